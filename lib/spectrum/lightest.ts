/**
 * The lightest surviving state of each sector: what the canvas labels a string with, what
 * the mass plot follows against the separation and what the revision diff compares.
 *
 * Invalid-input policy: rows whose alpha' M^2 cannot be read are skipped; nothing throws.
 */
import type { LevelRow, Sector, SpectrumResult } from "@/lib/boundary/types";
import { pairKey } from "./pair-key";
import { parseResultNumber } from "./result-number";
import { isSurviving } from "./state-count";

/**
 * The lightest level row of a sector that keeps any state after the GSO projection.
 *
 * @param sector - Only `levels` is read.
 * @returns The row of least alpha' M^2 (the first such row on a tie), or null when no row survives.
 * @example
 * // The NS tachyon is projected out (0 states), so the massless row is the lightest.
 * lightestLevel({ levels: [
 *   { sector: "NS", level: "0", massSquared: "-1/2", mass: null, states: "0", withChanPaton: "0" },
 *   { sector: "NS", level: "1/2", massSquared: "0", mass: 0, states: "8", withChanPaton: "16" },
 * ] })?.level // => "1/2"
 */
export function lightestLevel(sector: Pick<Sector, "levels">): LevelRow | null {
  let best: LevelRow | null = null;
  let bestValue = Number.POSITIVE_INFINITY;
  for (const row of sector.levels) {
    if (!isSurviving(row)) continue;
    const value = parseResultNumber(row.massSquared);
    if (value < bestValue) {
      best = row;
      bestValue = value;
    }
  }
  return best;
}

/** A sector with its lightest surviving level row. */
export interface SectorLightest {
  sector: Sector;
  row: LevelRow;
}

/**
 * The lightest surviving state of every sector that has one.
 *
 * @param result - Only `sectors` is read.
 * @returns A map keyed by {@link pairKey} of each sector's pair; sectors without a surviving row are left out.
 * @example
 * lightestBySector(result).get(pairKey("b", "a"))?.row.massSquared // => "0"
 */
export function lightestBySector(result: Pick<SpectrumResult, "sectors">): Map<string, SectorLightest> {
  const out = new Map<string, SectorLightest>();
  for (const sector of result.sectors) {
    const row = lightestLevel(sector);
    if (row) out.set(pairKey(...sector.pair), { sector, row });
  }
  return out;
}
