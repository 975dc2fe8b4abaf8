/**
 * The overview of a result: everything but the per-sector detail (level rows, mode expansions,
 * massless content, notes and the tower of a compact configuration), with each sector's lightest surviving row and its row count. The
 * results page opens with it and loads a sector's detail when it is shown, so a 64-stack result
 * (2080 sectors, tens of thousands of rows) opens as fast as a small one.
 *
 * Invalid-input policy: pure and total; nothing throws.
 */
import type { LevelRow, Sector, SpectrumResult } from "@/lib/boundary/types";
import { lightestLevel } from "./lightest";
import type { SectorNames } from "./sector-names";

/** The parts of a sector that live only in its detail. */
export type SectorDetailField = "levels" | "axes" | "massless" | "notes" | "tower";

/** A sector without its detail. */
export type SectorOverview = Omit<Sector, SectorDetailField | "detailOmitted"> & {
  /** Position of the sector in the full result (its detail is fetched by this index). */
  index: number;
  /** The lightest level row that keeps any state, or null when none does. */
  lightest: LevelRow | null;
  /** How many level rows the detail holds. */
  rowCount: number;
  /** How many massless entries and notes the detail holds. */
  masslessCount: number;
  noteCount: number;
};

/** A result with overview sectors. */
export type ResultOverview = Omit<SpectrumResult, "sectors"> & { sectors: SectorOverview[] };

/**
 * The overview of a full result.
 *
 * @param result - A full result (not mutated).
 * @returns The same result with each sector reduced to its overview.
 * @example
 * resultOverview(result).sectors[0]?.rowCount // => result.sectors[0].levels.length
 */
export function resultOverview(result: SpectrumResult): ResultOverview {
  return {
    ...result,
    sectors: result.sectors.map((sector, index) => sectorOverview(sector, index)),
  };
}

/**
 * One sector's overview.
 *
 * @param sector - A full sector (not mutated).
 * @param index - Its position in the result.
 * @returns The sector without levels, axes, massless content and notes, with its lightest row and counts.
 */
export function sectorOverview(sector: Sector, index: number): SectorOverview {
  const { levels, axes: _axes, massless, notes, tower: _tower, detailOmitted: _omitted, ...header } = sector;
  return {
    ...header,
    index,
    lightest: lightestLevel({ levels }),
    rowCount: levels.length,
    masslessCount: massless.length,
    noteCount: notes.length,
  };
}

/** Options of {@link pageSectorOverviews}. */
export interface SectorPageQuery {
  /** Index of the first matching sector to return (default 0). */
  offset?: number;
  /** How many matching sectors to return at most (default 100). */
  limit?: number;
  /** Keep sectors one of whose stacks' id or name contains this text (case-insensitive). */
  search?: string;
  /** Keep only tachyonic sectors. */
  tachyonicOnly?: boolean;
  /** The stacks' names: the search matches them too, and sectors come in natural order of them. */
  names?: SectorNames;
}

/** One page of the sectors that match a filter. */
export interface SectorOverviewPage {
  items: SectorOverview[];
  /** How many sectors match the filter in all. */
  total: number;
  offset: number;
}

/**
 * One page of the overview sectors that match a filter, in natural order of the stacks' names
 * when `names` is given (else in result order).
 *
 * @param sectors - The overview's sectors (not mutated).
 * @param query - Offset, page size, search text, tachyonic-only flag and stack names.
 * @returns The page, the number of matches and the offset used.
 * @example
 * pageSectorOverviews(overview.sectors, { search: "probe", limit: 20 }).total // => sectors of stacks named like "probe"
 */
export function pageSectorOverviews(sectors: readonly SectorOverview[], query: SectorPageQuery = {}): SectorOverviewPage {
  const needle = query.search?.trim().toLowerCase() ?? "";
  const names = query.names;
  const matchesStack = (pair: readonly [string, string]) =>
    names ? names.matches(pair, needle) : pair.some((id) => id.toLowerCase().includes(needle));
  const matching = sectors.filter((sector) => (!query.tachyonicOnly || sector.tachyonic) && (needle === "" || matchesStack(sector.pair)));
  if (names) matching.sort((a, b) => names.compare(a.pair, b.pair) || a.index - b.index);
  const offset = Math.min(Math.max(0, Math.floor(query.offset ?? 0)), matching.length);
  const limit = Math.max(1, Math.floor(query.limit ?? 100));
  return { items: matching.slice(offset, offset + limit), total: matching.length, offset };
}
