import { describe, expect, it } from "vitest";
import { ConfigurationError, checkConfiguration } from "./check";
import { parseRational, rationalToNumber } from "./rational";
import { computeSpectrum, tryComputeSpectrum } from "./spectrum";
import type { Configuration, Sector, Stack } from "./types";

const axes = (from: number, to: number): number[] => Array.from({ length: to - from + 1 }, (_, i) => from + i);

function stack(id: string, worldvolume: number[], extra: Partial<Stack> = {}): Stack {
  return { id, label: "", count: 1, anti: false, worldvolume, position: {}, ...extra };
}

function config(theory: Configuration["theory"], stacks: Stack[], extra: Partial<Configuration> = {}): Configuration {
  return { format: 1, title: "test", theory, stringScaleGeV: null, levels: 3, stacks, ...extra };
}

function sectorOf(sectors: Sector[], a: string, b: string): Sector {
  const found = sectors.find((sector) => sector.pair[0] === a && sector.pair[1] === b);
  if (!found) throw new Error(`no sector ${a}-${b}`);
  return found;
}

/** [massSquared, states] of every row of one sector kind. */
function rowsOf(sector: Sector, kind: "bosonic" | "NS" | "R"): [string, string | null][] {
  return sector.levels.filter((row) => row.sector === kind).map((row) => [row.massSquared, row.states]);
}

describe("computeSpectrum", () => {
  describe("bosonic string, D = 26", () => {
    const d25 = config("bosonic", [stack("a", axes(1, 25))], { levels: 3 });

    it("gives the tachyon at alpha' M^2 = -1 and 24 massless vector states at level 1 (Polchinski vol. 1, section 1.3, from memory)", () => {
      const [sector] = computeSpectrum(d25).sectors;
      expect(sector?.zeroPoint).toEqual({ bosonic: "-1" });
      expect(sector?.levels[0]?.massSquared).toBe("-1");
      expect(sector?.levels[0]?.mass).toBeNull();
      expect(sector?.tachyonic).toBe(true);
      expect(sector?.levels[1]?.massSquared).toBe("0");
      expect(sector?.levels[1]?.states).toBe("24");
      expect(sector?.massless).toEqual([
        expect.objectContaining({ sector: "bosonic", states: "24", description: expect.stringContaining("vector with 24 polarisations") }),
      ]);
    });

    it("counts 1, 24, 324, 3200, 25650 states at levels 0..4, up to the mass cap alpha' M^2 = 3 (OEIS A005758)", () => {
      const [sector] = computeSpectrum(d25).sectors;
      expect(sector ? rowsOf(sector, "bosonic") : []).toEqual([
        ["-1", "1"],
        ["0", "24"],
        ["1", "324"],
        ["2", "3200"],
        ["3", "25650"],
      ]);
    });

    it("splits the 24 massless states of a D3 into 2 vector polarisations and 22 position scalars (NN vector, DD scalar: Polchinski vol. 1, chapter 8, from memory)", () => {
      const [sector] = computeSpectrum(config("bosonic", [stack("d3", [1, 2, 3])])).sectors;
      expect(sector?.massless[0]?.description).toBe(
        "vector with 2 polarisations (NN axes 1-3 less one light-cone direction) and 22 scalars (positions on DD axes 4-25)",
      );
      expect(sector?.massless[0]?.states).toBe("24");
    });

    it("has no supercharges and ignores the antibrane flag", () => {
      const result = computeSpectrum(config("bosonic", [stack("a", [1, 2]), stack("b", [1, 2], { anti: true })]));
      expect(result.supercharges).toBeNull();
      expect(result.bps).toBe(false);
      // Coincident and the flag ignored: U(1) x U(1) -> U(2) (Chan-Paton factors, common practice; Polchinski vol. 1, chapter 8, from memory).
      expect(result.gaugeGroup).toBe("U(2)");
      expect(result.warnings.some((warning) => warning.includes("antibrane flag"))).toBe(true);
    });
  });

  describe("type II, nu = 0", () => {
    const single = config("IIB", [stack("d3", [1, 2, 3])], { levels: 3 });

    it("gives 8, 128, 1152 states at alpha' M^2 = 0, 1, 2 in both NS and R (Green, Schwarz and Witten vol. 1, chapter 4, from memory)", () => {
      const [sector] = computeSpectrum(single).sectors;
      // a_NS = -1/2, a_R = 0 at nu = 0 (Polchinski vol. 2, section 13.4, from memory).
      expect(sector?.zeroPoint).toEqual({ NS: "-1/2", R: "0" });
      const expected = [
        ["0", "8"],
        ["1", "128"],
        ["2", "1152"],
      ];
      expect(sector ? rowsOf(sector, "NS").slice(0, 3) : []).toEqual(expected);
      expect(sector ? rowsOf(sector, "R").slice(0, 3) : []).toEqual(expected);
      // The mass cap alpha' M^2 <= 3 stops NS (a = -1/2) at N = 7/2 and R (a = 0) at N = 3.
      expect(sector?.levels.map((row) => row.level)).toEqual(["1/2", "3/2", "5/2", "7/2", "0", "1", "2", "3"]);
      expect(sector?.tachyonic).toBe(false);
    });

    it("keeps 16 supercharges for one stack: a D-brane is half-BPS (Polchinski vol. 2, section 13.4, from memory)", () => {
      const result = computeSpectrum(single);
      expect(result.supercharges).toBe(16);
      expect(result.bps).toBe(true);
      expect(result.sectors[0]?.supersymmetric).toBe(true);
    });

    it("gives the brane-antibrane NS ground state at -1/2 and y_c = pi sqrt 2 ~ 4.443 (Banks and Susskind 1995, hep-th/9511194, from memory)", () => {
      const result = computeSpectrum(
        config("IIB", [stack("b", [1, 2, 3]), stack("c", [1, 2, 3], { anti: true, position: { "9": 1 } })]),
      );
      const pair = sectorOf(result.sectors, "b", "c");
      expect(pair.criticalSeparation).toBeCloseTo(Math.PI * Math.SQRT2, 12);
      expect(pair.criticalSeparation).toBeCloseTo(4.443, 3);
      // y = 1 < y_c: still tachyonic; alpha' M^2 = (y / 2 pi)^2 - 1/2 = 1 / (4 pi^2) - 1/2 (stretched-string
      // mass formula, Polchinski vol. 1, chapter 8, from memory).
      expect(pair.tachyonic).toBe(true);
      expect(Number(pair.levels[0]?.massSquared)).toBeCloseTo(1 / (4 * Math.PI ** 2) - 0.5, 11);
      expect(pair.levels[0]?.level).toBe("0");
      expect(result.supercharges).toBe(0);
      expect(pair.supersymmetric).toBe(false);

      const coincident = computeSpectrum(config("IIB", [stack("b", [1, 2, 3]), stack("c", [1, 2, 3], { anti: true })]));
      const exact = sectorOf(coincident.sectors, "b", "c");
      expect(rowsOf(exact, "NS")[0]).toEqual(["-1/2", "1"]);
      // The GSO projection of the opposite orientation keeps the NS tachyon and removes the massless vector
      // (Banks and Susskind 1995, from memory; Polchinski vol. 2, section 13.4, from memory).
      expect(exact.massless.map((content) => content.sector)).toEqual(["R"]);
      expect(coincident.gaugeGroup).toBe("U(1) x U(1)");
    });

    it("enhances coincident stacks of the same orientation to U(N_a + N_b) (common practice; Polchinski vol. 1, chapter 8, from memory)", () => {
      const result = computeSpectrum(
        config("IIB", [stack("x", [1, 2, 3], { count: 2 }), stack("y", [1, 2, 3], { position: { "9": 0 } })]),
      );
      expect(result.gaugeGroup).toBe("U(3)");
      const pair = sectorOf(result.sectors, "x", "y");
      expect(pair.notes).toContain("Coincident stacks: U(2) x U(1) is enhanced to U(3).");
      expect(pair.massless[0]?.description).toContain("bifundamental vector with 2 polarisations");
      // Chan-Paton: N_a N_b = 2 per orientation, 4 over both; 8 massless states each (common practice).
      expect(pair.chanPaton).toBe(4);
      expect(pair.levels[0]?.withChanPaton).toBe("32");
    });

    it("gives W-boson-like masses M = y / (2 pi alpha') for separated stacks (string tension 1 / (2 pi alpha'); Polchinski vol. 1, chapter 8, from memory)", () => {
      const y = 2 * Math.PI;
      const result = computeSpectrum(
        config("IIB", [stack("x", [1, 2, 3], { count: 2 }), stack("y", [1, 2, 3], { position: { "6": y } })], {
          stringScaleGeV: 2000,
        }),
      );
      const pair = sectorOf(result.sectors, "x", "y");
      expect(result.gaugeGroup).toBe("U(2) x U(1)");
      expect(pair.separation).toBe(y);
      expect(pair.levels[0]?.massSquared).toBe("1");
      expect(pair.levels[0]?.mass).toBeCloseTo(1, 12);
      // M_s = 2000 GeV, so M = 1 * 2000 GeV.
      expect(pair.levels[0]?.massGeV).toBeCloseTo(2000, 9);
      expect(pair.massless).toEqual([]);
      expect(pair.criticalSeparation).toBeNull();
    });
  });

  describe("type II, nu > 0", () => {
    it("gives 8 supercharges and equal NS and R counts at nu = 4 (Polchinski vol. 2, section 13.4, from memory)", () => {
      const result = computeSpectrum(config("IIA", [stack("w", axes(1, 8)), stack("p", axes(1, 4))], { levels: 2 }));
      const pair = sectorOf(result.sectors, "p", "w");
      expect(pair.nu).toBe(4);
      expect(pair.zeroPoint).toEqual({ NS: "0", R: "0" });
      expect(rowsOf(pair, "NS")).toEqual(rowsOf(pair, "R"));
      expect(pair.supersymmetric).toBe(true);
    });

    it("puts the single R ground state at nu = 8 in one orientation and says so (Polchinski vol. 2, section 13.4, from memory)", () => {
      const result = computeSpectrum(config("IIA", [stack("w", axes(1, 8)), stack("z", [])], { levels: 1 }));
      const pair = sectorOf(result.sectors, "w", "z");
      expect(pair.zeroPoint).toEqual({ NS: "1/2", R: "0" });
      const ground = pair.levels.find((row) => row.sector === "R" && row.level === "0");
      expect(ground?.states).toBeNull();
      expect(ground?.withChanPaton).toBe("1");
      expect(ground?.note).toContain("unpaired R ground state");
      expect(pair.massless).toEqual([expect.objectContaining({ sector: "R", states: "1" })]);
      expect(result.supercharges).toBe(8); // nu = 8 preserves a quarter (Polchinski vol. 2, section 13.4, from memory)
    });

    it("finds a tachyon at nu = 2 with a = -1/2 + nu/8 = -1/4 and no supersymmetry (Polchinski vol. 2, section 13.4, from memory)", () => {
      const result = computeSpectrum(config("IIA", [stack("d2", [1, 2]), stack("d0", [], { position: { "5": 1 } })]));
      const pair = sectorOf(result.sectors, "d0", "d2");
      expect(pair.zeroPoint.NS).toBe("-1/4");
      // y_c = 2 pi sqrt(-a) = 2 pi sqrt(1/4) = pi, where (y / 2 pi)^2 + a reaches 0 (mass formula above).
      expect(pair.criticalSeparation).toBeCloseTo(Math.PI, 12);
      expect(pair.supersymmetric).toBe(false);
      expect(result.supercharges).toBe(0);
    });
  });

  describe("result shape", () => {
    it("stamps the engine version and conventions and sorts sectors by id", () => {
      const result = computeSpectrum(config("IIA", [stack("m", [1, 2]), stack("b", [1, 2], { position: { "7": 3 } })]));
      expect(result.engineVersion).toMatch(/^\d+\.\d+\.\d+$/);
      expect(result.conventions).toContain("alpha' = 1");
      expect(result.dimension).toBe(10);
      expect(result.sectors.map((sector) => sector.pair.join("-"))).toEqual(["b-b", "b-m", "m-m"]);
    });

    it("lists the lightest states first, limited by lightestCount", () => {
      const result = computeSpectrum(
        config("IIA", [stack("a", [1, 2]), stack("b", [1, 2], { anti: true, position: { "7": 1 } })]),
        { lightestCount: 3 },
      );
      expect(result.lightest).toHaveLength(3);
      expect(result.lightest[0]).toEqual(expect.objectContaining({ pair: ["a", "b"], sector: "NS", level: "0", mass: null }));
      const values = result.lightest.map((state) =>
        state.massSquared.includes("/") ? rationalToNumber(parseRational(state.massSquared)) : Number(state.massSquared),
      );
      expect([...values].sort((x, y) => x - y)).toEqual(values);
    });

    it("is deterministic and does not mutate its input", () => {
      const c = config("IIA", [stack("a", [1, 2], { count: 3 }), stack("b", [3, 4], { position: { "1": 0.5 } })]);
      const copy = structuredClone(c);
      expect(computeSpectrum(c)).toEqual(computeSpectrum(c));
      expect(c).toEqual(copy);
    });

    it("adds massGeV only when a string scale is set", () => {
      const plain = computeSpectrum(config("IIB", [stack("a", [1])]));
      expect(plain.sectors[0]?.levels[0]).not.toHaveProperty("massGeV");
    });
  });

  describe("invalid input", () => {
    it("throws a ConfigurationError carrying every problem", () => {
      const bad = config("IIA", [stack("a", [1, 2, 3]), stack("a", [1])], { levels: 500 });
      expect(() => computeSpectrum(bad)).toThrow(ConfigurationError);
      try {
        computeSpectrum(bad);
      } catch (error) {
        expect(error instanceof ConfigurationError && error.problems.map((problem) => problem.path)).toEqual([
          ["levels"],
          ["stacks", 0, "worldvolume"],
          ["stacks", 1, "id"],
          ["stacks", 1, "worldvolume"],
        ]);
      }
    });

    it("rejects a negative lightestCount", () => {
      expect(() => computeSpectrum(config("IIB", []), { lightestCount: -1 })).toThrow(RangeError);
    });
  });

  describe("edge cases", () => {
    it("handles an empty configuration", () => {
      const result = computeSpectrum(config("IIA", []));
      expect(result.sectors).toEqual([]);
      expect(result.gaugeGroup).toBe("none");
      expect(result.supercharges).toBe(32); // type II in empty space (common practice)
      expect(result.bps).toBe(false);
      expect(result.warnings).toContain("The configuration has no stacks yet, so there are no open strings.");
    });

    it("handles a D0 with itself: 9 position directions, 8 light-cone states (common practice: D - 2 transverse polarisations)", () => {
      const [sector] = computeSpectrum(config("IIA", [stack("z", [])])).sectors;
      expect(sector?.nn).toBe(0);
      expect(sector?.dd).toBe(9);
      expect(sector?.massless[0]?.states).toBe("8");
      expect(sector?.massless[0]?.description).toContain("a non-dynamical A_0");
    });

    it("cautions about D8 and D9 and still computes them", () => {
      const d9 = computeSpectrum(config("IIB", [stack("f", axes(1, 9), { count: 32 })]));
      expect(d9.warnings[0]).toContain("D9");
      expect(d9.sectors[0]?.dd).toBe(0);
      expect(d9.sectors[0]?.chanPaton).toBe(1024); // N^2 = 32^2 states of the U(32) adjoint (common practice)
      expect(d9.sectors[0]?.massless[0]?.description).toBe(
        "vector with 8 polarisations (NN axes 1-9 less one light-cone direction)",
      );
      const d8 = computeSpectrum(config("IIA", [stack("w", axes(1, 8))]));
      expect(d8.warnings[0]).toContain("D8");
    });

    it("treats an antibrane with itself like a brane with itself", () => {
      const brane = computeSpectrum(config("IIA", [stack("a", [1, 2])]));
      const anti = computeSpectrum(config("IIA", [stack("a", [1, 2], { anti: true })]));
      expect(anti.sectors).toEqual(brane.sectors);
      expect(anti.supercharges).toBe(16); // an anti-D-brane alone is half-BPS too (Polchinski vol. 2, section 13.4, from memory)
    });

    it("keeps Chan-Paton totals exact for large counts", () => {
      const result = computeSpectrum(
        config("IIB", [stack("big", [1, 2, 3], { count: 10_000 }), stack("two", [1, 2, 3], { count: 2, position: { "9": 1 } })], {
          levels: 10,
        }),
      );
      const self = sectorOf(result.sectors, "big", "big");
      expect(self.chanPaton).toBe(100_000_000);
      for (const row of self.levels) {
        expect(row.withChanPaton).toBe((BigInt(row.states ?? "0") * 100_000_000n).toString());
      }
      const top = self.levels.at(-1);
      // The total outgrows 2^53, so it must stay exact as a BigInt string.
      expect(BigInt(top?.withChanPaton ?? "0") > BigInt(Number.MAX_SAFE_INTEGER)).toBe(true);
      const pair = sectorOf(result.sectors, "big", "two");
      expect(pair.chanPaton).toBe(40_000);
      for (const row of pair.levels) {
        expect(row.withChanPaton).toBe((BigInt(row.states ?? "0") * 40_000n).toString());
      }
    });

    it("warns about a non-critical bosonic dimension and uses a = -(D - 2)/24 (Polchinski vol. 1, section 1.3, from memory)", () => {
      const result = computeSpectrum(config("bosonic", [stack("a", [1, 2])], { dimension: 6, levels: 1 }));
      expect(result.warnings[0]).toContain("D = 6");
      expect(result.dimension).toBe(6);
      const [sector] = result.sectors;
      expect(sector?.zeroPoint.bosonic).toBe("-1/6");
      // D = 6: a = -4/24 = -1/6; level 1 has D - 2 = 4 states alpha_{-1}^i and is massive away from D = 26.
      expect(rowsOf(sector as Sector, "bosonic")).toEqual([
        ["-1/6", "1"],
        ["5/6", "4"],
      ]);
      expect(sector?.massless).toEqual([]);
    });

    it("counts a bosonic pair whose spatial axes are all ND covariantly, with a note and a warning", () => {
      const result = computeSpectrum(config("bosonic", [stack("point", []), stack("fill", axes(1, 25))]));
      const pair = sectorOf(result.sectors, "fill", "point");
      expect(pair.nu).toBe(25);
      expect(pair.notes[0]).toContain("counted covariantly");
      expect(result.warnings.some((warning) => warning.includes("Every spatial axis is ND"))).toBe(true);
    });

    it("lists the massless NS vector and R states at the mass cap levels = 0", () => {
      const [sector] = computeSpectrum(config("IIB", [stack("a", [1])], { levels: 0 })).sectors;
      expect(sector?.levels.map((row) => [row.sector, row.level])).toEqual([
        ["NS", "1/2"],
        ["R", "0"],
      ]);
      expect(sector?.massless.map((content) => content.sector)).toEqual(["NS", "R"]);
    });
  });
});

describe("tryComputeSpectrum", () => {
  it("returns the result computeSpectrum gives for a valid configuration, with no problems", () => {
    const valid = config("IIA", [stack("a", axes(1, 4)), stack("b", axes(1, 4), { anti: true, position: { "9": 2 } })]);
    const attempt = tryComputeSpectrum(valid);
    expect(attempt.problems).toEqual([]);
    expect(attempt.result).toEqual(computeSpectrum(valid));
  });

  it("returns every problem checkConfiguration finds instead of throwing, and no result", () => {
    const bad = config("IIA", [stack("a", [1]), stack("a", [1, 2])], { levels: 500 });
    const attempt = tryComputeSpectrum(bad);
    expect(attempt.result).toBeNull();
    expect(attempt.problems).toEqual(checkConfiguration(bad));
    expect(attempt.problems.length).toBeGreaterThan(1);
  });

  it("still throws a RangeError for an invalid lightestCount", () => {
    expect(() => tryComputeSpectrum(config("IIB", []), { lightestCount: 1.5 })).toThrow(RangeError);
  });
});
