/**
 * Reading the numbers a spectrum result carries as text. The engine writes levels, zero-point
 * energies and alpha' M^2 as exact rationals ("-1/2", "3"), and alpha' M^2 of separated stacks,
 * whose stretching energy (y / 2 pi)^2 is irrational, as a decimal string ("0.310264088", "1e-7").
 * Every reader of those strings goes through this module.
 *
 * Invalid-input policy: nothing here throws. Text of another form reads as NaN
 * (`parseResultNumber`) or null (`parseExactRational`), and sorts after every number.
 */
import { parseRational, rationalToNumber, type Rational } from "@/lib/boundary/rational";

/**
 * Reads an exact rational as the engine writes it.
 *
 * @param text - "-1/2", "3", "0"; a decimal string ("0.25") is not exact.
 * @returns The normalised rational, or null for a decimal string, other text or a zero denominator.
 * @example
 * parseExactRational("-2/4") // => { num: -1n, den: 2n }
 * parseExactRational("0.25") // => null
 */
export function parseExactRational(text: string): Rational | null {
  if (decimalMarks.test(text)) return null;
  try {
    return parseRational(text);
  } catch {
    return null;
  }
}

/**
 * Reads a level, zero-point energy or alpha' M^2 of a result as a double.
 *
 * @param text - An exact rational ("-1/2") or a decimal string ("0.3102", "-1.5e-7").
 * @returns The value; NaN for text of any other form.
 * @example
 * parseResultNumber("-1/2")   // => -0.5
 * parseResultNumber("0.3102") // => 0.3102
 * parseResultNumber("half")   // => NaN
 */
export function parseResultNumber(text: string): number {
  if (decimalMarks.test(text)) return decimalPattern.test(text) ? Number(text) : Number.NaN;
  const exact = parseExactRational(text);
  return exact === null ? Number.NaN : rationalToNumber(exact);
}

/**
 * Orders two numbers of a result by value, for sorting table rows.
 *
 * @param a - An exact rational or decimal string.
 * @param b - An exact rational or decimal string.
 * @returns Negative when a < b, 0 when equal (so "-1/2" equals "-0.5"), positive when a > b;
 *   unreadable text sorts after every number.
 * @example
 * ["1", "-1/2", "0.25"].sort(compareResultNumbers) // => ["-1/2", "0.25", "1"]
 */
export function compareResultNumbers(a: string, b: string): number {
  const x = parseResultNumber(a);
  const y = parseResultNumber(b);
  if (Number.isNaN(x) || Number.isNaN(y)) return Number(Number.isNaN(x)) - Number(Number.isNaN(y));
  return x < y ? -1 : x > y ? 1 : 0;
}

/** A decimal point or an exponent: the engine's decimal strings have one, its exact ones never. */
const decimalMarks = /[.eE]/;

const decimalPattern = /^\s*[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?\s*$/;
