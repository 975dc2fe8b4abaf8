import { describe, expect, it } from "vitest";
import type { Sector } from "@/lib/boundary/types";
import { degeneracyRows, massCurvePoints, massCurves } from "./plot-data";

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
  it("recovers N + a from alpha' M^2 at the separation and finds the tachyon crossing", () => {
    // Brane-antibrane NS ground state: N + a = -1/2, y_c = pi sqrt(2) ~ 4.443 (physics.md, from memory).
    const y = 2;
    const massSquared = String((y / (2 * Math.PI)) ** 2 - 0.5);
    const [curve] = massCurves([sector(["a", "b"], y, [["0", massSquared, "2", "NS"]])]);
    expect(curve!.intercept).toBeCloseTo(-0.5, 10);
    expect(curve!.crossing).toBeCloseTo(Math.PI * Math.SQRT2, 10);
  });

  it("has no crossing for a sector that is never tachyonic, and skips emptied levels", () => {
    const [curve] = massCurves([sector(["a", "a"], 0, [["0", "-1/2", "0", "NS"], ["1/2", "0", "8", "NS"]])]);
    expect(curve).toMatchObject({ intercept: 0, crossing: null, label: "a\u2013a" });
  });
});

describe("massCurvePoints", () => {
  it("samples (y / 2 pi)^2 + intercept from y = 0 to a range that shows the crossing", () => {
    const curves = [{ key: "a|b", label: "a-b", intercept: -0.5, separation: 1, crossing: Math.PI * Math.SQRT2 }];
    const { yMax, rows } = massCurvePoints(curves, { samples: 5 });
    expect(yMax).toBeGreaterThan(Math.PI * Math.SQRT2);
    expect(rows).toHaveLength(5);
    expect(rows[0]).toEqual({ y: 0, "a|b": -0.5 });
    expect(rows[4]!["a|b"]).toBeCloseTo((yMax / (2 * Math.PI)) ** 2 - 0.5, 12);
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
