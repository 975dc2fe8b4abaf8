import "server-only";
import { RateLimitError, UnauthenticatedError } from "@/lib/errors";
import { consumeRateLimit, refundRateLimit, type RateLimitOptions } from "@/lib/server/rate-limit";

/**
 * Failed password sign-ins allowed per e-mail address per window. Above the account lockout of
 * db/queries/users.ts (10 in a row), so an existing account shows its lockout message first; this
 * limit also covers addresses that have no account.
 */
export const signInLimitPerEmail: RateLimitOptions = { limit: 20, windowMs: 15 * 60_000 };

/** Failed password sign-ins allowed per client address per window (password spraying across accounts). */
export const signInLimitPerAddress: RateLimitOptions = { limit: 40, windowMs: 15 * 60_000 };

/** Options of `limitSignInAttempt` (the defaults are `signInLimitPerEmail` and `signInLimitPerAddress`). */
export interface LimitSignInAttemptOptions {
  perEmail?: RateLimitOptions;
  perAddress?: RateLimitOptions;
}

/**
 * Runs one password sign-in attempt under the per-e-mail and per-address limits, both counted in
 * PostgreSQL so every app instance shares them. Every attempt is counted before it runs (so
 * parallel guesses cannot slip past the limit) and refunded when it succeeds or fails for a
 * reason other than wrong credentials; only failures stay counted.
 *
 * @param email - The e-mail as typed (compared lowercased).
 * @param address - The client address (see `clientAddress`), or "unknown".
 * @param attempt - The credential check; it throws UnauthenticatedError for wrong credentials.
 * @param options - Other limits than the defaults (tests).
 * @throws RateLimitError with a user-facing lockout message when either limit is used up.
 */
export async function limitSignInAttempt<T>(
  email: string,
  address: string,
  attempt: () => Promise<T>,
  options: LimitSignInAttemptOptions = {},
): Promise<T> {
  const perEmail = options.perEmail ?? signInLimitPerEmail;
  const perAddress = options.perAddress ?? signInLimitPerAddress;
  const emailKey = `sign-in:email:${email.trim().toLowerCase()}`;
  const addressKey = `sign-in:ip:${address}`;

  const byEmail = await consumeRateLimit(emailKey, perEmail);
  if (!byEmail.ok) {
    throw new RateLimitError(
      byEmail.retryAfterSeconds,
      `Too many failed sign-ins for this e-mail address. Try again in ${minutesText(byEmail.retryAfterSeconds)}, or reset the password.`,
    );
  }
  const byAddress = await consumeRateLimit(addressKey, perAddress);
  if (!byAddress.ok) {
    await refundRateLimit(emailKey, perEmail);
    throw new RateLimitError(
      byAddress.retryAfterSeconds,
      `Too many failed sign-ins from your network. Try again in ${minutesText(byAddress.retryAfterSeconds)}.`,
    );
  }

  const refund = () =>
    Promise.all([refundRateLimit(emailKey, perEmail), refundRateLimit(addressKey, perAddress)]);
  try {
    const result = await attempt();
    await refund();
    return result;
  } catch (error) {
    // Wrong credentials and attempts on a locked account stay counted; anything else (e.g. the
    // database going away mid-check) is not the caller's failure.
    if (!(error instanceof UnauthenticatedError || error instanceof RateLimitError)) {
      await refund().catch(() => undefined);
    }
    throw error;
  }
}

/** E-mailed sign-in and password-reset links allowed per address per window (together). */
export const emailedLinkLimit: RateLimitOptions = { limit: 5, windowMs: 15 * 60_000 };

/**
 * Counts one request for an e-mailed link (sign-in link or password reset) to `email`, so a form
 * cannot be used to flood someone's mailbox. The limit applies whether or not the account exists,
 * so the answer reveals nothing about accounts.
 *
 * @returns null when the link may be sent, else the user-facing message to show instead.
 */
export async function limitEmailedLinks(email: string, options: RateLimitOptions = emailedLinkLimit): Promise<string | null> {
  const verdict = await consumeRateLimit(`email-link:${email.trim().toLowerCase()}`, options);
  if (verdict.ok) return null;
  return `Too many e-mails were requested for this address. Try again in ${minutesText(verdict.retryAfterSeconds)}.`;
}

/**
 * The client address of a next-auth `authorize(credentials, req)` call, whose `req.headers` is a
 * plain object in the App Router.
 */
export function signInAddress(headers: Record<string, unknown> | undefined): string {
  const forwarded = headers?.["x-forwarded-for"];
  const first = typeof forwarded === "string" ? forwarded.split(",")[0]?.trim() : undefined;
  if (first) return first;
  const real = headers?.["x-real-ip"];
  return (typeof real === "string" && real.trim()) || "unknown";
}

function minutesText(seconds: number): string {
  const minutes = Math.max(1, Math.ceil(seconds / 60));
  return `${minutes} minute${minutes === 1 ? "" : "s"}`;
}
