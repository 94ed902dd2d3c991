import { writeFileSync } from "node:fs";
import fc from "fast-check";
import { wellPosedDiagram } from "tests/support/arbitraries";
import { reduceDocument } from "@shared/engine/reduceDocument";
const maxCore = Number(process.argv[2]);
const samples = fc.sample(wellPosedDiagram({ maxCore }), { numRuns: Number(process.argv[3]), seed: Number(process.argv[4]) });
const times: number[] = [];
samples.forEach((g, i) => {
  writeFileSync(`/tmp/scan-current.json`, JSON.stringify(g.doc));
  const t0 = performance.now();
  const out = reduceDocument(g.doc);
  const ms = performance.now() - t0;
  times.push(ms);
  if (!out.ok) console.log(i, "refused", JSON.stringify(out.problems).slice(0, 300));
  if (ms > 200) console.log(i, ms.toFixed(0), "ms", g.doc.blocks.length, Object.keys(g.doc.parameters).length ? "sym" : "num");
});
times.sort((a, b) => a - b);
console.log("n", times.length, "median", times[times.length >> 1].toFixed(1), "p90", times[Math.floor(times.length * 0.9)].toFixed(1), "total", times.reduce((a, b) => a + b, 0).toFixed(0));
