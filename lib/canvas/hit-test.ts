/**
 * Hit-testing of projected stacks, in world coordinates.
 */
import type { ProjectedShape } from "./projection";
import type { Point, Rect } from "./viewport";

/** A projected stack with its id, in drawing order (later entries are on top). */
export interface ShapeEntry {
  id: string;
  shape: ProjectedShape;
}

/** Priority of a shape kind when several are under the pointer: points win over lines over fills. */
const kindPriority: Record<ProjectedShape["kind"], number> = {
  point: 0,
  "horizontal-line": 1,
  "vertical-line": 1,
  fill: 2,
};

/** Distance from `point` to a shape; 0 inside a fill. */
export function distanceToShape(shape: ProjectedShape, point: Point): number {
  switch (shape.kind) {
    case "point":
      return Math.hypot(point.x - shape.x, point.y - shape.y);
    case "horizontal-line":
      return Math.abs(point.y - shape.y);
    case "vertical-line":
      return Math.abs(point.x - shape.x);
    case "fill":
      return 0;
  }
}

/**
 * The id of the stack under `point`, within `tolerance` world units, or null. Among hits,
 * smaller shapes win (points, then lines, then fills); ties go to the nearest, then to
 * the one drawn last.
 */
export function hitTest(entries: ShapeEntry[], point: Point, tolerance: number): string | null {
  let best: { id: string; priority: number; distance: number } | null = null;
  for (const entry of entries) {
    const distance = distanceToShape(entry.shape, point);
    if (distance > tolerance) continue;
    const priority = kindPriority[entry.shape.kind];
    if (
      best === null ||
      priority < best.priority ||
      (priority === best.priority && distance <= best.distance)
    ) {
      best = { id: entry.id, priority, distance };
    }
  }
  return best?.id ?? null;
}

/** Normalises a rectangle given by two corners (any order). */
export function rectFromCorners(a: Point, b: Point): Rect {
  return {
    x: Math.min(a.x, b.x),
    y: Math.min(a.y, b.y),
    width: Math.abs(a.x - b.x),
    height: Math.abs(a.y - b.y),
  };
}

/**
 * Ids of stacks a marquee selects: points inside the rectangle and lines crossing it.
 * Fills are never marquee-selected (they would always match).
 */
export function stacksInRect(entries: ShapeEntry[], rect: Rect): string[] {
  const inX = (x: number) => x >= rect.x && x <= rect.x + rect.width;
  const inY = (y: number) => y >= rect.y && y <= rect.y + rect.height;
  return entries
    .filter(({ shape }) => {
      switch (shape.kind) {
        case "point":
          return inX(shape.x) && inY(shape.y);
        case "horizontal-line":
          return inY(shape.y);
        case "vertical-line":
          return inX(shape.x);
        case "fill":
          return false;
      }
    })
    .map((entry) => entry.id);
}
