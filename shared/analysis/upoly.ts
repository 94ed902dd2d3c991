// Dense univariate polynomials over Q: the analysis divides with remainder, takes gcds, Sturm sequences and
// Taylor shifts on numeric (parameter-free) polynomials, which the multivariate Poly type does not offer.
import { polyFromZ, polyGcd, polyParams, type Poly } from "@shared/algebra/poly";
import { polyToLatex, polyToText } from "@shared/algebra/polytext";
import { bigGcd, q, qAdd, qDiv, qMul, qNeg, qOne, qSub, qToNumber, qZero, type Q } from "@shared/algebra/rational";
import { S, zCoeffsS, zMake } from "@shared/algebra/zpoly";

/** ASCENDING exact coefficients without trailing zeros; the zero polynomial is []. Build with upFrom. */
export type UPoly = readonly Q[] & { readonly __ascending: true };

/** Canonical form of an ascending coefficient list. Example: upFrom([q(1), q(0)]) is the constant 1. */
export function upFrom(asc: readonly Q[]): UPoly {
  let n = asc.length;
  while (n > 0 && asc[n - 1].n === 0n) n--;
  return asc.slice(0, n) as unknown as UPoly;
}

/** Ascending from small integers, for tests and examples. Example: upInts([1, 0, 1]) is s^2 + 1. */
export const upInts = (asc: readonly number[]): UPoly => upFrom(asc.map((x) => q(x)));

/** A parameter-free Poly as a UPoly; throws for a polynomial with parameters. Example: upFromPoly(s + 1/2). */
export function upFromPoly(p: Poly): UPoly {
  if (polyParams(p).length) throw new Error(`internal: expected a numeric polynomial, got ${polyToText(p)}`);
  if (p.q.n === 0n) return upFrom([]);
  return upFrom(zCoeffsS(p.z).map((c) => qMul(p.q, q(c as bigint))));
}

/** Back to the shared Poly type. Example: upToPoly(upInts([1, 1])) is s + 1. */
export function upToPoly(u: UPoly): Poly {
  if (!u.length) return polyFromZ(qOne, 0n);
  const l = u.reduce((acc, c) => (acc * c.d) / bigGcd(acc, c.d), 1n); // common denominator
  return polyFromZ(q(1n, l), zMake(S, u.map((c) => (c.n * l) / c.d)));
}

/** Plain text in variable v. Example: upText(upInts([-2, 0, 1]), "K") === "K^2 - 2". */
export const upText = (u: UPoly, v = "s"): string => polyToText(upToPoly(u)).replace(/\bs\b/g, v);

/** LaTeX in variable v. Example: upLatex(upInts([0, 1]), "\\omega") === "\\omega". */
export const upLatex = (u: UPoly, v = "s"): string => polyToLatex(upToPoly(u)).replace(/\bs\b/g, v);

export const upDeg = (u: UPoly): number => u.length - 1;
export const upLead = (u: UPoly): Q => u[u.length - 1] ?? qZero;

function zip(a: UPoly, b: UPoly, f: (x: Q, y: Q) => Q): UPoly {
  const out: Q[] = [];
  for (let i = 0; i < Math.max(a.length, b.length); i++) out.push(f(a[i] ?? qZero, b[i] ?? qZero));
  return upFrom(out);
}

/** Sum. Example: upAdd(s, 1) is s + 1. */
export const upAdd = (a: UPoly, b: UPoly): UPoly => zip(a, b, qAdd);
/** Difference. Example: upSub(s, s) is 0. */
export const upSub = (a: UPoly, b: UPoly): UPoly => zip(a, b, qSub);
/** Times a rational. Example: upScale(s, 1/2) is s/2. */
export const upScale = (a: UPoly, c: Q): UPoly => upFrom(a.map((x) => qMul(x, c)));

/** Product. Example: upMul(s + 1, s - 1) is s^2 - 1. */
export function upMul(a: UPoly, b: UPoly): UPoly {
  if (!a.length || !b.length) return upFrom([]);
  const out: Q[] = new Array(a.length + b.length - 1).fill(qZero);
  a.forEach((x, i) => {
    if (x.n !== 0n) b.forEach((y, j) => (out[i + j] = qAdd(out[i + j], qMul(x, y))));
  });
  return upFrom(out);
}


/** Quotient and remainder; throws for b = 0. Example: upDivMod(s^2 + 1, s + 1) is { quo: s - 1, rem: 2 }. */
export function upDivMod(a: UPoly, b: UPoly): { quo: UPoly; rem: UPoly } {
  if (!b.length) throw new RangeError("upDivMod: division by the zero polynomial");
  const r = a.slice();
  const db = b.length - 1;
  const quo: Q[] = new Array(Math.max(0, a.length - db)).fill(qZero);
  for (let k = a.length - 1 - db; k >= 0; k--) {
    const t = qDiv(r[k + db], b[db]);
    quo[k] = t;
    if (t.n !== 0n) for (let j = 0; j <= db; j++) r[k + j] = qSub(r[k + j], qMul(t, b[j]));
  }
  return { quo: upFrom(quo), rem: upFrom(r.slice(0, db)) };
}

/** Monic multiple (zero stays zero). Example: upMonic(2s + 1) is s + 1/2. */
export const upMonic = (a: UPoly): UPoly => (a.length ? upScale(a, qDiv(qOne, upLead(a))) : a);

/** Monic greatest common divisor (the reducer's modular gcd). Example: upGcd(s^2 - 1, s^2 + 2s + 1) is s + 1. */
export function upGcd(a: UPoly, b: UPoly): UPoly {
  if (!a.length) return upMonic(b);
  if (!b.length) return upMonic(a);
  return upFromPoly(polyGcd(upToPoly(a), upToPoly(b)));
}

/** Derivative. Example: upDeriv(s^3) is 3s^2. */
export const upDeriv = (a: UPoly): UPoly => upFrom(a.slice(1).map((x, i) => qMul(x, q(i + 1))));

/** Exact value at a rational point (Horner). Example: upEval(s^2 + 1, 2) is 5. */
export function upEval(a: UPoly, x: Q): Q {
  let acc = qZero;
  for (let i = a.length - 1; i >= 0; i--) acc = qAdd(qMul(acc, x), a[i]);
  return acc;
}

/** Float value at a real point (Horner). Example: upEvalFloat(s^2 + 1, 2) === 5. */
export function upEvalFloat(a: UPoly, x: number): number {
  let acc = 0;
  for (let i = a.length - 1; i >= 0; i--) acc = acc * x + qToNumber(a[i]);
  return acc;
}

/** Float coefficients, DESCENDING (the order polyRoots takes). Example: upFloatsDesc(s + 1/2) is [1, 0.5]. */
export const upFloatsDesc = (a: UPoly): number[] => a.map(qToNumber).reverse();

/** p(−s). Example: upNegVar(s + 1) is −s + 1. */
export const upNegVar = (a: UPoly): UPoly => upFrom(a.map((x, i) => (i % 2 ? qNeg(x) : x)));

/** p(jω) = re(ω) + j·im(ω), both real polynomials in ω. Example: upOnAxis(s + 1) is { re: 1, im: ω }. */
export function upOnAxis(a: UPoly): { re: UPoly; im: UPoly } {
  const re: Q[] = [];
  const im: Q[] = [];
  a.forEach((x, k) => {
    const signed = k % 4 >= 2 ? qNeg(x) : x; // j^k = 1, j, −1, −j
    (k % 2 ? im : re)[k] = signed;
  });
  const fill = (c: Q[]) => upFrom(Array.from({ length: c.length }, (_, i) => c[i] ?? qZero));
  return { re: fill(re), im: fill(im) };
}

/** Keeps the even-power coefficients of an even polynomial as a polynomial in x = ω². Example: ω^4 + 1 → x^2 + 1. */
export const upEvenToX = (a: UPoly): UPoly => upFrom(a.filter((_, i) => i % 2 === 0));

/** |p(jω)|² as a polynomial in x = ω² (exact). Example: upMagnitudeSquared(s + 1) is x + 1. */
export function upMagnitudeSquared(a: UPoly): UPoly {
  const { re, im } = upOnAxis(a);
  return upEvenToX(upAdd(upMul(re, re), upMul(im, im)));
}

/** Multiplicity of the root s = 0. Example: upZeroOrder(s^3 + s^2) === 2. */
export const upZeroOrder = (a: UPoly): number => {
  let k = 0;
  while (k < a.length && a[k].n === 0n) k++;
  return k;
};
