import "server-only";
import { createHash } from "node:crypto";
import { and, eq, sql, type Placeholder, type SQL } from "drizzle-orm";
import { ENGINE_VERSION, resultInputKey } from "../../lib/boundary";
import type { Configuration } from "../../lib/boundary/types";
import { computeSpectrumJob } from "../../lib/server/compute/pool";
import { parseResultNumber, type ResultSummary } from "../../lib/spectrum";
import { db, type Executor, type Transaction } from "../index";
import { results } from "../schema";

/*
 * Results are content-addressed: the SHA-256 of the engine version and the document's
 * result-relevant content (lib/boundary/result-key.ts) is stored with each result, and a write of a
 * document whose hash is already stored copies that result row inside PostgreSQL instead of
 * computing it again. A result is never taken from the caller.
 */

/** A result the server just computed, as JSON text ready to store. */
export interface FreshResult {
  source: "fresh";
  contentHash: string;
  json: string;
  overviewJson: string;
  summary: ResultSummary;
  engineVersion: string;
  /** Milliseconds, to the microsecond; never negative or NaN (0 then), as the column wants. */
  computeMs: number;
}

/** A stored result with the same content, copied row to row inside PostgreSQL. */
export interface StoredResult {
  source: "stored";
  resultId: string;
  summary: ResultSummary;
}

/** The result a new revision gets. */
export type RevisionResult = FreshResult | StoredResult;

/** Options of {@link resultForDocument}. */
export interface ResultForDocumentOptions {
  /** Where the document sits in the request, for the paths of engine problems (default `["document"]`). */
  problemsAt?: (string | number)[];
  /** A revision with the same document whose result may be reused even if it predates content hashes. */
  sameAs?: { revisionId: string };
  /**
   * The lookup by content hash, already made by the caller in a statement of its own
   * ({@link storedResultByHash}): `stored` is what it found for `contentHash` (null for nothing).
   */
  byHash?: { contentHash: string; stored: StoredRow | null };
}

/**
 * The authoritative result for a document: a stored result with the same content hash when there
 * is one (or the `sameAs` revision's, when the running engine computed it), else a fresh computation
 * (off the request thread for large documents, lib/server/compute/pool.ts). Engine problems (a D3 in
 * IIA, ...) become a 422 with every JSON path under `problemsAt`.
 */
export async function resultForDocument(
  executor: Executor,
  document: Configuration,
  options: ResultForDocumentOptions = {},
): Promise<RevisionResult> {
  const contentHash = options.byHash?.contentHash ?? hashDocument(document);
  const byHash = options.byHash
    ? options.byHash.stored ? [options.byHash.stored] : []
    : executor === db
      ? storedByHashStatement.execute({ contentHash })
      : selectStored(executor, eq(results.contentHash, contentHash));
  const stored =
    (await findStoredResult(byHash, document)) ??
    (options.sameAs
      ? await findStoredResult(selectStored(executor, and(eq(results.revisionId, options.sameAs.revisionId), eq(results.engineVersion, ENGINE_VERSION))), document)
      : null);
  if (stored) return stored;
  const outcome = await computeSpectrumJob({ document, overview: true }, { problemsAt: options.problemsAt ?? ["document"] });
  return {
    source: "fresh",
    contentHash,
    json: outcome.json,
    overviewJson: outcome.overviewJson ?? "null",
    summary: outcome.summary,
    engineVersion: outcome.engineVersion,
    computeMs: Number.isFinite(outcome.computeMs) && outcome.computeMs >= 0 ? outcome.computeMs : 0,
  };
}

/**
 * SHA-256 (hex) of the running engine version and the document's result-relevant content.
 *
 * @example
 * hashDocument({ ...document, title: "another" }) === hashDocument(document) // => true
 */
export function hashDocument(document: Configuration): string {
  return createHash("sha256").update(`${ENGINE_VERSION}\n${resultInputKey(document)}`).digest("hex");
}

/** What the reuse of a stored result reads: its id and the summary columns, never the result itself. */
function selectStored(executor: Executor, where: SQL | undefined) {
  return executor
    .select({
      id: results.id,
      lightest: sql<string | null>`${results.result} -> 'lightest' -> 0 ->> 'massSquared'`.as("stored_lightest"),
      supercharges: sql<number | null>`(${results.result} ->> 'supercharges')::int`.as("stored_supercharges"),
      tachyonic: sql<boolean>`jsonb_path_exists(${results.result}::jsonb, '$.sectors[*] ? (@.tachyonic == true)')`.as("stored_tachyonic"),
    })
    .from(results)
    .where(where)
    .limit(1);
}

/** What a lookup of a stored result finds (see {@link selectStored}). */
export type StoredRow = Awaited<ReturnType<typeof selectStored>>[number];

/**
 * The lookup by content hash as a subquery, for a statement that makes it along with something
 * else (the save's access check, db/queries/configuration-access.ts).
 */
export function storedResultByHash(executor: Executor, contentHash: string | Placeholder) {
  return selectStored(executor, eq(results.contentHash, contentHash)).as("stored_by_hash");
}

/** The lookup by content hash that every save, create, fork and restore makes, prepared once. */
const storedByHashStatement = selectStored(db, eq(results.contentHash, sql.placeholder("contentHash"))).prepare("stored_result_by_hash");

/** Stores the result of a new revision inside the revision's transaction. */
export async function storeResult(tx: Transaction, revisionId: string, result: RevisionResult): Promise<void> {
  if (result.source === "fresh") {
    await tx.insert(results).values({
      revisionId,
      engineVersion: result.engineVersion,
      contentHash: result.contentHash,
      // The JSON text goes to PostgreSQL as it is: no parse and re-serialise on the request thread.
      result: sql`${result.json}::json`,
      overview: sql`${result.overviewJson}::json`,
      computeMs: result.computeMs,
    });
    return;
  }
  await tx.execute(sql`
    insert into ${results} (revision_id, engine_version, content_hash, result, overview, compute_ms)
    select ${revisionId}, engine_version, content_hash, result, overview, compute_ms from ${results} where id = ${result.resultId}`);
}

/**
 * The stored result a lookup found (see `selectStored`: the summary columns are read inside
 * PostgreSQL, so the result itself never travels), or null.
 */
async function findStoredResult(lookup: StoredRow[] | PromiseLike<StoredRow[]>, document: Configuration): Promise<StoredResult | null> {
  const [stored] = await lookup;
  if (!stored) return null;
  const lightest = stored.lightest === null ? Number.NaN : parseResultNumber(stored.lightest);
  const lightestMassSquared = Number.isFinite(lightest) ? lightest : null;
  return {
    source: "stored",
    resultId: stored.id,
    summary: {
      stackCount: document.stacks.length,
      lightestMassSquared,
      supercharges: stored.supercharges,
      tachyonic: stored.tachyonic || (lightestMassSquared !== null && lightestMassSquared < 0),
    },
  };
}

