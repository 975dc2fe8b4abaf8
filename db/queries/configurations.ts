import "server-only";
import { and, asc, count, desc, eq, ilike, inArray, isNull, sql, type Placeholder, type SQL } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";
import type { Configuration, SpectrumResult, Theory } from "../../lib/boundary/types";
import { ConflictError, ForbiddenError, NotFoundError, ValidationError } from "../../lib/errors";
import { db, type Executor, type Transaction } from "../index";
import {
  configurations,
  groups,
  memberships,
  results,
  revisions,
  users,
  type ConfigurationRow,
  type GroupKind,
  type GroupRole,
} from "../schema";
import { assertUuid, getGroupRole, requireActor, requireGroupRole, roleAtLeast, type Actor } from "./actor";
import { recordAudit } from "./audit";

/** A person shown next to a record. */
export interface PersonDto {
  id: string;
  name: string;
}

/** One row of a configurations table (summary columns of the current revision's result). */
export interface ConfigurationSummaryDto {
  id: string;
  title: string;
  theory: Theory;
  group: { id: string; slug: string; name: string; kind: GroupKind };
  version: number;
  isStarter: boolean;
  stackCount: number;
  /** alpha' M^2 of the lightest state, or null when unknown. */
  lightestMassSquared: number | null;
  tachyonic: boolean;
  /** Supercharges preserved (type II); null for bosonic. */
  supercharges: number | null;
  forkedFromConfigurationId: string | null;
  author: PersonDto;
  createdAt: Date;
  updatedAt: Date;
}

/** A configuration as the designer opens it. */
export interface ConfigurationDto extends ConfigurationSummaryDto {
  description: string;
  document: Configuration;
  currentRevision: { id: string; number: number } | null;
  /** Where this configuration was forked from; `title` is null when the actor cannot see the source. */
  forkedFrom: {
    configurationId: string;
    revisionId: string | null;
    revisionNumber: number | null;
    title: string | null;
  } | null;
  /** The actor's effective role in the configuration's group. */
  role: GroupRole;
  canEdit: boolean;
}

/** One row of a configuration's history. */
export interface RevisionSummaryDto {
  id: string;
  configurationId: string;
  number: number;
  message: string;
  author: PersonDto;
  createdAt: Date;
  isCurrent: boolean;
  hasResult: boolean;
}

/** A revision with its document snapshot. */
export interface RevisionDto extends RevisionSummaryDto {
  document: Configuration;
}

/** The stored engine result of one revision. */
export interface ResultDto {
  revisionId: string;
  engineVersion: string;
  result: SpectrumResult;
  computeMs: number;
  createdAt: Date;
}

/** Options of the list functions. */
export interface ListConfigurationsOptions {
  /** Case-insensitive substring of the title. */
  search?: string;
  /** Only lab starter configurations (true) or only the others (false). */
  starter?: boolean;
  theory?: Theory;
  sort?: "updated" | "created" | "title" | "lightest" | "stacks";
  direction?: "asc" | "desc";
  /** Default 100, at most 500. */
  limit?: number;
  offset?: number;
}

/** A page of configuration rows and the total matching count. */
export interface ConfigurationPage {
  items: ConfigurationSummaryDto[];
  total: number;
}

/** Options of `createConfiguration`. */
export interface CreateConfigurationOptions {
  /** Publish as a lab starter (owners of a lab group only). */
  isStarter?: boolean;
}

/** Input of `updateConfiguration`. */
export interface UpdateConfigurationInput {
  /** The version the editor started from; a different stored version means someone else saved. */
  expectedVersion: number;
  document: Configuration;
  message: string;
  /** The engine's result for `document`, computed by the caller. */
  result: SpectrumResult;
  computeMs: number;
}

/** Input of `forkConfiguration`. */
export interface ForkConfigurationInput {
  /** The group (e.g. the actor's personal space) that receives the fork; editor or better. */
  targetGroupId: string;
  /** Revision to fork; the current one when omitted. */
  revisionId?: string;
  /** Title of the fork; the source title when omitted. */
  title?: string;
}

/** Options of `restoreRevision`. */
export interface RestoreRevisionOptions {
  /** When given, the restore fails with ConflictError unless the stored version equals it. */
  expectedVersion?: number;
  message?: string;
  /**
   * A freshly computed result for the restored document. Without it the revision's stored result
   * is copied (the document is identical, so the result is too, for the same engine version).
   */
  result?: SpectrumResult;
  computeMs?: number;
}

/**
 * Configurations of one group (viewer or better), with summary columns and author.
 */
export async function listConfigurationsForGroup(
  actor: Actor | null,
  groupId: string,
  options: ListConfigurationsOptions = {},
): Promise<ConfigurationPage> {
  assertUuid(groupId, "group");
  await requireGroupRole(db, actor, groupId, "viewer");
  return listConfigurations(eq(configurations.groupId, groupId), options);
}

/**
 * Configurations across the actor's groups. `scope: "created"` (default) lists those the actor
 * created; `"accessible"` lists everything the actor can read through memberships.
 */
export async function listConfigurationsForUser(
  actor: Actor | null,
  options: ListConfigurationsOptions & { scope?: "created" | "accessible" } = {},
): Promise<ConfigurationPage> {
  const signedIn = requireActor(actor);
  const memberOf = db
    .select({ groupId: memberships.groupId })
    .from(memberships)
    .where(eq(memberships.userId, signedIn.id));
  const visible = inArray(configurations.groupId, memberOf);
  const where =
    (options.scope ?? "created") === "created"
      ? and(visible, eq(configurations.createdBy, signedIn.id))
      : visible;
  return listConfigurations(where, options);
}

/**
 * Direct forks of a configuration, for the owners and editors of its group (a lab instructor
 * comparing students' forks of a starter). Summaries only, wherever the forks live.
 */
export async function listForksOfConfiguration(
  actor: Actor | null,
  configurationId: string,
  options: ListConfigurationsOptions = {},
): Promise<ConfigurationPage> {
  await loadConfiguration(db, actor, configurationId, "editor");
  return listConfigurations(eq(configurations.forkedFromConfigurationId, configurationId), options);
}

/** One configuration with its current document (viewer or better). */
export async function getConfiguration(
  actor: Actor | null,
  configurationId: string,
): Promise<ConfigurationDto> {
  const { row, role } = await loadConfiguration(db, actor, configurationId, "viewer");
  return toConfigurationDto(db, actor, row, role);
}

/**
 * Creates a configuration in a group (editor or better) with revision 1 and its result, in one
 * transaction. Title, description and theory come from the document.
 */
export async function createConfiguration(
  actor: Actor | null,
  groupId: string,
  document: Configuration,
  message: string,
  result: SpectrumResult,
  computeMs: number,
  options: CreateConfigurationOptions = {},
): Promise<ConfigurationDto> {
  const author = requireActor(actor);
  assertUuid(groupId, "group");
  const title = requireTitle(document);
  return db.transaction(async (tx) => {
    const role = await requireGroupRole(tx, actor, groupId, "editor");
    if (options.isStarter) await assertCanPublishStarter(tx, groupId, role);
    const [created] = await tx
      .insert(configurations)
      .values({
        groupId,
        title,
        description: document.description ?? "",
        theory: document.theory,
        document,
        version: 1,
        isStarter: options.isStarter ?? false,
        createdBy: author.id,
        ...summarize(document, result),
      })
      .returning();
    if (!created) throw new Error("Configuration insert returned no row");
    const row = await addRevision(tx, created, author.id, document, message, result, computeMs);
    await recordAudit(tx, {
      actorId: author.id,
      groupId,
      action: "configuration.create",
      entityType: "configuration",
      entityId: created.id,
      details: { title, isStarter: created.isStarter },
    });
    return toConfigurationDto(tx, actor, row, role);
  });
}

/**
 * Saves a new revision (editor or better). The update only applies when the stored version
 * equals `expectedVersion`; otherwise ConflictError (with the current version) and nothing is
 * written, so concurrent saves never overwrite each other.
 */
export async function updateConfiguration(
  actor: Actor | null,
  configurationId: string,
  input: UpdateConfigurationInput,
): Promise<ConfigurationDto> {
  const author = requireActor(actor);
  const title = requireTitle(input.document);
  return db.transaction(async (tx) => {
    const { role } = await loadConfiguration(tx, actor, configurationId, "editor");
    const bumped = await bumpVersion(tx, configurationId, input.expectedVersion, {
      title,
      description: input.document.description ?? "",
      theory: input.document.theory,
      document: input.document,
      ...summarize(input.document, input.result),
    });
    const row = await addRevision(
      tx,
      bumped,
      author.id,
      input.document,
      input.message,
      input.result,
      input.computeMs,
    );
    await recordAudit(tx, {
      actorId: author.id,
      groupId: row.groupId,
      action: "configuration.update",
      entityType: "configuration",
      entityId: row.id,
      details: { version: row.version },
    });
    return toConfigurationDto(tx, actor, row, role);
  });
}

/**
 * Forks a configuration (viewer or better on the source) into a group where the actor is editor
 * or better. The fork starts at revision 1 with the source revision's document and result and
 * records the source configuration and revision.
 */
export async function forkConfiguration(
  actor: Actor | null,
  configurationId: string,
  input: ForkConfigurationInput,
): Promise<ConfigurationDto> {
  const author = requireActor(actor);
  assertUuid(input.targetGroupId, "group");
  if (input.revisionId !== undefined) assertUuid(input.revisionId, "revision");
  return db.transaction(async (tx) => {
    const { row: source } = await loadConfiguration(tx, actor, configurationId, "viewer");
    const targetRole = await getGroupRole(tx, actor, input.targetGroupId);
    if (!targetRole) throw ValidationError.at(["targetGroupId"], "Choose a space you belong to.");
    if (!roleAtLeast(targetRole, "editor")) {
      throw new ForbiddenError("You can only fork into a space where you are an editor or owner.");
    }
    const revisionId = input.revisionId ?? source.currentRevisionId;
    const [revision] = revisionId
      ? await tx
          .select()
          .from(revisions)
          .where(and(eq(revisions.id, revisionId), eq(revisions.configurationId, source.id)))
          .limit(1)
      : [];
    if (!revision) throw new NotFoundError("No such revision.");
    const [stored] = await tx.select().from(results).where(eq(results.revisionId, revision.id)).limit(1);
    if (!stored) throw new NotFoundError("That revision has no stored result to fork from.");

    const title = input.title?.trim() || revision.document.title;
    const document: Configuration = { ...revision.document, title };
    const [created] = await tx
      .insert(configurations)
      .values({
        groupId: input.targetGroupId,
        title,
        description: document.description ?? "",
        theory: document.theory,
        document,
        version: 1,
        forkedFromConfigurationId: source.id,
        forkedFromRevisionId: revision.id,
        createdBy: author.id,
        ...summarize(document, stored.result),
      })
      .returning();
    if (!created) throw new Error("Configuration insert returned no row");
    const row = await addRevision(
      tx,
      created,
      author.id,
      document,
      `Forked from "${source.title}", revision ${revision.number}`,
      stored.result,
      stored.computeMs,
    );
    await recordAudit(tx, {
      actorId: author.id,
      groupId: input.targetGroupId,
      action: "configuration.fork",
      entityType: "configuration",
      entityId: row.id,
      details: { sourceConfigurationId: source.id, sourceRevisionId: revision.id },
    });
    return toConfigurationDto(tx, actor, row, targetRole);
  });
}

/** The history of a configuration, newest first (viewer or better). */
export async function listRevisions(
  actor: Actor | null,
  configurationId: string,
): Promise<RevisionSummaryDto[]> {
  const { row } = await loadConfiguration(db, actor, configurationId, "viewer");
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

/** The stored engine result of a revision (viewer or better on its configuration). */
export async function getResultForRevision(actor: Actor | null, revisionId: string): Promise<ResultDto> {
  requireActor(actor);
  assertUuid(revisionId, "revision");
  const [found] = await db
    .select({ configurationId: revisions.configurationId, stored: results })
    .from(revisions)
    .leftJoin(results, eq(results.revisionId, revisions.id))
    .where(eq(revisions.id, revisionId))
    .limit(1);
  if (!found) throw new NotFoundError("No such revision.");
  await loadConfiguration(db, actor, found.configurationId, "viewer");
  if (!found.stored) throw new NotFoundError("This revision has no stored result yet.");
  return toResultDto(found.stored);
}

/**
 * Makes an old revision current again by saving its document as a new revision (editor or
 * better); history is never rewritten.
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
    const { row: current, role } = await loadConfiguration(tx, actor, configurationId, "editor");
    const [old] = await tx
      .select()
      .from(revisions)
      .where(and(eq(revisions.id, revisionId), eq(revisions.configurationId, configurationId)))
      .limit(1);
    if (!old) throw new NotFoundError("No such revision.");
    let result = options.result;
    let computeMs = options.computeMs ?? 0;
    if (!result) {
      const [stored] = await tx.select().from(results).where(eq(results.revisionId, old.id)).limit(1);
      if (!stored) throw new NotFoundError("That revision has no stored result; recompute it to restore.");
      result = stored.result;
      computeMs = stored.computeMs;
    }
    const bumped = await bumpVersion(tx, configurationId, options.expectedVersion ?? current.version, {
      title: old.document.title,
      description: old.document.description ?? "",
      theory: old.document.theory,
      document: old.document,
      ...summarize(old.document, result),
    });
    const row = await addRevision(
      tx,
      bumped,
      author.id,
      old.document,
      options.message?.trim() || `Restored revision ${old.number}`,
      result,
      computeMs,
    );
    await recordAudit(tx, {
      actorId: author.id,
      groupId: row.groupId,
      action: "configuration.restore",
      entityType: "configuration",
      entityId: row.id,
      details: { restoredRevisionId: old.id, restoredNumber: old.number, version: row.version },
    });
    return toConfigurationDto(tx, actor, row, role);
  });
}

/** Moves a configuration to the bin (editor or better); `undeleteConfiguration` brings it back. */
export async function softDeleteConfiguration(actor: Actor | null, configurationId: string): Promise<void> {
  const signedIn = requireActor(actor);
  await db.transaction(async (tx) => {
    const { row } = await loadConfiguration(tx, actor, configurationId, "editor");
    await tx
      .update(configurations)
      .set({ deletedAt: new Date() })
      .where(and(eq(configurations.id, row.id), isNull(configurations.deletedAt)));
    await recordAudit(tx, {
      actorId: signedIn.id,
      groupId: row.groupId,
      action: "configuration.delete",
      entityType: "configuration",
      entityId: row.id,
      details: { title: row.title },
    });
  });
}

/** Restores a soft-deleted configuration (editor or better in its group). */
export async function undeleteConfiguration(
  actor: Actor | null,
  configurationId: string,
): Promise<ConfigurationDto> {
  const signedIn = requireActor(actor);
  assertUuid(configurationId, "configuration");
  return db.transaction(async (tx) => {
    const [row] = await tx
      .select()
      .from(configurations)
      .where(eq(configurations.id, configurationId))
      .limit(1);
    if (!row) throw new NotFoundError("No such configuration.");
    const role = await requireGroupRole(tx, actor, row.groupId, "editor", "configuration");
    const [restored] = await tx
      .update(configurations)
      .set({ deletedAt: null })
      .where(eq(configurations.id, configurationId))
      .returning();
    if (!restored) throw new NotFoundError("No such configuration.");
    await recordAudit(tx, {
      actorId: signedIn.id,
      groupId: row.groupId,
      action: "configuration.undelete",
      entityType: "configuration",
      entityId: row.id,
    });
    return toConfigurationDto(tx, actor, restored, role);
  });
}

/** Publishes or withdraws a lab starter (owners of a lab group only). */
export async function setConfigurationStarter(
  actor: Actor | null,
  configurationId: string,
  isStarter: boolean,
): Promise<ConfigurationDto> {
  const signedIn = requireActor(actor);
  return db.transaction(async (tx) => {
    const { row, role } = await loadConfiguration(tx, actor, configurationId, "owner");
    if (isStarter) await assertCanPublishStarter(tx, row.groupId, role);
    const [updated] = await tx
      .update(configurations)
      .set({ isStarter })
      .where(eq(configurations.id, row.id))
      .returning();
    if (!updated) throw new NotFoundError("No such configuration.");
    await recordAudit(tx, {
      actorId: signedIn.id,
      groupId: row.groupId,
      action: isStarter ? "configuration.publish_starter" : "configuration.withdraw_starter",
      entityType: "configuration",
      entityId: row.id,
    });
    return toConfigurationDto(tx, actor, updated, role);
  });
}

/**
 * Summary columns derived from a result: stack count, the lightest alpha' M^2 (as a double, for
 * sorting), whether any sector is tachyonic, and the supercharges.
 */
export function summarize(
  document: Configuration,
  result: SpectrumResult,
): Pick<ConfigurationRow, "stackCount" | "lightestMassSquared" | "tachyonic" | "supercharges"> {
  const lightest = result.lightest[0];
  const lightestMassSquared = lightest ? parseExactNumber(lightest.massSquared) : null;
  return {
    stackCount: document.stacks.length,
    lightestMassSquared,
    tachyonic:
      result.sectors.some((sector) => sector.tachyonic) ||
      (lightestMassSquared !== null && lightestMassSquared < 0),
    supercharges: result.supercharges,
  };
}

/** Parses "-1/2", "3" or a decimal string; null when it is not a finite number. */
function parseExactNumber(text: string): number | null {
  const [numerator, denominator, ...rest] = text.split("/");
  const value =
    denominator === undefined ? Number(numerator) : rest.length === 0 ? Number(numerator) / Number(denominator) : NaN;
  return Number.isFinite(value) ? value : null;
}

function requireTitle(document: Configuration): string {
  const title = document.title.trim();
  if (!title) throw ValidationError.at(["document", "title"], "Give the configuration a title.");
  if (title.length > 200) throw ValidationError.at(["document", "title"], "Use at most 200 characters.");
  return title;
}

/**
 * Loads a live configuration and checks the actor's role in its group: 401 without an actor,
 * 404 when missing, deleted or invisible to the actor, 403 when the role is below `minimum`.
 */
async function loadConfiguration(
  executor: Executor,
  actor: Actor | null,
  configurationId: string,
  minimum: GroupRole,
): Promise<{ row: ConfigurationRow; role: GroupRole }> {
  requireActor(actor);
  assertUuid(configurationId, "configuration");
  const [row] = await executor
    .select()
    .from(configurations)
    .where(and(eq(configurations.id, configurationId), isNull(configurations.deletedAt)))
    .limit(1);
  if (!row) throw new NotFoundError("No such configuration.");
  const role = await requireGroupRole(executor, actor, row.groupId, minimum, "configuration");
  return { row, role };
}

async function assertCanPublishStarter(executor: Executor, groupId: string, role: GroupRole) {
  const [group] = await executor.select({ kind: groups.kind }).from(groups).where(eq(groups.id, groupId));
  if (group?.kind !== "lab") throw ValidationError.at(["isStarter"], "Only lab groups publish starter configurations.");
  if (role !== "owner") throw new ForbiddenError("Only the lab's owners publish starter configurations.");
}

/**
 * The optimistic-concurrency step: `UPDATE ... SET version = version + 1 WHERE version = expected`.
 * A concurrent save that committed first makes this match no row, and the caller gets a
 * ConflictError before anything is written.
 */
async function bumpVersion(
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
async function addRevision(
  tx: Transaction,
  row: ConfigurationRow,
  authorId: string,
  document: Configuration,
  message: string,
  result: SpectrumResult,
  computeMs: number,
): Promise<ConfigurationRow> {
  const [revision] = await tx
    .insert(revisions)
    .values({
      configurationId: row.id,
      number: row.version,
      document,
      authorId,
      message: message.trim(),
    })
    .returning({ id: revisions.id });
  if (!revision) throw new Error("Revision insert returned no row");
  await tx.insert(results).values({
    revisionId: revision.id,
    engineVersion: result.engineVersion,
    result,
    computeMs: Number.isFinite(computeMs) && computeMs >= 0 ? computeMs : 0,
  });
  const [updated] = await tx
    .update(configurations)
    .set({ currentRevisionId: revision.id })
    .where(eq(configurations.id, row.id))
    .returning();
  if (!updated) throw new Error("Configuration vanished inside its transaction");
  return updated;
}

const sortColumns = {
  updated: configurations.updatedAt,
  created: configurations.createdAt,
  title: configurations.title,
  lightest: configurations.lightestMassSquared,
  stacks: configurations.stackCount,
} as const;

async function listConfigurations(
  scope: SQL | undefined,
  options: ListConfigurationsOptions,
): Promise<ConfigurationPage> {
  const search = options.search?.trim();
  const where = and(
    scope,
    isNull(configurations.deletedAt),
    isNull(groups.deletedAt),
    search ? ilike(configurations.title, `%${search.replace(/[\\%_]/g, (c) => `\\${c}`)}%`) : undefined,
    options.starter === undefined ? undefined : eq(configurations.isStarter, options.starter),
    options.theory ? eq(configurations.theory, options.theory) : undefined,
  );
  const column = sortColumns[options.sort ?? "updated"];
  const direction = options.direction ?? (options.sort === "title" ? "asc" : "desc");
  const order = direction === "asc" ? sql`${column} asc nulls last` : sql`${column} desc nulls last`;
  const [rows, totals] = await Promise.all([
    db
      .select({ configuration: configurations, group: groups, authorName: users.name })
      .from(configurations)
      .innerJoin(groups, eq(groups.id, configurations.groupId))
      .innerJoin(users, eq(users.id, configurations.createdBy))
      .where(where)
      .orderBy(order, asc(configurations.id))
      .limit(Math.min(Math.max(options.limit ?? 100, 1), 500))
      .offset(Math.max(options.offset ?? 0, 0)),
    db
      .select({ n: count() })
      .from(configurations)
      .innerJoin(groups, eq(groups.id, configurations.groupId))
      .where(where),
  ]);
  return {
    items: rows.map(({ configuration, group, authorName }) => toSummary(configuration, group, authorName)),
    total: totals[0]?.n ?? 0,
  };
}

async function getRevisionWhere(
  actor: Actor | null,
  configurationId: string,
  where: SQL | undefined,
): Promise<RevisionDto> {
  const { row } = await loadConfiguration(db, actor, configurationId, "viewer");
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
const sourceConfiguration = alias(configurations, "source_configuration");
const sourceRevision = alias(revisions, "source_revision");
const currentRevision = alias(revisions, "current_revision");

/** Group, author, current revision number and fork source of one configuration (for its DTO). */
function selectConfigurationDetails(executor: Executor, configurationId: string | Placeholder) {
  return executor
    .select({
      group: groups,
      authorName: users.name,
      currentNumber: currentRevision.number,
      sourceTitle: sourceConfiguration.title,
      sourceGroupId: sourceConfiguration.groupId,
      sourceDeletedAt: sourceConfiguration.deletedAt,
      sourceRevisionNumber: sourceRevision.number,
    })
    .from(configurations)
    .innerJoin(groups, eq(groups.id, configurations.groupId))
    .innerJoin(users, eq(users.id, configurations.createdBy))
    .leftJoin(currentRevision, eq(currentRevision.id, configurations.currentRevisionId))
    .leftJoin(sourceConfiguration, eq(sourceConfiguration.id, configurations.forkedFromConfigurationId))
    .leftJoin(sourceRevision, eq(sourceRevision.id, configurations.forkedFromRevisionId))
    .where(eq(configurations.id, configurationId))
    .limit(1);
}

/**
 * The details query prepared once: planning this six-table join costs PostgreSQL about a
 * millisecond, more than running it, and every configuration read needs it. Transactions build
 * the same query on their own connection (selectConfigurationDetails).
 */
const configurationDetailsStatement = selectConfigurationDetails(db, sql.placeholder("id")).prepare("configuration_details");

async function toConfigurationDto(
  executor: Executor,
  actor: Actor | null,
  row: ConfigurationRow,
  role: GroupRole,
): Promise<ConfigurationDto> {
  const [details] =
    executor === db ? await configurationDetailsStatement.execute({ id: row.id }) : await selectConfigurationDetails(executor, row.id);
  if (!details) throw new NotFoundError("No such configuration.");

  let forkedFrom: ConfigurationDto["forkedFrom"] = null;
  if (row.forkedFromConfigurationId) {
    const sourceVisible =
      details.sourceGroupId !== null &&
      details.sourceDeletedAt === null &&
      (await getGroupRole(executor, actor, details.sourceGroupId)) !== null;
    forkedFrom = {
      configurationId: row.forkedFromConfigurationId,
      revisionId: row.forkedFromRevisionId,
      revisionNumber: sourceVisible ? details.sourceRevisionNumber : null,
      title: sourceVisible ? details.sourceTitle : null,
    };
  }
  return {
    ...toSummary(row, details.group, details.authorName),
    description: row.description,
    document: row.document,
    currentRevision:
      row.currentRevisionId && details.currentNumber !== null
        ? { id: row.currentRevisionId, number: details.currentNumber }
        : null,
    forkedFrom,
    role,
    canEdit: roleAtLeast(role, "editor"),
  };
}

function toSummary(
  row: ConfigurationRow,
  group: typeof groups.$inferSelect,
  authorName: string,
): ConfigurationSummaryDto {
  return {
    id: row.id,
    title: row.title,
    theory: row.theory,
    group: { id: group.id, slug: group.slug, name: group.name, kind: group.kind },
    version: row.version,
    isStarter: row.isStarter,
    stackCount: row.stackCount,
    lightestMassSquared: row.lightestMassSquared,
    tachyonic: row.tachyonic,
    supercharges: row.supercharges,
    forkedFromConfigurationId: row.forkedFromConfigurationId,
    author: { id: row.createdBy, name: authorName },
    createdAt: row.createdAt,
    updatedAt: row.updatedAt,
  };
}

function toRevisionSummary(
  revision: typeof revisions.$inferSelect,
  authorName: string,
  currentRevisionId: string | null,
  hasResult: boolean,
): RevisionSummaryDto {
  return {
    id: revision.id,
    configurationId: revision.configurationId,
    number: revision.number,
    message: revision.message,
    author: { id: revision.authorId, name: authorName },
    createdAt: revision.createdAt,
    isCurrent: revision.id === currentRevisionId,
    hasResult,
  };
}

function toResultDto(row: typeof results.$inferSelect): ResultDto {
  return {
    revisionId: row.revisionId,
    engineVersion: row.engineVersion,
    result: row.result,
    computeMs: row.computeMs,
    createdAt: row.createdAt,
  };
}
