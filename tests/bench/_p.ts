import { reduceDocumentExact } from "@shared/reduce/reduceDiagram";
const doc = { format: "loopwright-diagram", version: 1, title: "t", parameters: { K: 1, a: 2, b: 3, c: 4 },
 blocks: [{ id: "r", type: "input" }, { id: "e", type: "sum", signs: ["+", "-"] }, { id: "g", type: "transfer", expr: process.argv[2] ?? "1/(K+a+b+c+s)^50" }, { id: "h", type: "transfer", expr: process.argv[3] ?? "(s+K)/(s+a+b)" }, { id: "y", type: "output" }],
 wires: [{ from: "r", to: "e", port: 0 }, { from: "e", to: "g" }, { from: "g", to: "y" }, { from: "g", to: "h" }, { from: "h", to: "e", port: 1 }] };
const t0 = performance.now();
const out = reduceDocumentExact(doc);
console.log(performance.now() - t0, out.ok ? "ok" : JSON.stringify(out.problems));
