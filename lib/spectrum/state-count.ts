/**
 * Reading the state counts of a result. Degeneracies travel as decimal integer strings
 * (`LevelRow.states`, `LevelRow.withChanPaton`) because they outgrow 2^53.
 *
 * Invalid-input policy: nothing here throws; text that is not a decimal integer reads as
 * "no count" (sorted first) or NaN.
 */
import type { LevelRow } from "@/lib/boundary/types";

/**
 * Tells whether a level row keeps any state after the GSO projection.
 *
 * @param row - Only `withChanPaton` is read.
 * @returns False when the projection removed every state of the row.
 * @example
 * isSurviving({ withChanPaton: "0" })  // => false
 * isSurviving({ withChanPaton: "16" }) // => true
 */
export function isSurviving(row: Pick<LevelRow, "withChanPaton">): boolean {
  return row.withChanPaton !== "0";
}

/**
 * Orders two state counts exactly (BigInt), for sorting table rows.
 *
 * @param a - A decimal integer string, or null where the count is not defined.
 * @param b - A decimal integer string, or null.
 * @returns -1, 0 or 1; a missing or unreadable count sorts before every number.
 * @example
 * compareStateCounts("9007199254740993", "9007199254740992") // => 1
 * compareStateCounts(null, "1")                              // => -1
 */
export function compareStateCounts(a: string | null, b: string | null): -1 | 0 | 1 {
  const x = readCount(a);
  const y = readCount(b);
  if (x === null || y === null) return x === y ? 0 : x === null ? -1 : 1;
  return x < y ? -1 : x > y ? 1 : 0;
}

/**
 * log10 of a state count, exact in its digit count and accurate to about 15 significant
 * digits however long the count is.
 *
 * @param count - A non-negative decimal integer string.
 * @returns log10 of the count; -Infinity for "0"; NaN for text with other characters.
 * @example
 * log10OfStateCount("1000") // => 3
 * log10OfStateCount("0")    // => -Infinity
 */
export function log10OfStateCount(count: string): number {
  const digits = count.replace(/^0+/, "");
  if (digits === "") return Number.NEGATIVE_INFINITY;
  if (!/^\d+$/.test(digits)) return Number.NaN;
  const head = Number(`0.${digits.slice(0, 17)}`);
  return digits.length + Math.log10(head);
}

function readCount(text: string | null): bigint | null {
  return text !== null && /^\d+$/.test(text) ? BigInt(text) : null;
}
