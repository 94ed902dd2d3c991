// The classic landmarks of a root locus, for a closed-loop denominator affine in one parameter:
// χ(s) = A(s) + K·B(s) with the other parameters fixed. Everything is decided on exact polynomials; values
// are printed exactly (rational or quadratic surd) where the roots allow, else as floats.
import { polySubstitute, exactValue } from "@shared/analysis/nominal";
import type { Poly } from "@shared/algebra/poly";
import { q, qDiv, qIsZero, qNeg, qSub, qToNumber, qToString, type Q } from "@shared/algebra/rational";
import { polyRoots } from "@shared/algebra/roots";
import { zDeg } from "@shared/algebra/zpoly";
import { exactFactors } from "@shared/analysis/factors";
import { shownRational, shownRealRoots, shownText, shownValue, type Shown } from "@shared/analysis/shown";
import { realRoots } from "@shared/analysis/sturm";
import { sqrtRational, surdField } from "@shared/analysis/surd";
import {
  upDeg, upDeriv, upEval, upEvalFloat, upEvenToX, upFloatsDesc, upFrom, upFromPoly, upLead, upMul, upOnAxis, upSub, type UPoly,
} from "@shared/analysis/upoly";

/** A value as shown in the landmarks table: exact text where the algebra gives it, else 6 significant digits. */
export interface LocusNumber {
  value: number;
  text: string;
  exact: boolean;
}

export interface Breakaway {
  s: [number, number];
  /** s as text: exact where the algebra gives it (a real point of a factor of degree ≤ 2). */
  text: string;
  exact: boolean;
  gain: LocusNumber;
}

export interface Crossing {
  omega: LocusNumber;
  gain: LocusNumber;
}

export interface LocusGeometry {
  /** Roots of A: the closed-loop poles at K = 0 (the open-loop poles). */
  poles: [number, number][];
  /** Roots of B: where the finite branches end as K → ±∞ (the open-loop zeros). */
  zeros: [number, number][];
  /** (Σp − Σz)/(n − m), exact; null when there are no asymptotes (n ≤ m). */
  centroid: LocusNumber | null;
  /** Asymptote angles in degrees, (−180, 180], for K > 0 and for K < 0. */
  asymptotes: { positive: number[]; negative: number[] };
  /** Points where branches meet or part (K ≠ 0, either sign). */
  breakaways: Breakaway[];
  /** Imaginary-axis crossings, ω > 0 (K ≠ 0, either sign). */
  crossings: Crossing[];
  /** |K| at which the asymptotic branches are about 3× the pole–zero spread out (null without asymptotes). */
  farGain: number | null;
}

/**
 * A and B with χ = A + K·B at the other parameters' values (exact), or null when K enters χ nonlinearly,
 * not at all, or χ(K = 0) vanishes. Example: affineSplit(s^2 + 2s + K, "K", {}) is { A: s^2 + 2s, B: 1 }.
 */
export function affineSplit(den: Poly, name: string, at: Readonly<Record<string, number>>): { A: UPoly; B: UPoly } | null {
  const others = new Map(Object.entries(at).filter(([k]) => k !== name).map(([k, v]) => [k, exactValue(v, k)]));
  const inK = polySubstitute(den, others);
  if (zDeg(inK.z, name) !== 1) return null;
  const A = upFromPoly(polySubstitute(inK, new Map([[name, q(0)]])));
  const B = upSub(upFromPoly(polySubstitute(inK, new Map([[name, q(1)]]))), A);
  return upDeg(A) < 0 ? null : { A, B };
}

const number = (x: Shown): LocusNumber => {
  const exact = typeof x !== "number";
  return { value: shownValue(x), text: exact ? shownText(x) : String(Number(x.toPrecision(6))), exact };
};

/** u(x) / v(x) exactly in Q or Q(√rad) when x is exact, else in doubles; null where v(x) = 0. */
function ratioAt(u: UPoly, v: UPoly, x: Shown): Shown | null {
  if (typeof x === "number") {
    const d = upEvalFloat(v, x);
    return d === 0 ? null : upEvalFloat(u, x) / d;
  }
  const r = shownRational(x);
  if (r) {
    const d = upEval(v, r);
    return qIsZero(d) ? null : { a: qDiv(upEval(u, r), d), b: q(0), rad: 1n };
  }
  const F = surdField(x.rad);
  const at = (p: UPoly) => p.reduceRight((acc, c) => F.add(F.mul(acc, { a: x.a, b: x.b }), F.fromQ(c)), F.zero);
  const d = at(v);
  if (F.isZero(d)) return null;
  const k = F.div(at(u), d);
  return { a: k.a, b: k.b, rad: x.rad };
}

/** Real roots of u, exact per factor of degree ≤ 2, else floats; only those above `above` when given. */
function realRootsShown(u: UPoly, above: Q | null = null): Shown[] {
  if (upDeg(u) < 1) return [];
  return exactFactors(u, "locus polynomial").flatMap(({ poly }) => {
    const exact = shownRealRoots(poly);
    const roots: Shown[] = exact ?? realRoots(poly);
    return above ? roots.filter((x) => shownValue(x) > qToNumber(above)) : roots;
  });
}

/** Sum of the roots of u, −u_{d−1}/u_d (0 for a constant). */
const rootSum = (u: UPoly): Q => (upDeg(u) < 1 ? q(0) : qNeg(qDiv(u[upDeg(u) - 1], upLead(u))));

/** Angles (2k+1)·180/q (odd) or 2k·180/q, in (−180, 180], ascending. */
function angles(count: number, odd: boolean): number[] {
  const out = Array.from({ length: count }, (_, k) => ((odd ? 2 * k + 1 : 2 * k) * 180) / count).map((a) => (a > 180 ? a - 360 : a));
  return out.sort((a, b) => a - b);
}

/** Breakaway / break-in points: roots of A′B − AB′ where K = −A/B is real and non-zero. */
function breakaways(A: UPoly, B: UPoly): Breakaway[] {
  const D = upSub(upMul(upDeriv(A), B), upMul(A, upDeriv(B)));
  if (upDeg(D) < 1) return [];
  const minusA = upFrom(A.map(qNeg));
  const real = realRootsShown(D).flatMap((x): Breakaway[] => {
    const k = ratioAt(minusA, B, x);
    const at = number(x);
    return k === null || shownValue(k) === 0 ? [] : [{ s: [at.value, 0], text: at.text, exact: at.exact, gain: number(k) }];
  });
  // Complex roots of D lie on the locus only where −A/B is real there (a complex breakaway pair).
  const complex = exactFactors(D, "breakaway polynomial").flatMap(({ poly }) =>
    upDeg(poly) < 2 ? [] : polyRoots(upFloatsDesc(poly)).filter(([, im]) => im > 1e-9),
  ).flatMap(([re, im]): Breakaway[] => {
    const k = complexRatio(minusA, B, re, im);
    if (!k || Math.abs(k[1]) > 1e-7 * Math.hypot(...k) || k[0] === 0) return [];
    const gain = number(k[0]);
    const text = (y: number) => `${number(re).text} ${y < 0 ? "-" : "+"} ${number(Math.abs(y)).text}j`;
    return [{ s: [re, im], text: text(im), exact: false, gain }, { s: [re, -im], text: text(-im), exact: false, gain }];
  });
  return [...real, ...complex].sort((a, b) => a.s[0] - b.s[0] || a.s[1] - b.s[1]);
}

/** u(z)/v(z) at z = re + j·im in doubles. */
function complexRatio(u: UPoly, v: UPoly, re: number, im: number): [number, number] | null {
  const at = (p: UPoly): [number, number] =>
    p.reduceRight<[number, number]>(([x, y], c) => [x * re - y * im + qToNumber(c), x * im + y * re], [0, 0]);
  const [a, b] = [at(u), at(v)];
  const m = b[0] * b[0] + b[1] * b[1];
  return m === 0 ? null : [(a[0] * b[0] + a[1] * b[1]) / m, (a[1] * b[0] - a[0] * b[1]) / m];
}

/**
 * ω > 0 and K with A(jω) + K·B(jω) = 0: Re and Im vanish together where Ar·Bi − Ai·Br = 0, an odd polynomial
 * ω·P(ω²); K = −Ar/Br (or −Ai/Bi) is then a rational function of x = ω², exact where x is.
 */
function crossings(A: UPoly, B: UPoly): Crossing[] {
  const [a, b] = [upOnAxis(A), upOnAxis(B)];
  const W = upSub(upMul(a.re, b.im), upMul(a.im, b.re));
  if (upDeg(W) < 1) return [];
  const inX = (u: UPoly) => upEvenToX(u);
  const overOmega = (u: UPoly) => upEvenToX(upFrom(u.slice(1))); // an odd polynomial divided by ω, in x = ω²
  const [ar, br, ai, bi] = [inX(a.re), inX(b.re), overOmega(a.im), overOmega(b.im)];
  return realRootsShown(overOmega(W), q(0)).flatMap((x): Crossing[] => {
    const k = ratioAt(upFrom(ar.map(qNeg)), br, x) ?? ratioAt(upFrom(ai.map(qNeg)), bi, x);
    if (k === null || shownValue(k) === 0) return [];
    return [{ omega: number(sqrtShown(x)), gain: number(k) }];
  }).sort((p, r) => p.omega.value - r.omega.value);
}

/** √x, exact when x is rational. */
function sqrtShown(x: Shown): Shown {
  const r = shownRational(x);
  if (!r) return Math.sqrt(shownValue(x));
  const { coef, rad } = sqrtRational(r);
  return { a: q(0), b: coef, rad };
}

/**
 * The landmarks of the locus of A + K·B. Example: for A = s(s + 1)(s + 2), B = 1: centroid −1, asymptotes
 * −60°, 60°, 180° (K > 0), breakaway −1 + sqrt(3)/3, crossing ω = sqrt(2) at K = 6.
 */
export function locusGeometry(A: UPoly, B: UPoly): LocusGeometry {
  const poles = polyRoots(upFloatsDesc(A));
  const zeros = upDeg(B) >= 1 ? polyRoots(upFloatsDesc(B)) : [];
  const excess = upDeg(A) - upDeg(B);
  const centroid = excess > 0 ? qDiv(qSub(rootSum(A), rootSum(B)), q(excess)) : null;
  // Far out, A/B ≈ (a_n/b_m)·s^excess = −K: the odd angles belong to the sign of K that matches b_m/a_n.
  const sameSign = qToNumber(upLead(A)) * qToNumber(upLead(B)) > 0;
  const asymptotes = excess > 0 ? { positive: angles(excess, sameSign), negative: angles(excess, !sameSign) } : { positive: [], negative: [] };
  const spread = Math.max(1, ...[...poles, ...zeros].map(([re, im]) => Math.hypot(re, im)), centroid ? Math.abs(qToNumber(centroid)) : 0);
  const farGain = excess > 0 ? (3 * spread) ** excess * Math.abs(qToNumber(upLead(A)) / qToNumber(upLead(B))) : null;
  return {
    poles,
    zeros,
    centroid: centroid ? { value: qToNumber(centroid), text: qToString(centroid), exact: true } : null,
    asymptotes,
    breakaways: breakaways(A, B),
    crossings: crossings(A, B),
    farGain,
  };
}
