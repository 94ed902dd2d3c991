// What must be installed before anything else runs: node_modules (from the lock) and the Debian packages that
// tests and benchmarks use. Plain Node with built-in modules only.
import { spawnSync } from "node:child_process";
import { createHash } from "node:crypto";
import { existsSync, readFileSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { ROOT, fail, run, step } from "./common.mjs";

export const isRoot = process.getuid?.() === 0;
export const hash = (text) => createHash("sha256").update(text).digest("hex");

export function ensureNodeModules() {
  const lock = readFileSync(join(ROOT, "package-lock.json"), "utf8");
  const stamp = join(ROOT, "node_modules", ".loopwright-lock-hash");
  if (existsSync(stamp) && readFileSync(stamp, "utf8") === hash(lock)) return;
  step("Installing node modules (npm ci)…");
  run("npm", ["ci", "--no-audit", "--no-fund"], "npm ci failed: check the network to the npm registry and disk space");
  writeFileSync(stamp, hash(lock));
}

let aptUpdated = false;
export function aptInstall(packages, why) {
  if (!isRoot) fail(`${why} is missing. Install it with: sudo apt-get install -y ${packages.join(" ")}`);
  step(`Installing ${packages.join(", ")} (${why})…`);
  const env = { ...process.env, DEBIAN_FRONTEND: "noninteractive" };
  if (!aptUpdated) run("apt-get", ["update", "-q"], "apt-get update failed", { env });
  aptUpdated = true;
  run("apt-get", ["install", "-y", "-q", ...packages], `apt-get install ${packages.join(" ")} failed`, { env });
}

/** Like aptInstall, but a failure is only reported: for references a run can do without. True when installed. */
function tryAptInstall(packages, why) {
  if (!isRoot) {
    step(`${why} is missing and only root can install it (apt-get install -y ${packages.join(" ")}): going on without it`);
    return false;
  }
  step(`Installing ${packages.join(", ")} (${why})…`);
  const env = { ...process.env, DEBIAN_FRONTEND: "noninteractive" };
  const apt = (args) => spawnSync("apt-get", args, { stdio: "inherit", env }).status === 0;
  if (!aptUpdated) aptUpdated = apt(["update", "-q"]);
  const ok = aptUpdated && apt(["install", "-y", "-q", ...packages]);
  if (!ok) step(`apt-get install ${packages.join(" ")} failed: going on without ${why}`);
  return ok;
}

export function ensurePythonReferences() {
  const probe = spawnSync("/usr/bin/python3", ["-c", "import sympy, scipy, numpy"], { stdio: "ignore" });
  if (probe.status !== 0) aptInstall(["python3-sympy", "python3-scipy", "python3-numpy"], "the Python reference libraries for tests");
}

/** PARI/GP, the benchmark's second reference; the benchmark skips its column with a note when it cannot be had. */
export function ensurePari() {
  if (!existsSync("/usr/bin/gp")) tryAptInstall(["pari-gp"], "PARI/GP for the engine benchmark");
}

export function ensureChromium() {
  if (!existsSync("/usr/bin/chromium")) aptInstall(["chromium"], "Chromium for browser tests");
}
