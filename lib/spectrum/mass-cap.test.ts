import { describe, expect, it } from "vitest";
import { computeSpectrum } from "@/lib/boundary";
import { formatRational } from "@/lib/boundary/rational";
import type { Configuration } from "@/lib/boundary/types";
import { highestUnstretchedMassSquared, unstretchedMassSquared, unstretchedMassSquaredText } from "./mass-cap";

// alpha' M^2 = (y / 2 pi)^2 + N + a (physics.md, mass formula): N + a is alpha' M^2 at zero separation.
const separated: Configuration = {
  format: 1,
  title: "apart",
  theory: "IIB",
  stringScaleGeV: null,
  levels: 3,
  stacks: [
    { id: "a", label: "", count: 1, anti: false, worldvolume: [1, 2, 3], position: {} },
    { id: "b", label: "", count: 1, anti: false, worldvolume: [1, 2, 3], position: { "9": 5 } },
  ],
};

describe("unstretchedMassSquared", () => {
  it("adds the sector's zero point to the level: NS N = 3/2 with a = -1/2 is 1", () => {
    // a_NS = -1/2 at nu = 0 (Polchinski vol. 2, section 13.4, from memory).
    const value = unstretchedMassSquared({ sector: "NS", level: "3/2" }, { NS: "-1/2", R: "0" });
    expect(value && formatRational(value)).toBe("1");
    expect(unstretchedMassSquaredText({ sector: "R", level: "2" }, { NS: "-1/2", R: "0" })).toBe("2");
  });

  it("reads N + a of a separated pair, whose alpha' M^2 is larger by (y / 2 pi)^2", () => {
    const sector = computeSpectrum(separated).sectors.find((s) => s.pair.join("-") === "a-b");
    const row = sector?.levels[0];
    expect(row && sector && unstretchedMassSquaredText(row, sector.zeroPoint)).toBe("0");
    expect(Number(row?.massSquared)).toBeCloseTo((5 / (2 * Math.PI)) ** 2, 10);
  });

  it("finds the mass cap of a result as its highest N + a", () => {
    expect(highestUnstretchedMassSquared(computeSpectrum(separated).sectors)).toBe(3);
  });

  describe("edge cases", () => {
    it("gives null or an empty text when the level or zero point cannot be read", () => {
      expect(unstretchedMassSquared({ sector: "R", level: "1" }, { NS: "-1/2" })).toBeNull();
      expect(unstretchedMassSquared({ sector: "NS", level: "0.5" }, { NS: "-1/2" })).toBeNull();
      expect(unstretchedMassSquaredText({ sector: "bosonic", level: "1" }, {})).toBe("");
      expect(highestUnstretchedMassSquared([])).toBe(0);
    });
  });
});
