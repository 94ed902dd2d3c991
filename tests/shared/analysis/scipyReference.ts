import { fileURLToPath } from "node:url";
import { runPython } from "../../support/python";

/** tests/reference/scipy_analysis.py: one process for the whole batch. */
export { SYSTEM_PYTHON } from "../../support/python";
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
  return runPython({ file: SCIPY_SCRIPT }, { systems }, timeoutMs);
}
