import { beforeEach, describe, expect, it, vi } from "vitest";
import type { SpectrumResult } from "@/lib/boundary/types";
import { resetRateLimits } from "@/lib/server/rate-limit";
import { clientAddressHeader } from "@/scripts/lib/client-address.mjs";

// The compute route needs no database; only the session lookup is replaced.
const session = vi.hoisted(() => ({ signedIn: false }));
vi.mock("@/lib/server/session", () => ({
  getCurrentUser: async () => (session.signedIn ? { id: "user-1", name: "Test", siteRole: "member" } : null),
}));

const { POST } = await import("@/app/api/spectrum/route");

const d25 = Array.from({ length: 25 }, (_, i) => i + 1);

function post(body: string, headers: Record<string, string> = {}): Promise<Response> {
  return POST(
    new Request("http://127.0.0.1/api/spectrum", {
      method: "POST",
      headers: { "content-type": "application/json", [clientAddressHeader]: "198.51.100.7", ...headers },
      body,
    }),
  );
}

const bosonic = {
  format: 1,
  title: "one D25",
  theory: "bosonic",
  stringScaleGeV: null,
  levels: 1,
  stacks: [{ id: "a", label: "space-filling", count: 1, anti: false, worldvolume: d25, position: {} }],
};

describe("POST /api/spectrum", () => {
  beforeEach(async () => {
    session.signedIn = false;
    await resetRateLimits();
  });

  it("returns 200 with the spectrum: bosonic tachyon at -1 and 24 massless states (Polchinski vol. 1, common practice)", async () => {
    const response = await post(JSON.stringify(bosonic));
    expect(response.status).toBe(200);
    const result = (await response.json()) as SpectrumResult;
    expect(result.dimension).toBe(26);
    expect(result.sectors[0]?.levels.map((row) => [row.massSquared, row.states])).toEqual([
      ["-1", "1"],
      ["0", "24"],
    ]);
  });

  it("fills in defaults for optional fields (label, anti, position, stringScaleGeV)", async () => {
    const response = await post(
      JSON.stringify({ format: 1, title: "bare", theory: "IIB", levels: 1, stacks: [{ id: "d3", count: 2, worldvolume: [1, 2, 3] }] }),
    );
    expect(response.status).toBe(200);
    const result = (await response.json()) as SpectrumResult;
    expect(result.supercharges).toBe(16);
    expect(result.gaugeGroup).toBe("U(2)");
  });

  it("returns 422 with JSON paths for an invalid configuration", async () => {
    const invalid = {
      ...bosonic,
      theory: "IIA",
      stacks: [
        { id: "ok", label: "", count: 1, anti: false, worldvolume: [1, 2], position: {} },
        { id: "odd", label: "", count: 1, anti: false, worldvolume: [1, 2, 3], position: {} },
      ],
    };
    const response = await post(JSON.stringify(invalid));
    expect(response.status).toBe(422);
    const body = (await response.json()) as { error: string; issues: { path: (string | number)[]; jsonPath: string; message: string }[] };
    expect(body.error).toBe("validation_failed");
    expect(body.issues).toEqual([
      { path: ["stacks", 1, "worldvolume"], jsonPath: "stacks[1].worldvolume", message: expect.stringContaining("IIA allows only even p") },
    ]);
  });

  it("returns 422 with the path of a shape error", async () => {
    const response = await post(JSON.stringify({ ...bosonic, stacks: [{ ...bosonic.stacks[0], count: "many" }] }));
    expect(response.status).toBe(422);
    const body = (await response.json()) as { issues: { jsonPath: string }[] };
    expect(body.issues.map((issue) => issue.jsonPath)).toEqual(["stacks[0].count"]);
  });

  it("returns 400 for malformed JSON", async () => {
    const response = await post("{ not json");
    expect(response.status).toBe(400);
    expect(((await response.json()) as { error: string }).error).toBe("invalid_json");
  });

  it("returns 413 past 64 KiB", async () => {
    const response = await post(JSON.stringify({ ...bosonic, description: "x".repeat(70 * 1024) }));
    expect(response.status).toBe(413);
  });

  it("rate-limits anonymous callers per address with Retry-After, but not signed-in users", async () => {
    const body = JSON.stringify({ ...bosonic, levels: 0 });
    // Windows are fixed slices of the clock: pin the clock to the start of one window so the
    // 121 requests cannot straddle a boundary and split their count (only Date is faked).
    vi.useFakeTimers({ toFake: ["Date"] });
    vi.setSystemTime(new Date("2030-01-01T00:00:01Z"));
    try {
      let last: Response | undefined;
      for (let i = 0; i < 121; i += 1) last = await post(body, { [clientAddressHeader]: "203.0.113.5" });
      expect(last?.status).toBe(429);
      expect(Number(last?.headers.get("retry-after"))).toBeGreaterThan(0);
      // Another address still gets through.
      expect((await post(body, { [clientAddressHeader]: "203.0.113.6" })).status).toBe(200);
      // A signed-in caller from the limited address is not counted.
      session.signedIn = true;
      const signedIn = await post(body, { [clientAddressHeader]: "203.0.113.5", cookie: "next-auth.session-token=abc" });
      expect(signedIn.status).toBe(200);
    } finally {
      vi.useRealTimers();
    }
  });
});
