/**
 * Small rules of English that the interface and the mail share, so that counts agree with their
 * nouns ("1 account", "2 accounts") and roles take the right article ("an owner", "a viewer").
 *
 * Invalid-input policy: nothing throws; a non-integer count is written as given with the plural.
 */

/**
 * A count with its noun in the right number.
 *
 * @param count - How many.
 * @param singular - The noun for one ("account").
 * @param plural - The noun for any other count; the singular plus "s" when left out ("entries" needs it).
 * @example
 * countOf(1, "account")             // => "1 account"
 * countOf(3, "entry", "entries")    // => "3 entries"
 * countOf(0, "problem")             // => "0 problems"
 */
export function countOf(count: number, singular: string, plural = `${singular}s`): string {
  return `${count} ${count === 1 ? singular : plural}`;
}

/**
 * A word with "a" or "an" before it, chosen by its first sound as far as the first letter tells:
 * vowels take "an". The words the interface passes (roles, "editor", "owner", "viewer") follow it.
 *
 * @example
 * withArticle("owner")   // => "an owner"
 * withArticle("viewer")  // => "a viewer"
 * withArticle("editor")  // => "an editor"
 */
export function withArticle(word: string): string {
  return `${/^[aeiou]/i.test(word) ? "an" : "a"} ${word}`;
}
