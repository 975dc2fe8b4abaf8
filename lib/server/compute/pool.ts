import "server-only";
import { availableParallelism } from "node:os";
import { fileURLToPath } from "node:url";
import { Worker } from "node:worker_threads";
import { configurationCost } from "@/lib/boundary";
import { ValidationError } from "@/lib/errors";
import { createWorkerPool, type WorkerPool } from "@/lib/server/worker-pool";
import { runSpectrumJob, type SpectrumJob, type SpectrumJobOutcome } from "./spectrum-job";

/**
 * Spectrum computations on the server. Small ones (the designer's configurations, most API calls)
 * run inline, since a worker round trip costs more than they do; those above `offThreadCost`
 * (sectors x (levels + 1)) run in a small pool of worker threads (lib/server/worker-pool.ts), so
 * one 64-stack request cannot hold the event loop that health checks and reads share. The pool has
 * one thread per spare core (at least one) and a bounded queue: past it, callers get a 503 with
 * Retry-After instead of waiting behind work they cannot see.
 */

/** Configurations costing more than this run in a worker thread (about 5 ms of engine time inline). */
export const offThreadCost = 2_000;
/** Jobs waiting for a thread before new ones are refused. */
const maxQueuedJobs = 16;
/** A job running longer than this is abandoned and its thread replaced. */
const jobTimeoutMs = 30_000;

/** Computes a job, inline or in the pool by its cost; configuration problems become a 422 at `problemsAt`. */
export async function computeSpectrumJob(
  job: SpectrumJob,
  options: { problemsAt?: (string | number)[] } = {},
): Promise<ComputedSpectrum> {
  const offThread = configurationCost(job.document) > offThreadCost;
  const outcome = offThread ? await pool().run(job) : runSpectrumJob(job);
  if (!outcome.ok) {
    const at = options.problemsAt ?? [];
    throw new ValidationError(outcome.problems.map((problem) => ({ path: [...at, ...problem.path], message: problem.message })));
  }
  return { ...outcome, offThread };
}

/** A successful computation, and whether it ran in a worker thread. */
export type ComputedSpectrum = Extract<SpectrumJobOutcome, { ok: true }> & { offThread: boolean };

/**
 * A worker thread running spectrum-worker.ts. In the production server the bundler compiles the
 * entry (it recognises `new Worker(new URL(...))`); under vitest and tsx the source is TypeScript,
 * which Node's worker cannot load by itself, so tsx is registered inside the thread first.
 */
function startWorker(): Worker {
  if (import.meta.url.endsWith(".ts")) {
    const entry = fileURLToPath(import.meta.url).replace(/pool\.ts$/, "spectrum-worker.ts");
    return new Worker(`require("tsx/cjs/api").register(); require(${JSON.stringify(entry)});`, { eval: true });
  }
  return new Worker(new URL("./spectrum-worker.ts", import.meta.url));
}

const cache = globalThis as typeof globalThis & { __mooringComputePool?: WorkerPool<SpectrumJob, SpectrumJobOutcome> };

function pool(): WorkerPool<SpectrumJob, SpectrumJobOutcome> {
  cache.__mooringComputePool ??= createWorkerPool<SpectrumJob, SpectrumJobOutcome>({
    start: startWorker,
    size: Math.max(1, availableParallelism() - 1),
    maxQueue: maxQueuedJobs,
    busyMessage: "The server is busy computing other large spectra. Please try again in a moment.",
    timeoutMs: jobTimeoutMs,
    name: "spectrum",
  });
  return cache.__mooringComputePool;
}
