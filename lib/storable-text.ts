// NUL, and UTF-16 surrogates that are not part of a pair.
const unstorable = /\u0000|[\ud800-\udbff](?![\udc00-\udfff])|(?<![\ud800-\udbff])[\udc00-\udfff]/;

/** What the API and the forms answer for text that {@link isStorableText} refuses. */
export const unstorableTextMessage = "Text may not contain NUL characters or unpaired UTF-16 surrogates.";

/**
 * False for text that PostgreSQL's text and jsonb cannot store: a NUL character, or a UTF-16
 * surrogate that is not part of a pair. JSON, query strings and form fields may carry both; they
 * mean nothing in Mooring, so the app refuses them (422) before they reach the database.
 *
 * @example
 * isStorableText("D4 probe") // => true
 * isStorableText("a\u0000b")  // => false
 * isStorableText("\ud800")    // => false
 */
export function isStorableText(value: string): boolean {
  return !unstorable.test(value);
}
