import { ENGINE_VERSION } from "@/lib/boundary";
import { eq } from "drizzle-orm";
import { describe, expect, it, vi } from "vitest";
import { db } from "@/db/index";
import type { Actor } from "@/db/queries/actor";
import { addComment, deleteComment, listComments } from "@/db/queries/comments";
import {
  createConfiguration,
  setConfigurationStarter,
  softDeleteConfiguration,
  undeleteConfiguration,
  updateConfiguration,
} from "@/db/queries/configurations";
import { forkConfiguration } from "@/db/queries/forks";
import { listStarterForks } from "@/db/queries/labs";
import { createShareLink, getSharedConfiguration, listShareLinks, revokeShareLink } from "@/db/queries/share-links";
import { listAuditLog } from "@/db/queries/audit-log";
import { shareLinks } from "@/db/schema";
import type { Configuration } from "@/lib/boundary/types";
import { braneAntibranePair } from "@/lib/demo-configurations";
import { ForbiddenError, NotFoundError, ValidationError } from "@/lib/errors";
import { hashSecureToken } from "@/lib/server/secure-token";
import { createRoleGroup, createTestGroup, createTestUser } from "@/tests/fixtures/users";

const session = vi.hoisted(() => ({ actor: null as Actor | null }));
vi.mock("@/lib/server/session", () => ({ getCurrentUser: async () => session.actor }));
const { DELETE: revokeRoute } = await import("@/app/api/share-links/[shareLinkId]/route");

/** A hand-made result (shapes only; physics is tested in lib/boundary). */

async function scenario() {
  const { owner, editor, viewer, outsider, group } = await createRoleGroup();
  const configuration = await createConfiguration(owner.actor, group.id, braneAntibranePair, "First");
  return { owner, editor, viewer, outsider, group, configuration };
}

describe("share links", () => {
  it("gives a read-only view to anyone with the token until an editor revokes it", async () => {
    const { editor, viewer, outsider, configuration } = await scenario();
    const { link, token } = await createShareLink(editor.actor, configuration.id);
    expect(token).toMatch(/^[A-Za-z0-9_-]{43}$/);
    const [stored] = await db.select().from(shareLinks).where(eq(shareLinks.id, link.id));
    expect(stored?.tokenHash).toBe(hashSecureToken(token));

    const shared = await getSharedConfiguration(token);
    expect(shared.title).toBe(braneAntibranePair.title);
    expect(shared.result?.engineVersion).toBe(ENGINE_VERSION);

    await expect(createShareLink(viewer.actor, configuration.id)).rejects.toBeInstanceOf(ForbiddenError);
    await expect(listShareLinks(outsider.actor, configuration.id)).rejects.toBeInstanceOf(NotFoundError);

    session.actor = viewer.actor;
    const byViewer = await revokeRoute(new Request("http://test.local", { method: "DELETE" }), { params: Promise.resolve({ shareLinkId: link.id }) });
    expect(byViewer.status).toBe(403);
    expect((await getSharedConfiguration(token)).title).toBe(braneAntibranePair.title);

    session.actor = editor.actor;
    const byEditor = await revokeRoute(new Request("http://test.local", { method: "DELETE" }), { params: Promise.resolve({ shareLinkId: link.id }) });
    expect(byEditor.status).toBe(200);
    await expect(getSharedConfiguration(token)).rejects.toBeInstanceOf(NotFoundError);
    // Revoking again is harmless.
    expect((await revokeShareLink(editor.actor, link.id)).revokedAt).not.toBeNull();
  });

  it("revokes a configuration's share links when it is deleted; undeleting it leaves them revoked", async () => {
    const { editor, configuration } = await scenario();
    const { token } = await createShareLink(editor.actor, configuration.id);
    const { token: second } = await createShareLink(editor.actor, configuration.id);
    await softDeleteConfiguration(editor.actor, configuration.id);
    await undeleteConfiguration(editor.actor, configuration.id);
    for (const link of [token, second]) await expect(getSharedConfiguration(link)).rejects.toBeInstanceOf(NotFoundError);
    const links = await listShareLinks(editor.actor, configuration.id);
    expect(links.map((link) => link.revokedAt)).toEqual([expect.any(Date), expect.any(Date)]);
    // A link made after the undelete works as usual.
    const { token: fresh } = await createShareLink(editor.actor, configuration.id);
    expect((await getSharedConfiguration(fresh)).title).toBe(braneAntibranePair.title);
  });

  it("answers 404 for an unknown token", async () => {
    await expect(getSharedConfiguration("A".repeat(43))).rejects.toBeInstanceOf(NotFoundError);
  });
});

describe("comments", () => {
  it("ties each comment to the revision it was written on; viewers may comment, outsiders may not", async () => {
    const { owner, editor, viewer, outsider, configuration } = await scenario();
    const first = await addComment(viewer.actor, configuration.id, { body: "Is the tachyon expected here?" });
    expect(first.revisionNumber).toBe(1);

    const moved: Configuration = { ...braneAntibranePair, title: "Pair, moved apart" };
    await updateConfiguration(editor.actor, configuration.id, { expectedVersion: 1, document: moved, message: "Apart" });
    const second = await addComment(editor.actor, configuration.id, { body: "Now beyond the critical separation." });
    expect(second.revisionNumber).toBe(2);

    const listed = await listComments(owner.actor, configuration.id);
    expect(listed.map((c) => c.revisionNumber)).toEqual([1, 2]);
    expect(listed.every((c) => c.canDelete)).toBe(true);

    await expect(addComment(outsider.actor, configuration.id, { body: "hello" })).rejects.toBeInstanceOf(NotFoundError);
    await expect(deleteComment(viewer.actor, second.id)).rejects.toBeInstanceOf(ForbiddenError);
    await deleteComment(owner.actor, second.id);
    expect((await listComments(viewer.actor, configuration.id)).map((c) => c.id)).toEqual([first.id]);
  });

  it("refuses a revision of another configuration", async () => {
    const { owner, group, configuration } = await scenario();
    const other = await createConfiguration(owner.actor, group.id, braneAntibranePair, "Other");
    await expect(
      addComment(owner.actor, configuration.id, { body: "x", revisionId: other.currentRevision!.id }),
    ).rejects.toBeInstanceOf(ValidationError);
  });
});

describe("labs", () => {
  it("shows the instructor each student's fork of a starter with key results", async () => {
    const [instructor, student, otherStudent] = await Promise.all([
      createTestUser({ label: "instructor" }),
      createTestUser({ label: "student" }),
      createTestUser({ label: "student2" }),
    ]);
    const lab = await createTestGroup(
      instructor.actor,
      [
        { actor: student.actor, role: "viewer" },
        { actor: otherStudent.actor, role: "viewer" },
      ],
      "lab",
    );
    const starter = await createConfiguration(instructor.actor, lab.id, braneAntibranePair, "Starter");
    await setConfigurationStarter(instructor.actor, starter.id, true);
    await forkConfiguration(student.actor, starter.id, { targetGroupId: student.personalGroupId });

    const comparison = await listStarterForks(instructor.actor, lab.id);
    expect(comparison).toHaveLength(1);
    expect(comparison[0]?.forks.map((fork) => fork.student.id)).toEqual([student.actor.id]);
    // A brane with an antibrane at nu = 0 preserves no supercharges (physics.md, "Stability and supersymmetry").
    expect(comparison[0]?.forks[0]?.supersymmetric).toBe(false);

    await expect(listStarterForks(student.actor, lab.id)).rejects.toBeInstanceOf(ForbiddenError);
  });
});

describe("audit log", () => {
  it("is readable by owners only and records collaboration writes", async () => {
    const { owner, editor, viewer, group, configuration } = await scenario();
    await createShareLink(editor.actor, configuration.id);
    await addComment(viewer.actor, configuration.id, { body: "noted" });
    const entries = await listAuditLog(owner.actor, group.id);
    const actions = entries.map((entry) => entry.action);
    expect(actions).toContain("share_link.create");
    expect(actions).toContain("comment.create");
    expect(actions).toContain("configuration.create");
    await expect(listAuditLog(editor.actor, group.id)).rejects.toBeInstanceOf(ForbiddenError);
  });
});
