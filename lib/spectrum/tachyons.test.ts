import { describe, expect, it } from "vitest";
import { makeSector, makeSpectrumResult } from "@/tests/fixtures/spectrum-result-builders";
import { isTachyonicState, tachyonicSectors } from "./tachyons";

describe("isTachyonicState", () => {
  it("is true exactly when alpha' M^2 < 0", () => {
    // Bosonic open-string ground state alpha' M^2 = -1 (physics.md, from memory).
    expect(isTachyonicState({ massSquared: "-1" })).toBe(true);
    expect(isTachyonicState({ massSquared: "-0.0001" })).toBe(true);
    expect(isTachyonicState({ massSquared: "0" })).toBe(false);
    expect(isTachyonicState({ massSquared: "1/2" })).toBe(false);
  });

  describe("edge cases", () => {
    it("does not call unreadable text a tachyon", () => {
      expect(isTachyonicState({ massSquared: "-x" })).toBe(false);
    });
  });
});

describe("tachyonicSectors", () => {
  it("lists the tachyonic sectors with their lightest state and critical separation", () => {
    // Brane-antibrane at nu = 0: NS ground state -1/2, y_c = pi sqrt(2) (physics.md, Banks and Susskind 1995, from memory).
    const tachyon = { sector: "NS" as const, level: "0", massSquared: "-1/2", mass: null, states: "1", withChanPaton: "2" };
    const result = makeSpectrumResult([
      makeSector(["a", "a"]),
      makeSector(["a", "b"], { tachyonic: true, separation: 1, criticalSeparation: Math.PI * Math.SQRT2, levels: [tachyon] }),
    ]);
    expect(tachyonicSectors(result)).toEqual([
      { pair: ["a", "b"], lightest: tachyon, separation: 1, criticalSeparation: Math.PI * Math.SQRT2 },
    ]);
  });

  it("is empty for a stable configuration", () => {
    expect(tachyonicSectors(makeSpectrumResult([makeSector(["a", "a"])]))).toEqual([]);
  });
});
