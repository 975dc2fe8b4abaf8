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
  let count: number | null;
  try {
    count = await hitRateLimitBucket(key, windowStart, Math.max(1, options.limit), weight);
  } catch (error) {
    if (options.whenUnavailable === "allow" && isDatabaseUnavailable(error)) {
      console.error(`Rate limit "${key}" not checked: the database is unavailable; letting the request through.`);
      return { ok: true, remaining: 0, retryAfterSeconds: 0 };
    }
    throw error;
  }
  sweepNowAndThen(now);
  if (count === null) {
    const resetAt = windowStart.getTime() + options.windowMs;
    return { ok: false, remaining: 0, retryAfterSeconds: Math.max(1, Math.ceil((resetAt - now) / 1000)) };
  }
  return { ok: true, remaining: Math.max(0, options.limit - count), retryAfterSeconds: 0 };
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
