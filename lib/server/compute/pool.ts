import "server-only";
import { availableParallelism } from "node:os";
import { fileURLToPath } from "node:url";
import { Worker } from "node:worker_threads";
import { configurationCost } from "@/lib/boundary";
import { ServiceUnavailableError, ValidationError } from "@/lib/errors";
import { runSpectrumJob, type SpectrumJob, type SpectrumJobOutcome } from "./spectrum-job";

/**
 * Spectrum computations on the server. Small ones (the designer's configurations, most API calls)
 * run inline, since a worker round trip costs more than they do; those above `offThreadCost`
 * (sectors x (levels + 1)) run in a small pool of worker threads, so one 64-stack request cannot
 * hold the event loop that health checks and reads share. The pool has one thread per spare core
 * (at least one) and a bounded queue: past it, callers get a 503 with Retry-After instead of
 * waiting behind work they cannot see.
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

interface Pending {
  id: number;
  job: SpectrumJob;
  resolve: (outcome: SpectrumJobOutcome) => void;
  reject: (error: Error) => void;
}

interface Slot {
  worker: Worker;
  busy: Pending | null;
  timer: NodeJS.Timeout | null;
}

class ComputePool {
  private readonly slots: Slot[] = [];
  private readonly queue: Pending[] = [];
  private nextId = 1;

  constructor(private readonly size: number) {}

  run(job: SpectrumJob): Promise<SpectrumJobOutcome> {
    if (this.queue.length >= maxQueuedJobs) {
      return Promise.reject(new ServiceUnavailableError("The server is busy computing other large spectra. Please try again in a moment."));
    }
    return new Promise((resolve, reject) => {
      this.queue.push({ id: this.nextId++, job, resolve, reject });
      this.dispatch();
    });
  }

  private dispatch(): void {
    while (this.queue.length > 0) {
      let slot = this.slots.find((candidate) => candidate.busy === null);
      if (!slot && this.slots.length < this.size) slot = this.spawn();
      if (!slot) return;
      const pending = this.queue.shift() as Pending;
      slot.busy = pending;
      slot.timer = setTimeout(() => this.replace(slot as Slot, new Error("The computation took too long and was stopped.")), jobTimeoutMs);
      slot.worker.postMessage({ id: pending.id, job: pending.job });
    }
  }

  private spawn(): Slot {
    const slot: Slot = { worker: startWorker(), busy: null, timer: null };
    slot.worker.unref();
    slot.worker.on("message", (message: { id: number; outcome?: SpectrumJobOutcome; error?: string }) => {
      const pending = slot.busy;
      if (!pending || pending.id !== message.id) return;
      this.finish(slot);
      if (message.outcome) pending.resolve(message.outcome);
      else pending.reject(new Error(message.error ?? "The computation failed."));
      this.dispatch();
    });
    slot.worker.on("error", (error) => this.replace(slot, error));
    slot.worker.on("exit", (code) => {
      if (this.slots.includes(slot)) this.replace(slot, new Error(`The computation thread stopped (exit code ${code}).`));
    });
    this.slots.push(slot);
    return slot;
  }

  private finish(slot: Slot): void {
    if (slot.timer) clearTimeout(slot.timer);
    slot.timer = null;
    slot.busy = null;
  }

  /** Fails the slot's job, drops its thread and lets a fresh one take the queue. */
  private replace(slot: Slot, error: Error): void {
    const pending = slot.busy;
    this.finish(slot);
    const index = this.slots.indexOf(slot);
    if (index >= 0) this.slots.splice(index, 1);
    void slot.worker.terminate();
    if (pending) {
      console.error("Spectrum worker failed:", error);
      pending.reject(new ServiceUnavailableError("The computation failed on the server. Please try again."));
    }
    this.dispatch();
  }
}

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

const cache = globalThis as typeof globalThis & { __mooringComputePool?: ComputePool };

function pool(): ComputePool {
  cache.__mooringComputePool ??= new ComputePool(Math.max(1, availableParallelism() - 1));
  return cache.__mooringComputePool;
}
