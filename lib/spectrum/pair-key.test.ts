import { describe, expect, it } from "vitest";
import { pairKey } from "./pair-key";

describe("pairKey", () => {
  it("gives both orders of a pair the same key", () => {
    expect(pairKey("wall", "probe")).toBe("probe|wall");
    expect(pairKey("probe", "wall")).toBe("probe|wall");
  });

  it("keys a stack with itself", () => {
    expect(pairKey("a", "a")).toBe("a|a");
  });

  it("keeps pairs that share a prefix apart", () => {
    expect(pairKey("a", "b-c")).not.toBe(pairKey("a-b", "c"));
  });
});
