/**
 * Number formatting shared by the engine's text outputs (decimal mass strings, LaTeX).
 */

/** Options of `formatDecimal`. */
export interface FormatDecimalOptions {
  /** Significant digits kept (default 12, comfortably inside a double's 15-17). */
  significantDigits?: number;
}

/**
 * Formats a real number compactly: rounded to 12 significant digits, trailing zeros trimmed,
 * no exponent between 1e-6 and 1e21, never "-0".
 *
 * @param value - A finite number; NaN and infinities are returned as "NaN", "Infinity", "-Infinity".
 * @param options - `significantDigits` (default 12).
 * @returns E.g. "3.5", "-2", "0.0625", "1.2665147955".
 * @example
 * formatDecimal(3.5000000000001) // => "3.5"
 * formatDecimal(-0)             // => "0"
 * formatDecimal(1 / 3)          // => "0.333333333333"
 */
export function formatDecimal(value: number, options: FormatDecimalOptions = {}): string {
  if (!Number.isFinite(value)) return String(value);
  const rounded = Number(value.toPrecision(options.significantDigits ?? 12));
  // Rounding can produce -0 (e.g. -1e-20 at 12 digits stays tiny, but -0 itself must print as 0).
  return Object.is(rounded, -0) ? "0" : String(rounded);
}
