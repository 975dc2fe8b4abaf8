/**
 * What the sweep page plots: the lightest alpha' M^2 against a swept number or against the
 * separation of a pair of stacks, and a map of the verdicts over two dimensions with the others
 * held at chosen values.
 *
 * Invalid-input policy: pure; points without a lightest state are left out of the mass plot.
 */
import { classifyPair, dimensionOf } from "../boundary";
import type { Configuration } from "../boundary/types";
import { dimensionLabel, dimensionSize, formatDimensionValue, dimensionValue, isNumericDimension, numericValue } from "./dimension";
import { applyValues } from "./enumerate";
import type { SweepPointRow } from "./point-rows";
import type { PointVerdict, SweepDefinition } from "./types";

/** A horizontal axis of the mass plot: a numeric dimension, or the separation y of two stacks. */
export type MassPlotAxis = { kind: "dimension"; dimension: number } | { kind: "separation"; a: string; b: string };

/** The horizontal axes worth offering, separations first (they are what moves when positions are swept). */
export function massPlotAxes(base: Configuration, definition: SweepDefinition): { axis: MassPlotAxis; label: string }[] {
  const moved = new Set(definition.dimensions.flatMap((dimension) => (dimension.kind === "position" ? [dimension.stack] : dimension.kind === "boundary" ? dimension.stacks : [])));
  const pairs: { axis: MassPlotAxis; label: string }[] = [];
  base.stacks.forEach((a, i) => {
    base.stacks.slice(i + 1).forEach((b) => {
      if (moved.has(a.id) || moved.has(b.id)) pairs.push({ axis: { kind: "separation", a: a.id, b: b.id }, label: `separation y of ${a.id}–${b.id} (√α′)` });
    });
  });
  const numeric = definition.dimensions.flatMap((dimension, d) =>
    isNumericDimension(dimension) ? [{ axis: { kind: "dimension", dimension: d } as MassPlotAxis, label: dimensionLabel(dimension) }] : [],
  );
  return [...pairs, ...numeric];
}

/** One dot of the mass plot. */
export interface MassPlotPoint {
  x: number;
  y: number;
  index: number;
  verdict: PointVerdict;
}

/**
 * The lightest alpha' M^2 of every computed point against the chosen axis.
 *
 * @example
 * massPlotPoints(base, definition, rows, { kind: "separation", a: "a", b: "b" })[0] // => { x: 0, y: -0.5, index: 0, verdict: "tachyonic" }
 */
export function massPlotPoints(base: Configuration, definition: SweepDefinition, rows: readonly SweepPointRow[], axis: MassPlotAxis): MassPlotPoint[] {
  const dimension = dimensionOf(base);
  const points: MassPlotPoint[] = [];
  for (const row of rows) {
    if (row.lightestMassSquared === null) continue;
    let x: number | null = null;
    if (axis.kind === "dimension") {
      const value = row.values[axis.dimension];
      x = value ? numericValue(value) : null;
    } else {
      const document = applyValues(base, definition, row.values);
      const a = document.stacks.find((stack) => stack.id === axis.a);
      const b = document.stacks.find((stack) => stack.id === axis.b);
      x = a && b ? classifyPair(a, b, dimension).separation : null;
    }
    if (x !== null) points.push({ x, y: row.lightestMassSquared, index: row.index, verdict: row.verdict });
  }
  return points;
}

/** One cell of the verdict map. */
export interface VerdictCell {
  column: number;
  row: number;
  /** The point's number, or null where it is not stored yet. */
  index: number | null;
  verdict: PointVerdict | null;
}

/** The verdict map over dimensions `x` and `y`, the others held at `fixed[d]` (their value positions). */
export interface VerdictMap {
  columns: string[];
  rows: string[];
  cells: VerdictCell[];
}

/**
 * Builds the verdict map. Every (x, y) combination gets a cell, stored or not.
 *
 * @example
 * verdictMap(definition, rows, 0, 1, []).columns // => the labels of dimension 0's values
 */
export function verdictMap(definition: SweepDefinition, rows: readonly SweepPointRow[], x: number, y: number, fixed: readonly number[]): VerdictMap {
  const labels = (d: number): string[] => {
    const dimension = definition.dimensions[d];
    if (!dimension) return [""];
    return Array.from({ length: Number(dimensionSize(dimension)) }, (_unused, i) => formatDimensionValue(dimension, dimensionValue(dimension, i)));
  };
  const columns = labels(x);
  const rowLabels = x === y ? [""] : labels(y);
  const byCell = new Map<string, SweepPointRow>();
  for (const row of rows) {
    const held = row.digits.every((digit, d) => d === x || d === y || digit === (fixed[d] ?? 0));
    if (held) byCell.set(`${row.digits[x] ?? 0}:${x === y ? 0 : (row.digits[y] ?? 0)}`, row);
  }
  const cells: VerdictCell[] = [];
  for (let r = 0; r < rowLabels.length; r += 1) {
    for (let c = 0; c < columns.length; c += 1) {
      const found = byCell.get(`${c}:${r}`);
      cells.push({ column: c, row: r, index: found?.index ?? null, verdict: found?.verdict ?? null });
    }
  }
  return { columns, rows: rowLabels, cells };
}
