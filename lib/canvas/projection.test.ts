import { describe, expect, it } from "vitest";
import { closestPointOnShape, draggableAxes, positionOn, projectStack } from "./projection";

const axes = { horizontal: 4, vertical: 5 };

describe("projectStack", () => {
  it("draws a stack Dirichlet on both display axes as a point at its position", () => {
    const stack = { worldvolume: [1, 2, 3], position: { "4": 2.5, "5": -1 } };
    expect(projectStack(stack, axes)).toEqual({ kind: "point", x: 2.5, y: -1 });
  });

  it("draws a stack Neumann along the horizontal axis as a horizontal line at its vertical position", () => {
    const stack = { worldvolume: [1, 2, 3, 4], position: { "5": 3 } };
    expect(projectStack(stack, axes)).toEqual({ kind: "horizontal-line", y: 3 });
  });

  it("draws a stack Neumann along the vertical axis as a vertical line", () => {
    const stack = { worldvolume: [5], position: { "4": -2 } };
    expect(projectStack(stack, axes)).toEqual({ kind: "vertical-line", x: -2 });
  });

  it("fills the view for a stack Neumann on both display axes", () => {
    expect(projectStack({ worldvolume: [4, 5], position: {} }, axes)).toEqual({ kind: "fill" });
  });

  it("ignores positions on Neumann axes", () => {
    const stack = { worldvolume: [4], position: { "4": 99, "5": 1 } };
    expect(projectStack(stack, axes)).toEqual({ kind: "horizontal-line", y: 1 });
  });

  describe("edge cases", () => {
    it("puts a missing Dirichlet position at 0", () => {
      expect(projectStack({ worldvolume: [], position: {} }, axes)).toEqual({ kind: "point", x: 0, y: 0 });
    });
  });
});

describe("positionOn", () => {
  it("reads a position by axis number and defaults to 0", () => {
    expect(positionOn({ position: { "9": 3.5 } }, 9)).toBe(3.5);
    expect(positionOn({ position: { "9": 3.5 } }, 8)).toBe(0);
  });
});

describe("draggableAxes", () => {
  it("lets a point move on both axes, a line across itself, a fill not at all", () => {
    expect(draggableAxes({ kind: "point", x: 0, y: 0 })).toEqual({ x: true, y: true });
    expect(draggableAxes({ kind: "horizontal-line", y: 0 })).toEqual({ x: false, y: true });
    expect(draggableAxes({ kind: "vertical-line", x: 0 })).toEqual({ x: true, y: false });
    expect(draggableAxes({ kind: "fill" })).toEqual({ x: false, y: false });
  });
});

describe("closestPointOnShape", () => {
  it("drops a perpendicular onto a line", () => {
    expect(closestPointOnShape({ kind: "horizontal-line", y: 2 }, { x: 5, y: -1 })).toEqual({ x: 5, y: 2 });
    expect(closestPointOnShape({ kind: "vertical-line", x: 2 }, { x: 5, y: -1 })).toEqual({ x: 2, y: -1 });
  });

  it("returns the point itself for a point and the target for a fill", () => {
    expect(closestPointOnShape({ kind: "point", x: 1, y: 1 }, { x: 5, y: 5 })).toEqual({ x: 1, y: 1 });
    expect(closestPointOnShape({ kind: "fill" }, { x: 5, y: 5 })).toEqual({ x: 5, y: 5 });
  });
});
