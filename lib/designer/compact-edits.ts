/**
 * Pure edits of the compact axes of a designer document (file format 2): radii, Wilson lines and
 * T-duality along one axis. Like `document.ts`, each returns a new document, never mutates its
 * input, and refuses an impossible edit by returning the input unchanged.
 */
import { compactLimits, tDualize } from "@/lib/boundary";
import type { Configuration, Stack } from "@/lib/boundary/types";
import { spatialAxes } from "./document";

/** Smallest and largest radius the designer accepts, in units of sqrt(alpha') (the engine's limits). */
export const minRadius = compactLimits.minRadius;
export const maxRadius = compactLimits.maxRadius;

/** A Wilson line is an angle in [0, 2 pi). */
export const wilsonPeriod = 2 * Math.PI;

/**
 * Makes an axis compact with radius `radius`, changes its radius, or (with null) makes it
 * non-compact again, dropping the Wilson lines on it. Making an axis compact moves the document to
 * file format 2. Refused for an axis outside space and for a radius outside [minRadius, maxRadius].
 *
 * @example
 * setRadius(document, 9, 2.5).compact // => { "9": 2.5 }
 */
export function setRadius(config: Configuration, axis: number, radius: number | null): Configuration {
  if (!spatialAxes(config).includes(axis)) return config;
  const key = String(axis);
  if (radius === null) {
    if (config.compact?.[key] === undefined) return config;
    const { [key]: _dropped, ...rest } = config.compact ?? {};
    const next: Configuration = { ...config, stacks: config.stacks.map((stack) => withoutWilson(stack, key)) };
    if (Object.keys(rest).length > 0) next.compact = rest;
    else delete next.compact;
    return next;
  }
  if (!Number.isFinite(radius) || radius < minRadius || radius > maxRadius) return config;
  if (config.compact?.[key] === radius) return config;
  return { ...config, format: 2, compact: { ...config.compact, [key]: radius } };
}

/**
 * Sets the Wilson line of a stack on a compact Neumann axis; 0 removes it. Refused on a
 * non-compact or Dirichlet axis, and for an angle outside [0, 2 pi).
 *
 * @example
 * setWilsonLine(document, "a", 9, 1.2).stacks[0].wilson // => { "9": 1.2 }
 */
export function setWilsonLine(config: Configuration, id: string, axis: number, theta: number): Configuration {
  const key = String(axis);
  if (config.compact?.[key] === undefined || !Number.isFinite(theta) || theta < 0 || theta >= wilsonPeriod) return config;
  let changed = false;
  const stacks = config.stacks.map((stack) => {
    if (stack.id !== id || !stack.worldvolume.includes(axis) || (stack.wilson?.[key] ?? 0) === theta) return stack;
    changed = true;
    if (theta === 0) return withoutWilson(stack, key);
    return { ...stack, wilson: { ...stack.wilson, [key]: theta } };
  });
  return changed ? { ...config, format: 2, stacks } : config;
}

/**
 * T-dualises the document along a compact axis (see `tDualize`); refused for a non-compact axis.
 *
 * @example
 * tDualizeAxis(document, 9).compact?.["9"] // => 1 / document.compact["9"]
 */
export function tDualizeAxis(config: Configuration, axis: number): Configuration {
  if (config.compact?.[String(axis)] === undefined) return config;
  return tDualize(config, axis);
}

/**
 * Drops what other edits leave behind on compact axes: radii of axes that no longer exist (after
 * a switch from 26 to 10 dimensions) and Wilson lines on axes that are no longer compact Neumann
 * axes of their stack (after a flip to Dirichlet). Returns the input itself when nothing is stale,
 * so it can follow every edit.
 *
 * @example
 * tidyCompactAxes(document) === document // => true when nothing is stale
 */
export function tidyCompactAxes(config: Configuration): Configuration {
  const axes = new Set(spatialAxes(config).map(String));
  let compact = config.compact;
  if (compact && Object.keys(compact).some((key) => !axes.has(key))) {
    compact = Object.fromEntries(Object.entries(compact).filter(([key]) => axes.has(key)));
  }
  let changed = compact !== config.compact;
  const stacks = config.stacks.map((stack) => {
    if (!stack.wilson) return stack;
    const kept = Object.entries(stack.wilson).filter(([key]) => compact?.[key] !== undefined && stack.worldvolume.includes(Number(key)));
    if (kept.length === Object.keys(stack.wilson).length) return stack;
    changed = true;
    const { wilson: _wilson, ...rest } = stack;
    return kept.length > 0 ? { ...rest, wilson: Object.fromEntries(kept) } : rest;
  });
  if (!changed) return config;
  const next: Configuration = { ...config, stacks };
  if (compact && Object.keys(compact).length > 0) next.compact = compact;
  else delete next.compact;
  return next;
}

function withoutWilson(stack: Stack, key: string): Stack {
  if (stack.wilson?.[key] === undefined) return stack;
  const { [key]: _dropped, ...rest } = stack.wilson;
  const { wilson: _wilson, ...others } = stack;
  return Object.keys(rest).length > 0 ? { ...others, wilson: rest } : others;
}
