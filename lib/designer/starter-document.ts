/**
 * The document a new configuration starts from.
 */
import type { Configuration, Theory } from "@/lib/boundary/types";
import { stackPalette } from "./document";

/**
 * One stack of an allowed p for the theory (a D3 for IIB, a D4 for IIA, a D3 for bosonic)
 * at the origin, showing four levels.
 *
 * @example
 * starterDocument("IIA", "Probe").stacks[0].worldvolume // => [1, 2, 3, 4]
 */
export function starterDocument(theory: Theory, title: string): Configuration {
  const worldvolume = theory === "IIA" ? [1, 2, 3, 4] : [1, 2, 3];
  return {
    format: 1,
    title: title.trim() || "Untitled configuration",
    theory,
    stringScaleGeV: null,
    levels: 4,
    stacks: [{ id: "a", label: "first stack", count: 1, anti: false, worldvolume, position: {}, colour: stackPalette[0] }],
  };
}
