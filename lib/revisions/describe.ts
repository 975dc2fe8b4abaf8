/**
 * A configuration diff (lib/revisions/diff.ts) as short lines of text, for places with room for a
 * list and no table: the stale-save dialog ("what did the other save change?") and notices.
 *
 * Pure. Invalid-input policy: none needed; every diff describes.
 */
import { formatNumber } from "@/lib/spectrum";
import { describeCompactDiff } from "./compact-diff";
import type { ConfigurationDiff } from "./diff";

const fieldNames: Record<ConfigurationDiff["fields"][number]["field"], string> = {
  title: "Title",
  description: "Description",
  theory: "Theory",
  dimension: "Dimension",
  stringScaleGeV: "String scale (GeV)",
  levels: "Highest level",
};

/**
 * One line per change.
 *
 * @example
 * describeConfigurationDiff(diffConfigurations(a, withCount3))
 * // => ["Stack a: N 1 → 3"]
 */
export function describeConfigurationDiff(diff: ConfigurationDiff): string[] {
  const lines: string[] = [];
  for (const change of diff.fields) lines.push(`${fieldNames[change.field]}: ${show(change.before)} → ${show(change.after)}`);
  for (const plane of diff.planes) {
    lines.push(
      plane.before === null
        ? `Added plane ${plane.key}: ${plane.after ?? ""}`
        : plane.after === null
          ? `Removed plane ${plane.key}`
          : `Plane ${plane.key}: ${plane.before} → ${plane.after}`,
    );
  }
  for (const stack of diff.added) lines.push(`Added stack ${stack.id} (D${stack.worldvolume.length}, N = ${stack.count})`);
  for (const stack of diff.removed) lines.push(`Removed stack ${stack.id}`);
  for (const change of diff.changed) {
    const parts: string[] = [];
    if (change.label) parts.push(`label “${change.label.before}” → “${change.label.after}”`);
    if (change.count) parts.push(`N ${change.count.before} → ${change.count.after}`);
    if (change.anti) parts.push(change.anti.after ? "now an antibrane" : "now a brane");
    if (change.colour) parts.push("colour");
    for (const flip of change.boundaries) parts.push(`x${flip.axis} ${flip.before} → ${flip.after}`);
    for (const move of change.positions) parts.push(`x${move.axis} position ${show(move.before)} → ${show(move.after)}`);
    lines.push(`Stack ${change.id}: ${parts.join(", ")}`);
  }
  lines.push(...describeCompactDiff(diff.compact));
  return lines;
}

function show(value: string | number | null): string {
  if (value === null || value === "") return "none";
  return typeof value === "number" ? formatNumber(value, { significantDigits: 6 }) : value;
}
