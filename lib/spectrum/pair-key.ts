/**
 * The key of a sector: the unordered pair of stack ids it joins.
 *
 * Invalid-input policy: any two strings give a key; stack ids cannot hold "|"
 * (`stackIdPattern`), so distinct pairs never share one.
 */

/**
 * Order-independent key of a pair of stack ids, for maps and React keys.
 *
 * @param a - One stack id.
 * @param b - The other stack id (may equal `a`: a stack with itself).
 * @returns "a|b" with the ids in code-unit order, so that (a, b) and (b, a) share it.
 * @example
 * pairKey("wall", "probe") // => "probe|wall"
 * pairKey("a", "a")        // => "a|a"
 */
export function pairKey(a: string, b: string): string {
  return a <= b ? `${a}|${b}` : `${b}|${a}`;
}
