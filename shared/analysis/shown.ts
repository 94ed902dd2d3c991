// Numbers of a closed-form response as they are printed: exact a + b·√r, or a float to 12 significant digits.
import { q, qAdd, qIsZero, qMul, qNeg, qSub, qToString, type Q } from "@shared/algebra/rational";
import { sqrtRational, surdLatex, surdText, surdToNumber } from "@shared/analysis/surd";
import { upDeg, type UPoly } from "@shared/analysis/upoly";

/** a + b·√rad (rad a square-free integer ≥ 1; b = 0 for a rational), or a float. */
export type Shown = { readonly a: Q; readonly b: Q; readonly rad: bigint } | number;

/** An exact rational. Example: shownQ(q(1, 2)) prints "1/2". */
export const shownQ = (a: Q): Shown => ({ a, b: q(0), rad: 1n });

/** Value as a double. Example: shownValue({ a: 0, b: 1/2, rad: 3 }) ≈ 0.866. */
export const shownValue = (x: Shown): number =>
  typeof x === "number" ? x : surdToNumber(x.a, x.b, x.rad);

/** Negation. Example: shownNeg(shownQ(q(1))) prints "-1". */
export const shownNeg = (x: Shown): Shown => (typeof x === "number" ? -x : { a: qNeg(x.a), b: qNeg(x.b), rad: x.rad });

const isExactZero = (x: Shown) => typeof x !== "number" && qIsZero(x.a) && qIsZero(x.b);

/** One product term, so it needs no parentheses after a sign or before a factor. */
export const shownAtomic = (x: Shown): boolean => typeof x === "number" || qIsZero(x.a) || qIsZero(x.b) || x.rad === 1n;

/** 12 significant digits, no trailing zeros. Example: floatText(1/3) === "0.333333333333". */
export const floatText = (x: number): string => String(Number(x.toPrecision(12)));

function floatLatex(x: number): string {
  const [m, e] = floatText(x).split("e");
  return e === undefined ? m : `${m} \\cdot 10^{${Number(e)}}`;
}

/** Plain text. Example: shownText({ a: 1, b: -1, rad: 2 }) === "1 - sqrt(2)". */
export function shownText(x: Shown): string {
  if (typeof x === "number") return floatText(x);
  if (qIsZero(x.b) || x.rad === 1n) return qToString(x.rad === 1n ? qAdd(x.a, x.b) : x.a);
  const s = surdText(x.b, x.rad);
  if (qIsZero(x.a)) return s;
  return `${qToString(x.a)} ${s.startsWith("-") ? `- ${s.slice(1)}` : `+ ${s}`}`;
}

/** LaTeX. Example: shownLatex({ a: 0, b: 1/2, rad: 3 }) === "\\frac{\\sqrt{3}}{2}". */
export function shownLatex(x: Shown): string {
  if (typeof x === "number") return floatLatex(x);
  const rational = (r: Q) => (r.d === 1n ? r.n.toString() : `${r.n < 0n ? "-" : ""}\\frac{${r.n < 0n ? -r.n : r.n}}{${r.d}}`);
  if (qIsZero(x.b) || x.rad === 1n) return rational(x.rad === 1n ? qAdd(x.a, x.b) : x.a);
  const s = surdLatex(x.b, x.rad);
  if (qIsZero(x.a)) return s;
  return `${rational(x.a)} ${s.startsWith("-") ? `- ${s.slice(1)}` : `+ ${s}`}`;
}

/** True for an exact or float zero. Example: shownIsZero(0) === true. */
export const shownIsZero = (x: Shown): boolean => (typeof x === "number" ? x === 0 : isExactZero(x));

/** The rational a Shown denotes, or null for a surd or a float. Example: shownRational(shownQ(q(2))) is 2. */
export const shownRational = (x: Shown): Q | null =>
  typeof x === "number" ? null : qIsZero(x.b) ? x.a : x.rad === 1n ? qAdd(x.a, x.b) : null;

/**
 * The real roots of a MONIC polynomial of degree ≤ 2, exact and ascending (rational or quadratic surd);
 * null above degree 2. Example: shownRealRoots(s^2 + 2s − 2) prints ["-1 - sqrt(3)", "-1 + sqrt(3)"].
 */
export function shownRealRoots(f: UPoly): Shown[] | null {
  if (upDeg(f) === 1) return [shownQ(qNeg(f[0]))];
  if (upDeg(f) !== 2) return null;
  const disc = qSub(qMul(f[1], f[1]), qMul(q(4), f[0]));
  if (disc.n < 0n) return [];
  const { coef, rad } = sqrtRational(disc);
  const mid = qMul(qNeg(f[1]), q(1, 2));
  return [-1, 1].map((sign) => {
    const off = qMul(coef, q(sign, 2));
    return rad === 1n ? shownQ(qAdd(mid, off)) : { a: mid, b: off, rad };
  });
}
