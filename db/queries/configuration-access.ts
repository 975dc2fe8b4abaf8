import "server-only";
import { and, eq, isNull, sql, type Placeholder } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";
import { NotFoundError, ForbiddenError } from "../../lib/errors";
import { db, type Executor } from "../index";
import { configurations, groups, memberships, revisions, users, type ConfigurationRow, type GroupRole } from "../schema";
import { assertUuid, requireActor, roleAtLeast, type Actor } from "./actor";

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

/**
 * The configuration, its group, author and fork source, with the actor's membership in the group
 * and in the source's group, in one statement.
 */
function selectAccess(executor: Executor, configurationId: string | Placeholder, userId: string | Placeholder) {
  return executor
    .select({
      row: configurations,
      group: groups,
      authorName: users.name,
      memberRole: memberships.role,
      sourceTitle: sourceConfiguration.title,
      sourceIsStarter: sourceConfiguration.isStarter,
      sourceGroupKind: sourceGroup.kind,
      sourceMemberRole: sourceMembership.role,
      sourceRevisionNumber: sourceRevision.number,
    })
    .from(configurations)
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
 * plans this join once per connection instead of on every call. Transactions build the same query
 * on their own connection.
 */
const accessStatement = selectAccess(db, sql.placeholder("configurationId"), sql.placeholder("userId")).prepare("configuration_access");

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
  const [found] =
    executor === db
      ? await accessStatement.execute({ configurationId, userId: signedIn.id })
      : await selectAccess(executor, configurationId, signedIn.id);
  if (!found) throw new NotFoundError("No such configuration.");
  const admin = signedIn.siteRole === "admin";
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
