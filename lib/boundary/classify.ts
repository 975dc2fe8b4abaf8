/**
 * Classification of an ordered pair of stacks (a, b) by boundary conditions, axis by axis.
 *
 * Conventions (physics.md, "Classifying a pair of stacks"): the open string runs from stack a
 * at sigma = 0 to stack b at sigma = pi, so the first letter of an axis type is the condition
 * on a and the second on b. Axis 0 (time) is Neumann for every stack and is not listed; the
 * spatial axes are 1..D-1. Positions are in units of sqrt(alpha'); a Dirichlet axis missing from
 * `position` sits at 0.
 */

import type { AxisType, Stack } from "./types";

/** The part of a stack that the classification reads. */
export type ClassifiedStack = Pick<Stack, "worldvolume" | "position">;

/** One spatial axis of an ordered pair. */
export interface AxisClassification {
  /** Spatial axis number, 1..D-1. */
  axis: number;
  /** Boundary conditions: first letter on stack a (sigma = 0), second on stack b (sigma = pi). */
  type: AxisType;
  /** Position of stack a on this axis when it is Dirichlet there, else null. */
  positionA: number | null;
  /** Position of stack b on this axis when it is Dirichlet there, else null. */
  positionB: number | null;
}

/** One component of the separation vector (DD axes only). */
export interface SeparationComponent {
  axis: number;
  /** x_b - x_a along this axis, in units of sqrt(alpha'). */
  delta: number;
}

/** Boundary-condition summary of an ordered pair of stacks. */
export interface PairClassification {
  /** Every spatial axis 1..D-1 in increasing order. */
  axes: AxisClassification[];
  /** Number of spatial NN axes. */
  nn: number;
  /** Number of spatial DD axes. */
  dd: number;
  /** Number of ND axes (Neumann on a, Dirichlet on b). */
  nd: number;
  /** Number of DN axes (Dirichlet on a, Neumann on b). */
  dn: number;
  /** nu = ND + DN over all spatial axes. */
  nu: number;
  /** x_b - x_a over the DD axes only (an ND or DN axis has a free end, so nothing stretches). */
  separationVector: SeparationComponent[];
  /** y^2 = sum of the squared DD differences, in units of alpha'. */
  separationSquared: number;
  /** y = |separationVector|, in units of sqrt(alpha'). */
  separation: number;
}

/**
 * Position of a stack along a spatial axis on which it is Dirichlet.
 *
 * @param stack - The stack; its `position` is keyed by the axis number as a string.
 * @param axis - Spatial axis number.
 * @returns The position in units of sqrt(alpha'); 0 when the key is absent. The caller decides
 *   whether the axis is Dirichlet; for a Neumann axis the stored value has no meaning.
 * @example
 * dirichletPosition({ worldvolume: [1], position: { "9": 3.5 } }, 9) // => 3.5
 * dirichletPosition({ worldvolume: [1], position: {} }, 4)           // => 0
 */
export function dirichletPosition(stack: Pick<Stack, "position">, axis: number): number {
  return stack.position[String(axis)] ?? 0;
}

/**
 * Classifies an ordered pair of stacks axis by axis and measures their separation.
 *
 * @param a - Stack at sigma = 0.
 * @param b - Stack at sigma = pi (may be `a` itself, giving nu = 0 and y = 0).
 * @param dimension - Spacetime dimension D; spatial axes are 1..D-1.
 * @returns Axis types, counts nn/dd/nd/dn, nu = nd + dn, and the DD separation y.
 *   Invalid input (axes outside 1..D-1) is not rejected here: validate first with
 *   `checkConfiguration`; out-of-range worldvolume axes are simply never visited.
 * @example
 * const r = classifyPair(
 *   { worldvolume: [1, 2, 3, 4, 5, 6, 7, 8], position: { "9": 0 } },
 *   { worldvolume: [1, 2, 3, 4], position: { "9": 3.5 } },
 *   10,
 * );
 * // r.nn === 4, r.dd === 1, r.nd === 4, r.dn === 0, r.nu === 4, r.separation === 3.5
 */
export function classifyPair(a: ClassifiedStack, b: ClassifiedStack, dimension: number): PairClassification {
  const neumannA = new Set(a.worldvolume);
  const neumannB = new Set(b.worldvolume);
  const axes: AxisClassification[] = [];
  const separationVector: SeparationComponent[] = [];
  let nn = 0;
  let dd = 0;
  let nd = 0;
  let dn = 0;
  let separationSquared = 0;
  for (let axis = 1; axis < dimension; axis += 1) {
    const nA = neumannA.has(axis);
    const nB = neumannB.has(axis);
    const positionA = nA ? null : dirichletPosition(a, axis);
    const positionB = nB ? null : dirichletPosition(b, axis);
    let type: AxisType;
    if (nA && nB) {
      type = "NN";
      nn += 1;
    } else if (nA) {
      type = "ND";
      nd += 1;
    } else if (nB) {
      type = "DN";
      dn += 1;
    } else {
      type = "DD";
      dd += 1;
      const delta = (positionB ?? 0) - (positionA ?? 0);
      separationVector.push({ axis, delta });
      separationSquared += delta * delta;
    }
    axes.push({ axis, type, positionA, positionB });
  }
  return {
    axes,
    nn,
    dd,
    nd,
    dn,
    nu: nd + dn,
    separationVector,
    separationSquared,
    separation: Math.sqrt(separationSquared),
  };
}
