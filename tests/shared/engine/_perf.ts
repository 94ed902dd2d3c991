import { reduceDocument } from "@shared/engine/reduceDocument";
import { ladderDiagram, nestedLoopChain } from "@server/bench/diagrams";
const all: [string, number, boolean][] = [["ladder", 20, false], ["ladder", 60, false], ["ladder", 150, false], ["nested", 150, false], ["ladder", 10, true], ["ladder", 30, true], ["nested", 30, true], ["ladder", 500, false], ["nested", 500, false]];
const pick = process.argv[2];
const cases = pick ? all.filter(([f, n, s]) => `${f}${n}${s ? "s" : ""}` === pick) : all;
const cpu = () => { const u = process.cpuUsage(); return (u.user + u.system) / 1000; };
for (const [fam, n, sym] of cases) {
  const doc = fam === "ladder" ? ladderDiagram(n, { symbolic: sym }) : nestedLoopChain(n, { symbolic: sym });
  const times: number[] = [];
  let out;
  for (let i = 0; i < (n >= 500 ? 2 : 5); i++) { const t0 = cpu(); out = reduceDocument(doc); times.push(cpu() - t0); }
  times.sort((a, b) => a - b);
  const r = out!.ok ? out!.result : null;
  console.log(fam, n, sym ? "sym" : "num", "cpu ms min/med:", times[0].toFixed(0), times[times.length >> 1].toFixed(0), r ? `steps=${r.steps.length} Tlen=${r.transfers[0].denominator.length}` : JSON.stringify(out));
}
