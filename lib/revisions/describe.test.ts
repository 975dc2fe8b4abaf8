import { describe, expect, it } from "vitest";
import type { Configuration } from "@/lib/boundary/types";
import { slabAndPoint } from "@/tests/fixtures/slab-and-point";
import { describeConfigurationDiff } from "./describe";
import { diffConfigurations } from "./diff";

const before = slabAndPoint();

describe("describeConfigurationDiff", () => {
  it("writes one line per changed setting, added, removed and changed stack", () => {
    const after: Configuration = {
      ...before,
      stringScaleGeV: 1e16,
      stacks: [
        { ...before.stacks[0]!, count: 3, worldvolume: [1, 2, 3, 5], position: { "4": 0 } },
        { id: "c", label: "new", count: 2, anti: true, worldvolume: [1, 2], position: {} },
      ],
    };
    expect(describeConfigurationDiff(diffConfigurations(before, after))).toEqual([
      "String scale (GeV): none → 1e16",
      "Added stack c (D2, N = 2)",
      "Removed stack b",
      "Stack a: N 1 → 3, x4 N → D, x5 D → N",
    ]);
  });

  it("is empty for identical documents", () => {
    expect(describeConfigurationDiff(diffConfigurations(before, before))).toEqual([]);
  });
});
