import { beforeEach, describe, expect, it, vi } from "vitest";
import { computeSpectrum, configurationCost } from "@/lib/boundary";
import type { Configuration, Sector, SpectrumResult } from "@/lib/boundary/types";
import { computeSpectrumJob } from "@/lib/server/compute/pool";
import { largestConfiguration } from "@/tests/fixtures/large-configurations";
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

  it("returns 200 with the spectrum: bosonic tachyon at -1 and 24 massless states (Polchinski vol. 1, section 1.3, from memory)", async () => {
    const response = await post(JSON.stringify(bosonic));
    expect(response.status).toBe(200);
    const result = (await response.json()) as SpectrumResult;
    expect(result.dimension).toBe(26);
    // The mass cap levels = 1 lists alpha' M^2 <= 1: N = 0, 1, 2 with 1, 24, 324 states (OEIS A005758).
    expect(result.sectors[0]?.levels.map((row) => [row.massSquared, row.states])).toEqual([
      ["-1", "1"],
      ["0", "24"],
      ["1", "324"],
    ]);
  });

  it("fills in defaults for optional fields (label, anti, position, stringScaleGeV)", async () => {
    const response = await post(
      JSON.stringify({ format: 1, title: "bare", theory: "IIB", levels: 1, stacks: [{ id: "d3", count: 2, worldvolume: [1, 2, 3] }] }),
    );
    expect(response.status).toBe(200);
    const result = (await response.json()) as SpectrumResult;
    // One stack of two D3s: half-BPS with a U(2) gauge group (Polchinski vol. 2, section 13.4, from memory; common practice).
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

  it("rate-limits anonymous callers per address with Retry-After; signed-in users have a budget of their own", async () => {
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
      // A signed-in caller from the limited address is counted against the account, not the address.
      session.signedIn = true;
      const signedIn = await post(body, { [clientAddressHeader]: "203.0.113.5", cookie: "next-auth.session-token=abc" });
      expect(signedIn.status).toBe(200);
    } finally {
      vi.useRealTimers();
    }
  });

  it("weighs the budget by the configuration's cost: a few of the largest requests use up a minute", async () => {
    const body = JSON.stringify(largestConfiguration);
    const units = Math.ceil(configurationCost(largestConfiguration) / 500);
    expect(units).toBeGreaterThan(30);
    vi.useFakeTimers({ toFake: ["Date"] });
    vi.setSystemTime(new Date("2030-01-01T00:00:01Z"));
    try {
      const statuses: number[] = [];
      for (let i = 0; i < 5; i += 1) {
        const response = await post(`${body}`, { [clientAddressHeader]: "203.0.113.9" });
        statuses.push(response.status);
        await response.arrayBuffer();
      }
      // 120 units a minute per address: floor(120 / units) requests fit, the next is refused.
      const fit = Math.floor(120 / units);
      expect(statuses.slice(0, fit).every((status) => status === 200)).toBe(true);
      expect(statuses[fit]).toBe(429);
      // What is left of the minute still admits a cheap request from that address.
      expect((await post(JSON.stringify(bosonic), { [clientAddressHeader]: "203.0.113.9" })).status).toBe(200);
      // A signed-in user has a budget of their own (600 units), also weighed by cost.
      session.signedIn = true;
      const signedIn: number[] = [];
      for (let i = 0; i <= Math.floor(600 / units); i += 1) {
        const response = await post(body, { [clientAddressHeader]: "203.0.113.9", cookie: "next-auth.session-token=abc" });
        signedIn.push(response.status);
        await response.arrayBuffer();
      }
      expect(signedIn.slice(0, -1).every((status) => status === 200)).toBe(true);
      expect(signedIn.at(-1)).toBe(429);
    } finally {
      vi.useRealTimers();
    }
  });

  it("pages the level rows of a large result: every sector's detail arrives exactly once across the pages", async () => {
    const full = computeSpectrum(largestConfiguration);
    const seen = new Map<string, Sector>();
    let offset: number | null = 0;
    let pages = 0;
    session.signedIn = true;
    while (offset !== null) {
      const response = await POST(
        new Request(`http://127.0.0.1/api/spectrum?sectorOffset=${offset}&maxRows=8000`, {
          method: "POST",
          headers: { "content-type": "application/json", cookie: "next-auth.session-token=abc" },
          body: JSON.stringify(largestConfiguration),
        }),
      );
      expect(response.status).toBe(200);
      const text = await response.text();
      const page = JSON.parse(text) as SpectrumResult & { page: { sectorOffset: number; sectorsWithDetail: number; nextSectorOffset: number | null } };
      const detailed = page.sectors.filter((sector) => !sector.detailOmitted);
      expect(detailed.reduce((rows, sector) => rows + sector.levels.length, 0)).toBeLessThanOrEqual(8000);
      expect(page.sectors).toHaveLength(full.sectors.length);
      for (const sector of detailed) {
        const key = sector.pair.join("|");
        expect(seen.has(key)).toBe(false);
        seen.set(key, sector);
      }
      expect(page.lightest).toEqual(full.lightest);
      offset = page.page.nextSectorOffset;
      pages += 1;
    }
    expect(pages).toBeGreaterThan(1);
    expect([...seen.values()]).toEqual(full.sectors);
  });

  it("computes the largest configurations in a worker thread, and small ones inline", async () => {
    const large = await computeSpectrumJob({ document: largestConfiguration });
    expect(large.offThread).toBe(true);
    expect(JSON.parse(large.json)).toEqual(computeSpectrum(largestConfiguration));
    const small = await computeSpectrumJob({ document: bosonic as Configuration });
    expect(small.offThread).toBe(false);
  });
});
