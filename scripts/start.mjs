#!/usr/bin/env node
// `npm start`: install what is missing, start PostgreSQL and the fake mail server, migrate and seed
// the `mooring` database, build, and serve the app on http://127.0.0.1:3000 with sweep workers
// (MOORING_WORKERS of them, default one per core) until Ctrl-C.
// PostgreSQL keeps running afterwards (`npm run db:stop` stops it).
import { availableParallelism } from "node:os";
import { appEnv, buildApp, dataDir, runNpmScriptIfPresent, startApp, startMaildev, startWorkers } from "./lib/app.mjs";
import { isPortInUse } from "./lib/net.mjs";
import { createDatabase, databaseUrl, start as startPostgres } from "./lib/postgres.mjs";
import { stopService } from "./lib/processes.mjs";
import { authSecret, ensureNodeModules } from "./lib/setup.mjs";

const appPort = 3000;
const smtpPort = 1025;
const mailboxPort = 1080;

const services = [];
let stopping = false;

async function shutdown(code) {
  if (stopping) return;
  stopping = true;
  if (services.length > 0) {
    for (const handle of services.reverse()) await stopService(handle);
    console.log("[mooring] stopped the app, the sweep workers and the mail server; PostgreSQL keeps running (npm run db:stop)");
  }
  process.exit(code);
}

function fail(message) {
  console.error(`[mooring] ${message}`);
  return shutdown(1);
}

async function main() {
  for (const signal of ["SIGINT", "SIGTERM", "SIGHUP"]) process.on(signal, () => void shutdown(0));

  ensureNodeModules();
  for (const [port, what] of [[appPort, "the app"], [smtpPort, "the fake SMTP server"], [mailboxPort, "the mailbox API"]]) {
    if (await isPortInUse(port)) return fail(`port ${port} (${what}) is already in use on 127.0.0.1; stop whatever holds it`);
  }

  const pg = await startPostgres();
  console.log(`[mooring] PostgreSQL on 127.0.0.1:${pg.port}`);
  createDatabase("mooring", { port: pg.port });
  const env = appEnv({
    databaseUrl: databaseUrl("mooring", pg.port),
    appPort,
    smtpPort,
    mailboxPort,
    secret: authSecret(),
  });

  const migrate = await runNpmScriptIfPresent("db:migrate", env, "migrations");
  if (migrate.code !== 0) return fail("migrations failed");
  const seed = await runNpmScriptIfPresent("db:seed", env, "demo data");
  if (seed.code !== 0) return fail("seeding the demo data failed");

  const build = await buildApp(env);
  if (build.code !== 0) return fail("next build failed");

  await startMaildev({ smtpPort, webPort: mailboxPort, dir: dataDir("maildev"), services });
  const app = await startApp({ port: appPort, env, services, inherit: true });
  const workers = Number(process.env.MOORING_WORKERS ?? availableParallelism());
  startWorkers({ count: Number.isInteger(workers) && workers >= 0 ? workers : 1, env, services, inherit: true });
  console.log(`\n[mooring] Mooring is running at http://127.0.0.1:${appPort}  (captured mail: ${env.MAILBOX_URL})`);
  console.log("[mooring] Ctrl-C stops the app, the sweep workers and the mail server.\n");
  const code = await app.exitedPromise;
  if (!stopping) return fail(`the app exited unexpectedly (code ${code})`);
}

main().catch((error) => fail(error instanceof Error ? error.message : String(error)));
