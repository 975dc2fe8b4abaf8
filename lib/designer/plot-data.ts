/**
 * Data for the results plots: alpha' M^2 of each sector's lightest state against the
 * separation y, and log10 of the degeneracy against the level.
 */
import { addRational, compareRational, formatRational, isNegativeRational, rationalToNumber, type Rational } from "@/lib/boundary/rational";
import type { Sector, SectorKind } from "@/lib/boundary/types";
import {
  formatMassSquared,
  isSurviving,
  log10OfStateCount,
  pairKey,
  parseExactRational,
  parseResultNumber,
  sectorNames,
  type SectorNames,
  type SectorOverview,
} from "@/lib/spectrum";

/** The parts of a sector (full or overview) the mass plot reads. */
export type MassCurveSector = Pick<SectorOverview, "pair" | "separation" | "zeroPoint" | "lightest">;

/**
 * One curve alpha' M^2(y) = (y / 2 pi)^2 + (N + a), shared by every sector whose lightest state has
 * that N + a (their curves coincide), with the sectors' actual separations.
 */
export interface MassCurve {
  /** N + a as exact text, e.g. "-1/2": the curve's key. */
  key: string;
  label: string;
  /** N + a of the lightest surviving state (alpha' M^2 at y = 0), exact. */
  interceptText: string;
  intercept: number;
  /** y_c where alpha' M^2 crosses zero, or null when N + a >= 0 (exactly). */
  crossing: number | null;
  /** The sectors on this curve, at their separations. */
  sectors: Array<{ key: string; label: string; separation: number }>;
}

/**
 * The lightest-state curves of the sectors: N + a is taken exactly from the lightest surviving
 * row's level and the sector's zero-point energy (never recovered from a rounded alpha' M^2, so a
 * massless ground state never shows a spurious crossing), and sectors with the same N + a share one
 * curve. Curves come in increasing N + a.
 */
export function massCurves(sectors: readonly MassCurveSector[], names: SectorNames = sectorNames([])): MassCurve[] {
  const byIntercept = new Map<string, MassCurve & { exact: Rational }>();
  for (const sector of sectors) {
    const row = sector.lightest;
    if (!row) continue;
    const level = parseExactRational(row.level);
    const zeroPointText = sector.zeroPoint[row.sector];
    const zeroPoint = zeroPointText === undefined ? null : parseExactRational(zeroPointText);
    if (!level || !zeroPoint) continue;
    const exact = addRational(level, zeroPoint);
    const interceptText = formatRational(exact);
    let curve = byIntercept.get(interceptText);
    if (!curve) {
      const intercept = rationalToNumber(exact);
      curve = {
        key: interceptText,
        label: `N + a = ${formatMassSquared(interceptText)}`,
        interceptText,
        intercept,
        crossing: isNegativeRational(exact) ? 2 * Math.PI * Math.sqrt(-intercept) : null,
        sectors: [],
        exact,
      };
      byIntercept.set(interceptText, curve);
    }
    curve.sectors.push({ key: pairKey(...sector.pair), label: names.sector(sector.pair).text, separation: sector.separation });
  }
  return [...byIntercept.values()]
    .sort((x, y) => compareRational(x.exact, y.exact))
    .map(({ exact: _exact, ...curve }) => ({ ...curve, label: `${curve.label} (${curve.sectors.length === 1 ? (curve.sectors[0]?.label ?? "") : `${curve.sectors.length} sectors`})` }));
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
  const reach = Math.max(2 * Math.PI, ...curves.flatMap((c) => [c.crossing ?? 0, ...c.sectors.map((s) => s.separation)]));
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
