import { spawnSync } from "node:child_process";
import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import type { DiagramDocument } from "@shared/diagram/schema";
import { ladderDiagram } from "./diagrams";
import { runPython } from "../support/python";
import { SYMPY_SCRIPT, type SympyBench } from "../support/sympy";

/**
 * Command-line benchmark: whole-process wall time of `npm run --silent reduce -- ladder150.json --json` (the compiled
 * CLI, as teams' CI calls it), of the compiled CLI run with plain node (what npm itself adds), and of the sympy
 * reference solving the same document's block equations exactly (its fastest route, sparse Gauss-Jordan over
 * QQ(s); python start-up and the sympy import included, as for ours).
 * Prints medians and the ratio; asserts nothing.
 * Run: npx tsx tests/bench/cli.bench.ts (or `npm run bench cli`).
 */
const BLOCKS = 150;
const RUNS = 5;
const SYMPY_RUNS = 3;
const SYMPY_LIMIT_MS = 120_000;
const TARGET_SECONDS = 0.5;
const TARGET_RATIO = 3;

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
const seconds = (ms: number) => (ms / 1000).toFixed(2);

/** Wall time of one run of the command; fails the bench when it does not print the JSON result. */
function timeCommand(cmd: string, args: string[]): number {
  const started = performance.now();
  const r = spawnSync(cmd, args, { encoding: "utf8", maxBuffer: 64 * 1024 * 1024 });
  const ms = performance.now() - started;
  if (r.status !== 0) throw new Error(`${cmd} ${args.join(" ")} exited ${r.status}: ${r.stderr}`);
  JSON.parse(r.stdout); // stdout carries only the JSON: the CLI's public contract
  return ms;
}

async function timeSympy(doc: DiagramDocument): Promise<number> {
  const idOf = (type: string) => doc.blocks.find((b) => b.type === type)!.id;
  const request = { mode: "bench", doc, input: idOf("input"), output: idOf("output"), method: "rref" };
  const started = performance.now();
  await runPython<SympyBench>({ file: SYMPY_SCRIPT }, request, SYMPY_LIMIT_MS);
  return performance.now() - started;
}

async function main() {
  const dir = mkdtempSync(join(tmpdir(), "loopwright-cli-bench-"));
  try {
    const doc = ladderDiagram(BLOCKS);
    const file = join(dir, `ladder${BLOCKS}.json`);
    writeFileSync(file, JSON.stringify(doc));
    const npmArgs = ["run", "--silent", "reduce", "--", file, "--json"];
    timeCommand("npm", npmArgs); // compiles the CLI first when a source is newer; not counted
    const npm = median(Array.from({ length: RUNS }, () => timeCommand("npm", npmArgs)));
    const bootstrap = median(Array.from({ length: RUNS }, () => timeCommand(process.execPath, ["server/tools/bootstrap/cli.mjs", "reduce", file, "--json"])));
    const node = median(Array.from({ length: RUNS }, () => timeCommand(process.execPath, ["dist/tools/cli/reduce.js", file, "--json"])));
    const sympyTimes: number[] = [];
    for (let i = 0; i < SYMPY_RUNS; i++) sympyTimes.push(await timeSympy(doc));
    const sympy = median(sympyTimes);
    console.log(`\nladder of ${BLOCKS} blocks, whole-process wall time, median of ${RUNS} (sympy: ${SYMPY_RUNS})`);
    console.table([
      { command: "npm run --silent reduce -- FILE --json", seconds: seconds(npm), target: `< ${TARGET_SECONDS}` },
      { command: "node server/tools/bootstrap/cli.mjs reduce FILE --json", seconds: seconds(bootstrap), target: "" },
      { command: "node dist/tools/cli/reduce.js FILE --json", seconds: seconds(node), target: "" },
      { command: "/usr/bin/python3 tests/reference/sympy_reduce.py (rref)", seconds: seconds(sympy), target: "" },
    ]);
    console.log(`npm's own share: ${seconds(npm - bootstrap)} s; the staleness check and in-process hand-over: ${seconds(bootstrap - node)} s`);
    console.log(`sympy / npm run reduce: ${(sympy / npm).toFixed(1)}× (target ≥ ${TARGET_RATIO}×)`);
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

await main();
