import "server-only";
import { and, eq, isNull, sql } from "drizzle-orm";
import type { Configuration } from "../../lib/boundary/types";
import { configurationTitleMaxLength } from "../../lib/validations/limits";
import type { ResultSummary } from "../../lib/spectrum";
import { ConflictError, NotFoundError, ValidationError } from "../../lib/errors";
import type { Transaction } from "../index";
import { configurations, revisions, type ConfigurationRow } from "../schema";
import { storeResult, type RevisionResult } from "./results";

/*
 * The steps every write of a configuration document shares (create, save, restore, fork): the
 * columns the document and its result set, the optimistic version bump, and the new revision with
 * its result. Internal to db/queries.
 */


/** The trimmed title of a document, or a 422 at `document.title`. */
export function requireTitle(document: Configuration): string {
  const title = document.title.trim();
  if (!title) throw ValidationError.at(["document", "title"], "Give the configuration a title.");
  if (title.length > configurationTitleMaxLength) {
    throw ValidationError.at(["document", "title"], `Use at most ${configurationTitleMaxLength} characters.`);
  }
  return title;
}

/** The configuration columns a document and its result set (the list summary included). */
export function documentColumns(document: Configuration, summary: ResultSummary) {
  return {
    title: requireTitle(document),
    description: document.description ?? "",
    theory: document.theory,
    document,
    ...summary,
  } satisfies Partial<typeof configurations.$inferInsert>;
}

/**
 * The optimistic-concurrency step: `UPDATE ... SET version = version + 1 WHERE version = expected`.
 * A concurrent save that committed first makes this match no row, and the caller gets a
 * ConflictError before anything is written.
 */
export async function bumpVersion(
  tx: Transaction,
  configurationId: string,
  expectedVersion: number,
  changes: Partial<typeof configurations.$inferInsert>,
): Promise<ConfigurationRow> {
  if (!Number.isInteger(expectedVersion) || expectedVersion < 1) {
    throw ValidationError.at(["expectedVersion"], "expectedVersion must be a positive whole number.");
  }
  const [bumped] = await tx
    .update(configurations)
    .set({ ...changes, version: sql`${configurations.version} + 1`, updatedAt: sql`now()` })
    .where(
      and(
        eq(configurations.id, configurationId),
        eq(configurations.version, expectedVersion),
        isNull(configurations.deletedAt),
      ),
    )
    .returning();
  if (bumped) return bumped;
  const [current] = await tx
    .select({ version: configurations.version })
    .from(configurations)
    .where(eq(configurations.id, configurationId));
  if (!current) throw new NotFoundError("No such configuration.");
  throw new ConflictError(current.version);
}

/** Inserts the revision numbered `row.version` with its result and points the configuration at it. */
export async function addRevision(
  tx: Transaction,
  row: ConfigurationRow,
  authorId: string,
  message: string,
  result: RevisionResult,
): Promise<ConfigurationRow> {
  const [revision] = await tx
    .insert(revisions)
    .values({
      configurationId: row.id,
      number: row.version,
      document: row.document,
      authorId,
      message: message.trim(),
    })
    .returning({ id: revisions.id });
  if (!revision) throw new Error("Revision insert returned no row");
  await storeResult(tx, revision.id, result);
  const [updated] = await tx
    .update(configurations)
    .set({ currentRevisionId: revision.id })
    .where(eq(configurations.id, row.id))
    .returning();
  if (!updated) throw new Error("Configuration vanished inside its transaction");
  return updated;
}
