/**
 * Projection of a stack onto the two display axes the user picked.
 *
 * A stack that is Dirichlet on both display axes is a point at its position; Neumann on
 * exactly one of them is a line along that axis (at its position on the other); Neumann on
 * both fills the view.
 */
import type { Stack } from "@/lib/boundary/types";
import type { Point } from "./viewport";

/** The two spatial axes (1..D-1) drawn horizontally and vertically. */
export interface DisplayAxes {
  horizontal: number;
  vertical: number;
}

/** What a stack looks like on the canvas, in world coordinates. */
export type ProjectedShape =
  | { kind: "point"; x: number; y: number }
  /** Neumann along the horizontal axis: a horizontal line at height `y`. */
  | { kind: "horizontal-line"; y: number }
  /** Neumann along the vertical axis: a vertical line at `x`. */
  | { kind: "vertical-line"; x: number }
  | { kind: "fill" };

/** True when `axis` is a Neumann (worldvolume) axis of the stack. */
export function isNeumann(stack: Pick<Stack, "worldvolume">, axis: number): boolean {
  return stack.worldvolume.includes(axis);
}

/** Position of the stack on a Dirichlet axis (missing means 0). */
export function positionOn(stack: Pick<Stack, "position">, axis: number): number {
  const value = stack.position[String(axis)];
  return typeof value === "number" && Number.isFinite(value) ? value : 0;
}

/** Projects a stack onto the display axes. */
export function projectStack(
  stack: Pick<Stack, "worldvolume" | "position">,
  axes: DisplayAxes,
): ProjectedShape {
  const alongH = isNeumann(stack, axes.horizontal);
  const alongV = isNeumann(stack, axes.vertical);
  if (alongH && alongV) return { kind: "fill" };
  if (alongH) return { kind: "horizontal-line", y: positionOn(stack, axes.vertical) };
  if (alongV) return { kind: "vertical-line", x: positionOn(stack, axes.horizontal) };
  return { kind: "point", x: positionOn(stack, axes.horizontal), y: positionOn(stack, axes.vertical) };
}

/**
 * The display axes a drag may move for this shape: both for a point, the Dirichlet one
 * for a line, none for a fill.
 */
export function draggableAxes(shape: ProjectedShape): { x: boolean; y: boolean } {
  switch (shape.kind) {
    case "point":
      return { x: true, y: true };
    case "horizontal-line":
      return { x: false, y: true };
    case "vertical-line":
      return { x: true, y: false };
    case "fill":
      return { x: false, y: false };
  }
}

/**
 * The point of a shape closest to `target` (world coordinates): the point itself, the foot
 * of the perpendicular on a line, or the target itself inside a fill.
 */
export function closestPointOnShape(shape: ProjectedShape, target: Point): Point {
  switch (shape.kind) {
    case "point":
      return { x: shape.x, y: shape.y };
    case "horizontal-line":
      return { x: target.x, y: shape.y };
    case "vertical-line":
      return { x: shape.x, y: target.y };
    case "fill":
      return { x: target.x, y: target.y };
  }
}
