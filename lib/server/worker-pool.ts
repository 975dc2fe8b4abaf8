import "server-only";
import type { Worker } from "node:worker_threads";
import { ServiceUnavailableError } from "@/lib/errors";

/**
 * A small pool of worker threads with a bounded queue, for CPU-bound work that must not hold the
 * event loop that health checks and reads share (spectrum computations, password hashing). Threads
 * start on demand up to `size`; a job waits in a queue of at most `maxQueue`, and one more is
 * refused at once with a 503 and Retry-After ("busy, try again") instead of waiting without end. A
 * thread that fails, exits or runs past `timeoutMs` is replaced and its job fails with a 503. A
 * thread with work keeps the process alive (a script awaiting a result must not exit early); an
 * idle one does not.
 *
 * The thread speaks a two-message protocol: it receives `{ id, job }` and answers `{ id, value }` or
 * `{ id, error }` (a message).
 */

/** Options of {@link createWorkerPool}. */
export interface WorkerPoolOptions {
  /** Starts one thread. */
  start: () => Worker;
  /** Threads at most (at least 1). */
  size: number;
  /** Jobs that may wait for a thread; one more is refused. */
  maxQueue: number;
  /** What the 503 says when the queue is full. */
  busyMessage: string;
  /** A job running longer than this is abandoned and its thread replaced (default: no limit). */
  timeoutMs?: number;
  /** Names the work in logs and errors, e.g. "spectrum". */
  name: string;
}

/** A pool that runs jobs of type `TJob` to values of type `TValue`. */
export interface WorkerPool<TJob, TValue> {
  run(job: TJob): Promise<TValue>;
  /** Stops the threads; later jobs start new ones. */
  close(): Promise<void>;
}

interface Pending<TJob, TValue> {
  job: TJob;
  resolve: (value: TValue) => void;
  reject: (error: Error) => void;
}

interface Thread<TJob, TValue> {
  worker: Worker;
  current: (Pending<TJob, TValue> & { id: number }) | null;
  timer: NodeJS.Timeout | null;
}

/**
 * Creates a pool (see the module doc).
 *
 * @example
 * const pool = createWorkerPool<Job, Result>({ start: () => new Worker(source, { eval: true }), size: 1, maxQueue: 8, busyMessage: "Busy.", name: "demo" });
 * await pool.run(job);
 */
export function createWorkerPool<TJob, TValue>(options: WorkerPoolOptions): WorkerPool<TJob, TValue> {
  const size = Math.max(1, Math.floor(options.size));
  const threads: Thread<TJob, TValue>[] = [];
  const queue: Pending<TJob, TValue>[] = [];
  let nextId = 1;

  function startThread(): Thread<TJob, TValue> {
    const thread: Thread<TJob, TValue> = { worker: options.start(), current: null, timer: null };
    thread.worker.unref();
    thread.worker.on("message", (message: { id: number; value?: TValue; error?: string }) => {
      const current = thread.current;
      if (!current || current.id !== message.id) return;
      release(thread);
      if (message.error !== undefined) current.reject(new Error(`The ${options.name} computation failed: ${message.error}`));
      else current.resolve(message.value as TValue);
      dispatch();
    });
    thread.worker.on("error", (error) => replace(thread, error));
    thread.worker.on("exit", (code) => {
      if (threads.includes(thread)) replace(thread, new Error(`A ${options.name} thread stopped (exit code ${code}).`));
    });
    threads.push(thread);
    return thread;
  }

  function release(thread: Thread<TJob, TValue>): void {
    if (thread.timer) clearTimeout(thread.timer);
    thread.timer = null;
    thread.current = null;
    thread.worker.unref();
  }

  /** Fails the thread's job with a 503, drops the thread and lets a fresh one take the queue. */
  function replace(thread: Thread<TJob, TValue>, error: Error): void {
    const current = thread.current;
    release(thread);
    const index = threads.indexOf(thread);
    if (index >= 0) threads.splice(index, 1);
    void thread.worker.terminate();
    if (current) {
      console.error(`A ${options.name} thread failed:`, error);
      current.reject(new ServiceUnavailableError("The computation failed on the server. Please try again."));
    }
    dispatch();
  }

  function dispatch(): void {
    while (queue.length > 0) {
      const idle = threads.find((thread) => thread.current === null) ?? (threads.length < size ? startThread() : undefined);
      if (!idle) return;
      const pending = queue.shift() as Pending<TJob, TValue>;
      const id = nextId++;
      idle.current = { ...pending, id };
      idle.worker.ref();
      if (options.timeoutMs !== undefined) {
        idle.timer = setTimeout(() => replace(idle, new Error(`The ${options.name} job took too long and was stopped.`)), options.timeoutMs);
      }
      idle.worker.postMessage({ id, job: pending.job });
    }
  }

  return {
    run(job) {
      const busy = threads.filter((thread) => thread.current !== null).length;
      if (busy >= size && queue.length >= options.maxQueue) return Promise.reject(new ServiceUnavailableError(options.busyMessage));
      return new Promise<TValue>((resolve, reject) => {
        queue.push({ job, resolve, reject });
        dispatch();
      });
    },
    async close() {
      const stopping = threads.splice(0, threads.length);
      for (const thread of stopping) release(thread);
      await Promise.all(stopping.map((thread) => thread.worker.terminate()));
    },
  };
}
