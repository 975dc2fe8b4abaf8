/**
 * The short type of a stack as the grid, the canvas and the shared view name it.
 */
import type { Configuration, Stack } from "@/lib/boundary/types";

/**
 * Names a stack's brane type.
 *
 * @param stack - Only `worldvolume` (p = its length) and `anti` are read.
 * @param theory - The bosonic string has no RR charge, so it has no antibranes to name.
 * @returns "Dp", or "anti-Dp" for an antibrane of type II.
 * @example
 * stackKind({ worldvolume: [1, 2, 3, 4], anti: true }, "IIA")     // => "anti-D4"
 * stackKind({ worldvolume: [1, 2, 3, 4], anti: true }, "bosonic") // => "D4"
 */
export function stackKind(stack: Pick<Stack, "worldvolume" | "anti">, theory: Configuration["theory"]): string {
  const p = `D${stack.worldvolume.length}`;
  return stack.anti && theory !== "bosonic" ? `anti-${p}` : p;
}
