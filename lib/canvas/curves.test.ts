import { describe, expect, it } from "vitest";
import { assignLanes, curveAnchors, curveBetween, curveMidpoint, curveToPoints, referencePoint } from "./curves";

const centre = { x: 0, y: 0 };

describe("curveAnchors", () => {
  it("joins two points directly", () => {
    expect(
      curveAnchors({ kind: "point", x: 1, y: 2 }, { kind: "point", x: 4, y: -2 }, centre),
    ).toEqual({ start: { x: 1, y: 2 }, end: { x: 4, y: -2 } });
  });

  it("drops from a point straight onto a line", () => {
    expect(curveAnchors({ kind: "point", x: 1, y: 2 }, { kind: "horizontal-line", y: -3 }, centre)).toEqual({
      start: { x: 1, y: 2 },
      end: { x: 1, y: -3 },
    });
  });

  it("hops perpendicularly between parallel lines, shifted by the lane", () => {
    const anchors = curveAnchors(
      { kind: "horizontal-line", y: 0 },
      { kind: "horizontal-line", y: 3.5 },
      { x: 2, y: 0 },
      -1,
      1.5,
    );
    expect(anchors).toEqual({ start: { x: 0.5, y: 0 }, end: { x: 0.5, y: 3.5 } });
  });
});

describe("referencePoint", () => {
  it("projects the view centre onto a vertical line", () => {
    expect(referencePoint({ kind: "vertical-line", x: 7 }, { x: 1, y: 2 })).toEqual({ x: 7, y: 2 });
  });
});

describe("curveBetween", () => {
  it("bows a quadratic arc to one side of the chord by the bend fraction", () => {
    const curve = curveBetween({ x: 0, y: 0 }, { x: 100, y: 0 }, { bend: 0.2 });
    expect(curve).toEqual({ kind: "quadratic", start: { x: 0, y: 0 }, control: { x: 50, y: 20 }, end: { x: 100, y: 0 } });
  });

  it("puts the label at the arc midpoint, half way to the control point", () => {
    // For a quadratic Bezier B(1/2) = (P0 + 2C + P2) / 4.
    const mid = curveMidpoint(curveBetween({ x: 0, y: 0 }, { x: 100, y: 0 }, { bend: 0.2 }));
    expect(mid).toEqual({ x: 50, y: 10 });
  });

  it("draws a loop through the anchor when the ends coincide", () => {
    const curve = curveBetween({ x: 10, y: 10 }, { x: 10.2, y: 10 }, { loopSize: 20 });
    expect(curve.kind).toBe("loop");
    const points = curveToPoints(curve);
    expect(points.slice(0, 2)).toEqual([10, 10]);
    expect(points.slice(6, 8)).toEqual([10, 10]);
    // The default loop points up and to the right (screen y decreases upwards).
    const mid = curveMidpoint(curve);
    expect(mid.x).toBeGreaterThan(10);
    expect(mid.y).toBeLessThan(10);
  });
});

describe("curveToPoints", () => {
  it("elevates a quadratic to the equivalent cubic (controls at 2/3 towards the control point)", () => {
    const points = curveToPoints({ kind: "quadratic", start: { x: 0, y: 0 }, control: { x: 30, y: 30 }, end: { x: 60, y: 0 } });
    expect(points).toEqual([0, 0, 20, 20, 40, 20, 60, 0]);
  });
});

describe("assignLanes", () => {
  it("fans out repeated pairs in either order, alternating sides", () => {
    expect(
      assignLanes([
        ["a", "b"],
        ["b", "a"],
        ["a", "c"],
        ["a", "b"],
      ]),
    ).toEqual([0, 1, 0, -1]);
  });
});
