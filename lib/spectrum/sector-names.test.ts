import { describe, expect, it } from "vitest";
import { compareNatural, sectorNames } from "./sector-names";

describe("sectorNames", () => {
  const names = sectorNames([
    { id: "w", label: "wall" },
    { id: "p", label: "probe" },
    { id: "s3", label: "" },
  ]);

  it("names a sector by its stacks' labels and keeps the ids for a tooltip", () => {
    expect(names.sector(["w", "p"])).toEqual({ text: "wall\u2013probe", ids: "w\u2013p" });
    expect(names.sector(["p", "p"]).text).toBe("probe\u2013probe");
  });

  it("falls back to the id for an empty label or an unknown stack", () => {
    expect(names.stack("s3")).toBe("s3");
    expect(names.stack("nobody")).toBe("nobody");
  });

  it("tells apart stacks that share a label by their ids", () => {
    const twins = sectorNames([
      { id: "a", label: "D3" },
      { id: "b", label: "D3" },
    ]);
    expect(twins.sector(["a", "b"]).text).toBe("D3 (a)\u2013D3 (b)");
  });

  it("matches a label or an id, case-insensitively", () => {
    expect(names.matches(["w", "p"], "PRO")).toBe(true);
    expect(names.matches(["w", "p"], "w")).toBe(true);
    expect(names.matches(["w", "w"], "probe")).toBe(false);
    expect(names.matches(["w", "w"], "  ")).toBe(true);
  });

  it("orders sectors by the first stack's name, then the second's", () => {
    const pairs: Array<[string, string]> = [
      ["w", "w"],
      ["p", "w"],
      ["p", "p"],
    ];
    expect([...pairs].sort(names.compare)).toEqual([
      ["p", "p"],
      ["p", "w"],
      ["w", "w"],
    ]);
  });
});

describe("compareNatural", () => {
  it("orders digit runs by value and ignores case (common practice: 'natural sort order')", () => {
    expect(["s10", "s2", "S1", "s1a"].sort(compareNatural)).toEqual(["S1", "s1a", "s2", "s10"]);
    expect(["x9", "x10", "x100", "x11"].sort(compareNatural)).toEqual(["x9", "x10", "x11", "x100"]);
  });

  it("is a total order: names equal but for case still compare, and only identical strings give 0", () => {
    expect(compareNatural("a", "A")).not.toBe(0);
    expect(Math.sign(compareNatural("a", "A"))).toBe(-Math.sign(compareNatural("A", "a")));
    expect(compareNatural("s2", "s2")).toBe(0);
  });
});
