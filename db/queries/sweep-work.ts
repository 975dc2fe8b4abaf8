import "server-only";
import { and, asc, eq, isNull, sql } from "drizzle-orm";
import type { Configuration } from "../../lib/boundary/types";
import { chunkRange, type StoredSweepPoint, type SweepDefinition } from "../../lib/sweeps";
import { db } from "../index";
import { revisions, sweepChunks, sweepPoints, sweeps } from "../schema";
import type { SweepChunkJob } from "../sweep-queue";

/*
 * The workers' side of sweeps. These functions act for the system, not for a user: whoever
 * started the sweep was authorized then (db/queries/sweeps.ts), and a worker only computes and
 * stores what the sweep row says. Every write is idempotent, so a chunk may run any number of times.
 */

/** What a worker needs to compute one chunk. */
export interface ChunkWork {
  sweepId: string;
  chunk: number;
  /** Points [start, end). */
  start: number;
  end: number;
  document: Configuration;
  definition: SweepDefinition;
}

/** The immutable part of a sweep, kept by each worker once read. */
interface SweepBasis {
  document: Configuration;
  definition: SweepDefinition;
  chunkSize: number;
  totalPoints: number;
}

const bases = new Map<string, SweepBasis>();

/**
 * The work of a chunk, or null when there is nothing to do: the sweep is gone, no longer running,
 * or the chunk is already stored.
 */
export async function loadChunkWork(sweepId: string, chunk: number): Promise<ChunkWork | null> {
  const [state] = await db
    .select({ status: sweeps.status, doneAt: sweepChunks.doneAt })
    .from(sweeps)
    .innerJoin(sweepChunks, and(eq(sweepChunks.sweepId, sweeps.id), eq(sweepChunks.chunkIndex, chunk)))
    .where(eq(sweeps.id, sweepId))
    .limit(1);
  if (!state || state.status !== "running" || state.doneAt !== null) return null;
  let basis = bases.get(sweepId);
  if (!basis) {
    const [row] = await db
      .select({ document: revisions.document, definition: sweeps.definition, chunkSize: sweeps.chunkSize, totalPoints: sweeps.totalPoints })
      .from(sweeps)
      .innerJoin(revisions, eq(revisions.id, sweeps.revisionId))
      .where(eq(sweeps.id, sweepId))
      .limit(1);
    if (!row) return null;
    basis = row;
    if (bases.size > 100) bases.clear();
    bases.set(sweepId, basis);
  }
  const { start, end } = chunkRange(chunk, basis.chunkSize, basis.totalPoints);
  return { sweepId, chunk, start, end, document: basis.document, definition: basis.definition };
}

/**
 * Stores a chunk's points atomically, in one statement (one round trip): each point once (its key
 * is (sweep, point)), the chunk marked stored, and the sweep's count raised by the points actually
 * inserted, so a chunk stored twice counts once. The last chunk completes a running sweep.
 *
 * @returns How many points were new.
 */
export async function storeChunkPoints(sweepId: string, chunk: number, points: readonly StoredSweepPoint[]): Promise<number> {
  const rows = points.map((point) =>
    point.status === "ok"
      ? {
          point_index: point.index,
          supercharges: point.supercharges,
          tachyonic_sectors: point.tachyonicSectors,
          lightest_mass_squared: point.lightestMassSquared,
          massless_states: point.masslessStates,
          gauge_group: point.gaugeGroup,
          problem: null,
        }
      : { point_index: point.index, supercharges: null, tachyonic_sectors: 0, lightest_mass_squared: null, massless_states: null, gauge_group: null, problem: point.problem },
  );
  const result = await db.execute<{ inserted: number }>(sql`
    with inserted as (
      insert into ${sweepPoints} (sweep_id, point_index, supercharges, tachyonic_sectors, lightest_mass_squared, massless_states, gauge_group, problem)
      select ${sweepId}::uuid, x.point_index, x.supercharges, x.tachyonic_sectors, x.lightest_mass_squared, x.massless_states, x.gauge_group, x.problem
      from jsonb_to_recordset(${JSON.stringify(rows)}::jsonb) as x(
        point_index int, supercharges int, tachyonic_sectors int, lightest_mass_squared double precision,
        massless_states text, gauge_group text, problem text)
      on conflict do nothing
      returning 1
    ),
    counted as (select count(*)::int as n from inserted),
    chunk_done as (
      update ${sweepChunks} set done_at = now()
      where sweep_id = ${sweepId}::uuid and chunk_index = ${chunk} and done_at is null
    ),
    sweep_done as (
      update ${sweeps} set
        done_points = done_points + counted.n,
        status = case when done_points + counted.n >= total_points and status = 'running' then 'completed'::sweep_status else status end,
        finished_at = case when done_points + counted.n >= total_points and status = 'running' then now() else finished_at end
      from counted
      where id = ${sweepId}::uuid and counted.n > 0
    )
    select n as inserted from counted`);
  return result.rows[0]?.inserted ?? 0;
}

/** Marks a running sweep failed (a chunk failed on every retry), with the reason shown on its page. */
export async function markSweepFailed(sweepId: string, reason: string): Promise<void> {
  await db
    .update(sweeps)
    .set({ status: "failed", failure: reason.slice(0, 500), finishedAt: new Date() })
    .where(and(eq(sweeps.id, sweepId), eq(sweeps.status, "running")));
}

/**
 * Every chunk of a running sweep not yet stored, as the job it should have on the queue: the
 * workers put them on the queue again from time to time, which adds only the jobs that are missing.
 */
export async function listWaitingChunkJobs(): Promise<SweepChunkJob[]> {
  const rows = await db
    .select({ sweepId: sweepChunks.sweepId, chunk: sweepChunks.chunkIndex, tag: sweepChunks.tag, generation: sweeps.generation })
    .from(sweepChunks)
    .innerJoin(sweeps, eq(sweeps.id, sweepChunks.sweepId))
    .where(and(isNull(sweepChunks.doneAt), eq(sweeps.status, "running")))
    .orderBy(asc(sweepChunks.tag));
  return rows;
}
