// Evaluation of integer polynomials at double points in BigInt, with a proven relative accuracy: the root
// polisher needs p(z) and p'(z) correct to many bits, and for clustered or widely spread roots the rounding of
// a double Horner sum is larger than p(z) itself near a root.

/** A complex number as m·2^e with m = [re, im] doubles (e keeps huge and tiny values finite). */
export interface Scaled {
  m: [number, number];
  e: number;
}

/** x·2^e without overflow or underflow in the power itself. Example: ldexp(3, -1) === 1.5. */
export function ldexp(x: number, e: number): number {
  while (e > 1000) [x, e] = [x * 2 ** 1000, e - 1000];
  while (e < -1000) [x, e] = [x * 2 ** -1000, e + 1000];
  return x * 2 ** e;
}

/** Number of bits of |x|, to within a few (only used to pick shifts). Example: bitSize(255n) === 8. */
export function bitSize(x: bigint): number {
  const a = x < 0n ? -x : x;
  const f = Number(a);
  return f < 2 ** 1000 ? Math.ceil(Math.log2(f + 1)) : a.toString(16).length * 4;
}

/** a and b as doubles times a common power of two (their leading 64 bits). */
function scaledPair(a: bigint, b: bigint): Scaled {
  const shift = Math.max(0, Math.max(bitSize(a), bitSize(b)) - 64);
  if (shift === 0) return { m: [Number(a), Number(b)], e: 0 };
  const s = BigInt(shift);
  return { m: [Number(a >> s), Number(b >> s)], e: shift };
}

/** natural log of |x| for x ≠ 0 (−Infinity for 0), also for integers beyond the double range. Example: logAbs(1n) === 0. */
export function logAbs(x: bigint): number {
  if (x === 0n) return -Infinity;
  const { m, e } = scaledPair(x, 0n);
  return Math.log(Math.abs(m[0])) + e * Math.LN2;
}

/** x·2^−e as the nearest double (to 64-bit truncation), 0 when it underflows. Example: bigScaled(3n, 1) === 1.5. */
export function bigScaled(x: bigint, e: number): number {
  const { m, e: shift } = scaledPair(x, 0n);
  return ldexp(m[0], shift - e);
}

/**
 * The point x + iy as (X + iY)/2^F with integers X, Y: exact for |y| ≥ 2^−60·|x| and vice versa (a smaller part
 * is rounded at 2^−60 of the larger, far below a double's own precision), F ≥ 0 as small as that allows.
 */
function dyadic(x: number, y: number): { X: bigint; Y: bigint; F: number } {
  const m = Math.max(Math.abs(x), Math.abs(y));
  let F = m === 0 ? 0 : Math.max(0, 60 - Math.floor(Math.log2(m)));
  let [X, Y] = [Math.round(ldexp(x, F)), Math.round(ldexp(y, F))];
  while (F > 0 && X % 2 === 0 && Y % 2 === 0) [X, Y, F] = [X / 2, Y / 2, F - 1];
  return { X: BigInt(X), Y: BigInt(Y), F };
}

/** Horner on the fixed-point grid 2^−W: P ≈ 2^W·p(z), D ≈ 2^W·p'(z); exact once W ≥ F·n. */
function fixedHorner(c: readonly bigint[], X: bigint, Y: bigint, F: bigint, W: bigint) {
  let [pr, pi, dr, di] = [c[0] << W, 0n, 0n, 0n];
  for (let k = 1; k < c.length; k++) {
    const ck = c[k] << W;
    if (Y === 0n) {
      dr = ((dr * X) >> F) + pr;
      pr = ((pr * X) >> F) + ck;
    } else {
      [dr, di] = [((dr * X - di * Y) >> F) + pr, ((dr * Y + di * X) >> F) + pi];
      [pr, pi] = [((pr * X - pi * Y) >> F) + ck, (pr * Y + pi * X) >> F];
    }
  }
  return { p: scaledPair(pr, pi), dp: scaledPair(dr, di) };
}

const log2Of = (s: Scaled): number => Math.log2(Math.hypot(s.m[0], s.m[1])) + s.e;

/**
 * p(z) and p'(z) for integer coefficients in DESCENDING powers at the double point z = x + iy (taken exactly as
 * a dyadic rational), rounded to doubles with binary exponents, p to at least 2^−60 relative and p' to 2^−30.
 * Fixed-point Horner whose grid 2^−W is refined until the rounding bound n·max(1, |z|)^n·2^−W is that small,
 * ending with exact arithmetic (so an exact root gives p = 0). Example: bigEvalWithDerivative([1n, 0n, -2n], 1, 0)
 * is p = −1, p' = 2 (as m·2^e).
 */
export function bigEvalWithDerivative(c: readonly bigint[], x: number, y: number): { p: Scaled; dp: Scaled } {
  const { X, Y, F } = dyadic(x, y);
  const n = c.length - 1;
  const exactW = F * n;
  // log2 of the accumulated floor errors of p in units of 2^−W (p' collects up to n times more).
  const spread = Math.log2(2 * n) + Math.max(0, n - 1) * Math.max(0, Math.log2(Math.hypot(x, y)));
  for (let W = Math.min(exactW, 64); ; ) {
    const { p, dp } = fixedHorner(c, X, Y, BigInt(F), BigInt(W));
    const [lp, ldp] = [log2Of(p), log2Of(dp)];
    const margin = Math.min(lp - spread - 60, ldp - spread - Math.log2(n) - 30);
    if (W >= exactW || margin >= 0) return { p: { m: p.m, e: p.e - W }, dp: { m: dp.m, e: dp.e - W } };
    W = Math.min(exactW, W + Math.max(W, Math.ceil(-margin) + 16));
  }
}
