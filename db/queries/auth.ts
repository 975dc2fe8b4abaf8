import "server-only";
import { and, desc, eq, isNull, ne, or } from "drizzle-orm";
import { entryConfigurationId } from "./audit-log";
import { db } from "../index";
import { auditLog, configurations, groups, memberships, users, type GroupKind } from "../schema";
import { requireActor, type Actor } from "./actor";

/** One entry of the signed-in user's own recent activity. */
export interface ActivityDto {
  id: string;
  /** Dotted verb from the audit log, e.g. "configuration.update". */
  action: string;
  /** The entry's recorded details (version numbers, e-mail addresses, file names). */
  details: Record<string, unknown>;
  group: { slug: string; name: string; kind: GroupKind };
  /** The configuration the entry is about, when it still exists. */
  configuration: { id: string; title: string } | null;
  /** Who did it when it was someone else (another member forking the actor's configuration), else null. */
  otherActorName: string | null;
  createdAt: Date;
}

/** Options of `listRecentActivityForUser`. */
export interface ListRecentActivityOptions {
  /** Number of entries (1..50, default 10). */
  limit?: number;
}

/**
 * The actor's own writes in groups they still belong to, and other people's forks of the
 * configurations the actor created, newest first. Entries in groups the actor has left are
 * omitted, so nothing about those groups leaks; account-level events are left out.
 */
export async function listRecentActivityForUser(
  actor: Actor | null,
  options: ListRecentActivityOptions = {},
): Promise<ActivityDto[]> {
  const signedIn = requireActor(actor);
  const limit = Math.min(50, Math.max(1, options.limit ?? 10));
  const rows = await db
    .select({
      id: auditLog.id,
      action: auditLog.action,
      details: auditLog.details,
      groupSlug: groups.slug,
      groupName: groups.name,
      groupKind: groups.kind,
      configurationId: configurations.id,
      configurationTitle: configurations.title,
      actorId: auditLog.actorId,
      actorName: users.name,
      createdAt: auditLog.createdAt,
    })
    .from(auditLog)
    .innerJoin(groups, and(eq(groups.id, auditLog.groupId), isNull(groups.deletedAt)))
    .innerJoin(memberships, and(eq(memberships.groupId, groups.id), eq(memberships.userId, signedIn.id)))
    .leftJoin(
      configurations,
      and(
        eq(configurations.id, entryConfigurationId),
        eq(configurations.groupId, groups.id),
        isNull(configurations.deletedAt),
      ),
    )
    .leftJoin(users, eq(users.id, auditLog.actorId))
    .where(
      or(
        // One's own fork shows once, as the new configuration in the space it went to.
        and(eq(auditLog.actorId, signedIn.id), ne(auditLog.action, "configuration.forked")),
        and(eq(auditLog.action, "configuration.forked"), eq(configurations.createdBy, signedIn.id), ne(auditLog.actorId, signedIn.id)),
      ),
    )
    .orderBy(desc(auditLog.createdAt))
    .limit(limit);

  return rows.map((row) => ({
    id: row.id,
    action: row.action,
    details: row.details,
    group: { slug: row.groupSlug, name: row.groupName, kind: row.groupKind },
    configuration: row.configurationId && row.configurationTitle ? { id: row.configurationId, title: row.configurationTitle } : null,
    otherActorName: row.actorId === signedIn.id ? null : (row.actorName ?? "Someone"),
    createdAt: row.createdAt,
  }));
}
