/**
 * What changed on the compact axes between two configuration documents: radii (an axis made
 * compact, made non-compact or resized) and Wilson lines (per stack and axis), for the revision
 * diff and its one-line descriptions.
 *
 * Pure; inputs are never mutated. A missing Wilson line counts as 0, as in the file format.
 */
import type { Configuration } from "@/lib/boundary/types";
import { formatNumber } from "@/lib/spectrum";

/** A compact axis whose radius changed; null stands for a non-compact axis. */
export interface RadiusChange {
  axis: number;
  before: number | null;
  after: number | null;
}

/** A Wilson line that changed on a stack present in both documents (radians; missing = 0). */
export interface WilsonLineChange {
  stack: string;
  axis: number;
  before: number;
  after: number;
}

/** The compact-axis part of a configuration diff. */
export interface CompactDiff {
  radii: RadiusChange[];
  wilsonLines: WilsonLineChange[];
}

/**
 * Compares the compact axes and Wilson lines of two documents.
 *
 * @param before - The earlier document.
 * @param after - The later document.
 * @returns Radius changes in axis order and Wilson line changes in the later document's stack order.
 * @example
 * diffCompactAxes(flat, { ...flat, format: 2, compact: { "9": 2 } }).radii // => [{ axis: 9, before: null, after: 2 }]
 */
export function diffCompactAxes(before: Configuration, after: Configuration): CompactDiff {
  const axes = new Set([...Object.keys(before.compact ?? {}), ...Object.keys(after.compact ?? {})]);
  const radii: RadiusChange[] = [...axes]
    .map((key) => ({ axis: Number(key), before: before.compact?.[key] ?? null, after: after.compact?.[key] ?? null }))
    .filter((change) => change.before !== change.after)
    .sort((x, y) => x.axis - y.axis);
  const previousById = new Map(before.stacks.map((stack) => [stack.id, stack]));
  const wilsonLines: WilsonLineChange[] = [];
  for (const next of after.stacks) {
    const previous = previousById.get(next.id);
    if (!previous) continue;
    const keys = new Set([...Object.keys(previous.wilson ?? {}), ...Object.keys(next.wilson ?? {})]);
    for (const key of [...keys].sort((x, y) => Number(x) - Number(y))) {
      const was = previous.wilson?.[key] ?? 0;
      const now = next.wilson?.[key] ?? 0;
      if (was !== now) wilsonLines.push({ stack: next.id, axis: Number(key), before: was, after: now });
    }
  }
  return { radii, wilsonLines };
}

/**
 * One line per compact-axis change.
 *
 * @example
 * describeCompactDiff({ radii: [{ axis: 9, before: 2, after: 0.5 }], wilsonLines: [] }) // => ["Radius of x9: 2 → 0.5"]
 */
export function describeCompactDiff(diff: CompactDiff): string[] {
  return [
    ...diff.radii.map((change) =>
      change.before === null
        ? `x${change.axis} made compact, radius ${show(change.after)}`
        : change.after === null
          ? `x${change.axis} made non-compact (radius was ${show(change.before)})`
          : `Radius of x${change.axis}: ${show(change.before)} → ${show(change.after)}`,
    ),
    ...diff.wilsonLines.map((change) => `Stack ${change.stack}: Wilson line on x${change.axis} ${show(change.before)} → ${show(change.after)}`),
  ];
}

function show(value: number | null): string {
  return value === null ? "none" : formatNumber(value, { significantDigits: 6 });
}
