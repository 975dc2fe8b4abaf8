/**
 * Builds what the canvas draws (in screen pixels) from the document, the live result and the
 * view. Pure, so the drawing component only maps items to shapes.
 */
import { dimensionOf } from "@/lib/boundary/check";
import { stacksUnderPlane } from "@/lib/boundary/orientifold";
import type { Configuration, SpectrumResult } from "@/lib/boundary/types";
import { assignLanes, curveAnchors, curveBetween, curveMidpoint, curveToPoints } from "@/lib/canvas/curves";
import type { ShapeEntry } from "@/lib/canvas/hit-test";
import { estimateTextWidth, placeLabels, stackLabelAnchor } from "@/lib/canvas/labels";
import { isNeumann, positionOn, projectStack, type DisplayAxes, type ProjectedShape } from "@/lib/canvas/projection";
import { gridLines } from "@/lib/canvas/snap";
import { fitToPoints, toScreen, toWorld, visibleWorldRect, type Point, type Viewport } from "@/lib/canvas/viewport";
import { formatMassSquared, formatNumber, lightestBySector, massInGeV, pairKey } from "@/lib/spectrum";
import { stackKind } from "./stack-kind";

/** Font size of canvas labels in pixels. */
export const sceneFontSize = 12;

export interface SceneStack {
  id: string;
  shape: ProjectedShape;
  /** Screen geometry: centre for points, the line coordinate for lines. */
  screen: Point;
  colour: string;
  anti: boolean;
  selected: boolean;
  count: number;
  label: string;
  labelAt: Point;
}

export interface SceneCurve {
  key: string;
  pair: [string, string];
  /** Cubic Bezier control polygon [x0, y0, c1x, c1y, c2x, c2y, x1, y1]. */
  points: number[];
  tachyonic: boolean;
  label: string;
  labelAt: Point;
}

/** An orientifold plane as drawn: a hatched dashed line, a diamond, or a hatched frame. */
export interface ScenePlane {
  id: string;
  type: "O-" | "O+";
  shape: ProjectedShape;
  screen: Point;
  label: string;
}

export interface Scene {
  stacks: SceneStack[];
  /** Orientifold planes (at most one). */
  planes: ScenePlane[];
  /** Images of the stacks off the plane, drawn faintly and never hit-tested; they follow every drag. */
  images: SceneStack[];
  curves: SceneCurve[];
  /** Screen x of vertical grid lines and y of horizontal ones, with the origin lines flagged. */
  verticalLines: Array<{ x: number; origin: boolean }>;
  horizontalLines: Array<{ y: number; origin: boolean }>;
  /** Hit-test entries in world coordinates. */
  hitEntries: ShapeEntry[];
}

/** Inputs of {@link buildScene}. */
export interface BuildSceneInput {
  document: Configuration;
  result: SpectrumResult | null;
  axes: DisplayAxes;
  viewport: Viewport;
  width: number;
  height: number;
  selection: readonly string[];
  gridStep: number;
}

/** Width in pixels of the boxed label of a curve. */
export function curveLabelWidth(label: string): number {
  return estimateTextWidth(label, sceneFontSize - 1) + 8;
}

/** Fallback colour of a stack without one. */
export const defaultStackColour = "#2f6f9f";

/** Builds the scene. Curves join distinct stacks; self-sectors are listed in the preview. */
export function buildScene(input: BuildSceneInput): Scene {
  const { document, result, axes, viewport, width, height, selection, gridStep } = input;
  const stage = { width, height };
  const selected = new Set(selection);
  const view = visibleWorldRect(viewport, width, height);
  const viewCentre = toWorld({ x: width / 2, y: height / 2 }, viewport);

  const hitEntries: ShapeEntry[] = document.stacks.map((stack) => ({ id: stack.id, shape: projectStack(stack, axes) }));
  let fillSlot = 0;
  const anchors = hitEntries.map(({ shape }) =>
    stackLabelAnchor(shape, viewport, stage, shape.kind === "fill" ? fillSlot++ : 0),
  );
  const labelTexts = document.stacks.map(
    (stack) => `${stack.label || stack.id} \u00b7 ${stackKind(stack, document.theory)} \u00b7 N=${stack.count}`,
  );
  const stackLabelRequests = document.stacks.map((stack, i) => ({
    id: `stack:${stack.id}`,
    anchor: anchors[i] ?? { x: 0, y: 0 },
    width: estimateTextWidth(labelTexts[i] ?? "", sceneFontSize),
    height: sceneFontSize + 4,
  }));

  const stacks: SceneStack[] = document.stacks.map((stack, i) => {
    const shape = hitEntries[i]!.shape;
    const screen = screenOf(shape, viewport);
    return {
      id: stack.id,
      shape,
      screen,
      colour: stack.colour ?? defaultStackColour,
      anti: stack.anti && document.theory !== "bosonic",
      selected: selected.has(stack.id),
      count: stack.count,
      label: labelTexts[i] ?? stack.id,
      labelAt: { x: 0, y: 0 },
    };
  });

  const lightest = lightestBySector(result ?? { sectors: [] });
  const pairs: Array<[number, number]> = [];
  for (let i = 0; i < document.stacks.length; i++) {
    for (let j = i + 1; j < document.stacks.length; j++) pairs.push([i, j]);
  }
  const lanes = assignLanes(pairs.map(([i, j]) => [shapeKey(hitEntries[i]!.shape), shapeKey(hitEntries[j]!.shape)]));
  const laneSpacing = Math.max(view.width, 1) / 10;
  const sharedEnds = new Map<string, number>();
  const curves: SceneCurve[] = pairs.map(([i, j], k) => {
    const a = document.stacks[i]!;
    const b = document.stacks[j]!;
    const lane = lanes[k] ?? 0;
    const world = curveAnchors(hitEntries[i]!.shape, hitEntries[j]!.shape, viewCentre, lane, laneSpacing);
    const start = toScreen(world.start, viewport);
    const end = toScreen(world.end, viewport);
    // Curves that share both ends on screen (a point above two coincident stacks) fan out.
    const endsKey = [start, end].map((p) => `${Math.round(p.x)},${Math.round(p.y)}`).sort().join("|");
    const repeat = sharedEnds.get(endsKey) ?? 0;
    sharedEnds.set(endsKey, repeat + 1);
    const spread = repeat === 0 ? 0 : repeat % 2 === 1 ? (repeat + 1) / 2 : -repeat / 2;
    const curve = curveBetween(start, end, {
      bend: (lane % 2 === 0 ? 0.22 : -0.22) + spread * 0.3,
      loopAngle: Math.PI / 4 + ((lane + spread) * Math.PI) / 5,
    });
    const info = lightest.get(pairKey(a.id, b.id));
    const mid = curveMidpoint(curve);
    const gev = info ? massInGeV(info.row.mass, document.stringScaleGeV) : null;
    const label = info
      ? `\u03b1\u2032M\u00b2 = ${formatMassSquared(info.row.massSquared)}${gev !== null && gev > 0 ? ` \u00b7 M = ${formatNumber(gev)} GeV` : ""}${info.sector.tachyonic ? "  tachyon" : ""}`
      : "";
    return {
      key: pairKey(a.id, b.id),
      pair: [a.id, b.id],
      points: curveToPoints(curve),
      tachyonic: info?.sector.tachyonic ?? false,
      label,
      labelAt: { x: mid.x + 4, y: mid.y - sceneFontSize - 2 },
    };
  });

  // Stack labels first (they name things), then curve labels, each moved clear of the earlier ones.
  const placed = placeLabels([
    ...stackLabelRequests,
    ...curves
      .filter((curve) => curve.label !== "")
      .map((curve) => ({
        id: `curve:${curve.key}`,
        anchor: curve.labelAt,
        width: curveLabelWidth(curve.label),
        height: sceneFontSize + 6,
      })),
  ]);
  for (const stack of stacks) stack.labelAt = placed.get(`stack:${stack.id}`) ?? stack.labelAt;
  for (const curve of curves) curve.labelAt = placed.get(`curve:${curve.key}`) ?? curve.labelAt;

  const verticalLines = gridLines(view.x, view.x + view.width, gridStep, 120).map((x) => ({
    x: toScreen({ x, y: 0 }, viewport).x,
    origin: x === 0,
  }));
  const horizontalLines = gridLines(view.y, view.y + view.height, gridStep, 120).map((y) => ({
    y: toScreen({ x: 0, y }, viewport).y,
    origin: y === 0,
  }));

  const plane = document.orientifolds?.[0];
  const planes: ScenePlane[] = plane
    ? [(() => {
        const shape = projectStack(plane, axes);
        return { id: plane.id, type: plane.type, shape, screen: screenOf(shape, viewport), label: `${plane.id} \u00b7 O${plane.worldvolume.length}${plane.type === "O-" ? "\u2212" : "+"}` };
      })()]
    : [];
  const images: SceneStack[] = plane
    ? stacksUnderPlane(document.stacks, plane, document.theory, dimensionOf(document)).flatMap((entry, i) => {
        if (!entry.image) return [];
        const shape = projectStack(entry.image, axes);
        const screen = screenOf(shape, viewport);
        const own = stacks[i];
        return [{ id: entry.image.id, shape, screen, colour: own?.colour ?? defaultStackColour, anti: entry.image.anti && document.theory !== "bosonic", selected: false, count: entry.image.count, label: `${entry.stack.id}\u2032`, labelAt: { x: screen.x + 10, y: screen.y + 8 } }];
      })
    : [];

  return { stacks, planes, images, curves, verticalLines, horizontalLines, hitEntries };
}

/** Screen anchor of a projected shape: the centre of a point, the coordinate of a line. */
function screenOf(shape: ProjectedShape, viewport: Viewport): Point {
  return shape.kind === "point"
    ? toScreen({ x: shape.x, y: shape.y }, viewport)
    : shape.kind === "horizontal-line"
      ? toScreen({ x: 0, y: shape.y }, viewport)
      : shape.kind === "vertical-line"
        ? toScreen({ x: shape.x, y: 0 }, viewport)
        : { x: 0, y: 0 };
}

/**
 * A viewport that shows the origin and every stack's position on the display axes (0 along
 * a Neumann axis), with a margin for labels.
 */
export function fitSceneViewport(
  document: Pick<Configuration, "stacks">,
  axes: DisplayAxes,
  width: number,
  height: number,
): Viewport {
  const points: Point[] = [{ x: 0, y: 0 }];
  for (const stack of document.stacks) {
    points.push({
      x: isNeumann(stack, axes.horizontal) ? 0 : positionOn(stack, axes.horizontal),
      y: isNeumann(stack, axes.vertical) ? 0 : positionOn(stack, axes.vertical),
    });
  }
  return fitToPoints(points, width, height, 72);
}

/** Stacks drawn identically share a key, so their curves fan out into lanes. */
function shapeKey(shape: ProjectedShape): string {
  switch (shape.kind) {
    case "point":
      return `p:${shape.x},${shape.y}`;
    case "horizontal-line":
      return `h:${shape.y}`;
    case "vertical-line":
      return `v:${shape.x}`;
    case "fill":
      return "f";
  }
}
