import { describe, expect, it } from "vitest";
import { sweepDefinitionSchema } from "./sweep";

describe("sweepDefinitionSchema", () => {
  it("accepts a radius dimension with a list or a range of values", () => {
    const definition = {
      format: 1,
      dimensions: [
        { kind: "radius", axis: 9, values: { kind: "list", values: [0.5, 1, 2] } },
        { kind: "radius", axis: 8, values: { kind: "range", from: 0.5, to: 2, steps: 4 } },
      ],
    };
    expect(sweepDefinitionSchema.parse(definition)).toEqual(definition);
  });

  it("refuses a radius dimension without a whole-number axis, at its path", () => {
    const missing = sweepDefinitionSchema.safeParse({ format: 1, dimensions: [{ kind: "radius", values: { kind: "list", values: [1] } }] });
    expect(missing.success ? [] : missing.error.issues.map((issue) => issue.path)).toEqual([["dimensions", 0, "axis"]]);
    const fractional = sweepDefinitionSchema.safeParse({ format: 1, dimensions: [{ kind: "radius", axis: 8.5, values: { kind: "list", values: [1] } }] });
    expect(fractional.success ? [] : fractional.error.issues.map((issue) => issue.path)).toEqual([["dimensions", 0, "axis"]]);
  });

  it("refuses a radius that is not a finite number", () => {
    const result = sweepDefinitionSchema.safeParse({ format: 1, dimensions: [{ kind: "radius", axis: 9, values: { kind: "list", values: [1, Infinity] } }] });
    expect(result.success ? [] : result.error.issues.map((issue) => issue.path)).toEqual([["dimensions", 0, "values", "values", 1]]);
  });
});
