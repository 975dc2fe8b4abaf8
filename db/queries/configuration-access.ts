import "server-only";
import { and, eq, isNull } from "drizzle-orm";
import { NotFoundError } from "../../lib/errors";
import type { Executor } from "../index";
import { configurations, groups, type ConfigurationRow, type GroupKind, type GroupRole } from "../schema";
import { assertUuid, requireActor, requireGroupRole, type Actor } from "./actor";

/** A live configuration reached through its group, with the role the actor holds there. */
export interface ConfigurationAccess {
  row: ConfigurationRow;
  groupKind: GroupKind;
  role: GroupRole;
}

/**
 * The one access check for a configuration: loads it (not deleted, in a group that is not deleted)
 * and checks the actor's role in its group. Throws 401 without an actor, 404 when the configuration
 * does not exist, was deleted or the actor is not a member (existence does not leak), 403 when the
 * role is below `minimum`.
 */
export async function requireConfigurationRole(
  executor: Executor,
  actor: Actor | null,
  configurationId: string,
  minimum: GroupRole,
): Promise<ConfigurationAccess> {
  requireActor(actor);
  assertUuid(configurationId, "configuration");
  const [found] = await executor
    .select({ row: configurations, groupKind: groups.kind })
    .from(configurations)
    .innerJoin(groups, eq(groups.id, configurations.groupId))
    .where(and(eq(configurations.id, configurationId), isNull(configurations.deletedAt), isNull(groups.deletedAt)))
    .limit(1);
  if (!found) throw new NotFoundError("No such configuration.");
  const role = await requireGroupRole(executor, actor, found.row.groupId, minimum, "configuration");
  return { row: found.row, groupKind: found.groupKind, role };
}
