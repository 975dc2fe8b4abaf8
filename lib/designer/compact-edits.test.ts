import { describe, expect, it } from "vitest";
import type { Configuration } from "@/lib/boundary/types";
import { setRadius, setWilsonLine, tDualizeAxis, tidyCompactAxes } from "./compact-edits";
import { setTheory, toggleAxis } from "./document";

const document: Configuration = {
  format: 1,
  title: "Wrapped",
  theory: "IIB",
  stringScaleGeV: null,
  levels: 2,
  stacks: [
    { id: "a", label: "", count: 1, anti: false, worldvolume: [9], position: {} },
    { id: "b", label: "", count: 1, anti: false, worldvolume: [1], position: { "9": 3 } },
  ],
};

describe("setRadius", () => {
  it("makes an axis compact in format 2, resizes it and makes it non-compact again", () => {
    const compact = setRadius(document, 9, 2.5);
    expect(compact.format).toBe(2);
    expect(compact.compact).toEqual({ "9": 2.5 });
    const withWilson = setWilsonLine(compact, "a", 9, 1);
    const flat = setRadius(withWilson, 9, null);
    expect(flat.compact).toBeUndefined();
    expect(flat.stacks[0]).not.toHaveProperty("wilson");
    expect(document.compact).toBeUndefined();
  });

  describe("edge cases", () => {
    it("refuses radii outside the engine's range and axes outside space", () => {
      expect(setRadius(document, 9, 0)).toBe(document);
      expect(setRadius(document, 9, Number.NaN)).toBe(document);
      expect(setRadius(document, 10, 1)).toBe(document);
      expect(setRadius(document, 9, null)).toBe(document);
    });
  });
});

describe("setWilsonLine", () => {
  it("sets a Wilson line on a compact Neumann axis only", () => {
    const compact = setRadius(document, 9, 2);
    expect(setWilsonLine(compact, "a", 9, 1.2).stacks[0]?.wilson).toEqual({ "9": 1.2 });
    expect(setWilsonLine(compact, "b", 9, 1.2)).toBe(compact);
    expect(setWilsonLine(document, "a", 9, 1.2)).toBe(document);
    expect(setWilsonLine(compact, "a", 9, 2 * Math.PI)).toBe(compact);
    expect(setWilsonLine(setWilsonLine(compact, "a", 9, 1.2), "a", 9, 0).stacks[0]).not.toHaveProperty("wilson");
  });
});

describe("tDualizeAxis", () => {
  it("dualises a compact axis and refuses a non-compact one", () => {
    const compact = setWilsonLine(setRadius(document, 9, 2), "a", 9, 1);
    const dual = tDualizeAxis(compact, 9);
    expect(dual.theory).toBe("IIA");
    expect(dual.stacks[0]?.position).toEqual({ "9": 0.5 });
    expect(tDualizeAxis(document, 9)).toBe(document);
  });
});

describe("tidyCompactAxes", () => {
  it("drops a Wilson line once its axis turns Dirichlet, and radii of axes that no longer exist", () => {
    const compact = setWilsonLine(setRadius(document, 9, 2), "a", 9, 1);
    expect(tidyCompactAxes(compact)).toBe(compact);
    const flipped = tidyCompactAxes(toggleAxis(compact, "a", 9));
    expect(flipped.stacks[0]).not.toHaveProperty("wilson");
    const bosonic = setRadius(setTheory(document, "bosonic"), 20, 1);
    expect(tidyCompactAxes(setTheory(bosonic, "IIA")).compact).toBeUndefined();
  });
});
