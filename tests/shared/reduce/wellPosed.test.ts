import { describe, expect, test } from "vitest";
import { reduceDocument } from "@shared/reduce/reduceDiagram";
import { diagram } from "../reduce/diagramSpec";
import { exact, resultOf, sameValue, transferValue } from "./exact";

/** r → e(+, sign) → g → y with g fed back to e's second port. */
const loopAround = (expr: string, sign: "+" | "-", parameters = {}, type = "transfer") =>
  diagram(
    [["r", "input"], ["e", "sum", ["+", sign]], ["g", type, expr], ["y", "output"]],
    ["r>e:0", "e>g", "g>y", "g>e:1"],
    parameters,
  );

const problemsOf = (doc: unknown) => {
  const out = reduceDocument(doc);
  if (out.ok) throw new Error("expected the reduction to be refused");
  return out.problems;
};

describe("ill-posed loops are refused, naming the loop's blocks", () => {
  test("positive unity feedback around a unity gain: algebraic loop (Δ ≡ 0)", () => {
    // common practice: e = r + e has no solution — the classic algebraic loop
    const problems = problemsOf(loopAround("1", "+", {}, "gain"));
    expect(problems).toHaveLength(1);
    expect(problems[0]).toMatchObject({ severity: "error", code: "algebraic-loop", blockId: "e", related: ["e", "g"] });
    expect(problems[0].message).toContain("e, g");
  });

  test("positive unity feedback around (s+1)/(s+2): improper closed loop (Δ(∞) = 0)", () => {
    // by hand: 1 − (s+1)/(s+2) = 1/(s+2) → 0 as s → ∞, so T = s + 1 would be improper
    const problems = problemsOf(loopAround("(s+1)/(s+2)", "+"));
    expect(problems.map((p) => [p.code, p.severity, p.related])).toEqual([["improper-loop", "error", ["e", "g"]]]);
  });

  test("an algebraic loop away from every input-output path is still refused", () => {
    const doc = diagram(
      [["r", "input"], ["g", "transfer", "1/(s+1)"], ["y", "output"], ["e", "sum", ["+", "+"]], ["k", "gain", "1"]],
      ["r>g", "g>y", "g>e:0", "e>k", "k>e:1"],
    );
    const problems = problemsOf(doc).filter((p) => p.severity === "error");
    expect(problems.map((p) => [p.code, p.related])).toEqual([["algebraic-loop", ["e", "k"]]]);
  });

  test("unity positive feedback nested in an outer loop: the interconnection is improper", () => {
    // Mason by hand: L1 = k = 1 (e2–k), L2 = −k/s (outer), touching: Δ = 1 − 1 + 1/s = 1/s → 0 as s → ∞
    // (the signal at e2 would be s·r: a derivative), so the document is refused, naming the whole loop.
    const doc = diagram(
      [
        ["r", "input"], ["e1", "sum", ["+", "-"]], ["e2", "sum", ["+", "+"]], ["k", "gain", "1"], ["g", "integrator"],
        ["y", "output"],
      ],
      ["r>e1:0", "e1>e2:0", "e2>k", "k>e2:1", "k>g", "g>y", "g>e1:1"],
    );
    expect(problemsOf(doc).map((p) => [p.code, p.related])).toEqual([["improper-loop", ["e1", "e2", "k", "g"]]]);
  });
});

describe("loops singular only at particular parameter values give warnings", () => {
  test("positive feedback around a gain K: no solution when K = 1", () => {
    const r = resultOf(reduceDocument(loopAround("K", "+", { K: 0.5 }, "gain")));
    // common practice: T = K/(1 − K)
    expect(sameValue(transferValue(r.transfers[0], ["K"]), exact("K/(1 - K)", ["K"]))).toBe(true);
    expect(r.warnings.map((w) => [w.code, w.severity, w.related])).toEqual([["singular-at-values", "warning", ["e", "g"]]]);
    expect(r.warnings[0].message).toContain("K = 1");
  });

  test("positive feedback around K(s+1)/(s+2): improper when K = 1", () => {
    // by hand: Δ = ((1 − K)s + 2 − K)/(s + 2), Δ(∞) = 1 − K
    const r = resultOf(reduceDocument(loopAround("K*(s+1)/(s+2)", "+", { K: 0.5 })));
    expect(r.warnings.map((w) => w.code)).toEqual(["singular-at-values"]);
    expect(r.warnings[0].message).toContain("improper when K = 1");
  });

  test("a parameter that changes a block's degree: (1 − K)/(K s + 1) in positive feedback, singular at K = 0", () => {
    // by hand: Δ = 1 − (1 − K)/(K s + 1) = K (s + 1)/(K s + 1), identically zero when K = 0 (the block is then 1)
    const r = resultOf(reduceDocument(loopAround("(1-K)/(K*s+1)", "+", { K: 2 })));
    expect(r.warnings.map((w) => w.code)).toEqual(["singular-at-values"]);
    expect(r.warnings[0].message).toContain("no unique solution when K = 0");
  });

  test("values of a parameter that cancels in Δ(∞) are not reported", () => {
    // the spindle plant 1/(tau s^2 + s): tau leads both numerator and denominator of Δ, so Δ(∞) = 1 for every tau
    const doc = loopAround("K/(tau*s^2 + s)", "-", { K: 4, tau: 0.5 });
    expect(resultOf(reduceDocument(doc)).warnings).toEqual([]);
  });

  test("validation warnings are passed on", () => {
    const doc = loopAround("1/(s+1)", "-", { K: { value: 5, min: 0, max: 1 } });
    expect(resultOf(reduceDocument(doc)).warnings.some((w) => w.field === "parameters.K" || w.message.includes("K"))).toBe(true);
  });
});

describe("improper blocks are allowed", () => {
  test("a PD controller K(s+1) around 1/(s(s+2)) reduces exactly", () => {
    // common practice: T = K(s+1)/(s^2 + (K+2)s + K), multiplied out by hand
    const doc = diagram(
      [["r", "input"], ["e", "sum", ["+", "-"]], ["c", "transfer", "K*(s+1)"], ["p", "transfer", "1/(s*(s+2))"], ["y", "output"]],
      ["r>e:0", "e>c", "c>p", "p>y", "p>e:1"],
      { K: 3 },
    );
    const r = resultOf(reduceDocument(doc));
    expect(sameValue(transferValue(r.transfers[0], ["K"]), exact("K*(s+1)/(s^2 + (K+2)*s + K)", ["K"]))).toBe(true);
    expect(r.warnings).toEqual([]);
  });

  test("an improper loop made of an improper block only warns", () => {
    // by hand: 1 − s/(s+1)·… here L = s·1/(s+1) with positive feedback: Δ = 1/(s+1) → 0, but the loop holds s
    const doc = diagram(
      [["r", "input"], ["e", "sum", ["+", "+"]], ["d", "transfer", "s"], ["p", "transfer", "1/(s+1)"], ["y", "output"]],
      ["r>e:0", "e>d", "d>p", "p>y", "p>e:1"],
    );
    const r = resultOf(reduceDocument(doc));
    expect(r.warnings.map((w) => [w.code, w.severity])).toEqual([["improper-loop", "warning"]]);
    expect(sameValue(transferValue(r.transfers[0]), exact("s"))).toBe(true);
  });
});
