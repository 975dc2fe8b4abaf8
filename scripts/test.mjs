#!/usr/bin/env node
// `npm test`: install what is missing, start PostgreSQL, then run the unit tests, the integration tests
// against a fresh `mooring_test` database, and the browser tests against a production build served on
// 127.0.0.1:3100 with its own fresh `mooring_e2e` database and fake mail server, then a short fault run
// (scripts/fault-run.mjs: a throwaway PostgreSQL stopped and restarted under load) on the same build.
// `node scripts/test.mjs unit integration` runs only the named parts (unit, integration, e2e).
import { rmSync } from "node:fs";
import { appEnv, buildApp, clearMailbox, dataDir, runNpmScriptIfPresent, startApp, startMaildev, startWorkers } from "./lib/app.mjs";
import { findFreePort, freePortNear } from "./lib/net.mjs";
import {
  clusterState,
  createDatabase,
  databaseUrl,
  defaultPort,
  dropDatabase,
  portHolder,
  start as startPostgres,
  stop as stopPostgres,
} from "./lib/postgres.mjs";
import { bin, runStep, stopService } from "./lib/processes.mjs";
import { authSecret, chromiumPath, ensureChromium, ensureNodeModules } from "./lib/setup.mjs";

const parts = ["unit", "integration", "e2e"];
const requested = process.argv.slice(2);
for (const part of requested) {
  if (!parts.includes(part)) {
    console.error(`usage: node scripts/test.mjs [${parts.join("] [")}]`);
    process.exit(2);
  }
}
const selected = new Set(requested.length ? requested : parts);
// Lets two people run the suite in one checkout at once (with different NEXT_DIST_DIR too).
const dbSuffix = process.env.MOORING_TEST_DB_SUFFIX ? `_${process.env.MOORING_TEST_DB_SUFFIX}` : "";
const testDb = `mooring_test${dbSuffix}`;
const e2eDb = `mooring_e2e${dbSuffix}`;

/** @type {{ name: string, code: number, seconds: number, passed: number, failed: number, counted: boolean, failures: string[] }[]} */
const results = [];
const setupTimings = [];
const services = [];
let startedPostgres = false;

function log(message) {
  console.log(`\n[test] ${message}`);
}

/** Pulls "N passed" / "N failed" out of a vitest, Playwright or fault-run summary. */
function countTests(output, runner) {
  if (runner === "fault") {
    // scripts/fault-run.mjs ends with one "N passed, N failed" line.
    const last = [...output.matchAll(/^(\d+) passed, (\d+) failed$/gm)].at(-1);
    return last ? { passed: Number(last[1]), failed: Number(last[2]) } : null;
  }
  if (runner === "vitest") {
    const line = output.match(/^\s*Tests\s+(.*)$/m)?.[1];
    if (!line) return null;
    return {
      passed: Number(line.match(/(\d+) passed/)?.[1] ?? 0),
      failed: Number(line.match(/(\d+) failed/)?.[1] ?? 0),
    };
  }
  const passed = output.match(/^\s*(\d+) passed/m)?.[1];
  const failed = output.match(/^\s*(\d+) failed/m)?.[1];
  if (passed === undefined && failed === undefined) return null;
  return { passed: Number(passed ?? 0), failed: Number(failed ?? 0) };
}

/**
 * The failing tests named in a vitest or Playwright report, each with the first lines of its error,
 * so that the summary at the end of a long log says what failed (CI often shows only the tail).
 */
function failingTests(output, runner) {
  // runStep has already stripped the colour codes.
  const lines = output.split("\n");
  if (runner === "fault") return lines.filter((line) => line.startsWith("[fault] FAILED")).slice(0, 10).map((line) => line.slice(0, 400));
  const header = runner === "vitest" ? /^\s*FAIL\s+.*>\s/ : /^\s+\d+\) \[.*\] › /;
  const found = [];
  for (let i = 0; i < lines.length && found.length < 10; i += 1) {
    if (!header.test(lines[i])) continue;
    const detail = lines
      .slice(i + 1, i + 12)
      .map((line) => line.trim())
      .filter((line) => line && !line.startsWith("❯") && !/^[⎯─]+/.test(line))
      .slice(0, 4);
    found.push([lines[i].trim(), ...detail.map((line) => `    ${line}`)].map((line) => line.slice(0, 240)).join("\n"));
  }
  return found;
}

/** Runs a setup action and records how long it took (shown in the summary). */
async function timed(name, action) {
  const started = Date.now();
  const value = await action();
  setupTimings.push({ name, seconds: (Date.now() - started) / 1000 });
  return value;
}

/** Runs one named step, timing it and recording its exit code and test counts. */
async function step(name, action, runner) {
  log(`${name}...`);
  const started = Date.now();
  let code = 1;
  let output = "";
  try {
    ({ code, output } = await action());
  } catch (error) {
    console.error(`[test] ${name}: ${error instanceof Error ? error.message : String(error)}`);
  }
  const seconds = (Date.now() - started) / 1000;
  const counts = runner ? countTests(output, runner) : null;
  results.push({
    name,
    code,
    seconds,
    passed: counts?.passed ?? 0,
    failed: counts?.failed ?? 0,
    counted: counts !== null,
    failures: code !== 0 && runner ? failingTests(output, runner) : [],
  });
  console.log(`[test] ${name}: ${code === 0 ? "ok" : `FAILED (exit ${code})`} in ${seconds.toFixed(1)}s`);
  return code === 0;
}

async function freshDatabase(name, port, env) {
  dropDatabase(name, { port });
  createDatabase(name, { port });
  return runNpmScriptIfPresent("db:migrate", env, `migrations for ${name}`);
}

/** Picks the cluster port: when another cluster holds the default port, use a free one for this run. */
async function choosePostgresPort() {
  if (process.env.MOORING_PG_PORT || clusterState().running) return;
  const holder = await portHolder(defaultPort);
  if (!holder) return;
  const port = await findFreePort(defaultPort + 1);
  process.env.MOORING_PG_PORT = String(port);
  log(`port ${defaultPort} is held by another ${holder.kind === "postgres" ? "PostgreSQL cluster" : "program"}; ` +
    `this run uses MOORING_PG_PORT=${port}`);
}

async function teardown() {
  for (const handle of services.reverse()) await stopService(handle);
  services.length = 0;
  if (startedPostgres) {
    stopPostgres();
    startedPostgres = false;
    console.log("[test] stopped the PostgreSQL cluster this run started");
  }
}

function summary() {
  console.log("\n[test] summary");
  for (const t of setupTimings) console.log(`  setup  ${t.name.padEnd(40)} ${t.seconds.toFixed(1).padStart(6)}s`);
  for (const r of results) {
    const counts = r.counted ? ` (${r.passed} passed, ${r.failed} failed)` : "";
    console.log(`  ${r.code === 0 ? "ok    " : "FAILED"} ${r.name.padEnd(40)} ${r.seconds.toFixed(1).padStart(6)}s${counts}`);
    for (const failure of r.failures) console.log(failure.replace(/^/gm, "           "));
  }
  const passed = results.reduce((sum, r) => sum + r.passed, 0);
  // A failed step without a parsed count (a build, a migration, a crashed runner) counts as one failure.
  const failed = results.reduce((sum, r) => sum + (r.code !== 0 && r.failed === 0 ? 1 : r.failed), 0);
  console.log(`${passed} passed, ${failed} failed`);
  return failed === 0 && results.every((r) => r.code === 0) ? 0 : 1;
}

async function main() {
  const t0 = Date.now();
  for (const signal of ["SIGINT", "SIGTERM"]) {
    process.on(signal, () => {
      void teardown().then(() => process.exit(130));
    });
  }

  await timed("npm packages", () => ensureNodeModules());
  if (selected.has("e2e")) await timed("chromium", () => ensureChromium());
  await choosePostgresPort();
  const pg = await timed("postgresql", () => startPostgres());
  startedPostgres = pg.started;
  log(`PostgreSQL on 127.0.0.1:${pg.port}`);
  const secret = authSecret();

  // One fake mail server for the integration and browser tests (both may send mail).
  const appPort = await freePortNear(3100);
  const smtpPort = await freePortNear(1026);
  const mailboxPort = await freePortNear(smtpPort === 1081 ? 1082 : 1081);
  const ports = { appPort, smtpPort, mailboxPort, secret };
  const testEnv = appEnv({ databaseUrl: databaseUrl(testDb, pg.port), ...ports });
  const e2eEnv = appEnv({ databaseUrl: databaseUrl(e2eDb, pg.port), ...ports });
  if (selected.has("integration") || selected.has("e2e")) {
    const mailDir = dataDir(`maildev-test${dbSuffix}`);
    rmSync(mailDir, { recursive: true, force: true });
    await timed("maildev", () => startMaildev({ smtpPort, webPort: mailboxPort, dir: mailDir, services }));
    log(`fake mail server: SMTP 127.0.0.1:${smtpPort}, API ${testEnv.MAILBOX_URL}`);
  }

  if (selected.has("unit")) {
    await step("unit tests", () => runStep(bin("vitest"), ["run", "--project", "unit", "--passWithNoTests"], { env: testEnv }), "vitest");
  }

  if (selected.has("integration")) {
    const ready = await step(`fresh database ${testDb}`, () => freshDatabase(testDb, pg.port, testEnv));
    if (ready) {
      await step(
        "integration tests",
        () => runStep(bin("vitest"), ["run", "--project", "integration", "--passWithNoTests"], { env: testEnv }),
        "vitest",
      );
    }
  }

  if (selected.has("e2e")) {
    const ready =
      (await step(`fresh database ${e2eDb}`, () => freshDatabase(e2eDb, pg.port, e2eEnv))) &&
      (await step(`seed demo data into ${e2eDb}`, () => runNpmScriptIfPresent("db:seed", e2eEnv, "demo data"))) &&
      (await step("next build", () => buildApp(e2eEnv)));
    if (ready) {
      // The app's port is taken only now, after the build: another run may have taken the one
      // chosen at the start in the meantime (startApp refuses a port that answers already).
      const serveEnv = appEnv({ databaseUrl: databaseUrl(e2eDb, pg.port), ...ports, appPort: await freePortNear(appPort) });
      const serving = await step("serve the build", async () => {
        await startApp({ port: new URL(serveEnv.NEXTAUTH_URL).port, env: serveEnv, services });
        // The sweep browser test needs a worker computing the points.
        startWorkers({ count: 1, env: serveEnv, services });
        await clearMailbox(serveEnv.MAILBOX_URL);
        console.log(`[test] app on ${serveEnv.NEXTAUTH_URL}, mailbox on ${serveEnv.MAILBOX_URL}, browser ${chromiumPath}`);
        return { code: 0, output: "" };
      });
      if (serving) {
        await step(
          "browser tests (playwright)",
          () => runStep(bin("playwright"), ["test"], { env: { ...serveEnv, E2E_BASE_URL: serveEnv.NEXTAUTH_URL } }),
          "playwright",
        );
      }
      // Short fault run on the same build: its own throwaway PostgreSQL is stopped and restarted under load.
      await step(
        "fault run (database restart under load)",
        () => runStep(process.execPath, ["scripts/fault-run.mjs", "--short"], { env: e2eEnv }),
        "fault",
      );
    }
  }

  await teardown();
  const code = summary();
  console.log(`[test] total ${((Date.now() - t0) / 1000).toFixed(1)}s`);
  process.exit(code);
}

main().catch(async (error) => {
  console.error(`[test] ${error instanceof Error ? error.message : String(error)}`);
  await teardown().catch(() => {});
  summary();
  process.exit(1);
});
