/**
 * The summary of a result that lists store beside each configuration, so that group and lab
 * tables can sort and filter without reading the whole result.
 *
 * Invalid-input policy: an unreadable lightest alpha' M^2 is stored as null; nothing throws.
 */
import type { Configuration, LightestState, Sector, SpectrumResult, WorldvolumeTheory } from "@/lib/boundary/types";
import { lightestHeadline, type LightestHeadline } from "./headline";
import { lightestLevel } from "./lightest";
import { parseResultNumber } from "./result-number";
import { tachyonicSectors, type TachyonicSector, type TachyonSource } from "./tachyons";
import { stringCreationSectors, worldvolumeKey } from "./worldvolumes";

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

/** Tachyonic sectors and worldvolumes listed in a summary at most; the counts say how many there are. */
const listedTachyons = 50;
const listedWorldvolumes = 50;

/** One worldvolume as the summary shows it. */
export interface SummaryWorldvolume {
  /** `worldvolumeKey` of the worldvolume. */
  key: string;
  stacks: string[];
  summary: string;
  supersymmetry: string;
  supercharges: number | null;
}

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
  /**
   * The first worldvolumes, in result order; null when the result was stored before worldvolumes
   * were recorded (its warnings say so).
   */
  worldvolumes: SummaryWorldvolume[] | null;
  /** How many worldvolumes there are in all. */
  worldvolumeCount: number;
  /** Pairs whose supersymmetry needs a created string (nu = 8 across a common Dirichlet axis). */
  stringCreation: Array<[string, string]>;
  /** The most tachyonic state, the massless content and the first massive state, each with its sector. */
  headline: LightestHeadline;
}

/**
 * The facts of the summary component, from a full result or an overview (lib/spectrum/overview.ts).
 *
 * @param result - Theory, supercharges, BPS flag, gauge group, worldvolumes, lightest states and sectors are read.
 * @returns The facts, with at most fifty tachyonic sectors and fifty worldvolumes listed (and their
 *   total counts), and the pairs that are supersymmetric only with a created string.
 * @example
 * summaryFacts(result).tachyonCount // => 1 for a D4-antiD4 pair below y_c
 */
export function summaryFacts(
  result: Pick<SpectrumResult, "theory" | "supercharges" | "bps" | "gaugeGroup" | "lightest" | "worldvolumes"> & {
    sectors: readonly (TachyonSource & Pick<Sector, "nu" | "dd">)[];
  },
): SummaryFacts {
  const tachyons = tachyonicSectors(result);
  // A result with sectors but no worldvolumes was stored before they were recorded.
  const recorded = result.worldvolumes.length > 0 || result.sectors.length === 0;
  return {
    supercharges: result.supercharges,
    bps: result.bps,
    gaugeGroup: result.gaugeGroup,
    lightest: result.lightest[0] ?? null,
    tachyons: tachyons.slice(0, listedTachyons),
    tachyonCount: tachyons.length,
    sectorCount: result.sectors.length,
    worldvolumes: recorded ? result.worldvolumes.slice(0, listedWorldvolumes).map(summaryWorldvolume) : null,
    worldvolumeCount: result.worldvolumes.length,
    stringCreation: result.bps ? stringCreationSectors(result).map((sector) => sector.pair) : [],
    headline: lightestHeadline(
      result.lightest,
      result.sectors.map((sector) => ({ pair: sector.pair, lightest: "lightest" in sector ? sector.lightest : lightestLevel(sector) })),
    ),
  };
}

function summaryWorldvolume(worldvolume: WorldvolumeTheory): SummaryWorldvolume {
  const { stacks, summary, supersymmetry, supercharges } = worldvolume;
  return { key: worldvolumeKey(worldvolume), stacks, summary, supersymmetry, supercharges };
}
