import { describe, expect, it } from "vitest";
import { cleanNumber, gridLines, snapValue } from "./snap";

describe("snapValue", () => {
  it("rounds to the nearest multiple of the step", () => {
    expect(snapValue(1.26, 0.5)).toBe(1.5);
    expect(snapValue(1.24, 0.5)).toBe(1);
    expect(snapValue(-2.6, 1)).toBe(-3);
  });

  it("removes float noise from decimal steps", () => {
    // 3 * 0.1 is 0.30000000000000004 in binary floating point.
    expect(snapValue(0.31, 0.1)).toBe(0.3);
  });

  describe("edge cases", () => {
    it("never returns negative zero", () => {
      expect(Object.is(snapValue(-0.1, 1), 0)).toBe(true);
    });

    it("leaves the value alone for a zero, negative or NaN step", () => {
      expect(snapValue(1.234, 0)).toBe(1.234);
      expect(snapValue(1.234, -1)).toBe(1.234);
      expect(snapValue(1.234, Number.NaN)).toBe(1.234);
    });
  });
});

describe("cleanNumber", () => {
  it("keeps ten decimals", () => {
    expect(cleanNumber(0.1 + 0.2)).toBe(0.3);
    expect(cleanNumber(1.23456789012)).toBe(1.2345678901);
  });
});

describe("gridLines", () => {
  it("lists the multiples of the step in range", () => {
    expect(gridLines(-1.2, 1.1, 0.5)).toEqual([-1, -0.5, 0, 0.5, 1]);
  });

  it("doubles the step until the count fits", () => {
    const lines = gridLines(0, 100, 0.5, 30);
    expect(lines.length).toBeLessThanOrEqual(31);
    expect(lines[1]! - lines[0]!).toBe(4);
  });

  it("returns nothing for an empty or inverted range", () => {
    expect(gridLines(2, 1, 0.5)).toEqual([]);
  });
});
