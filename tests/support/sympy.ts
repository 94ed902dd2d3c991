import { fileURLToPath } from "node:url";
import { PythonTimeout, runPython } from "./python";

/**
 * The sympy reference (tests/reference/sympy_reduce.py). One process per batch: importing sympy costs about a second.
 */
export { SYSTEM_PYTHON } from "./python";
export const SYMPY_SCRIPT = fileURLToPath(new URL("../reference/sympy_reduce.py", import.meta.url));

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

export { PythonTimeout as SympyTimeout };

/** Send one JSON request to the script; resolves with its parsed answer. */
export const runSympy = <T>(request: unknown, timeoutMs: number): Promise<T> => runPython<T>({ file: SYMPY_SCRIPT }, request, timeoutMs);

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
