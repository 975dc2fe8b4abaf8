import "server-only";
import { and, eq, sql } from "drizzle-orm";
import { ENGINE_VERSION } from "../../lib/boundary";
import type { Configuration } from "../../lib/boundary/types";
import { computeSpectrumJob } from "../../lib/server/compute/pool";
import { parseResultNumber, type ResultSummary } from "../../lib/spectrum";
import type { Transaction } from "../index";
import { results } from "../schema";

/** A result the server just computed, as JSON text ready to store. */
export interface FreshResult {
  source: "fresh";
  json: string;
  summary: ResultSummary;
  engineVersion: string;
  /** Milliseconds, to the microsecond. */
  computeMs: number;
}

/** The stored result of another revision with the same document, copied row to row inside PostgreSQL. */
export interface StoredResult {
  source: "stored";
  revisionId: string;
  summary: ResultSummary;
}

/** The result a new revision gets. */
export type RevisionResult = FreshResult | StoredResult;

/** Options of {@link computeResult}. */
export interface ComputeResultOptions {
  /** Where the document sits in the request, for the paths of engine problems (default `["document"]`). */
  problemsAt?: (string | number)[];
}

/**
 * Computes the authoritative result of a document on the server. Every write of a document (create,
 * save, import, restore, fork of a changed draft) calls this itself: a result never comes from the
 * caller, so a browser's live preview is never trusted. Large documents are computed off the
 * request thread (lib/server/compute/pool.ts). Engine problems (a D3 in IIA, ...) become a 422 with
 * every JSON path under `document`.
 */
export async function computeResult(document: Configuration, options: ComputeResultOptions = {}): Promise<FreshResult> {
  const outcome = await computeSpectrumJob({ document }, { problemsAt: options.problemsAt ?? ["document"] });
  return { source: "fresh", json: outcome.json, summary: outcome.summary, engineVersion: outcome.engineVersion, computeMs: outcome.computeMs };
}

/**
 * The stored result of a revision when the running engine version computed it, so that copying the
 * revision's unchanged document can copy its result too; null when it must be recomputed. The
 * summary is read inside PostgreSQL, so the result itself never travels.
 */
export async function reusableResult(tx: Transaction, revisionId: string, document: Configuration): Promise<StoredResult | null> {
  const [stored] = await tx
    .select({
      lightest: sql<string | null>`${results.result} -> 'lightest' -> 0 ->> 'massSquared'`,
      supercharges: sql<number | null>`(${results.result} ->> 'supercharges')::int`,
      tachyonic: sql<boolean>`jsonb_path_exists(${results.result}, '$.sectors[*] ? (@.tachyonic == true)')`,
    })
    .from(results)
    .where(and(eq(results.revisionId, revisionId), eq(results.engineVersion, ENGINE_VERSION)))
    .limit(1);
  if (!stored) return null;
  const lightest = stored.lightest === null ? Number.NaN : parseResultNumber(stored.lightest);
  const lightestMassSquared = Number.isFinite(lightest) ? lightest : null;
  return {
    source: "stored",
    revisionId,
    summary: {
      stackCount: document.stacks.length,
      lightestMassSquared,
      supercharges: stored.supercharges,
      tachyonic: stored.tachyonic || (lightestMassSquared !== null && lightestMassSquared < 0),
    },
  };
}

/** Stores the result of a new revision inside the revision's transaction. */
export async function storeResult(tx: Transaction, revisionId: string, result: RevisionResult): Promise<void> {
  if (result.source === "fresh") {
    await tx.insert(results).values({
      revisionId,
      engineVersion: result.engineVersion,
      // The JSON text goes to PostgreSQL as it is: no parse and re-serialise on the request thread.
      result: sql`${result.json}::jsonb`,
      computeMs: Number.isFinite(result.computeMs) && result.computeMs >= 0 ? result.computeMs : 0,
    });
    return;
  }
  await tx.execute(sql`
    insert into ${results} (revision_id, engine_version, result, compute_ms)
    select ${revisionId}, engine_version, result, compute_ms from ${results} where revision_id = ${result.revisionId}`);
}
