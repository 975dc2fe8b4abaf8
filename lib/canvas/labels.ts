/**
 * Placement of text labels on the canvas, in screen pixels.
 */
import type { ProjectedShape } from "./projection";
import type { Point, Rect, Viewport } from "./viewport";
import { toScreen } from "./viewport";

/** A label to place: its preferred top-left corner and its box size. */
export interface LabelRequest {
  id: string;
  anchor: Point;
  width: number;
  height: number;
}

/** Options of {@link placeLabels}. */
export interface PlaceLabelsOptions {
  /** Pixels to step down per attempt when a label overlaps one already placed (default: its height + 2). */
  step?: number;
  /** Attempts before giving up and keeping the last position (default 12). */
  maxAttempts?: number;
}

/**
 * The preferred top-left corner of a stack's name label: beside a point, above the left end
 * of a horizontal line, beside the top of a vertical line, in the top-left corner for a
 * fill (`slot` stacks several fills).
 */
export function stackLabelAnchor(
  shape: ProjectedShape,
  viewport: Viewport,
  stage: { width: number; height: number },
  slot = 0,
): Point {
  switch (shape.kind) {
    case "point": {
      const p = toScreen({ x: shape.x, y: shape.y }, viewport);
      return { x: p.x + 12, y: p.y - 26 };
    }
    case "horizontal-line": {
      const p = toScreen({ x: 0, y: shape.y }, viewport);
      return { x: 12, y: p.y - 22 };
    }
    case "vertical-line": {
      const p = toScreen({ x: shape.x, y: 0 }, viewport);
      return { x: p.x + 8, y: 12 };
    }
    case "fill":
      return { x: Math.max(12, stage.width - 180), y: 12 + slot * 20 };
  }
}

/** True when two rectangles overlap (touching edges do not count). */
export function rectsOverlap(a: Rect, b: Rect): boolean {
  return a.x < b.x + b.width && b.x < a.x + a.width && a.y < b.y + b.height && b.y < a.y + a.height;
}

/**
 * Places labels in order, moving each one down until it overlaps none placed before it.
 * Returns the top-left corner per id. Input order sets priority.
 */
export function placeLabels(requests: LabelRequest[], options: PlaceLabelsOptions = {}): Map<string, Point> {
  const maxAttempts = options.maxAttempts ?? 12;
  const placed: Rect[] = [];
  const result = new Map<string, Point>();
  for (const request of requests) {
    const step = options.step ?? request.height + 2;
    let box: Rect = { x: request.anchor.x, y: request.anchor.y, width: request.width, height: request.height };
    for (let attempt = 0; attempt < maxAttempts && placed.some((other) => rectsOverlap(box, other)); attempt++) {
      box = { ...box, y: box.y + step };
    }
    placed.push(box);
    result.set(request.id, { x: box.x, y: box.y });
  }
  return result;
}

/** Rough width of a text in pixels for a monospace-ish font: enough for overlap checks. */
export function estimateTextWidth(text: string, fontSize: number): number {
  return Math.ceil(text.length * fontSize * 0.6);
}
