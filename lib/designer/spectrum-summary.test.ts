import { describe, expect, it } from "vitest";
import type { Sector, SpectrumResult } from "@/lib/boundary/types";
import { formatMassSquared, formatNumber, lightestBySector, pairKey, parseRational, stackKind } from "./spectrum-summary";

function sector(pair: [string, string], rows: Array<[string, string]>, tachyonic = false): Sector {
  return {
    pair,
    nn: 0,
    dd: 0,
    nu: 0,
    separation: 0,
    chanPaton: 2,
    zeroPoint: { NS: "-1/2", R: "0" },
    tachyonic,
    criticalSeparation: tachyonic ? Math.PI * Math.SQRT2 : null,
    supersymmetric: !tachyonic,
    axes: [],
    levels: rows.map(([massSquared, withChanPaton]) => ({
      sector: "NS",
      level: "0",
      massSquared,
      mass: null,
      states: withChanPaton,
      withChanPaton,
    })),
    massless: [],
    notes: [],
  };
}

const result = {
  sectors: [
    sector(["a", "b"], [["-1/2", "0"], ["0", "16"], ["1", "256"]]),
    sector(["b", "c"], [["1.25", "4"], ["-1/2", "2"]], true),
  ],
} as unknown as SpectrumResult;

describe("lightestBySector", () => {
  it("skips levels the GSO projection empties and finds the minimum alpha' M^2", () => {
    const map = lightestBySector(result);
    expect(map.get(pairKey("b", "a"))?.massSquared).toBe("0");
    expect(map.get(pairKey("b", "c"))).toMatchObject({ massSquared: "-1/2", tachyonic: true });
  });
});

describe("parseRational", () => {
  it("reads exact rationals and decimals", () => {
    expect(parseRational("-1/2")).toBe(-0.5);
    expect(parseRational("3")).toBe(3);
    expect(parseRational("0.3102")).toBe(0.3102);
    expect(parseRational("x")).toBeNaN();
  });
});

describe("formatMassSquared", () => {
  it("keeps exact values exact with a true minus sign and rounds decimals", () => {
    expect(formatMassSquared("-1/2")).toBe("\u22121/2");
    expect(formatMassSquared("0.310264088")).toBe("0.3103");
  });
});

describe("formatNumber", () => {
  it("uses four significant digits and an em dash for missing values", () => {
    expect(formatNumber(Math.PI * Math.SQRT2)).toBe("4.443");
    expect(formatNumber(null)).toBe("\u2014");
    expect(formatNumber(-0.5)).toBe("\u22120.5");
  });
});

describe("stackKind", () => {
  it("names Dp and antibranes, but not bosonic antibranes", () => {
    const stack = { id: "a", label: "a", count: 1, anti: true, worldvolume: [1, 2, 3, 4], position: {} };
    expect(stackKind(stack, "IIA")).toBe("anti-D4");
    expect(stackKind(stack, "bosonic")).toBe("D4");
  });
});
