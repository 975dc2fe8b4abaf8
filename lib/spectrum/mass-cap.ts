/**
 * The mass cap of a result: every sector lists its states with alpha' M^2 <= levels at zero
 * separation, i.e. N + a <= levels (engine 1.1.0 on). This module reads N + a back from a level
 * row and its sector's zero-point energy, for the tables' filter and the exports' column.
 *
 * Invalid-input policy: nothing throws; a row whose level or zero point cannot be read gives null.
 */
import { addRational, formatRational, rationalToNumber, type Rational } from "@/lib/boundary/rational";
import type { LevelRow, Sector, ZeroPoint } from "@/lib/boundary/types";
import { parseExactRational } from "./result-number";

/**
 * alpha' M^2 of a level row at zero separation: N + a, exact.
 *
 * @param row - `sector` (NS, R or bosonic) and `level` N.
 * @param zeroPoint - The sector's zero-point energies.
 * @returns N + a, or null when either cannot be read.
 * @example
 * formatRational(unstretchedMassSquared({ sector: "NS", level: "3/2" }, { NS: "-1/2", R: "0" })!) // => "1"
 */
export function unstretchedMassSquared(row: Pick<LevelRow, "sector" | "level">, zeroPoint: ZeroPoint): Rational | null {
  const level = parseExactRational(row.level);
  const text = zeroPoint[row.sector];
  const a = text === undefined ? null : parseExactRational(text);
  return level && a ? addRational(level, a) : null;
}

/**
 * {@link unstretchedMassSquared} as the engine writes exact values ("-1/2"), for exports.
 *
 * @returns The exact text, or "" when it cannot be read.
 * @example
 * unstretchedMassSquaredText({ sector: "R", level: "2" }, { NS: "-1/2", R: "0" }) // => "2"
 */
export function unstretchedMassSquaredText(row: Pick<LevelRow, "sector" | "level">, zeroPoint: ZeroPoint): string {
  const value = unstretchedMassSquared(row, zeroPoint);
  return value ? formatRational(value) : "";
}

/**
 * The highest N + a listed over all sectors: where a mass-cap filter starts so that it hides nothing.
 *
 * @param sectors - `levels` and `zeroPoint` of each sector are read.
 * @returns The largest N + a as a number; 0 when nothing can be read.
 * @example
 * highestUnstretchedMassSquared(result.sectors) // => 4 for a result with levels = 4
 */
export function highestUnstretchedMassSquared(sectors: ReadonlyArray<Pick<Sector, "levels" | "zeroPoint">>): number {
  let highest = 0;
  for (const sector of sectors) {
    for (const row of sector.levels) {
      const value = unstretchedMassSquared(row, sector.zeroPoint);
      if (value) highest = Math.max(highest, rationalToNumber(value));
    }
  }
  return highest;
}
