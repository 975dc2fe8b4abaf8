// Installs Debian packages with apt-get when the project needs them (we run as root locally and in CI).
import { spawnSync } from "node:child_process";

/** True when this process runs as root. */
export const isRoot = typeof process.getuid === "function" && process.getuid() === 0;

let updated = false;

/**
 * Installs Debian packages with apt-get (running `apt-get update` once per process first).
 * Throws with the manual command when not root or when apt-get fails.
 */
export function aptInstall(packages, why) {
  const manual = `sudo apt-get update && sudo apt-get install -y ${packages.join(" ")}`;
  if (!isRoot) throw new Error(`${why} is missing. Install it with: ${manual}`);
  process.stderr.write(`[setup] ${why} is missing; installing ${packages.join(" ")} with apt-get...\n`);
  const env = { ...process.env, DEBIAN_FRONTEND: "noninteractive" };
  const steps = [
    ...(updated ? [] : [["update"]]),
    ["install", "-y", "--no-install-recommends", ...packages],
  ];
  for (const args of steps) {
    const r = spawnSync("apt-get", args, { stdio: ["ignore", "inherit", "inherit"], env });
    if (r.status !== 0) throw new Error(`apt-get ${args.join(" ")} failed (exit ${r.status}); try: ${manual}`);
  }
  updated = true;
}
