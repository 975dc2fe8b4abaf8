import { describe, expect, it } from "vitest";
import type { Configuration, LightestState } from "@/lib/boundary/types";
import { makeSector, makeSpectrumResult } from "@/tests/fixtures/spectrum-result-builders";
import { summarizeResult } from "./summary";

const document: Pick<Configuration, "stacks"> = {
  stacks: [
    { id: "a", label: "", count: 1, anti: false, worldvolume: [1, 2, 3], position: {} },
    { id: "b", label: "", count: 1, anti: true, worldvolume: [1, 2, 3], position: {} },
  ],
};

function lightest(massSquared: string): LightestState {
  return { pair: ["a", "b"], sector: "NS", level: "0", massSquared, mass: null, states: "1", withChanPaton: "2" };
}

describe("summarizeResult", () => {
  it("stores the stack count, the lightest alpha' M^2 as a double, the tachyon flag and the supercharges", () => {
    // Brane-antibrane at nu = 0: tachyon at -1/2 and no supersymmetry (physics.md, from memory).
    const result = makeSpectrumResult([makeSector(["a", "b"], { tachyonic: true })], { supercharges: 0, lightest: [lightest("-1/2")] });
    expect(summarizeResult(document, result)).toEqual({ stackCount: 2, lightestMassSquared: -0.5, tachyonic: true, supercharges: 0 });
  });

  it("reads decimal alpha' M^2 and keeps large values whole", () => {
    const result = makeSpectrumResult([makeSector(["a", "b"])], { lightest: [lightest("1230.4")] });
    expect(summarizeResult(document, result)).toMatchObject({ lightestMassSquared: 1230.4, tachyonic: false, supercharges: 8 });
  });

  it("calls a negative lightest state tachyonic even where no sector is flagged", () => {
    const result = makeSpectrumResult([makeSector(["a", "b"])], { lightest: [lightest("-0.443")] });
    expect(summarizeResult(document, result).tachyonic).toBe(true);
  });

  it("keeps null supercharges of the bosonic string", () => {
    const result = makeSpectrumResult([makeSector(["a", "b"])], { theory: "bosonic", dimension: 26, supercharges: null, lightest: [lightest("-1")] });
    expect(summarizeResult(document, result).supercharges).toBeNull();
  });

  describe("edge cases", () => {
    it("stores null when there is no lightest state or it cannot be read", () => {
      expect(summarizeResult(document, makeSpectrumResult([])).lightestMassSquared).toBeNull();
      expect(summarizeResult(document, makeSpectrumResult([], { lightest: [lightest("?")] })).lightestMassSquared).toBeNull();
    });
  });
});
