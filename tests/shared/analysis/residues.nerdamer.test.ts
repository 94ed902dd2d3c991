import { describe, expect, it } from "vitest";
import { q, qMul, qNeg, qSub, qToString } from "@shared/algebra/rational";
import { ratDenominator, ratNumerator } from "@shared/algebra/ratfn";
import { exactFactors, type Factor } from "@shared/analysis/factors";
import { parseTransfer } from "../../support/parseTransfer";
import { poleCoefficients } from "@shared/analysis/residues";
import { sqrtRational, surdField } from "@shared/analysis/surd";
import { upDeg, upDivMod, upFromPoly, upText, type UPoly } from "@shared/analysis/upoly";
import { nEqualFraction, nPartialFractions, type Fraction } from "../../support/nerdamer";

// Reference: nerdamer 1.1.13 (in-process CAS), partfrac over Q, compared term by term by meaning. Its partfrac
// returns a wrong value when a quadratic factor has fractional coefficients beside a fractional pole (it gives
// (s - 2)/D for (s + 2)/D with D = (s + 1/2)(s^2 + s/2 + 1)), so these cases keep to integer quadratics.

/** Our partial fractions of a linear factor: A_j/(s − ρ)^j. */
function linearTerms(rem: UPoly, cofactor: UPoly, f: Factor): Fraction[] {
  const F = surdField(-1n);
  const rho = F.fromQ(qNeg(f.poly[0]));
  return poleCoefficients(F, rem, cofactor, rho, [rho], 0, f.multiplicity)
    .map((a, i) => ({ num: qToString(a.a), den: `(${upText(f.poly)})^${i + 1}` }))
    .filter((t) => t.num !== "0");
}

/** Our terms of an irreducible quadratic at ρ, ρ̄ merged into the real (a·s + b)/f that partfrac writes. */
function quadraticTerm(rem: UPoly, cofactor: UPoly, f: Factor): Fraction {
  if (f.multiplicity !== 1) throw new Error("a repeated quadratic factor is outside these cases");
  const disc = qSub(qMul(f.poly[1], f.poly[1]), qMul(q(4), f.poly[0])); // b² − 4c of s² + b·s + c
  const { coef, rad } = sqrtRational(disc.n < 0n ? qNeg(disc) : disc);
  const F = surdField(disc.n < 0n ? -rad : rad);
  const rho = { a: qMul(f.poly[1], q(-1, 2)), b: qMul(coef, q(1, 2)) };
  const conj = { a: rho.a, b: qNeg(rho.b) };
  const [A] = poleCoefficients(F, rem, cofactor, rho, [rho, conj], 0, 1);
  // A/(s − ρ) + Ā/(s − ρ̄) = (2·Re A·s − 2·Re(A·ρ̄))/f
  const [a, b] = [qMul(q(2), A.a), qMul(q(-2), F.mul(A, conj).a)];
  return { num: `(${qToString(a)})*s+(${qToString(b)})`, den: upText(f.poly) };
}

function ourPartialFractions(num: UPoly, den: UPoly): Fraction[] {
  const { quo, rem } = upDivMod(num, den);
  const terms: Fraction[] = quo.length ? [{ num: upText(quo), den: "1" }] : [];
  for (const f of exactFactors(den)) {
    let cofactor = den;
    for (let i = 0; i < f.multiplicity; i++) cofactor = upDivMod(cofactor, f.poly).quo;
    terms.push(...(upDeg(f.poly) === 1 ? linearTerms(rem, cofactor, f) : [quadraticTerm(rem, cofactor, f)]));
  }
  return terms;
}

describe("poleCoefficients against nerdamer's partfrac (reference: nerdamer 1.1.13 (in-process CAS))", () => {
  const table: [num: string, den: string][] = [
    ["1", "(s + 1)*(s + 2)"],
    ["s + 3", "s*(s + 1)^2"],
    ["1", "s^2*(s + 2)"],
    ["s^3", "(s + 1)*(s + 2)"],
    ["1", "(0.5*s + 1)*(s + 3)"],
    ["1", "s*(s^2 + 2*s + 5)"],
    ["3*s + 2", "(s + 1)*(s^2 + 2*s + 5)"],
    ["1", "s^2 + 3*s + 1"],
  ];
  it.each(table)("(%s)/(%s)", (n, d) => {
    const r = parseTransfer(n, d, []);
    const ours = ourPartialFractions(upFromPoly(ratNumerator(r)), upFromPoly(ratDenominator(r)));
    const unmatched = [...ours];
    for (const t of nPartialFractions(n, d)) {
      const at = unmatched.findIndex((o) => nEqualFraction(o, t));
      expect(at, `nerdamer's term (${t.num})/(${t.den}) is not among ours: ${JSON.stringify(ours)}`).toBeGreaterThanOrEqual(0);
      unmatched.splice(at, 1);
    }
    expect(unmatched, "our terms nerdamer does not have").toEqual([]);
  });
});
