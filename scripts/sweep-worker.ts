// `npm run worker`: one sweep worker against DATABASE_URL (lib/server/sweeps/worker.ts). Start as
// many as there are cores, on as many machines as you like; Ctrl-C or SIGTERM lets it finish the
// chunk in hand and stop. `npm run worker -- --verbose` logs every chunk.
import { closeDatabase } from "@/db/index";
import { stopSweepQueue } from "@/db/sweep-queue";
import { runSweepWorker } from "@/lib/server/sweeps/worker";

async function main(): Promise<void> {
  const stop = new Promise<void>((resolve) => {
    for (const signal of ["SIGINT", "SIGTERM"] as const) process.once(signal, () => resolve());
  });
  try {
    await runSweepWorker({ stop, log: (line) => console.log(`[worker] ${line}`), verbose: process.argv.includes("--verbose") });
  } finally {
    await stopSweepQueue();
    await closeDatabase();
  }
}

main().catch((error: unknown) => {
  console.error("[worker] stopped by an error:", error);
  process.exitCode = 1;
});
