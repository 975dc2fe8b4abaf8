import { describe, expect, it } from "vitest";
import { displaySignificantDigits, formatEngineProse, formatMassSquared, formatNumber } from "./format";

const minus = "\u2212";

describe("formatNumber", () => {
  it("keeps four significant digits", () => {
    expect(displaySignificantDigits).toBe(4);
    // y_c = pi sqrt(2) ~ 4.443 for a brane-antibrane pair (physics.md, Banks and Susskind 1995, from memory).
    expect(formatNumber(Math.PI * Math.SQRT2)).toBe("4.443");
    expect(formatNumber(0.310264088)).toBe("0.3103");
  });

  it("drops only the zeros after the decimal point", () => {
    expect(formatNumber(1230.4)).toBe("1230");
    expect(formatNumber(1000.2)).toBe("1000");
    expect(formatNumber(120)).toBe("120");
    expect(formatNumber(3.5)).toBe("3.5");
    expect(formatNumber(2.00004)).toBe("2");
  });

  it("writes a true minus sign", () => {
    expect(formatNumber(-0.5)).toBe(`${minus}0.5`);
    expect(formatNumber(-1230.4)).toBe(`${minus}1230`);
  });

  it("switches to an exponent below 1e-4 and from 1e6", () => {
    expect(formatNumber(2.5330295911e10)).toBe("2.533e10");
    expect(formatNumber(1e6)).toBe("1e6");
    expect(formatNumber(999_999)).toBe("1000000");
    expect(formatNumber(-1.5e-7)).toBe(`${minus}1.5e${minus}7`);
    expect(formatNumber(0.0001234)).toBe("0.0001234");
  });

  it("takes another number of significant digits", () => {
    expect(formatNumber(Math.PI, { significantDigits: 3 })).toBe("3.14");
    expect(formatNumber(1230.4, { significantDigits: 6 })).toBe("1230.4");
  });

  describe("edge cases", () => {
    it("shows zero and negative zero as 0", () => {
      expect(formatNumber(0)).toBe("0");
      expect(formatNumber(-0)).toBe("0");
    });

    it("shows an em dash where there is no number", () => {
      expect(formatNumber(null)).toBe("\u2014");
      expect(formatNumber(Number.NaN)).toBe("\u2014");
      expect(formatNumber(Number.POSITIVE_INFINITY)).toBe("\u2014");
    });

    it("throws a RangeError for an impossible number of digits", () => {
      expect(() => formatNumber(1, { significantDigits: 0 })).toThrow(RangeError);
    });
  });
});

describe("formatMassSquared", () => {
  it("keeps exact rationals exact, with a true minus sign", () => {
    // NS ground state of a brane-antibrane pair: alpha' M^2 = -1/2 (physics.md, from memory).
    expect(formatMassSquared("-1/2")).toBe(`${minus}1/2`);
    expect(formatMassSquared("3/2")).toBe("3/2");
    expect(formatMassSquared("-1")).toBe(`${minus}1`);
    expect(formatMassSquared("0")).toBe("0");
  });

  it("rounds the engine's decimal strings", () => {
    expect(formatMassSquared("0.310264088")).toBe("0.3103");
    expect(formatMassSquared("-0.189735912")).toBe(`${minus}0.1897`);
    expect(formatMassSquared("1230.40000001")).toBe("1230");
  });

  it("formats the doubles stored for lists without cutting zeros before the point", () => {
    expect(formatMassSquared(1230.4)).toBe("1230");
    expect(formatMassSquared(1000.2)).toBe("1000");
    expect(formatMassSquared(-0.5)).toBe(`${minus}0.5`);
    expect(formatMassSquared(0.133)).toBe("0.133");
  });

  describe("edge cases", () => {
    it("shows an em dash for a missing value and other text as it is", () => {
      expect(formatMassSquared(null)).toBe("\u2014");
      expect(formatMassSquared("unknown")).toBe("unknown");
    });
  });
});

describe("formatEngineProse", () => {
  it("writes alpha' M^2, M sqrt(alpha') and alpha' with the interface's symbols", () => {
    expect(formatEngineProse("of mass M sqrt(alpha') = 0.5, lightest alpha' M^2 = -1/2, M = y / (2 pi alpha')")).toBe(
      "of mass M\u221a\u03b1\u2032 = 0.5, lightest \u03b1\u2032M\u00b2 = \u22121/2, M = y / (2 pi \u03b1\u2032)",
    );
    // A hyphen between words or inside a range of axes is not a minus sign.
    expect(formatEngineProse("D4-D8 strings on axes 1-4, a = -1/2 (N = -1)")).toBe("D4-D8 strings on axes 1-4, a = \u22121/2 (N = \u22121)");
    expect(formatEngineProse("4d: U(2); U(1) flavour")).toBe("4d: U(2); U(1) flavour");
  });
});
