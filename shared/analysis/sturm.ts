// Exact real-root counting (Sturm) so crossovers, axis roots and stability endpoints are never missed or
// invented by a float tolerance; the roots themselves are then located numerically and polished.
import { bigGcd, q, qNeg, qToNumber, type Q } from "@shared/algebra/rational";
import { polyRoots } from "@shared/algebra/roots";
import {
  upDeg, upDeriv, upDivMod, upEval, upEvalFloat, upFloatsDesc, upFrom, upGcd, type UPoly,
} from "@shared/analysis/upoly";

/** A point of the extended real line. */
export type Point = Q | "-inf" | "+inf";

/** Integer coefficients (ascending) of a positive multiple of p. */
function toIntegers(p: UPoly): bigint[] {
  const l = p.reduce((acc, c) => (acc * c.d) / bigGcd(acc, c.d), 1n);
  return p.map((c) => (c.n * l) / c.d);
}

const trimInts = (a: bigint[]): bigint[] => {
  let n = a.length;
  while (n > 0 && a[n - 1] === 0n) n--;
  return a.slice(0, n);
};

const absBig = (x: bigint): bigint => (x < 0n ? -x : x);

/** a divided by the (positive) gcd of its coefficients (smallest first: the gcd shrinks fast, often to 1). */
function primitive(a: bigint[]): bigint[] {
  let g = 0n;
  for (const x of a.map(absBig).sort((x, y) => (x < y ? -1 : x > y ? 1 : 0))) {
    g = bigGcd(g, x);
    if (g === 1n) return a;
  }
  return g > 1n ? a.map((x) => x / g) : a;
}

/** Pseudo-remainder lc(b)^(deg a − deg b + 1)·a mod b, in integers. */
function pseudoRemainder(a: bigint[], b: bigint[]): bigint[] {
  const r = a.slice();
  const db = b.length - 1;
  const lb = b[db];
  for (let k = r.length - 1; k >= db; k--) {
    const top = r[k];
    for (let i = 0; i < r.length; i++) r[i] *= lb;
    if (top !== 0n) for (let j = 0; j <= db; j++) r[k - db + j] -= top * b[j];
  }
  return trimInts(r.slice(0, db));
}

/**
 * The Sturm sequence p, p', −rem, … with each member replaced by a positive multiple (primitive integer
 * pseudo-remainders), which keeps every sign and the numbers small. Example: of s^2 − 1: s^2 − 1, s, 1.
 */
export function sturmSequence(p: UPoly): bigint[][] {
  const seq = [primitive(toIntegers(p)), primitive(toIntegers(upDeriv(p)))];
  while (seq[seq.length - 1].length > 1) {
    const [a, b] = [seq[seq.length - 2], seq[seq.length - 1]];
    const r = pseudoRemainder(a, b);
    if (!r.length) break;
    // prem = lc(b)^(δ+1)·rem; the next member is −rem up to a positive factor
    const flip = b[b.length - 1] < 0n && (a.length - b.length + 1) % 2 === 1 ? 1n : -1n;
    seq.push(primitive(r.map((x) => x * flip)));
  }
  return seq;
}

function signAt(u: bigint[], x: Point): number {
  if (!u.length) return 0;
  const lead = u[u.length - 1] > 0n ? 1 : -1;
  if (x === "+inf") return lead;
  if (x === "-inf") return lead * ((u.length - 1) % 2 ? -1 : 1);
  let acc = 0n; // Σ u_i n^i d^(deg − i): the value times d^deg > 0
  let dPow = 1n;
  for (let i = u.length - 1; i >= 0; i--) {
    acc = acc * x.n + u[i] * dPow;
    dPow *= x.d;
  }
  return acc > 0n ? 1 : acc < 0n ? -1 : 0;
}

function variations(seq: readonly bigint[][], x: Point): number {
  let count = 0;
  let last = 0;
  for (const u of seq) {
    const s = signAt(u, x);
    if (s === 0) continue;
    if (last !== 0 && s !== last) count++;
    last = s;
  }
  return count;
}

/** Number of DISTINCT real roots in (lo, hi]. Example: countRealRoots(s^2 − 1, "-inf", "+inf") === 2. */
export function countRealRoots(p: UPoly, lo: Point = "-inf", hi: Point = "+inf"): number {
  if (upDeg(p) < 1) return 0;
  const seq = sturmSequence(p);
  return variations(seq, lo) - variations(seq, hi);
}

/** The square-free part p / gcd(p, p'). Example: squareFreePart((s − 1)^2) is s − 1. */
export function squareFreePart(p: UPoly): UPoly {
  if (upDeg(p) < 1) return p;
  return upDivMod(p, upGcd(p, upDeriv(p))).quo;
}

/**
 * The distinct real roots in (lo, hi) as floats, ascending: their number is decided exactly (Sturm),
 * their values by the root finder, polished by Newton on the real line.
 * Example: realRoots(x^2 − 2, 0) is [1.4142135623730951].
 */
export function realRoots(p: UPoly, lo: Q | null = null, hi: Q | null = null): number[] {
  let f = squareFreePart(p);
  // Exact roots at the ends are outside the open interval: divide them out so no float can confuse them.
  for (const end of [lo, hi]) if (end && upDeg(f) >= 1 && upEval(f, end).n === 0n) f = upDivMod(f, upFrom([qNeg(end), q(1)])).quo;
  if (upDeg(f) < 1) return [];
  const count = countRealRoots(f, lo ?? "-inf", hi ?? "+inf");
  if (count <= 0) return [];
  const loF = lo ? qToNumber(lo) : -Infinity;
  const hiF = hi ? qToNumber(hi) : Infinity;
  const slack = (x: number) => 1e-9 * Math.max(1, Math.abs(x));
  const candidates = polyRoots(upFloatsDesc(f))
    .filter(([re, im]) => im >= 0 && re > loF - slack(loF) && re < hiF + slack(hiF))
    .sort((a, b) => Math.abs(a[1]) / (1 + Math.hypot(...a)) - Math.abs(b[1]) / (1 + Math.hypot(...b)));
  return candidates
    .slice(0, count)
    .map(([re]) => polishReal(f, Math.min(Math.max(re, loF), hiF)))
    .sort((a, b) => a - b);
}

/** A few Newton steps in doubles, each kept only when it lowers |f|. */
function polishReal(f: UPoly, x: number): number {
  const df = upDeriv(f);
  let fx = Math.abs(upEvalFloat(f, x));
  for (let i = 0; i < 4 && fx > 0; i++) {
    const next = x - upEvalFloat(f, x) / upEvalFloat(df, x);
    const fn = Math.abs(upEvalFloat(f, next));
    if (!(fn < fx) || !Number.isFinite(next)) break;
    [x, fx] = [next, fn];
  }
  return x;
}
