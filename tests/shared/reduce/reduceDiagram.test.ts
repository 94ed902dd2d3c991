import { describe, expect, test } from "vitest";
import { benchDiagram } from "../../bench/diagrams";
import { reduceDocument } from "@shared/reduce/reduceDiagram";
import { reductionResultSchema } from "@shared/reduce/result";
import { diagram } from "../reduce/diagramSpec";
import { traceViolations } from "../reduce/traceCheck";
import { exact, resultOf, sameValue, transferValue } from "./exact";

const spindle = {
  format: "loopwright-diagram",
  version: 1,
  title: "Spindle speed loop",
  parameters: { K: 4, tau: { value: 0.5, unit: "s", min: 0.1, max: 2, description: "motor time constant" } },
  blocks: [
    { id: "r", type: "input", label: "r" },
    { id: "e", type: "sum", signs: ["+", "-"] },
    { id: "c", type: "transfer", expr: "K*(s+2)/s" },
    { id: "p", type: "transfer", expr: "1/(tau*s^2 + s)" },
    { id: "h", type: "gain", expr: "0.5" },
    { id: "y", type: "output", label: "y" },
  ],
  wires: [
    { id: "w1", from: "r", to: "e", port: 0 },
    { from: "e", to: "c" },
    { from: "c", to: "p" },
    { from: "p", to: "y" },
    { from: "p", to: "h" },
    { from: "h", to: "e", port: 1 },
  ],
  layout: { r: { x: 0, y: 0 } },
};

describe("the spindle speed loop example", () => {
  const result = resultOf(reduceDocument(spindle));

  test("closed loop T(r→y) = K(s+2)/(tau s^3 + s^2 + 0.5 K s + K)", () => {
    // common practice: T = C·P/(1 + C·P·H) with C = K(s+2)/s, P = 1/(tau s^2 + s), H = 0.5, multiplied out by hand
    expect(result.transfers).toHaveLength(1);
    const t = result.transfers[0];
    expect([t.input, t.output]).toEqual(["r", "y"]);
    expect(sameValue(transferValue(t, ["K", "tau"]), exact("K*(s+2)/(tau*s^3 + s^2 + 0.5*K*s + K)", ["K", "tau"]))).toBe(true);
    expect(t.cancelled).toEqual([]);
    expect(t.latex.startsWith("\\frac{")).toBe(true);
  });

  test("characteristic polynomial Δ·s·(tau s^2 + s) = tau s^3 + s^2 + 0.5 K s + K", () => {
    expect(sameValue(exact(result.characteristic, ["K", "tau"]), exact("tau*s^3 + s^2 + 0.5*K*s + K", ["K", "tau"]))).toBe(true);
    expect(result.characteristicLatex).toContain("\\tau");
  });

  test("the trace is the textbook one: series c·p, then the feedback loop through h", () => {
    expect(result.steps.map((s) => s.rule)).toEqual(["series", "feedback"]);
    expect(result.steps[0].consumedBlocks).toEqual(["c", "p"]);
    expect(result.steps[1].consumedBlocks).toEqual(["eq1", "h", "e"]); // the loop's summing junction too
    expect(sameValue(exact(result.steps[0].expr, ["K", "tau"]), exact("K*(s+2)/s/(tau*s^2+s)", ["K", "tau"]))).toBe(true);
    expect(traceViolations(spindle as never, result.steps)).toEqual([]);
    expect(result.warnings).toEqual([]);
  });

  test("is deterministic", () => {
    expect(JSON.stringify(resultOf(reduceDocument(spindle)))).toBe(JSON.stringify(result));
  });
});

describe("textbook reductions (exact, symbolic)", () => {
  test("unity feedback around 1/(s(s+1)) gives 1/(s^2 + s + 1)", () => {
    // from memory: Ogata, Modern Control Engineering, unity-feedback second-order system C/R = 1/(s^2 + s + 1)
    const doc = diagram(
      [["r", "input"], ["e", "sum", ["+", "-"]], ["g", "transfer", "1/(s*(s+1))"], ["y", "output"]],
      ["r>e:0", "e>g", "g>y", "g>e:1"],
    );
    const r = resultOf(reduceDocument(doc));
    expect(r.transfers[0].numerator).toBe("1");
    expect(r.transfers[0].denominator).toBe("s^2 + s + 1");
    expect(r.characteristic).toBe("s^2 + s + 1");
    expect(traceViolations(doc, r.steps)).toEqual([]);
  });

  test("a minor loop inside a unity outer loop: G1G2G3/(1 + G2H2 + G1G2G3)", () => {
    // from memory: Nise, Control Systems Engineering, ch. 5, block diagram reduction of a minor loop
    const doc = diagram(
      [
        ["r", "input"], ["e1", "sum", ["+", "-"]], ["g1", "gain", "K"], ["e2", "sum", ["+", "-"]],
        ["g2", "transfer", "1/(s+1)"], ["h2", "gain", "2"], ["g3", "integrator"], ["y", "output"],
      ],
      ["r>e1:0", "e1>g1", "g1>e2:0", "e2>g2", "g2>h2", "h2>e2:1", "g2>g3", "g3>y", "g3>e1:1"],
      { K: 3 },
    );
    const r = resultOf(reduceDocument(doc));
    // K·1/(s+1)·1/s / (1 + 2/(s+1) + K/(s(s+1))) = K/(s^2 + 3s + K), multiplied out by hand
    expect(sameValue(transferValue(r.transfers[0], ["K"]), exact("K/(s^2 + 3*s + K)", ["K"]))).toBe(true);
    expect(r.steps.map((s) => s.rule)).toContain("feedback");
    expect(traceViolations(doc, r.steps)).toEqual([]);
  });

  test("interlocked loops needing a moved junction or pickoff", () => {
    // from memory: Ogata, Modern Control Engineering, block diagram reduction example (positive loop H1 and
    // negative loop H2 sharing G2, unity outer loop): C/R = G1G2G3/(1 − G1G2H1 + G2G3H2 + G1G2G3)
    const names = ["G1", "G2", "G3", "H1", "H2"];
    const doc = diagram(
      [
        ["r", "input"], ["s1", "sum", ["+", "-"]], ["s2", "sum", ["+", "+"]], ["g1", "gain", "G1"], ["s3", "sum", ["+", "-"]],
        ["g2", "gain", "G2"], ["g3", "gain", "G3"], ["h1", "gain", "H1"], ["h2", "gain", "H2"], ["y", "output"],
      ],
      ["r>s1:0", "s1>s2:0", "s2>g1", "g1>s3:0", "s3>g2", "g2>g3", "g3>y", "g2>h1", "h1>s2:1", "g3>h2", "h2>s3:1", "g3>s1:1"],
      { G1: 2, G2: 3, G3: 0.5, H1: 0.25, H2: 4 },
    );
    const r = resultOf(reduceDocument(doc));
    const expected = exact("G1*G2*G3/(1 - G1*G2*H1 + G2*G3*H2 + G1*G2*G3)", names);
    expect(sameValue(transferValue(r.transfers[0], names), expected)).toBe(true);
    expect(r.steps.some((s) => s.rule === "move-sum" || s.rule === "move-pickoff")).toBe(true);
    expect(traceViolations(doc, r.steps)).toEqual([]);
  });

  test("parallel forward paths inside a feedback loop: (G1 + G2)/(1 + (G1 + G2)H)", () => {
    // common practice: parallel blocks add, then the feedback formula
    const doc = diagram(
      [
        ["r", "input"], ["e", "sum", ["+", "-"]], ["p", "branch"], ["a", "transfer", "1/(s+1)"], ["b", "transfer", "2/(s+3)"],
        ["j", "sum", ["+", "+"]], ["h", "gain", "k"], ["y", "output"],
      ],
      ["r>e:0", "e>p", "p>a", "p>b", "a>j:0", "b>j:1", "j>y", "j>h", "h>e:1"],
      { k: 2 },
    );
    const r = resultOf(reduceDocument(doc));
    const g = "(1/(s+1) + 2/(s+3))";
    expect(sameValue(transferValue(r.transfers[0], ["k"]), exact(`${g}/(1 + ${g}*k)`, ["k"]))).toBe(true);
    expect(r.steps.map((s) => s.rule)).toEqual(["parallel", "feedback"]);
  });
});

describe("several inputs and outputs", () => {
  // common practice (disturbance at the plant input): T_r = CP/(1 + CP), T_d = P/(1 + CP), T from r to u = C/(1 + CP)
  const doc = diagram(
    [
      ["r", "input"], ["d", "input"], ["e", "sum", ["+", "-"]], ["c", "transfer", "K"], ["u", "sum", ["+", "+"]],
      ["p", "transfer", "1/(s+1)"], ["y", "output"], ["uo", "output"],
    ],
    ["r>e:0", "e>c", "c>u:0", "d>u:1", "u>p", "p>y", "p>e:1", "c>uo"],
    { K: 5 },
  );

  test("every pair with the other inputs zero", () => {
    const r = resultOf(reduceDocument(doc));
    expect(r.transfers.map((t) => `${t.input}→${t.output}`)).toEqual(["r→y", "r→uo", "d→y", "d→uo"]);
    const v = (i: number) => transferValue(r.transfers[i], ["K"]);
    expect(sameValue(v(0), exact("K/(s + 1 + K)", ["K"]))).toBe(true);
    expect(sameValue(v(1), exact("K*(s+1)/(s + 1 + K)", ["K"]))).toBe(true);
    expect(sameValue(v(2), exact("1/(s + 1 + K)", ["K"]))).toBe(true);
    expect(sameValue(v(3), exact("-K/(s + 1 + K)", ["K"]))).toBe(true);
    expect(new Set(r.steps.map((s) => `${s.input}→${s.output}`))).toEqual(new Set(["r→y", "r→uo", "d→y", "d→uo"]));
    expect(traceViolations(doc, r.steps)).toEqual([]);
  });

  test("one pair on request", () => {
    const r = resultOf(reduceDocument(doc, { input: "d", output: "y" }));
    expect(r.transfers.map((t) => `${t.input}→${t.output}`)).toEqual(["d→y"]);
    expect(r.steps.every((s) => s.input === "d" && s.output === "y")).toBe(true);
    expect(resultOf(reduceDocument(doc, { output: "uo" })).transfers.map((t) => t.input)).toEqual(["r", "d"]);
  });

  test("an unknown or wrong pair id is a problem naming it", () => {
    const out = reduceDocument(doc, { input: "zz", output: "c" });
    expect(out.ok).toBe(false);
    if (out.ok) return;
    expect(out.problems.map((p) => [p.code, p.field, p.blockId])).toEqual([
      ["unknown-pair-id", "input", undefined],
      ["unknown-pair-id", "output", "c"],
    ]);
    expect(out.problems[0].message).toContain("zz");
  });

  test("a pair without a path has transfer 0 and no steps", () => {
    const apart = diagram(
      [["r", "input"], ["g", "transfer", "1/(s+1)"], ["y", "output"], ["q", "input"], ["z", "output"]],
      ["r>g", "g>y", "q>z"],
    );
    const r = resultOf(reduceDocument(apart, { input: "q", output: "y" }));
    expect([r.transfers[0].numerator, r.transfers[0].denominator]).toEqual(["0", "1"]);
    expect(r.steps).toEqual([]);
  });
});

describe("refusals", () => {
  test("validation errors fail with every problem found", () => {
    const out = reduceDocument({ ...spindle, blocks: spindle.blocks.map((b) => (b.id === "c" ? { ...b, expr: "K*(s+" } : b)) });
    expect(out.ok).toBe(false);
    if (!out.ok) expect(out.problems.some((p) => p.blockId === "c" && p.severity === "error")).toBe(true);
  });

  test("an expression that divides by something identically zero names its block", () => {
    const doc = diagram([["r", "input"], ["g", "transfer", "1/(s - s)"], ["y", "output"]], ["r>g", "g>y"]);
    const out = reduceDocument(doc);
    expect(out.ok).toBe(false);
    if (!out.ok) expect(out.problems.map((p) => [p.code, p.blockId, p.field])).toEqual([["division-by-zero", "g", "expr"]]);
  });

  test("not a document", () => {
    const out = reduceDocument("hello");
    expect(out.ok).toBe(false);
  });

  test("a result above degree 1000 in s is refused with degree-limit", () => {
    // 21 blocks of order 50 in cascade: order 1050
    const blocks: [string, string, string?][] = [["r", "input"]];
    const wires: string[] = [];
    for (let i = 0; i < 21; i++) {
      blocks.push([`g${i}`, "transfer", "1/(s+1)^50"]);
      wires.push(`${i === 0 ? "r" : `g${i - 1}`}>g${i}`);
    }
    blocks.push(["y", "output"]);
    wires.push("g20>y");
    const out = reduceDocument(diagram(blocks, wires));
    expect(out.ok).toBe(false);
    if (!out.ok) expect(out.problems.map((p) => p.code)).toContain("degree-limit");
  });

  test("too many input/output pairs: asks for one input or output", () => {
    // 40 inputs each wired to its own output: 1,600 pairs
    const ids = Array.from({ length: 40 }, (_, i) => i);
    const doc = diagram(
      ids.flatMap((i): [string, string][] => [[`u${i}`, "input"], [`y${i}`, "output"]]),
      ids.map((i) => `u${i}>y${i}`),
    );
    const out = reduceDocument(doc);
    expect(out.ok).toBe(false);
    if (!out.ok) expect(out.problems.map((p) => p.code)).toEqual(["too-many-pairs"]);
    expect(reduceDocument(doc, { output: "y3" }).ok).toBe(true);
  });

  test("a work limit is a clear problem, not a hang", () => {
    const out = reduceDocument(spindle, { limits: { maxEdges: 1 } });
    expect(out.ok).toBe(false);
    if (!out.ok) expect(out.problems.map((p) => p.code)).toEqual(["too-complex"]);
  });

  // A loop around one expression whose expansion alone runs for minutes: the clock is watched inside the arithmetic.
  const heavyLoop = (expr: string) =>
    diagram(
      [["r", "input"], ["e", "sum", ["+", "-"]], ["g", "transfer", expr], ["y", "output"]],
      ["r>e:0", "e>g", "g>y", "g>e:1"],
      { K: 1, a: 2, b: 3, c: 4 },
    );

  test("an expansion past the time limit (s + K + a + b + c)^20 ends with a problem naming the block and the limit", () => {
    // 10,626 terms: inside the size limits (sizeLimits.ts), so it is the time guard that stops it.
    const out = reduceDocument(heavyLoop("(K + a + b + c + s)^20"), { limits: { timeLimitMs: 50 } });
    expect(out.ok).toBe(false);
    if (out.ok) return;
    expect(out.problems.map((p) => [p.code, p.blockId])).toEqual([["too-complex", "g"]]);
    expect(out.problems[0].message).toContain("time limit of 0.05 s");
  });

  test("a gcd in four parameters past its own budget ends with a problem naming the block, the budget and the parameters", () => {
    const common = "(s + K + a + b + c + 1)^5";
    const expr = `((K*s + a + 2*b + 3)^5*${common})/((c*s + K + 3*a + 5)^5*${common})`;
    const out = reduceDocument(heavyLoop(expr), { limits: { gcdTimeLimitMs: 5 } });
    expect(out.ok).toBe(false);
    if (out.ok) return;
    expect(out.problems.map((p) => [p.code, p.blockId])).toEqual([["gcd-time-limit", "g"]]);
    expect(out.problems[0].message).toContain("gcd time budget of 0.005 s");
    // Which gcd runs out (the whole one, or one of its contents) depends on the machine: it names its parameters.
    expect(out.problems[0].message).toMatch(/polynomials in [Kabc](, [Kabc])* took longer/);
  });
});

describe("generated ladders and nested-loop chains", () => {
  test.each([
    ["ladder", 20, false],
    ["ladder", 60, false],
    ["nested", 60, false],
    ["ladder", 30, true],
    ["nested", 30, true],
  ] as const)("%s of %i blocks (symbolic: %s): a valid result, a consistent trace, the same every time", (family, n, symbolic) => {
    const doc = benchDiagram(family, n, { symbolic });
    const result = resultOf(reduceDocument(doc));
    expect(reductionResultSchema.safeParse(result).success).toBe(true);
    expect(traceViolations(doc, result.steps)).toEqual([]);
    expect(result.warnings).toEqual([]);
    // common practice: every loop holds a strictly proper section, so Δ(∞) = 1 and the order of the whole
    // interconnection is the sum of the block orders — here one per first-order transfer block
    const order = doc.blocks.filter((b) => b.type === "transfer").length;
    const degree = Math.max(...[...result.characteristic.matchAll(/\bs\^(\d+)/g)].map((m) => Number(m[1])));
    expect(degree).toBe(order);
    expect(JSON.stringify(resultOf(reduceDocument(doc)))).toBe(JSON.stringify(result));
  });
});
