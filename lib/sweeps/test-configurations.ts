/**
 * Small configurations of our own for the sweep tests (not shipped to the browser by any page).
 */
import type { Configuration } from "../boundary/types";

/** A D4 and an anti-D4 (IIA), parallel along x1..x4, both at the origin. */
export const braneAntibraneAtOrigin: Configuration = {
  format: 1,
  title: "Pair to pull apart",
  theory: "IIA",
  stringScaleGeV: null,
  levels: 2,
  stacks: [
    { id: "a", label: "brane", count: 1, anti: false, worldvolume: [1, 2, 3, 4], position: {} },
    { id: "b", label: "antibrane", count: 1, anti: true, worldvolume: [1, 2, 3, 4], position: {} },
  ],
};

/** Two D3 stacks (IIB) along x1..x3, one of two branes and one of one. */
export const twoThreeBranes: Configuration = {
  format: 1,
  title: "Two D3 stacks",
  theory: "IIB",
  stringScaleGeV: null,
  levels: 1,
  stacks: [
    { id: "p", label: "pair", count: 2, anti: false, worldvolume: [1, 2, 3], position: { "9": 0 } },
    { id: "q", label: "single", count: 1, anti: false, worldvolume: [1, 2, 3], position: { "9": 1.5, "8": 0.5 } },
  ],
};

/** One D1 (IIB) along x9, format 1: x9 is non-compact until a radius dimension wraps it on a circle. */
export const stringAlongNine: Configuration = {
  format: 1,
  title: "String along x9",
  theory: "IIB",
  stringScaleGeV: null,
  levels: 1,
  stacks: [{ id: "w", label: "wrapped", count: 1, anti: false, worldvolume: [9], position: {} }],
};
