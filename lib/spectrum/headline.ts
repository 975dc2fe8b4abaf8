/**
 * The one-line headline of a spectrum: its most tachyonic state, its massless content and its
 * first massive state, each with the sector it lives in. Read from the engine's list of lightest
 * states (sorted by alpha' M^2 over all sectors) together with each sector's lightest surviving row,
 * so a stored overview (which keeps only that row per sector) gives the same answer as a full result.
 *
 * Invalid-input policy: rows whose alpha' M^2 cannot be read, and rows no state survives in, are
 * skipped; nothing throws.
 */
import type { LevelRow, LightestState, SectorKind } from "@/lib/boundary/types";
import { pairKey } from "./pair-key";
import { parseResultNumber } from "./result-number";
import { isSurviving } from "./state-count";

/** One state of the headline. */
export interface HeadlineState {
  pair: [string, string];
  sector: SectorKind;
  level: string;
  /** alpha' M^2 as the engine wrote it (exact or decimal). */
  massSquared: string;
  /** M sqrt(alpha'), null for a tachyon. */
  mass: number | null;
  /** States with Chan-Paton factors, a decimal string. */
  withChanPaton: string;
}

/** The headline of a spectrum (see the module notes). */
export interface LightestHeadline {
  /** The most tachyonic state, or null when nothing is tachyonic. */
  tachyon: HeadlineState | null;
  /** The massless states, or null when there are none among the lightest. */
  massless: {
    /** States with Chan-Paton factors over all the massless rows found, a decimal string. */
    withChanPaton: string;
    /** The sectors holding them, in the order found (lightest list first). */
    pairs: Array<[string, string]>;
    /** False when the list of lightest states may have cut massless rows off (then the count is a lower bound). */
    complete: boolean;
  } | null;
  /** The lightest state with alpha' M^2 > 0, or null when none is known. */
  firstMassive: HeadlineState | null;
}

/** What the headline reads of a sector: its pair and its lightest surviving row. */
export interface HeadlineSector {
  pair: [string, string];
  lightest: LevelRow | null;
}

/**
 * The headline of a spectrum.
 *
 * @param lightest - The engine's lightest states over all sectors (sorted by alpha' M^2; possibly cut to a few).
 * @param sectors - Each sector's lightest surviving row.
 * @returns The most tachyonic state, the massless content and the first massive state.
 * @example
 * // A brane and an antibrane on top of each other (type II, nu = 0):
 * lightestHeadline(result.lightest, overview.sectors).tachyon?.massSquared // => "-1/2"
 */
export function lightestHeadline(lightest: readonly LightestState[], sectors: readonly HeadlineSector[]): LightestHeadline {
  const rows: Array<{ state: HeadlineState; value: number }> = [];
  const seen = new Set<string>();
  const add = (pair: [string, string], row: Omit<HeadlineState, "pair">) => {
    const value = parseResultNumber(row.massSquared);
    if (Number.isNaN(value) || !isSurviving(row)) return;
    const key = `${pairKey(...pair)}|${row.sector}|${row.level}`;
    if (seen.has(key)) return;
    seen.add(key);
    rows.push({ state: { pair, sector: row.sector, level: row.level, massSquared: row.massSquared, mass: row.mass, withChanPaton: row.withChanPaton }, value });
  };
  for (const state of lightest) add(state.pair, state);
  for (const sector of sectors) if (sector.lightest) add(sector.pair, sector.lightest);
  // Stable: states of the engine's list keep its order on ties.
  rows.sort((x, y) => x.value - y.value);

  const tachyon = rows[0] && rows[0].value < 0 ? rows[0].state : null;
  const masslessRows = rows.filter((row) => row.value === 0);
  const firstMassive = rows.find((row) => row.value > 0)?.state ?? null;
  // The engine's list is sorted and cut: when its last entry is not massive, massless rows of
  // sectors whose own lightest row is a tachyon may lie beyond it.
  const last = lightest.at(-1);
  const complete = last === undefined || parseResultNumber(last.massSquared) > 0;
  const pairs: Array<[string, string]> = [];
  const pairSeen = new Set<string>();
  for (const { state } of masslessRows) {
    const key = pairKey(...state.pair);
    if (!pairSeen.has(key)) {
      pairSeen.add(key);
      pairs.push(state.pair);
    }
  }
  return {
    tachyon,
    massless:
      masslessRows.length === 0
        ? null
        : { withChanPaton: masslessRows.reduce((sum, row) => sum + countOf(row.state.withChanPaton), 0n).toString(), pairs, complete },
    firstMassive,
  };
}

function countOf(text: string): bigint {
  return /^\d+$/.test(text) ? BigInt(text) : 0n;
}
