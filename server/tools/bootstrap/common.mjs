// What every bootstrap module shares: the project root, the ports and databases, and how progress and failures
// are reported. Plain Node with built-in modules only: it runs before node_modules exist.
import { spawnSync } from "node:child_process";
import { readFileSync } from "node:fs";
import { dirname, join, resolve } from "node:path";
import { fileURLToPath } from "node:url";

export const ROOT = resolve(dirname(fileURLToPath(import.meta.url)), "..", "..", "..");
/** The one table of ports, also imported by the TypeScript side (server config, Vite, Playwright, benches). */
export const PORTS = JSON.parse(readFileSync(join(ROOT, "shared", "ports.json"), "utf8"));
export const DB = { app: "loopwright", test: "loopwright_test" };
export const bin = (name) => join(ROOT, "node_modules", ".bin", name);

// A command-line tool's stdout is a public contract: progress then goes to stderr, and only when needed.
let quiet = false;
export const setQuiet = () => void (quiet = true);
export const childStdio = () => (quiet ? ["ignore", 2, 2] : "inherit");

export function step(message) {
  (quiet ? process.stderr : process.stdout).write(`▸ ${message}\n`);
}

export function fail(message) {
  process.stderr.write(`✗ ${message}\n`);
  process.exit(1);
}

/** Runs a command to completion, failing the whole script with `what` when it exits non-zero. */
export function run(cmd, args, what, opts = {}) {
  const r = spawnSync(cmd, args, { stdio: opts.capture ? "pipe" : childStdio(), encoding: "utf8", ...opts });
  if (r.error) fail(`${what}: ${r.error.message}`);
  if (r.status !== 0) fail(`${what} (exit ${r.status})${opts.capture ? `\n${r.stderr || r.stdout}` : ""}`);
  return r.stdout;
}
