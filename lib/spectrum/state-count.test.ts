import { describe, expect, it } from "vitest";
import { compareStateCounts, isSurviving, log10OfStateCount } from "./state-count";

describe("isSurviving", () => {
  it("is false only for a row the GSO projection emptied", () => {
    expect(isSurviving({ withChanPaton: "0" })).toBe(false);
    expect(isSurviving({ withChanPaton: "1" })).toBe(true);
    expect(isSurviving({ withChanPaton: "16" })).toBe(true);
  });
});

describe("compareStateCounts", () => {
  it("orders counts beyond 2^53 exactly", () => {
    // 2^53 + 1 and 2^53 are the same double; BigInt tells them apart.
    expect(compareStateCounts("9007199254740993", "9007199254740992")).toBe(1);
    expect(compareStateCounts("128", "1152")).toBe(-1);
    expect(compareStateCounts("8", "8")).toBe(0);
  });

  describe("edge cases", () => {
    it("sorts a missing or unreadable count first", () => {
      expect(compareStateCounts(null, "1")).toBe(-1);
      expect(compareStateCounts("1", null)).toBe(1);
      expect(compareStateCounts(null, null)).toBe(0);
      expect(compareStateCounts("12a", "0")).toBe(-1);
    });
  });
});

describe("log10OfStateCount", () => {
  it("matches Math.log10 where doubles are exact and counts digits beyond 2^53", () => {
    expect(log10OfStateCount("1000")).toBeCloseTo(3, 12);
    // 176256: bosonic level 5 at D = 26 (OEIS A005758).
    expect(log10OfStateCount("176256")).toBeCloseTo(Math.log10(176256), 12);
    // 10^40 has 41 digits.
    expect(log10OfStateCount(`1${"0".repeat(40)}`)).toBeCloseTo(40, 12);
  });

  describe("edge cases", () => {
    it("returns -Infinity for zero and NaN for non-digits", () => {
      expect(log10OfStateCount("0")).toBe(Number.NEGATIVE_INFINITY);
      expect(log10OfStateCount("12a")).toBeNaN();
    });
  });
});
