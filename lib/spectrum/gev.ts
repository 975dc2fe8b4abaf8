/**
 * Masses in GeV for a configuration that carries a string scale. With M_s = 1/sqrt(alpha') the
 * engine's M sqrt(alpha') is M / M_s, so M in GeV is that number times M_s in GeV; the engine
 * writes the same product into each level row's `massGeV`.
 *
 * Invalid-input policy: a tachyon (no real mass), a missing or non-positive scale gives null.
 */

/**
 * M in GeV.
 *
 * @param mass - M sqrt(alpha') as the engine reports it, or null for a tachyon.
 * @param stringScaleGeV - M_s = 1/sqrt(alpha') in GeV, or null when the configuration has none.
 * @returns mass x M_s, or null.
 * @example
 * massInGeV(1, 2.4e15)     // => 2.4e15
 * massInGeV(null, 2.4e15)  // => null
 * massInGeV(0.5, null)     // => null
 */
export function massInGeV(mass: number | null, stringScaleGeV: number | null): number | null {
  if (mass === null || stringScaleGeV === null || !(stringScaleGeV > 0) || !Number.isFinite(mass)) return null;
  return mass * stringScaleGeV;
}
