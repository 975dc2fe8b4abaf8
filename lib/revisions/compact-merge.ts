/**
 * The compact-axis part of the three-way merge (`merge.ts`): each radius and each stack's Wilson
 * line on each axis is one field, combined like the others (a change on one side is kept; the
 * same field changed differently on both sides is a conflict).
 *
 * Pure; inputs are never mutated.
 */
import type { Configuration, Stack } from "@/lib/boundary/types";
import type { MergeConflict } from "./merge";

/**
 * Merges radii and Wilson lines into a merged document whose other fields are settled.
 *
 * @param base - The version both sides started from.
 * @param mine - The draft.
 * @param theirs - The stored version now.
 * @param merged - The merged document so far (its stacks merged by id); not mutated.
 * @param conflicts - Receives a conflict per radius or Wilson line changed differently on both sides.
 * @returns `merged` with the merged radii, Wilson lines and file format (2 once anything is compact).
 * @example
 * mergeCompactAxes(base, { ...base, compact: { "9": 2 } }, base, merged, []).compact // => { "9": 2 }
 */
export function mergeCompactAxes(
  base: Configuration,
  mine: Configuration,
  theirs: Configuration,
  merged: Configuration,
  conflicts: MergeConflict[],
): Configuration {
  const compact = mergeRecord(base.compact, mine.compact, theirs.compact, (key, m, t) =>
    conflicts.push({ field: `radius of x${key}`, mine: show(m), theirs: show(t) }),
  );
  const byId = (document: Configuration) => new Map(document.stacks.map((stack) => [stack.id, stack]));
  const [baseById, mineById, theirsById] = [byId(base), byId(mine), byId(theirs)];
  const stacks = merged.stacks.map((stack): Stack => {
    const was = baseById.get(stack.id);
    const my = mineById.get(stack.id);
    const their = theirsById.get(stack.id);
    // A stack on one side only comes through as that side wrote it.
    if (!was || !my || !their) return stack;
    const wilson = mergeRecord(was.wilson, my.wilson, their.wilson, (key, m, t) =>
      conflicts.push({ field: `stack ${stack.id}: Wilson line on x${key}`, mine: show(m), theirs: show(t) }),
    );
    const { wilson: _wilson, ...rest } = stack;
    return wilson ? { ...rest, wilson } : rest;
  });
  const next: Configuration = { ...merged, stacks };
  if (compact) next.compact = compact;
  else delete next.compact;
  if (compact || stacks.some((stack) => stack.wilson)) next.format = 2;
  return next;
}

/** Merges two maps of numbers key by key against their base; a missing key is "absent", not 0. */
function mergeRecord(
  base: Record<string, number> | undefined,
  mine: Record<string, number> | undefined,
  theirs: Record<string, number> | undefined,
  onConflict: (key: string, mine: number | undefined, theirs: number | undefined) => void,
): Record<string, number> | undefined {
  const keys = new Set([...Object.keys(base ?? {}), ...Object.keys(mine ?? {}), ...Object.keys(theirs ?? {})]);
  const out: Record<string, number> = {};
  for (const key of keys) {
    const was = base?.[key];
    const my = mine?.[key];
    const their = theirs?.[key];
    let value: number | undefined;
    if (my === their || my === was) value = their;
    else if (their === was) value = my;
    else {
      onConflict(key, my, their);
      value = their;
    }
    if (value !== undefined) out[key] = value;
  }
  return Object.keys(out).length > 0 ? out : undefined;
}

function show(value: number | undefined): string {
  return value === undefined ? "none" : String(value);
}
