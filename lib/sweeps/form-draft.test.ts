import { describe, expect, it } from "vitest";
import { checkSweepDefinition } from "./definition";
import { draftToDefinition, firstValues, newDimensionDraft, toDimensionDraft } from "./form-draft";
import { braneAntibraneAtOrigin as base } from "./test-configurations";
import type { SweepDimension } from "./types";

describe("newDimensionDraft", () => {
  it("starts every kind with a definition the configuration accepts", () => {
    for (const kind of ["position", "count", "orientation", "boundary", "radius"] as const) {
      const { definition, problems } = draftToDefinition([newDimensionDraft(base, kind)]);
      expect(problems).toEqual([]);
      expect(checkSweepDefinition(base, definition)).toEqual([]);
    }
  });

  it("moves the last stack along its last Dirichlet axis", () => {
    expect(newDimensionDraft(base, "position")).toMatchObject({ stack: "b", axis: 9 });
  });

  it("sweeps the radius of the base's first compact axis, else the last axis, with positive radii", () => {
    expect(newDimensionDraft(base, "radius")).toEqual({ kind: "radius", axis: 9, values: firstValues.radius.range });
    expect(newDimensionDraft({ ...base, format: 2, compact: { "7": 2, "5": 1 } }, "radius")).toMatchObject({ axis: 5 });
    for (const mode of ["list", "range"] as const) {
      const { definition } = draftToDefinition([{ kind: "radius", axis: 9, values: firstValues.radius[mode] }]);
      expect(checkSweepDefinition(base, definition)).toEqual([]);
    }
  });
});

describe("draftToDefinition", () => {
  it("reads lists and ranges as typed", () => {
    const { definition } = draftToDefinition([
      { kind: "count", stack: "a", values: { mode: "list", text: " 1, 2;3  4 " } },
      { kind: "position", stack: "b", axis: 9, values: { mode: "range", from: "0", to: "2.5", steps: "6" } },
    ]);
    expect(definition.dimensions).toEqual([
      { kind: "count", stack: "a", values: { kind: "list", values: [1, 2, 3, 4] } },
      { kind: "position", stack: "b", axis: 9, values: { kind: "range", from: 0, to: 2.5, steps: 6 } },
    ]);
  });

  it("names text that is not a number at its field", () => {
    const { problems } = draftToDefinition([{ kind: "position", stack: "b", axis: 9, values: { mode: "range", from: "", to: "x", steps: "3" } }]);
    expect(problems).toEqual([
      { path: ["dimensions", 0, "values", "from"], message: "Enter a number" },
      { path: ["dimensions", 0, "values", "to"], message: '"x" is not a number' },
    ]);
  });

  it("round-trips a definition through its draft", () => {
    const dimensions: SweepDimension[] = [
      { kind: "position", stack: "b", axis: 9, values: { kind: "list", values: [0, 1.5] } },
      { kind: "count", stack: "a", values: { kind: "range", from: 1, to: 4, steps: 4 } },
      { kind: "orientation", stack: "b" },
      { kind: "radius", axis: 8, values: { kind: "range", from: 0.5, to: 2, steps: 4 } },
    ];
    expect(draftToDefinition(dimensions.map(toDimensionDraft)).definition.dimensions).toEqual(dimensions);
  });
});
