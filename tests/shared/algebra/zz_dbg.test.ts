import { appendFileSync } from "node:fs";
import { it } from "vitest";
import fc from "fast-check";
import { zSplitFactors } from "@shared/algebra/factor";
import { polyMul } from "@shared/algebra/poly";
import { polyToText } from "@shared/algebra/polytext";
import { ratFromExpr, ratNumerator } from "@shared/algebra/ratfn";
import { polyExpr } from "./support";
it("dbg", () => {
  const samples = fc.sample(fc.tuple(polyExpr(true), polyExpr(true, 2)), { numRuns: 200, seed: 1 });
  for (const [e, c] of samples) {
    const p = polyMul(polyMul(ratNumerator(ratFromExpr(e)), ratNumerator(ratFromExpr(c))), ratNumerator(ratFromExpr(c)));
    appendFileSync("/tmp/h2a/trace.txt", polyToText(p) + "\n");
    const t0 = performance.now();
    zSplitFactors(p.z);
    const ms = performance.now() - t0;
    if (ms > 50) console.log("SLOW", ms);
  }
});
