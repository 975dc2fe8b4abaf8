import type { Configuration } from "./boundary/types";

/*
 * Demo configurations of Mooring's own invented scenarios (pure data, file format 1). The seed
 * stores them with their computed results; the landing page shows `landingDemoConfiguration`.
 */

/** The read-only configuration on the public landing page: a three-stack IIB set-up. */
export const landingDemoConfiguration: Configuration = {
  format: 1,
  title: "Harbour lights: two D3 stacks beside a D7",
  description:
    "Three coincident D3-branes and a single D3 probe, both parallel to a D7 wall; the probe sits 1.5 string lengths off the wall along x8.",
  theory: "IIB",
  stringScaleGeV: null,
  levels: 4,
  stacks: [
    {
      id: "wall",
      label: "D7 wall",
      count: 1,
      anti: false,
      worldvolume: [1, 2, 3, 4, 5, 6, 7],
      position: { "8": 0, "9": 0 },
      colour: "#2f6f9f",
    },
    {
      id: "main",
      label: "main stack",
      count: 3,
      anti: false,
      worldvolume: [1, 2, 3],
      position: { "4": 0, "5": 0, "6": 0, "7": 0, "8": 0, "9": 0 },
      colour: "#c2572b",
    },
    {
      id: "probe",
      label: "probe",
      count: 1,
      anti: false,
      worldvolume: [1, 2, 3],
      position: { "4": 0, "5": 0, "6": 0, "7": 0, "8": 1.5, "9": 0 },
      colour: "#5a8f3c",
    },
  ],
};

/** A D3 probe two string lengths from a D7 along x8 (IIB; four ND axes, so the pair is BPS). */
export const probeNearSevenBrane: Configuration = {
  format: 1,
  title: "D3 probe near a D7",
  description: "A single D3 probe at distance 2 from a D7 along x8; the D3-D7 strings have four ND axes.",
  theory: "IIB",
  stringScaleGeV: null,
  levels: 6,
  stacks: [
    {
      id: "seven",
      label: "D7",
      count: 1,
      anti: false,
      worldvolume: [1, 2, 3, 4, 5, 6, 7],
      position: { "8": 0, "9": 0 },
    },
    {
      id: "probe",
      label: "D3 probe",
      count: 1,
      anti: false,
      worldvolume: [1, 2, 3],
      position: { "4": 0, "5": 0, "6": 0, "7": 0, "8": 2, "9": 0 },
    },
  ],
};

/** The same probe moved closer (an earlier revision of `probeNearSevenBrane`). */
export const probeNearSevenBraneCloser: Configuration = {
  ...probeNearSevenBrane,
  stacks: probeNearSevenBrane.stacks.map((stack) =>
    stack.id === "probe" ? { ...stack, position: { ...stack.position, "8": 0.5 } } : stack,
  ),
};

/**
 * A D4 and an anti-D4, parallel, 1.5 string lengths apart along x9: below the critical
 * separation pi sqrt(2) ~ 4.44, so the stretched NS ground state is tachyonic.
 */
export const braneAntibranePair: Configuration = {
  format: 1,
  title: "D4 and anti-D4 below critical separation",
  description: "A brane-antibrane pair of D4s separated by 1.5 along x9, inside the tachyonic range.",
  theory: "IIA",
  stringScaleGeV: null,
  levels: 6,
  stacks: [
    {
      id: "brane",
      label: "D4",
      count: 1,
      anti: false,
      worldvolume: [1, 2, 3, 4],
      position: { "5": 0, "6": 0, "7": 0, "8": 0, "9": 0 },
    },
    {
      id: "anti",
      label: "anti-D4",
      count: 1,
      anti: true,
      worldvolume: [1, 2, 3, 4],
      position: { "5": 0, "6": 0, "7": 0, "8": 0, "9": 1.5 },
    },
  ],
};

/** The same pair pulled apart beyond the critical separation (a later revision). */
export const braneAntibranePairApart: Configuration = {
  ...braneAntibranePair,
  stacks: braneAntibranePair.stacks.map((stack) =>
    stack.id === "anti" ? { ...stack, position: { ...stack.position, "9": 5 } } : stack,
  ),
};

/** A D0 sitting on a D4 (IIA; four ND axes), to check the massless bound-state spectrum. */
export const zeroFourBoundState: Configuration = {
  format: 1,
  title: "D0 on a D4: bound-state check",
  description: "One D0 at the origin of a D4's worldvolume; the D0-D4 strings have four ND axes.",
  theory: "IIA",
  stringScaleGeV: null,
  levels: 6,
  stacks: [
    {
      id: "four",
      label: "D4",
      count: 1,
      anti: false,
      worldvolume: [1, 2, 3, 4],
      position: { "5": 0, "6": 0, "7": 0, "8": 0, "9": 0 },
    },
    {
      id: "zero",
      label: "D0",
      count: 1,
      anti: false,
      worldvolume: [],
      position: {},
    },
  ],
};

/** Lab starter: two parallel D2 stacks (IIA), one unit apart along x3. */
export const twoTwoBraneStacks: Configuration = {
  format: 1,
  title: "Two D2 stacks",
  description:
    "Starter for the lab: two parallel D2 stacks one string length apart along x3. Try moving them together, or flipping one to an antibrane.",
  theory: "IIA",
  stringScaleGeV: null,
  levels: 4,
  stacks: [
    {
      id: "left",
      label: "left",
      count: 2,
      anti: false,
      worldvolume: [1, 2],
      position: { "3": 0 },
    },
    {
      id: "right",
      label: "right",
      count: 1,
      anti: false,
      worldvolume: [1, 2],
      position: { "3": 1 },
    },
  ],
};

/** Bosonic string: a space-filling D25 and a D23 inside it (two ND axes, x24 and x25). */
export const bosonicTwentyFiveWithTwentyThree: Configuration = {
  format: 1,
  title: "Bosonic D25 with a D23",
  description:
    "A space-filling D25 and a D23 inside it; the D23-D25 strings have two ND axes (x24, x25), so there is no stretching between them.",
  theory: "bosonic",
  stringScaleGeV: null,
  levels: 4,
  stacks: [
    {
      id: "bulk",
      label: "D25",
      count: 1,
      anti: false,
      worldvolume: Array.from({ length: 25 }, (_, index) => index + 1),
      position: {},
    },
    {
      id: "defect",
      label: "D23",
      count: 1,
      anti: false,
      worldvolume: Array.from({ length: 23 }, (_, index) => index + 1),
      position: { "24": 0, "25": 0 },
    },
  ],
};
