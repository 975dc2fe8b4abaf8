/**
 * The summary of a result that lists store beside each configuration, so that group and lab
 * tables can sort and filter without reading the whole result.
 *
 * Invalid-input policy: an unreadable lightest alpha' M^2 is stored as null; nothing throws.
 */
import type { Configuration, LightestState, SpectrumResult } from "@/lib/boundary/types";
import { parseResultNumber } from "./result-number";
import { tachyonicSectors, type TachyonicSector, type TachyonSource } from "./tachyons";

/** The summary columns of a configuration's current result. */
export interface ResultSummary {
  stackCount: number;
  /** alpha' M^2 of the lightest state as a double (for sorting; exact values are in the result), or null when there is none. */
  lightestMassSquared: number | null;
  /** True when any sector is tachyonic. */
  tachyonic: boolean;
  /** Supercharges preserved by the whole configuration (type II), null for bosonic. */
  supercharges: number | null;
}

/**
 * Derives the summary columns of a document and its result.
 *
 * @param document - Only `stacks` is read.
 * @param result - `lightest`, `sectors` and `supercharges` are read.
 * @returns The stack count, the lightest alpha' M^2 (from `lightest[0]`, which the engine sorts by
 *   mass), whether anything is tachyonic, and the supercharges.
 * @example
 * summarizeResult(document, result)
 * // => { stackCount: 2, lightestMassSquared: -0.5, tachyonic: true, supercharges: 0 }
 */
export function summarizeResult(
  document: Pick<Configuration, "stacks">,
  result: Pick<SpectrumResult, "lightest" | "sectors" | "supercharges">,
): ResultSummary {
  const lightest = result.lightest[0];
  const value = lightest ? parseResultNumber(lightest.massSquared) : Number.NaN;
  const lightestMassSquared = Number.isFinite(value) ? value : null;
  return {
    stackCount: document.stacks.length,
    lightestMassSquared,
    // The sectors' flags are the engine's verdict; a negative lightest alpha' M^2 is a tachyon
    // even in a stored result whose flags say otherwise.
    tachyonic: result.sectors.some((sector) => sector.tachyonic) || (lightestMassSquared !== null && lightestMassSquared < 0),
    supercharges: result.supercharges,
  };
}

/** Tachyonic sectors listed in a summary at most; `tachyonCount` says how many there are. */
const listedTachyons = 50;

/** What the one summary component shows of a result. */
export interface SummaryFacts {
  supercharges: number | null;
  bps: boolean;
  gaugeGroup: string;
  /** The lightest state over all sectors, or null when none survives. */
  lightest: LightestState | null;
  /** The first tachyonic sectors, in result order. */
  tachyons: TachyonicSector[];
  /** How many sectors are tachyonic in all. */
  tachyonCount: number;
  sectorCount: number;
}

/**
 * The facts of the summary component, from a full result or an overview (lib/spectrum/overview.ts).
 *
 * @param result - Supercharges, BPS flag, gauge group, lightest states and sectors are read.
 * @returns The facts, with at most fifty tachyonic sectors listed (and their total count).
 * @example
 * summaryFacts(result).tachyonCount // => 1 for a D4-antiD4 pair below y_c
 */
export function summaryFacts(
  result: Pick<SpectrumResult, "supercharges" | "bps" | "gaugeGroup" | "lightest"> & { sectors: readonly TachyonSource[] },
): SummaryFacts {
  const tachyons = tachyonicSectors(result);
  return {
    supercharges: result.supercharges,
    bps: result.bps,
    gaugeGroup: result.gaugeGroup,
    lightest: result.lightest[0] ?? null,
    tachyons: tachyons.slice(0, listedTachyons),
    tachyonCount: tachyons.length,
    sectorCount: result.sectors.length,
  };
}
