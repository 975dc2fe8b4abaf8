import { describe, expect, it } from "vitest";
import { GET } from "@/app/api/health/route";

describe("GET /api/health", () => {
  it("answers 200 with ok and a database round trip when PostgreSQL is up", async () => {
    const response = await GET();
    expect(response.status).toBe(200);
    expect(response.headers.get("cache-control")).toBe("private, no-store");
    // Exactly these fields; JSON would turn a NaN or infinite latency into null, which fails here.
    expect(await response.json()).toEqual({ ok: true, database: { ok: true, latencyMs: expect.any(Number) } });
  });
});
