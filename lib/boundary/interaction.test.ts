import { describe, expect, it } from "vitest";
import { braneAntibraneSupergravity } from "./annulus";
import { computeSpectrum } from "./spectrum";
import { interactionCurve, interactionCurves, interactionPairs, interactionSampleCount } from "./interaction";
import type { Configuration } from "./types";

const d3 = (id: string, anti: boolean, y: number, count = 1) => ({ id, label: "", count, anti, worldvolume: [1, 2, 3], position: { "9": y } });
const document = (stacks: Configuration["stacks"], orientifolds?: Configuration["orientifolds"]): Configuration => ({
  format: 2,
  title: "pairs",
  theory: "IIB",
  stringScaleGeV: null,
  levels: 1,
  stacks,
  ...(orientifolds ? { orientifolds } : {}),
});

describe("interactionCurves", () => {
  it("a D3 and two anti-D3s far apart: the supergravity attraction times N_a N_b (Polchinski vol. 2, section 13.4, from memory)", () => {
    const configuration = document([d3("a", false, 0), d3("b", true, 30, 2)]);
    const [curve] = interactionCurves(configuration);
    expect(curve?.labels).toBe(2);
    expect(curve?.samples).toHaveLength(interactionSampleCount);
    expect(curve?.criticalSeparation).toBeCloseTo(Math.PI * Math.SQRT2, 12);
    expect((curve?.atSeparation ?? 0) / (2 * braneAntibraneSupergravity(3, 30))).toBeCloseTo(1, 9);
  });
  it("two D3 branes feel nothing (Jacobi's identity), and a stack with its image under a plane gets a curve at twice the distance", () => {
    const configuration = document([d3("a", false, 0), d3("b", false, 2)]);
    expect(interactionCurves(configuration)[0]?.vanishes).toBe(true);
    const withPlane = document([d3("a", false, 1.5)], [{ id: "o", type: "O-", worldvolume: [1, 2, 3, 4, 5], position: {} }]);
    const curves = interactionCurves(withPlane);
    // D3 with an O5: nu' = 2, so the image is an anti-D3 (common practice) and the pair attracts.
    expect(curves[0]?.pair).toEqual(["a", "a'"]);
    expect(curves[0]?.separation).toBeCloseTo(3, 12);
    expect(curves[0]?.sameOrientation).toBe(false);
    expect(curves[0]?.atSeparation).toBeNull();
  });
  it("lists the same pairs as the engine's sectors between different stacks that share a Dirichlet axis", () => {
    const configuration = document(
      [d3("a", false, 0.5), d3("b", true, 7, 2), { id: "c", label: "", count: 1, anti: false, worldvolume: [1, 2, 3, 4, 5, 6, 7], position: { "9": 2 } }],
      [{ id: "o", type: "O-", worldvolume: [1, 2, 3], position: {} }],
    );
    const separable = computeSpectrum(configuration).sectors.filter((sector) => sector.pair[0] !== sector.pair[1] && sector.dd > 0);
    expect(interactionCurves(configuration).map((curve) => curve.pair)).toEqual(separable.map((sector) => sector.pair));
  });
  it("gives nothing for the bosonic string (closed-string tachyon)", () => {
    const configuration: Configuration = { ...document([]), theory: "bosonic", stacks: [
      { id: "a", label: "", count: 1, anti: false, worldvolume: [1], position: {} },
      { id: "b", label: "", count: 1, anti: false, worldvolume: [1], position: { "2": 3 } },
    ] };
    expect(interactionCurves(configuration)).toEqual([]);
  });
});

describe("interactionPairs and interactionCurve", () => {
  const configuration = document(
    [d3("a", false, 0.5), d3("b", true, 7, 2), d3("c", false, 4), { id: "d", label: "", count: 1, anti: false, worldvolume: [1, 2, 3, 4, 5, 6, 7], position: { "9": 2 } }],
    [{ id: "o", type: "O-", worldvolume: [1, 2, 3], position: {} }],
  );

  it("lists the pairs of interactionCurves, in its order, with their shapes and no potential", () => {
    const pairs = interactionPairs(configuration);
    const curves = interactionCurves(configuration);
    expect(pairs.map((pair) => pair.pair)).toEqual(curves.map((curve) => curve.pair));
    expect(pairs[0]).not.toHaveProperty("samples");
    expect(pairs.map(({ nu, nn, dd, sameOrientation, labels, separation }) => ({ nu, nn, dd, sameOrientation, labels, separation }))).toEqual(
      curves.map(({ nu, nn, dd, sameOrientation, labels, separation }) => ({ nu, nn, dd, sameOrientation, labels, separation })),
    );
  });

  it("computes any one pair's curve alone exactly as interactionCurves does among all of them", () => {
    const curves = interactionCurves(configuration);
    interactionPairs(configuration).forEach((pair, index) => {
      expect(interactionCurve(pair)).toEqual(curves[index]);
    });
  });
});

describe("interactionPairs on a circle", () => {
  it("takes the nearest image's separation, as the pair's sector does (compact.ts, describeCompactPair)", () => {
    // Two D3s on x9 of radius 1 at 0.5 and 2 pi - 0.5: the nearest images are 1 apart, not 2 pi - 1.
    const configuration: Configuration = { ...document([d3("a", false, 0.5), d3("b", true, 2 * Math.PI - 0.5)]), compact: { "9": 1 } };
    const [pair] = interactionPairs(configuration);
    expect(pair?.separation).toBeCloseTo(1, 12);
    const sector = computeSpectrum(configuration).sectors.find((candidate) => candidate.pair.join() === "a,b");
    expect(pair?.separation).toBeCloseTo(sector?.separation ?? Number.NaN, 12);
  });
});

