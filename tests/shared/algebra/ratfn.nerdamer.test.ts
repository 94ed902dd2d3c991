import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { polyGcd, polyIsZero, polyMul, type Poly } from "@shared/algebra/poly";
import { polyToText } from "@shared/algebra/polytext";
import { ratDenominator, ratFromExpr, ratNumerator, ratReduceTracked } from "@shared/algebra/ratfn";
import { parseTransfer } from "../../support/parseTransfer";
import type { ExprNode } from "@shared/expr/ast";
import {
  exprNerdamer, nAssociates, nCancel, nDegree, nEqual, nEqualFraction, nExpand, nGcd, type Fraction,
} from "../../support/nerdamer";
import { PARAMS, polyExpr } from "./support";

// Reference: nerdamer 1.1.13 (in-process CAS) — expand, gcd and div — compared by meaning, beside the sympy checks.
// Its gcd is wrong when both cofactors hold different parameters (gcd((s+a)(s+1), (s+a)(s+K)) gives 1), so the
// lowest-terms checks with parameters keep to one shared parameter factor and the random ones are numeric.

const polyOfText = (text: string): Poly => ratNumerator(parseTransfer(text, "1", PARAMS));
const polyOfTree = (e: ExprNode): Poly => ratNumerator(ratFromExpr(e));

/** Ours printed as nerdamer reads it: numerator and (leading coefficient 1) denominator of the lowest terms. */
function ourLowestTerms(num: Poly, den: Poly): Fraction {
  const { value } = ratReduceTracked(num, den);
  return { num: polyToText(ratNumerator(value)), den: polyToText(ratDenominator(value)) };
}

/** Same value as nerdamer's cancelled form and the same degrees, so nothing more could cancel. */
function expectSameLowestTerms(ours: Fraction, ref: Fraction, ctx: string): void {
  expect(nEqualFraction(ours, ref), `value differs from nerdamer: ${ctx}`).toBe(true);
  expect([nDegree(ours.num), nDegree(ours.den)], `degrees differ from nerdamer's: ${ctx}`).toEqual([
    nDegree(ref.num),
    nDegree(ref.den),
  ]);
}

describe("polyMul against nerdamer's expand (reference: nerdamer 1.1.13 (in-process CAS))", () => {
  const table: string[][] = [
    ["s + 1", "K*s + 2"],
    ["tau*s + 1", "s + a", "s + a"],
    ["0.5*s + 0.75", "s - 1"],
    ["K", "s^2 + 2*s + 1", "s + 1"],
    ["s^2 + a*s + K", "tau*s - 1/3"],
  ];
  it.each(table.map((f) => [f.join(" · "), f] as const))("%s", (_, factors) => {
    const ours = polyToText(factors.map(polyOfText).reduce(polyMul));
    expect(nEqual(ours, nExpand(factors.map((f) => `(${f})`).join("*"))), ours).toBe(true);
  });

  it("50 random products of small polynomials in s, K, a, tau", () => {
    fc.assert(
      fc.property(polyExpr(true), polyExpr(true), (p, q) => {
        const ours = polyToText(polyMul(polyOfTree(p), polyOfTree(q)));
        expect(nEqual(ours, nExpand(`${exprNerdamer(p)}*${exprNerdamer(q)}`)), ours).toBe(true);
      }),
      { numRuns: 50 },
    );
  });
});

describe("ratReduceTracked and polyGcd against nerdamer's gcd and div (reference: nerdamer 1.1.13 (in-process CAS))", () => {
  const table: [num: string, den: string][] = [
    ["s^2 - 1", "s^2 + s"],
    ["s^3 + 3*s^2 + 3*s + 1", "s^2 + 3*s + 2"],
    ["2*s^2 - 2", "4*s + 4"],
    ["0.5*s^2 + 0.5*s", "s^2 - 1"],
    ["(s + 2)^2*(s - 1)", "(s + 2)*(s^2 + 1)"],
    ["(s^2 + s + 1)*(2*s - 3)", "(s^2 + s + 1)*(s + 5)"],
    ["s + 3", "s^2 + 2*s + 5"],
    ["(tau*s + 1)*(s + 1)", "(tau*s + 1)*(s + 2)"],
    ["K*(s + 1)", "K*(s + 2)"],
  ];
  it.each(table)("(%s)/(%s)", (num, den) => {
    const ours = ourLowestTerms(polyOfText(num), polyOfText(den));
    expectSameLowestTerms(ours, nCancel(nExpand(num), nExpand(den)), `${ours.num} / ${ours.den}`);
  });

  it("50 random (p·g)/(q·g) with numeric coefficients: lowest terms, gcd and cancelled factors", () => {
    fc.assert(
      fc.property(polyExpr(false), polyExpr(false), polyExpr(false, 2), (p, q, g) => {
        const [num, den] = [polyMul(polyOfTree(p), polyOfTree(g)), polyMul(polyOfTree(q), polyOfTree(g))];
        fc.pre(!polyIsZero(den));
        const [refNum, refDen] = [p, q].map((x) => nExpand(`${exprNerdamer(x)}*${exprNerdamer(g)}`));
        const ctx = `(${polyToText(num)})/(${polyToText(den)})`;
        expectSameLowestTerms(ourLowestTerms(num, den), nCancel(refNum, refDen), ctx);
        const refGcd = nGcd(refNum, refDen);
        expect(nAssociates(refGcd, polyToText(polyGcd(num, den))), `gcd differs: ${ctx}`).toBe(true);
        const cancelled = ratReduceTracked(num, den).cancelled.map((f) => `(${polyToText(f)})`).join("*") || "1";
        expect(nAssociates(refGcd, cancelled), `cancelled factors differ from the gcd: ${ctx}`).toBe(true);
      }),
      { numRuns: 50 },
    );
  });
});
