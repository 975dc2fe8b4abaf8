/**
 * The sweep form's editable state: dimensions whose numbers are still text as typed. Turning a
 * draft into a definition keeps every parse problem at the same path `checkSweepDefinition` uses,
 * so the form shows both kinds of problem beside the same field.
 *
 * Invalid-input policy: never throws; text that is not a number is a problem, not a NaN.
 */
import { dimensionOf } from "../boundary";
import type { Configuration } from "../boundary/types";
import type { SweepProblem } from "./definition";
import { isNumericDimension } from "./dimension";
import type { SweepDefinition, SweepDimension, SweepDimensionKind, SweepValues } from "./types";

/** Values as typed: a range (from, to, number of values) or a list ("0, 0.5, 1"). */
export type ValuesDraft = { mode: "range"; from: string; to: string; steps: string } | { mode: "list"; text: string };

/**
 * First values of a numeric dimension, per mode, for a new dimension and when the form's mode
 * changes: radii must stay positive, so they start elsewhere than positions.
 *
 * @example
 * firstValues.radius.range // => { mode: "range", from: "0.5", to: "2", steps: "7" }
 */
export const firstValues = {
  position: { list: { mode: "list", text: "0, 1, 2" }, range: { mode: "range", from: "0", to: "5", steps: "11" } },
  radius: { list: { mode: "list", text: "0.5, 1, 2" }, range: { mode: "range", from: "0.5", to: "2", steps: "7" } },
} as const satisfies Record<string, { list: ValuesDraft; range: ValuesDraft }>;

/** One dimension as typed. */
export type DimensionDraft =
  | Extract<SweepDimension, { kind: "boundary" }>
  | { kind: "position"; stack: string; axis: number; values: ValuesDraft }
  | { kind: "count"; stack: string; values: ValuesDraft }
  | Extract<SweepDimension, { kind: "orientation" }>
  | { kind: "radius"; axis: number; values: ValuesDraft };

/**
 * A new dimension of `kind` for `base`, with sensible first values: the last stack's first
 * Dirichlet axis from 0 to 5 for a position, counts 1 to 3, N/D of the first two stacks on two axes,
 * and radii 0.5 to 2 of the base's first compact axis (else the last spatial axis).
 *
 * @example
 * newDimensionDraft(base, "orientation") // => { kind: "orientation", stack: "<last stack>" }
 */
export function newDimensionDraft(base: Configuration, kind: SweepDimensionKind): DimensionDraft {
  const last = base.stacks[base.stacks.length - 1];
  const stack = last?.id ?? "";
  const spatial = Array.from({ length: dimensionOf(base) - 1 }, (_unused, i) => i + 1);
  switch (kind) {
    case "position": {
      const dirichlet = spatial.filter((candidate) => !last?.worldvolume.includes(candidate));
      const axis = dirichlet[dirichlet.length - 1] ?? spatial[spatial.length - 1] ?? 1;
      return { kind, stack, axis, values: firstValues.position.range };
    }
    case "count":
      return { kind, stack, values: { mode: "list", text: "1, 2, 3" } };
    case "orientation":
      return { kind, stack };
    case "radius": {
      const compact = Object.keys(base.compact ?? {}).map(Number).filter((axis) => spatial.includes(axis));
      const axis = compact.sort((x, y) => x - y)[0] ?? spatial[spatial.length - 1] ?? 1;
      return { kind, axis, values: firstValues.radius.range };
    }
    case "boundary":
      return {
        kind,
        stacks: base.stacks.slice(0, 2).map((item) => item.id),
        axes: spatial.slice(-2),
        symmetry: "relabel-axes",
      };
  }
}

/** Shows a definition's dimension as a draft (e.g. to start from a suggested sweep). */
export function toDimensionDraft(dimension: SweepDimension): DimensionDraft {
  if (isNumericDimension(dimension)) return { ...dimension, values: toValuesDraft(dimension.values) };
  return dimension;
}

/**
 * The definition a draft stands for, and the numbers that could not be read.
 *
 * @example
 * draftToDefinition([{ kind: "count", stack: "a", values: { mode: "list", text: "1, x" } }]).problems
 * // => [{ path: ["dimensions", 0, "values", "values"], message: '"x" is not a number' }]
 */
export function draftToDefinition(drafts: readonly DimensionDraft[]): { definition: SweepDefinition; problems: SweepProblem[] } {
  const problems: SweepProblem[] = [];
  const dimensions = drafts.map((draft, index): SweepDimension => {
    if (draft.kind === "boundary" || draft.kind === "orientation") return draft;
    return { ...draft, values: readValues(draft.values, ["dimensions", index, "values"], problems) };
  });
  return { definition: { format: 1, dimensions }, problems };
}

function readValues(draft: ValuesDraft, path: (string | number)[], problems: SweepProblem[]): SweepValues {
  const number = (text: string, at: string): number => {
    const value = Number(text.trim());
    if (text.trim() === "" || !Number.isFinite(value)) {
      problems.push({ path: [...path, at], message: text.trim() === "" ? "Enter a number" : `"${text.trim()}" is not a number` });
      return 0;
    }
    return value;
  };
  if (draft.mode === "range") return { kind: "range", from: number(draft.from, "from"), to: number(draft.to, "to"), steps: number(draft.steps, "steps") };
  const parts = draft.text.split(/[\s,;]+/).filter((part) => part !== "");
  return { kind: "list", values: parts.map((part) => number(part, "values")) };
}

function toValuesDraft(values: SweepValues): ValuesDraft {
  return values.kind === "list"
    ? { mode: "list", text: values.values.join(", ") }
    : { mode: "range", from: String(values.from), to: String(values.to), steps: String(values.steps) };
}
