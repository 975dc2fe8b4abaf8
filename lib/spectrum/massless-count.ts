/**
 * How many massless states a result holds: the states at alpha' M^2 = 0 over every sector, both
 * orientations and all Chan-Paton labels, bosons (NS, bosonic) and fermions (R) alike.
 *
 * Invalid-input policy: rows whose alpha' M^2 cannot be read, or whose count is not a decimal
 * integer, add nothing; nothing throws.
 */
import type { SpectrumResult } from "@/lib/boundary/types";
import { parseResultNumber } from "./result-number";

/**
 * Counts the massless states of a result exactly (BigInt).
 *
 * @param result - Only `sectors[].levels` is read.
 * @returns The count as a decimal string ("0" when nothing is massless).
 * @example
 * countMasslessStates(computeSpectrum(oneD3Brane)) // => "16"  (8 NS + 8 R states at alpha' M^2 = 0)
 */
export function countMasslessStates(result: Pick<SpectrumResult, "sectors">): string {
  let total = 0n;
  for (const sector of result.sectors) {
    for (const row of sector.levels) {
      if (parseResultNumber(row.massSquared) === 0 && /^\d+$/.test(row.withChanPaton)) total += BigInt(row.withChanPaton);
    }
  }
  return total.toString();
}
