import { and, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { db } from "@/db/index";
import { listRecentActivityForUser } from "@/db/queries/auth";
import { recordAudit } from "@/db/queries/audit";
import { memberships } from "@/db/schema";
import { UnauthenticatedError } from "@/lib/errors";
import { createTestGroup, createTestUser } from "@/tests/fixtures/users";

describe("listRecentActivityForUser", () => {
  it("lists the actor's own entries in their groups, newest first", async () => {
    const user = await createTestUser({ label: "activity" });
    const other = await createTestUser({ label: "activity-other" });
    const base = { groupId: user.personalGroupId, entityType: "configuration", entityId: null };
    await recordAudit(db, { ...base, actorId: user.actor.id, action: "configuration.create" });
    await recordAudit(db, { ...base, actorId: user.actor.id, action: "configuration.update" });
    await recordAudit(db, { ...base, actorId: other.actor.id, action: "configuration.fork" });

    const entries = await listRecentActivityForUser(user.actor);
    expect(entries.map((entry) => entry.action)).toEqual(["configuration.update", "configuration.create"]);
    expect(entries[0]?.group.kind).toBe("personal");
    expect(entries[0]?.configuration).toBeNull();
  });

  it("omits entries in groups the actor has left", async () => {
    const owner = await createTestUser({ label: "activity-owner" });
    const leaver = await createTestUser({ label: "activity-leaver" });
    const group = await createTestGroup(owner.actor, [{ actor: leaver.actor, role: "editor" }]);
    await recordAudit(db, { actorId: leaver.actor.id, groupId: group.id, action: "comment.create", entityType: "comment", entityId: null });
    expect(await listRecentActivityForUser(leaver.actor)).toHaveLength(1);

    await db.delete(memberships).where(and(eq(memberships.groupId, group.id), eq(memberships.userId, leaver.actor.id)));
    expect(await listRecentActivityForUser(leaver.actor)).toEqual([]);
  });

  it("requires a signed-in actor", async () => {
    await expect(listRecentActivityForUser(null)).rejects.toBeInstanceOf(UnauthenticatedError);
  });
});
