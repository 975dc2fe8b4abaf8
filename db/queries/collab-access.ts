import "server-only";
import { and, eq, isNull } from "drizzle-orm";
import { DomainError, NotFoundError } from "../../lib/errors";
import type { Executor } from "../index";
import { configurations, groups, type GroupKind, type GroupRole } from "../schema";
import { assertUuid, requireGroupRole, type Actor } from "./actor";

/** A configuration reached through its group, with the role the actor holds there. */
export interface ConfigurationAccess {
  configurationId: string;
  groupId: string;
  groupKind: GroupKind;
  currentRevisionId: string | null;
  isStarter: boolean;
  role: GroupRole;
}

/**
 * Loads a live configuration and checks the actor's role in its group.
 * Throws 401 without an actor, 404 when the configuration does not exist, was deleted or the
 * actor is not a member (existence does not leak), 403 when the role is below `minimum`.
 */
export async function requireConfigurationRole(
  executor: Executor,
  actor: Actor | null,
  configurationId: string,
  minimum: GroupRole,
): Promise<ConfigurationAccess> {
  assertUuid(configurationId, "configuration");
  const [row] = await executor
    .select({
      configurationId: configurations.id,
      groupId: configurations.groupId,
      groupKind: groups.kind,
      currentRevisionId: configurations.currentRevisionId,
      isStarter: configurations.isStarter,
    })
    .from(configurations)
    .innerJoin(groups, eq(groups.id, configurations.groupId))
    .where(and(eq(configurations.id, configurationId), isNull(configurations.deletedAt), isNull(groups.deletedAt)))
    .limit(1);
  if (!row) throw new NotFoundError("No such configuration.");
  const role = await requireGroupRole(executor, actor, row.groupId, minimum, "configuration");
  return { ...row, role };
}

/**
 * A request that conflicts with the current state of a collaboration record (409), e.g. an
 * expired invitation or removing a group's last owner. `code` says which rule was hit.
 */
export class CollaborationConflictError extends DomainError {
  readonly status = 409;
  constructor(
    readonly code:
      | "invitation_expired"
      | "invitation_revoked"
      | "invitation_used"
      | "invitation_wrong_account"
      | "account_exists"
      | "last_owner"
      | "already_member"
      | "personal_group",
    message: string,
  ) {
    super(message);
    this.name = "CollaborationConflictError";
  }
}
