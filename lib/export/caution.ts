/** The caution every export carries (team rule: results state their conventions and a caution). */
export const exportCaution =
  "Computed by Mooring; check published results independently before relying on them.";

/**
 * The conventions line of an export: the engine's own statement plus units.
 *
 * @example
 * conventionsLine(result) // => "alpha' = 1; ... Engine 0.1.0."
 */
export function conventionsLine(result: { conventions: string; engineVersion: string; theory: string; dimension: number }): string {
  return `${result.conventions.trim()} Theory ${result.theory}, D = ${result.dimension}. Engine ${result.engineVersion}.`;
}
