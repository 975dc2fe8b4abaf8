/**
 * What the canvas draws for compact display axes, in screen pixels: a circle is shown as a
 * periodic strip. The strip [0, 2 pi R) is tinted, its edges are drawn as seams (the two edges are
 * the same place), and every stack that sits at a point along the circle is repeated faintly at
 * x + 2 pi R k, so that the nearest image of each stack is in view. Pure, beside `scene.ts`.
 */
import type { Configuration } from "@/lib/boundary/types";
import type { DisplayAxes } from "@/lib/canvas/projection";
import { toScreen, visibleWorldRect, type Viewport } from "@/lib/canvas/viewport";
import type { SceneStack } from "./scene";

/** One compact display axis, as drawn. */
export interface CompactStrip {
  /** "horizontal" when the circle runs along the horizontal display axis. */
  direction: "horizontal" | "vertical";
  axis: number;
  radius: number;
  /** Screen coordinates (x for horizontal, y for vertical) of the strip [0, 2 pi R). */
  from: number;
  to: number;
  /** Screen coordinates of the seams 2 pi R k in view. */
  seams: number[];
  /** E.g. "x9 is a circle, R = 2.5: the seams are one place". */
  caption: string;
}

/** What {@link buildCompactScene} returns. */
export interface CompactScene {
  strips: CompactStrip[];
  /** Faint copies of stacks at x + 2 pi R k (k != 0), not selectable. */
  images: SceneStack[];
}

/** Inputs of {@link buildCompactScene}. */
export interface BuildCompactSceneInput {
  document: Pick<Configuration, "compact">;
  axes: DisplayAxes;
  viewport: Viewport;
  width: number;
  height: number;
  /** The scene's stacks (`buildScene`). */
  stacks: readonly SceneStack[];
}

/** At most this many images of one stack along one axis, so a tiny circle stays cheap to draw. */
const maxImagesPerAxis = 24;

/**
 * The strips and images of the compact display axes.
 *
 * @example
 * buildCompactScene({ document: { compact: { "9": 1 } }, axes: { horizontal: 9, vertical: 8 }, ... }).strips[0]?.direction // => "horizontal"
 */
export function buildCompactScene(input: BuildCompactSceneInput): CompactScene {
  const { document, axes, viewport, width, height, stacks } = input;
  const view = visibleWorldRect(viewport, width, height);
  const origin = toScreen({ x: 0, y: 0 }, viewport);
  const strips: CompactStrip[] = [];
  const shifts: { direction: "horizontal" | "vertical"; steps: number[]; pixels: number }[] = [];
  for (const direction of ["horizontal", "vertical"] as const) {
    const axis = direction === "horizontal" ? axes.horizontal : axes.vertical;
    const radius = document.compact?.[String(axis)];
    if (radius === undefined) continue;
    const period = 2 * Math.PI * radius;
    const low = direction === "horizontal" ? view.x : view.y;
    const high = low + (direction === "horizontal" ? view.width : view.height);
    const first = Math.ceil(low / period);
    const last = Math.floor(high / period);
    const seams: number[] = [];
    for (let k = first; k <= last && seams.length <= maxImagesPerAxis; k += 1) seams.push(screenOf(direction, k * period, viewport));
    strips.push({
      direction,
      axis,
      radius,
      from: direction === "horizontal" ? origin.x : origin.y,
      to: screenOf(direction, period, viewport),
      seams,
      caption: `x${axis} is a circle, R = ${Number(radius.toPrecision(4))}: the seams are one place`,
    });
    // Images one period beyond the view on each side keep stacks near an edge in sight.
    const steps: number[] = [];
    const span = Math.ceil((high - low) / period) + 1;
    for (let k = -span; k <= span && steps.length < maxImagesPerAxis; k += 1) if (k !== 0) steps.push(k);
    shifts.push({ direction, steps, pixels: period * viewport.scale });
  }
  const images: SceneStack[] = [];
  for (const stack of stacks) {
    const along = (direction: "horizontal" | "vertical") =>
      stack.shape.kind === "point" || stack.shape.kind === (direction === "horizontal" ? "vertical-line" : "horizontal-line");
    // Every combination of shifts along the compact axes the stack is a point on, less no shift at all.
    let offsets: { dx: number; dy: number; key: string }[] = [{ dx: 0, dy: 0, key: "" }];
    for (const shift of shifts) {
      if (!along(shift.direction)) continue;
      offsets = offsets.flatMap((base) => [
        base,
        ...shift.steps.map((k) =>
          shift.direction === "horizontal"
            ? { dx: base.dx + k * shift.pixels, dy: base.dy, key: `${base.key}h${k}` }
            : { dx: base.dx, dy: base.dy - k * shift.pixels, key: `${base.key}v${k}` },
        ),
      ]);
    }
    for (const offset of offsets) {
      if (offset.key === "") continue;
      const screen = { x: stack.screen.x + offset.dx, y: stack.screen.y + offset.dy };
      if (screen.x < -40 || screen.x > width + 40 || screen.y < -40 || screen.y > height + 40) continue;
      images.push({ ...stack, id: `${stack.id}@${offset.key}`, screen, selected: false });
    }
  }
  return { strips, images };
}

function screenOf(direction: "horizontal" | "vertical", value: number, viewport: Viewport): number {
  return direction === "horizontal" ? toScreen({ x: value, y: 0 }, viewport).x : toScreen({ x: 0, y: value }, viewport).y;
}
