import { readFileSync } from "node:fs";
import { reduceDocument } from "@shared/engine/reduceDocument";
const doc = JSON.parse(readFileSync(process.argv[2], "utf8"));
const out = reduceDocument(doc);
console.log(JSON.stringify(out.ok ? out.result : out.problems, null, 1));
