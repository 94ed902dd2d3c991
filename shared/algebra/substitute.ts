// Substituting one variable of the exact algebra by a rational function (a dead time's Padé approximant, or 0
// for e^(−sT) as s → ∞), without leaving the integer-polynomial representation.
import { polyAdd, polyConst, polyFromZ, polyMul, polyZero, type Poly } from "@shared/algebra/poly";
import { qOne } from "@shared/algebra/rational";
import { ratDenominator, ratNumerator, ratReduceTracked, type RatFn } from "@shared/algebra/ratfn";
import { zAdd, zMul, zPow, zVarPoly, type ZPoly } from "@shared/algebra/zpoly";

/**
 * Coefficients of a polynomial in one of its variables, ascending; each is free of that variable.
 * Example: zCoeffsIn(K*s + K^2 + 1, "K") is [1, s, 1].
 */
export function zCoeffsIn(a: ZPoly, v: string): ZPoly[] {
  if (typeof a === "bigint") return [a];
  if (a.v === v) return [...a.c];
  // v sits inside the coefficients: collect each power of v across them, keeping the outer variable a.v.
  const parts = a.c.map((c) => zCoeffsIn(c, v));
  const out: ZPoly[] = [];
  const outer = zVarPoly(a.v);
  parts.forEach((coeffs, i) =>
    coeffs.forEach((c, k) => {
      out[k] = zAdd(out[k] ?? 0n, zMul(c, zPow(outer, i)));
    }),
  );
  return out.map((c) => c ?? 0n);
}

/** The polynomial at v = 0. Example: polyAtZero(K*E + 1, "E") is 1. */
export function polyAtZero(p: Poly, v: string): Poly {
  return polyFromZ(p.q, zCoeffsIn(p.z, v)[0]);
}

/** A rational function with variable v set to 0 (v must not divide its denominator). Example: (1 + K·E)/s at E = 0 is 1/s. */
export function ratAtZero(r: RatFn, v: string): RatFn {
  return ratReduceTracked(polyAtZero(ratNumerator(r), v), polyAtZero(ratDenominator(r), v)).value;
}

/**
 * p(v = P/Q) multiplied by Q^d, d = the degree of p in v: a polynomial again.
 * Example: polyHomogenized(E^2 + 1, "E", 1 - s, 1 + s) is (1 - s)^2 + (1 + s)^2.
 */
export function polyHomogenized(p: Poly, v: string, P: Poly, Q: Poly): { value: Poly; degree: number } {
  const coeffs = zCoeffsIn(p.z, v);
  const d = coeffs.length - 1;
  let acc = polyZero;
  let pPow = polyConst(qOne);
  const qPows: Poly[] = [polyConst(qOne)];
  for (let k = 1; k <= d; k++) qPows.push(polyMul(qPows[k - 1], Q));
  for (let k = 0; k <= d; k++) {
    if (coeffs[k] !== 0n) acc = polyAdd(acc, polyMul(polyMul(polyFromZ(p.q, coeffs[k]), pPow), qPows[d - k]));
    pPow = polyMul(pPow, P);
  }
  return { value: acc, degree: d };
}

/**
 * A rational function with variable v replaced by P/Q, in lowest terms.
 * Example: ratSubstitute(K·E/(1 + K·E), "E", 1 − s, 1 + s) is K(1 − s)/((1 + s) + K(1 − s)).
 */
export function ratSubstitute(r: RatFn, v: string, P: Poly, Q: Poly): RatFn {
  const num = polyHomogenized(ratNumerator(r), v, P, Q);
  const den = polyHomogenized(ratDenominator(r), v, P, Q);
  const qPow = (e: number): Poly => Array.from({ length: e }, () => Q).reduce(polyMul, polyConst(qOne));
  // n(P/Q)/d(P/Q) = n̂·Q^(dd − dn) / d̂ with n̂ = n(P/Q)·Q^dn, d̂ = d(P/Q)·Q^dd.
  const shift = den.degree - num.degree;
  return ratReduceTracked(polyMul(num.value, qPow(Math.max(0, shift))), polyMul(den.value, qPow(Math.max(0, -shift)))).value;
}
