import "server-only";
import { and, desc, eq, isNull, lt, sql } from "drizzle-orm";
import { db } from "../index";
import { auditLog, configurations, users } from "../schema";
import { assertUuid, requireGroupRole, type Actor } from "./actor";

/**
 * The configuration an entry is about: its entity for configuration entries, the recorded
 * `configurationId` for comments, attachments and share links.
 */
export const entryConfigurationId = sql`coalesce(case when ${auditLog.entityType} = 'configuration' then ${auditLog.entityId} end, (${auditLog.details} ->> 'configurationId')::uuid)`;

/** One row of a group's audit log. */
export interface AuditLogEntryDto {
  id: string;
  action: string;
  entityType: string;
  entityId: string | null;
  actorName: string | null;
  /** Title of the configuration the entry is about, while it exists (deleted ones keep theirs in `details`). */
  configurationTitle: string | null;
  details: Record<string, unknown>;
  createdAt: Date;
}

export interface ListAuditLogOptions {
  /** Page size (1..200, default 100). */
  limit?: number;
  /** Only entries strictly older than this (keyset pagination). */
  before?: Date;
}

/** A group's audit log, newest first. Owners of the group (and site admins) only. */
export async function listAuditLog(
  actor: Actor | null,
  groupId: string,
  options: ListAuditLogOptions = {},
): Promise<AuditLogEntryDto[]> {
  assertUuid(groupId, "group");
  await requireGroupRole(db, actor, groupId, "owner");
  const limit = Math.min(200, Math.max(1, options.limit ?? 100));
  return db
    .select({
      id: auditLog.id,
      action: auditLog.action,
      entityType: auditLog.entityType,
      entityId: auditLog.entityId,
      actorName: users.name,
      configurationTitle: configurations.title,
      details: auditLog.details,
      createdAt: auditLog.createdAt,
    })
    .from(auditLog)
    .leftJoin(users, eq(users.id, auditLog.actorId))
    .leftJoin(configurations, and(eq(configurations.id, entryConfigurationId), eq(configurations.groupId, groupId), isNull(configurations.deletedAt)))
    .where(and(eq(auditLog.groupId, groupId), options.before ? lt(auditLog.createdAt, options.before) : undefined))
    .orderBy(desc(auditLog.createdAt))
    .limit(limit);
}
