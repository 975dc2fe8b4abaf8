import { describe, expect, it } from "vitest";
import { checkConfiguration } from "../boundary";
import { dimensionLabel, dimensionValue, formatDimensionValue, isNumericDimension, valueAt } from "./dimension";
import { sweepPointCount } from "./definition";
import { pointDigits, pointDocument, pointNumbering, pointValues } from "./enumerate";
import { braneAntibraneAtOrigin as base, stringAlongNine, twoThreeBranes } from "./test-configurations";
import type { SweepDefinition, SweepDimension } from "./types";

/** The N/D table of the chosen stacks on the chosen axes, one string of N/D per axis (a column). */
function columnsOf(document: ReturnType<typeof pointDocument>, stacks: string[], axes: number[]): string[] {
  return axes.map((axis) =>
    stacks.map((id) => (document.stacks.find((stack) => stack.id === id)?.worldvolume.includes(axis) ? "N" : "D")).join(""),
  );
}

describe("pointValues", () => {
  it("numbers points like nested loops, the first dimension slowest", () => {
    const definition: SweepDefinition = {
      format: 1,
      dimensions: [
        { kind: "orientation", stack: "b" },
        { kind: "position", stack: "b", axis: 9, values: { kind: "list", values: [0, 1, 2] } },
      ],
    };
    expect([0, 1, 2, 3, 4, 5].map((i) => pointValues(definition, i))).toEqual([
      [{ kind: "orientation", anti: false }, { kind: "position", value: 0 }],
      [{ kind: "orientation", anti: false }, { kind: "position", value: 1 }],
      [{ kind: "orientation", anti: false }, { kind: "position", value: 2 }],
      [{ kind: "orientation", anti: true }, { kind: "position", value: 0 }],
      [{ kind: "orientation", anti: true }, { kind: "position", value: 1 }],
      [{ kind: "orientation", anti: true }, { kind: "position", value: 2 }],
    ]);
  });

  describe("edge cases", () => {
    it("refuses a point outside the sweep", () => {
      const definition: SweepDefinition = { format: 1, dimensions: [{ kind: "orientation", stack: "b" }] };
      expect(() => pointValues(definition, 2)).toThrow(RangeError);
      expect(() => pointValues(definition, -1)).toThrow(RangeError);
    });
  });
});

describe("pointNumbering", () => {
  it("decodes every point as pointDigits does and counts the points as sweepPointCount does", () => {
    const definition: SweepDefinition = {
      format: 1,
      dimensions: [
        { kind: "orientation", stack: "b" },
        { kind: "position", stack: "b", axis: 9, values: { kind: "list", values: [0, 1, 2] } },
        { kind: "count", stack: "a", values: { kind: "list", values: [1, 2, 3, 4] } },
      ],
    };
    const numbering = pointNumbering(definition);
    expect(numbering.total).toBe(Number(sweepPointCount(definition)));
    for (let i = 0; i < numbering.total; i += 1) expect(numbering.digits(i)).toEqual(pointDigits(definition, i));
    expect(() => numbering.digits(numbering.total)).toThrow(RangeError);
  });
});

describe("valueAt", () => {
  it("spaces a range evenly with both ends, without floating-point noise", () => {
    const range = { kind: "range", from: 0, to: 1, steps: 11 } as const;
    expect(Array.from({ length: 11 }, (_u, i) => valueAt(range, i))).toEqual([0, 0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7, 0.8, 0.9, 1]);
    expect(valueAt({ kind: "range", from: 2, to: 5, steps: 1 }, 0)).toBe(2);
  });
});

describe("pointDocument", () => {
  it("gives every N/D assignment once with symmetry 'all'", () => {
    const dimension: SweepDimension = { kind: "boundary", stacks: ["p", "q"], axes: [4, 5], symmetry: "all" };
    const definition: SweepDefinition = { format: 1, dimensions: [dimension] };
    const tables = Array.from({ length: Number(sweepPointCount(definition)) }, (_u, i) => columnsOf(pointDocument(twoThreeBranes, definition, i), ["p", "q"], [4, 5]).join("|"));
    expect(tables).toHaveLength(16);
    expect(new Set(tables).size).toBe(16);
  });

  it("gives one representative of every orbit under relabelling the axes", () => {
    const stacks = ["p", "q"];
    const axes = [4, 5, 6];
    const all: SweepDefinition = { format: 1, dimensions: [{ kind: "boundary", stacks, axes, symmetry: "all" }] };
    const reduced: SweepDefinition = { format: 1, dimensions: [{ kind: "boundary", stacks, axes, symmetry: "relabel-axes" }] };
    const orbitOf = (columns: string[]) => [...columns].sort().join("|");
    const orbits = new Set(Array.from({ length: 64 }, (_u, i) => orbitOf(columnsOf(pointDocument(twoThreeBranes, all, i), stacks, axes))));
    const representatives = Array.from({ length: Number(sweepPointCount(reduced)) }, (_u, i) => orbitOf(columnsOf(pointDocument(twoThreeBranes, reduced, i), stacks, axes)));
    expect(representatives).toHaveLength(orbits.size);
    expect(new Set(representatives)).toEqual(orbits);
  });

  it("drops the position of an axis that becomes Neumann and keeps sorted worldvolumes", () => {
    const definition: SweepDefinition = {
      format: 1,
      dimensions: [
        { kind: "boundary", stacks: ["q"], axes: [9, 4], symmetry: "all" },
        { kind: "position", stack: "q", axis: 9, values: { kind: "list", values: [3] } },
      ],
    };
    // Columns [1, 1]: q is Neumann on x9 and x4.
    const neumann = pointDocument(twoThreeBranes, definition, 3).stacks[1];
    expect(neumann?.worldvolume).toEqual([1, 2, 3, 4, 9]);
    expect(neumann?.position).toEqual({ "8": 0.5 });
    // Columns [0, 0]: Dirichlet on both; the position dimension sets x9.
    expect(pointDocument(twoThreeBranes, definition, 0).stacks[1]?.position).toEqual({ "9": 3, "8": 0.5 });
  });

  it("sets counts and orientation and leaves the base untouched", () => {
    const before = JSON.stringify(base);
    const definition: SweepDefinition = {
      format: 1,
      dimensions: [
        { kind: "count", stack: "a", values: { kind: "list", values: [3, 5] } },
        { kind: "orientation", stack: "b" },
      ],
    };
    const document = pointDocument(base, definition, 2);
    expect(document.stacks.map((stack) => [stack.count, stack.anti])).toEqual([
      [5, false],
      [1, false],
    ]);
    expect(checkConfiguration(document)).toEqual([]);
    expect(JSON.stringify(base)).toBe(before);
  });
});

describe("pointDocument with a radius dimension", () => {
  const radii: SweepDefinition = { format: 1, dimensions: [{ kind: "radius", axis: 9, values: { kind: "range", from: 0.5, to: 2, steps: 4 } }] };

  it("puts a non-compact axis of a format 1 base on a circle, making the document format 2", () => {
    const before = JSON.stringify(stringAlongNine);
    const documents = [0, 1, 2, 3].map((i) => pointDocument(stringAlongNine, radii, i));
    expect(documents.map((document) => [document.format, document.compact])).toEqual([
      [2, { "9": 0.5 }],
      [2, { "9": 1 }],
      [2, { "9": 1.5 }],
      [2, { "9": 2 }],
    ]);
    for (const document of documents) expect(checkConfiguration(document)).toEqual([]);
    expect(JSON.stringify(stringAlongNine)).toBe(before);
  });

  it("replaces the swept radius and keeps the base's other circles", () => {
    const base2 = { ...stringAlongNine, format: 2 as const, compact: { "8": 3, "9": 7 } };
    expect(pointDocument(base2, radii, 1).compact).toEqual({ "8": 3, "9": 1 });
    expect(base2.compact).toEqual({ "8": 3, "9": 7 });
  });

  it("leaves the format and circles alone without a radius dimension", () => {
    const definition: SweepDefinition = { format: 1, dimensions: [{ kind: "orientation", stack: "w" }] };
    const document = pointDocument(stringAlongNine, definition, 1);
    expect(document.format).toBe(1);
    expect(document.compact).toBeUndefined();
  });

  it("labels the dimension and its values as numbers", () => {
    const dimension = radii.dimensions[0] as SweepDimension;
    expect(dimensionLabel(dimension)).toBe("R9");
    expect(isNumericDimension(dimension)).toBe(true);
    expect(formatDimensionValue(dimension, dimensionValue(dimension, 2))).toBe("1.5");
  });
});

describe("formatDimensionValue", () => {
  it("writes a boundary choice per stack in axis order", () => {
    const dimension: SweepDimension = { kind: "boundary", stacks: ["a", "b"], axes: [4, 5], symmetry: "all" };
    // Column 1 = only a Neumann; column 3 = both Neumann.
    expect(formatDimensionValue(dimension, { kind: "boundary", columns: [1, 3] })).toBe("a NN · b DN");
    expect(formatDimensionValue(dimension, dimensionValue(dimension, 0))).toBe("a DD · b DD");
  });
});
