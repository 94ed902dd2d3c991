import { DIAGRAM_FORMAT, DIAGRAM_VERSION, type DiagramDocument } from "@shared/diagram/schema";
import { q, qAdd, qMul, type Q } from "@shared/algebra/rational";
import { polyRootsExact } from "@shared/algebra/roots";
import { analyzeAt } from "@shared/analysis/analyze";
import { rootsOf } from "@shared/analysis/poles";
import { parameterRange, rootLocus, sweepValues } from "@shared/analysis/sweep";
import { upFrom } from "@shared/analysis/upoly";
import { prepared as prepareDoc } from "../support/reduced";

/**
 * Analysis benchmark: the time of one slider update (every result recomputed at new parameter values) for a
 * 10th-order loop — target under 50 ms — with and without the stable ranges, plus the one-off preparation, a
 * root locus and the numeric roots of degree 10, 50 and 100. Prints figures; asserts nothing.
 * Run: npx tsx tests/bench/analysis.bench.ts
 */
const TARGET_MS = 50;

/** A PI-controlled 9th-order plant in unity feedback: 10th-order closed loop with parameters K and Ti. */
const doc: DiagramDocument = {
  format: DIAGRAM_FORMAT,
  version: DIAGRAM_VERSION,
  title: "Bench: 10th-order loop",
  parameters: { K: { value: 3, min: 0.1, max: 30 }, Ti: { value: 2, min: 0.5, max: 10 } },
  blocks: [
    { id: "r", type: "input" },
    { id: "e", type: "sum", signs: ["+", "-"] },
    { id: "c", type: "transfer", expr: "K*(Ti*s + 1)/(Ti*s)" },
    { id: "p1", type: "transfer", expr: "1/((s + 1)*(s + 2)*(s + 3))" },
    { id: "p2", type: "transfer", expr: "20/((s + 4)*(s + 5)*(s^2 + s + 4))" },
    { id: "p3", type: "transfer", expr: "10/(s^2 + 2*s + 10)" },
    { id: "b", type: "branch" },
    { id: "y", type: "output" },
  ],
  wires: [
    { id: "w1", from: "r", to: "e", port: 0 },
    { id: "w2", from: "e", to: "c" },
    { id: "w3", from: "c", to: "p1" },
    { id: "w4", from: "p1", to: "p2" },
    { id: "w5", from: "p2", to: "p3" },
    { id: "w6", from: "p3", to: "b" },
    { id: "w7", from: "b", to: "y" },
    { id: "w8", from: "b", to: "e", port: 1 },
  ],
};

// CPU time of this process besides wall time: on a shared, loaded machine wall time mostly measures the queue.
interface Timing {
  wall: number;
  cpu: number;
}
const time = (f: () => void): Timing => {
  const [t, c] = [performance.now(), process.cpuUsage()];
  f();
  const used = process.cpuUsage(c);
  return { wall: performance.now() - t, cpu: (used.user + used.system) / 1000 };
};
const pct = (xs: number[], q: number) => [...xs].sort((a, b) => a - b)[Math.min(xs.length - 1, Math.floor(xs.length * q))];
const fmt = (x: number) => x.toFixed(1).padStart(7);

const p = prepareDoc(doc);
const prep = time(() => prepareDoc(doc)); // parse, reduce and prepare: what a fresh document costs
const first = analyzeAt(p);
console.log(`closed-loop denominator degree ${first.poles.reduce((n, r) => n + r.multiplicity, 0)}; at nominal values: ${first.stability.verdict}, ` +
  `phase margin ${first.loop?.margins.phaseMarginDeg?.toFixed(2)}°, overshoot ${first.step.overshootPercent?.toFixed(2)} %`);

// Warm-up (JIT): a worker that has answered a few slider moves is in this state.
for (let i = 0; i < 30; i++) analyzeAt(p, { values: { K: 1 + i / 10, Ti: 2 + (i % 3) / 10 }, stableSets: false });
const rows: [string, Timing[]][] = [];
const ks = sweepValues(parameterRange(doc, "K"), 60);
rows.push(["slider update (K), everything but stable ranges", ks.map((K) => time(() => analyzeAt(p, { values: { K }, stableSets: false })))]);
const tis = sweepValues(parameterRange(doc, "Ti"), 30);
rows.push(["slider update (Ti), everything but stable ranges", tis.map((Ti) => time(() => analyzeAt(p, { values: { Ti }, stableSets: false })))]);
rows.push(["slider update (K), with stable ranges of K and Ti", sweepValues(parameterRange(doc, "K"), 20).map((K) => time(() => analyzeAt(p, { values: { K } })))]);
rows.push(["root locus over K, 200 points", [0, 1, 2].map(() => time(() => rootLocus(p, "K", parameterRange(doc, "K"), 200)))]);
rows.push(["prepare (reduce pair + loop at the break), once per edit", [prep]]);

console.log(`\n${"case".padEnd(58)} ${"wall median".padStart(11)} ${"wall p95".padStart(9)} ${"cpu median".padStart(11)} ${"cpu p95".padStart(8)}  (ms)`);
for (const [name, xs] of rows) {
  const [w, c] = [xs.map((x) => x.wall), xs.map((x) => x.cpu)];
  console.log(`${name.padEnd(58)} ${fmt(pct(w, 0.5)).padStart(11)} ${fmt(pct(w, 0.95)).padStart(9)} ${fmt(pct(c, 0.5)).padStart(11)} ${fmt(pct(c, 0.95)).padStart(8)}`);
}
console.log("");
for (const [label, row] of [["without stable ranges", rows[0]], ["with stable ranges", rows[2]]] as const) {
  const [c, w] = [row[1].map((x) => x.cpu), row[1].map((x) => x.wall)];
  console.log(
    `slider update ${label} (K sweep), target < ${TARGET_MS} ms: CPU median ${pct(c, 0.5).toFixed(1)} ms, p95 ${pct(c, 0.95).toFixed(1)} ms; ` +
      `wall median ${pct(w, 0.5).toFixed(1)} ms, p95 ${pct(w, 0.95).toFixed(1)} ms — ${pct(c, 0.95) < TARGET_MS ? "met" : "NOT met"} (CPU p95)`,
  );
}

// Numeric roots: the exact polisher on ill-conditioned expansions, and rootsOf (factorisation included) on
// well-conditioned ones. Medians of three runs; each rootsOf run gets a fresh polynomial, so no cache answers.
/** Π (s + k/10), k = 1..n, expanded exactly (descending): clustered, Wilkinson-like roots. */
const tenths = (n: number): Q[] => {
  let c: Q[] = [q(1)];
  for (let k = 1; k <= n; k++) c = [...c, q(0)].map((x, i) => (i === 0 ? x : qAdd(x, qMul(q(k, 10), c[i - 1]))));
  return c;
};
/** s^n + Σ small integer coefficients + a varying constant: irreducible-looking, well conditioned. */
const wavy = (n: number, shift: number) =>
  upFrom(Array.from({ length: n + 1 }, (_, i) => q(i === n ? 1 : i === 0 ? 7 + shift : ((i * 7919) % 13) - 6)));
const median = (xs: number[]) => pct(xs, 0.5);
console.log(`\n${"roots".padEnd(58)} ${"deg 10".padStart(8)} ${"deg 50".padStart(8)} ${"deg 100".padStart(8)}  (ms CPU, median)`);
const rootRows: [string, (n: number, run: number) => () => void][] = [
  ["polyRootsExact, Π (s + k/10) expanded", (n) => {
    const c = tenths(n);
    return () => polyRootsExact(c);
  }],
  ["rootsOf (factors + roots), well-conditioned polynomial", (n, run) => {
    const u = wavy(n, run);
    return () => rootsOf(u);
  }],
];
for (const [name, make] of rootRows) {
  const cells = [10, 50, 100].map((n) => median([0, 1, 2].map((run) => time(make(n, run)).cpu)));
  console.log(`${name.padEnd(58)} ${cells.map((c) => fmt(c).padStart(8)).join(" ")}`);
}
