import "server-only";
import {
  claimSignInAttempt,
  clearSignInFailures,
  deleteStaleSignInThrottles,
  refundSignInAttempt,
  type SignInDelayPolicy,
} from "@/db/queries/sign-in-throttles";
import { RateLimitError, UnauthenticatedError } from "@/lib/errors";
import { consumeRateLimit, refundRateLimit, type RateLimitOptions } from "@/lib/server/rate-limit";

/**
 * Progressive delays per (e-mail address, client address): the first 5 failures cost nothing; after
 * that each attempt from the same client for the same address must wait 1 s, 2 s, 4 s, ... up to
 * 15 minutes after the previous failure. Failures are forgotten after a day or a successful
 * sign-in. A stranger guessing from elsewhere only slows themselves down: there is no account-wide
 * lock for them to trigger, and signing in by e-mailed link is never limited by password failures.
 */
export const signInDelays: SignInDelayPolicy = { freeFailures: 5, baseSeconds: 1, maxSeconds: 15 * 60, forgetAfterSeconds: 24 * 60 * 60 };

/** Failed password sign-ins allowed per client address per window, across all e-mail addresses (password spraying). */
export const signInLimitPerAddress: RateLimitOptions = { limit: 40, windowMs: 15 * 60_000 };

/** Options of `limitSignInAttempt` (the defaults are `signInDelays` and `signInLimitPerAddress`). */
export interface LimitSignInAttemptOptions {
  delays?: SignInDelayPolicy;
  perAddress?: RateLimitOptions;
}

/**
 * Runs one password sign-in attempt under the progressive delay of (email, address) and the
 * per-address limit, both kept in PostgreSQL so every app instance shares them. Every attempt is
 * counted before it runs (so parallel guesses cannot slip past) and taken back when it succeeds or
 * fails for a reason other than wrong credentials; only failures stay counted.
 *
 * @param email - The e-mail as typed (compared lowercased), whether or not an account has it.
 * @param address - The client address (see `clientAddress`), or "unknown".
 * @param attempt - The credential check; it throws UnauthenticatedError for wrong credentials.
 * @param options - Other limits than the defaults (tests).
 * @throws RateLimitError with a user-facing message while the pair waits out its delay or the
 *   address is over its limit.
 */
export async function limitSignInAttempt<T>(
  email: string,
  address: string,
  attempt: () => Promise<T>,
  options: LimitSignInAttemptOptions = {},
): Promise<T> {
  const delays = options.delays ?? signInDelays;
  const perAddress = options.perAddress ?? signInLimitPerAddress;
  const normalized = email.trim().toLowerCase();
  const addressKey = `sign-in:ip:${address}`;

  const claim = await claimSignInAttempt(normalized, address, delays);
  if (!claim.ok) {
    throw new RateLimitError(
      claim.retryAfterSeconds,
      `Too many failed sign-ins for this e-mail address. Wait ${durationText(claim.retryAfterSeconds)} before trying again, or reset the password or sign in with an e-mailed link.`,
    );
  }
  const byAddress = await consumeRateLimit(addressKey, perAddress);
  if (!byAddress.ok) {
    await refundSignInAttempt(normalized, address);
    throw new RateLimitError(
      byAddress.retryAfterSeconds,
      `Too many failed sign-ins from your network. Try again in ${durationText(byAddress.retryAfterSeconds)}.`,
    );
  }
  sweepNowAndThen();

  try {
    const result = await attempt();
    await Promise.all([clearSignInFailures(normalized, address), refundRateLimit(addressKey, perAddress)]);
    return result;
  } catch (error) {
    // Wrong credentials stay counted; anything else (the database going away mid-check, a busy
    // hashing pool) is not the caller's failure.
    if (!(error instanceof UnauthenticatedError)) {
      await Promise.all([refundSignInAttempt(normalized, address), refundRateLimit(addressKey, perAddress)]).catch(() => undefined);
    }
    throw error;
  }
}

/** E-mailed sign-in, sign-up and password-reset links allowed per address per window (together). */
export const emailedLinkLimit: RateLimitOptions = { limit: 5, windowMs: 15 * 60_000 };

/**
 * Counts one request for an e-mailed link (sign-in link, sign-up confirmation or password reset)
 * to `email`, so a form cannot be used to flood someone's mailbox. The limit applies whether or
 * not the account exists, so the answer reveals nothing about accounts.
 *
 * @returns null when the link may be sent, else the user-facing message to show instead.
 */
export async function limitEmailedLinks(email: string, options: RateLimitOptions = emailedLinkLimit): Promise<string | null> {
  const verdict = await consumeRateLimit(`email-link:${email.trim().toLowerCase()}`, options);
  if (verdict.ok) return null;
  return `Too many e-mails were requested for this address. Try again in ${durationText(verdict.retryAfterSeconds)}.`;
}

/** Sign-ups allowed per client address per window (a lab class behind one network address fits). */
export const signUpLimitPerAddress: RateLimitOptions = { limit: 30, windowMs: 15 * 60_000 };

/**
 * Counts one sign-up from `address`.
 *
 * @returns null when the sign-up may go on, else the user-facing message to show instead.
 */
export async function limitSignUps(address: string, options: RateLimitOptions = signUpLimitPerAddress): Promise<string | null> {
  const verdict = await consumeRateLimit(`sign-up:ip:${address}`, options);
  if (verdict.ok) return null;
  return `Too many accounts were started from your network. Try again in ${durationText(verdict.retryAfterSeconds)}.`;
}

const sweepIntervalMs = 10 * 60_000;
let lastSweep = 0;

/** Deletes forgotten (email, address) pairs at most once per interval per process, off the request path. */
function sweepNowAndThen(): void {
  const now = Date.now();
  if (now - lastSweep < sweepIntervalMs) return;
  lastSweep = now;
  deleteStaleSignInThrottles(new Date(now - signInDelays.forgetAfterSeconds * 1000)).catch((error: unknown) => {
    console.error("Sweeping forgotten sign-in failures failed:", error);
  });
}

function durationText(seconds: number): string {
  if (seconds < 60) return `${seconds} second${seconds === 1 ? "" : "s"}`;
  const minutes = Math.ceil(seconds / 60);
  return `${minutes} minute${minutes === 1 ? "" : "s"}`;
}
