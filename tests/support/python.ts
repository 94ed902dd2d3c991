import { spawnSync } from "node:child_process";
import { existsSync } from "node:fs";
import { runChild } from "./childRun";

/**
 * The one way tests and benchmarks run a Python reference: Debian's /usr/bin/python3 (the python3 first on PATH
 * here lacks sympy, scipy and mpmath), JSON on stdin, JSON on stdout, a time limit. A missing interpreter or
 * library is an error naming the Debian package to install, never a silent skip.
 */
export const SYSTEM_PYTHON = "/usr/bin/python3";

/** A script file of tests/reference, or a short program passed with `-c`. */
export type PythonProgram = { file: string } | { code: string };

export class PythonTimeout extends Error {}

const DEBIAN_PACKAGES: Record<string, string> = {
  sympy: "python3-sympy",
  scipy: "python3-scipy",
  numpy: "python3-numpy",
  mpmath: "python3-mpmath",
};

const argsOf = (program: PythonProgram) => ("file" in program ? [program.file] : ["-c", program.code]);
const nameOf = (program: PythonProgram) => ("file" in program ? program.file : "an inline Python reference");

function missingInterpreter(): Error | null {
  if (existsSync(SYSTEM_PYTHON)) return null;
  return new Error(`${SYSTEM_PYTHON} not found: the Python references need Debian's python3 (apt-get install -y python3 ${Object.values(DEBIAN_PACKAGES).join(" ")})`);
}

/** Exit 3 is the reference scripts' own "library missing"; an inline program shows Python's ModuleNotFoundError. */
function failure(program: PythonProgram, code: number | null, stderr: string): Error {
  const missing = /No module named '(\w+)'/.exec(stderr)?.[1];
  const hint = missing && DEBIAN_PACKAGES[missing] ? ` Install it: apt-get install -y ${DEBIAN_PACKAGES[missing]}.` : "";
  if (code === 3 || hint) return new Error(`${stderr.trim()}${hint}`);
  return new Error(`${nameOf(program)} failed (exit ${code}): ${stderr.trim()}`);
}

function parsed<T>(program: PythonProgram, stdout: string): T {
  try {
    return JSON.parse(stdout) as T;
  } catch {
    throw new Error(`${nameOf(program)} wrote unreadable output: ${stdout.slice(0, 200)}`);
  }
}

/** Runs the program to completion (blocking): for quick references inside a test. */
export function runPythonSync<T>(program: PythonProgram, input: unknown, timeoutMs = 60_000): T {
  const missing = missingInterpreter();
  if (missing) throw missing;
  const r = spawnSync(SYSTEM_PYTHON, argsOf(program), { input: JSON.stringify(input), timeout: timeoutMs, encoding: "utf8", maxBuffer: 256 * 1024 * 1024 });
  if (r.error && (r.error as NodeJS.ErrnoException).code === "ETIMEDOUT") throw new PythonTimeout(`${nameOf(program)} exceeded ${timeoutMs} ms`);
  if (r.error) throw new Error(`Running ${SYSTEM_PYTHON} failed: ${r.error.message}`);
  if (r.status !== 0) throw failure(program, r.status, r.stderr);
  return parsed<T>(program, r.stdout);
}

/** Runs the program in the background, killed at the time limit (rejects with PythonTimeout): for long batches. */
export function runPython<T>(program: PythonProgram, input: unknown, timeoutMs = 120_000): Promise<T> {
  const missing = missingInterpreter();
  if (missing) return Promise.reject(missing);
  const timeout = () => new PythonTimeout(`${nameOf(program)} exceeded ${timeoutMs} ms`);
  return runChild(SYSTEM_PYTHON, argsOf(program), { input: JSON.stringify(input), timeoutMs, timeout }).then(({ code, stdout, stderr }) => {
    if (code !== 0) throw failure(program, code, stderr);
    return parsed<T>(program, stdout);
  });
}
