import "server-only";
import { eq, sql } from "drizzle-orm";
import { ENGINE_VERSION } from "../../lib/boundary";
import type { Sector } from "../../lib/boundary/types";
import { NotFoundError } from "../../lib/errors";
import { massCurves as curvesOf, type MassCurve } from "../../lib/designer/plot-data";
import {
  listWorldvolume,
  pageSectorOverviews,
  resultOverview,
  sectorNames,
  summaryFacts,
  type ListedWorldvolume,
  type ResultOverview,
  type SectorOverviewPage,
  type SectorPageQuery,
  type StackNameSource,
  type SummaryFacts,
} from "../../lib/spectrum";
import { readStoredResult } from "../../lib/validations/spectrum-result";
import { db } from "../index";
import { results, revisions } from "../schema";
import { assertUuid, requireActor, type Actor } from "./actor";
import { readConfigurationWithResult, requireConfigurationRole } from "./configuration-access";
import { toConfigurationDto, toResultDto, type ResultDto, type ResultMetaDto } from "./configuration-dtos";

/*
 * Reading stored results (viewer or better on the configuration). The whole result is read only
 * where a caller needs all of it (exports, the revision diff); the results page reads the overview
 * and then one sector at a time, and the API sends the stored JSON text as PostgreSQL gives it
 * when the running engine stored it (older results are upgraded through `readStoredResult`).
 */

/** Sectors in the first page of a result's head. */
const firstPageSectors = 100;

/**
 * What the results page opens with: the result without its sectors, the summary facts, the mass
 * curves, whether masses are also given in GeV, and the first page of sector overviews; further
 * pages and each sector's detail are read on demand.
 */
export interface ResultHeadDto extends ResultMetaDto {
  /** Each worldvolume's lists cut to `worldvolumeListEntries` (the full lists are in the stored result). */
  result: Omit<ResultOverview, "sectors" | "worldvolumes"> & { worldvolumes: ListedWorldvolume[] };
  facts: SummaryFacts;
  massCurves: MassCurve[];
  showGeV: boolean;
  /** The revision's stacks (id and label), so that the page names sectors by label. */
  stacks: StackNameSource[];
  firstPage: SectorOverviewPage;
}

/** Entries of each worldvolume's matter, flavour and defect lists that the page shows. */
const worldvolumeListEntries = 4;

/** Sector overview marks drawn on the mass plot at most, over all curves. */
const maxCurveMarks = 240;

/** The stored result of a revision, parsed and upgraded to the running engine's shape. */
export async function getResultForRevision(actor: Actor | null, revisionId: string): Promise<ResultDto> {
  const meta = await locateResult(actor, revisionId);
  const [row] = await db.select().from(results).where(eq(results.id, meta.resultId));
  if (!row) throw new NotFoundError("This revision has no stored result yet.");
  return toResultDto(row);
}

/**
 * The stored result as JSON text `{ revisionId, engineVersion, computeMs, createdAt, result }`,
 * built around the stored text without parsing it when the running engine stored it.
 */
export async function getResultText(actor: Actor | null, configurationId: string, revisionId: string): Promise<string> {
  const meta = await locateResult(actor, revisionId, configurationId);
  const [row] = await db.select({ text: sql<string>`${results.result}::text` }).from(results).where(eq(results.id, meta.resultId));
  if (!row) throw new NotFoundError("This revision has no stored result yet.");
  const text = meta.engineVersion === ENGINE_VERSION ? row.text : JSON.stringify(readStoredResult(JSON.parse(row.text)));
  const head = JSON.stringify({ revisionId: meta.revisionId, engineVersion: meta.engineVersion, computeMs: meta.computeMs, createdAt: meta.createdAt });
  return `${head.slice(0, -1)},"result":${text}}`;
}

/** The head of a stored result (see {@link ResultHeadDto}). */
export async function getResultHead(actor: Actor | null, configurationId: string, revisionId: string): Promise<ResultHeadDto> {
  const meta = await locateResult(actor, revisionId, configurationId);
  const [overview, stacks] = await Promise.all([loadOverview(meta), revisionStacks(revisionId)]);
  const names = sectorNames(stacks);
  const { sectors, ...result } = overview;
  let marks = 0;
  const massCurves = curvesOf(sectors.filter((sector) => sector.pair[0] !== sector.pair[1]), names).map((curve) => {
    const kept = curve.sectors.slice(0, Math.max(0, maxCurveMarks - marks));
    marks += kept.length;
    return { ...curve, sectors: kept };
  });
  return {
    revisionId: meta.revisionId,
    engineVersion: meta.engineVersion,
    computeMs: meta.computeMs,
    createdAt: meta.createdAt,
    result: { ...result, worldvolumes: result.worldvolumes.map((worldvolume) => listWorldvolume(worldvolume, worldvolumeListEntries)) },
    facts: summaryFacts(overview),
    massCurves,
    // Every row carries a mass in GeV exactly when the configuration sets a string scale.
    showGeV: overview.lightest.some((state) => "massGeV" in state) || sectors.some((sector) => sector.lightest?.massGeV !== undefined),
    stacks,
    firstPage: pageSectorOverviews(sectors, { limit: firstPageSectors, names }),
  };
}

/** Options of {@link getResultSectorPage}. */
export type ResultSectorPageQuery = Omit<SectorPageQuery, "names">;

/** One page of a stored result's sector overviews that match a filter, in natural order of the stacks' labels; the search matches ids and labels. */
export async function getResultSectorPage(
  actor: Actor | null,
  configurationId: string,
  revisionId: string,
  query: ResultSectorPageQuery,
): Promise<SectorOverviewPage> {
  const meta = await locateResult(actor, revisionId, configurationId);
  const [overview, stacks] = await Promise.all([loadOverview(meta), revisionStacks(revisionId)]);
  return pageSectorOverviews(overview.sectors, { ...query, names: sectorNames(stacks) });
}

/** The id and label of each stack of a revision, read without the rest of its document. */
async function revisionStacks(revisionId: string): Promise<StackNameSource[]> {
  const [row] = await db
    .select({ stacks: sql<Array<{ id: string; label?: string }> | null>`${revisions.document} -> 'stacks'` })
    .from(revisions)
    .where(eq(revisions.id, revisionId));
  return (row?.stacks ?? []).map((stack) => ({ id: stack.id, label: stack.label ?? "" }));
}

/** The stored overview when the running engine stored it, else one built from the upgraded full result. */
async function loadOverview(meta: { resultId: string; engineVersion: string }): Promise<ResultOverview> {
  if (meta.engineVersion === ENGINE_VERSION) {
    const [row] = await db.select({ overview: results.overview }).from(results).where(eq(results.id, meta.resultId));
    if (row?.overview) return row.overview;
  }
  const [row] = await db.select({ result: results.result }).from(results).where(eq(results.id, meta.resultId));
  if (!row) throw new NotFoundError("This revision has no stored result yet.");
  return resultOverview(readStoredResult(row.result));
}

/** One sector of a stored result, with its level rows, expansions, massless content and notes. */
export async function getResultSector(
  actor: Actor | null,
  configurationId: string,
  revisionId: string,
  index: number,
): Promise<Sector> {
  if (!Number.isInteger(index) || index < 0) throw new NotFoundError("No such sector.");
  const meta = await locateResult(actor, revisionId, configurationId);
  if (meta.engineVersion === ENGINE_VERSION) {
    const [row] = await db
      .select({ sector: sql<Sector | null>`${results.result} -> 'sectors' -> ${index}::int` })
      .from(results)
      .where(eq(results.id, meta.resultId));
    if (!row?.sector) throw new NotFoundError("No such sector.");
    return row.sector;
  }
  const [row] = await db.select({ result: results.result }).from(results).where(eq(results.id, meta.resultId));
  const sector = row ? readStoredResult(row.result).sectors[index] : undefined;
  if (!sector) throw new NotFoundError("No such sector.");
  return sector;
}

/** The stored result's row id and metadata, after checking that the actor may read it (404 otherwise). */
async function locateResult(
  actor: Actor | null,
  revisionId: string,
  configurationId?: string,
): Promise<ResultMetaDto & { resultId: string }> {
  requireActor(actor);
  assertUuid(revisionId, "revision");
  const [found] = await db
    .select({
      configurationId: revisions.configurationId,
      resultId: results.id,
      engineVersion: results.engineVersion,
      computeMs: results.computeMs,
      createdAt: results.createdAt,
    })
    .from(revisions)
    .leftJoin(results, eq(results.revisionId, revisions.id))
    .where(eq(revisions.id, revisionId))
    .limit(1);
  if (!found || (configurationId !== undefined && found.configurationId !== configurationId)) {
    throw new NotFoundError("No such revision.");
  }
  await requireConfigurationRole(db, actor, found.configurationId, "viewer");
  if (found.resultId === null || found.engineVersion === null || found.computeMs === null || found.createdAt === null) {
    throw new NotFoundError("This revision has no stored result yet.");
  }
  return { revisionId, resultId: found.resultId, engineVersion: found.engineVersion, computeMs: found.computeMs, createdAt: found.createdAt };
}

/**
 * A configuration (as `getConfiguration` returns it) with its current revision's stored result
 * spliced in as `result` (`null` before the first save), as JSON text; the result's JSON is sent as
 * stored when the running engine stored it.
 */
export async function getConfigurationWithResultText(
  actor: Actor | null,
  configurationId: string,
): Promise<{ text: string; version: number }> {
  const { row, context, role, result } = await readConfigurationWithResult(actor, configurationId);
  const head = JSON.stringify(toConfigurationDto(row, context, role)).slice(0, -1);
  if (!result || !row.currentRevisionId) return { text: `${head},"result":null}`, version: row.version };
  const text = result.engineVersion === ENGINE_VERSION ? result.text : JSON.stringify(readStoredResult(JSON.parse(result.text)));
  const meta = JSON.stringify({
    revisionId: row.currentRevisionId,
    engineVersion: result.engineVersion,
    computeMs: result.computeMs,
    createdAt: result.createdAt,
  });
  return { text: `${head},"result":${meta.slice(0, -1)},"result":${text}}}`, version: row.version };
}
