import "server-only";
import { and, eq, isNull, sql, type Placeholder } from "drizzle-orm";
import { ForbiddenError, NotFoundError, UnauthenticatedError } from "../../lib/errors";
import { db, type Executor } from "../index";
import { checkTicket, rememberActor, rememberedActor } from "../session-cache";
import { groups, memberships, sessions, users, type GroupRole, type SiteRole } from "../schema";

/** The signed-in user acting on the data, as carried by the session. */
export interface Actor {
  id: string;
  email: string;
  name: string;
  siteRole: SiteRole;
  /** The session (browser or device) the request came with, when it came with one. */
  sessionId?: string;
}

/** Group roles from weakest to strongest. */
const roleRank: Record<GroupRole, number> = { viewer: 1, editor: 2, owner: 3 };

/** True when `role` grants at least what `minimum` grants. */
export function roleAtLeast(role: GroupRole | null, minimum: GroupRole): boolean {
  return role !== null && roleRank[role] >= roleRank[minimum];
}

/** True for a site administrator. */
export function isSiteAdmin(actor: Actor | null): boolean {
  return actor?.siteRole === "admin";
}

/** Returns the actor, or throws UnauthenticatedError when nobody is signed in. */
export function requireActor(actor: Actor | null): Actor {
  if (!actor) throw new UnauthenticatedError();
  return actor;
}

/** Returns the actor when it is a site admin; otherwise throws (401 without a session, 403 otherwise). */
export function requireSiteAdmin(actor: Actor | null): Actor {
  const signedIn = requireActor(actor);
  if (signedIn.siteRole !== "admin") throw new ForbiddenError("Only site administrators can do this.");
  return signedIn;
}

/**
 * The actor's effective role in a (non-deleted) group, or null when the actor may not see it.
 * Site admins act as owners of every group; a personal group's user is its owner through
 * the membership created with the account.
 */
export async function getGroupRole(
  executor: Executor,
  actor: Actor | null,
  groupId: string,
): Promise<GroupRole | null> {
  if (!actor) return null;
  const [row] =
    executor === db
      ? await groupRoleStatement.execute({ groupId, userId: actor.id })
      : await selectGroupRole(executor, groupId, actor.id);
  if (!row) return null;
  if (actor.siteRole === "admin") return "owner";
  return row.role;
}

/**
 * Checks that the actor holds at least `minimum` in the group and returns the role held.
 * Throws UnauthenticatedError without an actor, NotFoundError when the actor is not a member
 * (so the group's existence does not leak) and ForbiddenError when the role is too weak.
 */
export async function requireGroupRole(
  executor: Executor,
  actor: Actor | null,
  groupId: string,
  minimum: GroupRole,
  what = "group",
): Promise<GroupRole> {
  const signedIn = requireActor(actor);
  const role = await getGroupRole(executor, signedIn, groupId);
  if (!role) throw new NotFoundError(`No such ${what}.`);
  if (!roleAtLeast(role, minimum)) {
    throw new ForbiddenError(
      minimum === "owner"
        ? "Only the group's owners can do this."
        : "You can view this group but not change it.",
    );
  }
  return role;
}

/**
 * Loads the Actor of a session token's user and session id, or null when the session was revoked
 * (signed out, a password change or reset) or the account is gone. This is how every request
 * obtains its actor: one prepared query, or the answer this process remembers from a check a few
 * seconds ago while it hears every change to sessions and accounts (db/session-cache.ts). The
 * actor is frozen, since requests may share it.
 */
export async function getActorForSession(userId: string, sessionId: string): Promise<Actor | null> {
  if (!isUuid(userId) || !isUuid(sessionId)) return null;
  const remembered = rememberedActor(userId, sessionId);
  if (remembered) return remembered;
  const ticket = checkTicket();
  const [row] = await actorBySessionStatement.execute({ userId, sessionId });
  return row ? rememberActor(ticket, userId, sessionId, { ...row, sessionId }) : null;
}

// Prepared statements for the lookups made on nearly every request: PostgreSQL parses and plans
// them once per connection instead of on every call. Inside a transaction the same query is built
// on the transaction instead, since a prepared statement runs on a pool connection of its own.

function selectGroupRole(executor: Executor, groupId: string | Placeholder, userId: string | Placeholder) {
  return executor
    .select({ role: memberships.role })
    .from(groups)
    .leftJoin(memberships, and(eq(memberships.groupId, groups.id), eq(memberships.userId, userId)))
    .where(and(eq(groups.id, groupId), isNull(groups.deletedAt)))
    .limit(1);
}

const groupRoleStatement = selectGroupRole(db, sql.placeholder("groupId"), sql.placeholder("userId")).prepare("group_role");

const actorBySessionStatement = db
  .select({ id: users.id, email: users.email, name: users.name, siteRole: users.siteRole })
  .from(sessions)
  .innerJoin(users, eq(users.id, sessions.userId))
  .where(
    and(
      eq(sessions.id, sql.placeholder("sessionId")),
      eq(sessions.userId, sql.placeholder("userId")),
      isNull(sessions.revokedAt),
      isNull(users.deletedAt),
    ),
  )
  .limit(1)
  .prepare("actor_by_session");

const uuidPattern = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** True for a syntactically valid UUID; ids that fail this cannot name any row. */
export function isUuid(value: string): boolean {
  return uuidPattern.test(value);
}

/** Throws NotFoundError for a malformed id, so PostgreSQL never sees an invalid uuid. */
export function assertUuid(value: string, what: string): void {
  if (!isUuid(value)) throw new NotFoundError(`No such ${what}.`);
}
