import { and, eq } from "drizzle-orm";
import { beforeEach, describe, expect, it, vi } from "vitest";
import { db } from "@/db/index";
import type { Actor } from "@/db/queries/actor";
import { listMembers, removeMember, setMemberRole } from "@/db/queries/groups";
import {
  acceptInvitation,
  createInvitation,
  getInvitationPreview,
  listInvitations,
  resendInvitation,
  revokeInvitation,
} from "@/db/queries/invitations";
import { auditLog, invitations, memberships, users } from "@/db/schema";
import { ForbiddenError, NotFoundError, ValidationError } from "@/lib/errors";
import { hashSecureToken } from "@/lib/server/secure-token";
import { createTestGroup, createTestUser } from "@/tests/fixtures/users";

const session = vi.hoisted(() => ({ actor: null as Actor | null }));
vi.mock("@/lib/server/session", () => ({ getCurrentUser: async () => session.actor }));
// The accept route is tested without a mail server; invitations are created through the DAL.
const { POST: acceptRoute } = await import("@/app/api/invitations/accept/route");
const { POST: inviteRoute } = await import("@/app/api/groups/[groupId]/invitations/route");
const { PATCH: changeRoleRoute } = await import("@/app/api/groups/[groupId]/members/[userId]/route");

function jsonRequest(url: string, body: unknown, method = "POST"): Request {
  return new Request(`http://test.local${url}`, {
    method,
    headers: { "content-type": "application/json" },
    body: JSON.stringify(body),
  });
}

async function scenario() {
  const [owner, editor, viewer] = await Promise.all([
    createTestUser({ label: "owner" }),
    createTestUser({ label: "editor" }),
    createTestUser({ label: "viewer" }),
  ]);
  const group = await createTestGroup(owner.actor, [
    { actor: editor.actor, role: "editor" },
    { actor: viewer.actor, role: "viewer" },
  ]);
  return { owner, editor, viewer, group };
}

beforeEach(() => {
  session.actor = null;
});

describe("invitation lifecycle", () => {
  it("lets an existing account accept once; the link cannot be reused", async () => {
    const { owner, group } = await scenario();
    const invitee = await createTestUser({ label: "invitee" });
    const issued = await createInvitation(owner.actor, group.id, { email: invitee.actor.email, role: "editor" });

    // Only the digest is stored.
    const [stored] = await db.select().from(invitations).where(eq(invitations.id, issued.invitation.id));
    expect(stored?.tokenHash).toBe(hashSecureToken(issued.token));
    expect(stored?.tokenHash).not.toContain(issued.token);

    const preview = await getInvitationPreview(issued.token);
    expect(preview.status).toBe("pending");
    expect(preview.accountExists).toBe(true);

    session.actor = invitee.actor;
    const response = await acceptRoute(jsonRequest("/api/invitations/accept", { token: issued.token }));
    expect(response.status).toBe(200);
    expect(await response.json()).toEqual({ groupSlug: group.slug, role: "editor" });

    const members = await listMembers(owner.actor, group.id);
    expect(members.find((m) => m.userId === invitee.actor.id)?.role).toBe("editor");

    const reuse = await acceptRoute(jsonRequest("/api/invitations/accept", { token: issued.token }));
    expect(reuse.status).toBe(409);
    expect(((await reuse.json()) as { error: string }).error).toBe("invitation_used");
    expect((await getInvitationPreview(issued.token)).status).toBe("accepted");
  });

  it("creates an account for a new person and makes them a member", async () => {
    const { owner, group } = await scenario();
    const email = `new-${Date.now()}@test.mooring`;
    const issued = await createInvitation(owner.actor, group.id, { email, role: "viewer" });
    expect((await getInvitationPreview(issued.token)).accountExists).toBe(false);

    const response = await acceptRoute(
      jsonRequest("/api/invitations/accept", { token: issued.token, name: "New Person", password: "long-enough-1" }),
    );
    expect(response.status).toBe(201);
    const [account] = await db.select().from(users).where(eq(users.email, email));
    expect(account?.emailVerifiedAt).not.toBeNull();
    const [membership] = await db
      .select()
      .from(memberships)
      .where(and(eq(memberships.groupId, group.id), eq(memberships.userId, account!.id)));
    expect(membership?.role).toBe("viewer");
  });

  it("refuses an expired invitation with a clear code and adds nobody", async () => {
    const { owner, group } = await scenario();
    const invitee = await createTestUser({ label: "late" });
    const eightDaysAgo = new Date(Date.now() - 8 * 24 * 60 * 60 * 1000);
    const issued = await createInvitation(owner.actor, group.id, { email: invitee.actor.email, role: "editor" }, eightDaysAgo);
    expect((await getInvitationPreview(issued.token)).status).toBe("expired");

    session.actor = invitee.actor;
    const response = await acceptRoute(jsonRequest("/api/invitations/accept", { token: issued.token }));
    expect(response.status).toBe(409);
    expect(((await response.json()) as { error: string }).error).toBe("invitation_expired");
    const members = await listMembers(owner.actor, group.id);
    expect(members.some((m) => m.userId === invitee.actor.id)).toBe(false);
  });

  it("refuses a revoked invitation; resending a pending one retires the old link", async () => {
    const { owner, group } = await scenario();
    const invitee = await createTestUser({ label: "revoked" });
    const first = await createInvitation(owner.actor, group.id, { email: invitee.actor.email, role: "editor" });
    const resent = await resendInvitation(owner.actor, first.invitation.id);
    expect(resent.token).not.toBe(first.token);
    await expect(getInvitationPreview(first.token)).rejects.toBeInstanceOf(NotFoundError);

    await revokeInvitation(owner.actor, first.invitation.id);
    expect((await getInvitationPreview(resent.token)).status).toBe("revoked");
    await expect(acceptInvitation(invitee.actor, resent.token)).rejects.toMatchObject({ code: "invitation_revoked", status: 409 });
    const listed = await listInvitations(owner.actor, group.id);
    expect(listed.find((i) => i.id === first.invitation.id)?.status).toBe("revoked");
  });

  it("refuses a signed-in account whose e-mail is not the invited one", async () => {
    const { owner, group } = await scenario();
    const other = await createTestUser({ label: "other" });
    const issued = await createInvitation(owner.actor, group.id, { email: "someone-else@test.mooring", role: "editor" });
    await expect(acceptInvitation(other.actor, issued.token)).rejects.toMatchObject({ code: "invitation_wrong_account" });
  });

  it("lets only owners invite, resend, revoke and list", async () => {
    const { owner, editor, viewer, group } = await scenario();
    const outsider = await createTestUser({ label: "outsider" });
    await expect(createInvitation(editor.actor, group.id, { email: "x@test.mooring", role: "viewer" })).rejects.toBeInstanceOf(ForbiddenError);
    await expect(createInvitation(viewer.actor, group.id, { email: "x@test.mooring", role: "viewer" })).rejects.toBeInstanceOf(ForbiddenError);
    await expect(createInvitation(outsider.actor, group.id, { email: "x@test.mooring", role: "viewer" })).rejects.toBeInstanceOf(NotFoundError);
    const issued = await createInvitation(owner.actor, group.id, { email: "y@test.mooring", role: "viewer" });
    await expect(resendInvitation(editor.actor, issued.invitation.id)).rejects.toBeInstanceOf(ForbiddenError);
    await expect(revokeInvitation(viewer.actor, issued.invitation.id)).rejects.toBeInstanceOf(ForbiddenError);
    await expect(listInvitations(editor.actor, group.id)).rejects.toBeInstanceOf(ForbiddenError);

    session.actor = editor.actor;
    const response = await inviteRoute(jsonRequest(`/api/groups/${group.id}/invitations`, { email: "z@test.mooring", role: "owner" }), {
      params: Promise.resolve({ groupId: group.id }),
    });
    expect(response.status).toBe(403);
    session.actor = null;
    const anonymous = await inviteRoute(jsonRequest(`/api/groups/${group.id}/invitations`, { email: "z@test.mooring" }), {
      params: Promise.resolve({ groupId: group.id }),
    });
    expect(anonymous.status).toBe(401);
  });

  it("rejects inviting someone who is already a member", async () => {
    const { owner, editor, group } = await scenario();
    await expect(createInvitation(owner.actor, group.id, { email: editor.actor.email, role: "viewer" })).rejects.toBeInstanceOf(ValidationError);
  });

  it("writes audit rows for create, revoke and accept", async () => {
    const { owner, group } = await scenario();
    const invitee = await createTestUser({ label: "audited" });
    const a = await createInvitation(owner.actor, group.id, { email: "gone@test.mooring", role: "viewer" });
    await revokeInvitation(owner.actor, a.invitation.id);
    const b = await createInvitation(owner.actor, group.id, { email: invitee.actor.email, role: "viewer" });
    await acceptInvitation(invitee.actor, b.token);
    const rows = await db.select({ action: auditLog.action }).from(auditLog).where(eq(auditLog.groupId, group.id));
    const actions = rows.map((row) => row.action);
    expect(actions.filter((action) => action === "invitation.create")).toHaveLength(2);
    expect(actions).toContain("invitation.revoke");
    expect(actions).toContain("invitation.accept");
  });
});

describe("role changes", () => {
  it("rejects role changes by editors and viewers and keeps the role", async () => {
    const { owner, editor, viewer, group } = await scenario();
    session.actor = editor.actor;
    const byEditor = await changeRoleRoute(jsonRequest(`/api/groups/${group.id}/members/${viewer.actor.id}`, { role: "owner" }, "PATCH"), {
      params: Promise.resolve({ groupId: group.id, userId: viewer.actor.id }),
    });
    expect(byEditor.status).toBe(403);
    session.actor = viewer.actor;
    const byViewer = await changeRoleRoute(jsonRequest(`/api/groups/${group.id}/members/${viewer.actor.id}`, { role: "owner" }, "PATCH"), {
      params: Promise.resolve({ groupId: group.id, userId: viewer.actor.id }),
    });
    expect(byViewer.status).toBe(403);
    await expect(removeMember(editor.actor, group.id, viewer.actor.id)).rejects.toBeInstanceOf(ForbiddenError);
    const members = await listMembers(owner.actor, group.id);
    expect(members.find((m) => m.userId === viewer.actor.id)?.role).toBe("viewer");
  });

  it("lets the owner change a role and rejects an unknown role with 422", async () => {
    const { owner, viewer, group } = await scenario();
    session.actor = owner.actor;
    const bad = await changeRoleRoute(jsonRequest(`/api/groups/${group.id}/members/${viewer.actor.id}`, { role: "admin" }, "PATCH"), {
      params: Promise.resolve({ groupId: group.id, userId: viewer.actor.id }),
    });
    expect(bad.status).toBe(422);
    const body = (await bad.json()) as { issues: { path: string[] }[] };
    expect(body.issues[0]?.path).toEqual(["role"]);
    const updated = await setMemberRole(owner.actor, group.id, viewer.actor.id, "editor");
    expect(updated.role).toBe("editor");
  });
});
