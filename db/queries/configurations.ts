import "server-only";
import { randomUUID } from "node:crypto";
import { and, asc, count, eq, ilike, inArray, isNull, sql, type SQL } from "drizzle-orm";
import type { Configuration } from "../../lib/boundary/types";
import { parseConfigurationFileBytes } from "../../lib/validations/import";
import { ConflictError, ForbiddenError, NotFoundError, ValidationError } from "../../lib/errors";
import { db } from "../index";
import { preparedSql } from "../prepared-sql";
import { auditLog, configurations, groups, memberships, results, revisions, shareLinks, users, type GroupRole } from "../schema";
import { assertUuid, requireActor, requireGroupRole, type Actor } from "./actor";
import { recordAudit } from "./audit";
import { getPersonalGroup } from "./groups";
import { requireConfigurationRole, requireConfigurationRoleWithStored } from "./configuration-access";
import {
  toConfigurationDto,
  toSummary,
  type ConfigurationDto,
  type ConfigurationPage,
  type ListConfigurationsOptions,
} from "./configuration-dtos";
import { hashDocument, resultForDocument, type RevisionResult } from "./results";
import { addRevision, documentColumns } from "./revision-writes";

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

/** One configuration with its current document (viewer or better). */
export async function getConfiguration(
  actor: Actor | null,
  configurationId: string,
): Promise<ConfigurationDto> {
  const { row, role, context } = await requireConfigurationRole(db, actor, configurationId, "viewer");
  return toConfigurationDto(row, context, role);
}

/**
 * Creates a configuration in a group (editor or better) with revision 1 and its result, in one
 * transaction. Title, description and theory come from the document; the server computes the result.
 */
export async function createConfiguration(
  actor: Actor | null,
  groupId: string,
  document: Configuration,
  message: string,
  options: CreateConfigurationOptions = {},
): Promise<ConfigurationDto> {
  requireActor(actor);
  assertUuid(groupId, "group");
  return insertConfiguration(actor, groupId, document, message, await resultForDocument(db, document), options);
}

/** Input of `importConfiguration`: a configuration file as uploaded. */
export interface ImportConfigurationInput {
  /** The receiving group; the actor's personal space when omitted. */
  groupId?: string;
  fileName: string;
  /** The file's bytes, judged by their content (UTF-8 JSON is expected). */
  bytes: Uint8Array;
}

/**
 * Creates a configuration from a configuration file (editor or better in the group).
 * Every problem of the file is reported at once with its JSON path inside the file (422), and
 * nothing is saved from an invalid file.
 */
export async function importConfiguration(actor: Actor | null, input: ImportConfigurationInput): Promise<ConfigurationDto> {
  const signedIn = requireActor(actor);
  if (input.groupId !== undefined) assertUuid(input.groupId, "group");
  const document = parseConfigurationFileBytes(input.bytes);
  const computed = await resultForDocument(db, document, { problemsAt: [] });
  const groupId = input.groupId ?? (await getPersonalGroup(signedIn)).id;
  return insertConfiguration(actor, groupId, document, `Imported from ${input.fileName || "a file"}`, computed, {});
}

async function insertConfiguration(
  actor: Actor | null,
  groupId: string,
  document: Configuration,
  message: string,
  computed: RevisionResult,
  options: CreateConfigurationOptions,
): Promise<ConfigurationDto> {
  const author = requireActor(actor);
  const columns = documentColumns(document, computed.summary);
  return db.transaction(async (tx) => {
    const role = await requireGroupRole(tx, actor, groupId, "editor");
    const [group] = await tx.select().from(groups).where(eq(groups.id, groupId));
    if (!group) throw new NotFoundError("No such group.");
    if (options.isStarter) assertCanPublishStarter(group, role);
    const [created] = await tx
      .insert(configurations)
      .values({ groupId, ...columns, version: 1, isStarter: options.isStarter ?? false, createdBy: author.id })
      .returning();
    if (!created) throw new Error("Configuration insert returned no row");
    const row = await addRevision(tx, created, author.id, message, computed);
    await recordAudit(tx, {
      actorId: author.id,
      groupId,
      action: "configuration.create",
      entityType: "configuration",
      entityId: created.id,
      details: { title: columns.title, isStarter: created.isStarter },
    });
    return toConfigurationDto(row, { group, authorName: author.name, source: null }, role);
  });
}

/**
 * Saves a new revision (editor or better) with a result the server computes. The update only
 * applies when the stored version equals `expectedVersion`; otherwise ConflictError (with the
 * current version) and nothing is written, so concurrent saves never overwrite each other.
 *
 * The access check (404, 403) and a stale version (409) are answered before anything is computed.
 * The write is then one statement (see `saveRevision`), which checks the role and the version
 * again: the new revision, its result, the configuration's new columns and the audit entry land
 * together or not at all, and nothing runs after it commits, so an answered error always means
 * nothing was saved. When it writes nothing (someone saved, deleted or changed the author's role
 * in between) the reason is looked up afresh.
 */
export async function updateConfiguration(
  actor: Actor | null,
  configurationId: string,
  input: UpdateConfigurationInput,
): Promise<ConfigurationDto> {
  const author = requireActor(actor);
  assertUuid(configurationId, "configuration");
  assertExpectedVersion(input.expectedVersion);
  // The access check and the lookup of a stored result with the same content, in one statement.
  const contentHash = hashDocument(input.document);
  const { stored, ...access } = await requireConfigurationRoleWithStored(actor, configurationId, "editor", contentHash);
  if (access.row.version !== input.expectedVersion) throw new ConflictError(access.row.version);
  const computed = await resultForDocument(db, input.document, { byHash: { contentHash, stored } });
  const columns = documentColumns(input.document, computed.summary);
  const revisionId = randomUUID();
  let saved: SavedRevision | undefined;
  try {
    [saved] = await saveRevision(computed)({
      revisionId,
      configurationId,
      expectedVersion: input.expectedVersion,
      authorId: author.id,
      authorIsAdmin: author.siteRole === "admin",
      message: input.message.trim(),
      document: JSON.stringify(columns.document),
      title: columns.title,
      description: columns.description,
      theory: columns.theory,
      stackCount: columns.stackCount,
      lightestMassSquared: columns.lightestMassSquared,
      tachyonic: columns.tachyonic,
      supercharges: columns.supercharges,
      ...resultValues(computed),
    });
  } catch (error) {
    // Two saves from the same version: the later one meets the earlier one's revision number.
    if (!isUniqueViolation(error)) throw error;
  }
  if (!saved) {
    const current = await requireConfigurationRole(db, actor, configurationId, "editor");
    throw new ConflictError(current.row.version);
  }
  const row = { ...access.row, ...columns, version: saved.version, currentRevisionId: revisionId, updatedAt: saved.updated_at };
  return toConfigurationDto(row, access.context, access.role);
}

/** Refuses an `expectedVersion` that is not a positive whole number (422). */
function assertExpectedVersion(expectedVersion: number): void {
  if (!Number.isInteger(expectedVersion) || expectedVersion < 1) {
    throw ValidationError.at(["expectedVersion"], "expectedVersion must be a positive whole number.");
  }
}

/** What the save statement returns: the configuration's new version and when it was written. */
interface SavedRevision {
  version: number;
  updated_at: Date;
}

/** The save statement's result inputs: a fresh result's JSON, or the stored result to copy. */
function resultValues(result: RevisionResult): Record<string, unknown> {
  return result.source === "fresh"
    ? {
        engineVersion: result.engineVersion,
        contentHash: result.contentHash,
        resultJson: result.json,
        overviewJson: result.overviewJson,
        computeMs: result.computeMs,
      }
    : { resultId: result.resultId };
}

/**
 * The save as one statement of data-modifying CTEs, prepared once per result source: the revision
 * (numbered expected + 1) is inserted only where the configuration is live, in a live group, at the
 * expected version, and the author may edit it (editor, owner or site admin); its result, the
 * configuration's update (which again requires the expected version) and the audit entry follow
 * from it. Returns the new version, or no row when nothing was written. A concurrent save from the
 * same version fails on the revision's unique number (23505) and writes nothing.
 */
function saveRevision(result: RevisionResult) {
  return result.source === "fresh" ? saveFreshRevision : saveReusedRevision;
}

function saveRevisionStatement(storeResult: SQL): SQL {
  const p = sql.placeholder;
  return sql`
    with rev as (
      insert into ${revisions} (id, configuration_id, number, document, author_id, message)
      select ${p("revisionId")}::uuid, c.id, c.version + 1, ${p("document")}::jsonb, ${p("authorId")}::uuid, ${p("message")}::text
      from ${configurations} c
      join ${groups} g on g.id = c.group_id and g.deleted_at is null
      where c.id = ${p("configurationId")}::uuid and c.version = ${p("expectedVersion")}::int and c.deleted_at is null
        and (${p("authorIsAdmin")}::boolean or exists (
          select 1 from ${memberships} m
          where m.group_id = c.group_id and m.user_id = ${p("authorId")}::uuid and m.role in ('editor', 'owner')))
      returning id, configuration_id, number
    ),
    res as (
      insert into ${results} (revision_id, engine_version, content_hash, result, overview, compute_ms)
      ${storeResult}
    ),
    upd as (
      update ${configurations} c
      set title = ${p("title")}::text, description = ${p("description")}::text, theory = ${p("theory")},
          document = ${p("document")}::jsonb, stack_count = ${p("stackCount")}::int,
          lightest_mass_squared = ${p("lightestMassSquared")}::double precision, tachyonic = ${p("tachyonic")}::boolean,
          supercharges = ${p("supercharges")}::int, version = rev.number, current_revision_id = rev.id, updated_at = now()
      from rev
      where c.id = rev.configuration_id and c.version = ${p("expectedVersion")}::int
      returning c.id, c.group_id, c.version, c.updated_at
    ),
    aud as (
      insert into ${auditLog} (actor_id, group_id, action, entity_type, entity_id, details)
      select ${p("authorId")}::uuid, upd.group_id, 'configuration.update', 'configuration', upd.id, jsonb_build_object('version', upd.version)
      from upd
    )
    select version, updated_at from upd`;
}

const saveFreshRevision = preparedSql<SavedRevision>(
  "save_revision_fresh",
  saveRevisionStatement(
    sql`select rev.id, ${sql.placeholder("engineVersion")}::text, ${sql.placeholder("contentHash")}::text, ${sql.placeholder("resultJson")}::json, ${sql.placeholder("overviewJson")}::json, ${sql.placeholder("computeMs")}::double precision from rev`,
  ),
);

const saveReusedRevision = preparedSql<SavedRevision>(
  "save_revision_reused",
  saveRevisionStatement(
    sql`select rev.id, s.engine_version, s.content_hash, s.result, s.overview, s.compute_ms from rev, ${results} s where s.id = ${sql.placeholder("resultId")}::uuid`,
  ),
);

/** PostgreSQL's unique_violation (23505). */
function isUniqueViolation(error: unknown): boolean {
  for (let current = error, depth = 0; current && typeof current === "object" && depth < 5; depth += 1) {
    if ("code" in current && current.code === "23505") return true;
    current = "cause" in current ? current.cause : undefined;
  }
  return false;
}

/**
 * Moves a configuration to the bin (editor or better); `undeleteConfiguration` brings it back. Its
 * share links are revoked with it and stay revoked after an undelete: a link someone handed out
 * for the old configuration should not start working again without anyone deciding so.
 */
export async function softDeleteConfiguration(actor: Actor | null, configurationId: string): Promise<void> {
  const signedIn = requireActor(actor);
  await db.transaction(async (tx) => {
    const { row } = await requireConfigurationRole(tx, actor, configurationId, "editor");
    const now = new Date();
    await tx
      .update(configurations)
      .set({ deletedAt: now })
      .where(and(eq(configurations.id, row.id), isNull(configurations.deletedAt)));
    const revoked = await tx
      .update(shareLinks)
      .set({ revokedAt: now })
      .where(and(eq(shareLinks.configurationId, row.id), isNull(shareLinks.revokedAt)))
      .returning({ id: shareLinks.id });
    await recordAudit(tx, {
      actorId: signedIn.id,
      groupId: row.groupId,
      action: "configuration.delete",
      entityType: "configuration",
      entityId: row.id,
      details: { title: row.title, revokedShareLinks: revoked.length },
    });
  });
}

/** Restores a soft-deleted configuration (editor or better in its group); its share links stay revoked. */
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
    await requireGroupRole(tx, actor, row.groupId, "editor", "configuration");
    await tx.update(configurations).set({ deletedAt: null }).where(eq(configurations.id, configurationId));
    await recordAudit(tx, {
      actorId: signedIn.id,
      groupId: row.groupId,
      action: "configuration.undelete",
      entityType: "configuration",
      entityId: row.id,
    });
    const restored = await requireConfigurationRole(tx, actor, configurationId, "editor");
    return toConfigurationDto(restored.row, restored.context, restored.role);
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
    const { row, role, context } = await requireConfigurationRole(tx, actor, configurationId, "owner");
    if (isStarter) assertCanPublishStarter(context.group, role);
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
    return toConfigurationDto(updated, context, role);
  });
}

function assertCanPublishStarter(group: Pick<typeof groups.$inferSelect, "kind">, role: GroupRole) {
  if (group.kind !== "lab") throw ValidationError.at(["isStarter"], "Only lab groups publish starter configurations.");
  if (role !== "owner") throw new ForbiddenError("Only the lab's owners publish starter configurations.");
}

const sortColumns = {
  updated: configurations.updatedAt,
  created: configurations.createdAt,
  title: configurations.title,
  lightest: configurations.lightestMassSquared,
  stacks: configurations.stackCount,
} as const;

/** One page of live configurations in live groups matching `scope`, for the list functions here and in forks.ts. */
export async function listConfigurations(
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

