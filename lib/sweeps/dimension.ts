/**
 * Sizes, values and labels of the dimensions of a sweep (types.ts).
 *
 * Invalid-input policy: these functions expect a dimension that `checkSweepDefinition` accepts;
 * sizes are exact BigInts whatever the input, and an index outside a dimension throws a RangeError.
 */
import { multisetCount, unrankMultiset } from "./combinatorics";
import type { DimensionValue, SweepDimension, SweepValues } from "./types";

/**
 * How many values a dimension takes.
 *
 * @returns 2^(s k) N/D assignments of s stacks on k axes (or C(2^s + k - 1, k) up to relabelling
 *   the axes), the number of listed or ranged values, or 2 for brane/antibrane.
 * @example
 * dimensionSize({ kind: "boundary", stacks: ["a", "b"], axes: [4, 5, 6], symmetry: "relabel-axes" }) // => 20n
 * dimensionSize({ kind: "orientation", stack: "a" }) // => 2n
 */
export function dimensionSize(dimension: SweepDimension): bigint {
  switch (dimension.kind) {
    case "boundary": {
      const columns = 2n ** BigInt(dimension.stacks.length);
      const axes = BigInt(dimension.axes.length);
      return dimension.symmetry === "all" ? columns ** axes : multisetCount(columns, axes);
    }
    case "position":
    case "count":
    case "radius":
      return BigInt(valuesLength(dimension.values));
    case "orientation":
      return 2n;
  }
}

/** Number of values of a list or range. */
export function valuesLength(values: SweepValues): number {
  return values.kind === "list" ? values.values.length : values.steps;
}

/**
 * The i-th value of a list or range; ranges are evenly spaced with both ends included and are
 * rounded to 12 significant digits, so 0 to 1 in 11 steps gives 0.3, not 0.30000000000000004.
 *
 * @example
 * valueAt({ kind: "range", from: 0, to: 1, steps: 11 }, 3) // => 0.3
 */
export function valueAt(values: SweepValues, index: number): number {
  if (values.kind === "list") {
    const value = values.values[index];
    if (value === undefined) throw new RangeError(`Value ${index} is outside the list of ${values.values.length}`);
    return value;
  }
  if (!Number.isInteger(index) || index < 0 || index >= values.steps) {
    throw new RangeError(`Value ${index} is outside the range of ${values.steps} steps`);
  }
  if (values.steps === 1) return values.from;
  return Number((values.from + ((values.to - values.from) * index) / (values.steps - 1)).toPrecision(12));
}

/**
 * The value a dimension takes at position `index` of its own values.
 *
 * @example
 * dimensionValue({ kind: "orientation", stack: "a" }, 1) // => { kind: "orientation", anti: true }
 */
export function dimensionValue(dimension: SweepDimension, index: number): DimensionValue {
  switch (dimension.kind) {
    case "boundary": {
      const kinds = 2 ** dimension.stacks.length;
      const k = dimension.axes.length;
      if (dimension.symmetry === "relabel-axes") return { kind: "boundary", columns: unrankMultiset(index, kinds, k) };
      if (!Number.isInteger(index) || index < 0 || index >= kinds ** k) throw new RangeError(`Choice ${index} is outside 0..${kinds ** k - 1}`);
      // Digits in base 2^s, the first axis varying slowest, like the dimensions of a sweep.
      const columns = new Array<number>(k);
      let rest = index;
      for (let t = k - 1; t >= 0; t -= 1) {
        columns[t] = rest % kinds;
        rest = Math.floor(rest / kinds);
      }
      return { kind: "boundary", columns };
    }
    case "position":
      return { kind: "position", value: valueAt(dimension.values, index) };
    case "count":
      return { kind: "count", value: valueAt(dimension.values, index) };
    case "radius":
      return { kind: "radius", value: valueAt(dimension.values, index) };
    case "orientation":
      if (index !== 0 && index !== 1) throw new RangeError(`Orientation ${index} is outside 0..1`);
      return { kind: "orientation", anti: index === 1 };
  }
}

/** True when, in a boundary value, stack number `stackIndex` of the dimension is Neumann on its axis number `axisIndex`. */
export function isNeumannAt(value: Extract<DimensionValue, { kind: "boundary" }>, stackIndex: number, axisIndex: number): boolean {
  return (((value.columns[axisIndex] ?? 0) >> stackIndex) & 1) === 1;
}

/**
 * A short heading for a dimension, for table columns and plot axes.
 *
 * @example
 * dimensionLabel({ kind: "position", stack: "probe", axis: 8, values }) // => "probe x8"
 * dimensionLabel({ kind: "boundary", stacks: ["a", "b"], axes: [4, 5], symmetry: "all" }) // => "N/D of a, b on x4 x5"
 * dimensionLabel({ kind: "radius", axis: 9, values }) // => "R9"
 */
export function dimensionLabel(dimension: SweepDimension): string {
  switch (dimension.kind) {
    case "boundary":
      return `N/D of ${dimension.stacks.join(", ")} on ${dimension.axes.map((axis) => `x${axis}`).join(" ")}`;
    case "position":
      return `${dimension.stack} x${dimension.axis}`;
    case "count":
      return `${dimension.stack} count N`;
    case "orientation":
      return `${dimension.stack} brane/antibrane`;
    case "radius":
      return `R${dimension.axis}`;
  }
}

/**
 * A dimension's value as text: per stack its letters on the chosen axes, a number, or brane/antibrane.
 *
 * @example
 * formatDimensionValue(boundaryOfAB, { kind: "boundary", columns: [1, 3] }) // => "a NN · b DN"
 */
export function formatDimensionValue(dimension: SweepDimension, value: DimensionValue): string {
  if (value.kind === "boundary" && dimension.kind === "boundary") {
    return dimension.stacks
      .map((stack, stackIndex) => `${stack} ${dimension.axes.map((_axis, axisIndex) => (isNeumannAt(value, stackIndex, axisIndex) ? "N" : "D")).join("")}`)
      .join(" · ");
  }
  if (value.kind === "orientation") return value.anti ? "antibrane" : "brane";
  const number = numericValue(value);
  return number === null ? "" : String(number);
}

/** The kinds of dimension whose values are numbers. */
export type NumericDimension = Extract<SweepDimension, { kind: "position" | "count" | "radius" }>;

/** True for a dimension whose values are numbers (a plot axis can be continuous). */
export function isNumericDimension(dimension: SweepDimension): dimension is NumericDimension {
  return dimension.kind === "position" || dimension.kind === "count" || dimension.kind === "radius";
}

/**
 * The number a numeric dimension's value stands for, or null for a boundary choice or orientation.
 *
 * @example
 * numericValue({ kind: "radius", value: 2.5 }) // => 2.5
 * numericValue({ kind: "orientation", anti: true }) // => null
 */
export function numericValue(value: DimensionValue): number | null {
  return value.kind === "position" || value.kind === "count" || value.kind === "radius" ? value.value : null;
}
