/**
 * Data for the results plots: alpha' M^2 of each sector's lightest state against the
 * separation y, and log10 of the degeneracy against the level.
 */
import type { Sector, SectorKind } from "@/lib/boundary/types";
import { formatPair, isSurviving, lightestLevel, log10OfStateCount, pairKey, parseResultNumber } from "@/lib/spectrum";

/** One sector's lightest-state curve alpha' M^2(y) = (y / 2 pi)^2 + (N + a). */
export interface MassCurve {
  key: string;
  label: string;
  /** N + a of the lightest surviving state (alpha' M^2 at y = 0). */
  intercept: number;
  /** The sector's actual separation. */
  separation: number;
  /** y_c where alpha' M^2 crosses zero, or null when the state is never tachyonic. */
  crossing: number | null;
}

/**
 * The lightest-state curve of each sector with at least one surviving state. The intercept
 * is recovered from the stored alpha' M^2 at the sector's separation (mass formula of the
 * conventions: alpha' M^2 = (y / 2 pi)^2 + N + a).
 */
export function massCurves(sectors: readonly Sector[]): MassCurve[] {
  const curves: MassCurve[] = [];
  for (const sector of sectors) {
    const row = lightestLevel(sector);
    const lightest = row ? parseResultNumber(row.massSquared) : Number.NaN;
    if (!Number.isFinite(lightest)) continue;
    const stretch = (sector.separation / (2 * Math.PI)) ** 2;
    const intercept = lightest - stretch;
    curves.push({
      key: pairKey(...sector.pair),
      label: formatPair(sector.pair),
      intercept,
      separation: sector.separation,
      crossing: intercept < 0 ? 2 * Math.PI * Math.sqrt(-intercept) : null,
    });
  }
  return curves;
}

/** Options of {@link massCurvePoints}. */
export interface MassCurvePointsOptions {
  /** Number of samples across [0, yMax] (default 61). */
  samples?: number;
}

/**
 * Samples the curves on a common y grid for a line chart: one row per y with a value per
 * curve key. yMax covers every separation and crossing with 30 % room (at least 2 pi).
 */
export function massCurvePoints(curves: readonly MassCurve[], options: MassCurvePointsOptions = {}): {
  yMax: number;
  rows: Array<Record<string, number>>;
} {
  const samples = Math.max(2, options.samples ?? 61);
  const reach = Math.max(2 * Math.PI, ...curves.map((c) => Math.max(c.separation, c.crossing ?? 0)));
  const yMax = Number((reach * 1.3).toPrecision(3));
  const rows: Array<Record<string, number>> = [];
  for (let i = 0; i < samples; i++) {
    const y = (yMax * i) / (samples - 1);
    const row: Record<string, number> = { y };
    for (const curve of curves) row[curve.key] = (y / (2 * Math.PI)) ** 2 + curve.intercept;
    rows.push(row);
  }
  return { yMax, rows };
}

/** One point of the degeneracy plot: the level and log10 of the states per sector kind. */
export type DegeneracyRow = { level: number } & Partial<Record<SectorKind, number>>;

/**
 * log10 of the total degeneracy (over both orientations and Chan-Paton labels) against the
 * oscillator level, one row per level, one value per sector kind present.
 */
export function degeneracyRows(sector: Pick<Sector, "levels">): DegeneracyRow[] {
  const byLevel = new Map<number, DegeneracyRow>();
  for (const row of sector.levels) {
    if (!isSurviving(row)) continue;
    const level = parseResultNumber(row.level);
    const entry = byLevel.get(level) ?? { level };
    entry[row.sector] = log10OfStateCount(row.withChanPaton);
    byLevel.set(level, entry);
  }
  return [...byLevel.values()].sort((a, b) => a.level - b.level);
}
