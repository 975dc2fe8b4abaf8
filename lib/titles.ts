/**
 * Distinct titles for copies: forking the same configuration twice into one space gives
 * "Probe (fork)" and "Probe (fork 2)", not two rows nobody can tell apart.
 *
 * Pure. Invalid-input policy: a title is returned unchanged when it is free; nothing throws.
 */

/**
 * The title itself when no other configuration of the space has it, else the first free numbered
 * variant: "X (fork)" -> "X (fork 2)", "X (fork 2)" -> "X (fork 3)", "X" -> "X (2)".
 *
 * @param title - The wanted title (already trimmed).
 * @param taken - Titles in use in the space.
 * @param maxLength - Longest allowed title; the stem is shortened so the number always fits.
 * @example
 * distinctTitle("Probe (fork)", new Set(["Probe (fork)"]), 200) // => "Probe (fork 2)"
 * distinctTitle("Probe", new Set(["Probe", "Probe (2)"]), 200)   // => "Probe (3)"
 */
export function distinctTitle(title: string, taken: ReadonlySet<string>, maxLength: number): string {
  if (!taken.has(title)) return title;
  const numbered = /^(.*\S) (\d+)\)$/.exec(title);
  const bracketed = /^(.*\S)\)$/.exec(title);
  const stem = numbered?.[1] ?? bracketed?.[1] ?? title;
  const closing = numbered || bracketed ? (k: number) => ` ${k})` : (k: number) => ` (${k})`;
  for (let k = numbered ? Number(numbered[2]) + 1 : 2; ; k++) {
    const suffix = closing(k);
    const candidate = `${stem.slice(0, Math.max(1, maxLength - suffix.length))}${suffix}`;
    if (!taken.has(candidate)) return candidate;
  }
}
