import "server-only";
import { createHash } from "node:crypto";
import PgBoss from "pg-boss";
import { getEnv } from "../lib/server/env";

/*
 * The job queue of sweeps: pg-boss on the same PostgreSQL database (its tables live in the
 * "pgboss" schema, which pg-boss creates and migrates itself). One job is one chunk of points.
 * Import it only from db/queries/* and the worker.
 */

/** The queue's name. */
export const sweepChunkQueue = "sweep-chunk";

/** What a chunk job carries. */
export interface SweepChunkJobData {
  sweepId: string;
  chunk: number;
  generation: number;
}

/** One chunk to put on the queue. */
export interface SweepChunkJob extends SweepChunkJobData {
  /** Fair-share start tag (lib/sweeps/chunks.ts); smaller runs first. */
  tag: number;
}

interface QueueCache {
  boss: Promise<PgBoss>;
}

const cache = globalThis as typeof globalThis & { __mooringSweepQueue?: QueueCache };

/** Options of {@link sweepQueue}. */
export interface SweepQueueOptions {
  /** Run pg-boss maintenance (expiring jobs of dead workers); workers do, the app does not. */
  supervise?: boolean;
}

/**
 * The started pg-boss instance of this process (one per process, with a pool of two connections).
 * Creates the queue on first use.
 */
export function sweepQueue(options: SweepQueueOptions = {}): Promise<PgBoss> {
  cache.__mooringSweepQueue ??= { boss: startQueue(options) };
  return cache.__mooringSweepQueue.boss;
}

async function startQueue(options: SweepQueueOptions): Promise<PgBoss> {
  const env = getEnv();
  const boss = new PgBoss({
    connectionString: env.DATABASE_URL,
    max: 2,
    supervise: options.supervise ?? false,
    schedule: false,
    maintenanceIntervalSeconds: env.SWEEP_MAINTENANCE_SECONDS,
    // Finished jobs are kept a day for inspection, then archived and dropped by pg-boss.
    archiveCompletedAfterSeconds: 24 * 60 * 60,
  });
  boss.on("error", (error: Error) => console.error("sweep queue:", error.message));
  try {
    await boss.start();
    await boss.createQueue(sweepChunkQueue, { name: sweepChunkQueue, policy: "standard" });
  } catch (error) {
    delete cache.__mooringSweepQueue;
    throw error;
  }
  return boss;
}

/** Stops this process's pg-boss instance (workers on shutdown, tests on teardown). */
export async function stopSweepQueue(): Promise<void> {
  const current = cache.__mooringSweepQueue;
  if (!current) return;
  delete cache.__mooringSweepQueue;
  const boss = await current.boss.catch(() => null);
  await boss?.stop({ graceful: false, wait: true });
}

/**
 * The job id of a chunk in one generation of a sweep: derived, not random, so that putting the
 * same chunk on the queue twice (a retried start, the workers' reconciliation) adds nothing.
 */
export function chunkJobId(job: SweepChunkJobData): string {
  const hex = createHash("sha256").update(`${job.sweepId}:${job.generation}:${job.chunk}`).digest("hex");
  // Shaped as an RFC 4122 version-5-style UUID.
  return `${hex.slice(0, 8)}-${hex.slice(8, 12)}-5${hex.slice(13, 16)}-${((parseInt(hex.slice(16, 18), 16) & 0x3f) | 0x80).toString(16)}${hex.slice(18, 20)}-${hex.slice(20, 32)}`;
}

/** Puts chunks on the queue; chunks already there (same generation) are left as they are. */
export async function enqueueChunks(jobs: readonly SweepChunkJob[]): Promise<void> {
  if (jobs.length === 0) return;
  const boss = await sweepQueue();
  const expireInSeconds = getEnv().SWEEP_JOB_EXPIRE_SECONDS;
  for (let i = 0; i < jobs.length; i += 1000) {
    await boss.insert(
      jobs.slice(i, i + 1000).map((job) => ({
        id: chunkJobId(job),
        name: sweepChunkQueue,
        data: { sweepId: job.sweepId, chunk: job.chunk, generation: job.generation } satisfies SweepChunkJobData,
        priority: -job.tag,
        retryLimit: 10,
        retryDelay: 1,
        retryBackoff: true,
        expireInSeconds,
      })),
    );
  }
}

/** Cancels the queued or running jobs of chunks (a worker that already holds one finishes it harmlessly). */
export async function cancelChunkJobs(jobs: readonly SweepChunkJobData[]): Promise<void> {
  if (jobs.length === 0) return;
  const boss = await sweepQueue();
  for (let i = 0; i < jobs.length; i += 1000) {
    await boss.cancel(sweepChunkQueue, jobs.slice(i, i + 1000).map(chunkJobId));
  }
}
