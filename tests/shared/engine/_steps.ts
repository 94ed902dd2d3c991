import { ladderDiagram } from "@server/bench/diagrams";
import { reduceDocument } from "@shared/engine/reduceDocument";
const n = Number(process.argv[2] ?? 30); const sym = process.argv[3] === "sym";
const out = reduceDocument(ladderDiagram(n, { symbolic: sym }));
if (out.ok) for (const s of out.result.steps) console.log(s.index, s.rule, s.description.slice(0, 110), s.expr.length);
