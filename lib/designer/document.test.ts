import { describe, expect, it } from "vitest";
import type { Configuration } from "@/lib/boundary/types";
import { configurationTitleMaxLength } from "@/lib/validations/limits";
import { checkConfiguration } from "@/lib/boundary";
import {
  addStack,
  addStackProblem,
  deleteStacks,
  duplicateStacks,
  maxStacks,
  moveStacks,
  moveWorldvolume,
  nextStackId,
  renameProblem,
  renameStack,
  setAnti,
  setColour,
  setCount,
  setLabel,
  setLevels,
  setPosition,
  setStringScale,
  setTheory,
  setTitle,
  spatialAxes,
  stackDimension,
  toggleAxis,
} from "./document";

function sample(): Configuration {
  return {
    format: 1,
    title: "Wall and probe",
    theory: "IIA",
    stringScaleGeV: null,
    levels: 4,
    stacks: [
      { id: "w", label: "wall", count: 1, anti: false, worldvolume: [1, 2, 3, 4, 5, 6, 7, 8], position: { "9": 0 } },
      { id: "p", label: "probe", count: 2, anti: false, worldvolume: [1, 2, 3, 4], position: { "9": 3.5 } },
    ],
  };
}

describe("spatialAxes", () => {
  it("lists 1..9 for type II and 1..25 for bosonic", () => {
    // D = 10 for superstrings and D = 26 for the bosonic string: common practice.
    expect(spatialAxes({ theory: "IIB" })).toEqual([1, 2, 3, 4, 5, 6, 7, 8, 9]);
    expect(spatialAxes({ theory: "bosonic" })).toHaveLength(25);
    expect(spatialAxes({ theory: "bosonic", dimension: 12 })).toHaveLength(11);
  });
});

describe("addStack", () => {
  it("adds a D0 for IIA and a D1 for IIB by default, so the new stack has an allowed p", () => {
    // IIA carries even p, IIB odd p: common practice.
    const a = addStack(sample());
    expect(a.stacks).toHaveLength(3);
    expect(stackDimension(a.stacks[2]!)).toBe(0);
    const b = addStack({ ...sample(), theory: "IIB", stacks: [] });
    expect(b.stacks[0]!.worldvolume).toEqual([1]);
  });

  it("gives the new stack an unused id", () => {
    const config = { ...sample(), stacks: [...sample().stacks, { ...sample().stacks[0]!, id: "s1" }] };
    expect(addStack(config).stacks.at(-1)!.id).toBe("s2");
  });

  it("sorts the worldvolume and drops axes outside space and positions along it", () => {
    const config = addStack(sample(), { worldvolume: [3, 1, 3, 12, 0], position: { "1": 5, "4": 2 } });
    const stack = config.stacks.at(-1)!;
    expect(stack.worldvolume).toEqual([1, 3]);
    expect(stack.position).toEqual({ "4": 2 });
  });

  it("does not mutate its input", () => {
    const config = sample();
    const frozen = JSON.stringify(config);
    addStack(config);
    expect(JSON.stringify(config)).toBe(frozen);
  });

  describe("edge cases", () => {
    it("refuses a taken or malformed id", () => {
      const config = sample();
      expect(addStack(config, { id: "w" })).toBe(config);
      expect(addStack(config, { id: "has space" })).toBe(config);
    });

    it("refuses beyond the stack limit", () => {
      let config = sample();
      for (let i = 0; i < maxStacks + 3; i++) config = addStack(config);
      expect(config.stacks).toHaveLength(maxStacks);
    });
  });
});

describe("duplicateStacks", () => {
  it("copies with fresh ids and shifts Dirichlet positions only", () => {
    const { config, newIds } = duplicateStacks(sample(), ["p"], { shift: { "9": 1, "2": 5 } });
    expect(newIds).toEqual(["p1"]);
    const copy = config.stacks.at(-1)!;
    expect(copy.position).toEqual({ "9": 4.5 });
    expect(copy.count).toBe(2);
    expect(copy.worldvolume).toEqual([1, 2, 3, 4]);
  });

  it("keeps every id unique", () => {
    const once = duplicateStacks(sample(), ["w", "p"]).config;
    const twice = duplicateStacks(once, ["w", "p"]).config;
    const ids = twice.stacks.map((s) => s.id);
    expect(new Set(ids).size).toBe(ids.length);
  });
});

describe("deleteStacks", () => {
  it("removes the given stacks and returns the same document for unknown ids", () => {
    const config = sample();
    expect(deleteStacks(config, ["w"]).stacks.map((s) => s.id)).toEqual(["p"]);
    expect(deleteStacks(config, ["nope"])).toBe(config);
  });
});

describe("moveStacks", () => {
  it("moves only along Dirichlet axes", () => {
    const moved = moveStacks(sample(), ["p", "w"], { "9": 1.25, "1": 7 });
    expect(moved.stacks.map((s) => s.position)).toEqual([{ "9": 1.25 }, { "9": 4.75 }]);
  });

  it("snaps the result to the grid step", () => {
    const moved = moveStacks(sample(), ["p"], { "9": 0.3, "6": -0.74 }, { snapStep: 0.5 });
    expect(moved.stacks[1]!.position).toEqual({ "9": 4, "6": -0.5 });
  });

  describe("edge cases", () => {
    it("refuses non-finite offsets", () => {
      const config = sample();
      expect(moveStacks(config, ["p"], { "9": Number.NaN })).toBe(config);
    });

    it("returns the same document when nothing moves", () => {
      const config = sample();
      expect(moveStacks(config, ["p"], { "1": 3 })).toBe(config);
    });
  });
});

describe("toggleAxis", () => {
  it("makes a Neumann axis Dirichlet at the given position and back", () => {
    const d = toggleAxis(sample(), "p", 4, 2);
    expect(d.stacks[1]!.worldvolume).toEqual([1, 2, 3]);
    expect(d.stacks[1]!.position).toEqual({ "9": 3.5, "4": 2 });
    const n = toggleAxis(d, "p", 4);
    expect(n.stacks[1]!.worldvolume).toEqual([1, 2, 3, 4]);
    expect(n.stacks[1]!.position).toEqual({ "9": 3.5 });
  });

  it("allows a p that the theory forbids; validation reports it", () => {
    const odd = toggleAxis(sample(), "p", 9);
    expect(stackDimension(odd.stacks[1]!)).toBe(5);
  });

  describe("edge cases", () => {
    it("cannot touch time (axis 0) or axes outside space: every stack extends along time", () => {
      const config = sample();
      expect(toggleAxis(config, "p", 0)).toBe(config);
      expect(toggleAxis(config, "p", 10)).toBe(config);
    });
  });
});

describe("setPosition", () => {
  it("sets a Dirichlet position and refuses a Neumann axis or NaN", () => {
    const config = sample();
    expect(setPosition(config, "p", 9, -2).stacks[1]!.position).toEqual({ "9": -2 });
    expect(setPosition(config, "p", 2, 1)).toBe(config);
    expect(setPosition(config, "p", 9, Number.POSITIVE_INFINITY)).toBe(config);
  });
});

describe("setCount", () => {
  it("accepts integers from 1 and refuses anything else", () => {
    const config = sample();
    expect(setCount(config, "w", 5).stacks[0]!.count).toBe(5);
    for (const bad of [0, -1, 1.5, Number.NaN, 100001]) expect(setCount(config, "w", bad)).toBe(config);
  });
});

describe("setAnti, setLabel, setColour", () => {
  it("update one stack", () => {
    let config = setAnti(sample(), "p", true);
    config = setLabel(config, "p", "anti probe");
    config = setColour(config, "p", "#ABCDEF");
    expect(config.stacks[1]).toMatchObject({ anti: true, label: "anti probe", colour: "#abcdef" });
  });

  it("refuse a colour that is not #rrggbb", () => {
    const config = sample();
    expect(setColour(config, "p", "red")).toBe(config);
  });
});

describe("renameStack", () => {
  it("renames to a free, well-formed id", () => {
    expect(renameStack(sample(), "p", "probe-2").stacks[1]!.id).toBe("probe-2");
  });

  it("refuses duplicates and malformed ids with a reason", () => {
    const config = sample();
    expect(renameStack(config, "p", "w")).toBe(config);
    expect(renameProblem(config, "p", "w")).toMatch(/already/);
    expect(renameProblem(config, "p", "")).toMatch(/letters/);
    expect(renameProblem(config, "p", "p")).toBeNull();
  });
});

describe("setTheory", () => {
  it("drops axes beyond nine when leaving the bosonic theory", () => {
    const bosonic: Configuration = {
      ...sample(),
      theory: "bosonic",
      stacks: [{ id: "a", label: "a", count: 1, anti: false, worldvolume: [1, 20], position: { "9": 1, "24": 3 } }],
    };
    const ii = setTheory(bosonic, "IIB");
    expect(ii.stacks[0]!.worldvolume).toEqual([1]);
    expect(ii.stacks[0]!.position).toEqual({ "9": 1 });
    expect(ii.dimension).toBeUndefined();
  });
});

describe("document settings", () => {
  it("sets title, levels and string scale within their limits", () => {
    const config = sample();
    expect(setTitle(config, "x".repeat(configurationTitleMaxLength + 100)).title).toHaveLength(configurationTitleMaxLength);
    expect(setLevels(config, 10).levels).toBe(10);
    expect(setLevels(config, 201)).toBe(config);
    expect(setStringScale(config, 1e16).stringScaleGeV).toBe(1e16);
    expect(setStringScale(config, -1)).toBe(config);
    expect(setStringScale(config, null).stringScaleGeV).toBeNull();
    // The engine's ceiling, beyond the Planck scale (about 1.2e19 GeV, common practice).
    expect(setStringScale(config, 1e21)).toBe(config);
  });
});

describe("moveWorldvolume", () => {
  it("moves one Neumann direction to a Dirichlet axis and keeps p", () => {
    const config = { ...sample(), stacks: [{ ...sample().stacks[1]!, position: { "6": 2, "9": 3.5 } }] };
    const moved = moveWorldvolume(config, "p", 4, 6);
    expect(moved.stacks[0]?.worldvolume).toEqual([1, 2, 3, 6]);
    // The stack keeps its place: the coordinate it had on x6 is now its coordinate on x4.
    expect(moved.stacks[0]?.position).toEqual({ "4": 2, "9": 3.5 });
    expect(stackDimension(moved.stacks[0]!)).toBe(4);
  });

  it("keeps a IIA document valid where a single flip would not", () => {
    const config = sample();
    // IIA allows only even p (common practice): one flip of a D4 makes a D3 or a D5.
    const flipped = toggleAxis(config, "p", 4);
    expect(checkConfiguration(flipped).some((issue) => /even p/.test(issue.message))).toBe(true);
    expect(checkConfiguration(moveWorldvolume(config, "p", 4, 6))).toEqual([]);
  });

  it("does not mutate its input", () => {
    const config = sample();
    const copy = structuredClone(config);
    moveWorldvolume(config, "p", 4, 6);
    expect(config).toEqual(copy);
  });

  describe("edge cases", () => {
    it("refuses a from axis that is not Neumann, a to axis that is not Dirichlet, time and unknown stacks", () => {
      const config = sample();
      expect(moveWorldvolume(config, "p", 6, 7)).toBe(config);
      expect(moveWorldvolume(config, "p", 4, 3)).toBe(config);
      expect(moveWorldvolume(config, "p", 4, 4)).toBe(config);
      expect(moveWorldvolume(config, "p", 0, 6)).toBe(config);
      expect(moveWorldvolume(config, "p", 4, 10)).toBe(config);
      expect(moveWorldvolume(config, "nobody", 4, 6)).toBe(config);
    });
  });
});

describe("addStackProblem", () => {
  it("explains the limit once the document is full, and is silent before", () => {
    let config = sample();
    expect(addStackProblem(config)).toBeNull();
    while (config.stacks.length < maxStacks) config = addStack(config);
    expect(addStackProblem(config)).toMatch(/at most 64 stacks/);
    expect(addStack(config)).toBe(config);
  });
});

describe("nextStackId", () => {
  it("counts up from 1 past used ids", () => {
    expect(nextStackId({ stacks: [{ id: "s1" }, { id: "s3" }] as Configuration["stacks"] })).toBe("s2");
  });
});
