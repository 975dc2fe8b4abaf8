/*
 * One spectrum computation as the server runs it, inline or in a worker thread: the engine's
 * result serialised once to JSON text, the list summary read from it, and (for the stateless API)
 * a page of sectors with their level rows. Pure apart from the clock: it is imported by the worker
 * thread, so it must not import "server-only", the database or Next.
 */
import { tryComputeSpectrum, type ConfigurationProblem } from "../../boundary";
import type { Configuration, Sector, SpectrumResult } from "../../boundary/types";
import { resultOverview, summarizeResult, type ResultSummary } from "../../spectrum";

/** Which sectors keep their level rows and mode expansions in an API response. */
export interface SectorPageOptions {
  /** Index of the first sector with details (default 0). */
  sectorOffset?: number;
  /** Stop adding sectors with details once this many level rows are in the page. */
  maxDetailRows: number;
}

/** Where a page of sectors sits in the whole result. */
export interface SectorPage {
  sectorOffset: number;
  /** Sectors from `sectorOffset` on that carry their level rows and expansions. */
  sectorsWithDetail: number;
  sectorCount: number;
  /** The `sectorOffset` of the next page, or null after the last one. */
  nextSectorOffset: number | null;
}

/** A job sent to the computation (inline or in a worker). */
export interface SpectrumJob {
  document: Configuration;
  /** Without it the whole result is kept (what a saved revision stores). */
  page?: SectorPageOptions;
  /** Also serialise the result's overview (lib/spectrum/overview.ts), as a saved revision stores it. */
  overview?: boolean;
}

/** What a computation answers. */
export type SpectrumJobOutcome =
  | {
      ok: true;
      json: string;
      /** The overview as JSON text when the job asked for it, else null. */
      overviewJson: string | null;
      summary: ResultSummary;
      engineVersion: string;
      computeMs: number;
      page: SectorPage | null;
    }
  | { ok: false; problems: ConfigurationProblem[] };

/**
 * Runs one job: computes the spectrum, pages its sectors when asked, and serialises it.
 * Configuration problems come back as `{ ok: false, problems }`; anything else throws.
 */
export function runSpectrumJob(job: SpectrumJob): SpectrumJobOutcome {
  const started = performance.now();
  // One pass of the engine's checks: the route parsed only the document's shape.
  const attempt = tryComputeSpectrum(job.document);
  if (!attempt.result) return { ok: false, problems: attempt.problems };
  const result = attempt.result;
  const summary = summarizeResult(job.document, result);
  const overviewJson = job.overview ? JSON.stringify(resultOverview(result)) : null;
  const page = job.page ? pageSectors(result, job.page) : null;
  const json = JSON.stringify(page ? { ...result, page } : result);
  return {
    ok: true,
    json,
    overviewJson,
    summary,
    engineVersion: result.engineVersion,
    computeMs: Math.round((performance.now() - started) * 1000) / 1000,
    page,
  };
}

/**
 * Keeps level rows, towers and expansions for the sectors of one page and marks the others
 * `detailOmitted` (their headers stay: pair, nu, separation, zero points, tachyon, massless
 * content, notes). Mutates `result`, which the caller owns.
 */
function pageSectors(result: SpectrumResult, options: SectorPageOptions): SectorPage {
  const sectorCount = result.sectors.length;
  const sectorOffset = Math.min(Math.max(0, Math.floor(options.sectorOffset ?? 0)), sectorCount);
  let rows = 0;
  let end = sectorOffset;
  // At least one sector per page, however many rows it has, so paging always moves on.
  // The tower of a compact configuration is detail too, and counts as rows.
  const detailRows = (sector: Sector): number => sector.levels.length + (sector.tower?.length ?? 0);
  while (end < sectorCount && (end === sectorOffset || rows + detailRows(result.sectors[end] as Sector) <= options.maxDetailRows)) {
    rows += detailRows(result.sectors[end] as Sector);
    end += 1;
  }
  result.sectors = result.sectors.map((sector, index) =>
    index >= sectorOffset && index < end
      ? sector
      : { ...sector, levels: [], axes: [], ...(sector.tower ? { tower: [] } : {}), detailOmitted: true },
  );
  return { sectorOffset, sectorsWithDetail: end - sectorOffset, sectorCount, nextSectorOffset: end < sectorCount ? end : null };
}
