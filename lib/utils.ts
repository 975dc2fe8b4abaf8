import { clsx, type ClassValue } from "clsx";
import { extendTailwindMerge } from "tailwind-merge";

export type { ClassValue };

/**
 * tailwind-merge knows Tailwind's default scales; our theme adds two shadow sizes (app/globals.css) that
 * it would otherwise read as shadow colours. Colour names need no entry: any name after `border-`,
 * `bg-` or `text-` that is not a size is taken as a colour.
 */
const mergeClasses = extendTailwindMerge({
  extend: { theme: { shadow: ["panel", "overlay"] } },
});

/**
 * Joins class names, skipping falsy parts (`cn("a", isOn && "b")`), and lets a later Tailwind utility
 * replace an earlier one of the same kind: `cn("border-transparent", "border-danger")` is `"border-danger"`.
 * The order in the CSS decides between two clashing utilities, not the order in the class attribute, so
 * without the merge an override passed as `className` could silently lose to a primitive's default.
 */
export function cn(...parts: ClassValue[]): string {
  return mergeClasses(clsx(parts));
}
