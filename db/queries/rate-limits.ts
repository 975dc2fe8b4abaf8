import "server-only";
import { and, eq, like, lt, lte, sql } from "drizzle-orm";
import { db } from "../index";
import { rateLimitBuckets } from "../schema";

/**
 * Fixed-window counters in PostgreSQL, so every app instance sees the same counts. Like the
 * health ping these rows belong to no user, so the functions take no actor; only lib/server/rate-limit.ts
 * calls them.
 */

/**
 * Counts `weight` hits (default 1, at most `limit`) for `key` in the window starting at
 * `windowStart`, unless they would take the window past `limit`. One atomic statement (`insert ...
 * on conflict do update ... where count + weight <= limit returning count`), so concurrent hits from
 * any number of instances are counted exactly.
 *
 * @returns The window's count after this hit, or null when the window was full (nothing counted).
 */
export async function hitRateLimitBucket(key: string, windowStart: Date, limit: number, weight = 1): Promise<number | null> {
  const hits = Math.min(Math.max(1, Math.floor(weight)), limit);
  const [row] = await hitStatement.execute({ key, windowStart, hits, limit });
  return row?.count ?? null;
}

// Prepared once: rate limits are checked on nearly every compute and sign-in request, and building
// the statement costs more than running it (PostgreSQL also plans it once per connection).
const hitStatement = db
  .insert(rateLimitBuckets)
  .values({ key: sql.placeholder("key"), windowStart: sql.placeholder("windowStart"), count: sql.placeholder("hits") })
  .onConflictDoUpdate({
    target: [rateLimitBuckets.key, rateLimitBuckets.windowStart],
    set: { count: sql`${rateLimitBuckets.count} + ${sql.placeholder("hits")}::integer` },
    setWhere: lte(sql`${rateLimitBuckets.count} + ${sql.placeholder("hits")}::integer`, sql`${sql.placeholder("limit")}::integer`),
  })
  .returning({ count: rateLimitBuckets.count })
  .prepare("rate_limit_hit");

/** Takes back one hit (e.g. after a successful sign-in); never goes below zero. */
export async function refundRateLimitBucket(key: string, windowStart: Date): Promise<void> {
  await db
    .update(rateLimitBuckets)
    .set({ count: sql`greatest(${rateLimitBuckets.count} - 1, 0)` })
    .where(and(eq(rateLimitBuckets.key, key), eq(rateLimitBuckets.windowStart, windowStart)));
}

/** The number of hits counted for `key` in the window starting at `windowStart` (0 when none). */
export async function readRateLimitBucket(key: string, windowStart: Date): Promise<number> {
  const [row] = await db
    .select({ count: rateLimitBuckets.count })
    .from(rateLimitBuckets)
    .where(and(eq(rateLimitBuckets.key, key), eq(rateLimitBuckets.windowStart, windowStart)));
  return row?.count ?? 0;
}

/** Deletes windows that started before `before`; returns how many went. */
export async function deleteRateLimitBucketsBefore(before: Date): Promise<number> {
  const deleted = await db
    .delete(rateLimitBuckets)
    .where(lt(rateLimitBuckets.windowStart, before))
    .returning({ key: rateLimitBuckets.key });
  return deleted.length;
}

/** Deletes every window whose key starts with `prefix` (all of them for ""); for tests. */
export async function deleteRateLimitBuckets(prefix = ""): Promise<void> {
  const escaped = prefix.replace(/[\\%_]/g, (ch) => `\\${ch}`);
  await db.delete(rateLimitBuckets).where(like(rateLimitBuckets.key, `${escaped}%`));
}
