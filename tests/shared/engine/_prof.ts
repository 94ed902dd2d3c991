import { ladderDiagram } from "@server/bench/diagrams";
import { loadDiagram, validateDiagram } from "@shared/diagram/validate";
import { blockGains } from "@shared/engine/blockGains";
import { buildSignalGraph } from "@shared/reduce/build";
import { ratField, ratToText, ratToLatex, ratDenominator } from "@shared/algebra/ratfn";
import { loopDeterminants, reducePairs } from "@shared/reduce/reduce";
import { createBudget } from "@shared/reduce/budget";
import { characteristicPolynomial, cancelledModes } from "@shared/engine/modes";
const n = Number(process.argv[2] ?? 150); const sym = process.argv[3] === "sym";
for (let rep = 0; rep < 3; rep++) {
const t = [performance.now()];
const doc = loadDiagram(ladderDiagram(n, { symbolic: sym })).doc!;
const v = validateDiagram(doc); t.push(performance.now());
const { gains } = blockGains(doc, v.expressions); t.push(performance.now());
const g = buildSignalGraph(doc, gains, ratField);
const loops = loopDeterminants(g, ratField, createBudget()); t.push(performance.now());
const chi = characteristicPolynomial(loops, gains); t.push(performance.now());
const r = reducePairs(g, ratField, (x) => ({ expr: "", latex: "" }), [["r", "y"]], createBudget()); t.push(performance.now());
const r2 = reducePairs(g, ratField, (x) => ({ expr: ratToText(x), latex: ratToLatex(x) }), [["r", "y"]], createBudget()); t.push(performance.now());
const c = cancelledModes(chi, r.transfers[0].gain, { K: 2, a: 1.5, tau: 0.5 }, new Map()); t.push(performance.now());
console.log(["validate", "gains", "loopdet", "chi", "pairs-noprint", "pairs-print", "cancel"].map((k, i) => `${k}=${(t[i + 1] - t[i]).toFixed(1)}`).join(" "), c.length);
}
