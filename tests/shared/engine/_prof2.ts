import { ladderDiagram } from "@server/bench/diagrams";
import { reduceDocument } from "@shared/engine/reduceDocument";
const n = Number(process.argv[2] ?? 30); const sym = process.argv[3] === "sym";
const doc = ladderDiagram(n, { symbolic: sym });
for (let i = 0; i < 5; i++) reduceDocument(doc);
