/** A class name part: falsy values are dropped so conditions can be written inline. */
export type ClassValue = string | false | null | undefined;

/**
 * Joins class names, skipping falsy parts: `cn("a", isOn && "b")`.
 * It does not merge conflicting Tailwind utilities, so pass overrides that don't clash.
 */
export function cn(...parts: ClassValue[]): string {
  return parts.filter(Boolean).join(" ");
}
