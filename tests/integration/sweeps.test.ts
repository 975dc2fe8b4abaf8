import { eq, sql } from "drizzle-orm";
import { afterAll, describe, expect, it } from "vitest";
import { db } from "@/db/index";
import { createConfiguration, setConfigurationStarter } from "@/db/queries/configurations";
import { forkConfiguration } from "@/db/queries/forks";
import { storeChunkPoints, loadChunkWork } from "@/db/queries/sweep-work";
import { cancelSweep, getSweep, listLabSweeps, listSweepPoints, listSweeps, maxRunningPointsPerAccount, resumeSweep, startSweep } from "@/db/queries/sweeps";
import { sweepChunks, sweeps } from "@/db/schema";
import { chunkJobId, stopSweepQueue } from "@/db/sweep-queue";
import { braneAntibranePair } from "@/lib/demo-configurations";
import { ForbiddenError, NotFoundError, RateLimitError, ValidationError } from "@/lib/errors";
import { computeChunk } from "@/lib/server/sweeps/worker";
import { sweepLimits, type SweepDefinition } from "@/lib/sweeps";
import { createTestGroup, createTestUser } from "@/tests/fixtures/users";

afterAll(async () => {
  await stopSweepQueue();
});

const separation = (steps: number): SweepDefinition => ({
  format: 1,
  dimensions: [{ kind: "position", stack: "anti", axis: 9, values: { kind: "range", from: 0, to: 8, steps } }],
});

async function jobStates(sweepId: string): Promise<Record<string, number>> {
  const result = await db.execute<{ state: string; count: number }>(
    sql`select state::text, count(*)::int as count from pgboss.job where name = 'sweep-chunk' and data->>'sweepId' = ${sweepId} group by state`,
  );
  return Object.fromEntries(result.rows.map((row) => [row.state, row.count]));
}

async function sweepRows(sweepId: string) {
  return db.select().from(sweeps).where(eq(sweeps.id, sweepId));
}

describe("startSweep", () => {
  it("queues one job per chunk and lets viewers see but not start", async () => {
    const owner = await createTestUser({ label: "sweep-owner" });
    const viewer = await createTestUser({ label: "sweep-viewer" });
    const outsider = await createTestUser({ label: "sweep-outsider" });
    const group = await createTestGroup(owner.actor, [{ actor: viewer.actor, role: "viewer" }]);
    const configuration = await createConfiguration(owner.actor, group.id, braneAntibranePair, "base");
    const sweep = await startSweep(owner.actor, configuration.id, { definition: separation(1000), title: "pull apart" });
    expect(sweep).toMatchObject({ status: "running", totalPoints: 1000, donePoints: 0, title: "pull apart" });
    expect(await jobStates(sweep.id)).toEqual({ created: sweep.chunkCount });

    expect((await listSweeps(viewer.actor, configuration.id)).items.map((item) => item.id)).toEqual([sweep.id]);
    expect((await getSweep(viewer.actor, sweep.id)).canControl).toBe(false);
    await expect(startSweep(viewer.actor, configuration.id, { definition: separation(3) })).rejects.toThrow(ForbiddenError);
    await expect(cancelSweep(viewer.actor, sweep.id)).rejects.toThrow(ForbiddenError);
    await expect(getSweep(outsider.actor, sweep.id)).rejects.toThrow(NotFoundError);
    await expect(listSweepPoints(outsider.actor, sweep.id)).rejects.toThrow(NotFoundError);
  });

  it("refuses a sweep over the point limit with a clear message before anything is stored or queued", async () => {
    const owner = await createTestUser({ label: "sweep-limit" });
    const configuration = await createConfiguration(owner.actor, owner.personalGroupId, braneAntibranePair, "base");
    const tooBig: SweepDefinition = {
      format: 1,
      dimensions: [
        { kind: "position", stack: "anti", axis: 9, values: { kind: "range", from: 0, to: 8, steps: 1000 } },
        { kind: "position", stack: "anti", axis: 8, values: { kind: "range", from: 0, to: 8, steps: 201 } },
      ],
    };
    const refusal = await startSweep(owner.actor, configuration.id, { definition: tooBig }).catch((error: unknown) => error);
    expect(refusal).toBeInstanceOf(ValidationError);
    expect((refusal as ValidationError).issues).toEqual([
      { path: ["definition", "dimensions"], message: expect.stringContaining(`This sweep has 201,000 points; at most 200,000 are allowed`) },
    ]);
    expect(sweepLimits.maxPoints).toBe(200_000);
    expect((await listSweeps(owner.actor, configuration.id)).items).toEqual([]);
  });

  it("refuses a sweep that would take the account past its running points, and counts only what is left", async () => {
    const owner = await createTestUser({ label: "sweep-busy" });
    const configuration = await createConfiguration(owner.actor, owner.personalGroupId, braneAntibranePair, "base");
    const big: SweepDefinition = {
      format: 1,
      dimensions: [
        { kind: "position", stack: "anti", axis: 9, values: { kind: "range", from: 0, to: 8, steps: 1000 } },
        { kind: "position", stack: "anti", axis: 8, values: { kind: "range", from: 0, to: 8, steps: 200 } },
      ],
    };
    const first = await startSweep(owner.actor, configuration.id, { definition: big });
    const second = await startSweep(owner.actor, configuration.id, { definition: big });
    expect(first.totalPoints + second.totalPoints).toBe(maxRunningPointsPerAccount);
    const refusal = await startSweep(owner.actor, configuration.id, { definition: separation(1) }).catch((error: unknown) => error);
    expect(refusal).toBeInstanceOf(RateLimitError);
    expect((refusal as Error).message).toMatch(/at most 400,000 running at once/);
    // A cancelled sweep no longer counts.
    await cancelSweep(owner.actor, first.id);
    await expect(startSweep(owner.actor, configuration.id, { definition: separation(1) })).resolves.toMatchObject({ totalPoints: 1 });
    await cancelSweep(owner.actor, second.id);
  });
});

describe("fair scheduling", () => {
  it("tags a second account's chunks from the queue's virtual time, not behind the first account's backlog", async () => {
    const [a, b] = await Promise.all([createTestUser({ label: "fair-a" }), createTestUser({ label: "fair-b" })]);
    const [configA, configB] = await Promise.all([
      createConfiguration(a.actor, a.personalGroupId, braneAntibranePair, "a"),
      createConfiguration(b.actor, b.personalGroupId, braneAntibranePair, "b"),
    ]);
    const big = await startSweep(a.actor, configA.id, { definition: separation(5000) });
    const small = await startSweep(b.actor, configB.id, { definition: separation(500) });
    const tags = async (sweepId: string) =>
      (await db.select({ tag: sweepChunks.tag }).from(sweepChunks).where(eq(sweepChunks.sweepId, sweepId)).orderBy(sweepChunks.chunkIndex)).map((row) => row.tag);
    const bigTags = await tags(big.id);
    const smallTags = await tags(small.id);
    // b's chunks start no later than a's still-waiting ones, so b never waits for a's whole sweep.
    expect(smallTags[0]).toBeLessThanOrEqual(bigTags[0] ?? 0);
    expect(Math.max(...smallTags)).toBeLessThan(Math.max(...bigTags));
    // The queue's priority is the negative tag.
    const job = await db.execute<{ priority: number }>(sql`select priority from pgboss.job where name = 'sweep-chunk' and id = ${chunkJobId({ sweepId: small.id, chunk: 0, generation: 1 })}::uuid`);
    expect((job.rows[0]?.priority ?? Number.NaN) + (smallTags[0] ?? 0)).toBe(0);
    await Promise.all([cancelSweep(a.actor, big.id), cancelSweep(b.actor, small.id)]);
  });
});

describe("cancelSweep and resumeSweep", () => {
  it("takes waiting chunks off the queue, then puts only the unstored ones back as a new generation", async () => {
    const owner = await createTestUser({ label: "sweep-cancel" });
    const configuration = await createConfiguration(owner.actor, owner.personalGroupId, { ...braneAntibranePair, levels: 60 }, "base");
    const sweep = await startSweep(owner.actor, configuration.id, { definition: separation(200) });
    expect(sweep.chunkCount).toBeGreaterThan(2);
    // A worker stores chunk 0 (as lib/server/sweeps/worker.ts does), twice: the second store adds nothing.
    const work = await loadChunkWork(sweep.id, 0);
    if (!work) throw new Error("chunk 0 should be waiting");
    const points = computeChunk(work);
    expect(await storeChunkPoints(sweep.id, 0, points)).toBe(points.length);
    expect(await storeChunkPoints(sweep.id, 0, points)).toBe(0);
    expect((await getSweep(owner.actor, sweep.id)).donePoints).toBe(points.length);

    const cancelled = await cancelSweep(owner.actor, sweep.id);
    expect(cancelled.status).toBe("cancelled");
    expect(await loadChunkWork(sweep.id, 1)).toBeNull();
    expect((await jobStates(sweep.id)).cancelled).toBe(sweep.chunkCount - 1);
    expect(await cancelSweep(owner.actor, sweep.id)).toMatchObject({ status: "cancelled" });

    const resumed = await resumeSweep(owner.actor, sweep.id);
    expect(resumed.status).toBe("running");
    const [row] = await sweepRows(sweep.id);
    expect(row?.generation).toBe(2);
    // Generation 2 has a job for every chunk not yet stored, and none for chunk 0.
    const fresh = await db.execute<{ chunk: number; state: string }>(
      sql`select (data->>'chunk')::int as chunk, state::text from pgboss.job where name = 'sweep-chunk' and data->>'sweepId' = ${sweep.id} and (data->>'generation')::int = 2 order by 1`,
    );
    expect(fresh.rows).toEqual(Array.from({ length: sweep.chunkCount - 1 }, (_u, i) => ({ chunk: i + 1, state: "created" })));
    const points2 = await listSweepPoints(owner.actor, sweep.id);
    expect(points2.index).toEqual(points.map((point) => point.index));
    await cancelSweep(owner.actor, sweep.id);
  });
});

describe("labs", () => {
  it("offers the instructor's starter sweep to students and shows a student's sweep in the lab overview", async () => {
    const [instructor, student] = await Promise.all([createTestUser({ label: "instructor" }), createTestUser({ label: "student" })]);
    const lab = await createTestGroup(instructor.actor, [{ actor: student.actor, role: "viewer" }], "lab");
    const starter = await createConfiguration(instructor.actor, lab.id, braneAntibranePair, "starter");
    await expect(startSweep(instructor.actor, starter.id, { definition: separation(9), attachToStarter: true })).rejects.toThrow(ValidationError);
    await setConfigurationStarter(instructor.actor, starter.id, true);
    const attached = await startSweep(instructor.actor, starter.id, { definition: separation(9), title: "Find y_c", attachToStarter: true });
    await cancelSweep(instructor.actor, attached.id);

    const fork = await forkConfiguration(student.actor, starter.id, { targetGroupId: student.personalGroupId });
    const { suggested } = await listSweeps(student.actor, fork.id);
    expect(suggested).toEqual([{ id: attached.id, title: "Find y_c", definition: separation(9), starterId: starter.id, starterTitle: starter.title }]);
    const own = await startSweep(student.actor, fork.id, { definition: suggested[0]?.definition ?? separation(1) });

    const overview = await listLabSweeps(instructor.actor, lab.id);
    expect(overview[fork.id]?.map((item) => item.id)).toEqual([own.id]);
    await expect(listLabSweeps(student.actor, lab.id)).rejects.toThrow(ForbiddenError);
    await cancelSweep(student.actor, own.id);
  });
});
