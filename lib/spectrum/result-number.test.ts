import { describe, expect, it } from "vitest";
import { compareResultNumbers, parseExactRational, parseResultNumber } from "./result-number";

describe("parseExactRational", () => {
  it("returns the normalised rational of exact text", () => {
    expect(parseExactRational("-1/2")).toEqual({ num: -1n, den: 2n });
    expect(parseExactRational("6/4")).toEqual({ num: 3n, den: 2n });
    expect(parseExactRational("3")).toEqual({ num: 3n, den: 1n });
  });

  it("returns null for decimal strings", () => {
    expect(parseExactRational("0.25")).toBeNull();
    expect(parseExactRational("1e-7")).toBeNull();
  });

  describe("edge cases", () => {
    it("returns null for other text and a zero denominator instead of throwing", () => {
      expect(parseExactRational("")).toBeNull();
      expect(parseExactRational("one half")).toBeNull();
      expect(parseExactRational("1/0")).toBeNull();
    });
  });
});

describe("parseResultNumber", () => {
  it("reads exact rationals", () => {
    expect(parseResultNumber("-1/2")).toBe(-0.5);
    expect(parseResultNumber("3/2")).toBe(1.5);
    expect(parseResultNumber("0")).toBe(0);
  });

  it("reads the engine's decimal strings, exponent forms included", () => {
    expect(parseResultNumber("0.310264088")).toBe(0.310264088);
    expect(parseResultNumber("-0.443")).toBe(-0.443);
    expect(parseResultNumber("1e-7")).toBe(1e-7);
    expect(parseResultNumber("2.5e+21")).toBe(2.5e21);
  });

  describe("edge cases", () => {
    it("returns NaN for text of another form", () => {
      expect(parseResultNumber("")).toBeNaN();
      expect(parseResultNumber("x")).toBeNaN();
      expect(parseResultNumber("1.2.3")).toBeNaN();
      expect(parseResultNumber("1/2/3")).toBeNaN();
      expect(parseResultNumber("Infinity")).toBeNaN();
    });
  });
});

describe("compareResultNumbers", () => {
  it("orders exact and decimal strings by value", () => {
    expect(["1", "-1/2", "0.25", "1/8"].sort(compareResultNumbers)).toEqual(["-1/2", "1/8", "0.25", "1"]);
  });

  it("treats an exact rational and its decimal as equal", () => {
    expect(compareResultNumbers("-1/2", "-0.5")).toBe(0);
  });

  describe("edge cases", () => {
    it("sorts unreadable text after every number", () => {
      expect(["x", "2", "-1"].sort(compareResultNumbers)).toEqual(["-1", "2", "x"]);
    });
  });
});
