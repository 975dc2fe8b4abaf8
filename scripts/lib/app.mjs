// Steps on the application shared by `npm start` and `npm test`: migrate, seed, build, serve, mail.
import { existsSync, mkdirSync } from "node:fs";
import path from "node:path";
import { isPortInUse } from "./net.mjs";
import { bin, runStep, startService, waitForHttp } from "./processes.mjs";
import { repoRoot } from "./postgres.mjs";
import { hasNpmScript } from "./setup.mjs";

/** Environment for the app (build, server, tests) against one database and one mail server. */
export function appEnv({ databaseUrl, appPort, smtpPort, mailboxPort, secret }) {
  return {
    ...process.env,
    DATABASE_URL: databaseUrl,
    NEXTAUTH_URL: `http://127.0.0.1:${appPort}`,
    NEXTAUTH_SECRET: secret,
    SMTP_URL: process.env.SMTP_URL ?? `smtp://127.0.0.1:${smtpPort}`,
    MAILBOX_URL: `http://127.0.0.1:${mailboxPort}`,
    // No network calls from the build or the server.
    NEXT_TELEMETRY_DISABLED: "1",
    // vitest 4 warns about loading vitest.config.ts through the CommonJS loader; it works as is.
    VITE_CONFIG_NATIVE_IGNORE_WARNING: "true",
  };
}

/** The file each database script runs; the step is skipped (with a message) until it exists. */
const scriptFiles = { "db:migrate": "db/migrate.ts", "db:seed": "db/seed.ts" };

/**
 * Runs `npm run <script>` against `env` when package.json defines it (and its file exists); otherwise
 * says so and skips. Returns { code, output, skipped }.
 */
export async function runNpmScriptIfPresent(script, env, what) {
  const file = scriptFiles[script];
  const missing = !hasNpmScript(script)
    ? `package.json has no "${script}" script yet`
    : file && !existsSync(path.join(repoRoot, file))
      ? `${file} does not exist yet`
      : null;
  if (missing) {
    console.log(`[mooring] skipping ${what}: ${missing}`);
    return { code: 0, output: "", skipped: true };
  }
  const result = await runStep("npm", ["run", "-s", script], { env });
  return { ...result, skipped: false };
}

/** `next build` with the app's environment, into `.next` (or NEXT_DIST_DIR when set). */
export function buildApp(env) {
  return runStep(bin("next"), ["build"], { env });
}

/**
 * Starts maildev (fake SMTP that keeps every message) on loopback and waits for its REST API.
 * Messages are kept in `dir` (git-ignored). The handle is pushed on `services` before waiting.
 */
export async function startMaildev({ smtpPort, webPort, dir, services }) {
  mkdirSync(dir, { recursive: true });
  const handle = startService("maildev", bin("maildev"), [
    "--smtp", String(smtpPort),
    "--web", String(webPort),
    "--ip", "127.0.0.1",
    "--web-ip", "127.0.0.1",
    "--mail-directory", dir,
  ]);
  services.push(handle);
  await waitForHttp(`http://127.0.0.1:${webPort}/healthz`, handle, 30_000);
  return handle;
}

/** Deletes every message the fake mail server holds (so browser tests start from an empty mailbox). */
export async function clearMailbox(mailboxUrl) {
  const response = await fetch(`${mailboxUrl}/email/all`, { method: "DELETE" });
  if (!response.ok) throw new Error(`maildev answered ${response.status} to DELETE /email/all`);
}

/**
 * Serves the build in `.next` (or NEXT_DIST_DIR) on 127.0.0.1:port through scripts/serve.mjs (the
 * custom server that resolves client addresses), pushes its handle on `services`, and waits until
 * it answers.
 */
export async function startApp({ port, env, services, inherit = false }) {
  // Something else answering there would pass the readiness check below in our server's place.
  if (await isPortInUse(Number(port))) throw new Error(`port ${port} on 127.0.0.1 is already in use; the app was not started`);
  const handle = startService("app", process.execPath, [path.join(repoRoot, "scripts", "serve.mjs"), "-H", "127.0.0.1", "-p", String(port)], {
    env: { ...env, NODE_ENV: "production" },
    inherit,
  });
  services.push(handle);
  await waitForHttp(`http://127.0.0.1:${port}/`, handle);
  return handle;
}

/** Folder for the git-ignored runtime files of one run (`.data/<name>`). */
export function dataDir(name) {
  return path.join(repoRoot, ".data", name);
}

/**
 * Starts `count` sweep workers (the script of `npm run worker`, run by node with tsx's loader so
 * that stopping the service stops the worker itself) against `env`'s database; pushes their
 * handles on `services`.
 */
export function startWorkers({ count, env, services, inherit = false }) {
  for (let i = 1; i <= count; i += 1) {
    const name = count > 1 ? `worker-${i}` : "worker";
    services.push(
      startService(name, process.execPath, ["--import", "tsx", "--conditions=react-server", "scripts/sweep-worker.ts"], { env, inherit }),
    );
  }
}
