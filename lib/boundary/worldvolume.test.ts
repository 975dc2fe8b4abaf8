import { describe, expect, it } from "vitest";
import { computeSpectrum } from "./spectrum";
import type { Configuration, Stack, WorldvolumeTheory } from "./types";

const axes = (from: number, to: number): number[] => Array.from({ length: to - from + 1 }, (_, i) => from + i);

function stack(id: string, worldvolume: number[], extra: Partial<Stack> = {}): Stack {
  return { id, label: "", count: 1, anti: false, worldvolume, position: {}, ...extra };
}

function config(theory: Configuration["theory"], stacks: Stack[], extra: Partial<Configuration> = {}): Configuration {
  return { format: 1, title: "worldvolumes", theory, stringScaleGeV: null, levels: 1, stacks, ...extra };
}

function worldvolumeOf(configuration: Configuration, first: string): WorldvolumeTheory {
  const found = computeSpectrum(configuration).worldvolumes.find((entry) => entry.stacks[0] === first);
  if (!found) throw new Error(`no worldvolume starting with ${first}`);
  return found;
}

describe("worldvolumes of computeSpectrum", () => {
  describe("D3-D7 (IIB)", () => {
    const system = config("IIB", [stack("d3", [1, 2, 3], { count: 2 }), stack("d7", axes(1, 7))]);

    it("gives the D3s a 4d N=2 U(2) theory with one fundamental hypermultiplet and U(1) flavour, not U(2) x U(1) gauge", () => {
      // D3 probes of a D7: 4d N=2 U(N) with N_7 fundamental hypermultiplets from the 3-7 strings and U(N_7)
      // flavour symmetry, the D7 group being global because its coupling is diluted over the four extra
      // non-compact directions (common practice; Polchinski vol. 2, section 13.4 for the nu = 4 hypermultiplet, from memory).
      const d3 = worldvolumeOf(system, "d3");
      expect(d3.summary).toBe("4d: U(2), one fundamental hypermultiplet; U(1) flavour");
      expect(d3.supersymmetry).toBe("4d N=2");
      expect(d3.supercharges).toBe(8);
      expect(d3.flavour).toEqual([{ stacks: ["d7"], group: "U(1)", dimension: 8 }]);
      expect(d3.matter).toEqual([
        { stacks: ["d7"], nu: 4, role: "flavour", description: "one fundamental hypermultiplet", massSquared: "0" },
      ]);
    });

    it("gives the D7 an 8d theory with 16 supercharges and the D3s as a 4d defect", () => {
      // One D7 alone preserves half of the 32 supercharges: 8d N=1 counts 16 (common practice, from memory).
      const d7 = worldvolumeOf(system, "d7");
      expect(d7.summary).toBe('8d: U(1); 4d defect with "d3"');
      expect(d7.supersymmetry).toBe("8d N=1");
      expect(d7.flavour).toEqual([]);
    });

    it("counts one hypermultiplet per D7 brane and gives it the mass y / (2 pi) when the D3s sit off the D7", () => {
      // Separating along a transverse DD axis gives the quark mass M = y / (2 pi alpha') (physics.md mass formula).
      const y = Math.PI;
      const d3 = worldvolumeOf(
        config("IIB", [stack("d3", [1, 2, 3], { position: { "8": y } }), stack("d7", axes(1, 7), { count: 3 })]),
        "d3",
      );
      expect(d3.summary).toBe("4d: U(1), 3 fundamental hypermultiplets of mass M sqrt(alpha') = 0.5; U(3) flavour");
      expect(Number(d3.matter[0]?.massSquared)).toBeCloseTo(0.25, 12);
    });

    it("lowers the supersymmetry to 4d N=1 with a second D7 along other axes (every flavour stack counts)", () => {
      // D3 with D7s along 4567 and 4589: each halves, and together they leave 4 supercharges, 4d N=1
      // (the constraints Gamma^{4567} = 1 and Gamma^{4589} = 1 commute and are independent; common practice).
      const d3 = worldvolumeOf(
        config("IIB", [stack("d3", [1, 2, 3]), stack("e", [1, 2, 3, 4, 5, 6, 7]), stack("f", [1, 2, 3, 4, 5, 8, 9])]),
        "d3",
      );
      expect(d3.supercharges).toBe(4);
      expect(d3.supersymmetry).toBe("4d N=1");
      expect(d3.flavour.map((group) => group.stacks)).toEqual([["e"], ["f"]]);
      expect(d3.matter.map((matter) => matter.description)).toEqual([
        "one fundamental hypermultiplet (a multiplet of the 8 supercharges of this pair)",
        "one fundamental hypermultiplet (a multiplet of the 8 supercharges of this pair)",
      ]);
    });
  });

  describe("D1-D5 and D1-D9 (IIB)", () => {
    it("gives D1-D5 a 2d (4,4) theory with N_5 fundamental hypermultiplets, and the D5s 6d (1,1)", () => {
      // The D1-D5 system: (4,4) supersymmetry on the strings' 1+1-dimensional worldsheet (common practice;
      // Strominger and Vafa 1996, from memory); a lone D5 of IIB carries 6d (1,1) (common practice).
      const system = config("IIB", [stack("d1", [1], { count: 3 }), stack("d5", axes(1, 5), { count: 2 })]);
      const d1 = worldvolumeOf(system, "d1");
      expect(d1.supersymmetry).toBe("2d (4,4)");
      expect(d1.chirality).toEqual({ positive: 4, negative: 4 });
      expect(d1.summary).toBe("2d: U(3), 2 fundamental hypermultiplets; U(2) flavour");
      const d5 = worldvolumeOf(system, "d5");
      expect(d5.supersymmetry).toBe("6d (1,1)");
      expect(d5.chirality).toEqual({ positive: 8, negative: 8 });
    });

    it("gives D1-D9 a chiral 2d theory whose handedness follows the orientation, with a chiral fermion", () => {
      // A D1 inside D9s keeps 8 supercharges of one worldsheet chirality, and the 1-9 strings give chiral
      // fermions (the type I D-string: Polchinski and Witten 1996, from memory).
      const brane = worldvolumeOf(config("IIB", [stack("d1", [1]), stack("d9", axes(1, 9))]), "d1");
      expect(brane.chirality).toEqual({ positive: 8, negative: 0 });
      expect(brane.supersymmetry).toBe("2d (8,0)");
      expect(brane.summary).toBe("2d: U(1), one fundamental chiral fermion in 1+1 dimensions; U(1) flavour");
      const anti = worldvolumeOf(config("IIB", [stack("d1", [1]), stack("d9", axes(1, 9), { anti: true })]), "d1");
      expect(anti.supersymmetry).toBe("2d (0,8)");
    });

    it("gives D5-D9 a chiral 6d (1,0) theory", () => {
      // D5s inside D9s: 6d (1,0) with 8 supercharges (type I small instantons; Witten 1996, from memory).
      const d5 = worldvolumeOf(config("IIB", [stack("d5", axes(1, 5)), stack("d9", axes(1, 9))]), "d5");
      expect(d5.supersymmetry).toBe("6d (1,0)");
      expect(d5.summary).toBe("6d: U(1), one fundamental hypermultiplet; U(1) flavour");
    });
  });

  describe("D0-D4 and D0-D8 (IIA)", () => {
    it("gives D0-D4 a 1d N=4 (8 real supercharges) theory with a hypermultiplet, and the D4 a 5d theory with a 1d defect", () => {
      // 8 real supercharges in 0+1 dimensions, counted as complex ones: N=4 (common practice, from memory).
      const system = config("IIA", [stack("d4", axes(1, 4)), stack("d0", [])]);
      const d0 = worldvolumeOf(system, "d0");
      expect(d0.summary).toBe("1d: U(1), one fundamental hypermultiplet; U(1) flavour");
      expect(d0.supersymmetry).toBe("1d N=4");
      // A lone D4: 16 supercharges, 5d N=2 (common practice).
      expect(worldvolumeOf(system, "d4").supersymmetry).toBe("5d N=2");
      expect(worldvolumeOf(system, "d4").defects).toEqual([{ stacks: ["d0"], dimension: 1 }]);
    });

    it("describes the D0 content as 9 adjoint scalars, a non-dynamical A_0 and 16 real fermions", () => {
      // The D0 theory is the dimensional reduction of 10d super Yang-Mills to 0+1 (common practice, from memory).
      expect(worldvolumeOf(config("IIA", [stack("d0", [])]), "d0").content).toBe(
        "9 adjoint scalars (positions), a non-dynamical A_0 and 16 real fermions",
      );
      // 16 supercharges in 0+1 dimensions: 1d N=8 (common practice).
      expect(worldvolumeOf(config("IIA", [stack("d0", [])]), "d0").supersymmetry).toBe("1d N=8");
    });

    it("calls the D0-D8 mode a fermionic mode in 0+1 dimensions and ties its supersymmetry to the created string", () => {
      // Bachas, Green and Schwimmer 1997; Danielsson, Ferretti and Klebanov 1997 (string creation, from memory).
      const d0 = worldvolumeOf(config("IIA", [stack("d8", axes(1, 8)), stack("d0", [], { position: { "9": 1.5 } })]), "d0");
      expect(d0.matter[0]?.description).toMatch(/^one fundamental fermionic mode in 0\+1 dimensions/);
      expect(d0.matter[0]?.description).not.toContain("chiral");
      expect(d0.supersymmetry).toBe('1d N=4, with a fundamental string stretched to "d8"');
    });
  });

  describe("coincident and parallel stacks", () => {
    it("merges coincident stacks of one orientation into U(N_a + N_b) and names the W-boson multiplet to a third one", () => {
      // physics.md, Chan-Paton factors: coincident stacks enhance; separated ones give massive W bosons.
      const result = computeSpectrum(
        config("IIB", [stack("x", [1, 2, 3], { count: 2 }), stack("y", [1, 2, 3]), stack("w", [1, 2, 3], { position: { "6": 2 * Math.PI } })]),
      );
      expect(result.gaugeGroup).toBe("U(3) x U(1)");
      const merged = result.worldvolumes.find((entry) => entry.stacks.includes("x"));
      expect(merged?.stacks).toEqual(["x", "y"]);
      expect(merged?.summary).toBe('4d: U(3), a massive W-boson multiplet in the bifundamental of U(3) x U(1) of mass M sqrt(alpha\') = 1 (with "w")');
      // Parallel stacks of one orientation keep 16 supercharges: 4d N=4 (common practice).
      expect(merged?.supersymmetry).toBe("4d N=4");
    });

    it("keeps a brane and an antibrane apart and reports the bifundamental tachyon and no supersymmetry", () => {
      // Brane-antibrane: NS ground state alpha' M^2 = -1/2 kept by the GSO projection (Banks and Susskind 1995, from memory).
      const result = computeSpectrum(config("IIB", [stack("a", [1, 2, 3]), stack("b", [1, 2, 3], { anti: true })]));
      expect(result.worldvolumes).toHaveLength(2);
      const a = result.worldvolumes[0];
      expect(a?.summary).toBe('4d: U(1), strings in the bifundamental of U(1) x U(1) with a tachyon at alpha\' M^2 = -1/2 (with "b")');
      expect(a?.supersymmetry).toBe("no supersymmetry");
    });

    it("describes a bosonic D3 with its 22 position scalars and the tachyon, without supersymmetry", () => {
      // Bosonic D = 26: a = -1 and 25 - 3 = 22 transverse positions (physics.md; Polchinski vol. 1, section 8.7, from memory).
      const d3 = worldvolumeOf(config("bosonic", [stack("d3", [1, 2, 3])]), "d3");
      expect(d3.content).toBe("a gauge field (2 polarisations) and 22 adjoint scalars, with an adjoint tachyon at alpha' M^2 = -1");
      expect(d3.supercharges).toBeNull();
      expect(d3.supersymmetry).toBe("no supersymmetry (bosonic string)");
    });
  });

  describe("edge cases", () => {
    it("lists no worldvolume and the gauge group none without stacks", () => {
      const result = computeSpectrum(config("IIA", []));
      expect(result.worldvolumes).toEqual([]);
      expect(result.gaugeGroup).toBe("none");
    });

    it("lists a defect only where the stacks meet, and names at most four matter entries in the summary", () => {
      // A D0 off a D8 (y = 1.5) does not sit on it: no defect of the D8 (physics.md: y is the DD separation).
      expect(worldvolumeOf(config("IIA", [stack("d8", axes(1, 8)), stack("d0", [], { position: { "9": 1.5 } })]), "d8").defects).toEqual([]);
      const walls = Array.from({ length: 6 }, (_, i) => stack(`w${i}`, [1, 2, 3, 4, 5, 6, 7], { position: { "8": i + 1 } }));
      const d3 = worldvolumeOf(config("IIB", [stack("d3", [1, 2, 3]), ...walls]), "d3");
      expect(d3.matter).toHaveLength(6);
      expect(d3.summary).toContain("and 2 more matter");
    });

    it("does not depend on the order of the stacks", () => {
      const stacks = [stack("d3", [1, 2, 3], { count: 2 }), stack("d7", axes(1, 7)), stack("p", [1, 2, 3], { position: { "8": 1 } })];
      const forward = computeSpectrum(config("IIB", stacks)).worldvolumes;
      expect(computeSpectrum(config("IIB", [...stacks].reverse())).worldvolumes).toEqual(forward);
    });
  });
});
