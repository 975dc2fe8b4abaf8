import { describe, expect, it } from "vitest";
import type { Configuration } from "@/lib/boundary/types";
import { mergeConfigurations } from "./merge";

const base: Configuration = {
  format: 2,
  title: "Wrapped",
  theory: "IIB",
  stringScaleGeV: null,
  levels: 2,
  compact: { "9": 2 },
  stacks: [
    { id: "a", label: "", count: 1, anti: false, worldvolume: [9], position: {} },
    { id: "b", label: "", count: 1, anti: false, worldvolume: [9], position: {} },
  ],
};

describe("mergeConfigurations on compact axes", () => {
  it("keeps a radius changed in the draft and a Wilson line set in the stored version", () => {
    const mine: Configuration = { ...base, compact: { "9": 3 } };
    const theirs: Configuration = { ...base, stacks: [base.stacks[0]!, { ...base.stacks[1]!, wilson: { "9": 1 } }] };
    const merged = mergeConfigurations(base, mine, theirs);
    expect(merged.document?.compact).toEqual({ "9": 3 });
    expect(merged.document?.stacks[1]?.wilson).toEqual({ "9": 1 });
  });

  it("reports a radius changed differently on both sides", () => {
    const merged = mergeConfigurations(base, { ...base, compact: { "9": 3 } }, { ...base, compact: { "9": 4 } });
    expect(merged.conflicts).toEqual([{ field: "radius of x9", mine: "3", theirs: "4" }]);
  });

  it("moves a flat document made compact in the draft to format 2", () => {
    const flat: Configuration = { ...base, format: 1, compact: undefined };
    delete flat.compact;
    const merged = mergeConfigurations(flat, { ...flat, compact: { "9": 1 } }, { ...flat, title: "Renamed" });
    expect(merged.document).toMatchObject({ format: 2, title: "Renamed", compact: { "9": 1 } });
  });
});
