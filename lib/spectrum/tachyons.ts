/**
 * Tachyons of a result: which states and sectors have alpha' M^2 < 0, and where stretching
 * makes them massive (physics.md, "Stability and supersymmetry").
 *
 * Invalid-input policy: a row whose alpha' M^2 cannot be read is not tachyonic; nothing throws.
 */
import type { LevelRow, Sector } from "@/lib/boundary/types";
import { lightestLevel } from "./lightest";
import { parseResultNumber } from "./result-number";

/**
 * Tells whether a state is tachyonic.
 *
 * @param state - Only `massSquared` (alpha' M^2) is read.
 * @returns True when alpha' M^2 < 0.
 * @example
 * isTachyonicState({ massSquared: "-1/2" }) // => true
 * isTachyonicState({ massSquared: "0" })    // => false
 */
export function isTachyonicState(state: Pick<LevelRow, "massSquared">): boolean {
  return parseResultNumber(state.massSquared) < 0;
}

/** A tachyonic sector with what the summary says about it. */
export interface TachyonicSector {
  pair: [string, string];
  /** The lightest surviving state (the tachyon), or null if the stored sector lists none. */
  lightest: LevelRow | null;
  /** Separation y of the pair, in units of sqrt(alpha'). */
  separation: number;
  /** y_c beyond which the state is massive, or null when separating cannot lift it. */
  criticalSeparation: number | null;
}

/** What a tachyon summary reads of a sector: a full sector, or an overview sector with its lightest row. */
export type TachyonSource = Pick<Sector, "pair" | "tachyonic" | "separation" | "criticalSeparation"> &
  ({ levels: LevelRow[] } | { lightest: LevelRow | null });

/**
 * The sectors the engine marked tachyonic, in the order of the result.
 *
 * @param result - Only `sectors` is read (full sectors or overview sectors, lib/spectrum/overview.ts).
 * @returns One entry per tachyonic sector; empty when the configuration is stable.
 * @example
 * tachyonicSectors(braneAntibrane)[0] // => { pair: ["a", "b"], lightest: { massSquared: "-1/2", ... }, separation: 0, criticalSeparation: 4.44288293816 }
 */
export function tachyonicSectors(result: { sectors: readonly TachyonSource[] }): TachyonicSector[] {
  return result.sectors.filter((sector) => sector.tachyonic).map(describeTachyon);
}

function describeTachyon(sector: TachyonSource): TachyonicSector {
  return {
    pair: sector.pair,
    lightest: "lightest" in sector ? sector.lightest : lightestLevel(sector),
    separation: sector.separation,
    criticalSeparation: sector.criticalSeparation,
  };
}
