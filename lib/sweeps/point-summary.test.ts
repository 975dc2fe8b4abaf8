import { describe, expect, it } from "vitest";
import { computeSpectrum, tryComputeSpectrum } from "../boundary";
import { countMasslessStates } from "../spectrum/massless-count";
import { computeSweepPoint, pointVerdict, summarizeSweepPoint } from "./point-summary";
import { parseResultNumber } from "../spectrum/result-number";
import { braneAntibraneAtOrigin, stringAlongNine, twoThreeBranes } from "./test-configurations";
import type { Configuration } from "../boundary/types";
import type { SweepDefinition } from "./types";

describe("computeSweepPoint", () => {
  it("finds the brane-antibrane tachyon below y_c = pi sqrt(2) and none beyond", () => {
    // Banks and Susskind (1995), from memory: the NS ground state at alpha' M^2 = -1/2 + (y / 2 pi)^2
    // is tachyonic for y < pi sqrt(2) ~ 4.443 (physics.md, "Public check values").
    const definition: SweepDefinition = { format: 1, dimensions: [{ kind: "position", stack: "b", axis: 9, values: { kind: "range", from: 0, to: 8, steps: 9 } }] };
    const outcomes = Array.from({ length: 9 }, (_u, i) => computeSweepPoint(braneAntibraneAtOrigin, definition, i));
    expect(outcomes.map((outcome) => pointVerdict(outcome))).toEqual([...Array<string>(5).fill("tachyonic"), ...Array<string>(4).fill("neither")]);
    const first = outcomes[0];
    expect(first?.status === "ok" ? first.lightestMassSquared : null).toBe(-0.5);
    const y = 3;
    const third = outcomes[y];
    expect(third?.status === "ok" ? third.lightestMassSquared : null).toBeCloseTo(-0.5 + (y / (2 * Math.PI)) ** 2, 10);
  });

  it("keeps 16 supercharges for two parallel D3 stacks and counts their massless states", () => {
    // Common practice: parallel Dp stacks of one orientation preserve 16 supercharges (physics.md).
    const definition: SweepDefinition = { format: 1, dimensions: [{ kind: "position", stack: "q", axis: 9, values: { kind: "list", values: [0] } }] };
    const outcome = computeSweepPoint(twoThreeBranes, definition, 0);
    // Coincident stacks of 2 and 1 branes (x8 differs, so not coincident: q sits at x8 = 0.5).
    // The aa sectors give 8 NS + 8 R massless states per Chan-Paton label (GSW vol. 1, from memory):
    // 16 x (2^2 + 1^2) = 80; the separated pq strings are massive.
    expect(outcome).toMatchObject({ status: "ok", supercharges: 16, tachyonicSectors: 0, masslessStates: "80", gaugeGroup: "U(2) x U(1)" });
    expect(pointVerdict(outcome)).toBe("supersymmetric");
  });

  it("stores a configuration the engine refuses as invalid, with its reason", () => {
    // Making "a" Neumann on x5 turns the D4 into a D5, which IIA forbids.
    const definition: SweepDefinition = { format: 1, dimensions: [{ kind: "boundary", stacks: ["a"], axes: [5], symmetry: "all" }] };
    const outcome = computeSweepPoint(braneAntibraneAtOrigin, definition, 1);
    expect(outcome.status).toBe("invalid");
    expect(outcome.status === "invalid" ? outcome.problem : "").toMatch(/D5 brane, but IIA allows only even p/);
    expect(pointVerdict(outcome)).toBe("invalid");
  });
});

describe("summarizeSweepPoint", () => {
  it("reads the same massless count as countMasslessStates and the engine's own flags", () => {
    const result = computeSpectrum(braneAntibraneAtOrigin);
    const summary = summarizeSweepPoint(result);
    expect(summary).toEqual({
      status: "ok",
      supercharges: result.supercharges,
      tachyonicSectors: result.sectors.filter((sector) => sector.tachyonic).length,
      lightestMassSquared: -0.5,
      masslessStates: countMasslessStates(result),
      gaugeGroup: result.gaugeGroup,
    });
  });
});

describe("pointVerdict", () => {
  it("puts tachyons before supersymmetry", () => {
    expect(pointVerdict({ status: "ok", supercharges: 8, tachyonicSectors: 1 })).toBe("tachyonic");
    expect(pointVerdict({ status: "ok", supercharges: 0, tachyonicSectors: 0 })).toBe("neither");
    expect(pointVerdict({ status: "ok", supercharges: null, tachyonicSectors: 0 })).toBe("neither");
  });
});

describe("computeSweepPoint over a radius dimension", () => {
  // Radii above 1, so the first momentum state 1/R^2 lies below the first oscillator level (cap 1).
  const radii = [1.25, 2, 2.5, 4];
  const definition: SweepDefinition = { format: 1, dimensions: [{ kind: "radius", axis: 9, values: { kind: "list", values: radii } }] };
  const byHand = (radius: number): Configuration => ({ ...stringAlongNine, format: 2, compact: { "9": radius } });

  it("gives the engine's own result for the D1 wrapped on the circle of each radius", () => {
    radii.forEach((radius, index) => {
      expect(computeSweepPoint(stringAlongNine, definition, index)).toEqual(summarizeSweepPoint(computeSpectrum(byHand(radius), { lightestCount: 1 })));
    });
  });

  it("keeps the massless content of the wrapped D1 at every radius and moves its momentum states as n^2 / R^2", () => {
    const outcomes = radii.map((_radius, index) => computeSweepPoint(stringAlongNine, definition, index));
    // Common practice: one D1 in IIB keeps 16 supercharges, with 8 NS + 8 R massless states
    // (the n = 0 states of the tower), whatever the radius it wraps.
    for (const outcome of outcomes) {
      expect(outcome).toMatchObject({ status: "ok", supercharges: 16, tachyonicSectors: 0, lightestMassSquared: 0, masslessStates: "16", gaugeGroup: "U(1)" });
    }
    radii.forEach((radius) => {
      // Open strings on a circle of radius R along a Neumann axis carry momentum n / R, so
      // alpha' M^2 = N + a + n^2 / R^2 (Polchinski vol. 1, section 8.6, from memory).
      const tower = computeSpectrum(byHand(radius)).sectors[0]?.tower ?? [];
      const massive = tower.filter((row) => parseResultNumber(row.massSquared) > 0);
      const first = massive[0];
      expect(Math.abs(first?.momentum["9"] ?? 0)).toBe(1);
      expect(parseResultNumber(first?.massSquared ?? "NaN")).toBeCloseTo(1 / radius ** 2, 12);
      const second = massive.find((row) => Math.abs(row.momentum["9"] ?? 0) === 2 && row.level === first?.level);
      if (4 / radius ** 2 <= stringAlongNine.levels) expect(parseResultNumber(second?.massSquared ?? "NaN")).toBeCloseTo(4 / radius ** 2, 12);
    });
  });

  it("stores a point whose base has an orientifold plane as invalid, since planes take non-compact axes only", () => {
    const withPlane: Configuration = {
      ...twoThreeBranes,
      format: 2,
      orientifolds: [{ id: "o", type: "O-", worldvolume: [1, 2, 3], position: {} }],
    };
    const radius: SweepDefinition = { format: 1, dimensions: [{ kind: "radius", axis: 5, values: { kind: "list", values: [1] } }] };
    expect(tryComputeSpectrum(withPlane).problems).toEqual([]);
    const outcome = computeSweepPoint(withPlane, radius, 0);
    expect(outcome.status).toBe("invalid");
    expect(outcome.status === "invalid" ? outcome.problem : "").toMatch(/Orientifold planes are computed on non-compact axes only/);
  });
});
