import { reduceDocument } from "@shared/engine/reduceDocument";
import { ladderDiagram, nestedLoopChain } from "@server/bench/diagrams";
const cases: [string, number, boolean][] = [["ladder", 20, false], ["ladder", 60, false], ["ladder", 150, false], ["nested", 150, false], ["ladder", 10, true], ["ladder", 30, true], ["nested", 30, true], ["ladder", 500, false], ["nested", 500, false]];
for (const [fam, n, sym] of cases) {
  const doc = fam === "ladder" ? ladderDiagram(n, { symbolic: sym }) : nestedLoopChain(n, { symbolic: sym });
  const times: number[] = [];
  let out;
  for (let i = 0; i < 3; i++) { const t0 = performance.now(); out = reduceDocument(doc); times.push(performance.now() - t0); }
  times.sort((a, b) => a - b);
  const r = out!.ok ? out!.result : null;
  console.log(fam, n, sym ? "sym" : "num", times.map((t) => t.toFixed(1)).join(" "), r ? `steps=${r.steps.length} degT=${r.transfers[0].denominator.length} chiLen=${r.characteristic.length}` : JSON.stringify(out));
}
