import { describe, expect, it } from "vitest";
import type { Configuration } from "@/lib/boundary/types";
import { slabAndPoint } from "@/tests/fixtures/slab-and-point";
import { mergeConfigurations } from "./merge";

const base = () => slabAndPoint();

function withStack(doc: Configuration, id: string, change: Partial<Configuration["stacks"][number]>): Configuration {
  return { ...doc, stacks: doc.stacks.map((s) => (s.id === id ? { ...s, ...change } : s)) };
}

describe("mergeConfigurations", () => {
  it("combines edits of different fields of the same stack and of the settings", () => {
    const mine = { ...withStack(base(), "b", { label: "ada's point" }), levels: 5 };
    const theirs = withStack(base(), "a", { count: 3 });
    const merged = mergeConfigurations(base(), mine, theirs);
    expect(merged.conflicts).toEqual([]);
    expect(merged.document?.levels).toBe(5);
    expect(merged.document?.stacks.map((s) => [s.id, s.label, s.count])).toEqual([
      ["a", "slab", 3],
      ["b", "ada's point", 1],
    ]);
  });

  it("merges per axis: a move on one axis and a flip on another", () => {
    const mine = withStack(base(), "b", { position: { "9": 2 } });
    const theirs = withStack(base(), "b", { worldvolume: [1, 2], position: { "9": 1.5 } });
    const merged = mergeConfigurations(base(), mine, theirs).document;
    expect(merged?.stacks[1]).toMatchObject({ worldvolume: [1, 2], position: { "9": 2 } });
  });

  it("reports the same field changed differently on both sides, and gives no document", () => {
    const mine = withStack(base(), "a", { count: 2 });
    const theirs = withStack(base(), "a", { count: 3 });
    expect(mergeConfigurations(base(), mine, theirs)).toEqual({
      document: null,
      conflicts: [{ field: "stack a: N", mine: "2", theirs: "3" }],
    });
  });

  it("accepts the same change made on both sides", () => {
    const both = { ...base(), title: "Renamed" };
    expect(mergeConfigurations(base(), both, both).document?.title).toBe("Renamed");
  });

  it("keeps stacks added on either side, theirs first", () => {
    const extra = { id: "c", label: "c", count: 1, anti: false, worldvolume: [], position: {} };
    const other = { ...extra, id: "d", label: "d" };
    const merged = mergeConfigurations(base(), { ...base(), stacks: [...base().stacks, extra] }, { ...base(), stacks: [...base().stacks, other] });
    expect(merged.document?.stacks.map((s) => s.id)).toEqual(["a", "b", "d", "c"]);
  });

  it("deletes a stack deleted on one side and untouched on the other; a change against a delete conflicts", () => {
    const withoutB = { ...base(), stacks: base().stacks.slice(0, 1) };
    expect(mergeConfigurations(base(), withoutB, withStack(base(), "a", { label: "wide slab" })).document?.stacks.map((s) => s.id)).toEqual(["a"]);
    expect(mergeConfigurations(base(), withoutB, withStack(base(), "b", { count: 2 })).conflicts).toEqual([
      { field: "stack b", mine: "deleted", theirs: "changed" },
    ]);
    expect(mergeConfigurations(base(), withStack(base(), "b", { count: 2 }), withoutB).conflicts).toEqual([
      { field: "stack b", mine: "changed", theirs: "deleted" },
    ]);
  });

  it("does not mutate its inputs", () => {
    const [b, m, t] = [base(), withStack(base(), "a", { label: "x" }), { ...base(), levels: 9 }];
    const copies = structuredClone([b, m, t]);
    mergeConfigurations(b, m, t);
    expect([b, m, t]).toEqual(copies);
  });

  describe("edge cases", () => {
    it("is the stored version itself when the draft did not change", () => {
      const theirs = withStack(base(), "a", { count: 4 });
      expect(mergeConfigurations(base(), base(), theirs).document).toEqual(theirs);
    });
    it("treats a missing position as 0", () => {
      const mine = withStack(base(), "a", { position: { "9": 0 } });
      expect(mergeConfigurations(base(), mine, base()).conflicts).toEqual([]);
    });
  });
});
