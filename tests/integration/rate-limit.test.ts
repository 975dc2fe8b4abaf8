import { execFile } from "node:child_process";
import { randomUUID } from "node:crypto";
import path from "node:path";
import { promisify } from "node:util";
import { eq } from "drizzle-orm";
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { db } from "@/db/index";
import { rateLimitBuckets } from "@/db/schema";
import { clientAddress, consumeRateLimit, peekRateLimit, refundRateLimit, resetRateLimits } from "@/lib/server/rate-limit";
import { clientAddressHeader } from "@/scripts/lib/client-address.mjs";

const run = promisify(execFile);
const root = path.resolve(import.meta.dirname, "..", "..");

/** A fresh key per test, so tests never see each other's windows. */
const freshKey = (label: string) => `test:${label}:${randomUUID()}`;

/** Pins the clock to the start of a window for each test of the block (only Date: the pg driver keeps its real timers). */
function pinClock(): void {
  beforeEach(() => {
    vi.useFakeTimers({ toFake: ["Date"] });
    vi.setSystemTime(new Date("2026-01-01T00:00:00Z"));
  });
  afterEach(() => {
    vi.useRealTimers();
  });
}

describe("consumeRateLimit", () => {
  pinClock();

  it("allows `limit` requests per window, then refuses with the seconds left", async () => {
    const key = freshKey("limit");
    const options = { limit: 2, windowMs: 10_000 };
    expect(await consumeRateLimit(key, options)).toEqual({ ok: true, remaining: 1, retryAfterSeconds: 0 });
    expect((await consumeRateLimit(key, options)).ok).toBe(true);
    vi.setSystemTime(new Date("2026-01-01T00:00:02.500Z"));
    expect(await consumeRateLimit(key, options)).toEqual({ ok: false, remaining: 0, retryAfterSeconds: 8 });
    // Other keys have their own window.
    expect((await consumeRateLimit(freshKey("other"), options)).ok).toBe(true);
  });

  it("does not count refused requests: the stored count never passes the limit", async () => {
    const key = freshKey("cap");
    const options = { limit: 3, windowMs: 60_000 };
    for (let i = 0; i < 7; i += 1) await consumeRateLimit(key, options);
    const rows = await db.select().from(rateLimitBuckets).where(eq(rateLimitBuckets.key, key));
    expect(rows.map((row) => row.count)).toEqual([3]);
  });

  it("opens a new window once the old one has passed", async () => {
    const key = freshKey("window");
    const options = { limit: 1, windowMs: 1_000 };
    expect((await consumeRateLimit(key, options)).ok).toBe(true);
    expect((await consumeRateLimit(key, options)).ok).toBe(false);
    vi.setSystemTime(new Date("2026-01-01T00:00:01Z"));
    expect((await consumeRateLimit(key, options)).ok).toBe(true);
  });

  it("counts concurrent requests exactly (one atomic upsert per request)", async () => {
    const key = freshKey("concurrent");
    const options = { limit: 25, windowMs: 60_000 };
    const outcomes = await Promise.all(Array.from({ length: 60 }, () => consumeRateLimit(key, options)));
    expect(outcomes.filter((o) => o.ok)).toHaveLength(25);
    expect((await peekRateLimit(key, options)).ok).toBe(false);
  });

  it("peeks without counting and refunds one request", async () => {
    const key = freshKey("refund");
    const options = { limit: 2, windowMs: 60_000 };
    await consumeRateLimit(key, options);
    await consumeRateLimit(key, options);
    expect(await peekRateLimit(key, options)).toEqual({ ok: false, remaining: 0, retryAfterSeconds: 60 });
    await refundRateLimit(key, options);
    expect(await peekRateLimit(key, options)).toEqual({ ok: true, remaining: 1, retryAfterSeconds: 0 });
    expect(await peekRateLimit(key, options)).toEqual({ ok: true, remaining: 1, retryAfterSeconds: 0 });
  });

  it("forgets only the windows under a prefix on reset", async () => {
    const prefix = freshKey("reset");
    const options = { limit: 1, windowMs: 60_000 };
    const kept = freshKey("kept");
    await consumeRateLimit(`${prefix}:a`, options);
    await consumeRateLimit(kept, options);
    await resetRateLimits(prefix);
    expect((await consumeRateLimit(`${prefix}:a`, options)).ok).toBe(true);
    expect((await consumeRateLimit(kept, options)).ok).toBe(false);
  });
});

describe("consumeRateLimit with leased units", () => {
  pinClock();

  /** The window's count as PostgreSQL holds it (hits and reserved units). */
  async function stored(key: string): Promise<number> {
    const [row] = await db.select({ count: rateLimitBuckets.count }).from(rateLimitBuckets).where(eq(rateLimitBuckets.key, key));
    return row?.count ?? 0;
  }

  it("reserves units ahead in PostgreSQL and spends them without counting each request there", async () => {
    const key = freshKey("lease");
    const options = { limit: 100, windowMs: 60_000, leaseUnits: 8 };
    expect(await consumeRateLimit(key, options)).toEqual({ ok: true, remaining: 99, retryAfterSeconds: 0 });
    // The hit and eight units ahead are counted at once.
    expect(await stored(key)).toBe(9);
    for (let i = 0; i < 8; i += 1) expect((await consumeRateLimit(key, options)).ok).toBe(true);
    expect(await stored(key)).toBe(9);
    expect(await consumeRateLimit(key, options)).toEqual({ ok: true, remaining: 90, retryAfterSeconds: 0 });
    expect(await stored(key)).toBe(18);
  });

  it("stays exact in one process: the limit is met, never passed, sequentially, concurrently and by weight", async () => {
    const sequential = freshKey("lease-seq");
    const options = { limit: 25, windowMs: 60_000, leaseUnits: 4 };
    const outcomes = [];
    for (let i = 0; i < 30; i += 1) outcomes.push(await consumeRateLimit(sequential, options));
    expect(outcomes.map((o) => o.ok)).toEqual([...Array<boolean>(25).fill(true), ...Array<boolean>(5).fill(false)]);
    expect(outcomes[29]).toEqual({ ok: false, remaining: 0, retryAfterSeconds: 60 });

    const concurrent = freshKey("lease-concurrent");
    const together = await Promise.all(Array.from({ length: 60 }, () => consumeRateLimit(concurrent, options)));
    expect(together.filter((o) => o.ok)).toHaveLength(25);

    // Weighted hits: 7 + 7 fit in 20, another 7 does not (6 are left) and counts nothing, 6 fits.
    const weighted = freshKey("lease-weight");
    const weightedOptions = { limit: 20, windowMs: 60_000, leaseUnits: 4 };
    const verdicts = [];
    for (const weight of [7, 7, 7, 6, 1]) verdicts.push((await consumeRateLimit(weighted, weightedOptions, weight)).ok);
    expect(verdicts).toEqual([true, true, false, true, false]);
    expect(await stored(weighted)).toBe(20);
  });

  it("starts afresh in the next window and after a reset", async () => {
    const key = freshKey("lease-window");
    const options = { limit: 3, windowMs: 10_000, leaseUnits: 2 };
    for (let i = 0; i < 3; i += 1) expect((await consumeRateLimit(key, options)).ok).toBe(true);
    expect((await consumeRateLimit(key, options)).ok).toBe(false);
    vi.setSystemTime(new Date("2026-01-01T00:00:10Z"));
    expect((await consumeRateLimit(key, options)).ok).toBe(true);
    // The reset forgets this process's unspent units too: they were reserved in the deleted window.
    await resetRateLimits(key);
    expect(await stored(key)).toBe(0);
    expect((await consumeRateLimit(key, options)).ok).toBe(true);
    expect(await stored(key)).toBe(3);
  });
});

describe("several app instances", () => {
  /** Runs `hits` simultaneous requests in a separate Node process (own modules, own pg pool). */
  async function instance(key: string, limit: number, hits: number, leaseUnits = 0): Promise<{ ok: number; refused: number }> {
    const { stdout } = await run(
      path.join(root, "node_modules", ".bin", "tsx"),
      ["--conditions=react-server", "tests/support/rate-limit-instance.ts", key, String(limit), "600000", String(hits), String(leaseUnits)],
      { cwd: root, env: process.env },
    );
    return JSON.parse(stdout.trim().split("\n").at(-1) ?? "{}") as { ok: number; refused: number };
  }

  it("share one count per key: two processes hitting at once accept exactly the limit between them", async () => {
    const key = freshKey("instances");
    const [first, second] = await Promise.all([instance(key, 40, 30), instance(key, 40, 30)]);
    expect(first.ok + second.ok).toBe(40);
    expect(first.refused + second.refused).toBe(20);
    // This process (a third instance) sees the same full window.
    expect((await peekRateLimit(key, { limit: 40, windowMs: 600_000 })).ok).toBe(false);
  });

  it("with leased units, never accept past the limit between them, and refuse at most their unspent units early", async () => {
    const key = freshKey("instances-lease");
    const [first, second] = await Promise.all([instance(key, 40, 30, 5), instance(key, 40, 30, 5)]);
    expect(first.ok + second.ok).toBeLessThanOrEqual(40);
    expect(first.ok + second.ok).toBeGreaterThanOrEqual(40 - 2 * 5);
    expect((await peekRateLimit(key, { limit: 40, windowMs: 600_000 })).ok).toBe(false);
  });

  it("see what another instance counted", async () => {
    const key = freshKey("handover");
    const options = { limit: 10, windowMs: 600_000 };
    for (let i = 0; i < 4; i += 1) await consumeRateLimit(key, options);
    expect(await instance(key, 10, 8)).toEqual({ ok: 6, refused: 2 });
    expect(await peekRateLimit(key, options)).toMatchObject({ ok: false, remaining: 0 });
  });
});

describe("clientAddress", () => {
  const request = (headers: Record<string, string>) => new Request("http://127.0.0.1/", { headers });

  it("reads only the address the app's server resolved, never headers a client can set", () => {
    expect(clientAddress(request({ [clientAddressHeader]: "203.0.113.1" }))).toBe("203.0.113.1");
    expect(clientAddress(new Headers({ [clientAddressHeader]: "203.0.113.2" }))).toBe("203.0.113.2");
    // next-auth's authorize() gets the headers as a plain object.
    expect(clientAddress({ [clientAddressHeader]: "203.0.113.3", "x-forwarded-for": "198.51.100.9" })).toBe("203.0.113.3");
    // Without it every caller shares one bucket, whatever X-Forwarded-For or X-Real-IP say.
    expect(clientAddress(request({ "x-forwarded-for": "203.0.113.1, 10.0.0.1" }))).toBe("unknown");
    expect(clientAddress(request({ "x-real-ip": "198.51.100.2" }))).toBe("unknown");
    expect(clientAddress({})).toBe("unknown");
    expect(clientAddress(undefined)).toBe("unknown");
  });
});
