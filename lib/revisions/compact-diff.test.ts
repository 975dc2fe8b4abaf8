import { describe, expect, it } from "vitest";
import { tDualize } from "@/lib/boundary";
import type { Configuration } from "@/lib/boundary/types";
import { describeCompactDiff, diffCompactAxes } from "./compact-diff";
import { describeConfigurationDiff } from "./describe";
import { diffConfigurations } from "./diff";

const flat: Configuration = {
  format: 1,
  title: "Wrapped D1",
  theory: "IIB",
  stringScaleGeV: null,
  levels: 2,
  stacks: [{ id: "a", label: "", count: 1, anti: false, worldvolume: [9], position: {} }],
};
const onCircle: Configuration = { ...flat, format: 2, compact: { "9": 2 }, stacks: [{ ...flat.stacks[0]!, wilson: { "9": 1 } }] };

describe("diffCompactAxes", () => {
  it("names an axis made compact and a Wilson line set", () => {
    expect(diffCompactAxes(flat, onCircle)).toEqual({
      radii: [{ axis: 9, before: null, after: 2 }],
      wilsonLines: [{ stack: "a", axis: 9, before: 0, after: 1 }],
    });
    expect(describeCompactDiff(diffCompactAxes(onCircle, flat))).toEqual([
      "x9 made non-compact (radius was 2)",
      "Stack a: Wilson line on x9 1 → 0",
    ]);
  });

  it("names the radius and the boundary flip of a T-duality in the revision diff", () => {
    const diff = diffConfigurations(onCircle, tDualize(onCircle, 9));
    expect(diff.identical).toBe(false);
    expect(describeConfigurationDiff(diff)).toEqual([
      "Theory: IIB → IIA",
      "Stack a: x9 N → D",
      "Radius of x9: 2 → 0.5",
      "Stack a: Wilson line on x9 1 → 0",
    ]);
  });

  it("finds nothing between equal documents", () => {
    expect(diffConfigurations(onCircle, structuredClone(onCircle)).identical).toBe(true);
  });
});
