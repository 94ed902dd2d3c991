import { describe, expect, test } from "vitest";
import { buildSignalGraph } from "@shared/reduce/build";
import { createBudget } from "@shared/reduce/budget";
import { fieldProduct } from "@shared/reduce/eliminate";
import { SignalFlowGraph } from "@shared/reduce/graph";
import { loopDeterminants, reducePairs } from "@shared/reduce/reduce";
import { printSteps } from "@shared/reduce/trace";
import { diagram } from "./diagramSpec";
import { frac, fracField, fracText, showFrac, type Frac } from "./fractionField";
import { traceViolations } from "./traceCheck";

const f = fracField;
type Doc = ReturnType<typeof diagram>;

function reduce(doc: Doc, gains: Record<string, Frac>, pair: [string, string] = ["r", "y"]) {
  const graph = buildSignalGraph(doc, new Map(Object.entries(gains)), f);
  const out = reducePairs(graph, f, [pair], createBudget(), { determinant: true });
  expect(traceViolations(doc, out.steps)).toEqual([]);
  return { ...out, steps: printSteps(out.steps, showFrac), t: out.transfers[0] };
}

describe("textbook rules on small graphs (plain rational gains)", () => {
  test("series: two blocks in cascade multiply", () => {
    // common practice: blocks in cascade have the product transfer function
    const doc = diagram([["r", "input"], ["a", "transfer"], ["b", "transfer"], ["y", "output"]], ["r>a", "a>b", "b>y"]);
    const { t, steps } = reduce(doc, { a: frac(2, 3), b: frac(5) });
    expect(fracText(t.gain)).toBe("10/3");
    expect(steps).toHaveLength(1);
    expect(steps[0]).toMatchObject({
      rule: "series",
      consumedBlocks: ["a", "b"],
      consumedWires: ["w1"], // the wire between them; r → a and b → y now connect eq1
      produced: "eq1",
      expr: "10/3",
      input: "r",
      output: "y",
    });
    expect(steps[0].description).toBe("Series: a then b become eq1 = a·b.");
    expect(t.final).toBe("eq1");
  });

  test("parallel: two paths between a pickoff and a junction add", () => {
    // common practice: parallel blocks between one pickoff point and one summing junction add
    const doc = diagram(
      [["r", "input"], ["p", "branch"], ["a", "gain"], ["b", "gain"], ["s", "sum", ["+", "-"]], ["y", "output"]],
      ["r>p", "p>a", "a>s:0", "p>b", "b>s:1", "s>y"],
    );
    const { t, steps } = reduce(doc, { a: frac(2), b: frac(3) });
    expect(fracText(t.gain)).toBe("-1");
    expect(steps.map((s) => s.rule)).toEqual(["parallel"]);
    expect(steps[0].consumedBlocks).toEqual(["p", "a", "b", "s"]); // the pickoff, both branches, the junction
    expect(steps[0].consumedWires).toEqual(["w1", "w2", "w3", "w4"]); // r → p and s → y stay
    expect(steps[0].description).toContain("a and −b");
  });

  test("feedback: unity negative feedback gives G/(1 + G)", () => {
    // from memory: Ogata, Modern Control Engineering, closed-loop transfer function C/R = G/(1 + G) for unity feedback
    const doc = diagram(
      [["r", "input"], ["e", "sum", ["+", "-"]], ["g", "transfer"], ["y", "output"]],
      ["r>e:0", "e>g", "g>y", "g>e:1"],
    );
    const { t, steps } = reduce(doc, { g: frac(3) });
    expect(fracText(t.gain)).toBe("3/4");
    expect(steps).toHaveLength(1);
    expect(steps[0]).toMatchObject({ rule: "feedback", consumedBlocks: ["g", "e"], consumedWires: ["w1", "w3"], produced: "eq1" });
    expect(steps[0].description).toContain("negative feedback");
    expect(steps[0].description).toContain("g/(1 + g)");
  });

  test("feedback: a loop of gain G·H with the sum's sign + gives G/(1 − G·H)", () => {
    // from memory: Dorf & Bishop, Modern Control Systems, positive feedback G/(1 − GH)
    const doc = diagram(
      [["r", "input"], ["e", "sum", ["+", "+"]], ["g", "transfer"], ["h", "gain"], ["y", "output"]],
      ["r>e:0", "e>g", "g>y", "g>h", "h>e:1"],
    );
    const { t, steps } = reduce(doc, { g: frac(2), h: frac(1, 4) });
    expect(fracText(t.gain)).toBe("4"); // 2 / (1 − 1/2)
    expect(steps[0].description).toContain("positive feedback");
  });

  test("feedback on a self-loop: a node fed back to itself", () => {
    // common practice: x = g·u + L·x gives x = g/(1 − L)·u
    const g = new SignalFlowGraph<Frac>();
    ["u", "n", "y"].forEach((id, i) => g.addNode(id, i, null));
    g.addEdge({ from: "u", to: "n", gain: frac(2), label: "a", sign: 1, before: [], after: [] });
    g.addEdge({ from: "n", to: "n", gain: frac(1, 3), label: "l", sign: 1, before: [], after: [] });
    g.addEdge({ from: "n", to: "y", gain: frac(5), label: "b", sign: 1, before: [], after: [] });
    const out = reducePairs(g, f, [["u", "y"]], createBudget(), { determinant: true });
    expect(fracText(out.transfers[0].gain)).toBe("15"); // 2/(1 − 1/3)·5
    expect(fracText(fieldProduct(f, out.transfers[0].pivots!))).toBe("2/3");
    expect(out.steps.map((s) => s.rule)).toEqual(["feedback", "series"]);
    expect(out.steps[0].description).toContain("a/(1 − l)");
  });
});

describe("interlocked loops: moving junctions and pickoff points", () => {
  // from memory: Ogata, Modern Control Engineering, block diagram reduction example with loops H1 (positive),
  // H2 and the unity outer loop all sharing G2: C/R = G1G2G3 / (1 − G1G2H1 + G2G3H2 + G1G2G3)
  const doc = diagram(
    [
      ["r", "input"], ["s1", "sum", ["+", "-"]], ["s2", "sum", ["+", "+"]], ["g1", "transfer"], ["s3", "sum", ["+", "-"]],
      ["g2", "transfer"], ["g3", "transfer"], ["h1", "gain"], ["h2", "gain"], ["y", "output"],
    ],
    ["r>s1:0", "s1>s2:0", "s2>g1", "g1>s3:0", "s3>g2", "g2>g3", "g3>y", "g2>h1", "h1>s2:1", "g3>h2", "h2>s3:1", "g3>s1:1"],
  );
  const [G1, G2, G3, H1, H2] = [frac(2), frac(3, 2), frac(1, 3), frac(1, 5), frac(4)];

  test("reduces to the textbook closed form", () => {
    const { t, steps } = reduce(doc, { g1: G1, g2: G2, g3: G3, h1: H1, h2: H2 });
    const fwd = f.mul(f.mul(G1, G2), G3);
    const den = f.add(f.add(f.sub(f.one, f.mul(f.mul(G1, G2), H1)), f.mul(f.mul(G2, G3), H2)), fwd);
    expect(fracText(t.gain)).toBe(fracText(f.div(fwd, den)));
    expect(fracText(fieldProduct(f, t.pivots!))).toBe(fracText(den));
    const rules = new Set(steps.map((s) => s.rule));
    expect(rules.has("move-sum") || rules.has("move-pickoff")).toBe(true);
  });

  test("is deterministic: the same document gives the same steps", () => {
    const gains = { g1: G1, g2: G2, g3: G3, h1: H1, h2: H2 };
    expect(JSON.stringify(reduce(doc, gains).steps)).toBe(JSON.stringify(reduce(doc, gains).steps));
  });
});

describe("general elimination", () => {
  test("a node with two ways in and two ways out is eliminated", () => {
    // common practice: node elimination x_b += g_ab·g_bc/(1 − L_b); checked against a hand solve below
    const g = new SignalFlowGraph<Frac>();
    ["u", "a", "b", "c", "y"].forEach((id, i) => g.addNode(id, i, null));
    const edge = (from: string, to: string, gain: Frac, label: string) =>
      g.addEdge({ from, to, gain, label, sign: 1, before: [], after: [] });
    edge("u", "b", frac(1), "p");
    edge("a", "b", frac(1, 2), "q");
    edge("b", "c", frac(2), "r");
    edge("b", "a", frac(1, 3), "t");
    edge("c", "a", frac(1, 4), "v");
    edge("u", "a", frac(1), "w");
    edge("c", "y", frac(1), "z");
    edge("a", "y", frac(3), "k");
    const out = reducePairs(g, f, [["u", "y"]], createBudget(), { determinant: true });
    // By hand: a = u + b/3 + c/4, b = u + a/2, c = 2b  →  a = u + 5b/6 = 11u/6 + 5a/12  →  a = 22u/7,
    // b = 18u/7, c = 36u/7, y = c + 3a = 102u/7.
    expect(fracText(out.transfers[0].gain)).toBe("102/7");
    expect(out.steps.some((s) => s.rule === "eliminate-node" || s.rule.startsWith("move"))).toBe(true);
  });

  test("falls back to solving the remaining junctions together when every pivot is zero", () => {
    // x_a = x_a + 3·x_b + u and x_b = x_b + 2·x_a: no single-node pivot, yet the solution is unique:
    // x_a = 0, x_b = −u/3 (solved by hand).
    const g = new SignalFlowGraph<Frac>();
    ["u", "a", "b", "y"].forEach((id, i) => g.addNode(id, i, null));
    const edge = (from: string, to: string, gain: Frac, label: string) =>
      g.addEdge({ from, to, gain, label, sign: 1, before: [], after: [] });
    edge("u", "a", frac(1), "p");
    edge("a", "a", frac(1), "la");
    edge("b", "b", frac(1), "lb");
    edge("a", "b", frac(2), "q");
    edge("b", "a", frac(3), "t");
    edge("b", "y", frac(1), "z");
    const out = reducePairs(g, f, [["u", "y"]], createBudget(), { determinant: true });
    expect(fracText(out.transfers[0].gain)).toBe("-1/3");
    expect(fracText(fieldProduct(f, out.transfers[0].pivots!))).toBe("-6");
    const last = out.steps[out.steps.length - 1];
    expect(last.rule).toBe("eliminate-node");
    expect(last.description).toContain("together");
  });
});

describe("loop determinants", () => {
  // from memory: Mason's gain formula, Δ = 1 − ΣL_i + ΣL_iL_j (non-touching pairs) − …
  test("two loops that touch: Δ = 1 − L1 − L2", () => {
    const doc = diagram(
      [["r", "input"], ["e", "sum", ["+", "+", "+"]], ["a", "gain"], ["b", "gain"], ["y", "output"]],
      ["r>e:0", "e>a", "a>e:1", "a>b", "b>e:2", "b>y"],
    );
    const graph = buildSignalGraph(doc, new Map([["a", frac(1, 2)], ["b", frac(1, 3)]]), f);
    const [loop] = loopDeterminants(graph, f, createBudget());
    expect(loop.nodes).toEqual(["e", "a", "b"]);
    expect(fracText(loop.det)).toBe("1/3"); // L1 = a = 1/2, L2 = a·b = 1/6: 1 − 1/2 − 1/6
  });

  test("two loops apart: one determinant each, product 1 − L1 − L2 + L1·L2", () => {
    const doc = diagram(
      [["r", "input"], ["e1", "sum", ["+", "+"]], ["a", "gain"], ["e2", "sum", ["+", "+"]], ["b", "gain"], ["y", "output"]],
      ["r>e1:0", "e1>a", "a>e1:1", "a>e2:0", "e2>b", "b>e2:1", "b>y"],
    );
    const graph = buildSignalGraph(doc, new Map([["a", frac(1, 2)], ["b", frac(1, 3)]]), f);
    const loops = loopDeterminants(graph, f, createBudget());
    expect(loops.map((l) => [l.nodes, fracText(l.det)])).toEqual([
      [["e1", "a"], "1/2"],
      [["e2", "b"], "2/3"],
    ]);
    const pair = reducePairs(graph, f, [["r", "y"]], createBudget(), { determinant: true }).transfers[0];
    expect(fracText(fieldProduct(f, pair.pivots!))).toBe("1/3"); // 1 − 1/2 − 1/3 + 1/6
  });

  test("positive unity feedback around a unity gain is singular: Δ = 0", () => {
    const doc = diagram(
      [["r", "input"], ["e", "sum", ["+", "+"]], ["g", "gain"], ["y", "output"]],
      ["r>e:0", "e>g", "g>e:1", "g>y"],
    );
    const graph = buildSignalGraph(doc, new Map([["g", frac(1)]]), f);
    expect(f.isZero(loopDeterminants(graph, f, createBudget())[0].det)).toBe(true);
    expect(() => reducePairs(graph, f, [["r", "y"]], createBudget())).toThrow(/Algebraic loop/);
  });
});
