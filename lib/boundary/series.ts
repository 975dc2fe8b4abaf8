/**
 * Truncated power series with exact BigInt coefficients, for level generating functions.
 *
 * Convention: a `Series` holds the coefficients of t^0, t^1, ..., t^K with t = q^(1/2), so index k
 * is the oscillator level N = k / 2 (half-integer levels fit). A factor `(1 + sign t^power)^exponent`
 * is a `SeriesFactor`; a negative exponent is a denominator.
 *
 * Infinite products are computed with the logarithmic-derivative recurrence: for
 * F = prod_i (1 + s_i t^{m_i})^{p_i}, t F'/F = sum_k c_k t^k with
 * c_k = sum over factors with m_i | k of p_i m_i (-1)^{j+1} s_i^j, j = k / m_i, and then
 * k F_k = sum_{j=1..k} c_j F_{k-j} (the Euler transform; e.g. Apostol, "Introduction to Analytic
 * Number Theory", section 14.4, from memory). That is O(K^2) exact operations for the whole
 * product however many factors it has, instead of expanding each binomial.
 *
 * Invalid-input policy (RangeError): `maxIndex` must be an integer from 0 to `maxSeriesIndex`;
 * a factor's `power` a positive integer, `sign` 1 or -1 and `exponent` a safe integer.
 * Operations on two series truncate to the shorter one (beyond it the product is unknown).
 */

import type { Moding } from "./types";

/** Coefficients of t^0 .. t^K, t = q^(1/2); index k is level k / 2. */
export type Series = bigint[];

/** The factor (1 + sign * t^power)^exponent; a negative exponent puts it in the denominator. */
export interface SeriesFactor {
  /** Power m of t (m = 2n for the integer mode n, m = 2n - 1 for the half-integer mode n - 1/2). */
  power: number;
  /** +1 for (1 + t^m), -1 for (1 - t^m). */
  sign: 1 | -1;
  /** Integer exponent; negative for denominators, 0 for no factor. */
  exponent: number;
}

/**
 * Largest truncation index accepted (level 1000); the product costs O(K^2) BigInt operations.
 *
 * @example
 * maxSeriesIndex // => 2000
 */
export const maxSeriesIndex = 2000;

/**
 * Expands one factor (1 + sign t^m)^exponent to order t^maxIndex with the binomial recurrence
 * C(p, j) = C(p, j - 1) (p - j + 1) / j (O(maxIndex / m) exact steps).
 *
 * @param m - Power of t in the factor (positive integer).
 * @param sign - +1 for (1 + t^m), -1 for (1 - t^m).
 * @param exponent - Integer exponent (negative: the factor is a denominator).
 * @param maxIndex - Highest power of t kept.
 * @returns The series of length maxIndex + 1.
 * @throws RangeError for invalid arguments (see the module policy).
 * @example
 * powerOfFactor(1, -1, -2, 4) // => [1n, 2n, 3n, 4n, 5n]   (1 - t)^-2
 * powerOfFactor(2, 1, 2, 4)   // => [1n, 0n, 2n, 0n, 1n]   (1 + t^2)^2
 */
export function powerOfFactor(m: number, sign: 1 | -1, exponent: number, maxIndex: number): Series {
  assertMaxIndex(maxIndex);
  assertFactor({ power: m, sign, exponent });
  const result = zeroSeries(maxIndex);
  const p = BigInt(exponent);
  const s = BigInt(sign);
  let coefficient = 1n;
  for (let j = 0; j * m <= maxIndex; j += 1) {
    if (j > 0) {
      const step = BigInt(j);
      // Generalised binomial C(p, j) s^j; the division is exact at every step.
      coefficient = (coefficient * (p - step + 1n) * s) / step;
      if (coefficient === 0n) break; // a positive exponent ends the polynomial
    }
    result[j * m] = coefficient;
  }
  return result;
}

/**
 * Multiplies out a finite list of factors (1 + s t^m)^p to order t^maxIndex with the
 * logarithmic-derivative recurrence (see the module doc).
 *
 * @param factors - The factors; repeated powers are fine, exponent 0 factors are ignored.
 * @param maxIndex - Highest power of t kept.
 * @returns The product as a series of length maxIndex + 1 (constant term 1).
 * @throws RangeError for invalid factors or maxIndex (see the module policy).
 * @example
 * seriesProduct(modeFactors("integer", -1, -1, 10), 10)
 * // => [1n, 0n, 1n, 0n, 2n, 0n, 3n, 0n, 5n, 0n, 7n]   partitions p(0..5) at even t-powers
 */
export function seriesProduct(factors: readonly SeriesFactor[], maxIndex: number): Series {
  assertMaxIndex(maxIndex);
  const weights: bigint[] = new Array<bigint>(maxIndex + 1).fill(0n);
  for (const factor of factors) {
    assertFactor(factor);
    if (factor.exponent === 0) continue;
    // t d/dt log (1 + s t^m)^p = p m sum_{j>=1} (-1)^(j+1) s^j t^(mj).
    const base = BigInt(factor.exponent * factor.power);
    // (-1)^(j+1) s^j is -1 for every j when s = -1, and alternates +1, -1, ... when s = +1.
    for (let j = 1; j * factor.power <= maxIndex; j += 1) {
      const index = j * factor.power;
      const negative = factor.sign === -1 || j % 2 === 0;
      weights[index] = (weights[index] ?? 0n) + (negative ? -base : base);
    }
  }
  const nonZero: number[] = [];
  let stride = 0;
  for (let j = 1; j <= maxIndex; j += 1) {
    if (weights[j] === 0n) continue;
    nonZero.push(j);
    stride = gcd(stride, j);
  }

  const result = zeroSeries(maxIndex);
  result[0] = 1n;
  if (stride === 0) return result;
  // Only multiples of the gcd of the occurring powers can be non-zero (e.g. integer levels only,
  // when there are no half-integer modes), so the other indices are skipped.
  for (let k = stride; k <= maxIndex; k += stride) {
    let sum = 0n;
    for (const j of nonZero) {
      if (j > k) break;
      sum += (weights[j] ?? 0n) * (result[k - j] ?? 0n);
    }
    result[k] = sum / BigInt(k);
  }
  return result;
}

/**
 * The factors of prod_{n >= 1} (1 + sign q^n)^exponent (integer moding) or
 * prod_{n >= 1} (1 + sign q^(n - 1/2))^exponent (half-integer moding), as powers of t = q^(1/2)
 * up to maxIndex.
 *
 * @param moding - "integer" (t^2, t^4, ...) or "half-integer" (t^1, t^3, ...).
 * @param sign - +1 or -1 inside the factor.
 * @param exponent - Exponent of every factor (negative for denominators).
 * @param maxIndex - Highest power of t that matters.
 * @returns The list of factors (empty when exponent is 0).
 * @throws RangeError for an invalid maxIndex.
 * @example
 * modeFactors("half-integer", 1, 8, 4) // => [{ power: 1, sign: 1, exponent: 8 }, { power: 3, sign: 1, exponent: 8 }]
 */
export function modeFactors(moding: Moding, sign: 1 | -1, exponent: number, maxIndex: number): SeriesFactor[] {
  assertMaxIndex(maxIndex);
  if (exponent === 0) return [];
  const factors: SeriesFactor[] = [];
  for (let power = moding === "integer" ? 2 : 1; power <= maxIndex; power += 2) {
    factors.push({ power, sign, exponent });
  }
  return factors;
}

/**
 * Multiplies two truncated series.
 *
 * @param a - First series.
 * @param b - Second series.
 * @returns a * b truncated to the shorter length (further terms are not determined by the inputs).
 * @example
 * multiplySeries([1n, 1n, 0n], [1n, -1n, 0n]) // => [1n, 0n, -1n]
 */
export function multiplySeries(a: readonly bigint[], b: readonly bigint[]): Series {
  const length = Math.min(a.length, b.length);
  const result = zeroSeries(length - 1);
  for (let i = 0; i < length; i += 1) {
    const left = a[i] ?? 0n;
    if (left === 0n) continue; // generating functions here are sparse in t
    for (let j = 0; i + j < length; j += 1) result[i + j] = (result[i + j] ?? 0n) + left * (b[j] ?? 0n);
  }
  return result;
}

/**
 * Multiplies every coefficient by an integer.
 *
 * @param a - The series.
 * @param factor - The integer multiplier (e.g. a fermion zero-mode degeneracy 2^k).
 * @returns factor * a (a new array).
 * @example
 * scaleSeries([1n, 2n], 16n) // => [16n, 32n]
 */
export function scaleSeries(a: readonly bigint[], factor: bigint): Series {
  return a.map((coefficient) => coefficient * factor);
}

/**
 * Adds two truncated series.
 *
 * @param a - First series.
 * @param b - Second series.
 * @returns a + b truncated to the shorter length.
 * @example
 * addSeries([1n, 2n, 3n], [1n, -2n]) // => [2n, 0n]
 */
export function addSeries(a: readonly bigint[], b: readonly bigint[]): Series {
  return combine(a, b, 1n);
}

/**
 * Subtracts two truncated series.
 *
 * @param a - Minuend.
 * @param b - Subtrahend.
 * @returns a - b truncated to the shorter length.
 * @example
 * subtractSeries([1n, 2n], [1n, -2n]) // => [0n, 4n]
 */
export function subtractSeries(a: readonly bigint[], b: readonly bigint[]): Series {
  return combine(a, b, -1n);
}

/**
 * Divides every coefficient by an integer that must divide it exactly.
 *
 * @param a - The series.
 * @param divisor - Non-zero integer (e.g. 2n for a projection (f +/- f_F) / 2).
 * @returns a / divisor.
 * @throws RangeError when the divisor is zero or some coefficient is not a multiple of it
 *   (for a projection that would mean an inconsistent generating function).
 * @example
 * divideSeriesExactly([2n, 4n], 2n) // => [1n, 2n]
 */
export function divideSeriesExactly(a: readonly bigint[], divisor: bigint): Series {
  if (divisor === 0n) throw new RangeError("Division of a series by zero");
  return a.map((coefficient, index) => {
    if (coefficient % divisor !== 0n) {
      throw new RangeError(`Coefficient ${coefficient.toString()} at index ${index} is not divisible by ${divisor.toString()}`);
    }
    return coefficient / divisor;
  });
}

/**
 * Evaluates a truncated series at a real t in floating point (Horner's rule), for numerical checks.
 *
 * @param a - The series.
 * @param t - The point (|t| < 1 for the infinite products of this module).
 * @returns sum_k a_k t^k as a double.
 * @example
 * evaluateSeries([1n, 2n, 3n], 0.5) // => 2.75
 */
export function evaluateSeries(a: readonly bigint[], t: number): number {
  let value = 0;
  for (let k = a.length - 1; k >= 0; k -= 1) value = value * t + Number(a[k] ?? 0n);
  return value;
}

function combine(a: readonly bigint[], b: readonly bigint[], sign: bigint): Series {
  const length = Math.min(a.length, b.length);
  const result = zeroSeries(length - 1);
  for (let k = 0; k < length; k += 1) result[k] = (a[k] ?? 0n) + sign * (b[k] ?? 0n);
  return result;
}

function gcd(a: number, b: number): number {
  while (b !== 0) [a, b] = [b, a % b];
  return a;
}

function zeroSeries(maxIndex: number): Series {
  return new Array<bigint>(Math.max(maxIndex + 1, 0)).fill(0n);
}

function assertMaxIndex(maxIndex: number): void {
  if (!Number.isInteger(maxIndex) || maxIndex < 0 || maxIndex > maxSeriesIndex) {
    throw new RangeError(`Series truncation index must be an integer from 0 to ${maxSeriesIndex}, got ${String(maxIndex)}`);
  }
}

function assertFactor(factor: SeriesFactor): void {
  if (!Number.isInteger(factor.power) || factor.power < 1) {
    throw new RangeError(`Factor power must be a positive integer, got ${String(factor.power)}`);
  }
  if (factor.sign !== 1 && factor.sign !== -1) {
    throw new RangeError(`Factor sign must be 1 or -1, got ${String(factor.sign)}`);
  }
  if (!Number.isSafeInteger(factor.exponent)) {
    throw new RangeError(`Factor exponent must be a safe integer, got ${String(factor.exponent)}`);
  }
}
