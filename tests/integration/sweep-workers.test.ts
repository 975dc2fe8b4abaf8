import { spawn, type ChildProcess } from "node:child_process";
import path from "node:path";
import { sql } from "drizzle-orm";
import { afterAll, describe, expect, it, vi } from "vitest";

// Chunks whose worker died are retried after this long; set before the environment is first read.
vi.hoisted(() => {
  process.env.SWEEP_JOB_EXPIRE_SECONDS = "3";
});

const { db } = await import("@/db/index");
const { createConfiguration } = await import("@/db/queries/configurations");
const { getSweep, startSweep } = await import("@/db/queries/sweeps");
const { stopSweepQueue } = await import("@/db/sweep-queue");
const { braneAntibranePair } = await import("@/lib/demo-configurations");
const { computeSweepPoint } = await import("@/lib/sweeps");
const { createTestUser } = await import("@/tests/fixtures/users");

const root = path.resolve(import.meta.dirname, "..", "..");
const workers: ChildProcess[] = [];

/** Starts `npm run worker`'s script as its own process against the test database. */
function startWorker(name: string): { child: ChildProcess; log: string[] } {
  const log: string[] = [];
  // Node itself with tsx's loader (as `npm run worker` does), so that SIGKILL hits the worker and
  // not a wrapper process.
  const child = spawn(process.execPath, ["--import", "tsx", "--conditions=react-server", "scripts/sweep-worker.ts", "--verbose"], {
    cwd: root,
    env: { ...process.env, SWEEP_MAINTENANCE_SECONDS: "1", SWEEP_JOB_EXPIRE_SECONDS: "3" },
    stdio: ["ignore", "pipe", "pipe"],
  });
  for (const stream of [child.stdout, child.stderr]) stream?.on("data", (chunk: Buffer) => log.push(`[${name}] ${chunk.toString()}`));
  workers.push(child);
  return { child, log };
}

async function until<T>(what: string, read: () => Promise<T>, done: (value: T) => boolean, log: () => string[]): Promise<T> {
  const deadline = Date.now() + 45_000;
  for (;;) {
    const value = await read();
    if (done(value)) return value;
    if (Date.now() > deadline) throw new Error(`Timed out waiting for ${what}; last value ${JSON.stringify(value)}\n${log().join("")}`);
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
}

afterAll(async () => {
  for (const child of workers) if (child.exitCode === null) child.kill("SIGKILL");
  await stopSweepQueue();
});

describe("sweep workers", () => {
  it("two workers share a sweep; one killed mid-run loses nothing and every point is stored exactly once", { timeout: 90_000 }, async () => {
    const owner = await createTestUser({ label: "sweeper" });
    // Forty levels make a point heavy enough for chunks of a few dozen points, so the sweep has
    // several chunks and the kill lands while the first worker holds one.
    const base = { ...braneAntibranePair, levels: 40 };
    const configuration = await createConfiguration(owner.actor, owner.personalGroupId, base, "base");
    const definition = {
      format: 1 as const,
      dimensions: [
        { kind: "position" as const, stack: "anti", axis: 9, values: { kind: "range" as const, from: 0, to: 8, steps: 60 } },
        { kind: "count" as const, stack: "brane", values: { kind: "list" as const, values: [1, 2, 3, 4, 5] } },
        { kind: "orientation" as const, stack: "anti" },
      ],
    };
    const sweep = await startSweep(owner.actor, configuration.id, { definition, title: "kill test" });
    expect(sweep.totalPoints).toBe(600);
    expect(sweep.chunkCount).toBeGreaterThanOrEqual(5);

    // The first worker runs alone until it has stored a chunk of this sweep and holds the next one,
    // and is killed then; the second starts after that and must finish the sweep, the chunk the
    // first one died holding included. (Started together, the second could take every chunk left
    // while the first was busy with other tests' sweeps, which share the queue, and the first was
    // never seen holding one.)
    const first = startWorker("first");
    let secondLog: string[] = [];
    const logs = () => [...first.log, ...secondLog];
    const progress = () => getSweep(owner.actor, sweep.id);
    // Only lines naming this sweep count; a line may arrive split over two reads.
    const took = new RegExp(`took chunk (\\d+) of sweep ${sweep.id}`);
    const storedLine = new RegExp(`stored chunk (\\d+) of sweep ${sweep.id}`);
    const taken = await new Promise<number>((resolve, reject) => {
      let holding: number | null = null;
      let storedOne = false;
      let partial = "";
      const timer = setTimeout(() => reject(new Error(`the first worker never held a chunk after storing one\n${logs().join("")}`)), 45_000);
      const check = (data: Buffer) => {
        const lines = (partial + data.toString()).split("\n");
        partial = lines.pop() ?? "";
        for (const line of lines) {
          const tookMatch = took.exec(line);
          const storedMatch = storedLine.exec(line);
          if (tookMatch) holding = Number(tookMatch[1]);
          if (storedMatch) {
            storedOne = true;
            if (Number(storedMatch[1]) === holding) holding = null;
          }
        }
        if (holding === null || !storedOne) return;
        clearTimeout(timer);
        first.child.kill("SIGKILL");
        first.child.stdout?.off("data", check);
        resolve(holding);
      };
      first.child.stdout?.on("data", check);
    });
    await new Promise((resolve) => first.child.once("exit", resolve));
    // It died holding the chunk: it never stored it.
    expect(first.log.join("")).not.toMatch(new RegExp(`stored chunk ${taken} of sweep ${sweep.id}`));
    const second = startWorker("second");
    secondLog = second.log;

    const finished = await until("the sweep to complete", progress, (value) => value.status === "completed", logs);
    expect(finished.donePoints).toBe(600);

    const stored = await db.execute<{ count: number; distinct: number; low: number; high: number }>(
      sql`select count(*)::int as count, count(distinct point_index)::int as distinct, min(point_index) as low, max(point_index) as high from sweep_points where sweep_id = ${sweep.id}`,
    );
    expect(stored.rows[0]).toEqual({ count: 600, distinct: 600, low: 0, high: 599 });
    const chunks = await db.execute<{ open: number }>(sql`select count(*) filter (where done_at is null)::int as open from sweep_chunks where sweep_id = ${sweep.id}`);
    expect(chunks.rows[0]?.open).toBe(0);
    // The chunk the killed worker held expired and ran again on the other worker.
    const retried = await db.execute<{ retries: number }>(
      sql`select retry_count as retries from pgboss.job where name = 'sweep-chunk' and data->>'sweepId' = ${sweep.id} and (data->>'chunk')::int = ${taken}`,
    );
    expect(retried.rows[0]?.retries).toBeGreaterThan(0);
    expect(second.log.join("")).toMatch(new RegExp(`stored chunk ${taken} of sweep ${sweep.id}: \\d+ new points`));

    // The stored summaries are the engine's, point by point.
    const rows = await db.execute<{ point_index: number; tachyonic_sectors: number; lightest_mass_squared: number | null; supercharges: number | null }>(
      sql`select point_index, tachyonic_sectors, lightest_mass_squared, supercharges from sweep_points where sweep_id = ${sweep.id} and point_index % 37 = 0 order by point_index`,
    );
    for (const row of rows.rows) {
      const expected = computeSweepPoint(base, definition, row.point_index);
      expect(expected.status).toBe("ok");
      if (expected.status !== "ok") continue;
      expect(row).toEqual({
        point_index: row.point_index,
        tachyonic_sectors: expected.tachyonicSectors,
        lightest_mass_squared: expected.lightestMassSquared,
        supercharges: expected.supercharges,
      });
    }
    second.child.kill("SIGTERM");
  });
});
