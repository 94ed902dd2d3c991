import { reduceDocument } from "@shared/engine/reduceDocument";
import { benchDiagram } from "@server/bench/diagrams";
for (const [f, n] of [["ladder", 20], ["ladder", 150], ["nested", 150]] as const) {
  const out = reduceDocument(benchDiagram(f, n));
  if (!out.ok) continue;
  const count: Record<string, number> = {};
  for (const s of out.result.steps) count[s.rule] = (count[s.rule] ?? 0) + 1;
  const chars = out.result.steps.reduce((a, s) => a + s.expr.length + s.latex.length, 0);
  console.log(f, n, JSON.stringify(count), "printed chars", chars);
  if (n === 20) for (const s of out.result.steps) console.log("  ", s.rule, "|", s.description, "|", s.expr);
}
