import { benchDiagram, type BenchFamily } from "./diagrams";
import { runChild } from "../support/childRun";

/** A generated diagram of the reduction benchmarks, and how a bench measures it in a child process of its own. */
export interface Case {
  family: BenchFamily;
  blocks: number;
  symbolic: boolean;
}

/** "ladder:150", "nested:30:sym": the child's argument. */
export const caseName = (c: Case): string => `${c.family}:${c.blocks}${c.symbolic ? ":sym" : ""}`;

export function caseOf(name: string): Case {
  const [family, blocks, sym] = name.split(":");
  return { family: family as BenchFamily, blocks: Number(blocks), symbolic: sym === "sym" };
}

export const docOf = (c: Case) => benchDiagram(c.family, c.blocks, { symbolic: c.symbolic });

class OverLimit extends Error {}

/**
 * Runs `script --case NAME` under the same node and loader, killed at the limit: its figures (its stdout, JSON),
 * "timeout", or why it failed.
 */
export async function runCase<T>(script: string, c: Case, limitMs: number): Promise<T | "timeout" | string> {
  try {
    const args = [...process.execArgv, script, "--case", caseName(c)];
    const run = await runChild(process.execPath, args, { timeoutMs: limitMs, timeout: () => new OverLimit() });
    return run.code === 0 ? (JSON.parse(run.stdout) as T) : `failed: ${run.stderr.trim().split("\n")[0]}`;
  } catch (e) {
    if (e instanceof OverLimit) return "timeout";
    throw e;
  }
}
