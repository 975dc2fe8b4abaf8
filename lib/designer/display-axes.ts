/**
 * Choice of the two display axes for the canvas.
 */
import type { Configuration } from "@/lib/boundary/types";
import type { DisplayAxes } from "@/lib/canvas/projection";
import { positionOn } from "@/lib/canvas/projection";
import { spatialAxes } from "./document";

/**
 * Suggests display axes that show the configuration well: vertically the axis along which
 * the Dirichlet positions spread the most (separations show), horizontally the axis where
 * the stacks disagree most between Neumann and Dirichlet (shapes differ). Falls back to the
 * last two spatial axes.
 */
export function suggestDisplayAxes(config: Pick<Configuration, "theory" | "dimension" | "stacks">): DisplayAxes {
  const axes = spatialAxes(config);
  const last = axes[axes.length - 1] ?? 2;
  const secondLast = axes[axes.length - 2] ?? 1;
  if (config.stacks.length === 0) return { horizontal: secondLast, vertical: last };
  const spread = (axis: number) => {
    const values = config.stacks.filter((s) => !s.worldvolume.includes(axis)).map((s) => positionOn(s, axis));
    return values.length < 2 ? 0 : Math.max(...values) - Math.min(...values);
  };
  const mixed = (axis: number) => {
    const n = config.stacks.filter((s) => s.worldvolume.includes(axis)).length;
    return Math.min(n, config.stacks.length - n);
  };
  const vertical = [...axes].sort((a, b) => spread(b) - spread(a) || b - a)[0] ?? last;
  const horizontal =
    axes.filter((a) => a !== vertical).sort((a, b) => mixed(b) - mixed(a) || spread(b) - spread(a) || b - a)[0] ??
    secondLast;
  return { horizontal, vertical };
}

/** Keeps display axes valid for a configuration (distinct, inside space), else suggests new ones. */
export function normaliseDisplayAxes(
  axes: DisplayAxes,
  config: Pick<Configuration, "theory" | "dimension" | "stacks">,
): DisplayAxes {
  const valid = new Set(spatialAxes(config));
  if (valid.has(axes.horizontal) && valid.has(axes.vertical) && axes.horizontal !== axes.vertical) return axes;
  return suggestDisplayAxes(config);
}
