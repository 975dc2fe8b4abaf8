import { describe, expect, it } from "vitest";
import { checkSweepDefinition, formatPointCount, sweepLimits, sweepPointCount } from "./definition";
import { braneAntibraneAtOrigin as base, stringAlongNine, twoThreeBranes } from "./test-configurations";
import type { SweepDefinition } from "./types";

const separation: SweepDefinition["dimensions"][number] = { kind: "position", stack: "b", axis: 9, values: { kind: "range", from: 0, to: 8, steps: 9 } };

describe("sweepPointCount", () => {
  it("multiplies the sizes of the dimensions", () => {
    const definition: SweepDefinition = {
      format: 1,
      dimensions: [
        separation,
        { kind: "orientation", stack: "a" },
        { kind: "count", stack: "a", values: { kind: "list", values: [1, 2, 3] } },
        // 2 stacks on 3 axes: 2^6 = 64 assignments.
        { kind: "boundary", stacks: ["a", "b"], axes: [5, 6, 7], symmetry: "all" },
      ],
    };
    expect(sweepPointCount(definition)).toBe(9n * 2n * 3n * 64n);
  });

  it("counts N/D choices up to relabelling the axes with the multiset coefficient", () => {
    // 2 stacks, 3 axes: C(2^2 + 3 - 1, 3) = C(6, 3) = 20 (OEIS A000292 at n = 4).
    expect(sweepPointCount({ format: 1, dimensions: [{ kind: "boundary", stacks: ["a", "b"], axes: [5, 6, 7], symmetry: "relabel-axes" }] })).toBe(20n);
  });
});

describe("checkSweepDefinition", () => {
  it("accepts a valid sweep", () => {
    expect(checkSweepDefinition(base, { format: 1, dimensions: [separation, { kind: "orientation", stack: "b" }] })).toEqual([]);
  });

  it("refuses a sweep over the point limit, with the count in the message, before anything runs", () => {
    // 2 stacks on 9 axes, every assignment: 2^18 = 262144 points.
    const problems = checkSweepDefinition(twoThreeBranes, {
      format: 1,
      dimensions: [{ kind: "boundary", stacks: ["p", "q"], axes: [1, 2, 3, 4, 5, 6, 7, 8, 9], symmetry: "all" }],
    });
    expect(problems).toEqual([
      {
        path: ["dimensions"],
        message: expect.stringContaining(`This sweep has 262,144 points; at most ${formatPointCount(sweepLimits.maxPoints)} are allowed`),
      },
    ]);
  });

  it("names unknown stacks, axes outside space and bad values at their paths", () => {
    const problems = checkSweepDefinition(base, {
      format: 1,
      dimensions: [
        { kind: "orientation", stack: "nope" },
        { kind: "position", stack: "a", axis: 10, values: { kind: "list", values: [0, 2e6] } },
        { kind: "count", stack: "a", values: { kind: "range", from: 1, to: 2, steps: 3 } },
      ],
    });
    expect(problems.map((problem) => problem.path)).toEqual([
      ["dimensions", 0, "stack"],
      ["dimensions", 1, "axis"],
      ["dimensions", 1, "values", "values", 1],
      ["dimensions", 2, "values", "steps"],
    ]);
    expect(problems[0]?.message).toBe('There is no stack "nope" in this configuration');
  });

  it("refuses two dimensions that set the same thing", () => {
    const problems = checkSweepDefinition(base, {
      format: 1,
      dimensions: [separation, { ...separation, values: { kind: "list", values: [1] } }, { kind: "boundary", stacks: ["a"], axes: [5], symmetry: "all" }, { kind: "boundary", stacks: ["b", "a"], axes: [6, 5], symmetry: "all" }],
    });
    expect(problems).toEqual([
      { path: ["dimensions", 1, "axis"], message: 'The position of "b" on x9 is already swept by dimension 1' },
      { path: ["dimensions", 3, "axes", 1], message: 'The N/D choice of "a" on x5 is already swept by dimension 3' },
    ]);
  });

  it("refuses brane/antibrane in the bosonic theory, where it changes nothing", () => {
    const bosonic = { ...base, theory: "bosonic" as const, stacks: base.stacks.map((stack) => ({ ...stack, anti: false })) };
    expect(checkSweepDefinition(bosonic, { format: 1, dimensions: [{ kind: "orientation", stack: "a" }] })[0]?.path).toEqual(["dimensions", 0, "kind"]);
  });

  it("checks radius dimensions: a spatial axis, radii within the engine's limits, one dimension per axis", () => {
    // The engine takes radii from compactLimits.minRadius = 0.001 to 1000 (lib/boundary/compact.ts).
    const problems = checkSweepDefinition(stringAlongNine, {
      format: 1,
      dimensions: [
        { kind: "radius", axis: 9, values: { kind: "list", values: [1, 0, -2] } },
        { kind: "radius", axis: 10, values: { kind: "list", values: [1] } },
        { kind: "radius", axis: 8, values: { kind: "range", from: 0, to: 2, steps: 5 } },
        { kind: "radius", axis: 9, values: { kind: "list", values: [2] } },
      ],
    });
    expect(problems).toEqual([
      { path: ["dimensions", 0, "values", "values", 1], message: "Radii must be numbers from 0.001 to 1000, got 0" },
      { path: ["dimensions", 1, "axis"], message: "Axis 10 is not a spatial axis 1..9" },
      { path: ["dimensions", 2, "values", "from"], message: "Radii must be numbers from 0.001 to 1000, got 0" },
      { path: ["dimensions", 3, "axis"], message: "The radius of x9 is already swept by dimension 1" },
    ]);
    expect(checkSweepDefinition(stringAlongNine, { format: 1, dimensions: [{ kind: "radius", axis: 9, values: { kind: "list", values: [0.5, 1, 2] } }] })).toEqual([]);
    expect(sweepPointCount({ format: 1, dimensions: [{ kind: "radius", axis: 9, values: { kind: "range", from: 0.5, to: 2, steps: 7 } }] })).toBe(7n);
  });

  describe("edge cases", () => {
    it("refuses a negative or non-finite radius at its path", () => {
      const problems = checkSweepDefinition(stringAlongNine, {
        format: 1,
        dimensions: [{ kind: "radius", axis: 9, values: { kind: "range", from: 1, to: -1, steps: 3 } }],
      });
      expect(problems).toEqual([{ path: ["dimensions", 0, "values", "to"], message: "Radii must be numbers from 0.001 to 1000, got -1" }]);
      const infinite = checkSweepDefinition(stringAlongNine, { format: 1, dimensions: [{ kind: "radius", axis: 9, values: { kind: "list", values: [Infinity] } }] });
      expect(infinite.map((problem) => problem.path)).toEqual([["dimensions", 0, "values", "values", 0]]);
    });

    it("asks for at least one dimension and at most the limit", () => {
      expect(checkSweepDefinition(base, { format: 1, dimensions: [] })).toEqual([{ path: ["dimensions"], message: "Add at least one dimension to sweep over" }]);
      const many = Array.from({ length: sweepLimits.maxDimensions + 1 }, (_u, i) => ({ kind: "position" as const, stack: "a", axis: i + 1, values: { kind: "list" as const, values: [0] } }));
      expect(checkSweepDefinition(base, { format: 1, dimensions: many }).some((problem) => problem.message.startsWith("At most"))).toBe(true);
    });

    it("refuses empty lists and repeated values", () => {
      const problems = checkSweepDefinition(base, {
        format: 1,
        dimensions: [
          { kind: "position", stack: "a", axis: 9, values: { kind: "list", values: [] } },
          { kind: "count", stack: "b", values: { kind: "list", values: [2, 2] } },
        ],
      });
      expect(problems.map((problem) => problem.message)).toEqual([`Give 1 to ${sweepLimits.maxValues} values, got 0`, "A value is listed twice"]);
    });
  });
});
