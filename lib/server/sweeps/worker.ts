import "server-only";
import type PgBoss from "pg-boss";
import { listWaitingChunkJobs, loadChunkWork, markSweepFailed, storeChunkPoints, type ChunkWork } from "@/db/queries/sweep-work";
import { enqueueChunks, sweepChunkQueue, sweepQueue, type SweepChunkJobData } from "@/db/sweep-queue";
import { braneAntibranePair } from "@/lib/demo-configurations";
import { computeSweepPoint, type StoredSweepPoint, type SweepDefinition } from "@/lib/sweeps";

/*
 * A sweep worker: takes one chunk at a time from the pg-boss queue, computes its points with the
 * engine and stores them. Any number of workers, on any number of machines, may run against one
 * database. A worker killed mid-chunk loses nothing: the chunk's job stays active until it
 * expires (SWEEP_JOB_EXPIRE_SECONDS), pg-boss's maintenance then retries it on another worker,
 * and storing is idempotent.
 */

/** Options of {@link runSweepWorker}. */
export interface SweepWorkerOptions {
  /** Resolves when the worker should stop; it finishes the chunk in hand first. */
  stop: Promise<void>;
  /** Writes one line of the worker's log. */
  log?: (line: string) => void;
  /** Also log every chunk taken and stored. */
  verbose?: boolean;
}

/** How long an idle worker waits before asking the queue again. */
const idlePollMs = 250;
/** How often a worker puts missing jobs of running sweeps back on the queue. */
const reconcileEveryMs = 60_000;

/** Computes every point of a chunk (pure apart from the clock-free engine). */
export function computeChunk(work: ChunkWork): StoredSweepPoint[] {
  const points: StoredSweepPoint[] = [];
  for (let index = work.start; index < work.end; index += 1) {
    points.push({ index, ...computeSweepPoint(work.document, work.definition, index) });
  }
  return points;
}

/**
 * Runs the engine on a few hundred points of a small sweep of our own before the first chunk: a
 * fresh process runs its first chunk several times slower while the JIT compiles the engine.
 */
export function warmUpEngine(): void {
  const definition: SweepDefinition = {
    format: 1,
    dimensions: [
      { kind: "position", stack: "anti", axis: 9, values: { kind: "range", from: 0, to: 6, steps: 100 } },
      { kind: "orientation", stack: "anti" },
      { kind: "count", stack: "brane", values: { kind: "list", values: [1, 2] } },
    ],
  };
  computeChunk({ sweepId: "", chunk: 0, start: 0, end: 400, document: { ...braneAntibranePair, levels: 3 }, definition });
}

/** Runs a worker until `options.stop` resolves. */
export async function runSweepWorker(options: SweepWorkerOptions): Promise<void> {
  const log = options.log ?? ((line: string) => console.log(line));
  let stopping = false;
  let wake: (() => void) | null = null;
  void options.stop.then(() => {
    stopping = true;
    wake?.();
  });
  const boss = await sweepQueue({ supervise: true });
  warmUpEngine();
  log(`sweep worker ${process.pid} is taking chunks from "${sweepChunkQueue}"`);

  let lastReconcile = 0;
  let stored = 0;
  let lastReport = Date.now();
  while (!stopping) {
    if (Date.now() - lastReconcile > reconcileEveryMs) {
      lastReconcile = Date.now();
      await reconcile(log);
    }
    const [job] = await boss.fetch<SweepChunkJobData>(sweepChunkQueue, { batchSize: 1, includeMetadata: true }).catch((error: unknown) => {
      log(`sweep worker: could not fetch a chunk: ${error instanceof Error ? error.message : String(error)}`);
      return [];
    });
    if (!job) {
      await new Promise<void>((resolve) => {
        wake = resolve;
        setTimeout(resolve, idlePollMs);
      });
      wake = null;
      continue;
    }
    stored += await runJob(boss, job, log, options.verbose ?? false);
    if (Date.now() - lastReport > 10_000 && stored > 0) {
      log(`sweep worker ${process.pid}: stored ${stored} points in the last ${Math.round((Date.now() - lastReport) / 1000)} s`);
      stored = 0;
      lastReport = Date.now();
    }
  }
  log(`sweep worker ${process.pid} stopped`);
}

async function runJob(boss: PgBoss, job: PgBoss.JobWithMetadata<SweepChunkJobData>, log: (line: string) => void, verbose: boolean): Promise<number> {
  const { sweepId, chunk } = job.data;
  try {
    if (verbose) log(`took chunk ${chunk} of sweep ${sweepId}`);
    const work = await loadChunkWork(sweepId, chunk);
    const inserted = work ? await storeChunkPoints(sweepId, chunk, computeChunk(work)) : 0;
    await boss.complete(sweepChunkQueue, job.id);
    if (verbose) log(`stored chunk ${chunk} of sweep ${sweepId}: ${inserted} new points`);
    return inserted;
  } catch (error) {
    const message = error instanceof Error ? error.message : String(error);
    log(`sweep worker: chunk ${chunk} of sweep ${sweepId} failed (attempt ${job.retryCount + 1} of ${job.retryLimit + 1}): ${message}`);
    if (job.retryCount >= job.retryLimit) {
      await markSweepFailed(sweepId, `Chunk ${chunk} failed on every attempt: ${message}`).catch(() => undefined);
    }
    await boss.fail(sweepChunkQueue, job.id, { message }).catch(() => undefined);
    return 0;
  }
}

/** Puts back on the queue the jobs of waiting chunks that are missing (e.g. an app that died between commit and queueing). */
async function reconcile(log: (line: string) => void): Promise<void> {
  try {
    await enqueueChunks(await listWaitingChunkJobs());
  } catch (error) {
    log(`sweep worker: could not check the queue: ${error instanceof Error ? error.message : String(error)}`);
  }
}
