/**
 * Text fields with a length limit cut what is typed or pasted beyond it and say so, instead of
 * the browser's `maxLength` silently swallowing the keys.
 *
 * Pure. Invalid-input policy: a limit below 0 counts as 0; nothing throws.
 */

/** What a limited field keeps, and the note it shows when something was cut. */
export interface LimitedText {
  text: string;
  /** Null when everything typed fits. */
  note: string | null;
}

/**
 * Cuts `typed` to `max` characters.
 *
 * @param typed - The field's new text.
 * @param max - The limit, in characters.
 * @param what - What the field holds, in the plural ("Titles").
 * @example
 * limitText("abcdef", 4, "Titles")
 * // => { text: "abcd", note: "Titles hold at most 4 characters; the last 2 were left out." }
 */
export function limitText(typed: string, max: number, what: string): LimitedText {
  const limit = Math.max(0, max);
  if (typed.length <= limit) return { text: typed, note: null };
  const cut = typed.length - limit;
  return { text: typed.slice(0, limit), note: `${what} hold at most ${limit} characters; the last ${cut === 1 ? "one was" : `${cut} were`} left out.` };
}
