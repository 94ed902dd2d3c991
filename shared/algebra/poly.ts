// Own exact polynomial code on BigInt: nerdamer/mathjs are too slow and not exact enough for the reduction hot path.
import { AlgebraError } from "@shared/algebra/errors";
import { q, qInv, qMul, qOne, qToNumber, qZero, type Q } from "@shared/algebra/rational";
import { zGcd, zUnitContent } from "@shared/algebra/zgcd";
import {
  S, zAdd, zCoeffsS, zDeg, zEquals, zLeadNum, zMul, zQuo, zScale, zVarPoly, zVars, type ZPoly,
} from "@shared/algebra/zpoly";

/**
 * A polynomial in s whose coefficients are exact rationals or polynomials in the parameters, stored as q·z:
 * z has integer coefficients, content 1 and a positive leading numeric coefficient, so the pair is unique.
 * Zero is { q: 0, z: 0n }. Build it with the functions below, not by hand.
 * Example: polyFromCoeffs([1, 1/2]) (s + 1/2) is { q: 1/2, z: 2*s + 1 }.
 */
export interface Poly {
  readonly q: Q;
  readonly z: ZPoly;
}

export const polyZero: Poly = { q: qZero, z: 0n };

/** Normalised q·z for any integer polynomial z. Example: polyFromZ(q(1), 4*s + 2) is 2·(2*s + 1). */
export function polyFromZ(k: Q, z: ZPoly): Poly {
  if (z === 0n || k.n === 0n) return polyZero;
  const u = zUnitContent(z);
  return { q: qMul(k, q(u)), z: zQuo(z, u) };
}

/** A constant. Example: polyConst(q(3, 2)) is 3/2. */
export const polyConst = (c: Q): Poly => polyFromZ(c, 1n);

/** The polynomial s. Example: polyToText(polyS()) === "s". */
export const polyS = (): Poly => ({ q: qOne, z: zVarPoly(S) });

/** A parameter as a polynomial. Example: polyParam("K") is K. */
export const polyParam = (name: string): Poly => ({ q: qOne, z: zVarPoly(name) });

/** From exact numeric coefficients, DESCENDING powers of s. Example: polyFromCoeffs([q(1), q(0), q(-1)]) is s^2 - 1. */
export function polyFromCoeffs(desc: readonly Q[]): Poly {
  return desc.reduce<Poly>((acc, c) => polyAdd(polyMul(acc, polyS()), polyConst(c)), polyZero);
}

/** Sum. Example: polyAdd(s, 1) is s + 1. */
export function polyAdd(a: Poly, b: Poly): Poly {
  if (a.q.n === 0n) return b;
  if (b.q.n === 0n) return a;
  const z = zAdd(zScale(a.z, a.q.n * b.q.d), zScale(b.z, b.q.n * a.q.d));
  return polyFromZ(q(1n, a.q.d * b.q.d), z);
}

/** Negation. Example: polyNeg(s) is -s. */
export const polyNeg = (a: Poly): Poly => ({ q: { n: -a.q.n, d: a.q.d }, z: a.z });

/** Difference. Example: polySub(s, s) is 0. */
export const polySub = (a: Poly, b: Poly): Poly => polyAdd(a, polyNeg(b));

/** Product; primitive times primitive stays primitive, so no renormalisation. Example: polyMul(s + 1, s - 1) is s^2 - 1. */
export function polyMul(a: Poly, b: Poly): Poly {
  if (a.q.n === 0n || b.q.n === 0n) return polyZero;
  return { q: qMul(a.q, b.q), z: zMul(a.z, b.z) };
}

/** Times a rational. Example: polyScale(s, q(1, 2)) is 1/2*s. */
export const polyScale = (a: Poly, c: Q): Poly => (c.n === 0n ? polyZero : { q: qMul(a.q, c), z: a.z });

/**
 * Scaled so the leading term (highest power of s, then parameters in order) has coefficient 1 — the canonical
 * form of denominators and reported factors. Example: polyMonic(2*s + 1) is s + 1/2.
 */
export const polyMonic = (a: Poly): Poly => (a.q.n === 0n ? a : { q: qInv(q(zLeadNum(a.z))), z: a.z });

/** Greatest common divisor over Q[params, s], in the polyMonic form. Example: polyGcd(s^2 - 1, 2*s + 2) is s + 1. */
export function polyGcd(a: Poly, b: Poly): Poly {
  if (a.q.n === 0n && b.q.n === 0n) return polyZero;
  return polyMonic({ q: qOne, z: zGcd(a.z, b.z) });
}

/** Degree in s; -1 for the zero polynomial. Example: polyDegree(K*s^2 + 1) === 2. */
export const polyDegree = (a: Poly): number => (a.q.n === 0n ? -1 : zDeg(a.z, S));

export const polyIsZero = (a: Poly): boolean => a.q.n === 0n;

/** Exact equality. Example: polyEquals(polyAdd(s, s), polyMul(2, s)) === true. */
export const polyEquals = (a: Poly, b: Poly): boolean =>
  a.q.n === b.q.n && a.q.d === b.q.d && zEquals(a.z, b.z);

/** Leading coefficient in s (a number or a polynomial in the parameters). Example: polyLeading(2*K*s + 1) is 2*K. */
export function polyLeading(a: Poly): Poly {
  const c = zCoeffsS(a.z);
  return polyFromZ(a.q, c[c.length - 1]);
}

/** Coefficients in s, ASCENDING, each a polynomial in the parameters. Example: polyCoeffsS(2*s + K) is [K, 2]. */
export const polyCoeffsS = (a: Poly): Poly[] =>
  a.q.n === 0n ? [] : zCoeffsS(a.z).map((c) => polyFromZ(a.q, c));

/**
 * lim s→∞ of num/den for generic parameter values (den non-zero).
 * Example: polyAtInfinityRatio(s, s^2 + 1) === "zero".
 */
export function polyAtInfinityRatio(num: Poly, den: Poly): "zero" | "finite-nonzero" | "infinite" {
  if (den.q.n === 0n) throw new AlgebraError("division-by-zero", "The denominator polynomial is identically zero.");
  const dn = polyDegree(num);
  const dd = polyDegree(den);
  return dn < dd ? "zero" : dn === dd ? "finite-nonzero" : "infinite";
}

/** Names of the parameters that occur, sorted. Example: polyParams(K*tau*s) is ["K", "tau"]. */
export function polyParams(a: Poly): string[] {
  const vars = zVars(a.z);
  vars.delete(S);
  return [...vars].sort();
}

/**
 * Numeric coefficients, DESCENDING powers of s, at the given parameter values; zero gives [0].
 * Throws AlgebraError "missing-parameter" naming a parameter without a value.
 * Example: polyEvaluateAt(K*s + 1, { K: 2 }) is [2, 1].
 */
export function polyEvaluateAt(a: Poly, params: Readonly<Record<string, number>>): number[] {
  if (a.q.n === 0n) return [0];
  const value = (z: ZPoly): number => {
    if (typeof z === "bigint") return qToNumber(qMul(a.q, q(z)));
    const x = params[z.v];
    if (typeof x !== "number") {
      throw new AlgebraError("missing-parameter", `No value for parameter "${z.v}": give it a nominal value.`, z.v);
    }
    let acc = 0;
    for (let i = z.c.length - 1; i >= 0; i--) acc = acc * x + value(z.c[i]);
    return acc;
  };
  return zCoeffsS(a.z).map(value).reverse();
}
