import "server-only";
import { and, desc, eq, type SQL } from "drizzle-orm";
import { NotFoundError } from "../../lib/errors";
import { db } from "../index";
import { results, revisions, users } from "../schema";
import { assertUuid, requireActor, type Actor } from "./actor";
import { recordAudit } from "./audit";
import { requireConfigurationRole } from "./configuration-access";
import {
  toConfigurationDto,
  toRevisionSummary,
  type ConfigurationDto,
  type RevisionDto,
  type RevisionSummaryDto,
} from "./configuration-dtos";
import { resultForDocument } from "./results";
import { addRevision, bumpVersion, documentColumns } from "./revision-writes";

/** Options of `restoreRevision`. */
export interface RestoreRevisionOptions {
  /** When given, the restore fails with ConflictError unless the stored version equals it. */
  expectedVersion?: number;
  message?: string;
}

/** The history of a configuration, newest first (viewer or better). */
export async function listRevisions(
  actor: Actor | null,
  configurationId: string,
): Promise<RevisionSummaryDto[]> {
  const { row } = await requireConfigurationRole(db, actor, configurationId, "viewer");
  const rows = await db
    .select({
      revision: revisions,
      authorName: users.name,
      resultId: results.id,
    })
    .from(revisions)
    .innerJoin(users, eq(users.id, revisions.authorId))
    .leftJoin(results, eq(results.revisionId, revisions.id))
    .where(eq(revisions.configurationId, configurationId))
    .orderBy(desc(revisions.number));
  return rows.map(({ revision, authorName, resultId }) =>
    toRevisionSummary(revision, authorName, row.currentRevisionId, resultId !== null),
  );
}

/** One revision with its document (viewer or better on its configuration). */
export async function getRevision(actor: Actor | null, revisionId: string): Promise<RevisionDto> {
  requireActor(actor);
  assertUuid(revisionId, "revision");
  const [found] = await db
    .select({ configurationId: revisions.configurationId })
    .from(revisions)
    .where(eq(revisions.id, revisionId))
    .limit(1);
  if (!found) throw new NotFoundError("No such revision.");
  return getRevisionWhere(actor, found.configurationId, eq(revisions.id, revisionId));
}

/** A revision by its number within a configuration (viewer or better). */
export async function getRevisionByNumber(
  actor: Actor | null,
  configurationId: string,
  number: number,
): Promise<RevisionDto> {
  if (!Number.isInteger(number) || number < 1) throw new NotFoundError("No such revision.");
  return getRevisionWhere(
    actor,
    configurationId,
    and(eq(revisions.configurationId, configurationId), eq(revisions.number, number)),
  );
}

/** A revision that belongs to the given configuration (404 otherwise, also for revisions of others). */
export async function getRevisionOfConfiguration(
  actor: Actor | null,
  configurationId: string,
  revisionId: string,
): Promise<RevisionDto> {
  const revision = await getRevision(actor, revisionId);
  if (revision.configurationId !== configurationId) throw new NotFoundError("No such revision.");
  return revision;
}

/**
 * Makes an old revision current again by saving its document as a new revision (editor or
 * better); history is never rewritten. The revision's stored result is reused when the current
 * engine computed it (same document, same engine, same numbers); otherwise it is recomputed.
 */
export async function restoreRevision(
  actor: Actor | null,
  configurationId: string,
  revisionId: string,
  options: RestoreRevisionOptions = {},
): Promise<ConfigurationDto> {
  const author = requireActor(actor);
  assertUuid(revisionId, "revision");
  return db.transaction(async (tx) => {
    const { row: current, role, context } = await requireConfigurationRole(tx, actor, configurationId, "editor");
    const [old] = await tx
      .select()
      .from(revisions)
      .where(and(eq(revisions.id, revisionId), eq(revisions.configurationId, configurationId)))
      .limit(1);
    if (!old) throw new NotFoundError("No such revision.");
    const result = await resultForDocument(tx, old.document, { sameAs: { revisionId: old.id } });
    const bumped = await bumpVersion(
      tx,
      configurationId,
      options.expectedVersion ?? current.version,
      documentColumns(old.document, result.summary),
    );
    const row = await addRevision(tx, bumped, author.id, options.message?.trim() || `Restored revision ${old.number}`, result);
    await recordAudit(tx, {
      actorId: author.id,
      groupId: row.groupId,
      action: "configuration.restore",
      entityType: "configuration",
      entityId: row.id,
      details: { restoredRevisionId: old.id, restoredNumber: old.number, version: row.version },
    });
    return toConfigurationDto(row, context, role);
  });
}

async function getRevisionWhere(
  actor: Actor | null,
  configurationId: string,
  where: SQL | undefined,
): Promise<RevisionDto> {
  const { row } = await requireConfigurationRole(db, actor, configurationId, "viewer");
  const [found] = await db
    .select({ revision: revisions, authorName: users.name, resultId: results.id })
    .from(revisions)
    .innerJoin(users, eq(users.id, revisions.authorId))
    .leftJoin(results, eq(results.revisionId, revisions.id))
    .where(where)
    .limit(1);
  if (!found) throw new NotFoundError("No such revision.");
  return {
    ...toRevisionSummary(found.revision, found.authorName, row.currentRevisionId, found.resultId !== null),
    document: found.revision.document,
  };
}
