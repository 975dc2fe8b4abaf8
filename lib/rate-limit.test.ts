import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { clientAddress, consumeRateLimit, resetRateLimits } from "./rate-limit";

describe("consumeRateLimit", () => {
  beforeEach(async () => {
    vi.useFakeTimers();
    vi.setSystemTime(new Date("2026-01-01T00:00:00Z"));
    await resetRateLimits();
  });
  afterEach(() => {
    vi.useRealTimers();
  });

  it("allows `limit` requests per window, then refuses with the seconds left", async () => {
    const options = { limit: 2, windowMs: 10_000 };
    expect(await consumeRateLimit("k", options)).toEqual({ ok: true, remaining: 1, retryAfterSeconds: 0 });
    expect((await consumeRateLimit("k", options)).ok).toBe(true);
    vi.advanceTimersByTime(2_500);
    expect(await consumeRateLimit("k", options)).toEqual({ ok: false, remaining: 0, retryAfterSeconds: 8 });
    // Other keys have their own window.
    expect((await consumeRateLimit("other", options)).ok).toBe(true);
  });

  it("opens a new window once the old one has passed", async () => {
    const options = { limit: 1, windowMs: 1_000 };
    expect((await consumeRateLimit("k", options)).ok).toBe(true);
    expect((await consumeRateLimit("k", options)).ok).toBe(false);
    vi.advanceTimersByTime(1_000);
    expect((await consumeRateLimit("k", options)).ok).toBe(true);
  });
});

describe("clientAddress", () => {
  const request = (headers: Record<string, string>) => new Request("http://127.0.0.1/", { headers });

  it("takes the first x-forwarded-for entry, then x-real-ip, then 'unknown'", () => {
    expect(clientAddress(request({ "x-forwarded-for": "203.0.113.1, 10.0.0.1" }))).toBe("203.0.113.1");
    expect(clientAddress(request({ "x-real-ip": "198.51.100.2" }))).toBe("198.51.100.2");
    expect(clientAddress(request({}))).toBe("unknown");
  });
});
