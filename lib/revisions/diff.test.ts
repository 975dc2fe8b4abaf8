import { describe, expect, it } from "vitest";
import type { Configuration } from "@/lib/boundary/types";
import { makeSector as sector, makeSpectrumResult as result } from "@/tests/fixtures/spectrum-result-builders";
import { diffConfigurations, diffSpectra } from "./diff";

const base: Configuration = {
  format: 1,
  title: "Probe near a wall",
  theory: "IIA",
  stringScaleGeV: null,
  levels: 4,
  stacks: [
    { id: "w", label: "wall", count: 1, anti: false, worldvolume: [1, 2, 3, 4, 5, 6, 7, 8], position: { "9": 0 } },
    { id: "p", label: "probe", count: 2, anti: false, worldvolume: [1, 2, 3, 4], position: { "9": 3.5 } },
  ],
};

describe("diffConfigurations", () => {
  it("reports nothing for identical documents", () => {
    const diff = diffConfigurations(base, structuredClone(base));
    expect(diff.identical).toBe(true);
    expect(diff.fields).toEqual([]);
    expect(diff.changed).toEqual([]);
  });

  it("lists changed top-level fields", () => {
    const diff = diffConfigurations(base, { ...base, title: "Moved probe", levels: 6 });
    expect(diff.fields).toEqual([
      { field: "title", before: "Probe near a wall", after: "Moved probe" },
      { field: "levels", before: 4, after: 6 },
    ]);
    expect(diff.identical).toBe(false);
  });

  it("lists stacks added and removed by id", () => {
    const extra = { id: "q", label: "second probe", count: 1, anti: false, worldvolume: [1, 2], position: {} };
    const diff = diffConfigurations(base, { ...base, stacks: [base.stacks[1]!, extra] });
    expect(diff.added.map((s) => s.id)).toEqual(["q"]);
    expect(diff.removed.map((s) => s.id)).toEqual(["w"]);
    expect(diff.changed).toEqual([]);
  });

  it("reports boundary flips per axis, moved positions, count and orientation", () => {
    const probe = base.stacks[1]!;
    const moved = { ...probe, count: 3, anti: true, worldvolume: [1, 2, 3, 5], position: { "9": 1.5 } };
    const diff = diffConfigurations(base, { ...base, stacks: [base.stacks[0]!, moved] });
    expect(diff.changed).toHaveLength(1);
    const change = diff.changed[0]!;
    expect(change.id).toBe("p");
    expect(change.count).toEqual({ before: 2, after: 3 });
    expect(change.anti).toEqual({ before: false, after: true });
    expect(change.label).toBeNull();
    expect(change.boundaries).toEqual([
      { axis: 4, before: "N", after: "D" },
      { axis: 5, before: "D", after: "N" },
    ]);
    expect(change.positions).toEqual([{ axis: 9, before: 3.5, after: 1.5 }]);
  });

  it("does not mutate its inputs", () => {
    const a = structuredClone(base);
    const b = { ...structuredClone(base), title: "x" };
    const snapshotA = JSON.stringify(a);
    const snapshotB = JSON.stringify(b);
    diffConfigurations(a, b);
    expect(JSON.stringify(a)).toBe(snapshotA);
    expect(JSON.stringify(b)).toBe(snapshotB);
  });

  describe("edge cases", () => {
    it("treats a missing Dirichlet position as 0 (file format rule)", () => {
      const wall = base.stacks[0]!;
      const explicitZero = { ...wall, position: { "9": 0 } };
      const implicitZero = { ...wall, position: {} };
      const diff = diffConfigurations(
        { ...base, stacks: [explicitZero] },
        { ...base, stacks: [implicitZero] },
      );
      expect(diff.identical).toBe(true);
    });

    it("ignores position keys on Neumann axes", () => {
      const wall = base.stacks[0]!;
      const diff = diffConfigurations(
        { ...base, stacks: [{ ...wall, position: { "9": 0, "1": 5 } }] },
        { ...base, stacks: [{ ...wall, position: { "9": 0, "1": 7 } }] },
      );
      expect(diff.identical).toBe(true);
    });

    it("compares axes up to the larger dimension when the theory changes", () => {
      const point = { id: "x", label: "", count: 1, anti: false, worldvolume: [], position: {} };
      const wide = { ...point, worldvolume: [20] };
      const diff = diffConfigurations(
        { ...base, theory: "bosonic", stacks: [wide] },
        { ...base, theory: "IIA", stacks: [point] },
      );
      expect(diff.fields.map((f) => f.field)).toEqual(["theory", "dimension"]);
      expect(diff.changed[0]!.boundaries).toEqual([{ axis: 20, before: "N", after: "D" }]);
    });
  });
});

describe("diffSpectra", () => {
  it("reports nothing for identical results", () => {
    const r = result([sector(["w", "w"]), sector(["w", "p"])]);
    expect(diffSpectra(r, structuredClone(r)).identical).toBe(true);
  });

  it("finds a sector whose lightest state, tachyon status and supersymmetry changed", () => {
    const before = result([sector(["w", "p"])]);
    const tachyonic = sector(["p", "w"], {
      tachyonic: true,
      supersymmetric: false,
      levels: [{ sector: "NS", level: "0", massSquared: "-1/2", mass: null, states: "1", withChanPaton: "4" }],
    });
    const diff = diffSpectra(before, result([tachyonic], { bps: false, supercharges: 0 }));
    expect(diff.changedSectors).toEqual([
      {
        pair: ["p", "w"],
        lightest: {
          before: { sector: "NS", level: "0", massSquared: "0" },
          after: { sector: "NS", level: "0", massSquared: "-1/2" },
        },
        tachyonic: { before: false, after: true },
        supersymmetric: { before: true, after: false },
      },
    ]);
    expect(diff.bps).toEqual({ before: true, after: false });
    expect(diff.supercharges).toEqual({ before: 8, after: 0 });
    expect(diff.gaugeGroup).toBeNull();
  });

  it("lists sectors added and removed", () => {
    const before = result([sector(["w", "w"]), sector(["w", "p"])]);
    const after = result([sector(["w", "w"]), sector(["w", "q"])], { gaugeGroup: "U(1) x U(1)" });
    const diff = diffSpectra(before, after);
    expect(diff.addedSectors).toEqual([["w", "q"]]);
    expect(diff.removedSectors).toEqual([["w", "p"]]);
    expect(diff.gaugeGroup).toEqual({ before: "U(1) x U(2)", after: "U(1) x U(1)" });
  });

  describe("edge cases", () => {
    it("compares masses numerically, so an exact and a decimal form of one value agree", () => {
      const exact = sector(["w", "p"], {
        levels: [{ sector: "NS", level: "0", massSquared: "-1/2", mass: null, states: "1", withChanPaton: "4" }],
      });
      const decimal = sector(["w", "p"], {
        levels: [{ sector: "NS", level: "0", massSquared: "-0.5", mass: null, states: "1", withChanPaton: "4" }],
      });
      expect(diffSpectra(result([exact]), result([decimal])).identical).toBe(true);
    });

    it("skips rows with no surviving states when finding the lightest", () => {
      const projected = sector(["w", "p"], {
        levels: [
          { sector: "NS", level: "0", massSquared: "-1/2", mass: null, states: "0", withChanPaton: "0" },
          { sector: "NS", level: "1/2", massSquared: "0", mass: 0, states: "8", withChanPaton: "16" },
        ],
      });
      const diff = diffSpectra(result([sector(["w", "p"])]), result([projected]));
      expect(diff.changedSectors).toEqual([]);
    });
  });
});
