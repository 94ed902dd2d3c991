import { readFileSync } from "node:fs";
import { reduceDocument } from "@shared/engine/reduceDocument";
const doc = JSON.parse(readFileSync(process.argv[2], "utf8"));
const t0 = performance.now();
const out = reduceDocument(doc);
console.log((performance.now() - t0).toFixed(1), "ms", JSON.stringify(out.ok ? out.result.transfers : out.problems).slice(0, 1500));
