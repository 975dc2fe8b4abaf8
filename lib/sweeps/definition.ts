/**
 * Checking a sweep definition against the configuration it varies, and counting its points.
 *
 * Invalid-input policy: `checkSweepDefinition` never throws for a value of type SweepDefinition;
 * it lists every problem at its JSON path (from the definition's root), so a form can show each
 * one beside its field. A sweep with more than `sweepLimits.maxPoints` points is a problem too,
 * reported before anything is stored or queued.
 */
import { compactLimits, configurationLimits, dimensionOf } from "../boundary";
import type { Configuration } from "../boundary/types";
import { dimensionSize, valueAt, valuesLength } from "./dimension";
import type { SweepDefinition, SweepValues } from "./types";

/**
 * Limits of one sweep.
 *
 * @example
 * sweepLimits.maxPoints // => 200000
 */
export const sweepLimits = {
  /** Most points in one sweep. */
  maxPoints: 200_000,
  /** Most dimensions in one sweep. */
  maxDimensions: 6,
  /** Most values of one listed or ranged dimension. */
  maxValues: 10_000,
} as const;

/** One problem of a definition, at the JSON path of the offending value. */
export interface SweepProblem {
  path: (string | number)[];
  message: string;
}

/**
 * The number of points of a definition: the product of its dimensions' sizes, exactly.
 *
 * @example
 * sweepPointCount({ format: 1, dimensions: [orientationOfA, { kind: "position", stack: "a", axis: 9, values: { kind: "range", from: 0, to: 5, steps: 11 } }] }) // => 22n
 */
export function sweepPointCount(definition: SweepDefinition): bigint {
  return definition.dimensions.reduce((product, dimension) => product * dimensionSize(dimension), 1n);
}

/**
 * Formats a point count with thousands separators, for messages.
 *
 * @example
 * formatPointCount(262144n) // => "262,144"
 */
export function formatPointCount(count: bigint | number): string {
  return BigInt(count).toString().replace(/\B(?=(\d{3})+(?!\d))/g, ",");
}

/**
 * Every problem that keeps a definition from running on a configuration.
 *
 * @param base - The configuration the sweep varies (its stacks and dimension are read).
 * @param definition - The definition (not mutated).
 * @returns Problems in definition order, the point limit last; empty when the sweep may start.
 * @example
 * checkSweepDefinition(base, { format: 1, dimensions: [{ kind: "orientation", stack: "nope" }] })
 * // => [{ path: ["dimensions", 0, "stack"], message: 'There is no stack "nope" in this configuration' }]
 */
export function checkSweepDefinition(base: Configuration, definition: SweepDefinition): SweepProblem[] {
  const problems: SweepProblem[] = [];
  const dimension = dimensionOf(base);
  const stackIds = new Set(base.stacks.map((stack) => stack.id));
  const dims = definition.dimensions;
  if (dims.length === 0) problems.push({ path: ["dimensions"], message: "Add at least one dimension to sweep over" });
  if (dims.length > sweepLimits.maxDimensions) {
    problems.push({ path: ["dimensions"], message: `At most ${sweepLimits.maxDimensions} dimensions are allowed, got ${dims.length}` });
  }

  // Which dimension already controls what, to refuse two dimensions that set the same thing.
  const owners = new Map<string, number>();
  const claim = (key: string, what: string, index: number, path: (string | number)[]) => {
    const previous = owners.get(key);
    if (previous !== undefined && previous !== index) {
      problems.push({ path, message: `${what} is already swept by dimension ${previous + 1}` });
    } else {
      owners.set(key, index);
    }
  };
  const checkStack = (stack: string, path: (string | number)[]): boolean => {
    if (stackIds.has(stack)) return true;
    problems.push({ path, message: `There is no stack "${stack}" in this configuration` });
    return false;
  };
  const checkAxis = (axis: number, path: (string | number)[]): boolean => {
    if (Number.isInteger(axis) && axis >= 1 && axis <= dimension - 1) return true;
    problems.push({ path, message: `Axis ${String(axis)} is not a spatial axis 1..${dimension - 1}` });
    return false;
  };

  dims.forEach((dim, index) => {
    const at = (...rest: (string | number)[]) => ["dimensions", index, ...rest];
    switch (dim.kind) {
      case "boundary": {
        if (dim.stacks.length === 0) problems.push({ path: at("stacks"), message: "Pick at least one stack" });
        if (dim.axes.length === 0) problems.push({ path: at("axes"), message: "Pick at least one axis" });
        if (new Set(dim.stacks).size !== dim.stacks.length) problems.push({ path: at("stacks"), message: "A stack is listed twice" });
        if (new Set(dim.axes).size !== dim.axes.length) problems.push({ path: at("axes"), message: "An axis is listed twice" });
        const stacksOk = dim.stacks.map((stack, i) => checkStack(stack, at("stacks", i)));
        const axesOk = dim.axes.map((axis, i) => checkAxis(axis, at("axes", i)));
        dim.stacks.forEach((stack, i) => {
          dim.axes.forEach((axis, j) => {
            if (stacksOk[i] && axesOk[j]) claim(`nd:${stack}:${axis}`, `The N/D choice of "${stack}" on x${axis}`, index, at("axes", j));
          });
        });
        break;
      }
      case "position": {
        const ok = checkStack(dim.stack, at("stack")) && checkAxis(dim.axis, at("axis"));
        checkValues(dim.values, at("values"), problems, { integer: false, min: -configurationLimits.maxAbsPosition, max: configurationLimits.maxAbsPosition, what: "Positions" });
        if (ok) claim(`position:${dim.stack}:${dim.axis}`, `The position of "${dim.stack}" on x${dim.axis}`, index, at("axis"));
        break;
      }
      case "count": {
        const ok = checkStack(dim.stack, at("stack"));
        checkValues(dim.values, at("values"), problems, { integer: true, min: 1, max: configurationLimits.maxCount, what: "Counts" });
        if (ok) claim(`count:${dim.stack}`, `The count of "${dim.stack}"`, index, at("stack"));
        break;
      }
      case "orientation": {
        const ok = checkStack(dim.stack, at("stack"));
        if (base.theory === "bosonic") {
          problems.push({ path: at("kind"), message: "The bosonic string has no RR charge, so brane and antibrane give the same spectrum" });
        }
        if (ok) claim(`orientation:${dim.stack}`, `Brane/antibrane of "${dim.stack}"`, index, at("stack"));
        break;
      }
      case "radius": {
        const ok = checkAxis(dim.axis, at("axis"));
        // The engine's own limits, so that no point is refused for its radius alone.
        checkValues(dim.values, at("values"), problems, { integer: false, min: compactLimits.minRadius, max: compactLimits.maxRadius, what: "Radii" });
        if (ok) claim(`radius:${dim.axis}`, `The radius of x${dim.axis}`, index, at("axis"));
        break;
      }
    }
  });

  if (dims.length > 0) {
    const count = sweepPointCount(definition);
    if (count > BigInt(sweepLimits.maxPoints)) {
      problems.push({
        path: ["dimensions"],
        message: `This sweep has ${formatPointCount(count)} points; at most ${formatPointCount(sweepLimits.maxPoints)} are allowed. Use fewer values, fewer stacks or axes, or count N/D choices up to relabelling the axes.`,
      });
    }
  }
  return problems;
}

function checkValues(
  values: SweepValues,
  path: (string | number)[],
  problems: SweepProblem[],
  rule: { integer: boolean; min: number; max: number; what: string },
): void {
  const length = valuesLength(values);
  if (!Number.isInteger(length) || length < 1 || length > sweepLimits.maxValues) {
    problems.push({
      path: [...path, values.kind === "list" ? "values" : "steps"],
      message: `Give 1 to ${sweepLimits.maxValues} values, got ${String(length)}`,
    });
    return;
  }
  const inRange = (value: number) => Number.isFinite(value) && value >= rule.min && value <= rule.max && (!rule.integer || Number.isInteger(value));
  const describe = `${rule.what} must be ${rule.integer ? "whole numbers" : "numbers"} from ${rule.min} to ${rule.max}`;
  if (values.kind === "list") {
    const bad = values.values.findIndex((value) => !inRange(value));
    if (bad >= 0) problems.push({ path: [...path, "values", bad], message: `${describe}, got ${String(values.values[bad])}` });
    if (new Set(values.values).size !== values.values.length) problems.push({ path: [...path, "values"], message: "A value is listed twice" });
    return;
  }
  for (const end of ["from", "to"] as const) {
    if (!inRange(values[end])) problems.push({ path: [...path, end], message: `${describe}, got ${String(values[end])}` });
  }
  if (rule.integer && values.steps > 1 && inRange(values.from) && inRange(values.to)) {
    const bad = Array.from({ length: values.steps }, (_unused, i) => valueAt(values, i)).find((value) => !Number.isInteger(value));
    if (bad !== undefined) {
      problems.push({ path: [...path, "steps"], message: `${rule.what} must be whole numbers; ${values.steps} steps from ${values.from} to ${values.to} give ${bad}` });
    }
  }
}
