// One-time setup shared by `npm start` and `npm test`: npm packages, Chromium, the local auth secret.
import { spawnSync } from "node:child_process";
import { randomBytes } from "node:crypto";
import { existsSync, mkdirSync, readFileSync, statSync, writeFileSync } from "node:fs";
import path from "node:path";
import { aptInstall } from "./apt.mjs";
import { repoRoot } from "./postgres.mjs";

/** Path of Debian's Chromium, the only browser the end-to-end tests use. */
export const chromiumPath = "/usr/bin/chromium";

function mtime(file) {
  return existsSync(file) ? statSync(file).mtimeMs : null;
}

/**
 * Runs `npm ci` when node_modules is missing or older than package-lock.json (npm stamps
 * node_modules/.package-lock.json on every install; a few seconds of slack covers the order in which
 * `npm install` writes the two files).
 */
export function ensureNodeModules() {
  const lock = mtime(path.join(repoRoot, "package-lock.json"));
  const installed = mtime(path.join(repoRoot, "node_modules", ".package-lock.json"));
  if (installed !== null && lock !== null && installed + 5000 >= lock) return;
  process.stderr.write(
    `[setup] ${installed === null ? "node_modules is missing" : "package-lock.json is newer than node_modules"}; running npm ci...\n`,
  );
  const r = spawnSync("npm", ["ci", "--no-audit", "--no-fund"], { cwd: repoRoot, stdio: "inherit" });
  if (r.status !== 0) throw new Error(`npm ci failed (exit ${r.status})`);
}

/** Installs Debian's chromium with apt-get when /usr/bin/chromium is missing (Playwright never downloads a browser of its own here). */
export function ensureChromium() {
  if (existsSync(chromiumPath)) return;
  aptInstall(["chromium"], "Chromium (for the browser tests)");
  if (!existsSync(chromiumPath)) throw new Error(`apt-get installed chromium but ${chromiumPath} is missing`);
}

/**
 * NEXTAUTH_SECRET from the environment, or the one kept in the git-ignored `.data/auth-secret`
 * (generated on first use, readable by the owner only).
 */
export function authSecret() {
  if (process.env.NEXTAUTH_SECRET) return process.env.NEXTAUTH_SECRET;
  const file = path.join(repoRoot, ".data", "auth-secret");
  if (existsSync(file)) {
    const kept = readFileSync(file, "utf8").trim();
    if (kept) return kept;
  }
  mkdirSync(path.dirname(file), { recursive: true });
  const secret = randomBytes(32).toString("base64url");
  writeFileSync(file, `${secret}\n`, { mode: 0o600 });
  return secret;
}

/** True when package.json defines the npm script `name`. */
export function hasNpmScript(name) {
  const pkg = JSON.parse(readFileSync(path.join(repoRoot, "package.json"), "utf8"));
  return typeof pkg.scripts?.[name] === "string";
}
