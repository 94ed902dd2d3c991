import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { zSplitFactors } from "@shared/algebra/factor";
import { polyConst, polyDegree, polyFromCoeffs, polyFromZ, polyIsZero, polyMul, polyParam, polyS, polyAdd, polyMonic, type Poly } from "@shared/algebra/poly";
import { polyToText } from "@shared/algebra/polytext";
import { ratDenominator, ratFromExpr, ratNumerator, ratReduceTracked } from "@shared/algebra/ratfn";
import { q, qOne } from "@shared/algebra/rational";
import { polyExpr } from "./support";

const P = (...desc: number[]) => polyFromCoeffs(desc.map((x) => q(x)));
const split = (p: Poly) => zSplitFactors(p.z).map((f) => polyToText(polyMonic(polyFromZ(qOne, f))));

describe("zSplitFactors", () => {
  it.each<[string, Poly, string[]]>([
    ["2(s + 1)^2 (s^2 + 2)", polyMul(polyMul(P(2), polyMul(P(1, 1), P(1, 1))), P(1, 0, 2)), ["s + 1", "s + 1", "s^2 + 2"]],
    ["(3s − 1)(s + 4)^3 s", polyMul(polyMul(P(3, -1), polyMul(P(1, 4), polyMul(P(1, 4), P(1, 4)))), P(1, 0)), ["s", "s - 1/3", "s + 4", "s + 4", "s + 4"]],
    ["K (s + K)^2", polyMul(polyParam("K"), polyMul(polyAdd(polyS(), polyParam("K")), polyAdd(polyS(), polyParam("K")))), ["K", "s + K", "s + K"]],
    ["s^2 − 3 (irrational roots: one factor)", P(1, 0, -3), ["s^2 - 3"]],
    ["(s^2 + 1)(s^2 + 4): two rational quadratics", polyMul(P(1, 0, 1), P(1, 0, 4)), ["s^2 + 1", "s^2 + 4"]],
    ["7: constants are dropped", polyConst(q(7)), []],
  ])("%s (checked by hand, common practice)", (_label, p, want) => {
    expect(split(p).sort()).toEqual(want.sort());
  });

  it("the factors multiply back to the input up to a constant (fast-check)", () => {
    fc.assert(
      fc.property(polyExpr(true), polyExpr(true, 2), (e, c) => {
        const p = polyMul(polyMul(ratNumerator(ratFromExpr(e)), ratNumerator(ratFromExpr(c))), ratNumerator(ratFromExpr(c)));
        fc.pre(!polyIsZero(p));
        const product = zSplitFactors(p.z).reduce<Poly>((acc, f) => polyMul(acc, polyFromZ(qOne, f)), polyConst(qOne));
        const r = ratReduceTracked(p, product).value;
        expect(polyDegree(ratNumerator(r)) === 0 && polyDegree(ratDenominator(r)) === 0).toBe(true);
      }),
      { numRuns: 200 },
    );
  });
});
