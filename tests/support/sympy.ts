import { spawn } from "node:child_process";
import { existsSync } from "node:fs";
import { fileURLToPath } from "node:url";

/**
 * Runs the sympy reference (tests/reference/sympy_reduce.py) under Debian's /usr/bin/python3 — the
 * python3 first on PATH lacks sympy. One process per batch: importing sympy costs about a second.
 * A missing interpreter or sympy is an error with an install hint, never a silent skip.
 */
export const SYSTEM_PYTHON = "/usr/bin/python3";
export const SYMPY_SCRIPT = fileURLToPath(new URL("../reference/sympy_reduce.py", import.meta.url));
const MISSING = "python3-sympy is required for the reference checks: apt-get install -y python3-sympy";

export interface PairText {
  input: string;
  output: string;
  numerator: string;
  denominator: string;
}

export interface SympyJob {
  id: string;
  doc: unknown;
  /** Our result to compare exactly (cross-multiplied) with sympy's; `cancelled` is checked against χ/D. */
  ours?: { transfers: (PairText & { cancelled?: { factor: string }[] })[]; characteristic: string };
}

export interface SympyTransfer extends PairText {
  agrees?: boolean;
  lowestTerms?: boolean;
  /** Only for denominators free of parameters: leading coefficient 1. */
  monic?: boolean;
  /** χ = D · Π(cancelled factors) · constant. */
  cancelledAgrees?: boolean;
}

export interface SympyResult {
  id: string;
  transfers: SympyTransfer[];
  characteristic: string;
  characteristicAgrees?: boolean;
  error?: string;
}

export interface SympyBench {
  seconds: number;
  numeratorDegree: number;
  denominatorDegree: number;
}

export class SympyTimeout extends Error {}

/** Send one JSON request to the script; resolves with its parsed answer. */
export function runSympy<T>(request: unknown, timeoutMs: number): Promise<T> {
  if (!existsSync(SYSTEM_PYTHON)) return Promise.reject(new Error(`${SYSTEM_PYTHON} not found. ${MISSING}`));
  return new Promise((resolve, reject) => {
    const child = spawn(SYSTEM_PYTHON, [SYMPY_SCRIPT], { stdio: ["pipe", "pipe", "pipe"] });
    let out = "";
    let err = "";
    const timer = setTimeout(() => {
      child.kill("SIGKILL");
      reject(new SympyTimeout(`sympy reference exceeded ${timeoutMs} ms`));
    }, timeoutMs);
    child.stdout.on("data", (d: Buffer) => (out += d.toString()));
    child.stderr.on("data", (d: Buffer) => (err += d.toString()));
    child.on("error", (e) => {
      clearTimeout(timer);
      reject(e);
    });
    child.on("close", (code, signal) => {
      clearTimeout(timer);
      if (signal) return; // killed by the timer, already rejected
      if (code === 3) return reject(new Error(`${err.trim()}. ${MISSING}`));
      if (code !== 0) return reject(new Error(`sympy reference failed (exit ${code}): ${err.trim()}`));
      try {
        resolve(JSON.parse(out) as T);
      } catch {
        reject(new Error(`sympy reference wrote unreadable output: ${out.slice(0, 200)}`));
      }
    });
    child.stdin.end(JSON.stringify(request));
  });
}

/** Exact reference transfers (and comparisons with `ours`) for a batch of documents. */
export async function sympyReduce(jobs: SympyJob[], timeoutMs = 120_000): Promise<SympyResult[]> {
  const answer = await runSympy<{ results: SympyResult[] }>({ mode: "reduce", jobs }, timeoutMs);
  return answer.results;
}

/**
 * Time sympy's exact solve of one pair of a document (python start-up excluded): "rref" is a sparse
 * Gauss-Jordan over QQ(s, params) with DomainMatrix (the fastest route found), "linsolve" sympy's plain API.
 */
export type SympyMethod = "rref" | "linsolve";

export function sympyBench(
  doc: unknown,
  input: string,
  output: string,
  timeoutMs: number,
  method: SympyMethod = "rref",
): Promise<SympyBench> {
  return runSympy<SympyBench>({ mode: "bench", doc, input, output, method }, timeoutMs);
}
