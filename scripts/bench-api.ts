/**
 * API load benchmark (`npm run bench:api`): autocannon against a running production server
 * (BENCH_URL, default http://127.0.0.1:3000), in one run, first with 16 connections
 * (BENCH_CONNECTIONS) and then with one client:
 *   1. GET /api/health (the yardstick: routing plus one database round trip),
 *   2. POST /api/spectrum of a four-stack configuration whose body differs on every request,
 *   3. a configuration read with its stored result, GET /api/configurations/:id?include=result,
 *      and for reference the same read without the result, GET /api/configurations/:id,
 *   4. a save, PUT /api/configurations/:id with If-Match (revision + result) of a document that
 *      differs on every request, so no stored result can be reused.
 * With 16 connections each case's throughput is read as a ratio to health's in the same run
 * (latency there is about 16 / throughput, so absolute figures only measure the cores); with one
 * client the p95 latencies are read. Health runs before the first case and again after every case,
 * and each case is read against the mean of the health runs just before and after it, so that a
 * machine whose other tenants get busier or quieter during the run moves case and yardstick alike.
 * A read of the configuration without its result is measured for reference (no target): the
 * session check, access check and routing that every configuration read pays. It also times the results page of the largest accepted
 * configuration (64 stacks) in Chromium and weighs the designer's first-load JavaScript. The report
 * prints each target with PASS or FAIL and writes bench-results/api.json.
 *
 * The read and save cases sign in (next-auth credentials) and work on scratch configurations
 * created for the run in the account's personal space, one per connection so that saves do not
 * conflict; they are soft-deleted at the end. Cases whose route is missing are reported as not
 * measured. Start the server with raised compute budgets (SPECTRUM_BUDGET_ANONYMOUS and
 * SPECTRUM_BUDGET_ACCOUNT, e.g. 100000000), or the spectrum case measures 429s.
 *
 * Environment: BENCH_URL, BENCH_DURATION (seconds per case, default 10), BENCH_CONNECTIONS
 * (default 16), BENCH_EMAIL and BENCH_PASSWORD (default: the seed's demo researcher
 * ada@mooring.test), BENCH_SERVER_PID (optional: the server's pid(s), to report its CPU time
 * per request). Start the production server first, e.g. `npm run build && npm run serve`.
 */
import { randomInt } from "node:crypto";
import { mkdirSync, readFileSync, writeFileSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { gzipSync } from "node:zlib";
import autocannon, { type RequestSpec } from "autocannon";
import { benchPreviewDemo } from "../tests/fixtures/bench-12-stacks";
import { largestConfiguration } from "../tests/fixtures/large-configurations";
import { printRows, quantile } from "./lib/bench-report";

const baseUrl = (process.env.BENCH_URL ?? "http://127.0.0.1:3000").replace(/\/+$/, "");
const durationSeconds = positiveNumber(process.env.BENCH_DURATION, 10);
const connections = positiveNumber(process.env.BENCH_CONNECTIONS, 16);
const warmupSeconds = Math.min(3, durationSeconds);
/** What a browser sends with the app's own fetches (the proxy's CSRF check is skipped for them, see proxy.ts). */
const sameOriginHeaders = { origin: baseUrl, "sec-fetch-site": "same-origin" };
/** Linux USER_HZ, the unit of utime/stime in /proc/<pid>/stat. */
const clockTicksPerSecond = 100;

interface CaseReport {
  name: string;
  method: string;
  path: string;
  status: "measured" | "not measured";
  reason?: string;
  requests?: number;
  p50Ms?: number;
  p95Ms?: number;
  p99Ms?: number;
  meanMs?: number;
  requestsPerSecond?: number;
  bytesPerSecond?: number;
  statusCounts?: Record<string, number>;
  errors?: number;
  timeouts?: number;
  /** Requests per second as a fraction of the health route's in the same run and mode. */
  throughputToYardstick?: number;
  /** Server process CPU time per request (BENCH_SERVER_PID), unaffected by queueing on a busy machine. */
  serverCpuMsPerRequest?: number;
  /** For health: the requests per second of each of its runs, in order. */
  runsPerSecond?: number[];
}

interface TargetReport {
  target: string;
  limit: string;
  measured: string;
  status: "PASS" | "FAIL" | "NOT MEASURED";
  note?: string;
}

interface Session {
  cookie: string;
}

interface ConfigurationHandle {
  id: string;
  version: string;
  document: unknown;
  busy: boolean;
}

async function main(): Promise<void> {
  const health = await probe("GET", "/api/health");
  if (health === undefined) {
    console.error(`No server answers at ${baseUrl}. Start the production server first (npm run build && npm run serve).`);
    process.exitCode = 1;
    return;
  }
  const session = await signIn();
  const authHeaders: Record<string, string> = session ? { cookie: session.cookie } : {};
  const handles = session ? await createScratchConfigurations(session) : { handles: [], reason: "sign-in failed (set BENCH_EMAIL and BENCH_PASSWORD)" };

  // The same cases with 16 connections (throughput, read against health) and with one client (latency).
  const loaded = await runCases(connections, handles, authHeaders);
  const single = await runCases(1, handles, authHeaders);
  const resultsPage = session ? await timeLargeResultsPage(session) : undefined;
  const firstLoad = session && handles.handles[0] ? await weighDesignerFirstLoad(session, handles.handles[0].id) : undefined;
  if (session) await deleteScratchConfigurations(session, handles.handles);

  const targets: TargetReport[] = [
    ratioTarget(loaded, "spectrum", "POST /api/spectrum throughput", 0.5),
    ratioTarget(loaded, "configuration read", "configuration read with its stored result, throughput", 0.7),
    ratioTarget(loaded, "save", "save (revision + result) throughput", 0.35),
    latencyTarget(single, "spectrum", "POST /api/spectrum, one client", 8),
    latencyTarget(single, "configuration read", "configuration read, one client", 6),
    latencyTarget(single, "save", "save, one client", 15),
    resultsPage
      ? {
          target: "results page of 64 stacks interactive",
          limit: `< ${resultsPageLimitMs} ms`,
          measured: `${resultsPage.interactiveMs.toFixed(0)} ms (first sector card ${resultsPage.firstCardMs.toFixed(0)} ms, ${(resultsPage.htmlBytes / 1e6).toFixed(2)} MB of HTML; median of ${resultsPage.runs})`,
          status: resultsPage.interactiveMs < resultsPageLimitMs ? "PASS" : "FAIL",
        }
      : { target: "results page of 64 stacks interactive", limit: `< ${resultsPageLimitMs} ms`, measured: "-", status: "NOT MEASURED" },
    firstLoad
      ? {
          target: "designer first-load JS",
          limit: `< ${designerFirstLoadLimitKb} kB gzipped`,
          measured: `${firstLoad.gzippedKb.toFixed(1)} kB (${firstLoad.scripts} scripts)`,
          status: firstLoad.gzippedKb < designerFirstLoadLimitKb ? "PASS" : "FAIL",
        }
      : { target: "designer first-load JS", limit: `< ${designerFirstLoadLimitKb} kB gzipped`, measured: "-", status: "NOT MEASURED" },
  ];

  printReport(`${connections} connections`, loaded);
  printReport("1 connection", single);
  console.log("\nTargets (product.md; throughput read as a ratio to the health route in the same run):");
  printRows(
    ["target", "limit", "measured", "status"],
    targets.map((t) => [t.target, t.limit, t.measured, t.status + (t.note ? `: ${t.note}` : "")]),
  );
  const out = {
    generatedAt: new Date().toISOString(),
    url: baseUrl,
    connections,
    durationSeconds,
    node: process.version,
    cpu: os.cpus()[0]?.model ?? "unknown",
    cpus: os.cpus().length,
    signedIn: session !== undefined,
    loadAverage: os.loadavg(),
    cases: { [`${connections} connections`]: loaded, "1 connection": single },
    resultsPage,
    designerFirstLoad: firstLoad,
    targets,
  };
  const dir = path.resolve(process.cwd(), "bench-results");
  mkdirSync(dir, { recursive: true });
  writeFileSync(path.join(dir, "api.json"), `${JSON.stringify(out, null, 2)}\n`);
  console.log(`\nWrote ${path.relative(process.cwd(), path.join(dir, "api.json"))}`);
}

/**
 * The four cases at `clients` connections: health (the yardstick), a compute whose body differs on
 * every request (a probe position moves by a step each time, so no cache can serve it), a read of
 * a configuration with its stored result, and saves of documents that differ on every request.
 */
async function runCases(
  clients: number,
  handles: { handles: ConfigurationHandle[]; reason: string },
  authHeaders: Record<string, string>,
): Promise<CaseReport[]> {
  console.log(`\n${clients} connection${clients === 1 ? "" : "s"}:`);
  const health = () => runCase("health", { method: "GET", path: "/api/health" }, { clients });
  const healthRuns: CaseReport[] = [await health()];
  const reports: CaseReport[] = [];
  /** Runs a case, then health again; the case is read against the health runs around it. */
  const measure = async (run: () => Promise<CaseReport>): Promise<void> => {
    const before = healthRuns[healthRuns.length - 1];
    const report = await run();
    const after = await health();
    healthRuns.push(after);
    const yardstick = ((before?.requestsPerSecond ?? Number.NaN) + (after.requestsPerSecond ?? Number.NaN)) / 2;
    if (report.requestsPerSecond !== undefined && yardstick > 0) report.throughputToYardstick = report.requestsPerSecond / yardstick;
    reports.push(report);
  };
  const spectrumHeaders = { "content-type": "application/json", ...sameOriginHeaders };
  await measure(() =>
    runCase(
      "spectrum",
      {
        method: "POST",
        path: "/api/spectrum",
        headers: spectrumHeaders,
        setupRequest: (request) => ({ ...request, body: JSON.stringify(variedDocument(benchPreviewDemo, nextStep())) }),
      },
      { clients },
    ),
  );
  const first = handles.handles[0];
  if (!first) {
    reports.push(notMeasured("configuration read", "GET", "/api/configurations/:id?include=result", handles.reason));
    reports.push(notMeasured("save", "PUT", "/api/configurations/:id", handles.reason));
  } else {
    const readPath = `/api/configurations/${encodeURIComponent(first.id)}?include=result`;
    const plainPath = `/api/configurations/${encodeURIComponent(first.id)}`;
    // One request first, so that a route compiled on demand is ready before timing starts.
    await probe("GET", readPath, authHeaders);
    await measure(() => runCase("configuration read", { method: "GET", path: readPath, headers: authHeaders }, { clients }));
    await measure(() => runCase(referenceReadName, { method: "GET", path: plainPath, headers: authHeaders }, { clients }));
    // autocannon's warm-up would abort saves in flight and leave stale versions behind, so the
    // save case warms up with one sequential save per scratch configuration instead.
    await warmUpSaves(handles.handles, authHeaders);
    await measure(() => runCase("save", saveRequest(handles.handles, authHeaders), { warmup: false, clients }));
  }
  // Health itself, as one row: every run summed, against their own mean (1.00x).
  return [mergeRuns(healthRuns), ...reports];
}

/** The reference case: a configuration read without its result (no target). */
const referenceReadName = "configuration read, no result (reference)";

/** One report of several runs of the same case: counts summed, latencies of the runs' worst, throughput averaged. */
function mergeRuns(runs: CaseReport[]): CaseReport {
  const [first] = runs;
  if (!first) throw new Error("no health run");
  const measured = runs.filter((run) => run.requestsPerSecond !== undefined);
  const mean = (pick: (run: CaseReport) => number | undefined) =>
    measured.reduce((sum, run) => sum + (pick(run) ?? 0), 0) / Math.max(1, measured.length);
  const statusCounts: Record<string, number> = {};
  for (const run of runs) for (const [code, count] of Object.entries(run.statusCounts ?? {})) statusCounts[code] = (statusCounts[code] ?? 0) + count;
  return {
    ...first,
    requests: runs.reduce((sum, run) => sum + (run.requests ?? 0), 0),
    p50Ms: mean((run) => run.p50Ms),
    p95Ms: Math.max(...runs.map((run) => run.p95Ms ?? 0)),
    p99Ms: Math.max(...runs.map((run) => run.p99Ms ?? 0)),
    meanMs: mean((run) => run.meanMs),
    requestsPerSecond: mean((run) => run.requestsPerSecond),
    bytesPerSecond: mean((run) => run.bytesPerSecond),
    serverCpuMsPerRequest: measured.every((run) => run.serverCpuMsPerRequest !== undefined) ? mean((run) => run.serverCpuMsPerRequest) : undefined,
    statusCounts,
    errors: runs.reduce((sum, run) => sum + (run.errors ?? 0), 0),
    timeouts: runs.reduce((sum, run) => sum + (run.timeouts ?? 0), 0),
    throughputToYardstick: 1,
    runsPerSecond: runs.map((run) => run.requestsPerSecond ?? Number.NaN),
  };
}

let step = 0;
/** A new step for every varied request of the run. */
function nextStep(): number {
  step += 1;
  return step;
}

/**
 * A shift of less than a thousandth of sqrt(alpha') drawn once per run: stored results are
 * content-addressed and outlive a run, so without it a later run against the same database would
 * send the documents an earlier one saved and the save case would reuse their results.
 */
const runShift = randomInt(1, 1_000_000) / 1e9;

/**
 * The document with its last stack moved along its last Dirichlet axis by `stepIndex` thousandths
 * of sqrt(alpha') (plus this run's `runShift`): a different body, and different numbers, on every
 * request of every run.
 */
function variedDocument<T extends { stacks: Array<{ position: Record<string, number>; worldvolume: number[] }> }>(document: T, stepIndex: number): T {
  const stacks = document.stacks.map((stack, index) => {
    if (index !== document.stacks.length - 1) return stack;
    const axis = [9, 8, 7, 6, 5, 4, 3, 2, 1].find((candidate) => !stack.worldvolume.includes(candidate)) ?? 9;
    const key = String(axis);
    return { ...stack, position: { ...stack.position, [key]: (stack.position[key] ?? 0) + (stepIndex % 100_000) / 1000 + runShift } };
  });
  return { ...document, stacks };
}

function ratioTarget(reports: CaseReport[], name: string, target: string, minimum: number): TargetReport {
  const report = reports.find((r) => r.name === name);
  const limit = `>= ${minimum}x health`;
  if (!report || report.throughputToYardstick === undefined) return { target, limit, measured: "-", status: "NOT MEASURED", note: report?.reason };
  const failures = nonSuccesses(report);
  return {
    target,
    limit,
    measured: `${report.throughputToYardstick.toFixed(2)}x (${fixed(report.requestsPerSecond, 0)} req/s)`,
    status: report.throughputToYardstick >= minimum && failures === 0 ? "PASS" : "FAIL",
    note: failures > 0 ? `${failures} non-2xx responses (${JSON.stringify(report.statusCounts)})` : undefined,
  };
}

function latencyTarget(reports: CaseReport[], name: string, target: string, limitMs: number): TargetReport {
  const report = reports.find((r) => r.name === name);
  const limit = `p95 < ${limitMs} ms`;
  if (!report || report.p95Ms === undefined) return { target, limit, measured: "-", status: "NOT MEASURED", note: report?.reason };
  const failures = nonSuccesses(report);
  return {
    target,
    limit,
    measured: `${report.p95Ms.toFixed(1)} ms`,
    status: report.p95Ms < limitMs && failures === 0 ? "PASS" : "FAIL",
    note: failures > 0 ? `${failures} non-2xx responses (${JSON.stringify(report.statusCounts)})` : undefined,
  };
}

function nonSuccesses(report: CaseReport): number {
  return Object.entries(report.statusCounts ?? {})
    .filter(([code]) => !code.startsWith("2"))
    .reduce((sum, [, count]) => sum + count, 0);
}

/** issue 16: "64 stacks interactive under 2 s on this machine". */
const resultsPageLimitMs = 2000;

interface ResultsPageReport {
  runs: number;
  /** Median time from navigation to the first sector card on screen. */
  firstCardMs: number;
  /** Median time from navigation to the first sector's level table after opening it. */
  interactiveMs: number;
  htmlBytes: number;
}

/**
 * Times the results page of the largest accepted configuration (64 stacks, 2080 sectors) in
 * Debian's Chromium: from navigation to the first sector card, and to the first sector's level
 * table after clicking it open (the page answers input). The median of three loads after one
 * warm-up load; undefined when the browser or the page is unavailable.
 */
async function timeLargeResultsPage(session: Session): Promise<ResultsPageReport | undefined> {
  const created = await createConfiguration(session, largestConfiguration, "bench:api results page");
  if (!created) return undefined;
  const { chromium } = await import("@playwright/test");
  const browser = await chromium
    .launch({ executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium", args: ["--no-sandbox"] })
    .catch((error: unknown) => {
      console.warn(`results page not timed: ${error instanceof Error ? error.message : String(error)}`);
      return undefined;
    });
  try {
    if (!browser) return undefined;
    const context = await browser.newContext();
    await context.addCookies(cookiesOf(session));
    const samples: Array<{ firstCardMs: number; interactiveMs: number; htmlBytes: number }> = [];
    for (let run = 0; run < 4; run += 1) {
      const page = await context.newPage();
      const started = performance.now();
      const response = await page.goto(`${baseUrl}/configurations/${encodeURIComponent(created.id)}/results`);
      if (response?.status() !== 200) return undefined;
      const htmlBytes = (await response.body()).length;
      const firstCard = page.locator("[data-testid^=sector-]").first();
      await firstCard.waitFor({ timeout: 60_000 });
      const firstCardMs = performance.now() - started;
      await firstCard.locator("summary").click();
      await page.getByRole("table", { name: /Levels of sector/ }).first().waitFor({ timeout: 60_000 });
      const interactiveMs = performance.now() - started;
      await page.close();
      // The first load warms the server's compiled routes and caches; it is not counted.
      if (run > 0) samples.push({ firstCardMs, interactiveMs, htmlBytes });
    }
    const median = (values: number[]) => values.sort((a, b) => a - b)[Math.floor(values.length / 2)] ?? 0;
    return {
      runs: samples.length,
      firstCardMs: median(samples.map((s) => s.firstCardMs)),
      interactiveMs: median(samples.map((s) => s.interactiveMs)),
      htmlBytes: samples[0]?.htmlBytes ?? 0,
    };
  } finally {
    await browser?.close();
    await deleteScratchConfigurations(session, [{ id: created.id, version: "", document: null, busy: false }]);
  }
}

/** product.md: "first-load JavaScript of the designer route under 350 kB gzipped". */
const designerFirstLoadLimitKb = 350;

interface FirstLoadReport {
  scripts: number;
  rawKb: number;
  gzippedKb: number;
}

/**
 * Weighs the JavaScript a browser loads to open the designer until its canvas is drawn: Debian's
 * Chromium (headless, as in the browser tests) opens the page signed in, and every script response,
 * chunks imported after hydration included, is gzipped (zlib's default level, as servers usually
 * send it) and summed in kB (1000 bytes). Undefined when the browser or the page is unavailable.
 */
async function weighDesignerFirstLoad(session: Session, configurationId: string): Promise<FirstLoadReport | undefined> {
  const { chromium } = await import("@playwright/test");
  const browser = await chromium
    .launch({ executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium", args: ["--no-sandbox"] })
    .catch((error: unknown) => {
      console.warn(`designer first-load JS not measured: ${error instanceof Error ? error.message : String(error)}`);
      return undefined;
    });
  if (!browser) return undefined;
  try {
    const context = await browser.newContext();
    await context.addCookies(cookiesOf(session));
    const page = await context.newPage();
    const bodies: Promise<Buffer | undefined>[] = [];
    page.on("response", (response) => {
      if (response.request().resourceType() === "script") bodies.push(response.body().catch(() => undefined));
    });
    const response = await page.goto(`${baseUrl}/configurations/${encodeURIComponent(configurationId)}`);
    if (response?.status() !== 200 || !page.url().includes(`/configurations/${configurationId}`)) return undefined;
    await page.getByRole("application", { name: /Canvas showing/ }).waitFor({ timeout: 60_000 });
    await page.waitForLoadState("networkidle");
    const scripts = (await Promise.all(bodies)).filter((body): body is Buffer => body !== undefined);
    return {
      scripts: scripts.length,
      rawKb: scripts.reduce((sum, body) => sum + body.length, 0) / 1000,
      gzippedKb: scripts.reduce((sum, body) => sum + gzipSync(body).length, 0) / 1000,
    };
  } finally {
    await browser.close();
  }
}

/** Runs one autocannon case after a warm-up and summarises every response time it saw. */
async function runCase(name: string, request: RequestSpec, options: { warmup?: boolean; clients?: number } = {}): Promise<CaseReport> {
  const clients = options.clients ?? connections;
  const method = request.method ?? "GET";
  // Reported with ":id" in place of the scratch configuration's id.
  const requestPath = (request.path ?? "/").replace(/\/api\/configurations\/[^/]+/, "/api/configurations/:id");
  process.stdout.write(`${name}: ${method} ${requestPath} for ${durationSeconds} s with ${clients} connection${clients === 1 ? "" : "s"}... `);
  const times: number[] = [];
  const statusCounts: Record<string, number> = {};
  const instance = autocannon({
    url: baseUrl,
    connections: clients,
    duration: durationSeconds,
    timeout: 30,
    requests: [request],
    ...(options.warmup === false ? {} : { warmup: { connections: clients, duration: warmupSeconds } }),
  });
  // The main run (after the warm-up) starts with this event; server CPU is read around it.
  let cpuAtStart: number | undefined;
  instance.on("start", () => {
    cpuAtStart = serverCpuMs();
  });
  instance.on("response", (_client: unknown, statusCode: number, _bytes: number, responseTime: number) => {
    times.push(responseTime);
    statusCounts[String(statusCode)] = (statusCounts[String(statusCode)] ?? 0) + 1;
  });
  const result = await instance;
  const cpuAtEnd = serverCpuMs();
  times.sort((a, b) => a - b);
  console.log("done");
  return {
    name,
    method,
    path: requestPath,
    status: "measured",
    requests: times.length,
    p50Ms: quantile(times, 0.5),
    p95Ms: quantile(times, 0.95),
    p99Ms: quantile(times, 0.99),
    meanMs: times.reduce((s, x) => s + x, 0) / Math.max(1, times.length),
    requestsPerSecond: result.requests.average,
    bytesPerSecond: result.throughput.average,
    statusCounts,
    errors: result.errors,
    timeouts: result.timeouts,
    serverCpuMsPerRequest:
      cpuAtStart !== undefined && cpuAtEnd !== undefined && times.length > 0 ? (cpuAtEnd - cpuAtStart) / times.length : undefined,
  };
}

/**
 * CPU time (user + system) used so far by the server processes named in BENCH_SERVER_PID
 * (comma-separated pids, e.g. the next-server process), from /proc; undefined when unset or unreadable.
 */
function serverCpuMs(): number | undefined {
  const pids = (process.env.BENCH_SERVER_PID ?? "").split(",").map((p) => p.trim()).filter(Boolean);
  if (pids.length === 0) return undefined;
  let total = 0;
  for (const pid of pids) {
    try {
      // Fields after the parenthesised command name; utime and stime are fields 14 and 15, in clock ticks.
      const stat = readFileSync(`/proc/${pid}/stat`, "utf8");
      const fields = stat.slice(stat.lastIndexOf(")") + 2).split(" ");
      total += (Number(fields[11]) + Number(fields[12])) * (1000 / clockTicksPerSecond);
    } catch {
      return undefined;
    }
  }
  return total;
}

/**
 * A save request that gives every in-flight request its own configuration and current
 * version, so that the benchmark measures saves rather than 409 conflicts.
 */
function saveRequest(handles: ConfigurationHandle[], authHeaders: Record<string, string>): RequestSpec {
  return {
    method: "PUT",
    path: `/api/configurations/${encodeURIComponent(handles[0]?.id ?? "")}`,
    setupRequest: (request, context) => {
      const handle = handles.find((h) => !h.busy) ?? handles[0];
      if (!handle) return request;
      handle.busy = true;
      context["handle"] = handle.id;
      return {
        ...request,
        path: `/api/configurations/${encodeURIComponent(handle.id)}`,
        headers: { ...authHeaders, "content-type": "application/json", ...sameOriginHeaders, "if-match": handle.version },
        // A document that differs on every save, so that no stored result can be reused.
        body: JSON.stringify({ document: variedDocument(handle.document as typeof benchPreviewDemo, nextStep()), message: "bench:api save" }),
      };
    },
    onResponse: (status, body, context, headers) => {
      const handle = handles.find((h) => h.id === context["handle"]);
      if (!handle) return;
      handle.busy = false;
      if (status >= 200 && status < 300) handle.version = readVersion(body, headers) ?? handle.version;
      // A 409 names the current version; take it so the next save on this copy succeeds.
      if (status === 409) handle.version = readCurrentVersion(body) ?? handle.version;
    },
  };
}

/** One save per scratch configuration, sequentially, updating each version. */
async function warmUpSaves(handles: ConfigurationHandle[], authHeaders: Record<string, string>): Promise<void> {
  for (const handle of handles) {
    const response = await fetch(`${baseUrl}/api/configurations/${encodeURIComponent(handle.id)}`, {
      method: "PUT",
      headers: { ...authHeaders, "content-type": "application/json", ...sameOriginHeaders, "if-match": handle.version },
      body: JSON.stringify({ document: handle.document, message: "bench:api warm-up save" }),
    });
    const text = await response.text();
    const headers = Object.fromEntries(response.headers.entries());
    handle.version = (response.ok ? readVersion(text, headers) : readCurrentVersion(text)) ?? handle.version;
  }
}

/** `currentVersion` of a 409 body, as an If-Match value. */
function readCurrentVersion(body: string): string | undefined {
  try {
    const current = objectField(JSON.parse(body) as unknown, "currentVersion");
    return typeof current === "number" || typeof current === "string" ? `"${String(current)}"` : undefined;
  } catch {
    return undefined;
  }
}

/** Signs in with next-auth's credentials flow when BENCH_EMAIL and BENCH_PASSWORD are set. */
async function signIn(): Promise<Session | undefined> {
  // Defaults: a demo account of db/seed.ts (its password is listed in the README).
  const email = process.env.BENCH_EMAIL ?? "ada@mooring.test";
  const password = process.env.BENCH_PASSWORD ?? "demo-password-1";
  const csrfResponse = await fetch(`${baseUrl}/api/auth/csrf`);
  const { csrfToken } = (await csrfResponse.json()) as { csrfToken?: string };
  const csrfCookies = cookiePairs(csrfResponse);
  if (!csrfToken) throw new Error("next-auth returned no CSRF token");
  const response = await fetch(`${baseUrl}/api/auth/callback/password`, {
    method: "POST",
    redirect: "manual",
    headers: { "content-type": "application/x-www-form-urlencoded", cookie: csrfCookies.join("; "), origin: baseUrl },
    body: new URLSearchParams({ csrfToken, email, password, json: "true" }).toString(),
  });
  const cookies = [...csrfCookies, ...cookiePairs(response)];
  if (!cookies.some((c) => c.includes("session-token="))) {
    console.log(`Sign-in as ${email} failed (status ${response.status}): measuring the anonymous cases only.`);
    return undefined;
  }
  return { cookie: cookies.join("; ") };
}

/** Creates one scratch configuration per connection in the account's personal space. */
async function createScratchConfigurations(session: Session): Promise<{ handles: ConfigurationHandle[]; reason: string }> {
  const headers = { cookie: session.cookie, origin: baseUrl };
  const groupsResponse = await fetch(`${baseUrl}/api/groups`, { headers });
  if (groupsResponse.status === 404) return { handles: [], reason: "GET /api/groups is missing (404)" };
  if (!groupsResponse.ok) return { handles: [], reason: `GET /api/groups answered ${groupsResponse.status}` };
  const groups = (await groupsResponse.json()) as unknown;
  const personal = (Array.isArray(groups) ? groups : []).find((g) => stringField(g, "kind") === "personal");
  const groupId = stringField(personal, "id");
  if (!groupId) return { handles: [], reason: "the account has no personal space" };

  const handles: ConfigurationHandle[] = [];
  for (let i = 0; i < connections; i++) {
    const document = { ...benchPreviewDemo, title: `bench:api scratch ${i + 1}` };
    const response = await fetch(`${baseUrl}/api/configurations`, {
      method: "POST",
      headers: { ...headers, "content-type": "application/json" },
      body: JSON.stringify({ groupId, document, message: "bench:api scratch copy" }),
    });
    const text = await response.text();
    if (response.status === 404) return { handles, reason: "POST /api/configurations is missing (404)" };
    if (!response.ok) return { handles, reason: `POST /api/configurations answered ${response.status}: ${text.slice(0, 200)}` };
    const id = stringField(JSON.parse(text) as unknown, "id");
    const version = readVersion(text, Object.fromEntries(response.headers.entries()));
    if (id && version) handles.push({ id, version, document, busy: false });
  }
  return { handles, reason: handles.length === 0 ? "no scratch configuration could be created" : "" };
}

/** Creates one configuration in the account's personal space; undefined when that fails. */
async function createConfiguration(session: Session, document: unknown, message: string): Promise<{ id: string } | undefined> {
  const headers = { cookie: session.cookie, origin: baseUrl };
  const groups = (await (await fetch(`${baseUrl}/api/groups`, { headers })).json()) as unknown;
  const groupId = stringField((Array.isArray(groups) ? groups : []).find((g) => stringField(g, "kind") === "personal"), "id");
  if (!groupId) return undefined;
  const response = await fetch(`${baseUrl}/api/configurations`, {
    method: "POST",
    headers: { ...headers, "content-type": "application/json" },
    body: JSON.stringify({ groupId, document, message }),
  });
  const id = stringField((await response.json()) as unknown, "id");
  return response.ok && id ? { id } : undefined;
}

/** The session's cookies for a browser context. */
function cookiesOf(session: Session): Array<{ name: string; value: string; url: string }> {
  return session.cookie.split("; ").map((pair) => {
    const cut = pair.indexOf("=");
    return { name: pair.slice(0, cut), value: pair.slice(cut + 1), url: baseUrl };
  });
}

/** Soft-deletes the scratch configurations of the run. */
async function deleteScratchConfigurations(session: Session, handles: ConfigurationHandle[]): Promise<void> {
  let failed = 0;
  for (const handle of handles) {
    const response = await fetch(`${baseUrl}/api/configurations/${encodeURIComponent(handle.id)}`, {
      method: "DELETE",
      headers: { cookie: session.cookie, origin: baseUrl },
    });
    if (!response.ok) failed++;
  }
  if (failed > 0) console.log(`Could not delete ${failed} scratch configuration(s) titled "bench:api scratch N".`);
}

/** The version of a configuration from an ETag header or a `version` field of the JSON body. */
function readVersion(body: string, headers: Record<string, string>): string | undefined {
  const etag = headers["etag"];
  if (etag) return etag;
  try {
    const parsed = JSON.parse(body) as unknown;
    const version = objectField(parsed, "version") ?? objectField(objectField(parsed, "configuration"), "version");
    return typeof version === "number" || typeof version === "string" ? String(version) : undefined;
  } catch {
    return undefined;
  }
}

/** One request before the load run: the status code, or undefined when nothing answers. */
async function probe(method: string, route: string, headers?: Record<string, string>, body?: string): Promise<number | undefined> {
  try {
    const response = await fetch(`${baseUrl}${route}`, { method, headers, body });
    await response.arrayBuffer();
    return response.status;
  } catch {
    return undefined;
  }
}

function notMeasured(name: string, method: string, route: string, reason: string): CaseReport {
  return { name, method, path: route, status: "not measured", reason };
}

function printReport(mode: string, reports: CaseReport[]): void {
  const [load] = os.loadavg();
  console.log(`\nAPI benchmark, ${baseUrl}, ${mode}, ${durationSeconds} s per case (load average ${(load ?? 0).toFixed(1)} on ${os.cpus().length} cores)`);
  printRows(
    ["case", "requests", "p50 ms", "p95 ms", "p99 ms", "req/s", "req/s / health", "server CPU ms/req", "statuses"],
    reports.map((r) =>
      r.status === "measured"
        ? [
            `${r.name} (${r.method} ${r.path})`,
            String(r.requests ?? 0),
            fixed(r.p50Ms),
            fixed(r.p95Ms),
            fixed(r.p99Ms),
            fixed(r.requestsPerSecond, 0),
            r.throughputToYardstick === undefined ? "-" : `${r.throughputToYardstick.toFixed(2)}x`,
            fixed(r.serverCpuMsPerRequest, 2),
            Object.entries(r.statusCounts ?? {})
              .map(([code, count]) => `${code}:${count}`)
              .join(" ") + (r.errors ? ` errors:${r.errors}` : ""),
          ]
        : [`${r.name} (${r.method} ${r.path})`, "-", "-", "-", "-", "-", "-", "-", `not measured: ${r.reason ?? ""}`],
    ),
  );
  const healthRuns = reports[0]?.runsPerSecond;
  if (healthRuns && healthRuns.length > 1) {
    console.log(`health runs, before the first case and after each: ${healthRuns.map((rate) => rate.toFixed(0)).join(", ")} req/s; each case is read against the two around it`);
  }
}

function fixed(value: number | undefined, digits = 1): string {
  return value === undefined ? "-" : value.toFixed(digits);
}

function positiveNumber(raw: string | undefined, fallback: number): number {
  const value = Number(raw);
  return raw !== undefined && Number.isFinite(value) && value > 0 ? value : fallback;
}

/** "name=value" pairs of a response's Set-Cookie headers. */
function cookiePairs(response: Response): string[] {
  return response.headers.getSetCookie().map((c) => c.split(";")[0] ?? "").filter((c) => c.includes("="));
}

function objectField(value: unknown, key: string): unknown {
  return typeof value === "object" && value !== null && key in value ? (value as Record<string, unknown>)[key] : undefined;
}

function stringField(value: unknown, key: string): string | undefined {
  const field = objectField(value, key);
  return typeof field === "string" ? field : typeof field === "number" ? String(field) : undefined;
}

main().catch((error: unknown) => {
  console.error("bench:api failed:", error);
  process.exitCode = 1;
});
