import { Worker } from "node:worker_threads";
import { afterEach, describe, expect, it } from "vitest";
import { ServiceUnavailableError } from "@/lib/errors";
import { createWorkerPool, type WorkerPool } from "./worker-pool";

// A thread that squares numbers, waits when asked, and crashes on "crash".
const source = `
const { parentPort } = require("node:worker_threads");
parentPort.on("message", ({ id, job }) => {
  if (job === "crash") process.exit(3);
  if (job === "fail") return parentPort.postMessage({ id, error: "no such job" });
  if (typeof job === "object") return setTimeout(() => parentPort.postMessage({ id, value: job.wait }), job.wait);
  parentPort.postMessage({ id, value: job * job });
});
`;

let pool: WorkerPool<unknown, unknown> | undefined;
afterEach(async () => {
  await pool?.close();
});

function make(options: { size?: number; maxQueue?: number; timeoutMs?: number } = {}) {
  pool = createWorkerPool<unknown, unknown>({
    start: () => new Worker(source, { eval: true }),
    size: options.size ?? 1,
    maxQueue: options.maxQueue ?? 4,
    timeoutMs: options.timeoutMs,
    busyMessage: "busy",
    name: "test",
  });
  return pool;
}

describe("createWorkerPool", () => {
  it("runs jobs on its threads and answers each with its own value", async () => {
    const squares = make({ size: 2 });
    expect(await Promise.all([2, 3, 4, 5].map((n) => squares.run(n)))).toEqual([4, 9, 16, 25]);
  });

  it("refuses a job at once with a 503 when every thread is busy and the queue is full", async () => {
    const busy = make({ size: 1, maxQueue: 1 });
    const running = busy.run({ wait: 200 });
    const queued = busy.run({ wait: 1 });
    await expect(busy.run(1)).rejects.toBeInstanceOf(ServiceUnavailableError);
    expect(await running).toBe(200);
    expect(await queued).toBe(1);
  });

  it("replaces a thread that crashes or runs too long, and goes on with the queue", async () => {
    // The time limit covers starting a thread too, which takes a while on a loaded machine.
    const fragile = make({ size: 1, timeoutMs: 2_000 });
    const crashed = fragile.run("crash");
    const after = fragile.run(7);
    await expect(crashed).rejects.toBeInstanceOf(ServiceUnavailableError);
    expect(await after).toBe(49);
    await expect(fragile.run({ wait: 60_000 })).rejects.toBeInstanceOf(ServiceUnavailableError);
    expect(await fragile.run(3)).toBe(9);
  });

  it("passes a thread's own error on", async () => {
    await expect(make().run("fail")).rejects.toThrow(/no such job/);
  });
});
