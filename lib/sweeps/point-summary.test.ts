import { describe, expect, it } from "vitest";
import { computeSpectrum } from "../boundary";
import { countMasslessStates } from "../spectrum/massless-count";
import { computeSweepPoint, pointVerdict, summarizeSweepPoint } from "./point-summary";
import { braneAntibraneAtOrigin, twoThreeBranes } from "./test-configurations";
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
