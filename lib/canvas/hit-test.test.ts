import { describe, expect, it } from "vitest";
import { distanceToShape, hitTest, rectFromCorners, stacksInRect, type ShapeEntry } from "./hit-test";

const entries: ShapeEntry[] = [
  { id: "bulk", shape: { kind: "fill" } },
  { id: "wall", shape: { kind: "horizontal-line", y: 0 } },
  { id: "probe", shape: { kind: "point", x: 1, y: 0.1 } },
  { id: "rod", shape: { kind: "vertical-line", x: 5 } },
];

describe("hitTest", () => {
  it("prefers a point over a line and a fill under the pointer", () => {
    expect(hitTest(entries, { x: 1.05, y: 0.05 }, 0.2)).toBe("probe");
  });

  it("picks the line when the point is out of reach", () => {
    expect(hitTest(entries, { x: -3, y: 0.1 }, 0.2)).toBe("wall");
  });

  it("falls back to the fill anywhere else", () => {
    expect(hitTest(entries, { x: -3, y: 4 }, 0.2)).toBe("bulk");
  });

  it("returns null when nothing is in reach", () => {
    expect(hitTest(entries.slice(1), { x: -3, y: 4 }, 0.2)).toBeNull();
  });

  it("breaks a tie between equal shapes in favour of the one drawn last", () => {
    const twins: ShapeEntry[] = [
      { id: "first", shape: { kind: "point", x: 0, y: 0 } },
      { id: "second", shape: { kind: "point", x: 0, y: 0 } },
    ];
    expect(hitTest(twins, { x: 0, y: 0 }, 0.1)).toBe("second");
  });
});

describe("distanceToShape", () => {
  it("measures Euclidean distance to a point and perpendicular distance to a line", () => {
    // 3-4-5 right triangle.
    expect(distanceToShape({ kind: "point", x: 0, y: 0 }, { x: 3, y: 4 })).toBe(5);
    expect(distanceToShape({ kind: "vertical-line", x: 2 }, { x: -1, y: 9 })).toBe(3);
  });
});

describe("stacksInRect", () => {
  it("selects points inside and lines crossing the rectangle, never fills", () => {
    const rect = rectFromCorners({ x: 6, y: 1 }, { x: 0.5, y: -1 });
    expect(stacksInRect(entries, rect)).toEqual(["wall", "probe", "rod"]);
  });

  it("leaves out points outside", () => {
    const rect = rectFromCorners({ x: 2, y: 1 }, { x: 3, y: 2 });
    expect(stacksInRect(entries, rect)).toEqual([]);
  });
});

describe("rectFromCorners", () => {
  it("normalises corners given in any order", () => {
    expect(rectFromCorners({ x: 3, y: -1 }, { x: 1, y: 2 })).toEqual({ x: 1, y: -1, width: 2, height: 3 });
  });
});
