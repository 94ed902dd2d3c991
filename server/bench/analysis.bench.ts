import { DIAGRAM_FORMAT, DIAGRAM_VERSION, type DiagramDocument } from "@shared/diagram/schema";
import { analyzeAt } from "@shared/analysis/analyze";
import { prepareAnalysis } from "@shared/analysis/prepare";
import { parameterRange, rootLocus, sweepValues } from "@shared/analysis/sweep";

/**
 * Analysis benchmark: the time of one slider update (every result recomputed at new parameter values) for a
 * 10th-order loop — target under 50 ms — plus the one-off preparation, the stable-range computation and a
 * root locus. Prints figures; asserts nothing. Run: npx tsx server/bench/analysis.bench.ts
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

const prepared = prepareAnalysis(doc);
if (!prepared.ok) throw new Error(prepared.problems.map((p) => p.message).join("; "));
const p = prepared.prepared;
const prep = time(() => prepareAnalysis(doc));
const first = analyzeAt(p);
console.log(`closed-loop denominator degree ${first.poles.reduce((n, r) => n + r.multiplicity, 0)}; at nominal values: ${first.stability.verdict}, ` +
  `phase margin ${first.loop?.margins.phaseMarginDeg?.toFixed(2)}°, overshoot ${first.step.overshootPercent?.toFixed(2)} %`);

for (let i = 0; i < 5; i++) analyzeAt(p, { values: { K: 1 + i / 10 }, stableSets: false }); // warm-up
const rows: [string, Timing[]][] = [];
const ks = sweepValues(parameterRange(doc, "K"), 60);
rows.push(["slider update (K), everything but stable ranges", ks.map((K) => time(() => analyzeAt(p, { values: { K }, stableSets: false })))]);
const tis = sweepValues(parameterRange(doc, "Ti"), 30);
rows.push(["slider update (Ti), everything but stable ranges", tis.map((Ti) => time(() => analyzeAt(p, { values: { Ti }, stableSets: false })))]);
rows.push(["full analysis incl. stable ranges of K and Ti", [1, 2, 3, 4, 5].map((K) => time(() => analyzeAt(p, { values: { K } })))]);
rows.push(["root locus over K, 200 points", [0, 1, 2].map(() => time(() => rootLocus(p, "K", parameterRange(doc, "K"), 200)))]);
rows.push(["prepare (reduce pair + loop at the break), once per edit", [prep]]);

console.log(`\n${"case".padEnd(58)} ${"wall median".padStart(11)} ${"wall p95".padStart(9)} ${"cpu median".padStart(11)} ${"cpu p95".padStart(8)}  (ms)`);
for (const [name, xs] of rows) {
  const [w, c] = [xs.map((x) => x.wall), xs.map((x) => x.cpu)];
  console.log(`${name.padEnd(58)} ${fmt(pct(w, 0.5)).padStart(11)} ${fmt(pct(w, 0.95)).padStart(9)} ${fmt(pct(c, 0.5)).padStart(11)} ${fmt(pct(c, 0.95)).padStart(8)}`);
}
const slider = rows[0][1].map((x) => x.cpu);
console.log(`\nslider update target < ${TARGET_MS} ms (CPU time, K sweep): median ${pct(slider, 0.5).toFixed(1)} ms, p95 ${pct(slider, 0.95).toFixed(1)} ms — ${pct(slider, 0.95) < TARGET_MS ? "met" : "NOT met"}`);
