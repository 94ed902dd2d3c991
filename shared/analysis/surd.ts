// Exact arithmetic in Q(√d): the poles of a rational quadratic factor live there, so residues and time
// responses stay exact for them (d < 0 gives the complex pairs).
import type { Field } from "@shared/algebra/field";
import {
  q, qAdd, qDiv, qEquals, qFromDouble, qIsZero, qMul, qNeg, qOne, qSub, qToNumber, qToString, qZero, type Q,
} from "@shared/algebra/rational";

/** a + b·√d in a field Q(√d) fixed by the surrounding code. Example: { a: 1/2, b: 1/2 } in Q(√−3). */
export interface Surd {
  readonly a: Q;
  readonly b: Q;
}

/** A field whose elements can be built from rationals and read as complex floats. */
export interface NumberField<T> extends Field<T> {
  fromQ(x: Q): T;
  /** [re, im] as floats. */
  toComplex(x: T): [number, number];
}

/** Square factors up to this bound are pulled out of a radicand; larger ones are left inside (still exact). */
const TRIAL_LIMIT = 10_000n;

/** √r = coef·√rad with rad a (trial-divided) square-free integer ≥ 1, for r ≥ 0. Example: √(12/5) = 2/5·√15. */
export function sqrtRational(r: Q): { coef: Q; rad: bigint } {
  if (r.n < 0n) throw new RangeError("sqrtRational of a negative number");
  let rad = r.n * r.d; // √(n/d) = √(n·d)/d
  let out = 1n;
  for (let p = 2n; p <= TRIAL_LIMIT && p * p <= rad; p++) {
    while (rad % (p * p) === 0n) {
      rad /= p * p;
      out *= p;
    }
  }
  const root = bigSqrt(rad);
  if (root * root === rad) [out, rad] = [out * root, 1n];
  return { coef: q(out, r.d), rad };
}

/** Floor of the square root of a non-negative BigInt (Newton). Example: bigSqrt(17n) === 4n. */
export function bigSqrt(n: bigint): bigint {
  if (n < 2n) return n;
  // Newton from above: 2^⌈bits/2⌉ ≥ √n, so the iterates fall monotonically to the floor (any size, no float).
  let x = 1n << BigInt(Math.ceil(n.toString(2).length / 2));
  while (x * x > n) x = (x + n / x) / 2n;
  while ((x + 1n) * (x + 1n) <= n) x += 1n;
  return x;
}

const bits = (x: bigint): number => (x < 0n ? -x : x).toString(2).length;

/** √x of a rational x ≥ 0 of any size as a double, from an integer square root of about 120 bits. Example: qSqrtToNumber(q(1, 4)) === 0.5. */
export function qSqrtToNumber(x: Q): number {
  if (x.n === 0n) return 0;
  const k = Math.floor((120 - (bits(x.n) - bits(x.d))) / 2); // x·4^k has about 120 bits
  const scaled = k >= 0 ? (x.n << BigInt(2 * k)) / x.d : x.n / (x.d << BigInt(-2 * k));
  // 2^(−k) in two halves, so neither factor overflows or underflows before the product does.
  const half = 2 ** (-k / 2);
  return Number(bigSqrt(scaled)) * half * half;
}

/**
 * a + b·√d as a double (d > 0), without the cancellation of adding two nearly opposite floats: then it is
 * (a² − b²d)/(a − b·√d) with the numerator exact. Example: surdToNumber(q(1), q(-1, 2), 3n) ≈ 0.134 (1 − √3/2).
 */
export function surdToNumber(a: Q, b: Q, d: bigint): number {
  if (qIsZero(b)) return qToNumber(a);
  const b2d = qMul(qMul(b, b), q(d));
  const bRoot = (b.n < 0n ? -1 : 1) * qSqrtToNumber(b2d);
  const aValue = qToNumber(a);
  if (qIsZero(a) || aValue > 0 === bRoot > 0) return aValue + bRoot;
  // The quotient is taken exactly (the float denominator read back as a rational), so a tiny norm cannot underflow.
  return qToNumber(qDiv(qSub(qMul(a, a), b2d), qFromDouble(aValue - bRoot)));
}

/** The field Q(√d) for a square-free integer d ≠ 1 (d = −1 gives the Gaussian rationals). Example: surdField(-3n). */
export function surdField(d: bigint): NumberField<Surd> {
  const D = q(d);
  const make = (a: Q, b: Q): Surd => ({ a, b });
  return {
    zero: make(qZero, qZero),
    one: make(qOne, qZero),
    fromQ: (x) => make(x, qZero),
    add: (x, y) => make(qAdd(x.a, y.a), qAdd(x.b, y.b)),
    sub: (x, y) => make(qSub(x.a, y.a), qSub(x.b, y.b)),
    neg: (x) => make(qNeg(x.a), qNeg(x.b)),
    mul: (x, y) => make(qAdd(qMul(x.a, y.a), qMul(qMul(x.b, y.b), D)), qAdd(qMul(x.a, y.b), qMul(x.b, y.a))),
    div: (x, y) => {
      const norm = qSub(qMul(y.a, y.a), qMul(qMul(y.b, y.b), D)); // y·ȳ, non-zero for y ≠ 0 since d is no square
      if (qIsZero(norm)) throw new RangeError("division by zero in Q(√d)");
      const num = make(qSub(qMul(x.a, y.a), qMul(qMul(x.b, y.b), D)), qSub(qMul(x.b, y.a), qMul(x.a, y.b)));
      return make(qDiv(num.a, norm), qDiv(num.b, norm));
    },
    isZero: (x) => qIsZero(x.a) && qIsZero(x.b),
    isOne: (x) => qEquals(x.a, qOne) && qIsZero(x.b),
    toComplex: (x) => (d < 0n ? [qToNumber(x.a), surdToNumber(qZero, x.b, -d)] : [surdToNumber(x.a, x.b, d), 0]),
  };
}

/** Complex doubles as a field, for poles that are neither rational nor quadratic surds. */
export const complexField: NumberField<[number, number]> = {
  zero: [0, 0],
  one: [1, 0],
  fromQ: (x) => [qToNumber(x), 0],
  add: (x, y) => [x[0] + y[0], x[1] + y[1]],
  sub: (x, y) => [x[0] - y[0], x[1] - y[1]],
  neg: (x) => [-x[0], -x[1]],
  mul: (x, y) => [x[0] * y[0] - x[1] * y[1], x[0] * y[1] + x[1] * y[0]],
  div: (x, y) => {
    const m = y[0] * y[0] + y[1] * y[1];
    if (m === 0) throw new RangeError("complex division by zero");
    return [(x[0] * y[0] + x[1] * y[1]) / m, (x[1] * y[0] - x[0] * y[1]) / m];
  },
  isZero: (x) => x[0] === 0 && x[1] === 0,
  isOne: (x) => x[0] === 1 && x[1] === 0,
  toComplex: (x) => x,
};

/** Plain text of c·√rad (rad ≥ 1). Example: surdText(q(1, 2), 3n) === "sqrt(3)/2". */
export function surdText(c: Q, rad: bigint): string {
  if (rad === 1n) return qToString(c);
  const neg = c.n < 0n ? "-" : "";
  const n = c.n < 0n ? -c.n : c.n;
  const root = `sqrt(${rad})`;
  return `${neg}${n === 1n ? root : `${n}*${root}`}${c.d === 1n ? "" : `/${c.d}`}`;
}

/** LaTeX of c·√rad. Example: surdLatex(q(1, 2), 3n) === "\\frac{\\sqrt{3}}{2}". */
export function surdLatex(c: Q, rad: bigint): string {
  const neg = c.n < 0n ? "-" : "";
  const n = c.n < 0n ? -c.n : c.n;
  const top = rad === 1n ? `${n}` : `${n === 1n ? "" : n}\\sqrt{${rad}}`;
  return c.d === 1n ? `${neg}${top}` : `${neg}\\frac{${top}}{${c.d}}`;
}
