import "server-only";
import { and, eq, isNull, sql, type Placeholder } from "drizzle-orm";
import { alias, type PgSelect } from "drizzle-orm/pg-core";
import { NotFoundError, ForbiddenError } from "../../lib/errors";
import { db, type Executor } from "../index";
import { configurations, groups, memberships, results, revisions, users, type ConfigurationRow, type GroupRole } from "../schema";
import { assertUuid, requireActor, roleAtLeast, type Actor } from "./actor";
import { storedResultByHash, type StoredRow } from "./results";

/** Where a fork came from, as far as the reader may see it. */
export interface ForkSource {
  configurationId: string;
  revisionId: string | null;
  /** Null when the reader may not see the source (deleted, or in a group they are not in). */
  title: string | null;
  revisionNumber: number | null;
}

/** What a configuration's DTO shows besides its own row. */
export interface ConfigurationContext {
  group: typeof groups.$inferSelect;
  authorName: string;
  source: ForkSource | null;
}

/** A live configuration reached through its group, with the role the actor holds there. */
export interface ConfigurationAccess {
  row: ConfigurationRow;
  role: GroupRole;
  context: ConfigurationContext;
}

const sourceConfiguration = alias(configurations, "source_configuration");
const sourceGroup = alias(groups, "source_group");
const sourceMembership = alias(memberships, "source_membership");
const sourceRevision = alias(revisions, "source_revision");

/** What the access check reads. */
const accessColumns = {
  row: configurations,
  group: groups,
  authorName: users.name,
  memberRole: memberships.role,
  sourceTitle: sourceConfiguration.title,
  sourceIsStarter: sourceConfiguration.isStarter,
  sourceGroupKind: sourceGroup.kind,
  sourceMemberRole: sourceMembership.role,
  sourceRevisionNumber: sourceRevision.number,
};

/** The current revision's stored result, as text, for reads that send it along. */
const resultColumns = {
  resultText: sql<string | null>`${results.result}::text`,
  resultEngineVersion: results.engineVersion,
  resultComputeMs: results.computeMs,
  resultCreatedAt: results.createdAt,
};

/**
 * The configuration, its group, author and fork source, with the actor's membership in the group
 * and in the source's group, in one statement.
 */
function selectAccess(executor: Executor, configurationId: string | Placeholder, userId: string | Placeholder) {
  return withAccessJoins(executor.select(accessColumns).from(configurations).$dynamic(), configurationId, userId);
}

/** {@link selectAccess} with the current revision's stored result as text. */
function selectAccessWithResult(executor: Executor, configurationId: string | Placeholder, userId: string | Placeholder) {
  const query = executor
    .select({ ...accessColumns, ...resultColumns })
    .from(configurations)
    .leftJoin(results, eq(results.revisionId, configurations.currentRevisionId))
    .$dynamic();
  return withAccessJoins(query, configurationId, userId);
}

function withAccessJoins<TQuery extends PgSelect>(query: TQuery, configurationId: string | Placeholder, userId: string | Placeholder) {
  return query
    .innerJoin(groups, and(eq(groups.id, configurations.groupId), isNull(groups.deletedAt)))
    .innerJoin(users, eq(users.id, configurations.createdBy))
    .leftJoin(memberships, and(eq(memberships.groupId, configurations.groupId), eq(memberships.userId, userId)))
    .leftJoin(
      sourceConfiguration,
      and(eq(sourceConfiguration.id, configurations.forkedFromConfigurationId), isNull(sourceConfiguration.deletedAt)),
    )
    .leftJoin(sourceGroup, and(eq(sourceGroup.id, sourceConfiguration.groupId), isNull(sourceGroup.deletedAt)))
    .leftJoin(sourceMembership, and(eq(sourceMembership.groupId, sourceGroup.id), eq(sourceMembership.userId, userId)))
    .leftJoin(sourceRevision, eq(sourceRevision.id, configurations.forkedFromRevisionId))
    .where(and(eq(configurations.id, configurationId), isNull(configurations.deletedAt)))
    .limit(1);
}

/**
 * The access query prepared once: it runs on nearly every configuration request, and PostgreSQL
 * plans this join once per connection instead of on every call (planning it costs about 3 ms, far
 * more than running it). A transaction prepares the same statement, under the same name, on its own
 * connection (`prepareAccess`), so the access check inside a write (a delete, a restore, a fork) is
 * not planned afresh either.
 */
const accessStatement = prepareAccess(db);
function prepareAccess(executor: Executor) {
  return selectAccess(executor, sql.placeholder("configurationId"), sql.placeholder("userId")).prepare("configuration_access");
}
const accessWithResultStatement = selectAccessWithResult(db, sql.placeholder("configurationId"), sql.placeholder("userId")).prepare(
  "configuration_access_with_result",
);

/**
 * The one access check for a configuration, in one statement: loads it (not deleted, in a group
 * that is not deleted) with what its DTO shows, and the actor's effective role:
 * - a site admin acts as an owner;
 * - a member has their group role;
 * - the owners and editors of a lab read (as viewers) a student's fork of one of the lab's starter
 *   configurations, wherever the fork lives, so instructors can follow their students' work.
 * Throws 401 without an actor, 404 when the configuration does not exist, was deleted or the actor
 * may not see it (existence does not leak), 403 when the role is below `minimum`.
 */
export async function requireConfigurationRole(
  executor: Executor,
  actor: Actor | null,
  configurationId: string,
  minimum: GroupRole,
): Promise<ConfigurationAccess> {
  const signedIn = requireActor(actor);
  assertUuid(configurationId, "configuration");
  const [found] = await (executor === db ? accessStatement : prepareAccess(executor)).execute({ configurationId, userId: signedIn.id });
  return resolveAccess(found, signedIn, minimum);
}

/**
 * The save's access statement: {@link selectAccess} with the lookup of a stored result by the new
 * document's content hash (the reuse check of db/queries/results.ts), one round trip for both.
 */
const accessForSaveStatement = (() => {
  const stored = storedResultByHash(db, sql.placeholder("contentHash"));
  const query = db
    .select({ ...accessColumns, stored: { id: stored.id, lightest: stored.lightest, supercharges: stored.supercharges, tachyonic: stored.tachyonic } })
    .from(configurations)
    .leftJoin(stored, sql`true`)
    .$dynamic();
  return withAccessJoins(query, sql.placeholder("configurationId"), sql.placeholder("userId")).prepare("configuration_access_for_save");
})();

/**
 * {@link requireConfigurationRole} with the stored result of `contentHash`, if any, found in the
 * same statement (`stored` is null when no result has that hash).
 */
export async function requireConfigurationRoleWithStored(
  actor: Actor | null,
  configurationId: string,
  minimum: GroupRole,
  contentHash: string,
): Promise<ConfigurationAccess & { stored: StoredRow | null }> {
  const signedIn = requireActor(actor);
  assertUuid(configurationId, "configuration");
  const [found] = await accessForSaveStatement.execute({ configurationId, userId: signedIn.id, contentHash });
  const access = resolveAccess(found, signedIn, minimum);
  return { ...access, stored: found?.stored ?? null };
}

/** The current revision's stored result as JSON text, with when and by which engine it was computed. */
export interface StoredResultText {
  text: string;
  engineVersion: string;
  computeMs: number;
  createdAt: Date;
}

/**
 * {@link requireConfigurationRole} (viewer or better) with the current revision's stored result as
 * text, in the same statement; `result` is null before the first save.
 */
export async function readConfigurationWithResult(
  actor: Actor | null,
  configurationId: string,
): Promise<ConfigurationAccess & { result: StoredResultText | null }> {
  const signedIn = requireActor(actor);
  assertUuid(configurationId, "configuration");
  const [found] = await accessWithResultStatement.execute({ configurationId, userId: signedIn.id });
  const access = resolveAccess(found, signedIn, "viewer");
  const result =
    found?.resultText != null && found.resultEngineVersion !== null && found.resultComputeMs !== null && found.resultCreatedAt !== null
      ? { text: found.resultText, engineVersion: found.resultEngineVersion, computeMs: found.resultComputeMs, createdAt: found.resultCreatedAt }
      : null;
  return { ...access, result };
}

type AccessRow = Awaited<ReturnType<typeof selectAccess>>[number];

/** The effective role and DTO context of an access row (see {@link requireConfigurationRole}). */
function resolveAccess(found: AccessRow | undefined, actor: Actor, minimum: GroupRole): ConfigurationAccess {
  if (!found) throw new NotFoundError("No such configuration.");
  const admin = actor.siteRole === "admin";
  const instructor = found.sourceIsStarter === true && found.sourceGroupKind === "lab" && roleAtLeast(found.sourceMemberRole, "editor");
  const role: GroupRole | null = admin ? "owner" : (found.memberRole ?? (instructor ? "viewer" : null));
  if (!role) throw new NotFoundError("No such configuration.");
  if (!roleAtLeast(role, minimum)) {
    throw new ForbiddenError(minimum === "owner" ? "Only the group's owners can do this." : "You can view this configuration but not change it.");
  }
  const sourceVisible = found.sourceTitle !== null && found.sourceGroupKind !== null && (admin || found.sourceMemberRole !== null);
  const source: ForkSource | null = found.row.forkedFromConfigurationId
    ? {
        configurationId: found.row.forkedFromConfigurationId,
        revisionId: found.row.forkedFromRevisionId,
        title: sourceVisible ? found.sourceTitle : null,
        revisionNumber: sourceVisible ? found.sourceRevisionNumber : null,
      }
    : null;
  return { row: found.row, role, context: { group: found.group, authorName: found.authorName, source } };
}

/**
 * Whether a configuration exists (not deleted, in a group that is not deleted) even though the
 * actor was refused it. Only for pages, which answer 403 rather than 404 to a signed-in reader who
 * holds the link to something they may not see; the API keeps answering 404 so that programs
 * cannot probe for ids.
 */
export async function configurationExistsForSignedIn(actor: Actor | null, configurationId: string): Promise<boolean> {
  requireActor(actor);
  assertUuid(configurationId, "configuration");
  const [found] = await db
    .select({ id: configurations.id })
    .from(configurations)
    .innerJoin(groups, and(eq(groups.id, configurations.groupId), isNull(groups.deletedAt)))
    .where(and(eq(configurations.id, configurationId), isNull(configurations.deletedAt)))
    .limit(1);
  return found !== undefined;
}
