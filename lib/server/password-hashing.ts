import "server-only";
import { availableParallelism } from "node:os";
import { Worker } from "node:worker_threads";
import { createWorkerPool } from "@/lib/server/worker-pool";

/**
 * bcrypt off the main thread. bcryptjs is plain JavaScript: at cost 12 one hash or check is about a
 * quarter of a second of CPU, and its async API only slices that work into chunks on the event loop,
 * so a flood of sign-ins would starve every other request. Here the work runs in a small pool of
 * worker threads with a bounded queue; past the queue a caller gets a ServiceUnavailableError (503
 * with Retry-After, "busy, try again") at once instead of waiting without end, as the spectrum
 * compute pool does (lib/server/compute/pool.ts).
 */

/** One job for a hashing thread. */
type PasswordJob = { kind: "hash"; password: string; cost: number } | { kind: "compare"; password: string; hash: string };

/** Options of {@link createPasswordHasher}. */
export interface PasswordHasherOptions {
  /** Worker threads (default: one per core but one, between 1 and 4). */
  threads?: number;
  /** Jobs that may wait for a thread; one more is refused with a 503 (default 32 per thread, about 8 s of work at cost 12). */
  maxQueue?: number;
}

/** Hashes and checks passwords on worker threads. */
export interface PasswordHasher {
  /** A bcrypt hash of `password` at `cost`. */
  hash(password: string, cost: number): Promise<string>;
  /** True when `password` matches the bcrypt `hash`. */
  compare(password: string, hash: string): Promise<boolean>;
  /** Stops the threads; later calls start new ones. */
  close(): Promise<void>;
}

// The thread's code, evaluated as CommonJS; bcryptjs is required from the app's folder (the working
// directory of the server, the tests and the scripts), so no bundler has to know about this file.
const workerSource = `
const { parentPort } = require("node:worker_threads");
const { createRequire } = require("node:module");
const path = require("node:path");
const bcrypt = createRequire(path.join(process.cwd(), "package.json"))("bcryptjs");
parentPort.on("message", ({ id, job }) => {
  try {
    const value = job.kind === "hash" ? bcrypt.hashSync(job.password, job.cost) : bcrypt.compareSync(job.password, job.hash);
    parentPort.postMessage({ id, value });
  } catch (error) {
    parentPort.postMessage({ id, error: error instanceof Error ? error.message : String(error) });
  }
});
`;

const busyMessage = "The server is busy checking other passwords. Nothing was changed; please try again in a moment.";

/** A pool of hashing threads; the app uses one shared pool (see {@link hashPassword}). */
export function createPasswordHasher(options: PasswordHasherOptions = {}): PasswordHasher {
  const size = Math.max(1, Math.floor(options.threads ?? Math.min(4, Math.max(1, availableParallelism() - 1))));
  const pool = createWorkerPool<PasswordJob, string | boolean>({
    start: () => new Worker(workerSource, { eval: true }),
    size,
    maxQueue: Math.max(0, Math.floor(options.maxQueue ?? size * 32)),
    busyMessage,
    name: "password hashing",
  });
  return {
    hash: async (password, cost) => (await pool.run({ kind: "hash", password, cost })) as string,
    compare: async (password, hash) => (await pool.run({ kind: "compare", password, hash })) as boolean,
    close: () => pool.close(),
  };
}

let shared: PasswordHasher | undefined;

function sharedHasher(): PasswordHasher {
  shared ??= createPasswordHasher();
  return shared;
}

/** A bcrypt hash of `password` at `cost`, computed on the shared pool; a 503 when it is full. */
export function hashPassword(password: string, cost: number): Promise<string> {
  return sharedHasher().hash(password, cost);
}

/** True when `password` matches `hash`, checked on the shared pool; a 503 when it is full. */
export function comparePassword(password: string, hash: string): Promise<boolean> {
  return sharedHasher().compare(password, hash);
}
