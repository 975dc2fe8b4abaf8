import { describe, expect, it } from "vitest";
import { computeSpectrum } from "@/lib/boundary";
import type { Configuration } from "@/lib/boundary/types";
import { countMasslessStates } from "./massless-count";

const single = (count: number): Configuration => ({
  format: 1,
  title: "one stack",
  theory: "IIB",
  stringScaleGeV: null,
  levels: 1,
  stacks: [{ id: "s", label: "", count, anti: false, worldvolume: [1, 2, 3], position: {} }],
});

describe("countMasslessStates", () => {
  it("counts 8 NS and 8 R massless states per Chan-Paton label of one stack", () => {
    // Type II, nu = 0, brane-brane: 8 states at alpha' M^2 = 0 in NS and in R after GSO
    // (Green, Schwarz and Witten vol. 1, from memory; physics.md). N branes give N^2 labels.
    expect(countMasslessStates(computeSpectrum(single(1)))).toBe("16");
    expect(countMasslessStates(computeSpectrum(single(3)))).toBe(String(16 * 9));
  });

  it("counts the bosonic open string's 24 massless vector states at level 1", () => {
    // Bosonic open string, D = 26: 24 massless states at level 1 (physics.md, common practice).
    const bosonic: Configuration = { ...single(1), theory: "bosonic", stacks: [{ id: "s", label: "", count: 1, anti: false, worldvolume: [1, 2, 3, 4], position: {} }] };
    expect(countMasslessStates(computeSpectrum(bosonic))).toBe("24");
  });

  describe("edge cases", () => {
    it("is 0 without sectors and skips unreadable rows", () => {
      expect(countMasslessStates({ sectors: [] })).toBe("0");
    });
  });
});
