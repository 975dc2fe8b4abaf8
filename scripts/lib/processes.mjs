// Child processes for `npm start` and `npm test`: steps that run to completion, and services
// (maildev, the app server) that run in their own process group so they can be stopped as a whole.
import { spawn } from "node:child_process";
import path from "node:path";
import { repoRoot } from "./postgres.mjs";

/** Absolute path of a binary installed by npm in node_modules/.bin. */
export function bin(name) {
  return path.join(repoRoot, "node_modules", ".bin", name);
}

const ansi = /\x1b\[[0-9;?]*[A-Za-z]/g;

/**
 * Runs a command to completion with inherited-looking output (copied to our stdout/stderr) and
 * returns { code, output } where output is the combined text without colour codes.
 */
export function runStep(cmd, args, { env = process.env, cwd = repoRoot } = {}) {
  return new Promise((resolve) => {
    const child = spawn(cmd, args, { cwd, env: { FORCE_COLOR: "1", ...env }, stdio: ["ignore", "pipe", "pipe"] });
    let output = "";
    child.stdout.on("data", (chunk) => {
      process.stdout.write(chunk);
      output += chunk.toString();
    });
    child.stderr.on("data", (chunk) => {
      process.stderr.write(chunk);
      output += chunk.toString();
    });
    child.on("error", (error) => {
      output += String(error);
      resolve({ code: 127, output: output.replace(ansi, "") });
    });
    child.on("close", (code, signal) => resolve({ code: code ?? (signal ? 128 : 1), output: output.replace(ansi, "") }));
  });
}

/**
 * Starts a long-running service in its own process group. Output lines are prefixed with
 * `[name]` unless `inherit` is set. Returns a handle for `stopService`.
 */
export function startService(name, cmd, args, { env = process.env, inherit = false } = {}) {
  const child = spawn(cmd, args, {
    cwd: repoRoot,
    env,
    detached: true,
    stdio: inherit ? ["ignore", "inherit", "inherit"] : ["ignore", "pipe", "pipe"],
  });
  const handle = { name, child, exited: false, exitCode: null };
  const exited = new Promise((resolve) => {
    child.on("exit", (code, signal) => {
      handle.exited = true;
      handle.exitCode = code ?? (signal ? 128 : 1);
      resolve(handle.exitCode);
    });
    child.on("error", (error) => {
      process.stderr.write(`[${name}] failed to start: ${error.message}\n`);
      handle.exited = true;
      handle.exitCode = 127;
      resolve(127);
    });
  });
  handle.exitedPromise = exited;
  if (!inherit) {
    for (const stream of [child.stdout, child.stderr]) {
      let partial = "";
      stream.on("data", (chunk) => {
        const lines = (partial + chunk.toString()).split("\n");
        partial = lines.pop() ?? "";
        for (const line of lines) process.stdout.write(`[${name}] ${line}\n`);
      });
    }
  }
  return handle;
}

/** Stops a service's process group: SIGTERM, then SIGKILL after `graceMs`. */
export async function stopService(handle, graceMs = 5000) {
  if (!handle || handle.exited || handle.child.pid === undefined) return;
  const signalGroup = (signal) => {
    try {
      process.kill(-handle.child.pid, signal);
    } catch {
      // Already gone.
    }
  };
  signalGroup("SIGTERM");
  const timer = new Promise((resolve) => setTimeout(() => resolve("timeout"), graceMs));
  if ((await Promise.race([handle.exitedPromise, timer])) === "timeout") {
    signalGroup("SIGKILL");
    await handle.exitedPromise;
  }
}

/**
 * Waits until `url` answers HTTP (any status below 500) or the service exits.
 * Throws with the service name on timeout or early exit.
 */
export async function waitForHttp(url, handle, timeoutMs = 90_000) {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (handle?.exited) throw new Error(`${handle.name} exited (code ${handle.exitCode}) before ${url} answered`);
    try {
      const response = await fetch(url, { redirect: "manual", signal: AbortSignal.timeout(5000) });
      if (response.status < 500) return;
    } catch {
      // Not listening yet.
    }
    await new Promise((resolve) => setTimeout(resolve, 300));
  }
  throw new Error(`${url} did not answer within ${timeoutMs / 1000}s`);
}
