/**
 * Small, pure read-outs of a spectrum result for the designer: the lightest surviving state
 * per sector (for curve labels) and number formatting of exact rationals.
 */
import type { Configuration, LevelRow, SpectrumResult } from "@/lib/boundary/types";

/** The lightest surviving state of one sector, as the canvas labels it. */
export interface SectorLightest {
  pair: [string, string];
  massSquared: string;
  mass: number | null;
  tachyonic: boolean;
  criticalSeparation: number | null;
  separation: number;
  supersymmetric: boolean;
  nu: number;
}

/** Order-independent key of a pair of stack ids. */
export function pairKey(a: string, b: string): string {
  return a <= b ? `${a}|${b}` : `${b}|${a}`;
}

/**
 * Parses an exact rational ("-1/2", "3") or decimal ("0.3102") string to a number; NaN for
 * anything else.
 */
export function parseRational(value: string): number {
  const match = /^\s*(-?\d+(?:\.\d+)?(?:e[-+]?\d+)?)\s*(?:\/\s*(\d+))?\s*$/i.exec(value);
  if (!match) return Number.NaN;
  const numerator = Number(match[1]);
  return match[2] === undefined ? numerator : numerator / Number(match[2]);
}

/** True when a level row has at least one state after the GSO projection. */
export function isSurviving(row: Pick<LevelRow, "withChanPaton">): boolean {
  return row.withChanPaton !== "0";
}

/** The lightest surviving state of every sector, keyed by {@link pairKey}. */
export function lightestBySector(result: SpectrumResult): Map<string, SectorLightest> {
  const out = new Map<string, SectorLightest>();
  for (const sector of result.sectors) {
    let best: LevelRow | null = null;
    let bestValue = Number.POSITIVE_INFINITY;
    for (const row of sector.levels) {
      if (!isSurviving(row)) continue;
      const value = parseRational(row.massSquared);
      if (value < bestValue) {
        best = row;
        bestValue = value;
      }
    }
    if (!best) continue;
    out.set(pairKey(sector.pair[0], sector.pair[1]), {
      pair: sector.pair,
      massSquared: best.massSquared,
      mass: best.mass,
      tachyonic: sector.tachyonic,
      criticalSeparation: sector.criticalSeparation,
      separation: sector.separation,
      supersymmetric: sector.supersymmetric,
      nu: sector.nu,
    });
  }
  return out;
}

/**
 * Formats alpha' M^2 for display: exact rationals stay exact ("-1/2"), decimals get four
 * significant digits, and a minus sign is a true minus.
 */
export function formatMassSquared(value: string): string {
  const text = value.includes("/") || /^-?\d+$/.test(value) ? value : formatNumber(parseRational(value));
  return text.replace(/^-/, "\u2212");
}

/** Formats a real number with up to four significant digits (no exponent for ordinary sizes). */
export function formatNumber(value: number | null, digits = 4): string {
  if (value === null || !Number.isFinite(value)) return "\u2014";
  if (value === 0) return "0";
  const abs = Math.abs(value);
  const text = abs >= 1e6 || abs < 1e-4 ? value.toExponential(digits - 1) : Number(value.toPrecision(digits)).toString();
  return text.replace(/^-/, "\u2212");
}

/** A stack's short type, e.g. "D4" or "anti-D4" (the bosonic theory has no antibranes). */
export function stackKind(stack: Configuration["stacks"][number], theory: Configuration["theory"]): string {
  const p = `D${stack.worldvolume.length}`;
  return stack.anti && theory !== "bosonic" ? `anti-${p}` : p;
}
