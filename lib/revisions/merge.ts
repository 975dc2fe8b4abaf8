/**
 * A three-way merge of configuration documents, for a save that found a newer stored version:
 * `base` is the version the draft started from, `mine` the draft and `theirs` what is stored now.
 * Edits to different fields combine; the same field changed to different values on both sides is a
 * conflict, and then there is no merged document.
 *
 * Fields are the document's settings (title, description, theory, dimension, string scale, levels)
 * and, per stack (matched by id), its label, N, orientation, colour and each spatial axis (N, or D
 * with its position). A stack added on one side is kept; a stack deleted on one side is deleted
 * unless the other side changed it.
 *
 * Pure; inputs are never mutated. Invalid-input policy: documents are taken as they are (validation
 * of the merged document is the engine's and the schema's job), nothing throws.
 */
import { dimensionOf } from "@/lib/boundary";
import type { Configuration, Stack } from "@/lib/boundary/types";
import { mergeCompactAxes } from "./compact-merge";

/** One field both sides changed differently. */
export interface MergeConflict {
  /** Where: "title", "stack a: N", "stack a: x4". */
  field: string;
  mine: string;
  theirs: string;
}

export type MergeResult = { document: Configuration; conflicts: [] } | { document: null; conflicts: MergeConflict[] };

type SettingKey = "title" | "description" | "theory" | "dimension" | "stringScaleGeV" | "levels";
const settingNames: Record<SettingKey, string> = {
  title: "title",
  description: "description",
  theory: "theory",
  dimension: "dimension",
  stringScaleGeV: "string scale",
  levels: "highest level",
};

/**
 * Merges the draft and the stored version against their common base.
 *
 * @param base - The stored version the draft was based on.
 * @param mine - The draft.
 * @param theirs - The stored version now.
 * @returns The merged document with no conflicts, or null and every conflict found.
 * @example
 * mergeConfigurations(base, { ...base, title: "Mine" }, { ...base, levels: 8 }).document
 * // => { ...base, title: "Mine", levels: 8 }
 */
export function mergeConfigurations(base: Configuration, mine: Configuration, theirs: Configuration): MergeResult {
  const conflicts: MergeConflict[] = [];
  const merged: Configuration = { ...theirs };

  for (const key of Object.keys(settingNames) as SettingKey[]) {
    const picked = pick(base[key], mine[key], theirs[key]);
    if (picked.conflict) conflicts.push({ field: settingNames[key], mine: show(mine[key]), theirs: show(theirs[key]) });
    else setSetting(merged, key, picked.value);
  }

  const axisCount = Math.max(dimensionOf(base), dimensionOf(mine), dimensionOf(theirs)) - 1;
  const baseById = new Map(base.stacks.map((s) => [s.id, s]));
  const mineById = new Map(mine.stacks.map((s) => [s.id, s]));
  const stacks: Stack[] = [];

  for (const their of theirs.stacks) {
    const was = baseById.get(their.id);
    const my = mineById.get(their.id);
    if (!was) {
      // Added in the stored version; a stack of the same id added in the draft must agree with it.
      if (my && !sameStack(my, their, axisCount)) conflicts.push({ field: `stack ${their.id}`, mine: "added", theirs: "added differently" });
      stacks.push(their);
    } else if (!my) {
      // Deleted in the draft: gone, unless the stored version changed it meanwhile.
      if (!sameStack(was, their, axisCount)) conflicts.push({ field: `stack ${their.id}`, mine: "deleted", theirs: "changed" });
    } else {
      stacks.push(mergeStack(was, my, their, axisCount, conflicts));
    }
  }
  const theirIds = new Set(theirs.stacks.map((s) => s.id));
  for (const my of mine.stacks) {
    if (theirIds.has(my.id)) continue;
    const was = baseById.get(my.id);
    if (!was) stacks.push(my);
    // Deleted in the stored version: gone, unless the draft changed it.
    else if (!sameStack(was, my, axisCount)) conflicts.push({ field: `stack ${my.id}`, mine: "changed", theirs: "deleted" });
  }

  const axes = dimensionOf(merged) - 1;
  const document = mergeCompactAxes(base, mine, theirs, { ...merged, stacks: stacks.map((stack) => dropAxesBeyond(stack, axes)) }, conflicts);
  if (conflicts.length > 0) return { document: null, conflicts };
  return { document, conflicts: [] };
}

function mergeStack(base: Stack, mine: Stack, theirs: Stack, axisCount: number, conflicts: MergeConflict[]): Stack {
  const field = (name: string, m: unknown, t: unknown) => conflicts.push({ field: `stack ${theirs.id}: ${name}`, mine: show(m), theirs: show(t) });
  const label = pick(base.label, mine.label, theirs.label);
  if (label.conflict) field("label", mine.label, theirs.label);
  const count = pick(base.count, mine.count, theirs.count);
  if (count.conflict) field("N", mine.count, theirs.count);
  const anti = pick(base.anti, mine.anti, theirs.anti);
  if (anti.conflict) field("brane or antibrane", mine.anti ? "antibrane" : "brane", theirs.anti ? "antibrane" : "brane");
  const colour = pick(base.colour ?? null, mine.colour ?? null, theirs.colour ?? null);
  if (colour.conflict) field("colour", mine.colour, theirs.colour);

  const worldvolume: number[] = [];
  const position: Record<string, number> = {};
  for (let axis = 1; axis <= axisCount; axis++) {
    const picked = pick(axisState(base, axis), axisState(mine, axis), axisState(theirs, axis));
    if (picked.conflict) {
      field(`x${axis}`, axisState(mine, axis), axisState(theirs, axis));
      continue;
    }
    if (picked.value === "N") worldvolume.push(axis);
    else position[String(axis)] = Number(picked.value.slice(2));
  }
  const merged: Stack = {
    ...theirs,
    label: label.value,
    count: count.value,
    anti: anti.value,
    worldvolume,
    position: Object.fromEntries(Object.entries(position).filter(([key, value]) => value !== 0 || key in theirs.position || key in mine.position)),
  };
  if (colour.value === null) delete merged.colour;
  else merged.colour = colour.value;
  return merged;
}

/** "N", or "D@<position>" (a missing position is 0, as in the file format). */
function axisState(stack: Stack, axis: number): string {
  return stack.worldvolume.includes(axis) ? "N" : `D@${stack.position[String(axis)] ?? 0}`;
}

function sameStack(a: Stack, b: Stack, axisCount: number): boolean {
  if (a.label !== b.label || a.count !== b.count || a.anti !== b.anti || (a.colour ?? null) !== (b.colour ?? null)) return false;
  for (let axis = 1; axis <= axisCount; axis++) if (axisState(a, axis) !== axisState(b, axis)) return false;
  return true;
}

/** The side that changed; on a conflict `value` is theirs, and the caller records the conflict (no document is returned then). */
function pick<T>(base: T, mine: T, theirs: T): { conflict: boolean; value: T } {
  if (Object.is(mine, theirs) || Object.is(mine, base)) return { conflict: false, value: theirs };
  if (Object.is(theirs, base)) return { conflict: false, value: mine };
  return { conflict: true, value: theirs };
}

function setSetting(document: Configuration, key: SettingKey, value: Configuration[SettingKey]): void {
  if (value === undefined) delete (document as Partial<Configuration>)[key];
  else Object.assign(document, { [key]: value });
}

function dropAxesBeyond(stack: Stack, axes: number): Stack {
  const worldvolume = stack.worldvolume.filter((axis) => axis <= axes);
  const position = Object.fromEntries(Object.entries(stack.position).filter(([key]) => Number(key) <= axes));
  return worldvolume.length === stack.worldvolume.length && Object.keys(position).length === Object.keys(stack.position).length
    ? stack
    : { ...stack, worldvolume, position };
}

function show(value: unknown): string {
  if (value === null || value === undefined) return "none";
  if (typeof value === "string" && value.startsWith("D@")) return `D at ${value.slice(2)}`;
  return String(value);
}
