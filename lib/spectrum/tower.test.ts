import { describe, expect, it } from "vitest";
import { computeSpectrum } from "@/lib/boundary";
import { quantumNumberText, quantumNumbers, resultHasTower, towerPoints } from "./tower";

const onCircle = computeSpectrum({
  format: 2,
  title: "D1 on a circle",
  theory: "IIB",
  stringScaleGeV: null,
  levels: 2,
  compact: { "9": 1, "8": 2 },
  stacks: [{ id: "a", label: "", count: 1, anti: false, worldvolume: [9], position: { "8": 1 } }],
});

describe("quantumNumbers", () => {
  it("lists momentum and winding numbers in axis order", () => {
    expect(quantumNumbers({ momentum: { "9": 1 }, winding: { "8": -2 } })).toEqual([
      { axis: 8, kind: "w", value: -2 },
      { axis: 9, kind: "n", value: 1 },
    ]);
    expect(quantumNumberText({ momentum: { "9": 1 }, winding: { "8": -2 } })).toBe("w8 = -2, n9 = 1");
    expect(quantumNumberText({ momentum: {}, winding: {} })).toBe("none");
  });
});

describe("towerPoints", () => {
  it("plots the momentum tower of a D1 on a circle of radius 1: alpha' M^2 = n^2 at the massless level", () => {
    // p = n / R with R = 1 adds n^2 to alpha' M^2 (Polchinski vol. 1, section 8.6, from memory).
    const sector = onCircle.sectors[0]!;
    const points = towerPoints(sector, 9).filter((point) => point.sector === "NS" && point.level === "1/2" && point.label.includes("w8 = 0"));
    expect(points.map((point) => [point.number, point.massSquared])).toEqual([
      [0, 0],
      [-1, 1],
      [1, 1],
    ]);
  });

  it("is empty for an axis the sector has no numbers on", () => {
    expect(towerPoints(onCircle.sectors[0]!, 3)).toEqual([]);
  });
});

describe("resultHasTower", () => {
  it("tells results on circles from flat ones", () => {
    expect(resultHasTower(onCircle)).toBe(true);
    expect(resultHasTower({ sectors: [] })).toBe(false);
  });
});
