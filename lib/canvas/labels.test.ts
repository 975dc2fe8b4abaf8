import { describe, expect, it } from "vitest";
import { estimateTextWidth, placeLabels, rectsOverlap, stackLabelAnchor } from "./labels";
import { createViewport } from "./viewport";

describe("placeLabels", () => {
  it("keeps labels that do not overlap where they asked to be", () => {
    const placed = placeLabels([
      { id: "a", anchor: { x: 0, y: 0 }, width: 50, height: 10 },
      { id: "b", anchor: { x: 100, y: 0 }, width: 50, height: 10 },
    ]);
    expect(placed.get("a")).toEqual({ x: 0, y: 0 });
    expect(placed.get("b")).toEqual({ x: 100, y: 0 });
  });

  it("moves a later label down until it clears the earlier ones", () => {
    const placed = placeLabels([
      { id: "a", anchor: { x: 0, y: 0 }, width: 50, height: 10 },
      { id: "b", anchor: { x: 10, y: 4 }, width: 50, height: 10 },
      { id: "c", anchor: { x: 20, y: 0 }, width: 50, height: 10 },
    ]);
    expect(placed.get("b")).toEqual({ x: 10, y: 16 });
    // c must clear both a (0..10) and b (16..26) whatever path it took.
    const c = placed.get("c")!;
    const boxes = ["a", "b"].map((id) => ({ ...placed.get(id)!, width: 50, height: 10 }));
    for (const box of boxes) expect(rectsOverlap({ ...c, width: 50, height: 10 }, box)).toBe(false);
  });

  it("stops after the attempt limit", () => {
    const placed = placeLabels(
      [
        { id: "a", anchor: { x: 0, y: 0 }, width: 50, height: 1000 },
        { id: "b", anchor: { x: 0, y: 0 }, width: 50, height: 10 },
      ],
      { maxAttempts: 3 },
    );
    expect(placed.get("b")).toEqual({ x: 0, y: 36 });
  });
});

describe("rectsOverlap", () => {
  it("treats touching edges as not overlapping", () => {
    expect(rectsOverlap({ x: 0, y: 0, width: 10, height: 10 }, { x: 10, y: 0, width: 5, height: 5 })).toBe(false);
    expect(rectsOverlap({ x: 0, y: 0, width: 10, height: 10 }, { x: 9, y: 9, width: 5, height: 5 })).toBe(true);
  });
});

describe("stackLabelAnchor", () => {
  const vp = createViewport(400, 300, 40);
  const stage = { width: 400, height: 300 };

  it("puts a point's label above and to the right of it (screen y = 150 - 40 - 26)", () => {
    expect(stackLabelAnchor({ kind: "point", x: 1, y: 1 }, vp, stage)).toEqual({ x: 252, y: 84 });
  });

  it("puts a horizontal line's label at the left edge above the line", () => {
    expect(stackLabelAnchor({ kind: "horizontal-line", y: -1 }, vp, stage)).toEqual({ x: 12, y: 168 });
  });

  it("stacks fill labels by slot in the top-right corner", () => {
    expect(stackLabelAnchor({ kind: "fill" }, vp, stage, 2)).toEqual({ x: 220, y: 52 });
  });
});

describe("estimateTextWidth", () => {
  it("scales with length and font size", () => {
    expect(estimateTextWidth("abcd", 10)).toBe(24);
  });
});
