import { describe, expect, it } from "vitest";
import { computeSpectrum } from "@/lib/boundary";
import type { Configuration, LevelRow, Sector } from "@/lib/boundary/types";
import { braneAntibranePair } from "@/lib/demo-configurations";
import { resultOverview } from "@/lib/spectrum";
import { degeneracyRows, massCurvePoints, massCurves } from "./plot-data";

function row(sector: LevelRow["sector"], level: string): LevelRow {
  return { sector, level, massSquared: "0", mass: 0, states: "1", withChanPaton: "1" };
}

function sector(pair: [string, string], separation: number, rows: Array<[string, string, string, "NS" | "R" | "bosonic"]>): Sector {
  return {
    pair,
    nn: 0,
    dd: 0,
    nu: 0,
    separation,
    chanPaton: 2,
    zeroPoint: {},
    tachyonic: false,
    criticalSeparation: null,
    supersymmetric: false,
    axes: [],
    levels: rows.map(([level, massSquared, withChanPaton, kind]) => ({
      sector: kind,
      level,
      massSquared,
      mass: null,
      states: withChanPaton,
      withChanPaton,
    })),
    massless: [],
    multiplet: null,
    notes: [],
  };
}

describe("massCurves", () => {
  it("takes N + a exactly from the lightest row and finds the brane-antibrane tachyon crossing", () => {
    // Brane-antibrane NS ground state: N + a = -1/2, y_c = pi sqrt(2) ~ 4.443 (Banks and Susskind 1995,
    // hep-th/9511194, from memory).
    const overview = resultOverview(computeSpectrum(braneAntibranePair));
    const curves = massCurves(overview.sectors.filter((s) => s.pair[0] !== s.pair[1]));
    expect(curves.map((curve) => curve.interceptText)).toEqual(["-1/2"]);
    expect(curves[0]?.intercept).toBe(-0.5);
    expect(curves[0]?.crossing).toBeCloseTo(Math.PI * Math.SQRT2, 12);
    expect(curves[0]?.sectors.map((s) => s.separation)).toEqual([1.5]);
  });

  it("never marks a crossing for separated parallel D3s, whose ground state is massless at every y", () => {
    // Issue seen in the browser: a rounded alpha' M^2 minus (y / 2 pi)^2 gave a tiny negative N + a
    // and a spurious y_c. Two parallel D3-branes: the NS ground state is projected out and the
    // lightest state is the stretched massless vector, N + a = 1/2 - 1/2 = 0 (physics.md, GSO).
    for (const y of [0.0123, 1, 7.77]) {
      const document: Configuration = {
        format: 1,
        title: "two D3",
        theory: "IIB",
        stringScaleGeV: null,
        levels: 1,
        stacks: [
          { id: "a", label: "", count: 1, anti: false, worldvolume: [1, 2, 3], position: {} },
          { id: "b", label: "", count: 1, anti: false, worldvolume: [1, 2, 3], position: { "9": y } },
        ],
      };
      const curves = massCurves(resultOverview(computeSpectrum(document)).sectors.filter((s) => s.pair[0] !== s.pair[1]));
      expect(curves.map((curve) => [curve.interceptText, curve.crossing])).toEqual([["0", null]]);
    }
  });

  it("shares one curve between sectors with the same N + a and skips sectors with no surviving row", () => {
    const curves = massCurves([
      { pair: ["a", "b"], separation: 1, zeroPoint: { NS: "-1/2" }, lightest: row("NS", "0") },
      { pair: ["a", "c"], separation: 2, zeroPoint: { NS: "-1/2" }, lightest: row("NS", "0") },
      { pair: ["b", "c"], separation: 3, zeroPoint: { NS: "0" }, lightest: row("NS", "1/2") },
      { pair: ["c", "d"], separation: 3, zeroPoint: { NS: "0" }, lightest: null },
    ]);
    expect(curves.map((curve) => [curve.interceptText, curve.sectors.length])).toEqual([
      ["-1/2", 2],
      ["1/2", 1],
    ]);
  });
});

describe("massCurvePoints", () => {
  it("samples (y / 2 pi)^2 + intercept from y = 0 to a range that shows the crossing", () => {
    const curves = massCurves([{ pair: ["a", "b"], separation: 1, zeroPoint: { NS: "-1/2" }, lightest: row("NS", "0") }]);
    const { yMax, rows } = massCurvePoints(curves, { samples: 5 });
    expect(yMax).toBeGreaterThan(Math.PI * Math.SQRT2);
    expect(rows).toHaveLength(5);
    expect(rows[0]).toEqual({ y: 0, "-1/2": -0.5 });
    expect(rows[4]!["-1/2"]).toBeCloseTo((yMax / (2 * Math.PI)) ** 2 - 0.5, 12);
  });
});

describe("degeneracyRows", () => {
  it("puts NS and R of the same level on one row, sorted by level", () => {
    const rows = degeneracyRows(
      sector(["a", "a"], 0, [
        ["1", "1", "128", "R"],
        ["1/2", "0", "8", "NS"],
        ["0", "0", "8", "R"],
        ["3/2", "1", "128", "NS"],
      ]),
    );
    expect(rows.map((r) => r.level)).toEqual([0, 0.5, 1, 1.5]);
    expect(rows[0]!.R).toBeCloseTo(Math.log10(8), 12);
    expect(rows[3]!.NS).toBeCloseTo(Math.log10(128), 12);
  });
});
