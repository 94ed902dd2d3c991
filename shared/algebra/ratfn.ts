// Own exact rational functions on BigInt: nerdamer/mathjs are too slow and not exact enough for the reduction hot path.
import { AlgebraError, DEGREE_LIMIT } from "@shared/algebra/errors";
import type { Field } from "@shared/algebra/field";
import { checkPowerSize, checkProductSize } from "@shared/algebra/sizeLimits";
import { zSplitFactors } from "@shared/algebra/factor";
import { polyFromZ, polyMonic, polyZero, type Poly } from "@shared/algebra/poly";
import { polyToLatex, polyToText, polyToTextAndLatex } from "@shared/algebra/polytext";
import { q, qDiv, qEquals, qInv, qIsOne, qMul, qOne, qPow, qZero, type Q } from "@shared/algebra/rational";
import { zGcd, zGcdSplit, zUnitContent, type GcdSplit } from "@shared/algebra/zgcd";
import {
  S, zAdd, zDeg, zEquals, zLeadNum, zMul, zOnlyS, zPow, zQuo, zScale, zVarPoly, zVars, type ZPoly,
} from "@shared/algebra/zpoly";
import type { ExprNode } from "@shared/expr/ast";

/**
 * An exact rational function of s (coefficients rational or polynomial in the parameters), always in lowest terms:
 * value k·n/d with n, d integer polynomials that are coprime in Z[params, s] (so no common factor in s for generic
 * parameter values, and no common parameter factor either), each with content 1 and a positive leading numeric
 * coefficient. That makes the triple unique: equal values are structurally equal and print identically.
 * Zero is k = 0, n = d = 1. Printed, the denominator is scaled so its leading term (highest power of s, then
 * parameters alphabetically) has coefficient 1 — monic whenever its leading coefficient in s is a number.
 * Example: "K*(s+2)/(2*s)" is stored as k = 1/2, n = K*s + 2*K, d = s and prints as (1/2*K*s + K)/s.
 */
export interface RatFn {
  readonly k: Q;
  readonly n: ZPoly;
  readonly d: ZPoly;
}

export const ratZero: RatFn = { k: qZero, n: 1n, d: 1n };
export const ratOne: RatFn = { k: qOne, n: 1n, d: 1n };

/** A constant. Example: ratConst(q(1, 2)) is 1/2. */
export const ratConst = (c: Q): RatFn => (c.n === 0n ? ratZero : { k: c, n: 1n, d: 1n });

function refuseDegree(degree: number): void {
  if (degree > DEGREE_LIMIT) {
    throw new AlgebraError(
      "degree-limit",
      `The result would have degree ${degree} in s; the limit is ${DEGREE_LIMIT}. Simplify the diagram.`,
    );
  }
}

/** Builds k·n/d from coprime integer polynomials, moving their contents and signs into k. */
function normalised(k: Q, n: ZPoly, d: ZPoly): RatFn {
  if (n === 0n || k.n === 0n) return ratZero;
  refuseDegree(Math.max(zDeg(n, S), zDeg(d, S)));
  const un = zUnitContent(n);
  const ud = zUnitContent(d);
  return { k: qMul(k, q(un, ud)), n: zQuo(n, un), d: zQuo(d, ud) };
}

/** Sum (Henrici: only the gcd of the denominators can cancel). Example: ratAdd(1/s, 1/s) is 2/s. */
export function ratAdd(a: RatFn, b: RatFn): RatFn {
  if (a.k.n === 0n) return b;
  if (b.k.n === 0n) return a;
  const x1 = a.k.n * b.k.d;
  const x2 = b.k.n * a.k.d;
  const k = q(1n, a.k.d * b.k.d);
  const { g, ca: da, cb: db } = split(a.d, b.d);
  const t = zAdd(zScale(zMul(a.n, db), x1), zScale(zMul(b.n, da), x2));
  if (t === 0n) return ratZero;
  if (g === 1n) return normalised(k, t, zMul(a.d, b.d));
  // b.d / gcd(t, g) = db · (g / gcd(t, g)): a product of known cofactors, not a division.
  const { ca: n, cb: rest } = zGcdSplit(t, g);
  return normalised(k, n, zMul(zMul(da, db), rest));
}

/** gcd with cofactors, without a gcd where one side is 1 or both are equal (common in loops). */
const split = (x: ZPoly, y: ZPoly): GcdSplit =>
  x === 1n || y === 1n ? { g: 1n, ca: x, cb: y } : zEquals(x, y) ? { g: x, ca: 1n, cb: 1n } : zGcdSplit(x, y);

/** Negation. Example: ratNeg(1/s) is -1/s. */
export const ratNeg = (a: RatFn): RatFn => ({ k: { n: -a.k.n, d: a.k.d }, n: a.n, d: a.d });

/** Difference. Example: ratSub(s, s) is 0. */
export const ratSub = (a: RatFn, b: RatFn): RatFn => ratAdd(a, ratNeg(b));

/** Product, cancelling crosswise first so the pieces stay small. Example: ratMul((s+1)/s, s/(s+1)) is 1. */
export function ratMul(a: RatFn, b: RatFn): RatFn {
  if (a.k.n === 0n || b.k.n === 0n) return ratZero;
  const { ca: n1, cb: d2 } = split(a.n, b.d);
  const { ca: n2, cb: d1 } = split(b.n, a.d);
  refuseDegree(Math.max(zDeg(n1, S) + zDeg(n2, S), zDeg(d1, S) + zDeg(d2, S))); // degrees add: check before multiplying
  // Quotients of primitive, positive-leading polynomials by such gcds keep both properties: no renormalising.
  return { k: qMul(a.k, b.k), n: zMul(n1, n2), d: zMul(d1, d2) };
}

/** Reciprocal; throws AlgebraError "division-by-zero" for 0. Example: ratInv(s/(s+1)) is (s+1)/s. */
export function ratInv(a: RatFn): RatFn {
  if (a.k.n === 0n) throw new AlgebraError("division-by-zero", "Division by a transfer function that is identically 0.");
  return { k: qInv(a.k), n: a.d, d: a.n };
}

/** Quotient; throws AlgebraError "division-by-zero" when b is 0. Example: ratDiv(1, s) is 1/s. */
export const ratDiv = (a: RatFn, b: RatFn): RatFn => ratMul(a, ratInv(b));

/** Non-negative integer power (lowest terms are kept without a gcd). Example: ratPow(1/(s+1), 2) is 1/(s^2 + 2*s + 1). */
export function ratPow(a: RatFn, e: number): RatFn {
  if (e === 0) return ratOne;
  if (a.k.n === 0n) return ratZero;
  for (const v of new Set([...zVars(a.n), ...zVars(a.d)])) {
    const dv = Math.max(zDeg(a.n, v), zDeg(a.d, v)) * e;
    if (dv > DEGREE_LIMIT) {
      throw new AlgebraError("degree-limit", `A power would have degree ${dv} in ${v}; the limit is ${DEGREE_LIMIT}.`, v);
    }
  }
  return { k: qPow(a.k, e), n: zPow(a.n, e), d: zPow(a.d, e) };
}

export const ratIsZero = (a: RatFn): boolean => a.k.n === 0n;
/** True when no parameter occurs. Example: ratOnlyS(1/(s + 1)) === true, ratOnlyS(K/s) === false. */
export const ratOnlyS = (a: RatFn): boolean => zOnlyS(a.n) && zOnlyS(a.d);
export const ratIsOne = (a: RatFn): boolean => qIsOne(a.k) && a.n === 1n && a.d === 1n;
/** Exact equality of values (the representation is canonical). Example: ratEquals(ratAdd(x, x), ratMul(2, x)). */
export const ratEquals = (a: RatFn, b: RatFn): boolean => qEquals(a.k, b.k) && zEquals(a.n, b.n) && zEquals(a.d, b.d);

/** The field the reducer runs on. Example: ratField.add(ratField.one, ratField.one) is 2. */
export const ratField: Field<RatFn> = {
  zero: ratZero,
  one: ratOne,
  add: ratAdd,
  sub: ratSub,
  mul: ratMul,
  div: ratDiv,
  neg: ratNeg,
  isZero: ratIsZero,
  isOne: ratIsOne,
};

/**
 * Exact value of a checked expression tree. Throws AlgebraError "division-by-zero" when a divisor is identically
 * zero, "degree-limit" when a power is too high and "size-limit" when a product or power would grow past the
 * limits of sizeLimits.ts. Example: ratFromExpr(tree of "1/(0.5*s + 1)") is 2/(s + 2).
 */
export function ratFromExpr(ast: ExprNode): RatFn {
  switch (ast.kind) {
    case "num":
      return ratConst(q(ast.num, ast.den));
    case "s":
    case "param":
      return { k: qOne, n: zVarPoly(ast.kind === "s" ? S : ast.name), d: 1n };
    case "add":
      return ratAdd(ratFromExpr(ast.left), ratFromExpr(ast.right));
    case "sub":
      return ratSub(ratFromExpr(ast.left), ratFromExpr(ast.right));
    case "mul": {
      const [a, b] = [ratFromExpr(ast.left), ratFromExpr(ast.right)];
      checkProductSize(a, b);
      return ratMul(a, b);
    }
    case "div": {
      const divisor = ratFromExpr(ast.right);
      if (ratIsZero(divisor)) {
        throw new AlgebraError("division-by-zero", "Division by zero: a divisor in the expression is identically 0.");
      }
      const dividend = ratFromExpr(ast.left);
      checkProductSize(dividend, ratInv(divisor));
      return ratDiv(dividend, divisor);
    }
    case "neg":
      return ratNeg(ratFromExpr(ast.arg));
    case "pow": {
      const base = ratFromExpr(ast.base);
      checkPowerSize(base, ast.exp);
      return ratPow(base, ast.exp);
    }
  }
}

/** Numerator as printed (pairs with ratDenominator). Example: ratNumerator of 1/(2*s + 1) is 1/2. */
export const ratNumerator = (r: RatFn): Poly => (r.k.n === 0n ? polyZero : { q: qMul(r.k, q(1n, zLeadNum(r.d))), z: r.n });

/** Denominator with leading term coefficient 1 (monic when numeric). Example: ratDenominator of 1/(2*s + 1) is s + 1/2. */
export const ratDenominator = (r: RatFn): Poly => polyMonic({ q: qOne, z: r.d });

/** Degrees in s; num is -1 for zero. Example: ratDegrees of (s+1)/s^2 is { num: 1, den: 2 }. */
export const ratDegrees = (r: RatFn): { num: number; den: number } => ({
  num: r.k.n === 0n ? -1 : zDeg(r.n, S),
  den: zDeg(r.d, S),
});

/**
 * num/den in lowest terms, reporting the cancelled common factor (gcd) split into factors where possible
 * (parameter content, square-free parts, rational linear and quadratic factors), each in the polyMonic form and
 * repeated by multiplicity. A zero numerator cancels the whole denominator. Throws "division-by-zero" for den = 0.
 * Example: ratReduceTracked(s^2 - 1, s^2 + s) is { value: (s - 1)/s, cancelled: [s + 1] }.
 */
export function ratReduceTracked(num: Poly, den: Poly): { value: RatFn; cancelled: Poly[] } {
  if (den.q.n === 0n) throw new AlgebraError("division-by-zero", "The denominator polynomial is identically 0.");
  const g = zGcd(num.z, den.z);
  const value = normalised(qDiv(num.q, den.q), zQuo(num.z, g), zQuo(den.z, g));
  return { value, cancelled: zSplitFactors(g).map((f) => polyMonic(polyFromZ(qOne, f))) };
}

const bare = (t: string): boolean => /^[A-Za-z0-9_^]+$/.test(t);
const textOver = (n: string, d: string): string => `${bare(n) ? n : `(${n})`}/${bare(d) ? d : `(${d})`}`;
const latexOver = (n: string, d: string): string => `\\frac{${n}}{${d}}`;

/** Plain text in the expression syntax. Example: ratToText of 1/(s + 1) is "1/(s + 1)". */
export function ratToText(r: RatFn): string {
  const n = polyToText(ratNumerator(r));
  return r.d === 1n ? n : textOver(n, polyToText(ratDenominator(r)));
}

/** LaTeX: \frac{num}{den}, or the numerator alone over 1. Example: "\frac{1}{s + 1}". */
export function ratToLatex(r: RatFn): string {
  const n = polyToLatex(ratNumerator(r));
  return r.d === 1n ? n : latexOver(n, polyToLatex(ratDenominator(r)));
}

/** ratToText and ratToLatex from one pass over each polynomial. Example: ratToTextAndLatex(1/s).latex === "\\frac{1}{s}". */
export function ratToTextAndLatex(r: RatFn): { text: string; latex: string } {
  const n = polyToTextAndLatex(ratNumerator(r));
  if (r.d === 1n) return n;
  const d = polyToTextAndLatex(ratDenominator(r));
  return { text: textOver(n.text, d.text), latex: latexOver(n.latex, d.latex) };
}
