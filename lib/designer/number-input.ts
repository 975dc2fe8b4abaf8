/**
 * Reading what someone typed into one of the designer's number fields, and saying why it cannot
 * be used ("N must be a whole number: 2.5 is not"), so that a refused value is explained instead of
 * silently replaced by the old one.
 *
 * Pure. Invalid-input policy: every input gives a verdict; nothing throws.
 */

/** What a field accepts. */
export interface NumberRules {
  /** The quantity, as the message names it ("N", "The position on x9", "The highest level"). */
  name: string;
  integer?: boolean;
  /** Only numbers above zero (a scale); checked before `min`. */
  positive?: boolean;
  min?: number;
  max?: number;
  /** Unit after a number in messages ("GeV"). */
  unit?: string;
}

/** The verdict on a text: a number to use, nothing yet (empty or half-typed), or a problem to show. */
export type NumberInput = { kind: "value"; value: number } | { kind: "incomplete" } | { kind: "problem"; message: string };

const numberPattern = /^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i;
/** Text on its way to a number: "-", ".", "1.", "2e", "2e-". */
const partialPattern = /^[-+]?(\d*\.?\d*)(e[-+]?)?$/i;

/**
 * Reads one field's text.
 *
 * @param text - What is in the field; surrounding spaces are ignored.
 * @param rules - Whole numbers only, bounds and the quantity's name.
 * @returns The number, `incomplete` for text that is on its way to a number, or the reason.
 * @example
 * readNumberInput("0", { name: "N", integer: true, min: 1, max: 10000 })
 * // => { kind: "problem", message: "N must be at least 1: 0 is too small." }
 * readNumberInput("2.5", { name: "N", integer: true, min: 1 })
 * // => { kind: "problem", message: "N must be a whole number: 2.5 is not." }
 */
export function readNumberInput(text: string, rules: NumberRules): NumberInput {
  const trimmed = text.trim();
  if (trimmed === "") return { kind: "incomplete" };
  if (!numberPattern.test(trimmed)) {
    if (partialPattern.test(trimmed)) return { kind: "incomplete" };
    if (/^[-+]?\d+,\d+$/.test(trimmed)) return { kind: "problem", message: `${rules.name} uses a decimal point: write ${trimmed.replace(",", ".")}.` };
    return { kind: "problem", message: `${rules.name} must be a number: “${trimmed}” is not.` };
  }
  const value = Number(trimmed);
  const shown = `${trimmed}${rules.unit ? ` ${rules.unit}` : ""}`;
  if (!Number.isFinite(value)) return { kind: "problem", message: `${rules.name} must be a finite number.` };
  if (rules.integer && !Number.isInteger(value)) return { kind: "problem", message: `${rules.name} must be a whole number: ${shown} is not.` };
  if (rules.positive && !(value > 0)) return { kind: "problem", message: `${rules.name} must be greater than 0: ${shown} is not.` };
  if (rules.min !== undefined && value < rules.min) {
    return { kind: "problem", message: `${rules.name} must be at least ${withUnit(rules.min, rules.unit)}: ${shown} is too small.` };
  }
  if (rules.max !== undefined && value > rules.max) {
    return { kind: "problem", message: `${rules.name} can be at most ${withUnit(rules.max, rules.unit)}: ${shown} is too large.` };
  }
  return { kind: "value", value };
}

/**
 * The sentence a field shows after it gave up a refused text on leaving it.
 *
 * @example
 * keptValueNote({ name: "N" }, 3) // => "N stays 3."
 */
export function keptValueNote(rules: Pick<NumberRules, "name" | "unit">, kept: number): string {
  return `${rules.name} stays ${withUnit(kept, rules.unit)}.`;
}

function withUnit(value: number, unit: string | undefined): string {
  return unit ? `${value} ${unit}` : String(value);
}
