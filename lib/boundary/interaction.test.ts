import { describe, expect, it } from "vitest";
import { braneAntibraneSupergravity } from "./annulus";
import { interactionCurves, interactionSampleCount } from "./interaction";
import { computeSpectrum } from "./spectrum";
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
    const [curve] = interactionCurves(configuration, computeSpectrum(configuration));
    expect(curve?.labels).toBe(2);
    expect(curve?.samples).toHaveLength(interactionSampleCount);
    expect(curve?.criticalSeparation).toBeCloseTo(Math.PI * Math.SQRT2, 12);
    expect((curve?.atSeparation ?? 0) / (2 * braneAntibraneSupergravity(3, 30))).toBeCloseTo(1, 9);
  });
  it("two D3 branes feel nothing (Jacobi's identity), and a stack with its image under a plane gets a curve at twice the distance", () => {
    const configuration = document([d3("a", false, 0), d3("b", false, 2)]);
    expect(interactionCurves(configuration, computeSpectrum(configuration))[0]?.vanishes).toBe(true);
    const withPlane = document([d3("a", false, 1.5)], [{ id: "o", type: "O-", worldvolume: [1, 2, 3, 4, 5], position: {} }]);
    const curves = interactionCurves(withPlane, computeSpectrum(withPlane));
    // D3 with an O5: nu' = 2, so the image is an anti-D3 (common practice) and the pair attracts.
    expect(curves[0]?.pair).toEqual(["a", "a'"]);
    expect(curves[0]?.separation).toBeCloseTo(3, 12);
    expect(curves[0]?.sameOrientation).toBe(false);
    expect(curves[0]?.atSeparation).toBeNull();
  });
  it("gives nothing for the bosonic string (closed-string tachyon)", () => {
    const configuration: Configuration = { ...document([]), theory: "bosonic", stacks: [
      { id: "a", label: "", count: 1, anti: false, worldvolume: [1], position: {} },
      { id: "b", label: "", count: 1, anti: false, worldvolume: [1], position: { "2": 3 } },
    ] };
    expect(interactionCurves(configuration, computeSpectrum(configuration))).toEqual([]);
  });
});
