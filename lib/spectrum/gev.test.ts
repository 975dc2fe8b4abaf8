import { describe, expect, it } from "vitest";
import { computeSpectrum } from "@/lib/boundary";
import type { Configuration } from "@/lib/boundary/types";
import { massInGeV } from "./gev";

describe("massInGeV", () => {
  it("multiplies M sqrt(alpha') by M_s = 1/sqrt(alpha') (definition of the string scale, common practice)", () => {
    expect(massInGeV(1, 2.4e15)).toBe(2.4e15);
    expect(massInGeV(0.25, 1000)).toBe(250);
  });

  it("agrees with the engine's own massGeV on every level row", () => {
    const config: Configuration = {
      format: 1,
      title: "Two separated D3s",
      theory: "IIB",
      stringScaleGeV: 5e16,
      levels: 2,
      stacks: [
        { id: "a", label: "a", count: 1, anti: false, worldvolume: [1, 2, 3], position: {} },
        { id: "b", label: "b", count: 2, anti: false, worldvolume: [1, 2, 3], position: { "9": 3 } },
      ],
    };
    const rows = computeSpectrum(config).sectors.flatMap((sector) => sector.levels);
    expect(rows.length).toBeGreaterThan(0);
    for (const row of rows) expect(massInGeV(row.mass, config.stringScaleGeV)).toBe(row.massGeV);
  });

  describe("edge cases", () => {
    it("has no value for a tachyon or without a scale", () => {
      expect(massInGeV(null, 2.4e15)).toBeNull();
      expect(massInGeV(0.5, null)).toBeNull();
      expect(massInGeV(0.5, 0)).toBeNull();
    });
  });
});
