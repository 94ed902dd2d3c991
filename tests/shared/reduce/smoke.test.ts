import { test } from "vitest";
import { buildSignalGraph } from "@shared/reduce/build";
import { reducePairs, loopDeterminants } from "@shared/reduce/reduce";
import { createBudget } from "@shared/reduce/budget";
import { diagram, frac, fracField, fracText, showFrac } from "./fractionField";

test("smoke", () => {
  const doc = diagram(
    [["r", "input"], ["e", "sum", ["+", "-"]], ["c", "transfer"], ["p", "transfer"], ["h", "gain"], ["y", "output"]],
    ["r>e:0", "e>c", "c>p", "p>y", "p>h", "h>e:1"],
  );
  const gains = new Map([["c", frac(12)], ["p", frac(2, 3)], ["h", frac(1, 2)]]);
  const g = buildSignalGraph(doc, gains, fracField);
  console.log(loopDeterminants(g, fracField, createBudget()).map((l) => [l.nodes, fracText(l.det)]));
  const r = reducePairs(g, fracField, showFrac, [["r", "y"]], createBudget());
  console.log(r.transfers.map((t) => [t.input, t.output, fracText(t.gain), t.final]));
  console.log(r.steps);
});
