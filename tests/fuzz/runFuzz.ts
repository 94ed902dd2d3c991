import fc from "fast-check";
import { runCase, truncated } from "./harness";
import { FUZZ_SEED, FUZZ_TARGETS } from "./targets";

/**
 * `npm run fuzz [name]`: the long run of every fuzz target (or those whose name contains `name`), one table row
 * per target — cases, failures, median/p99/max ms, the slowest input — then every failure and every input over
 * the 100 ms goal. Exit 1 when any input failed; slow inputs are reported, not failed.
 */
const GOAL_MS = 100;
const only = process.argv.slice(2).join(" ");

const quantile = (sorted: number[], p: number) => sorted[Math.min(sorted.length - 1, Math.floor(p * sorted.length))];
const rows: string[][] = [["target", "cases", "failures", "median ms", "p99 ms", "max ms", `> ${GOAL_MS} ms`, "slowest input"]];
const failures: string[] = [];
const slow: string[] = [];

for (const { target, long } of FUZZ_TARGETS.filter((t) => t.target.name.includes(only))) {
  const times: number[] = [];
  let worst = { ms: -1, input: "" };
  let failed = 0;
  let over = 0;
  fc.assert(
    fc.property(target.arbitrary, (input) => {
      const { ms, failure } = runCase(target, input);
      times.push(ms);
      if (ms > worst.ms) worst = { ms, input: target.show(input) };
      if (failure) {
        failed += 1;
        failures.push(`${target.name}: ${failure}\n    ${truncated(target.show(input), 400)}`);
      }
      if (ms > GOAL_MS) {
        over += 1;
        slow.push(`${target.name}: ${ms.toFixed(0)} ms  ${truncated(target.show(input), 300)}`);
      }
    }),
    { numRuns: long, seed: FUZZ_SEED },
  );
  times.sort((a, b) => a - b);
  const f = (x: number) => x.toFixed(2);
  rows.push([target.name, String(times.length), String(failed), f(quantile(times, 0.5)), f(quantile(times, 0.99)), f(times[times.length - 1]), String(over), truncated(worst.input, 60)]);
  process.stderr.write(`${target.name}: ${times.length} cases done\n`);
}

const widths = rows[0].map((_, i) => Math.max(...rows.map((r) => r[i].length)));
const line = (r: string[]) => `| ${r.map((c, i) => c.padEnd(widths[i])).join(" | ")} |`;
console.log([line(rows[0]), `|${widths.map((w) => "-".repeat(w + 2)).join("|")}|`, ...rows.slice(1).map(line)].join("\n"));
console.log(`\n${rows.slice(1).reduce((n, r) => n + Number(r[1]), 0)} cases, seed ${FUZZ_SEED}`);
if (failures.length) console.log(`\nFailures (${failures.length}):\n${failures.slice(0, 50).join("\n")}`);
if (slow.length) console.log(`\nInputs over ${GOAL_MS} ms (${slow.length}):\n${slow.slice(0, 50).join("\n")}`);
process.exit(failures.length ? 1 : 0);
