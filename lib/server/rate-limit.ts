import "server-only";
import {
  deleteRateLimitBucketsBefore,
  deleteRateLimitBuckets,
  hitRateLimitBucket,
  readRateLimitBucket,
  refundRateLimitBucket,
} from "@/db/queries/rate-limits";
import { isDatabaseUnavailable } from "@/lib/errors";
import { clientAddressHeader } from "@/scripts/lib/client-address.mjs";

/**
 * Fixed-window rate limiting with its counters in PostgreSQL (table `rate_limit_buckets`), so
 * several app instances behind a load balancer share one count per key. Windows are aligned to
 * multiples of `windowMs` since the epoch, so every instance agrees on where a window starts.
 */

/** How many requests a key may make per window. */
export interface RateLimitOptions {
  /** Requests allowed per window (at least 1). */
  limit: number;
  /** Window length in milliseconds (at most one day; older windows are swept away). */
  windowMs: number;
  /**
   * What to do when PostgreSQL cannot be reached: "refuse" (default) lets the database error
   * propagate (route handlers answer 503); "allow" lets the request through, for limits that
   * protect work needing no database (e.g. stateless compute).
   */
  whenUnavailable?: "refuse" | "allow";
  /**
   * Units this process reserves ahead in PostgreSQL with each counted hit and then spends without a
   * round trip (default 0: every hit is a round trip). For limits checked on every request of a hot
   * route. Within one process the count stays exact (a request is refused only when the window
   * holds less than its weight, reserved units included); across instances a caller may be refused
   * up to `leaseUnits` early per instance holding unspent units, never let past the limit.
   */
  leaseUnits?: number;
}

/** The outcome of one `consumeRateLimit` call. */
export interface RateLimitResult {
  /** True when the request may proceed (it has been counted). */
  ok: boolean;
  /** Requests left in the current window after this one. */
  remaining: number;
  /** Seconds until the window resets (whole seconds, at least 1 when refused; 0 when ok). */
  retryAfterSeconds: number;
}

/** No limiter uses a longer window; windows older than this are deleted. */
const maxWindowMs = 24 * 60 * 60 * 1000;
/** How often one process sweeps expired windows. */
const sweepIntervalMs = 10 * 60 * 1000;
let lastSweep = 0;

/**
 * Counts one request for `key`, weighing `weight` requests (an expensive computation counts for
 * several), and says whether it is within the limit.
 *
 * @param key - What is limited, e.g. `spectrum:203.0.113.9`.
 * @param options - Limit per window and window length.
 * @param weight - How many requests this one counts for (default 1; capped at the limit, so one
 *   request is always possible in a fresh window).
 * @returns `{ ok, remaining, retryAfterSeconds }`; refused requests are not counted.
 */
export async function consumeRateLimit(key: string, options: RateLimitOptions, weight = 1): Promise<RateLimitResult> {
  const now = Date.now();
  const windowStart = windowStartAt(now, options.windowMs);
  const limit = Math.max(1, Math.floor(options.limit));
  // As hitRateLimitBucket counts it: at least one, at most the limit.
  const hits = Math.min(Math.max(1, Math.floor(weight)), limit);
  const leaseUnits = Math.max(0, Math.floor(options.leaseUnits ?? 0));
  const lease = leaseUnits > 0 ? leaseFor(key, windowStart.getTime()) : null;
  // One reservation per key at a time: requests arriving meanwhile wait for its units, so that
  // concurrent requests do not each reserve ahead and strand units a later request needs.
  while (lease?.reserving) await lease.reserving;
  if (lease && lease.units >= hits) {
    lease.units -= hits;
    return { ok: true, remaining: Math.max(0, limit - lease.counted + lease.units), retryAfterSeconds: 0 };
  }
  let finishReserving = () => {};
  if (lease) lease.reserving = new Promise<void>((resolve) => (finishReserving = resolve));
  try {
    return await countHit(key, options, { now, windowStart, limit, hits, leaseUnits, lease });
  } finally {
    if (lease) lease.reserving = null;
    finishReserving();
  }
}

/** The counting part of {@link consumeRateLimit}: one round trip (two near the limit when leasing). */
async function countHit(
  key: string,
  options: RateLimitOptions,
  { now, windowStart, limit, hits, leaseUnits, lease }: { now: number; windowStart: Date; limit: number; hits: number; leaseUnits: number; lease: Lease | null },
): Promise<RateLimitResult> {
  // What this process already holds goes towards the request; only the rest is counted now.
  const held = lease ? lease.units : 0;
  if (lease) lease.units = 0;
  const needed = hits - held;
  let count: number | null;
  let reserved = needed;
  try {
    if (lease) {
      reserved = Math.min(needed + leaseUnits, limit);
      count = await hitRateLimitBucket(key, windowStart, limit, reserved);
      // Near the limit the extra units may not fit where the request itself does.
      if (count === null && reserved > needed) {
        reserved = needed;
        count = await hitRateLimitBucket(key, windowStart, limit, reserved);
      }
    } else {
      count = await hitRateLimitBucket(key, windowStart, limit, needed);
    }
  } catch (error) {
    if (lease) lease.units += held;
    if (options.whenUnavailable === "allow" && isDatabaseUnavailable(error)) {
      console.error(`Rate limit "${key}" not checked: the database is unavailable; letting the request through.`);
      return { ok: true, remaining: 0, retryAfterSeconds: 0 };
    }
    throw error;
  }
  sweepNowAndThen(now);
  if (count === null) {
    if (lease) lease.units += held;
    const resetAt = windowStart.getTime() + options.windowMs;
    return { ok: false, remaining: 0, retryAfterSeconds: Math.max(1, Math.ceil((resetAt - now) / 1000)) };
  }
  if (lease) {
    lease.units += reserved - needed;
    lease.counted = Math.max(lease.counted, count);
    return { ok: true, remaining: Math.max(0, limit - lease.counted + lease.units), retryAfterSeconds: 0 };
  }
  return { ok: true, remaining: Math.max(0, limit - count), retryAfterSeconds: 0 };
}

/** Units a process reserved ahead for a key's window and has not spent yet (see `leaseUnits`). */
interface Lease {
  windowStart: number;
  /** Reserved units not spent yet. */
  units: number;
  /** The window's count in PostgreSQL as last seen (every instance's hits and reservations). */
  counted: number;
  /** The reservation in flight, which other requests for the key wait for. */
  reserving: Promise<void> | null;
}

const leases = new Map<string, Lease>();
/** Keys with a lease kept at most; past it, leases of ended windows go, then all (which is only stricter). */
const maxLeases = 4096;

/** The key's lease for the window, a fresh empty one when it held none for this window. */
function leaseFor(key: string, windowStart: number): Lease {
  const found = leases.get(key);
  if (found && found.windowStart === windowStart) return found;
  if (leases.size >= maxLeases) {
    for (const [other, lease] of leases) if (lease.windowStart < windowStart) leases.delete(other);
    if (leases.size >= maxLeases) leases.clear();
  }
  const lease: Lease = { windowStart, units: 0, counted: 0, reserving: null };
  leases.set(key, lease);
  return lease;
}

/**
 * Reads where `key` stands without counting anything.
 *
 * @returns The same shape as `consumeRateLimit`; `ok` is false when the window is already full.
 */
export async function peekRateLimit(key: string, options: RateLimitOptions): Promise<RateLimitResult> {
  const now = Date.now();
  const windowStart = windowStartAt(now, options.windowMs);
  const count = await readRateLimitBucket(key, windowStart);
  if (count >= options.limit) {
    const resetAt = windowStart.getTime() + options.windowMs;
    return { ok: false, remaining: 0, retryAfterSeconds: Math.max(1, Math.ceil((resetAt - now) / 1000)) };
  }
  return { ok: true, remaining: options.limit - count, retryAfterSeconds: 0 };
}

/** Takes back one counted request of `key` in the current window (e.g. after a successful sign-in). */
export async function refundRateLimit(key: string, options: RateLimitOptions): Promise<void> {
  await refundRateLimitBucket(key, windowStartAt(Date.now(), options.windowMs));
}

/** Forgets every window, or those whose key starts with `prefix` (tests start from a clean slate with it). */
export async function resetRateLimits(prefix = ""): Promise<void> {
  for (const key of leases.keys()) if (key.startsWith(prefix)) leases.delete(key);
  await deleteRateLimitBuckets(prefix);
}

/**
 * The caller's address for rate limiting, as the app's own server (scripts/serve.mjs) resolved it
 * from the socket and the trusted proxies (TRUSTED_PROXY_COUNT) into the `x-mooring-client-address`
 * header, which it overwrites on every request. X-Forwarded-For and X-Real-IP are never read here:
 * a client can set them. Without the header (another server, a script calling a handler) every
 * caller shares the one bucket "unknown", which is stricter, never a way around the limit.
 *
 * @param source - A request, or headers as a Headers object or next-auth's plain header object.
 */
export function clientAddress(source: Request | Headers | Record<string, unknown> | undefined): string {
  const value =
    source instanceof Request ? source.headers.get(clientAddressHeader)
    : source instanceof Headers ? source.get(clientAddressHeader)
    : source?.[clientAddressHeader];
  return typeof value === "string" && value.trim() ? value.trim().slice(0, 64) : "unknown";
}

function windowStartAt(now: number, windowMs: number): Date {
  const length = Math.min(Math.max(1, Math.floor(windowMs)), maxWindowMs);
  return new Date(Math.floor(now / length) * length);
}

/** Deletes long-expired windows at most once per `sweepIntervalMs` per process, off the request path. */
function sweepNowAndThen(now: number): void {
  if (now - lastSweep < sweepIntervalMs) return;
  lastSweep = now;
  deleteRateLimitBucketsBefore(new Date(now - maxWindowMs)).catch((error: unknown) => {
    console.error("Sweeping expired rate-limit windows failed:", error);
  });
}
