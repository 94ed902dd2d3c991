import fc from "fast-check";
import { analyzeDocument } from "@shared/analysis/analyzeDiagram";
import { wellPosedDiagram } from "../support/arbitraries";
import { unityFeedback } from "../support/docBuilder";

/**
 * Analysis of hard real plants and of random diagrams up to 30 blocks: the wall time of one whole analysis
 * (reduce, prepare, analyse) of each — target under 2 s for every case. Prints figures; asserts nothing.
 * Run: npx tsx tests/bench/widePlants.bench.ts
 */
const TARGET_MS = 2000;
const PLANTS = [
  "1/(s*(s+0.000001))",
  "1e-300/((s+1)*(s+2))",
  "1e300/((s+1)*(s+2))",
  "10/((0.000001*s + 1)*(1000*s + 1))",
  "1/((s+0.001)*(s^2+0.0002*s+1)*(0.000001*s+1))",
];
const timed = (doc: unknown) => {
  const t = performance.now();
  const out = analyzeDocument(doc);
  return { ms: performance.now() - t, ok: out.ok };
};

console.log("\nhard plants in unity feedback, one whole analysis each");
console.log("plant".padEnd(52), "ms".padStart(8), " result");
for (const G of PLANTS) {
  const { ms, ok } = timed(unityFeedback(G));
  console.log(G.padEnd(52), ms.toFixed(1).padStart(8), ok ? " analysed" : " refused with problems");
}

const RUNS = 60;
// Drawn large (fast-check's "xlarge" size) and kept between 20 and 30 blocks.
fc.configureGlobal({ baseSize: "xlarge" });
const docs = fc
  .sample(wellPosedDiagram({ maxCore: 28 }), { numRuns: 40 * RUNS, seed: 20261204 })
  .map((g) => g.doc)
  .filter((d) => d.blocks.length >= 20 && d.blocks.length <= 30)
  .slice(0, RUNS);
const rows = docs.map((doc) => ({ blocks: doc.blocks.length, params: Object.keys(doc.parameters ?? {}).length, ...timed(doc) }));
const ms = rows.map((r) => r.ms).sort((a, b) => a - b);
const q = (p: number) => ms[Math.min(ms.length - 1, Math.floor(p * ms.length))];
console.log(`\n${rows.length} random well-posed diagrams (seed 20261204), ${Math.min(...rows.map((r) => r.blocks))}–${Math.max(...rows.map((r) => r.blocks))} blocks, 0–${Math.max(...rows.map((r) => r.params))} parameters`);
console.log(`median ${q(0.5).toFixed(0)} ms · p95 ${q(0.95).toFixed(0)} ms · max ${ms[ms.length - 1].toFixed(0)} ms · over ${TARGET_MS} ms: ${rows.filter((r) => r.ms > TARGET_MS).length}`);
const worst = rows.reduce((a, b) => (b.ms > a.ms ? b : a));
console.log(`slowest: ${worst.blocks} blocks, ${worst.params} parameters, ${worst.ms.toFixed(0)} ms, ${worst.ok ? "analysed" : "refused with problems"}`);
