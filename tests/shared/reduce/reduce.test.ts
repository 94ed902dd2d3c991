import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { createBudget } from "@shared/reduce/budget";
import { SingularLoopError } from "@shared/reduce/dense";
import { fieldProduct } from "@shared/reduce/eliminate";
import { SignalFlowGraph } from "@shared/reduce/graph";
import { reducePairs } from "@shared/reduce/reduce";
import { printSteps } from "@shared/reduce/trace";
import { diagram } from "./diagramSpec";
import { frac, fracField, fracText, showFrac, solveSignals, type Frac } from "./fractionField";
import { traceViolations } from "./traceCheck";

interface EdgeSpec {
  from: number;
  to: number;
  num: number;
  den: number;
  bare: boolean;
}

/** Random signal-flow graphs: input u, output y, `inner` nodes each fed by u and feeding y, plus random edges
 *  (self-loops included) with small rational gains; some are bare ±1 wires. Gains of 1 make zero pivots likely. */
const graphs = fc
  .integer({ min: 1, max: 6 })
  .chain((inner) =>
    fc.record({
      inner: fc.constant(inner),
      extra: fc.array(
        fc.record({
          from: fc.integer({ min: 1, max: inner }),
          to: fc.integer({ min: 1, max: inner }),
          num: fc.integer({ min: -3, max: 3 }).filter((x) => x !== 0),
          den: fc.integer({ min: 1, max: 3 }),
          bare: fc.boolean(),
        }),
        { maxLength: inner * 3 },
      ),
      ends: fc.array(fc.integer({ min: 1, max: 4 }), { minLength: 2 * inner, maxLength: 2 * inner }),
    }),
  );

function build(inner: number, extra: EdgeSpec[], ends: number[]) {
  const names = ["u", ...Array.from({ length: inner }, (_, i) => `n${i + 1}`), "y"];
  const edges: { from: string; to: string; gain: Frac; label: string | null; sign: 1 | -1 }[] = [];
  for (let i = 1; i <= inner; i++) {
    edges.push({ from: "u", to: names[i], gain: frac(ends[2 * i - 2]), label: `in${i}`, sign: 1 });
    edges.push({ from: names[i], to: "y", gain: frac(1, ends[2 * i - 1]), label: `out${i}`, sign: 1 });
  }
  extra.forEach((e, k) => {
    const sign = e.num < 0 ? -1 : 1;
    edges.push(
      e.bare
        ? { from: names[e.from], to: names[e.to], gain: frac(sign), label: null, sign }
        : { from: names[e.from], to: names[e.to], gain: frac(e.num, e.den), label: `g${k}`, sign: 1 },
    );
  });
  const graph = new SignalFlowGraph<Frac>();
  names.forEach((id, i) => graph.addNode(id, i, null));
  for (const e of edges) graph.addEdge({ ...e, before: [], after: [] });
  const labels = edges.flatMap((e) => (e.label ? [e.label] : []));
  return { graph, names, edges, doc: diagram(labels.map((l) => [l, "gain"]), []) };
}

describe("random signal-flow graphs against an independent linear solve (common practice)", () => {
  test("transfer, determinant, trace and determinism agree", () => {
    fc.assert(
      fc.property(graphs, ({ inner, extra, ends }) => {
        const { graph, names, edges, doc } = build(inner, extra, ends);
        const ref = solveSignals(names, edges, "u");
        const run = () => reducePairs(graph, fracField, [["u", "y"]], createBudget(), { determinant: true });
        if (!ref.x) {
          expect(run).toThrow(SingularLoopError);
          return;
        }
        const out = run();
        expect(fracText(out.transfers[0].gain)).toBe(fracText(ref.x.get("y")!));
        expect(fracText(fieldProduct(fracField, out.transfers[0].pivots!))).toBe(fracText(ref.det));
        expect(traceViolations(doc, out.steps)).toEqual([]);
        expect(JSON.stringify(printSteps(run().steps, showFrac))).toBe(JSON.stringify(printSteps(out.steps, showFrac)));
      }),
      { numRuns: 400 },
    );
  });
});
