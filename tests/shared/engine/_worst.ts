import { reduceDocument } from "@shared/engine/reduceDocument";
import { ladderDiagram, nestedLoopChain } from "@server/bench/diagrams";
const cpu = () => { const u = process.cpuUsage(); return (u.user + u.system) / 1000; };
const which = process.argv[2];
let doc: unknown;
if (which === "ladder") doc = ladderDiagram(Number(process.argv[3]));
if (which === "nested") doc = nestedLoopChain(Number(process.argv[3]));
if (which === "dense") {
  // n gain blocks; sums with 16 ports wired from pseudo-random blocks: a dense web of algebraic loops.
  const n = Number(process.argv[3]);
  const blocks: any[] = [{ id: "r", type: "input" }];
  const wires: any[] = [];
  let seed = 1; const rnd = (m: number) => { seed = (seed * 1103515245 + 12345) % 2147483648; return seed % m; };
  const sums = Math.floor((n - 2) / 2);
  for (let i = 0; i < sums; i++) {
    blocks.push({ id: `s${i}`, type: "sum", signs: Array(8).fill("+") });
    blocks.push({ id: `g${i}`, type: "transfer", expr: `${(i % 7) + 1}/(s+${(i % 5) + 1})` });
    wires.push({ from: `s${i}`, to: `g${i}` });
  }
  for (let i = 0; i < sums; i++) for (let p = 0; p < 8; p++) wires.push({ from: p === 0 && i === 0 ? "r" : `g${rnd(sums)}`, to: `s${i}`, port: p });
  blocks.push({ id: "y", type: "output" }); wires.push({ from: `g${sums - 1}`, to: "y" });
  doc = { format: "loopwright-diagram", version: 1, parameters: {}, blocks, wires };
}
const t0 = cpu(); const m0 = process.memoryUsage().rss;
const out = reduceDocument(doc, { limits: { timeLimitMs: Number(process.argv[4] ?? 30000) } });
const r = out.ok ? out.result : null;
console.log(which, process.argv[3], "cpu ms", (cpu() - t0).toFixed(0), "rss MB", (process.resourceUsage().maxRSS / 1024).toFixed(0),
  r ? `ok steps=${r.steps.length} chars=${JSON.stringify(r).length} warnings=${r.warnings.length}` : JSON.stringify(out.problems.filter((p) => p.severity === "error").map((p) => [p.code, p.message.slice(0, 150)])) + ` (${out.problems.length} problems)`);
