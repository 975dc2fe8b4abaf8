import "server-only";
import { and, eq, lt, sql, type SQL } from "drizzle-orm";
import { db } from "../index";
import { signInThrottles } from "../schema";

/**
 * Progressive delays for password sign-ins, per (e-mail address, client address), in PostgreSQL so
 * every app instance shares them. See lib/server/sign-in-limit.ts for the policy.
 */

/** How the delay grows: none for the first `freeFailures`, then `baseSeconds` doubling up to `maxSeconds`. */
export interface SignInDelayPolicy {
  freeFailures: number;
  baseSeconds: number;
  maxSeconds: number;
  /** Failures older than this are forgotten. */
  forgetAfterSeconds: number;
}

/** The outcome of {@link claimSignInAttempt}. */
export type SignInClaim = { ok: true } | { ok: false; retryAfterSeconds: number };

/**
 * Claims one attempt for (email, clientAddress): when the pair is not waiting out a delay, counts
 * the attempt as a failure in advance (so simultaneous guesses cannot all slip through) and sets
 * the delay before the next one. A success clears the pair ({@link clearSignInFailures}); an
 * attempt that failed for another reason than the credentials is taken back
 * ({@link refundSignInAttempt}).
 */
export async function claimSignInAttempt(email: string, clientAddress: string, policy: SignInDelayPolicy): Promise<SignInClaim> {
  const stale = sql`${signInThrottles.updatedAt} < now() - make_interval(secs => ${policy.forgetAfterSeconds})`;
  const failures = sql`case when ${stale} then 1 else ${signInThrottles.failures} + 1 end`;
  const [claimed] = await db
    .insert(signInThrottles)
    .values({ email, clientAddress, failures: 1, blockedUntil: blockAfter(sql`1`, policy), updatedAt: sql`now()` })
    .onConflictDoUpdate({
      target: [signInThrottles.email, signInThrottles.clientAddress],
      set: { failures, blockedUntil: blockAfter(failures, policy), updatedAt: sql`now()` },
      setWhere: sql`${signInThrottles.blockedUntil} <= now() or ${stale}`,
    })
    .returning({ failures: signInThrottles.failures });
  if (claimed) return { ok: true };
  const [row] = await db
    .select({ waitSeconds: sql<number>`extract(epoch from (${signInThrottles.blockedUntil} - now()))::float8` })
    .from(signInThrottles)
    .where(and(eq(signInThrottles.email, email), eq(signInThrottles.clientAddress, clientAddress)))
    .limit(1);
  return { ok: false, retryAfterSeconds: Math.max(1, Math.ceil(row?.waitSeconds ?? 1)) };
}

/** Forgets the failures of (email, clientAddress), after a successful sign-in. */
export async function clearSignInFailures(email: string, clientAddress: string): Promise<void> {
  await db.delete(signInThrottles).where(and(eq(signInThrottles.email, email), eq(signInThrottles.clientAddress, clientAddress)));
}

/**
 * Takes back one claimed attempt that failed for a reason other than the credentials. The wait it
 * set goes too: the claim was only allowed because no earlier wait was still running.
 */
export async function refundSignInAttempt(email: string, clientAddress: string): Promise<void> {
  await db
    .update(signInThrottles)
    .set({ failures: sql`greatest(0, ${signInThrottles.failures} - 1)`, blockedUntil: sql`'-infinity'::timestamptz` })
    .where(and(eq(signInThrottles.email, email), eq(signInThrottles.clientAddress, clientAddress)));
}

/** Deletes pairs whose failures are forgotten anyway (swept now and then, off the request path). */
export async function deleteStaleSignInThrottles(olderThan: Date): Promise<void> {
  await db.delete(signInThrottles).where(lt(signInThrottles.updatedAt, olderThan));
}

/**
 * Until when the next attempt waits after the `failures`-th failure. Free failures block nothing
 * ("-infinity", not now(): a concurrent claim whose statement started a moment earlier must not
 * see a block that was never meant).
 */
function blockAfter(failures: SQL, policy: SignInDelayPolicy): SQL {
  return sql`case when ${failures} < ${policy.freeFailures} then '-infinity'::timestamptz
    else now() + make_interval(secs => least(${policy.maxSeconds}::float8, ${policy.baseSeconds}::float8 * power(2, ${failures} - ${policy.freeFailures}))) end`;
}
