import "server-only";
import { ConfigurationError, computeSpectrum } from "../../lib/boundary";
import type { Configuration, SpectrumResult } from "../../lib/boundary/types";
import { ValidationError } from "../../lib/errors";
import type { Transaction } from "../index";
import { results } from "../schema";

/** The engine's authoritative result of a document and how long the server took to compute it. */
export interface ComputedResult {
  result: SpectrumResult;
  /** Milliseconds, to the microsecond. */
  computeMs: number;
}

/** Options of {@link computeResult}. */
export interface ComputeResultOptions {
  /** Where the document sits in the request, for the paths of engine problems (default `["document"]`). */
  problemsAt?: (string | number)[];
}

/**
 * Computes the authoritative result of a document on the server. Every write of a document (create,
 * save, import, restore, fork of a changed draft) calls this itself: a result never comes from the
 * caller, so a browser's live preview is never trusted. Engine problems (a D3 in IIA, ...) become a
 * 422 with every JSON path under `document`.
 */
export function computeResult(document: Configuration, options: ComputeResultOptions = {}): ComputedResult {
  const started = performance.now();
  try {
    const result = computeSpectrum(document);
    return { result, computeMs: Math.round((performance.now() - started) * 1000) / 1000 };
  } catch (error) {
    if (error instanceof ConfigurationError) {
      const at = options.problemsAt ?? ["document"];
      throw new ValidationError(error.problems.map((problem) => ({ path: [...at, ...problem.path], message: problem.message })));
    }
    throw error;
  }
}

/** Stores the result of a revision inside the revision's transaction. */
export async function storeResult(tx: Transaction, revisionId: string, computed: ComputedResult): Promise<void> {
  await tx.insert(results).values({
    revisionId,
    engineVersion: computed.result.engineVersion,
    result: computed.result,
    computeMs: Number.isFinite(computed.computeMs) && computed.computeMs >= 0 ? computed.computeMs : 0,
  });
}
