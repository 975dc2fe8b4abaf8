import "server-only";
import { randomBytes } from "node:crypto";
import { and, asc, count, eq, isNull, sql } from "drizzle-orm";
import { ForbiddenError, NotFoundError, ValidationError } from "../../lib/errors";
import { db, type Executor } from "../index";
import {
  configurations,
  groups,
  memberships,
  users,
  type GroupKind,
  type GroupRole,
} from "../schema";
import {
  assertUuid,
  getGroupRole,
  isUuid,
  requireActor,
  requireGroupRole,
  type Actor,
} from "./actor";
import { recordAudit } from "./audit";

/** A group as the interface sees it, with the actor's role in it. */
export interface GroupDto {
  id: string;
  slug: string;
  name: string;
  description: string;
  kind: GroupKind;
  /** The actor's effective role (site admins act as owners). */
  role: GroupRole;
  createdAt: Date;
}

/** A row of the actor's group list. */
export interface GroupSummaryDto extends GroupDto {
  memberCount: number;
  configurationCount: number;
}

/** A row of a group's members table. */
export interface MemberDto {
  userId: string;
  name: string;
  email: string;
  role: GroupRole;
  joinedAt: Date;
}

/** The columns of a MemberDto (memberships joined with users). */
const memberColumns = {
  userId: users.id,
  name: users.name,
  email: users.email,
  role: memberships.role,
  joinedAt: memberships.createdAt,
};

/** Input of `createGroup`. Personal groups are created only with their account. */
export interface CreateGroupInput {
  name: string;
  kind: Exclude<GroupKind, "personal">;
  description?: string;
  /** Lowercase letters, digits and single hyphens; derived from the name when omitted. */
  slug?: string;
}

const slugPattern = /^[a-z0-9]+(?:-[a-z0-9]+)*$/;

/** Lowercase, hyphen-separated, ASCII-only form of `text` (at most 48 characters). */
export function toSlug(text: string): string {
  const slug = text
    .normalize("NFKD")
    .replace(/[\u0300-\u036f]/g, "")
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, "-")
    .replace(/^-+|-+$/g, "")
    .slice(0, 48)
    .replace(/-+$/g, "");
  return slug || "group";
}

/** Creates a research group or lab; the creator becomes its owner. */
export async function createGroup(actor: Actor | null, input: CreateGroupInput): Promise<GroupDto> {
  const creator = requireActor(actor);
  const name = input.name.trim();
  if (!name) throw ValidationError.at(["name"], "Give the group a name.");
  if (name.length > 120) throw ValidationError.at(["name"], "Use at most 120 characters.");
  if (input.kind !== "research" && input.kind !== "lab") {
    throw ValidationError.at(["kind"], "A group is either a research group or a lab.");
  }
  const slug = input.slug?.trim() || toSlug(name);
  if (!slugPattern.test(slug) || slug.length > 48) {
    throw ValidationError.at(
      ["slug"],
      "Use 1-48 lowercase letters, digits and single hyphens, e.g. brane-engineering.",
    );
  }

  return db.transaction(async (tx) => {
    const [group] = await tx
      .insert(groups)
      .values({ slug, name, description: input.description?.trim() ?? "", kind: input.kind })
      .onConflictDoNothing({ target: groups.slug })
      .returning();
    if (!group) throw ValidationError.at(["slug"], "This address is already taken; choose another.");
    await tx.insert(memberships).values({ groupId: group.id, userId: creator.id, role: "owner" });
    await recordAudit(tx, {
      actorId: creator.id,
      groupId: group.id,
      action: "group.create",
      entityType: "group",
      entityId: group.id,
      details: { slug, kind: input.kind },
    });
    return toGroupDto(group, "owner");
  });
}

/**
 * Creates the personal space of a new account, inside the account's transaction.
 * @internal used by `createUser`.
 */
export async function createPersonalGroup(
  executor: Executor,
  user: { id: string; name: string; email: string },
): Promise<{ id: string; slug: string }> {
  const base = toSlug(user.email.split("@")[0] ?? user.name);
  const slug = `${base.slice(0, 39)}-${randomBytes(4).toString("hex")}`;
  const [group] = await executor
    .insert(groups)
    .values({
      slug,
      name: `${user.name}'s space`,
      description: "Personal space",
      kind: "personal",
      personalUserId: user.id,
    })
    .returning({ id: groups.id, slug: groups.slug });
  if (!group) throw new Error("Personal group insert returned no row");
  await executor.insert(memberships).values({ groupId: group.id, userId: user.id, role: "owner" });
  return group;
}

/**
 * A group by its slug. Non-members get NotFoundError, so a group's existence does not leak; so
 * does text that cannot be a slug (it never reaches the database).
 */
export async function getGroupBySlug(actor: Actor | null, slug: string): Promise<GroupDto> {
  requireActor(actor);
  if (!slugPattern.test(slug.toLowerCase())) throw new NotFoundError("No such group.");
  const [group] = await db
    .select()
    .from(groups)
    .where(and(eq(groups.slug, slug.toLowerCase()), isNull(groups.deletedAt)))
    .limit(1);
  const role = group ? await getGroupRole(db, actor, group.id) : null;
  if (!group || !role) throw new NotFoundError("No such group.");
  return toGroupDto(group, role);
}

/** A group by id (viewer or better). */
export async function getGroup(actor: Actor | null, groupId: string): Promise<GroupDto> {
  requireActor(actor);
  assertUuid(groupId, "group");
  const role = await requireGroupRole(db, actor, groupId, "viewer");
  const [group] = await db.select().from(groups).where(eq(groups.id, groupId)).limit(1);
  if (!group) throw new NotFoundError("No such group.");
  return toGroupDto(group, role);
}

/** The actor's personal space. */
export async function getPersonalGroup(actor: Actor | null): Promise<GroupDto> {
  const signedIn = requireActor(actor);
  const [group] = await db
    .select()
    .from(groups)
    .where(and(eq(groups.personalUserId, signedIn.id), isNull(groups.deletedAt)))
    .limit(1);
  if (!group) throw new NotFoundError("No personal space for this account.");
  return toGroupDto(group, "owner");
}

/**
 * The groups the actor belongs to (personal space first, then by name), with member and
 * configuration counts. Filter on `role` for the groups the actor may write to.
 */
export async function listGroupsForUser(actor: Actor | null): Promise<GroupSummaryDto[]> {
  const signedIn = requireActor(actor);
  const memberCount = db
    .select({ groupId: memberships.groupId, n: count().as("member_n") })
    .from(memberships)
    .groupBy(memberships.groupId)
    .as("member_counts");
  const configurationCount = db
    .select({ groupId: configurations.groupId, n: count().as("configuration_n") })
    .from(configurations)
    .where(isNull(configurations.deletedAt))
    .groupBy(configurations.groupId)
    .as("configuration_counts");
  const rows = await db
    .select({
      group: groups,
      role: memberships.role,
      memberCount: sql<number>`coalesce(${memberCount.n}, 0)::int`,
      configurationCount: sql<number>`coalesce(${configurationCount.n}, 0)::int`,
    })
    .from(memberships)
    .innerJoin(groups, eq(groups.id, memberships.groupId))
    .leftJoin(memberCount, eq(memberCount.groupId, groups.id))
    .leftJoin(configurationCount, eq(configurationCount.groupId, groups.id))
    .where(and(eq(memberships.userId, signedIn.id), isNull(groups.deletedAt)))
    .orderBy(sql`${groups.kind} <> 'personal'`, asc(groups.name));
  return rows.map((row) => ({
    ...toGroupDto(row.group, row.role),
    memberCount: row.memberCount,
    configurationCount: row.configurationCount,
  }));
}

/** The members of a group (viewer or better), owners first. */
export async function listMembers(actor: Actor | null, groupId: string): Promise<MemberDto[]> {
  assertUuid(groupId, "group");
  await requireGroupRole(db, actor, groupId, "viewer");
  return db
    .select(memberColumns)
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(and(eq(memberships.groupId, groupId), isNull(users.deletedAt)))
    .orderBy(sql`case ${memberships.role} when 'owner' then 0 when 'editor' then 1 else 2 end`, asc(users.name));
}

/** The actor's effective role in a group, or null when the actor cannot see it. */
export async function getMembershipRole(
  actor: Actor | null,
  groupId: string,
): Promise<GroupRole | null> {
  if (!actor || !isUuid(groupId)) return null;
  return getGroupRole(db, actor, groupId);
}

/**
 * Changes a member's role (owners only). A group always keeps at least one owner, and a
 * personal space's owner cannot be changed.
 */
export async function setMemberRole(
  actor: Actor | null,
  groupId: string,
  userId: string,
  role: GroupRole,
): Promise<MemberDto> {
  assertUuid(groupId, "group");
  assertUuid(userId, "member");
  return db.transaction(async (tx) => {
    await requireGroupRole(tx, actor, groupId, "owner");
    const group = await lockGroup(tx, groupId);
    if (group.kind === "personal") throw new ForbiddenError("A personal space has exactly one member.");
    const [current] = await tx
      .select({ role: memberships.role })
      .from(memberships)
      .where(and(eq(memberships.groupId, groupId), eq(memberships.userId, userId)))
      .limit(1);
    if (!current) throw new NotFoundError("No such member.");
    if (current.role === "owner" && role !== "owner") await assertAnotherOwner(tx, groupId, userId);
    await tx
      .update(memberships)
      .set({ role })
      .where(and(eq(memberships.groupId, groupId), eq(memberships.userId, userId)));
    await recordAudit(tx, {
      actorId: actor?.id ?? null,
      groupId,
      action: "membership.role_change",
      entityType: "user",
      entityId: userId,
      details: { from: current.role, to: role },
    });
    const [member] = await tx
      .select(memberColumns)
      .from(memberships)
      .innerJoin(users, eq(users.id, memberships.userId))
      .where(and(eq(memberships.groupId, groupId), eq(memberships.userId, userId)));
    if (!member) throw new NotFoundError("No such member.");
    return member;
  });
}

/**
 * Removes a member: owners may remove anyone, any member may remove themselves (leave).
 * The last owner cannot leave or be removed; nobody leaves a personal space.
 */
export async function removeMember(
  actor: Actor | null,
  groupId: string,
  userId: string,
): Promise<void> {
  const signedIn = requireActor(actor);
  assertUuid(groupId, "group");
  assertUuid(userId, "member");
  await db.transaction(async (tx) => {
    await requireGroupRole(tx, actor, groupId, signedIn.id === userId ? "viewer" : "owner");
    const group = await lockGroup(tx, groupId);
    if (group.kind === "personal") throw new ForbiddenError("You cannot leave your personal space.");
    const [removed] = await tx
      .delete(memberships)
      .where(and(eq(memberships.groupId, groupId), eq(memberships.userId, userId)))
      .returning({ role: memberships.role });
    if (!removed) throw new NotFoundError("No such member.");
    if (removed.role === "owner") await assertAnotherOwner(tx, groupId, userId);
    await recordAudit(tx, {
      actorId: signedIn.id,
      groupId,
      action: signedIn.id === userId ? "membership.leave" : "membership.remove",
      entityType: "user",
      entityId: userId,
      details: { role: removed.role },
    });
  });
}

/** The actor leaves a group (see `removeMember`). */
export async function leaveGroup(actor: Actor | null, groupId: string): Promise<void> {
  await removeMember(actor, groupId, requireActor(actor).id);
}

/** Locks the group row so concurrent role changes cannot remove the last owner together. */
async function lockGroup(executor: Executor, groupId: string): Promise<{ kind: GroupKind }> {
  const [group] = await executor
    .select({ kind: groups.kind })
    .from(groups)
    .where(eq(groups.id, groupId))
    .for("update");
  if (!group) throw new NotFoundError("No such group.");
  return group;
}

async function assertAnotherOwner(executor: Executor, groupId: string, userId: string) {
  const [other] = await executor
    .select({ userId: memberships.userId })
    .from(memberships)
    .where(
      and(
        eq(memberships.groupId, groupId),
        eq(memberships.role, "owner"),
        sql`${memberships.userId} <> ${userId}`,
      ),
    )
    .limit(1);
  if (!other) {
    throw ValidationError.at(["role"], "A group needs at least one owner; make someone else owner first.");
  }
}


function toGroupDto(group: typeof groups.$inferSelect, role: GroupRole): GroupDto {
  return {
    id: group.id,
    slug: group.slug,
    name: group.name,
    description: group.description,
    kind: group.kind,
    role,
    createdAt: group.createdAt,
  };
}
