import "server-only";
import { and, asc, desc, eq, inArray, isNull, sql } from "drizzle-orm";
import type { Configuration } from "../../lib/boundary/types";
import { NotFoundError, RateLimitError, ValidationError } from "../../lib/errors";
import {
  checkSweepDefinition,
  chunkCount,
  chunkSizeFor,
  firstFairTag,
  formatPointCount,
  sweepPointCount,
  toPointColumns,
  type StoredSweepPoint,
  type SweepDefinition,
  type SweepPointColumns,
} from "../../lib/sweeps";
import { db, type Executor, type Transaction } from "../index";
import { configurations, memberships, revisions, sweepChunks, sweepPoints, sweeps, users, type SweepRow, type SweepStatus } from "../schema";
import { cancelChunkJobs, enqueueChunks, type SweepChunkJob } from "../sweep-queue";
import { assertUuid, requireActor, requireGroupRole, roleAtLeast, type Actor } from "./actor";
import { recordAudit } from "./audit";
import { requireConfigurationRole } from "./configuration-access";

/*
 * Sweeps as the app sees them: start, read, cancel and resume, with the configuration's roles
 * (viewers see a sweep, editors start, cancel and resume it). The work itself is done by the
 * worker processes through db/queries/sweep-work.ts.
 */

/**
 * Points an account may have running at once over all its sweeps: one account's backlog stays
 * bounded, and fair scheduling (lib/sweeps/chunks.ts) shares the workers between accounts.
 */
export const maxRunningPointsPerAccount = 400_000;

/** A sweep and its progress. */
export interface SweepDto {
  id: string;
  configurationId: string;
  revisionId: string;
  title: string;
  definition: SweepDefinition;
  status: SweepStatus;
  totalPoints: number;
  donePoints: number;
  chunkSize: number;
  chunkCount: number;
  attachedToStarter: boolean;
  failure: string | null;
  createdBy: { id: string; name: string };
  createdAt: Date;
  startedAt: Date;
  finishedAt: Date | null;
  /** Points stored per second since the sweep last started or resumed; null before the first chunk. */
  pointsPerSecond: number | null;
  /** Estimated seconds until every point is stored, at that rate; null when unknown or not running. */
  secondsLeft: number | null;
  /** True when the caller may cancel and resume it (editor or better on the configuration). */
  canControl: boolean;
}

/** A sweep with the configuration it varies, for the sweep page. */
export interface SweepDetailDto extends SweepDto {
  configurationTitle: string;
  revisionNumber: number;
  /** The saved document every point varies. */
  document: Configuration;
}

/** A sweep a lab's instructor attached to the starter this configuration was forked from. */
export interface SuggestedSweepDto {
  id: string;
  title: string;
  definition: SweepDefinition;
  starterId: string;
  starterTitle: string;
}

/** Input of {@link startSweep}. */
export interface StartSweepInput {
  definition: SweepDefinition;
  title?: string;
  /** Offer the sweep to students who fork this starter (lab starters only). */
  attachToStarter?: boolean;
}

/**
 * Starts a sweep of a configuration's current revision (editor or better). Refuses, before
 * anything is stored or queued, a definition the configuration does not fit, a sweep over
 * `sweepLimits.maxPoints` points (422), and one that would take the account past
 * `maxRunningPointsPerAccount` running points (429). The chunks get fair-share tags and go on the queue.
 */
export async function startSweep(actor: Actor | null, configurationId: string, input: StartSweepInput): Promise<SweepDto> {
  const author = requireActor(actor);
  const { sweep, jobs } = await db.transaction(async (tx) => {
    const access = await requireConfigurationRole(tx, actor, configurationId, "editor");
    if (input.attachToStarter && !access.row.isStarter) {
      throw ValidationError.at(["attachToStarter"], "Only a lab starter can offer a sweep to students; publish it as a starter first.");
    }
    const revisionId = access.row.currentRevisionId;
    const [revision] = revisionId ? await tx.select({ document: revisions.document }).from(revisions).where(eq(revisions.id, revisionId)).limit(1) : [];
    if (!revisionId || !revision) throw ValidationError.at(["configurationId"], "Save the configuration before sweeping it.");
    const problems = checkSweepDefinition(revision.document, input.definition);
    if (problems.length > 0) {
      throw new ValidationError(problems.map((problem) => ({ path: ["definition", ...problem.path], message: problem.message })));
    }
    const totalPoints = Number(sweepPointCount(input.definition));
    await lockScheduling(tx);
    await assertRunningLimit(tx, author.id, totalPoints);
    const chunkSize = chunkSizeFor(revision.document, totalPoints);
    const chunks = chunkCount(totalPoints, chunkSize);
    const [created] = await tx
      .insert(sweeps)
      .values({
        configurationId,
        revisionId,
        title: input.title?.trim() ?? "",
        definition: input.definition,
        totalPoints,
        chunkSize,
        chunkCount: chunks,
        attachedToStarter: input.attachToStarter ?? false,
        createdBy: author.id,
      })
      .returning();
    if (!created) throw new Error("Sweep insert returned no row");
    const indices = Array.from({ length: chunks }, (_unused, i) => i);
    const queued = await tagChunks(tx, created, author.id, indices, "insert");
    await recordAudit(tx, {
      actorId: author.id,
      groupId: access.row.groupId,
      action: "sweep.start",
      entityType: "sweep",
      entityId: created.id,
      details: { configurationId, totalPoints },
    });
    return { sweep: created, jobs: queued };
  });
  await enqueueAfterCommit(jobs);
  return toSweepDto(sweep, { id: author.id, name: author.name }, true);
}

/** The sweeps of a configuration, newest first, and those its lab starter suggests (viewer or better). */
export async function listSweeps(actor: Actor | null, configurationId: string): Promise<{ items: SweepDto[]; suggested: SuggestedSweepDto[] }> {
  const access = await requireConfigurationRole(db, actor, configurationId, "viewer");
  const canControl = roleAtLeast(access.role, "editor");
  const rows = await db
    .select({ sweep: sweeps, authorName: users.name })
    .from(sweeps)
    .innerJoin(users, eq(users.id, sweeps.createdBy))
    .where(eq(sweeps.configurationId, configurationId))
    .orderBy(desc(sweeps.createdAt))
    .limit(200);
  const suggested = await suggestedSweeps(actor, access.row.forkedFromConfigurationId);
  return {
    items: rows.map((row) => toSweepDto(row.sweep, { id: row.sweep.createdBy, name: row.authorName }, canControl)),
    suggested,
  };
}

/** One sweep with its base document (viewer or better on its configuration). */
export async function getSweep(actor: Actor | null, sweepId: string): Promise<SweepDetailDto> {
  const { sweep, role } = await requireSweepRole(actor, sweepId, "viewer");
  const [row] = await db
    .select({ authorName: users.name, title: configurations.title, number: revisions.number, document: revisions.document })
    .from(sweeps)
    .innerJoin(users, eq(users.id, sweeps.createdBy))
    .innerJoin(configurations, eq(configurations.id, sweeps.configurationId))
    .innerJoin(revisions, eq(revisions.id, sweeps.revisionId))
    .where(eq(sweeps.id, sweep.id))
    .limit(1);
  if (!row) throw new NotFoundError("No such sweep.");
  return {
    ...toSweepDto(sweep, { id: sweep.createdBy, name: row.authorName }, roleAtLeast(role, "editor")),
    configurationTitle: row.title,
    revisionNumber: row.number,
    document: row.document,
  };
}

/** Every stored point of a sweep, column by column (viewer or better). */
export async function listSweepPoints(actor: Actor | null, sweepId: string): Promise<SweepPointColumns & { totalPoints: number }> {
  const { sweep } = await requireSweepRole(actor, sweepId, "viewer");
  const rows = await db.select().from(sweepPoints).where(eq(sweepPoints.sweepId, sweep.id)).orderBy(asc(sweepPoints.pointIndex));
  const points: StoredSweepPoint[] = rows.map((row) =>
    row.problem !== null
      ? { index: row.pointIndex, status: "invalid", problem: row.problem }
      : {
          index: row.pointIndex,
          status: "ok",
          supercharges: row.supercharges,
          tachyonicSectors: row.tachyonicSectors,
          lightestMassSquared: row.lightestMassSquared,
          masslessStates: row.masslessStates ?? "0",
          gaugeGroup: row.gaugeGroup ?? "",
        },
  );
  return { ...toPointColumns(points), totalPoints: sweep.totalPoints };
}

/**
 * Cancels a running sweep (editor or better): its waiting chunks leave the queue; a chunk a
 * worker is computing still stores its points. Cancelling a sweep that is not running changes nothing.
 */
export async function cancelSweep(actor: Actor | null, sweepId: string): Promise<SweepDto> {
  const author = requireActor(actor);
  const { sweep: found, groupId } = await requireSweepRole(actor, sweepId, "editor");
  const { sweep, waiting } = await db.transaction(async (tx) => {
    const [updated] = await tx
      .update(sweeps)
      .set({ status: "cancelled", finishedAt: new Date() })
      .where(and(eq(sweeps.id, found.id), eq(sweeps.status, "running")))
      .returning();
    if (!updated) return { sweep: found, waiting: [] as number[] };
    const open = await tx
      .select({ chunk: sweepChunks.chunkIndex })
      .from(sweepChunks)
      .where(and(eq(sweepChunks.sweepId, found.id), isNull(sweepChunks.doneAt)));
    await recordAudit(tx, { actorId: author.id, groupId, action: "sweep.cancel", entityType: "sweep", entityId: found.id });
    return { sweep: updated, waiting: open.map((row) => row.chunk) };
  });
  try {
    await cancelChunkJobs(waiting.map((chunk) => ({ sweepId: sweep.id, chunk, generation: sweep.generation })));
  } catch (error) {
    // The sweep is cancelled in the database; workers skip its chunks even if their jobs remain.
    console.error(`sweep ${sweep.id}: could not take its chunks off the queue`, error);
  }
  return withAuthor(sweep, true);
}

/**
 * Resumes a cancelled or failed sweep (editor or better): the chunks not yet stored go back on
 * the queue with fresh fair-share tags, within the account's running limit. A running or
 * completed sweep is left as it is.
 */
export async function resumeSweep(actor: Actor | null, sweepId: string): Promise<SweepDto> {
  const author = requireActor(actor);
  const { sweep: found, groupId } = await requireSweepRole(actor, sweepId, "editor");
  if (found.status === "running" || found.status === "completed") return withAuthor(found, true);
  const { sweep, jobs } = await db.transaction(async (tx) => {
    await lockScheduling(tx);
    const [current] = await tx.select().from(sweeps).where(eq(sweeps.id, found.id)).for("update").limit(1);
    if (!current || current.status === "running" || current.status === "completed") return { sweep: current ?? found, jobs: [] };
    await assertRunningLimit(tx, author.id, current.totalPoints - current.donePoints);
    const open = await tx
      .select({ chunk: sweepChunks.chunkIndex })
      .from(sweepChunks)
      .where(and(eq(sweepChunks.sweepId, current.id), isNull(sweepChunks.doneAt)))
      .orderBy(asc(sweepChunks.chunkIndex));
    const done = open.length === 0 || current.donePoints >= current.totalPoints;
    const [updated] = await tx
      .update(sweeps)
      .set(
        done
          ? { status: "completed", finishedAt: new Date(), failure: null }
          : { status: "running", generation: current.generation + 1, startedAt: new Date(), startedPoints: current.donePoints, finishedAt: null, failure: null },
      )
      .where(eq(sweeps.id, current.id))
      .returning();
    if (!updated) throw new Error("Sweep update returned no row");
    const queued = done ? [] : await tagChunks(tx, updated, current.createdBy, open.map((row) => row.chunk), "update");
    await recordAudit(tx, { actorId: author.id, groupId, action: "sweep.resume", entityType: "sweep", entityId: current.id });
    return { sweep: updated, jobs: queued };
  });
  await enqueueAfterCommit(jobs);
  return withAuthor(sweep, true);
}

/** A student's sweep as the lab's instructor sees it: the summary, never the points. */
export interface LabSweepDto {
  id: string;
  configurationId: string;
  title: string;
  status: SweepStatus;
  totalPoints: number;
  donePoints: number;
  supersymmetricPoints: number;
  tachyonicPoints: number;
  createdAt: Date;
}

/**
 * The sweeps lab members ran on their forks of the lab's starters, by fork configuration id
 * (owners and editors of the lab, as the starter comparison of db/queries/labs.ts).
 */
export async function listLabSweeps(actor: Actor | null, labGroupId: string): Promise<Record<string, LabSweepDto[]>> {
  assertUuid(labGroupId, "group");
  await requireGroupRole(db, actor, labGroupId, "editor");
  const starters = db
    .select({ id: configurations.id })
    .from(configurations)
    .where(and(eq(configurations.groupId, labGroupId), eq(configurations.isStarter, true), isNull(configurations.deletedAt)));
  const rows = await db
    .select({
      sweep: sweeps,
      supersymmetric: sql<number>`(select count(*)::int from ${sweepPoints} p where p.sweep_id = ${sweeps.id} and p.problem is null and p.tachyonic_sectors = 0 and p.supercharges > 0)`,
      tachyonic: sql<number>`(select count(*)::int from ${sweepPoints} p where p.sweep_id = ${sweeps.id} and p.tachyonic_sectors > 0)`,
    })
    .from(sweeps)
    .innerJoin(configurations, eq(configurations.id, sweeps.configurationId))
    // Sweeps by people who are (still) members of the lab, on their forks of its starters.
    .innerJoin(memberships, and(eq(memberships.userId, sweeps.createdBy), eq(memberships.groupId, labGroupId)))
    .where(and(inArray(configurations.forkedFromConfigurationId, starters), isNull(configurations.deletedAt)))
    .orderBy(desc(sweeps.createdAt));
  const byConfiguration: Record<string, LabSweepDto[]> = {};
  for (const row of rows) {
    (byConfiguration[row.sweep.configurationId] ??= []).push({
      id: row.sweep.id,
      configurationId: row.sweep.configurationId,
      title: row.sweep.title,
      status: row.sweep.status,
      totalPoints: row.sweep.totalPoints,
      donePoints: row.sweep.donePoints,
      supersymmetricPoints: row.supersymmetric,
      tachyonicPoints: row.tachyonic,
      createdAt: row.sweep.createdAt,
    });
  }
  return byConfiguration;
}

// ---------------------------------------------------------------------------------------------

/** The sweep with the caller's role on its configuration; 404 when the caller may not see it. */
async function requireSweepRole(actor: Actor | null, sweepId: string, minimum: "viewer" | "editor") {
  requireActor(actor);
  assertUuid(sweepId, "sweep");
  const [sweep] = await db.select().from(sweeps).where(eq(sweeps.id, sweepId)).limit(1);
  if (!sweep) throw new NotFoundError("No such sweep.");
  try {
    const access = await requireConfigurationRole(db, actor, sweep.configurationId, minimum);
    return { sweep, role: access.role, groupId: access.row.groupId };
  } catch (error) {
    if (error instanceof NotFoundError) throw new NotFoundError("No such sweep.");
    throw error;
  }
}

/** Serialises scheduling decisions (fair tags, running limits) across app instances. */
async function lockScheduling(tx: Transaction): Promise<void> {
  await tx.execute(sql`select pg_advisory_xact_lock(hashtext('mooring.sweep-scheduling'))`);
}

async function assertRunningLimit(tx: Transaction, accountId: string, adding: number): Promise<void> {
  const [row] = await tx
    .select({ running: sql<number>`coalesce(sum(${sweeps.totalPoints} - ${sweeps.donePoints}), 0)::int` })
    .from(sweeps)
    .where(and(eq(sweeps.createdBy, accountId), eq(sweeps.status, "running")));
  const running = row?.running ?? 0;
  if (running + adding > maxRunningPointsPerAccount) {
    throw new RateLimitError(
      60,
      `Your running sweeps have ${formatPointCount(running)} points still to compute, and this one adds ${formatPointCount(adding)}; ` +
        `an account may have at most ${formatPointCount(maxRunningPointsPerAccount)} running at once. Wait for a sweep to finish or cancel one.`,
    );
  }
}

/**
 * Gives chunks their fair-share start tags (inserting or updating their rows) and returns them as jobs.
 * Tags start at max(smallest waiting tag, one past the account's largest waiting tag).
 */
async function tagChunks(tx: Transaction, sweep: SweepRow, accountId: string, chunks: number[], mode: "insert" | "update"): Promise<SweepChunkJob[]> {
  const [waiting] = await tx
    .select({
      smallest: sql<number | null>`min(${sweepChunks.tag})`,
      accountLargest: sql<number | null>`max(${sweepChunks.tag}) filter (where ${sweeps.createdBy} = ${accountId})`,
    })
    .from(sweepChunks)
    .innerJoin(sweeps, eq(sweeps.id, sweepChunks.sweepId))
    .where(and(isNull(sweepChunks.doneAt), eq(sweeps.status, "running"), sql`${sweeps.id} <> ${sweep.id}`));
  const first = firstFairTag(waiting?.smallest ?? null, waiting?.accountLargest ?? null);
  const jobs = chunks.map((chunk, i) => ({ sweepId: sweep.id, chunk, generation: sweep.generation, tag: first + i }));
  for (let i = 0; i < jobs.length; i += 1000) {
    const slice = jobs.slice(i, i + 1000);
    if (mode === "insert") {
      await tx.insert(sweepChunks).values(slice.map((job) => ({ sweepId: sweep.id, chunkIndex: job.chunk, tag: job.tag })));
    } else {
      // Whole numbers only, so the arrays travel as PostgreSQL array literals.
      const chunkList = `{${slice.map((job) => job.chunk).join(",")}}`;
      const tagList = `{${slice.map((job) => job.tag).join(",")}}`;
      await tx.execute(sql`
        update ${sweepChunks} set tag = v.tag
        from unnest(${chunkList}::int[], ${tagList}::int[]) as v(chunk, tag)
        where ${sweepChunks.sweepId} = ${sweep.id} and ${sweepChunks.chunkIndex} = v.chunk`);
    }
  }
  return jobs;
}

/** Puts chunks on the queue after their rows are committed; a failure is healed by the workers' reconciliation. */
async function enqueueAfterCommit(jobs: SweepChunkJob[]): Promise<void> {
  try {
    await enqueueChunks(jobs);
  } catch (error) {
    console.error("sweep: could not put chunks on the queue now; the workers will queue them", error);
  }
}

async function suggestedSweeps(actor: Actor | null, starterId: string | null): Promise<SuggestedSweepDto[]> {
  if (!starterId) return [];
  let starter;
  try {
    starter = await requireConfigurationRole(db, actor, starterId, "viewer");
  } catch (error) {
    // A student who left the lab no longer sees its starter, nor what it suggests.
    if (error instanceof NotFoundError) return [];
    throw error;
  }
  if (!starter.row.isStarter) return [];
  const rows = await db
    .select({ id: sweeps.id, title: sweeps.title, definition: sweeps.definition })
    .from(sweeps)
    .where(and(eq(sweeps.configurationId, starterId), eq(sweeps.attachedToStarter, true)))
    .orderBy(desc(sweeps.createdAt));
  return rows.map((row) => ({ ...row, starterId, starterTitle: starter.row.title }));
}

async function withAuthor(sweep: SweepRow, canControl: boolean, executor: Executor = db): Promise<SweepDto> {
  const [author] = await executor.select({ name: users.name }).from(users).where(eq(users.id, sweep.createdBy)).limit(1);
  return toSweepDto(sweep, { id: sweep.createdBy, name: author?.name ?? "" }, canControl);
}

function toSweepDto(sweep: SweepRow, createdBy: { id: string; name: string }, canControl: boolean): SweepDto {
  const elapsedSeconds = ((sweep.finishedAt ?? new Date()).getTime() - sweep.startedAt.getTime()) / 1000;
  const stored = sweep.donePoints - sweep.startedPoints;
  const pointsPerSecond = stored > 0 && elapsedSeconds > 0 ? stored / elapsedSeconds : null;
  const left = sweep.totalPoints - sweep.donePoints;
  return {
    id: sweep.id,
    configurationId: sweep.configurationId,
    revisionId: sweep.revisionId,
    title: sweep.title,
    definition: sweep.definition,
    status: sweep.status,
    totalPoints: sweep.totalPoints,
    donePoints: sweep.donePoints,
    chunkSize: sweep.chunkSize,
    chunkCount: sweep.chunkCount,
    attachedToStarter: sweep.attachedToStarter,
    failure: sweep.failure,
    createdBy,
    createdAt: sweep.createdAt,
    startedAt: sweep.startedAt,
    finishedAt: sweep.finishedAt,
    pointsPerSecond,
    secondsLeft: sweep.status === "running" && pointsPerSecond ? left / pointsPerSecond : null,
    canControl,
  };
}
