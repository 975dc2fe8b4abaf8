/**
 * Geometry of the string curves drawn between stacks, in screen pixels.
 *
 * Each sector (a pair of stacks) is drawn as a Bezier curve between an anchor on each
 * stack. Distinct pairs that would share anchors are spread into "lanes" along the free
 * direction of lines so their curves and labels do not sit on top of each other. A stack
 * with itself (or two stacks drawn at the same spot) gets a loop.
 */
import { closestPointOnShape, type ProjectedShape } from "./projection";
import type { Point } from "./viewport";

/** A curve in screen pixels: quadratic (one control point) or a cubic loop (two). */
export type CurvePath =
  | { kind: "quadratic"; start: Point; control: Point; end: Point }
  | { kind: "loop"; start: Point; control1: Point; control2: Point; end: Point };

/** Options of {@link curveBetween}. */
export interface CurveBetweenOptions {
  /** Bend as a fraction of the chord length (default 0.25); its sign picks the side. */
  bend?: number;
  /** Loop size in pixels for self-sectors and coincident anchors (default 36). */
  loopSize?: number;
  /** Direction of a loop in radians, measured from +x towards screen-up (default pi/4). */
  loopAngle?: number;
}

/**
 * A point that stands for a shape when a curve needs an anchor and the other end is not
 * known yet: the point itself, the view centre projected onto a line, or the view centre
 * for a fill. `lane` shifts the result along the free direction by `laneSpacing` world
 * units per lane so that several curves on one line separate.
 */
export function referencePoint(
  shape: ProjectedShape,
  viewCentre: Point,
  lane = 0,
  laneSpacing = 1,
): Point {
  const shift = lane * laneSpacing;
  switch (shape.kind) {
    case "point":
      return { x: shape.x, y: shape.y };
    case "horizontal-line":
      return { x: viewCentre.x + shift, y: shape.y };
    case "vertical-line":
      return { x: shape.x, y: viewCentre.y + shift };
    case "fill":
      return { x: viewCentre.x + shift, y: viewCentre.y + shift };
  }
}

/**
 * World anchors of the curve between two shapes: the end on `a` is the point of `a`
 * nearest to b's reference point (with the lane shift), and the end on `b` is the point of
 * `b` nearest to that, so a curve between parallel lines is a perpendicular hop and a
 * curve from a point to a line drops straight onto the line.
 */
export function curveAnchors(
  a: ProjectedShape,
  b: ProjectedShape,
  viewCentre: Point,
  lane = 0,
  laneSpacing = 1,
): { start: Point; end: Point } {
  const start = closestPointOnShape(a, referencePoint(b, viewCentre, lane, laneSpacing));
  const end = closestPointOnShape(b, start);
  return { start, end };
}

/**
 * The curve between two screen points: a quadratic arc bowed to one side, or a loop when
 * the ends coincide (within half a pixel).
 */
export function curveBetween(start: Point, end: Point, options: CurveBetweenOptions = {}): CurvePath {
  const bend = options.bend ?? 0.25;
  const dx = end.x - start.x;
  const dy = end.y - start.y;
  const length = Math.hypot(dx, dy);
  if (length < 0.5) {
    const size = options.loopSize ?? 36;
    const angle = options.loopAngle ?? Math.PI / 4;
    // Two control points either side of the loop direction give a teardrop through `start`.
    const spread = 0.45;
    const c1 = polar(start, size * 1.4, angle - spread);
    const c2 = polar(start, size * 1.4, angle + spread);
    return { kind: "loop", start, control1: c1, control2: c2, end: { ...start } };
  }
  const mid = { x: (start.x + end.x) / 2, y: (start.y + end.y) / 2 };
  // Unit normal to the chord (rotated +90 degrees on screen).
  const nx = -dy / length;
  const ny = dx / length;
  return {
    kind: "quadratic",
    start,
    control: { x: mid.x + nx * bend * length, y: mid.y + ny * bend * length },
    end,
  };
}

/** The point halfway along the curve's parameter (t = 1/2), where its label goes. */
export function curveMidpoint(curve: CurvePath): Point {
  if (curve.kind === "quadratic") {
    return {
      x: 0.25 * curve.start.x + 0.5 * curve.control.x + 0.25 * curve.end.x,
      y: 0.25 * curve.start.y + 0.5 * curve.control.y + 0.25 * curve.end.y,
    };
  }
  return {
    x: (curve.start.x + 3 * curve.control1.x + 3 * curve.control2.x + curve.end.x) / 8,
    y: (curve.start.y + 3 * curve.control1.y + 3 * curve.control2.y + curve.end.y) / 8,
  };
}

/** Flat list of coordinates for drawing the curve with a Bezier-capable line (Konva `bezier`). */
export function curveToPoints(curve: CurvePath): number[] {
  if (curve.kind === "quadratic") {
    // Elevate the quadratic to a cubic so one drawing path serves both kinds.
    const c1 = lerp(curve.start, curve.control, 2 / 3);
    const c2 = lerp(curve.end, curve.control, 2 / 3);
    return [curve.start.x, curve.start.y, c1.x, c1.y, c2.x, c2.y, curve.end.x, curve.end.y];
  }
  return [
    curve.start.x,
    curve.start.y,
    curve.control1.x,
    curve.control1.y,
    curve.control2.x,
    curve.control2.y,
    curve.end.x,
    curve.end.y,
  ];
}

/**
 * Lane numbers for a list of pairs: the k-th pair that touches the same (unordered) pair
 * of shapes gets lane k, alternating sides (0, 1, -1, 2, -2, ...), so repeated curves fan out.
 */
export function assignLanes(pairs: Array<[string, string]>): number[] {
  const seen = new Map<string, number>();
  return pairs.map(([a, b]) => {
    const key = a < b ? `${a}\u0000${b}` : `${b}\u0000${a}`;
    const k = seen.get(key) ?? 0;
    seen.set(key, k + 1);
    return k === 0 ? 0 : k % 2 === 1 ? (k + 1) / 2 : -k / 2;
  });
}

function polar(origin: Point, radius: number, angle: number): Point {
  // Screen y grows downwards, so "up" is negative y.
  return { x: origin.x + radius * Math.cos(angle), y: origin.y - radius * Math.sin(angle) };
}

function lerp(a: Point, b: Point, t: number): Point {
  return { x: a.x + (b.x - a.x) * t, y: a.y + (b.y - a.y) * t };
}
