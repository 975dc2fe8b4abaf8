#!/usr/bin/env node
// `npm run fuzz:long`: the fuzz tests with many more runs than `npm test` uses (defaults: 200,000
// engine configurations, 20,000 bodies per API route; FUZZ_RUNS / FUZZ_API_RUNS override them,
// FUZZ_SEED replays a failure). Starts the project's PostgreSQL when needed and uses a fresh
// `mooring_fuzz` database.
import { appEnv, runNpmScriptIfPresent } from "./lib/app.mjs";
import { createDatabase, databaseUrl, dropDatabase, start as startPostgres, stop as stopPostgres } from "./lib/postgres.mjs";
import { bin, runStep } from "./lib/processes.mjs";
import { authSecret, ensureNodeModules } from "./lib/setup.mjs";

const database = "mooring_fuzz";

async function main() {
  ensureNodeModules();
  const pg = await startPostgres();
  const env = {
    ...appEnv({ databaseUrl: databaseUrl(database, pg.port), appPort: 3199, smtpPort: 1099, mailboxPort: 1199, secret: authSecret() }),
    FUZZ_RUNS: process.env.FUZZ_RUNS ?? "200000",
    FUZZ_API_RUNS: process.env.FUZZ_API_RUNS ?? "20000",
  };
  let failed = false;
  try {
    dropDatabase(database, { port: pg.port });
    createDatabase(database, { port: pg.port });
    const migrated = await runNpmScriptIfPresent("db:migrate", env, `migrations for ${database}`);
    if (migrated.code !== 0) throw new Error("migrations failed");
    console.log(`[fuzz] engine: ${env.FUZZ_RUNS} configurations; API: ${env.FUZZ_API_RUNS} bodies per route`);
    const engine = await runStep(bin("vitest"), ["run", "--project", "unit", "lib/boundary/fuzz.test.ts"], { env });
    const api = await runStep(bin("vitest"), ["run", "--project", "integration", "tests/integration/fuzz-api.test.ts"], { env });
    failed = engine.code !== 0 || api.code !== 0;
  } finally {
    dropDatabase(database, { port: pg.port });
    if (pg.started) stopPostgres();
  }
  process.exit(failed ? 1 : 0);
}

main().catch((error) => {
  console.error(`[fuzz] ${error instanceof Error ? error.message : String(error)}`);
  process.exit(1);
});
