import "server-only";
import { ConfigurationError, computeSpectrum } from "@/lib/boundary";
import type { Configuration, SpectrumResult } from "@/lib/boundary/types";
import { getRevision, type RevisionDto } from "@/db/queries/configurations";
import type { Actor } from "@/db/queries/actor";
import { NotFoundError, PayloadTooLargeError, ValidationError } from "@/lib/errors";

/**
 * Computes the authoritative result of a document on the server, timed in milliseconds.
 * Engine problems (wrong p for the theory, ...) become a 422 with every JSON path.
 */
export function computeAuthoritativeResult(document: Configuration): { result: SpectrumResult; computeMs: number } {
  const started = performance.now();
  try {
    const result = computeSpectrum(document);
    return { result, computeMs: Math.round((performance.now() - started) * 1000) / 1000 };
  } catch (error) {
    if (error instanceof ConfigurationError) {
      throw new ValidationError(error.problems.map((problem) => ({ path: ["document", ...problem.path], message: problem.message })));
    }
    throw error;
  }
}

/**
 * Reads a JSON body, refusing more than `limitBytes` (413) and malformed JSON (422).
 */
export async function readJsonBody(request: Request, limitBytes: number): Promise<unknown> {
  const declared = Number(request.headers.get("content-length") ?? "0");
  if (declared > limitBytes) throw new PayloadTooLargeError(limitBytes);
  const text = await request.text();
  if (new TextEncoder().encode(text).length > limitBytes) throw new PayloadTooLargeError(limitBytes);
  try {
    return JSON.parse(text) as unknown;
  } catch {
    throw ValidationError.at([], "The request body is not valid JSON.");
  }
}

/** A revision that belongs to the given configuration (404 otherwise, also for revisions of others). */
export async function getRevisionOfConfiguration(
  actor: Actor,
  configurationId: string,
  revisionId: string,
): Promise<RevisionDto> {
  const revision = await getRevision(actor, revisionId);
  if (revision.configurationId !== configurationId) throw new NotFoundError("No such revision.");
  return revision;
}
