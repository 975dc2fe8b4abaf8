/*
 * Entry of the worker threads that compute large spectra off the request thread
 * (lib/server/compute/pool.ts). Must not import "server-only", the database or Next.
 */
import { parentPort } from "node:worker_threads";
import { runSpectrumJob, type SpectrumJob } from "./spectrum-job";

parentPort?.on("message", (message: { id: number; job: SpectrumJob }) => {
  try {
    parentPort?.postMessage({ id: message.id, value: runSpectrumJob(message.job) });
  } catch (error) {
    parentPort?.postMessage({ id: message.id, error: error instanceof Error ? error.message : String(error) });
  }
});
