import "server-only";
import { and, desc, eq, gt, isNull, sql } from "drizzle-orm";
import { NotFoundError, ValidationError } from "../../lib/errors";
import { createSecureToken, hashSecureToken } from "../../lib/server/secure-token";
import type { CreateInvitationInput } from "../../lib/validations/invitation";
import { db, type Executor } from "../index";
import { groups, invitations, memberships, users, type GroupRole, type InvitationRow } from "../schema";
import { assertUuid, requireActor, requireGroupRole, type Actor } from "./actor";
import { recordAudit } from "./audit";
import { CollaborationConflictError } from "./collaboration-errors";
import { createUser } from "./users";

/** How long an invitation link works, in days. */
export const invitationLifetimeDays = 7;

export type InvitationStatus = "pending" | "accepted" | "revoked" | "expired";

/** One invitation as the owner's invitations panel shows it (never the token). */
export interface InvitationDto {
  id: string;
  email: string;
  role: GroupRole;
  status: InvitationStatus;
  invitedByName: string;
  expiresAt: Date;
  createdAt: Date;
  acceptedAt: Date | null;
}

/** What the invitation page shows to whoever holds the link. */
export interface InvitationPreviewDto {
  status: InvitationStatus;
  email: string;
  role: GroupRole;
  groupName: string;
  groupSlug: string;
  groupKind: "research" | "lab" | "personal";
  invitedByName: string;
  expiresAt: Date;
  /** True when an account with the invited e-mail exists (the page offers sign-in, not sign-up). */
  accountExists: boolean;
}

/** A freshly created or re-sent invitation with the plain token, which exists only here and in the e-mail. */
export interface IssuedInvitation {
  invitation: InvitationDto;
  token: string;
  groupName: string;
  invitedByName: string;
}

/**
 * Invites an e-mail address into a group. Owners only; personal spaces take no invitations.
 * A pending invitation to the same address is revoked and replaced, so only the newest link works.
 */
export async function createInvitation(
  actor: Actor | null,
  groupId: string,
  input: CreateInvitationInput,
  now: Date = new Date(),
): Promise<IssuedInvitation> {
  assertUuid(groupId, "group");
  const signedIn = requireActor(actor);
  return db.transaction(async (tx) => {
    // Invitations of one e-mail to one group run one at a time, so the newest always retires the
    // others (without the lock, simultaneous requests would each see no pending one and all insert).
    await tx.execute(sql`select pg_advisory_xact_lock(hashtext(${`invitation:${groupId}:${input.email}`}))`);
    await requireGroupRole(tx, signedIn, groupId, "owner");
    const group = await loadGroup(tx, groupId);
    if (group.kind === "personal") {
      throw new CollaborationConflictError("personal_group", "A personal space cannot have other members.");
    }
    const [member] = await tx
      .select({ id: memberships.id })
      .from(memberships)
      .innerJoin(users, eq(users.id, memberships.userId))
      .where(and(eq(memberships.groupId, groupId), eq(users.email, input.email)))
      .limit(1);
    if (member) throw ValidationError.at(["email"], "This person is already a member of the group.");

    await tx
      .update(invitations)
      .set({ revokedAt: now })
      .where(and(eq(invitations.groupId, groupId), eq(invitations.email, input.email), pendingAt(now)));

    const token = createSecureToken();
    const [row] = await tx
      .insert(invitations)
      .values({
        groupId,
        email: input.email,
        role: input.role,
        tokenHash: hashSecureToken(token),
        invitedBy: signedIn.id,
        expiresAt: addDays(now, invitationLifetimeDays),
        createdAt: now,
      })
      .returning();
    if (!row) throw new Error("Invitation insert returned no row.");
    await recordAudit(tx, {
      actorId: signedIn.id,
      groupId,
      action: "invitation.create",
      entityType: "invitation",
      entityId: row.id,
      details: { email: input.email, role: input.role },
    });
    return { invitation: toDto(row, signedIn.name, now), token, groupName: group.name, invitedByName: signedIn.name };
  });
}

/**
 * Sends a pending invitation again with a new link and a fresh expiry; the old link stops working.
 * Owners only. Accepted or revoked invitations cannot be re-sent (409); an expired one can.
 */
export async function resendInvitation(
  actor: Actor | null,
  invitationId: string,
  now: Date = new Date(),
): Promise<IssuedInvitation> {
  assertUuid(invitationId, "invitation");
  const signedIn = requireActor(actor);
  return db.transaction(async (tx) => {
    const existing = await loadInvitationForOwner(tx, signedIn, invitationId);
    if (existing.acceptedAt) throw new CollaborationConflictError("invitation_used", "This invitation was already accepted.");
    if (existing.revokedAt) throw new CollaborationConflictError("invitation_revoked", "This invitation was revoked; invite again instead.");
    const token = createSecureToken();
    const [row] = await tx
      .update(invitations)
      .set({ tokenHash: hashSecureToken(token), expiresAt: addDays(now, invitationLifetimeDays) })
      .where(eq(invitations.id, invitationId))
      .returning();
    if (!row) throw new NotFoundError("No such invitation.");
    const group = await loadGroup(tx, row.groupId);
    await recordAudit(tx, {
      actorId: signedIn.id,
      groupId: row.groupId,
      action: "invitation.resend",
      entityType: "invitation",
      entityId: row.id,
      details: { email: row.email },
    });
    const inviter = await inviterName(tx, row.invitedBy);
    return { invitation: toDto(row, inviter, now), token, groupName: group.name, invitedByName: signedIn.name };
  });
}

/** Revokes an invitation so its link stops working. Owners only; accepted invitations cannot be revoked (409). */
export async function revokeInvitation(actor: Actor | null, invitationId: string, now: Date = new Date()): Promise<InvitationDto> {
  assertUuid(invitationId, "invitation");
  const signedIn = requireActor(actor);
  return db.transaction(async (tx) => {
    const existing = await loadInvitationForOwner(tx, signedIn, invitationId);
    if (existing.acceptedAt) throw new CollaborationConflictError("invitation_used", "This invitation was already accepted; remove the member instead.");
    const [row] = await tx
      .update(invitations)
      .set({ revokedAt: existing.revokedAt ?? now })
      .where(eq(invitations.id, invitationId))
      .returning();
    if (!row) throw new NotFoundError("No such invitation.");
    if (!existing.revokedAt) {
      await recordAudit(tx, {
        actorId: signedIn.id,
        groupId: row.groupId,
        action: "invitation.revoke",
        entityType: "invitation",
        entityId: row.id,
        details: { email: row.email },
      });
    }
    return toDto(row, await inviterName(tx, row.invitedBy), now);
  });
}

/** A group's invitations, newest first (pending, accepted, revoked and expired). Owners only. */
export async function listInvitations(actor: Actor | null, groupId: string, now: Date = new Date()): Promise<InvitationDto[]> {
  assertUuid(groupId, "group");
  await requireGroupRole(db, actor, groupId, "owner");
  const rows = await db
    .select({ invitation: invitations, inviter: users.name })
    .from(invitations)
    .innerJoin(users, eq(users.id, invitations.invitedBy))
    .where(eq(invitations.groupId, groupId))
    .orderBy(desc(invitations.createdAt))
    .limit(200);
  return rows.map((row) => toDto(row.invitation, row.inviter, now));
}

/**
 * What an invitation link leads to. Holding the token is the authorization; an unknown token is
 * a 404. Expired, revoked and accepted invitations are returned with that status so the page can
 * say so plainly.
 */
export async function getInvitationPreview(token: string, now: Date = new Date()): Promise<InvitationPreviewDto> {
  const [row] = await db
    .select({ invitation: invitations, groupName: groups.name, groupSlug: groups.slug, groupKind: groups.kind, inviter: users.name })
    .from(invitations)
    .innerJoin(groups, eq(groups.id, invitations.groupId))
    .innerJoin(users, eq(users.id, invitations.invitedBy))
    .where(and(eq(invitations.tokenHash, hashSecureToken(token)), isNull(groups.deletedAt)))
    .limit(1);
  if (!row) throw new NotFoundError("This invitation link is not valid. Ask the group owner for a new one.");
  const [account] = await db
    .select({ id: users.id })
    .from(users)
    .where(and(eq(users.email, row.invitation.email), isNull(users.deletedAt)))
    .limit(1);
  return {
    status: statusOf(row.invitation, now),
    email: row.invitation.email,
    role: row.invitation.role,
    groupName: row.groupName,
    groupSlug: row.groupSlug,
    groupKind: row.groupKind,
    invitedByName: row.inviter,
    expiresAt: row.invitation.expiresAt,
    accountExists: Boolean(account),
  };
}

/** Result of accepting: where to go next. */
export interface AcceptedInvitation {
  groupId: string;
  groupSlug: string;
  role: GroupRole;
}

/**
 * Accepts an invitation as the signed-in user. The account's e-mail must be the invited one
 * (409 `invitation_wrong_account` otherwise); expired, revoked and used links give 409 with a
 * code that says which. Someone already in the group keeps their role.
 */
export async function acceptInvitation(actor: Actor | null, token: string, now: Date = new Date()): Promise<AcceptedInvitation> {
  const signedIn = requireActor(actor);
  return db.transaction(async (tx) => acceptInTransaction(tx, signedIn.id, signedIn.email, token, now));
}

/**
 * Accepts inside an open transaction for `userId` (used by `acceptInvitation` and by sign-up from
 * an invitation, which creates the account in the same transaction).
 */
export async function acceptInTransaction(
  tx: Executor,
  userId: string,
  userEmail: string,
  token: string,
  now: Date,
): Promise<AcceptedInvitation> {
  const [row] = await tx
    .select({ invitation: invitations, groupSlug: groups.slug })
    .from(invitations)
    .innerJoin(groups, eq(groups.id, invitations.groupId))
    .where(and(eq(invitations.tokenHash, hashSecureToken(token)), isNull(groups.deletedAt)))
    .for("update", { of: invitations })
    .limit(1);
  if (!row) throw new NotFoundError("This invitation link is not valid. Ask the group owner for a new one.");
  const invitation = row.invitation;
  assertPending(invitation, now);
  if (invitation.email !== userEmail.toLowerCase()) {
    throw new CollaborationConflictError(
      "invitation_wrong_account",
      `This invitation was sent to ${invitation.email}, but you are signed in as ${userEmail}. Sign in with the invited address.`,
    );
  }
  const [existing] = await tx
    .select({ role: memberships.role })
    .from(memberships)
    .where(and(eq(memberships.groupId, invitation.groupId), eq(memberships.userId, userId)))
    .limit(1);
  if (!existing) {
    await tx.insert(memberships).values({ groupId: invitation.groupId, userId, role: invitation.role });
  }
  await tx.update(invitations).set({ acceptedAt: now, acceptedBy: userId }).where(eq(invitations.id, invitation.id));
  await recordAudit(tx, {
    actorId: userId,
    groupId: invitation.groupId,
    action: "invitation.accept",
    entityType: "invitation",
    entityId: invitation.id,
    details: { email: invitation.email, role: existing?.role ?? invitation.role, alreadyMember: Boolean(existing) },
  });
  return { groupId: invitation.groupId, groupSlug: row.groupSlug, role: existing?.role ?? invitation.role };
}

/**
 * Sign-up from an invitation: creates the account for the invited e-mail (marked verified, since
 * the link arrived there) and accepts the invitation. An existing account for that e-mail gets
 * 409 `account_exists` (sign in instead); a dead link fails before anything is written.
 */
export async function acceptInvitationWithNewAccount(
  token: string,
  input: { name: string; password: string },
  now: Date = new Date(),
): Promise<AcceptedInvitation & { email: string }> {
  const email = await requirePendingInvitationEmail(db, token, now);
  const [existing] = await db.select({ id: users.id }).from(users).where(eq(users.email, email)).limit(1);
  if (existing) {
    throw new CollaborationConflictError("account_exists", `An account for ${email} already exists. Sign in to accept the invitation.`);
  }
  const account = await createUser(null, { email, name: input.name, password: input.password, emailVerified: true });
  const accepted = await db.transaction(async (tx) => acceptInTransaction(tx, account.id, account.email, token, now));
  return { ...accepted, email: account.email };
}

/** The invited e-mail behind a pending token; throws like accepting would. */
async function requirePendingInvitationEmail(tx: Executor, token: string, now: Date): Promise<string> {
  const [row] = await tx
    .select()
    .from(invitations)
    .where(eq(invitations.tokenHash, hashSecureToken(token)))
    .limit(1);
  if (!row) throw new NotFoundError("This invitation link is not valid. Ask the group owner for a new one.");
  assertPending(row, now);
  return row.email;
}

function assertPending(invitation: InvitationRow, now: Date): void {
  const status = statusOf(invitation, now);
  if (status === "accepted") {
    throw new CollaborationConflictError("invitation_used", "This invitation has already been used. Ask the group owner for a new one if you need it.");
  }
  if (status === "revoked") {
    throw new CollaborationConflictError("invitation_revoked", "This invitation was withdrawn by the group owner.");
  }
  if (status === "expired") {
    throw new CollaborationConflictError("invitation_expired", "This invitation has expired. Ask the group owner to send it again.");
  }
}

function statusOf(invitation: InvitationRow, now: Date): InvitationStatus {
  if (invitation.acceptedAt) return "accepted";
  if (invitation.revokedAt) return "revoked";
  if (invitation.expiresAt.getTime() <= now.getTime()) return "expired";
  return "pending";
}

function pendingAt(now: Date) {
  return and(isNull(invitations.acceptedAt), isNull(invitations.revokedAt), gt(invitations.expiresAt, now));
}

function toDto(row: InvitationRow, invitedByName: string, now: Date): InvitationDto {
  return {
    id: row.id,
    email: row.email,
    role: row.role,
    status: statusOf(row, now),
    invitedByName,
    expiresAt: row.expiresAt,
    createdAt: row.createdAt,
    acceptedAt: row.acceptedAt,
  };
}

async function loadGroup(executor: Executor, groupId: string) {
  const [group] = await executor
    .select({ id: groups.id, name: groups.name, kind: groups.kind })
    .from(groups)
    .where(eq(groups.id, groupId))
    .limit(1);
  if (!group) throw new NotFoundError("No such group.");
  return group;
}

async function loadInvitationForOwner(executor: Executor, actor: Actor, invitationId: string): Promise<InvitationRow> {
  const [row] = await executor.select().from(invitations).where(eq(invitations.id, invitationId)).for("update").limit(1);
  if (!row) throw new NotFoundError("No such invitation.");
  await requireGroupRole(executor, actor, row.groupId, "owner", "invitation");
  return row;
}

async function inviterName(executor: Executor, userId: string): Promise<string> {
  const [row] = await executor.select({ name: users.name }).from(users).where(eq(users.id, userId)).limit(1);
  return row?.name ?? "A former member";
}

function addDays(date: Date, days: number): Date {
  return new Date(date.getTime() + days * 24 * 60 * 60 * 1000);
}
