/**
 * Exact level degeneracies of open-string oscillator states, before and after the GSO projection.
 *
 * Arrays are indexed by twice the level (index k is N = k / 2), so half-integer levels fit.
 * Generating functions (physics.md, "Level degeneracies"; light-cone gauge, 8 transverse
 * directions in type II, of which nu are ND/DN):
 * - bosonic: prod_{n>=1} (1 - q^n)^-(D-2-nu) (1 - q^(n-1/2))^-nu
 * - NS: 2^(nu/2) prod (1 + q^(n-1/2))^(8-nu) (1 + q^n)^nu / [(1 - q^n)^(8-nu) (1 - q^(n-1/2))^nu]
 * - R:  2^((8-nu)/2) prod (1 + q^n)^(8-nu) (1 + q^(n-1/2))^nu / [(1 - q^n)^(8-nu) (1 - q^(n-1/2))^nu]
 * The powers of 2 are the fermion zero-mode degeneracies.
 *
 * GSO projection: (-1)^F is inserted in the trace. f_F is f with every fermion factor's sign
 * flipped, (1 + q^r) -> (1 - q^r), and the zero-mode factor replaced by 0 when fermion zero modes
 * exist (the trace of (-1)^F over their Clifford module vanishes). An orientation keeps
 * (f + f_F)/2 (even F) or (f - f_F)/2 (odd F), per physics.md "GSO projection".
 * It is deliberately not q^(1/2) -> -q^(1/2), which agrees only for NS at nu = 0.
 *
 * Orientation convention for R at nu = 8 (no fermion zero modes): the single R ground state
 * (level 0) is counted in orientation "ab" when the stacks have the same orientation (both
 * branes or both antibranes) and in "ba" when one is an antibrane.
 *
 * Bosonic pairs with every spatial axis ND (nu = D - 1) are counted covariantly: X^0 and the b, c
 * ghosts leave one integer-moded tower in the numerator, prod (1 - q^n)^(+1) (1 - q^(n-1/2))^(-nu),
 * which is the bosonic formula above with D - 2 - nu = -1 (Polchinski vol. 1, section 4.4, from
 * memory; at D = 26 it gives 1, 25, 324, 2925, 20774 at N = 0, 1/2, 1, 3/2, 2).
 *
 * Invalid-input policy (RangeError): bosonic needs an integer D >= 2 and an integer nu with
 * 0 <= nu <= D - 1; NS and R need D = 10 and nu in {0, 2, 4, 6, 8}; `maxLevel` must be a
 * multiple of 1/2 from 0 to 1000.
 */

import { superstringCriticalDimension } from "./constants";
import {
  addSeries,
  divideSeriesExactly,
  maxSeriesIndex,
  modeFactors,
  scaleSeries,
  seriesProduct,
  subtractSeries,
  type Series,
  type SeriesFactor,
} from "./series";
import type { SectorKind } from "./types";

/** Options of `oscillatorDegeneracies`. */
export interface OscillatorDegeneraciesOptions {
  /** Spacetime dimension D (26 critical bosonic; NS and R need 10). */
  dimension: number;
  /** Number of ND/DN spatial axes of the pair. */
  nu: number;
  /** Highest level N computed (a multiple of 1/2, at most 1000). */
  maxLevel: number;
}

/** Options of `projectedDegeneracies`. */
export interface ProjectedDegeneraciesOptions {
  /** Number of ND/DN axes: 0, 2, 4, 6 or 8 (type II, D = 10). */
  nu: number;
  /** True for brane-brane (or antibrane-antibrane), false for brane-antibrane. */
  sameOrientation: boolean;
  /** Highest level N computed (a multiple of 1/2, at most 1000). */
  maxLevel: number;
}

/** GSO-projected state counts at one level, for each orientation of the open string. */
export interface OrientedCounts {
  /** Twice the oscillator level N (so 1 means N = 1/2). */
  twiceLevel: number;
  /** States of the string from stack a (sigma = 0) to stack b (sigma = pi), per Chan-Paton label. */
  ab: bigint;
  /** States of the string from stack b to stack a, per Chan-Paton label. */
  ba: bigint;
}

/**
 * Oscillator-state counts before the GSO projection, level by level.
 *
 * @param sector - "bosonic", "NS" or "R".
 * @param options - `dimension` D, `nu` (ND/DN axes) and `maxLevel` (multiple of 1/2).
 * @returns Counts of length 2 * maxLevel + 1; index k is level N = k / 2 (zero where no state exists).
 * @throws RangeError for invalid options (see the module policy).
 * @example
 * oscillatorDegeneracies("bosonic", { dimension: 26, nu: 0, maxLevel: 2 }) // => [1n, 0n, 24n, 0n, 324n]
 * oscillatorDegeneracies("NS", { dimension: 10, nu: 0, maxLevel: 1 })     // => [1n, 8n, 36n]
 */
export function oscillatorDegeneracies(sector: SectorKind, options: OscillatorDegeneraciesOptions): bigint[] {
  const { dimension, nu, maxLevel } = options;
  const maxIndex = toMaxIndex(maxLevel);
  if (sector === "bosonic") {
    assertBosonic(dimension, nu);
    return seriesProduct(
      [
        ...modeFactors("integer", -1, -(dimension - 2 - nu), maxIndex),
        ...modeFactors("half-integer", -1, -nu, maxIndex),
      ],
      maxIndex,
    );
  }
  if (dimension !== superstringCriticalDimension) {
    throw new RangeError(`The ${sector} sector needs D = ${superstringCriticalDimension}, got ${String(dimension)}`);
  }
  assertTypeIINu(nu);
  return superstringSeries(sector, nu, maxIndex, 1);
}

/**
 * GSO-projected counts per orientation, with (-1)^F inserted in the trace (see the module doc).
 *
 * Which states survive (physics.md, "GSO projection"):
 * - fermion zero modes present (NS with nu >= 2, R with nu <= 6): f_F = 0, so each orientation
 *   keeps half of every level;
 * - NS with nu = 0: same orientation keeps odd fermion number (half-integer levels: no tachyon,
 *   8 massless states), opposite orientation keeps even (integer levels: the tachyon stays,
 *   the massless vector goes);
 * - R with nu = 8: f_F = 1 and the orientations keep opposite parities; the ground state is in
 *   "ab" for the same orientation and in "ba" for opposite orientations (our convention).
 *
 * @param sector - "NS" or "R".
 * @param options - `nu` in {0, 2, 4, 6, 8}, `sameOrientation`, `maxLevel` (multiple of 1/2).
 * @returns One row per level from 0 to maxLevel at which some state survives, in increasing
 *   order; levels where both orientations are empty are left out.
 * @throws RangeError for invalid options (see the module policy).
 * @example
 * projectedDegeneracies("NS", { nu: 0, sameOrientation: true, maxLevel: 2 })
 * // => [{ twiceLevel: 1, ab: 8n, ba: 8n }, { twiceLevel: 3, ab: 128n, ba: 128n }]
 * projectedDegeneracies("R", { nu: 8, sameOrientation: false, maxLevel: 0 })
 * // => [{ twiceLevel: 0, ab: 0n, ba: 1n }]
 */
export function projectedDegeneracies(
  sector: "NS" | "R",
  options: ProjectedDegeneraciesOptions,
): OrientedCounts[] {
  const { nu, sameOrientation, maxLevel } = options;
  if (sector !== "NS" && sector !== "R") {
    throw new RangeError(`The GSO projection applies to the NS and R sectors, got ${String(sector)}`);
  }
  assertTypeIINu(nu);
  const maxIndex = toMaxIndex(maxLevel);
  const f = superstringSeries(sector, nu, maxIndex, 1);
  const fF = superstringSeries(sector, nu, maxIndex, -1);
  const even = divideSeriesExactly(addSeries(f, fF), 2n);
  const odd = divideSeriesExactly(subtractSeries(f, fF), 2n);

  let ab: Series;
  let ba: Series;
  if (sector === "NS" && nu === 0) {
    [ab, ba] = sameOrientation ? [odd, odd] : [even, even];
  } else {
    // With zero modes f_F = 0 and both choices are f/2; for R at nu = 8 the orientations
    // keep opposite parities and the ground state (F even) sits in "ab" for equal orientations.
    [ab, ba] = sameOrientation ? [even, odd] : [odd, even];
  }

  const rows: OrientedCounts[] = [];
  for (let k = 0; k <= maxIndex; k += 1) {
    const countAb = ab[k] ?? 0n;
    const countBa = ba[k] ?? 0n;
    if (countAb !== 0n || countBa !== 0n) rows.push({ twiceLevel: k, ab: countAb, ba: countBa });
  }
  return rows;
}

/**
 * The NS or R generating function f (fermionSign = 1) or f_F with (-1)^F inserted (fermionSign = -1).
 */
function superstringSeries(sector: "NS" | "R", nu: number, maxIndex: number, fermionSign: 1 | -1): Series {
  const transverse = superstringCriticalDimension - 2;
  // NN/DD fermions are half-integer in NS and integer in R; ND/DN fermions have the other moding.
  const integerFermions = sector === "NS" ? nu : transverse - nu;
  const halfIntegerFermions = transverse - integerFermions;
  const factors: SeriesFactor[] = [
    ...modeFactors("integer", -1, -(transverse - nu), maxIndex),
    ...modeFactors("half-integer", -1, -nu, maxIndex),
    ...modeFactors("integer", fermionSign, integerFermions, maxIndex),
    ...modeFactors("half-integer", fermionSign, halfIntegerFermions, maxIndex),
  ];
  // Integer-moded fermions have zero modes: 2^(count/2) ground states, and Tr (-1)^F = 0 over them.
  const zeroModeFactor = integerFermions === 0 ? 1n : fermionSign === 1 ? 2n ** BigInt(integerFermions / 2) : 0n;
  if (zeroModeFactor === 0n) return new Array<bigint>(maxIndex + 1).fill(0n);
  return scaleSeries(seriesProduct(factors, maxIndex), zeroModeFactor);
}

function toMaxIndex(maxLevel: number): number {
  const maxIndex = 2 * maxLevel;
  if (!Number.isInteger(maxIndex) || maxIndex < 0 || maxIndex > maxSeriesIndex) {
    throw new RangeError(`maxLevel must be a multiple of 1/2 from 0 to ${maxSeriesIndex / 2}, got ${String(maxLevel)}`);
  }
  return maxIndex;
}

function assertBosonic(dimension: number, nu: number): void {
  if (!Number.isInteger(dimension) || dimension < 2) {
    throw new RangeError(`Dimension must be an integer of at least 2, got ${String(dimension)}`);
  }
  // nu = D - 1 leaves no light-cone axis: the covariant count (module doc) has D - 2 - nu = -1.
  if (!Number.isInteger(nu) || nu < 0 || nu > dimension - 1) {
    throw new RangeError(`nu must be an integer from 0 to D - 1 = ${dimension - 1}, got ${String(nu)}`);
  }
}

function assertTypeIINu(nu: number): void {
  // Type II pairs have p of equal parity, so nu is even, and at most 8 transverse axes are ND.
  if (!Number.isInteger(nu) || nu < 0 || nu > 8 || nu % 2 !== 0) {
    throw new RangeError(`Type II nu must be 0, 2, 4, 6 or 8, got ${String(nu)}`);
  }
}
