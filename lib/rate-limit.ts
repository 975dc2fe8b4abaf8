/**
 * Fixed-window rate limiting behind a small async interface, so the store can move into
 * PostgreSQL (shared by every app instance) without touching callers. TODO(#6): move the store
 * into PostgreSQL; this in-memory one is per process.
 */

/** How many requests a key may make per window. */
export interface RateLimitOptions {
  /** Requests allowed per window (at least 1). */
  limit: number;
  /** Window length in milliseconds. */
  windowMs: number;
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

interface Window {
  count: number;
  resetAt: number;
}

const windows = new Map<string, Window>();
/** Past this many keys, expired windows are swept before a new key is added. */
const sweepThreshold = 10_000;

/**
 * Counts one request for `key` and says whether it is within the limit.
 *
 * @param key - What is limited, e.g. `spectrum:203.0.113.9`.
 * @param options - Limit per window and window length.
 * @returns `{ ok, remaining, retryAfterSeconds }`; refused requests are not counted.
 */
export async function consumeRateLimit(key: string, options: RateLimitOptions): Promise<RateLimitResult> {
  const now = Date.now();
  let window = windows.get(key);
  if (!window || window.resetAt <= now) {
    if (!window && windows.size >= sweepThreshold) sweepExpired(now);
    window = { count: 0, resetAt: now + options.windowMs };
    windows.set(key, window);
  }
  if (window.count >= options.limit) {
    return { ok: false, remaining: 0, retryAfterSeconds: Math.max(1, Math.ceil((window.resetAt - now) / 1000)) };
  }
  window.count += 1;
  return { ok: true, remaining: options.limit - window.count, retryAfterSeconds: 0 };
}

/** Forgets every window (tests start from a clean slate with it). */
export async function resetRateLimits(): Promise<void> {
  windows.clear();
}

/**
 * The caller's address for rate limiting: the first `x-forwarded-for` entry, else `x-real-ip`,
 * else "unknown". Trust these headers only behind a proxy that sets them.
 */
export function clientAddress(request: Request): string {
  const forwarded = request.headers.get("x-forwarded-for")?.split(",")[0]?.trim();
  if (forwarded) return forwarded;
  return request.headers.get("x-real-ip")?.trim() || "unknown";
}

function sweepExpired(now: number): void {
  for (const [key, window] of windows) {
    if (window.resetAt <= now) windows.delete(key);
  }
}
