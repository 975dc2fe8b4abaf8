/**
 * The points of a sweep, by number: point i of a definition is a mixed-radix number whose digits
 * are the value indices of the dimensions, the first dimension varying slowest. Nothing is listed
 * in advance, so any range of points (a chunk) is computed from its numbers alone, and the same
 * numbers mean the same points in the browser, the app and every worker.
 *
 * Invalid-input policy: expects a definition that `checkSweepDefinition` accepts for `base`;
 * a point number outside 0..count-1 throws a RangeError. Documents are new objects; `base` is
 * never mutated.
 */
import type { Configuration, Stack } from "../boundary/types";
import { dimensionSize, dimensionValue, isNeumannAt } from "./dimension";
import type { DimensionValue, SweepDefinition } from "./types";

/**
 * The value of every dimension at point `index`.
 *
 * @example
 * pointValues({ format: 1, dimensions: [orientationOfA, positionOfAInThreeSteps] }, 4)
 * // => [{ kind: "orientation", anti: true }, { kind: "position", value: ... (the second step) }]
 */
export function pointValues(definition: SweepDefinition, index: number): DimensionValue[] {
  const digits = pointDigits(definition, index);
  return definition.dimensions.map((dimension, d) => dimensionValue(dimension, digits[d] ?? 0));
}

/**
 * The position of point `index` along each dimension (the digits of its mixed-radix number).
 *
 * @example
 * pointDigits({ format: 1, dimensions: [orientationOfB, threePositions] }, 4) // => [1, 1]
 */
export function pointDigits(definition: SweepDefinition, index: number): number[] {
  return pointNumbering(definition).digits(index);
}

/**
 * The numbering of a definition's points, with the sizes worked out once: for callers that decode
 * many points (tables of 200,000 rows).
 *
 * @example
 * pointNumbering(definition).digits(4) // => as pointDigits(definition, 4)
 */
export function pointNumbering(definition: SweepDefinition): { total: number; digits: (index: number) => number[] } {
  const sizes = definition.dimensions.map((dimension) => Number(dimensionSize(dimension)));
  const total = sizes.reduce((product, size) => product * size, 1);
  return {
    total,
    digits: (index) => {
      if (!Number.isInteger(index) || index < 0 || index >= total) throw new RangeError(`Point ${index} is outside 0..${total - 1}`);
      const digits = new Array<number>(sizes.length);
      let rest = index;
      for (let d = sizes.length - 1; d >= 0; d -= 1) {
        const size = sizes[d] ?? 1;
        digits[d] = rest % size;
        rest = Math.floor(rest / size);
      }
      return digits;
    },
  };
}

/**
 * The configuration at a point: the base with every dimension's value applied. A Neumann axis
 * loses its position; a Dirichlet axis keeps the base position unless a position dimension sets it.
 * A radius dimension makes the document format 2 with its axis compact at that radius.
 *
 * @example
 * pointDocument(base, { format: 1, dimensions: [{ kind: "count", stack: "a", values: { kind: "list", values: [3] } }] }, 0).stacks[0].count // => 3
 */
export function pointDocument(base: Configuration, definition: SweepDefinition, index: number): Configuration {
  return applyValues(base, definition, pointValues(definition, index));
}

/** Applies dimension values (from {@link pointValues}) to a copy of the base configuration. */
export function applyValues(base: Configuration, definition: SweepDefinition, values: readonly DimensionValue[]): Configuration {
  const stacks = new Map<string, Stack>(
    base.stacks.map((stack) => [stack.id, { ...stack, worldvolume: [...stack.worldvolume], position: { ...stack.position } }]),
  );
  // Boundary choices first, so that positions apply to the axes that end up Dirichlet.
  definition.dimensions.forEach((dimension, d) => {
    const value = values[d];
    if (dimension.kind !== "boundary" || value?.kind !== "boundary") return;
    dimension.stacks.forEach((id, stackIndex) => {
      const stack = stacks.get(id);
      if (!stack) return;
      const neumann = new Set(stack.worldvolume);
      dimension.axes.forEach((axis, axisIndex) => {
        if (isNeumannAt(value, stackIndex, axisIndex)) {
          neumann.add(axis);
          delete stack.position[String(axis)];
        } else {
          neumann.delete(axis);
        }
      });
      stack.worldvolume = [...neumann].sort((x, y) => x - y);
    });
  });
  let compact = base.compact;
  definition.dimensions.forEach((dimension, d) => {
    const value = values[d];
    if (dimension.kind === "radius" && value?.kind === "radius") compact = { ...compact, [String(dimension.axis)]: value.value };
  });
  definition.dimensions.forEach((dimension, d) => {
    const value = values[d];
    if (!value || dimension.kind === "boundary" || dimension.kind === "radius") return;
    const stack = stacks.get(dimension.stack);
    if (!stack) return;
    if (dimension.kind === "position" && value.kind === "position") {
      if (!stack.worldvolume.includes(dimension.axis)) stack.position[String(dimension.axis)] = value.value;
    } else if (dimension.kind === "count" && value.kind === "count") {
      stack.count = value.value;
    } else if (dimension.kind === "orientation" && value.kind === "orientation") {
      stack.anti = value.anti;
    }
  });
  const document: Configuration = { ...base, stacks: base.stacks.map((stack) => stacks.get(stack.id) ?? stack) };
  return compact === base.compact ? document : { ...document, format: 2, compact };
}
