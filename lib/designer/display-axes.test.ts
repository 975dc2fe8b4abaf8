import { describe, expect, it } from "vitest";
import type { Configuration } from "@/lib/boundary/types";
import { normaliseDisplayAxes, suggestDisplayAxes } from "./display-axes";

const wallAndProbe: Pick<Configuration, "theory" | "stacks"> = {
  theory: "IIA",
  stacks: [
    { id: "w", label: "wall", count: 1, anti: false, worldvolume: [1, 2, 3, 4, 5, 6, 7, 8], position: { "9": 0 } },
    { id: "p", label: "probe", count: 2, anti: false, worldvolume: [1, 2, 3, 4], position: { "9": 3.5 } },
  ],
};

describe("suggestDisplayAxes", () => {
  it("shows the separation vertically and an axis where the shapes differ horizontally", () => {
    // Axis 9 carries the 3.5 separation; axes 5..8 are N for the wall and D for the probe.
    expect(suggestDisplayAxes(wallAndProbe)).toEqual({ horizontal: 8, vertical: 9 });
  });

  it("falls back to the last two axes for an empty configuration", () => {
    expect(suggestDisplayAxes({ theory: "IIB", stacks: [] })).toEqual({ horizontal: 8, vertical: 9 });
    expect(suggestDisplayAxes({ theory: "bosonic", stacks: [] })).toEqual({ horizontal: 24, vertical: 25 });
  });
});

describe("normaliseDisplayAxes", () => {
  it("keeps valid axes and replaces equal or out-of-range ones", () => {
    expect(normaliseDisplayAxes({ horizontal: 2, vertical: 3 }, wallAndProbe)).toEqual({ horizontal: 2, vertical: 3 });
    expect(normaliseDisplayAxes({ horizontal: 3, vertical: 3 }, wallAndProbe)).toEqual({ horizontal: 8, vertical: 9 });
    expect(normaliseDisplayAxes({ horizontal: 20, vertical: 3 }, wallAndProbe)).toEqual({ horizontal: 8, vertical: 9 });
  });
});
