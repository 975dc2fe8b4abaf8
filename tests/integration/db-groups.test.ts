import { and, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { db } from "@/db/index";
import { auditLog, memberships } from "@/db/schema";
import {
  createGroup,
  getGroupBySlug,
  getMembershipRole,
  getPersonalGroup,
  leaveGroup,
  listGroupsForUser,
  listMembers,
  removeMember,
  setMemberRole,
} from "@/db/queries/groups";
import { ForbiddenError, NotFoundError, UnauthenticatedError, ValidationError } from "@/lib/errors";
import { createTestGroup, createTestUser } from "@/tests/fixtures/users";

describe("createGroup", () => {
  it("makes the creator the owner and records the write", async () => {
    const owner = await createTestUser({ label: "owner" });
    const slug = `ripple-${crypto.randomUUID().slice(0, 8)}`;
    const group = await createGroup(owner.actor, { name: "Ripple Group", kind: "research", slug });
    expect(group).toMatchObject({ slug, name: "Ripple Group", kind: "research", role: "owner" });
    expect(await getMembershipRole(owner.actor, group.id)).toBe("owner");
    const audit = await db
      .select()
      .from(auditLog)
      .where(and(eq(auditLog.groupId, group.id), eq(auditLog.action, "group.create")));
    expect(audit).toHaveLength(1);
    expect(audit[0]?.actorId).toBe(owner.actor.id);
  });

  it("derives a slug from the name and rejects a taken or malformed slug on the slug field", async () => {
    const owner = await createTestUser({ label: "owner" });
    const name = `Tidal Lab ${crypto.randomUUID().slice(0, 6)}`;
    const group = await createGroup(owner.actor, { name, kind: "lab" });
    expect(group.slug).toBe(name.toLowerCase().replace(/ /g, "-"));
    for (const slug of [group.slug, "Not A Slug"]) {
      await expect(createGroup(owner.actor, { name: "Other", kind: "research", slug })).rejects.toMatchObject({
        issues: [{ path: ["slug"] }],
      });
    }
    await expect(createGroup(null, { name: "Anonymous", kind: "research" })).rejects.toBeInstanceOf(
      UnauthenticatedError,
    );
  });
});

describe("getGroupBySlug", () => {
  it("answers NotFound to non-members so existence does not leak, and the role to members", async () => {
    const owner = await createTestUser({ label: "owner" });
    const viewer = await createTestUser({ label: "viewer" });
    const outsider = await createTestUser({ label: "outsider" });
    const admin = await createTestUser({ label: "admin", siteRole: "admin" });
    const group = await createTestGroup(owner.actor, [{ actor: viewer.actor, role: "viewer" }]);

    expect((await getGroupBySlug(viewer.actor, group.slug)).role).toBe("viewer");
    expect((await getGroupBySlug(admin.actor, group.slug)).role).toBe("owner");
    await expect(getGroupBySlug(outsider.actor, group.slug)).rejects.toBeInstanceOf(NotFoundError);
    await expect(getGroupBySlug(outsider.actor, "no-such-group-anywhere")).rejects.toBeInstanceOf(NotFoundError);
    await expect(getGroupBySlug(null, group.slug)).rejects.toBeInstanceOf(UnauthenticatedError);
  });

  it("treats text that cannot be a slug as no such group, without asking the database", async () => {
    const owner = await createTestUser({ label: "slug-owner" });
    for (const slug of ["a\u0000b", "\ud800", "../admin", ""]) {
      await expect(getGroupBySlug(owner.actor, slug)).rejects.toBeInstanceOf(NotFoundError);
    }
  });
});

describe("listGroupsForUser", () => {
  it("lists the personal space first, then the groups with roles and counts", async () => {
    const owner = await createTestUser({ label: "owner" });
    const editor = await createTestUser({ label: "editor" });
    const group = await createTestGroup(owner.actor, [{ actor: editor.actor, role: "editor" }]);
    const list = await listGroupsForUser(editor.actor);
    expect(list.map((item) => item.kind)).toEqual(["personal", "research"]);
    expect(list[0]?.id).toBe(editor.personalGroupId);
    expect(list[1]).toMatchObject({ id: group.id, role: "editor", memberCount: 2, configurationCount: 0 });
    expect((await getPersonalGroup(editor.actor)).id).toBe(editor.personalGroupId);
  });
});

describe("members", () => {
  it("lists members for viewers and hides them from outsiders", async () => {
    const owner = await createTestUser({ label: "owner" });
    const viewer = await createTestUser({ label: "viewer" });
    const outsider = await createTestUser({ label: "outsider" });
    const group = await createTestGroup(owner.actor, [{ actor: viewer.actor, role: "viewer" }]);
    const members = await listMembers(viewer.actor, group.id);
    expect(members.map((member) => [member.userId, member.role])).toEqual([
      [owner.actor.id, "owner"],
      [viewer.actor.id, "viewer"],
    ]);
    await expect(listMembers(outsider.actor, group.id)).rejects.toBeInstanceOf(NotFoundError);
    await expect(listMembers(outsider.actor, "malformed")).rejects.toBeInstanceOf(NotFoundError);
  });

  it("lets only owners change roles and always keeps one owner", async () => {
    const owner = await createTestUser({ label: "owner" });
    const editor = await createTestUser({ label: "editor" });
    const group = await createTestGroup(owner.actor, [{ actor: editor.actor, role: "editor" }]);

    await expect(setMemberRole(editor.actor, group.id, editor.actor.id, "owner")).rejects.toBeInstanceOf(
      ForbiddenError,
    );
    const lastOwner = setMemberRole(owner.actor, group.id, owner.actor.id, "editor");
    await expect(lastOwner).rejects.toBeInstanceOf(ValidationError);
    expect(await getMembershipRole(owner.actor, group.id)).toBe("owner");

    const promoted = await setMemberRole(owner.actor, group.id, editor.actor.id, "owner");
    expect(promoted.role).toBe("owner");
    await setMemberRole(owner.actor, group.id, owner.actor.id, "viewer");
    expect(await getMembershipRole(owner.actor, group.id)).toBe("viewer");
  });

  it("lets owners remove members and members leave, but not the last owner or a personal space", async () => {
    const owner = await createTestUser({ label: "owner" });
    const editor = await createTestUser({ label: "editor" });
    const viewer = await createTestUser({ label: "viewer" });
    const group = await createTestGroup(owner.actor, [
      { actor: editor.actor, role: "editor" },
      { actor: viewer.actor, role: "viewer" },
    ]);
    await expect(removeMember(editor.actor, group.id, viewer.actor.id)).rejects.toBeInstanceOf(ForbiddenError);
    await removeMember(owner.actor, group.id, viewer.actor.id);
    await leaveGroup(editor.actor, group.id);
    await expect(leaveGroup(owner.actor, group.id)).rejects.toBeInstanceOf(ValidationError);
    await expect(leaveGroup(owner.actor, owner.personalGroupId)).rejects.toBeInstanceOf(ForbiddenError);
    const remaining = await db.select().from(memberships).where(eq(memberships.groupId, group.id));
    expect(remaining.map((row) => row.userId)).toEqual([owner.actor.id]);
  });
});
