/**
 * How every number of a result is shown, in the interface and on the canvas: exact rationals
 * stay exact ("-1/2"), other values get a fixed number of significant digits with only the
 * zeros after the decimal point dropped, and negative values carry a true minus sign (U+2212).
 * Exports keep the engine's strings and do not use this module.
 *
 * Invalid-input policy: nothing throws for a valid `significantDigits`. A missing or non-finite
 * number shows as an em dash; text that is not a number of a result is shown as it is.
 */
import { formatRational } from "@/lib/boundary/rational";
import { parseExactRational, parseResultNumber } from "./result-number";

/**
 * Significant digits of every decimal shown (alpha' M^2, M sqrt(alpha'), separations).
 *
 * @example
 * displaySignificantDigits // => 4
 */
export const displaySignificantDigits = 4;

/** Options of {@link formatNumber} and {@link formatMassSquared}. */
export interface FormatNumberOptions {
  /** Significant digits of a decimal, 1 to 21 (default {@link displaySignificantDigits}). */
  significantDigits?: number;
}

/**
 * Formats a real number for display.
 *
 * @param value - The number, or null where there is none (e.g. M sqrt(alpha') of a tachyon).
 * @param options - `significantDigits` (default 4; a RangeError outside 1 to 21).
 * @returns Plain digits from 1e-4 up to 1e6, "2.533e10"-style beyond; "0" for zero (never "-0");
 *   an em dash for null, NaN and infinities.
 * @example
 * formatNumber(1230.4)                  // => "1230"
 * formatNumber(-0.5)                    // => "\u22120.5"
 * formatNumber(Math.PI * Math.SQRT2)    // => "4.443"
 * formatNumber(2.5330295911e10)         // => "2.533e10"
 * formatNumber(null)                    // => "\u2014"
 */
export function formatNumber(value: number | null, options: FormatNumberOptions = {}): string {
  if (value === null || !Number.isFinite(value)) return missing;
  if (value === 0) return "0";
  const digits = options.significantDigits ?? displaySignificantDigits;
  const abs = Math.abs(value);
  const text =
    abs >= 1e6 || abs < 1e-4 ? formatterFor(digits, "scientific").format(value).replace("E", "e") : formatterFor(digits, "standard").format(value);
  return withTrueMinus(text);
}

/**
 * Formats alpha' M^2 (or a zero-point energy, in the same units) for display.
 *
 * @param value - An exact rational or decimal string as the engine writes it, a double as the
 *   list columns store it, or null where there is none.
 * @param options - `significantDigits` of a decimal (default 4).
 * @returns Exact rationals exactly ("\u22121/2"), decimals as {@link formatNumber} does; an em dash
 *   for null; other text unchanged.
 * @example
 * formatMassSquared("-1/2")        // => "\u22121/2"
 * formatMassSquared("0.310264088") // => "0.3103"
 * formatMassSquared(1000.2)        // => "1000"
 * formatMassSquared(null)          // => "\u2014"
 */
export function formatMassSquared(value: string | number | null, options: FormatNumberOptions = {}): string {
  if (typeof value !== "string") return formatNumber(value, options);
  const exact = parseExactRational(value);
  if (exact) return withTrueMinus(formatRational(exact));
  const number = parseResultNumber(value);
  return Number.isNaN(number) ? value : formatNumber(number, options);
}

/**
 * Shows the engine's plain-text physics prose (notes, worldvolume lines, multiplets) with the
 * symbols of the interface: alpha' M^2 as α′M², M sqrt(alpha') as M√α′, 1/sqrt(alpha') as 1/√α′,
 * alpha' alone as α′, and a negative number with a true minus sign (a hyphen between words or
 * inside a range such as "1-4" stays). Exports keep the engine's text.
 *
 * @param text - Prose as the engine writes it.
 * @returns The same prose with those symbols; other text unchanged.
 * @example
 * formatEngineProse("of mass M sqrt(alpha') = 0.5") // => "of mass M\u221a\u03b1\u2032 = 0.5"
 */
export function formatEngineProse(text: string): string {
  return text
    .replaceAll("alpha' M^2", "\u03b1\u2032M\u00b2")
    .replaceAll("M sqrt(alpha')", "M\u221a\u03b1\u2032")
    .replaceAll("sqrt(alpha')", "\u221a\u03b1\u2032")
    .replaceAll("alpha'", "\u03b1\u2032")
    .replace(/(^|[\s(=,:])-(?=\d)/g, "$1\u2212");
}

const missing = "\u2014";

function withTrueMinus(text: string): string {
  return text.replaceAll("-", "\u2212");
}

type Notation = "standard" | "scientific";

const formatters = new Map<string, Intl.NumberFormat>();

function formatterFor(significantDigits: number, notation: Notation): Intl.NumberFormat {
  const key = `${notation}:${significantDigits}`;
  let formatter = formatters.get(key);
  if (!formatter) {
    // A fixed locale: the server render and the browser must print the same digits.
    formatter = new Intl.NumberFormat("en-US", {
      notation,
      maximumSignificantDigits: significantDigits,
      useGrouping: false,
    });
    formatters.set(key, formatter);
  }
  return formatter;
}
