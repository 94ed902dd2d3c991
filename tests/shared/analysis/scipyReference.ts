import { spawn } from "node:child_process";
import { existsSync } from "node:fs";
import { fileURLToPath } from "node:url";

/**
 * Runs tests/reference/scipy_analysis.py under Debian's /usr/bin/python3 (the python3 first on PATH lacks
 * scipy) — one process for the whole batch. A missing interpreter, scipy or numpy is an error, never a skip.
 */
export const SYSTEM_PYTHON = "/usr/bin/python3";
export const SCIPY_SCRIPT = fileURLToPath(new URL("../../reference/scipy_analysis.py", import.meta.url));

export interface ScipySystem {
  id: string;
  /** Coefficients, DESCENDING powers of s. */
  num: number[];
  den: number[];
  t: number[];
  w: number[];
  /** Only numpy.roots, no simulation. */
  rootsOnly?: boolean;
}

export interface ScipyAnswer {
  id: string;
  denRoots: [number, number][];
  numRoots: [number, number][];
  step?: number[];
  impulse?: number[];
  freq?: [number, number][];
}

export function runScipy(systems: ScipySystem[], timeoutMs = 120_000): Promise<{ results: ScipyAnswer[]; scipy: string }> {
  if (!existsSync(SYSTEM_PYTHON)) return Promise.reject(new Error(`${SYSTEM_PYTHON} not found: apt-get install -y python3-scipy python3-numpy`));
  return new Promise((resolve, reject) => {
    const child = spawn(SYSTEM_PYTHON, [SCIPY_SCRIPT], { stdio: ["pipe", "pipe", "pipe"] });
    let out = "";
    let err = "";
    const timer = setTimeout(() => {
      child.kill("SIGKILL");
      reject(new Error(`scipy reference exceeded ${timeoutMs} ms`));
    }, timeoutMs);
    child.stdout.on("data", (d: Buffer) => (out += d.toString()));
    child.stderr.on("data", (d: Buffer) => (err += d.toString()));
    child.on("error", reject);
    child.on("close", (code) => {
      clearTimeout(timer);
      if (code !== 0) reject(new Error(`scipy reference failed (exit ${code}): ${err.trim()}`));
      else resolve(JSON.parse(out));
    });
    child.stdin.end(JSON.stringify({ systems }));
  });
}
