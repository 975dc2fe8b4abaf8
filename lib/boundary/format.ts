/**
 * Number and text formatting shared by the engine's text outputs (decimal mass strings, LaTeX, notes).
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
  const text = value.toPrecision(options.significantDigits ?? 12);
  // Exponent forms (below 1e-6 or beyond the digits) are normalised by a round trip through Number.
  if (text.includes("e")) return String(Number(text));
  // Trimming the zeros by hand is about twice as fast as a Number/String round trip, and this
  // runs for every level row of every separated pair.
  let end = text.length;
  if (text.includes(".")) {
    while (text.charCodeAt(end - 1) === 48 /* 0 */) end -= 1;
    if (text.charCodeAt(end - 1) === 46 /* . */) end -= 1;
  }
  const trimmed = text.slice(0, end);
  return trimmed === "-0" ? "0" : trimmed;
}

/**
 * Joins phrases as English prose: "a", "a and b", "a, b and c".
 *
 * @param parts - The phrases, in order (not mutated).
 * @returns The joined text; "" for no phrases.
 * @example
 * listInWords(["one massive vector (3 polarisations)", "5 scalars", "8 fermion states"])
 * // => "one massive vector (3 polarisations), 5 scalars and 8 fermion states"
 */
export function listInWords(parts: readonly string[]): string {
  return parts.length <= 1 ? (parts[0] ?? "") : `${parts.slice(0, -1).join(", ")} and ${parts.at(-1) ?? ""}`;
}
