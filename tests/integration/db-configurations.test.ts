import { eq, sql } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { db } from "@/db/index";
import { auditLog, configurations, results, revisions } from "@/db/schema";
import { createConfiguration, getConfiguration, listConfigurationsForGroup, listConfigurationsForUser, setConfigurationStarter, softDeleteConfiguration, undeleteConfiguration, updateConfiguration } from "@/db/queries/configurations";
import { forkConfiguration, listForksOfConfiguration } from "@/db/queries/forks";
import { getResultForRevision } from "@/db/queries/result-reads";
import { getRevision, getRevisionByNumber, listRevisions, restoreRevision } from "@/db/queries/revisions";
import { ENGINE_VERSION } from "@/lib/boundary";
import type { Configuration } from "@/lib/boundary/types";
import { braneAntibranePair, twoTwoBraneStacks } from "@/lib/demo-configurations";
import { ConflictError, ForbiddenError, NotFoundError, UnauthenticatedError } from "@/lib/errors";
import { createRoleGroup, createTestGroup, createTestUser } from "@/tests/fixtures/users";

/**
 * alpha' M^2 of the lightest state of the D4-antiD4 pair at separation y: the NS ground state,
 * (y / 2 pi)^2 - 1/2 (physics.md "Mass formula" and "Zero-point energies": a = -1/2 at nu = 0; the
 * brane-antibrane GSO keeps it, Banks and Susskind 1995, from memory).
 */
function braneAntibraneLightest(y: number): number {
  return (y / (2 * Math.PI)) ** 2 - 1 / 2;
}

function moved(document: Configuration, y: number): Configuration {
  return {
    ...document,
    stacks: document.stacks.map((stack, index) =>
      index === 1 ? { ...stack, position: { ...stack.position, "9": y } } : stack,
    ),
  };
}

/** A research group with an owner, an editor, a viewer, an outsider and an admin, plus one saved configuration. */
async function scenario() {
  const [{ owner, editor, viewer, outsider, group }, admin] = await Promise.all([
    createRoleGroup(),
    createTestUser({ label: "admin", siteRole: "admin" }),
  ]);
  const configuration = await createConfiguration(
    editor.actor,
    group.id,
    braneAntibranePair,
    "First sketch",
  );
  return { owner, editor, viewer, outsider, admin, group, configuration };
}

async function countRows(configurationId: string) {
  const [revisionCount] = await db
    .select({ n: sql<number>`count(*)::int` })
    .from(revisions)
    .where(eq(revisions.configurationId, configurationId));
  const [auditCount] = await db
    .select({ n: sql<number>`count(*)::int` })
    .from(auditLog)
    .where(eq(auditLog.entityId, configurationId));
  return { revisions: revisionCount?.n, audit: auditCount?.n };
}

describe("createConfiguration", () => {
  it("stores version 1, revision 1 with its result, and the summary columns", async () => {
    const { editor, group, configuration } = await scenario();
    expect(configuration).toMatchObject({
      title: braneAntibranePair.title,
      theory: "IIA",
      version: 1,
      stackCount: 2,
      tachyonic: true,
      supercharges: 0,
      role: "editor",
      canEdit: true,
      forkedFrom: null,
      author: { id: editor.actor.id, name: editor.actor.name },
      group: { id: group.id, slug: group.slug },
    });
    expect(configuration.lightestMassSquared).toBeCloseTo(braneAntibraneLightest(1.5), 10);
    expect(configuration.currentRevision?.number).toBe(1);
    // The DAL computed and stored the result itself, with the running engine's version.
    const result = await getResultForRevision(editor.actor, configuration.currentRevision?.id ?? "");
    expect(result.engineVersion).toBe(ENGINE_VERSION);
    expect(result.computeMs).toBeGreaterThan(0);
    expect(Number(result.result.lightest[0]?.massSquared)).toBeCloseTo(braneAntibraneLightest(1.5), 10);
    const history = await listRevisions(editor.actor, configuration.id);
    expect(history.map((revision) => [revision.number, revision.message, revision.isCurrent])).toEqual([
      [1, "First sketch", true],
    ]);
  });

  it("refuses viewers (403), outsiders (404) and anonymous callers (401) and writes nothing", async () => {
    const { viewer, outsider, group } = await scenario();
    const before = await listConfigurationsForGroup(viewer.actor, group.id);
    const attempt = (actor: typeof viewer.actor | null) =>
      createConfiguration(actor, group.id, twoTwoBraneStacks, "");
    await expect(attempt(viewer.actor)).rejects.toBeInstanceOf(ForbiddenError);
    await expect(attempt(outsider.actor)).rejects.toBeInstanceOf(NotFoundError);
    await expect(attempt(null)).rejects.toBeInstanceOf(UnauthenticatedError);
    expect((await listConfigurationsForGroup(viewer.actor, group.id)).total).toBe(before.total);
  });
});

describe("getConfiguration", () => {
  it("lets members read, answers NotFound to outsiders and for malformed ids, and lets admins read", async () => {
    const { viewer, outsider, admin, configuration } = await scenario();
    const read = await getConfiguration(viewer.actor, configuration.id);
    expect(read.document).toEqual(braneAntibranePair);
    expect(read.canEdit).toBe(false);
    await expect(getConfiguration(outsider.actor, configuration.id)).rejects.toBeInstanceOf(NotFoundError);
    await expect(getConfiguration(outsider.actor, "1234")).rejects.toBeInstanceOf(NotFoundError);
    expect((await getConfiguration(admin.actor, configuration.id)).role).toBe("owner");
  });
});

describe("updateConfiguration", () => {
  it("saves a new revision and result when the version matches", async () => {
    const { owner, configuration } = await scenario();
    const saved = await updateConfiguration(owner.actor, configuration.id, {
      expectedVersion: 1,
      document: moved(braneAntibranePair, 5),
      message: "Pulled apart",
    });
    // Past y_c = pi sqrt(2) the stretched tachyon is massive (braneAntibraneLightest(5) > 0), so the
    // lightest states are the massless vectors of each stack with itself.
    expect(braneAntibraneLightest(5)).toBeGreaterThan(0);
    expect(saved).toMatchObject({ version: 2, tachyonic: false, lightestMassSquared: 0 });
    expect(saved.currentRevision?.number).toBe(2);
    const second = await getRevisionByNumber(owner.actor, configuration.id, 2);
    expect(second.document.stacks[1]?.position["9"]).toBe(5);
    expect(second.message).toBe("Pulled apart");
    expect((await getRevision(owner.actor, second.id)).number).toBe(2);
    const first = await getRevisionByNumber(owner.actor, configuration.id, 1);
    expect(first.document).toEqual(braneAntibranePair);
    expect(first.isCurrent).toBe(false);
  });

  it("throws ConflictError with the current version on a stale save and writes nothing", async () => {
    const { editor, owner, configuration } = await scenario();
    await updateConfiguration(editor.actor, configuration.id, {
      expectedVersion: 1,
      document: moved(braneAntibranePair, 2),
      message: "Editor's change",
    });
    const before = await countRows(configuration.id);
    const stale = updateConfiguration(owner.actor, configuration.id, {
      expectedVersion: 1,
      document: moved(braneAntibranePair, 9),
      message: "Owner's stale change",
    });
    await expect(stale).rejects.toBeInstanceOf(ConflictError);
    await expect(stale).rejects.toMatchObject({ currentVersion: 2, status: 409 });
    expect(await countRows(configuration.id)).toEqual(before);
    const current = await getConfiguration(owner.actor, configuration.id);
    expect(current.version).toBe(2);
    expect(current.document.stacks[1]?.position["9"]).toBe(2);
  });

  it("answers the saved configuration as a fresh read shows it", async () => {
    const { editor, configuration } = await scenario();
    const saved = await updateConfiguration(editor.actor, configuration.id, {
      expectedVersion: 1,
      document: { ...moved(braneAntibranePair, 4), title: "  Closer pair  ", description: "moved in" },
      message: "Closer",
    });
    expect(saved).toMatchObject({ version: 2, title: "Closer pair", description: "moved in", role: "editor", canEdit: true });
    expect(saved.updatedAt.getTime()).toBeGreaterThan(configuration.updatedAt.getTime());
    expect(saved).toEqual(await getConfiguration(editor.actor, configuration.id));
  });

  it("answers a stale save with 409 before it checks the document, and writes nothing for either", async () => {
    const { editor, configuration } = await scenario();
    const untitled = { ...moved(braneAntibranePair, 3), title: " " };
    const before = await countRows(configuration.id);
    await expect(
      updateConfiguration(editor.actor, configuration.id, { expectedVersion: 1, document: untitled, message: "No title" }),
    ).rejects.toMatchObject({ status: 422, issues: [{ path: ["document", "title"] }] });
    await updateConfiguration(editor.actor, configuration.id, { expectedVersion: 1, document: moved(braneAntibranePair, 2), message: "Moved" });
    const afterSave = await countRows(configuration.id);
    await expect(
      updateConfiguration(editor.actor, configuration.id, { expectedVersion: 1, document: untitled, message: "Stale, no title" }),
    ).rejects.toMatchObject({ status: 409, currentVersion: 2 });
    expect(afterSave).toEqual({ revisions: (before.revisions ?? 0) + 1, audit: (before.audit ?? 0) + 1 });
    expect(await countRows(configuration.id)).toEqual(afterSave);
  });

  it("accepts exactly one of several concurrent saves from the same version", async () => {
    const { editor, configuration } = await scenario();
    const attempts = await Promise.allSettled(
      [1, 2, 3, 4, 5, 6].map((y) =>
        updateConfiguration(editor.actor, configuration.id, {
          expectedVersion: 1,
          document: moved(braneAntibranePair, y),
          message: `Try ${y}`,
        }),
      ),
    );
    const accepted = attempts.filter((attempt) => attempt.status === "fulfilled");
    const rejected = attempts.filter((attempt) => attempt.status === "rejected");
    expect(accepted).toHaveLength(1);
    expect(rejected.every((attempt) => attempt.reason instanceof ConflictError)).toBe(true);
    expect((await listRevisions(editor.actor, configuration.id)).map((revision) => revision.number)).toEqual([2, 1]);
  });

  it("refuses a viewer with ForbiddenError and an outsider with NotFoundError", async () => {
    const { viewer, outsider, configuration } = await scenario();
    const input = {
      expectedVersion: 1,
      document: moved(braneAntibranePair, 3),
      message: "Not allowed",
    };
    const before = await countRows(configuration.id);
    await expect(updateConfiguration(viewer.actor, configuration.id, input)).rejects.toBeInstanceOf(ForbiddenError);
    await expect(updateConfiguration(outsider.actor, configuration.id, input)).rejects.toBeInstanceOf(NotFoundError);
    expect(await countRows(configuration.id)).toEqual(before);
  });
});

describe("forkConfiguration", () => {
  it("copies the chosen revision into the actor's space and records where it came from", async () => {
    const { editor, viewer, configuration } = await scenario();
    const firstRevisionId = configuration.currentRevision?.id ?? "";
    await updateConfiguration(editor.actor, configuration.id, {
      expectedVersion: 1,
      document: moved(braneAntibranePair, 7),
      message: "Later change",
    });
    const fork = await forkConfiguration(viewer.actor, configuration.id, {
      targetGroupId: viewer.personalGroupId,
      revisionId: firstRevisionId,
    });
    expect(fork).toMatchObject({
      version: 1,
      group: { id: viewer.personalGroupId, kind: "personal" },
      role: "owner",
      tachyonic: true,
      forkedFromConfigurationId: configuration.id,
      forkedFrom: {
        configurationId: configuration.id,
        revisionId: firstRevisionId,
        revisionNumber: 1,
        title: braneAntibranePair.title,
      },
    });
    expect(fork.document).toEqual(braneAntibranePair);
    const [revision] = await listRevisions(viewer.actor, fork.id);
    expect(revision?.message).toBe(`Forked from "${braneAntibranePair.title}", revision 1`);
    const forkResult = (await getResultForRevision(viewer.actor, revision?.id ?? "")).result;
    expect(Number(forkResult.lightest[0]?.massSquared)).toBeCloseTo(braneAntibraneLightest(1.5), 10);
  });

  it("starts a fork from an unsaved draft in the same call, with the draft's own result", async () => {
    const { viewer, configuration } = await scenario();
    const draft = moved(braneAntibranePair, 6);
    const fork = await forkConfiguration(viewer.actor, configuration.id, {
      targetGroupId: viewer.personalGroupId,
      title: "My variant",
      document: draft,
    });
    expect(fork.document).toEqual({ ...draft, title: "My variant" });
    expect(fork.forkedFrom?.revisionNumber).toBe(1);
    const history = await listRevisions(viewer.actor, fork.id);
    expect(history.map((revision) => revision.message)).toEqual([
      `Forked from "${braneAntibranePair.title}", revision 1, with unsaved changes`,
    ]);
    // y = 6 is past y_c: the draft's result, not the source's tachyonic one.
    expect(fork).toMatchObject({ tachyonic: false, lightestMassSquared: 0 });
  });

  it("gives a repeat fork into the same space a numbered title, document and row alike", async () => {
    const { viewer, configuration } = await scenario();
    const titles: string[] = [];
    for (let i = 0; i < 3; i++) {
      const fork = await forkConfiguration(viewer.actor, configuration.id, { targetGroupId: viewer.personalGroupId, title: "Pair (fork)" });
      expect(fork.document.title).toBe(fork.title);
      titles.push(fork.title);
    }
    expect(titles).toEqual(["Pair (fork)", "Pair (fork 2)", "Pair (fork 3)"]);
  });

  it("needs read access to the source and editor access to the target", async () => {
    const { viewer, outsider, group, configuration } = await scenario();
    await expect(
      forkConfiguration(outsider.actor, configuration.id, { targetGroupId: outsider.personalGroupId }),
    ).rejects.toBeInstanceOf(NotFoundError);
    await expect(
      forkConfiguration(viewer.actor, configuration.id, { targetGroupId: group.id }),
    ).rejects.toBeInstanceOf(ForbiddenError);
    await expect(
      forkConfiguration(viewer.actor, configuration.id, { targetGroupId: outsider.personalGroupId }),
    ).rejects.toMatchObject({ status: 422, issues: [{ path: ["targetGroupId"] }] });
  });
});

describe("restoreRevision", () => {
  it("restores an old document as a new revision without rewriting history", async () => {
    const { editor, configuration } = await scenario();
    const first = configuration.currentRevision?.id ?? "";
    await updateConfiguration(editor.actor, configuration.id, {
      expectedVersion: 1,
      document: moved(braneAntibranePair, 6),
      message: "Apart",
    });
    const restored = await restoreRevision(editor.actor, configuration.id, first, { expectedVersion: 2 });
    expect(restored).toMatchObject({ version: 3, tachyonic: true });
    expect(restored.lightestMassSquared).toBeCloseTo(braneAntibraneLightest(1.5), 10);
    expect(restored.document).toEqual(braneAntibranePair);
    const history = await listRevisions(editor.actor, configuration.id);
    expect(history.map((revision) => [revision.number, revision.message])).toEqual([
      [3, "Restored revision 1"],
      [2, "Apart"],
      [1, "First sketch"],
    ]);
    await expect(
      restoreRevision(editor.actor, configuration.id, first, { expectedVersion: 2 }),
    ).rejects.toBeInstanceOf(ConflictError);
  });

  it("recomputes a result stored by an older engine version instead of copying it", async () => {
    const { editor, configuration } = await scenario();
    const first = configuration.currentRevision?.id ?? "";
    await db
      .update(results)
      // As a row stored by an older engine, before results carried content hashes.
      .set({ engineVersion: "0.9.0", contentHash: null, result: sql`jsonb_set(${results.result}::jsonb, '{engineVersion}', '"0.9.0"')::json` })
      .where(eq(results.revisionId, first));
    const restored = await restoreRevision(editor.actor, configuration.id, first, { expectedVersion: 1 });
    const stored = await getResultForRevision(editor.actor, restored.currentRevision?.id ?? "");
    expect(stored.engineVersion).toBe(ENGINE_VERSION);
    expect(Number(stored.result.lightest[0]?.massSquared)).toBeCloseTo(braneAntibraneLightest(1.5), 10);
  });

  it("refuses viewers", async () => {
    const { viewer, configuration } = await scenario();
    await expect(
      restoreRevision(viewer.actor, configuration.id, configuration.currentRevision?.id ?? ""),
    ).rejects.toBeInstanceOf(ForbiddenError);
  });
});

describe("soft deletion", () => {
  it("hides a deleted configuration and can bring it back", async () => {
    const { editor, viewer, group, configuration } = await scenario();
    await expect(softDeleteConfiguration(viewer.actor, configuration.id)).rejects.toBeInstanceOf(ForbiddenError);
    await softDeleteConfiguration(editor.actor, configuration.id);
    await expect(getConfiguration(editor.actor, configuration.id)).rejects.toBeInstanceOf(NotFoundError);
    expect((await listConfigurationsForGroup(editor.actor, group.id)).total).toBe(0);
    const [row] = await db.select().from(configurations).where(eq(configurations.id, configuration.id));
    expect(row?.deletedAt).toBeInstanceOf(Date);
    const back = await undeleteConfiguration(editor.actor, configuration.id);
    expect(back.id).toBe(configuration.id);
    expect((await listConfigurationsForGroup(editor.actor, group.id)).total).toBe(1);
  });
});

describe("lists", () => {
  it("lists a group's configurations for members only, with search and sorting", async () => {
    const { editor, viewer, outsider, group } = await scenario();
    await createConfiguration(editor.actor, group.id, twoTwoBraneStacks, "Second");
    const byTitle = await listConfigurationsForGroup(viewer.actor, group.id, { sort: "title" });
    expect(byTitle.items.map((item) => item.title)).toEqual([braneAntibranePair.title, twoTwoBraneStacks.title]);
    const byLightest = await listConfigurationsForGroup(viewer.actor, group.id, { sort: "lightest", direction: "asc" });
    // Two D2 stacks of the same orientation: the lightest states are massless (the aa vector).
    const lightest = byLightest.items.map((item) => item.lightestMassSquared ?? Number.NaN);
    expect(lightest[0]).toBeCloseTo(braneAntibraneLightest(1.5), 10);
    expect(lightest[1]).toBe(0);
    const searched = await listConfigurationsForGroup(viewer.actor, group.id, { search: "d2 STACK" });
    expect(searched.items.map((item) => item.title)).toEqual([twoTwoBraneStacks.title]);
    await expect(listConfigurationsForGroup(outsider.actor, group.id)).rejects.toBeInstanceOf(NotFoundError);
  });

  it("lists the actor's own configurations, or everything readable", async () => {
    const { editor, viewer, group } = await scenario();
    expect((await listConfigurationsForUser(editor.actor)).total).toBe(1);
    expect((await listConfigurationsForUser(viewer.actor)).total).toBe(0);
    const readable = await listConfigurationsForUser(viewer.actor, { scope: "accessible" });
    expect(readable.items.map((item) => item.group.id)).toEqual([group.id]);
  });
});

describe("lab starters", () => {
  it("lets a lab owner publish a starter and see the students' forks", async () => {
    const instructor = await createTestUser({ label: "instructor" });
    const student = await createTestUser({ label: "student" });
    const lab = await createTestGroup(instructor.actor, [{ actor: student.actor, role: "viewer" }], "lab");
    const starter = await createConfiguration(
      instructor.actor,
      lab.id,
      twoTwoBraneStacks,
      "Starter",
      { isStarter: true },
    );
    expect(starter.isStarter).toBe(true);
    const fork = await forkConfiguration(student.actor, starter.id, { targetGroupId: student.personalGroupId });
    const forks = await listForksOfConfiguration(instructor.actor, starter.id);
    expect(forks.items.map((item) => [item.id, item.author.id])).toEqual([[fork.id, student.actor.id]]);
    await expect(listForksOfConfiguration(student.actor, starter.id)).rejects.toBeInstanceOf(ForbiddenError);
    await expect(setConfigurationStarter(student.actor, starter.id, false)).rejects.toBeInstanceOf(ForbiddenError);
  });

  it("lets the lab's instructors read a student's fork of a starter, and nobody else outside the student's space", async () => {
    const instructor = await createTestUser({ label: "instructor" });
    const assistant = await createTestUser({ label: "assistant" });
    const student = await createTestUser({ label: "student" });
    const classmate = await createTestUser({ label: "classmate" });
    const lab = await createTestGroup(
      instructor.actor,
      [
        { actor: assistant.actor, role: "editor" },
        { actor: student.actor, role: "viewer" },
        { actor: classmate.actor, role: "viewer" },
      ],
      "lab",
    );
    const starter = await createConfiguration(instructor.actor, lab.id, twoTwoBraneStacks, "Starter", { isStarter: true });
    const fork = await forkConfiguration(student.actor, starter.id, { targetGroupId: student.personalGroupId });

    const seen = await getConfiguration(instructor.actor, fork.id);
    expect(seen).toMatchObject({ id: fork.id, role: "viewer", canEdit: false, forkedFrom: { configurationId: starter.id, title: twoTwoBraneStacks.title } });
    expect((await getConfiguration(assistant.actor, fork.id)).role).toBe("viewer");
    expect((await listRevisions(instructor.actor, fork.id)).map((revision) => revision.number)).toEqual([1]);
    await expect(
      updateConfiguration(instructor.actor, fork.id, { expectedVersion: 1, document: twoTwoBraneStacks, message: "not mine" }),
    ).rejects.toBeInstanceOf(ForbiddenError);
    // A fellow student of the lab is no instructor: the fork stays hidden.
    await expect(getConfiguration(classmate.actor, fork.id)).rejects.toBeInstanceOf(NotFoundError);
    // Once the starter is withdrawn the fork is the student's alone again.
    await setConfigurationStarter(instructor.actor, starter.id, false);
    await expect(getConfiguration(instructor.actor, fork.id)).rejects.toBeInstanceOf(NotFoundError);
  });

  it("refuses starters outside lab groups", async () => {
    const { owner, group } = await scenario();
    await expect(
      createConfiguration(owner.actor, group.id, twoTwoBraneStacks, "", { isStarter: true }),
    ).rejects.toMatchObject({ status: 422, issues: [{ path: ["isStarter"] }] });
    expect((await listConfigurationsForGroup(owner.actor, group.id)).total).toBe(1);
  });
});
