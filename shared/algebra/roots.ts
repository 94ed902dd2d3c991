// Own root finder (Aberth–Ehrlich) so reported modes do not depend on a slow general CAS; for exact
// coefficients the double roots are polished with p and p' evaluated exactly, which is what makes
// ill-conditioned degree-100 polynomials accurate.
import { bigEvalWithDerivative, bigScaled, ldexp, logAbs } from "@shared/algebra/bigEval";
import { AlgebraError } from "@shared/algebra/errors";
import { polyDegree, polyParams, type Poly } from "@shared/algebra/poly";
import { bigGcd, q, qMul, qToNumber, type Q } from "@shared/algebra/rational";

const EPS = 2 ** -52;
/** Sweeps of the exact stage; good double starting points need one or two, clusters of 100 roots some dozens. */
const EXACT_SWEEPS = 200;

/**
 * Numeric roots as [re, im] pairs, sorted by real then imaginary part, from real coefficients in DESCENDING
 * powers. Aberth–Ehrlich iteration started on the Newton-polygon circles, stopped per root when |p(z)| is at
 * the level of its rounding error (evaluated through the reversed polynomial outside the unit circle).
 * Example: polyRoots([1, 0, 1]) is [[0, -1], [0, 1]].
 */
export function polyRoots(coeffsDescending: readonly number[]): [number, number][] {
  let first = 0;
  while (first < coeffsDescending.length && coeffsDescending[first] === 0) first++;
  const a = coeffsDescending.slice(first);
  const roots: [number, number][] = [];
  while (a.length > 1 && a[a.length - 1] === 0) {
    a.pop();
    roots.push([0, 0]);
  }
  const scale = Math.max(...a.map(Math.abs));
  const c = a.map((x) => x / scale);
  const n = c.length - 1;
  if (n === 1) roots.push([-c[1] / c[0], 0]);
  else if (n === 2) roots.push(...quadratic(c[0], c[1], c[2]));
  else if (n > 2) roots.push(...aberth(c));
  return tidyRoots(roots);
}

/**
 * Roots of a polynomial with EXACT rational coefficients in DESCENDING powers, each to a few units in the last
 * place when the roots are simple (give square-free factors: a repeated root converges slowly). Double starting
 * points, then Aberth–Ehrlich steps with p and p' evaluated exactly, so clustered, widely spread or
 * Wilkinson-like roots cost time, not accuracy. Sorted like polyRoots.
 * Example: polyRootsExact([q(1), q(0), q(-2)]) is [[−√2, 0], [√2, 0]], each the nearest double.
 */
export function polyRootsExact(coeffsDescending: readonly Q[]): [number, number][] {
  const c = integerCoefficients(coeffsDescending);
  const roots: [number, number][] = [];
  while (c.length > 1 && c[c.length - 1] === 0n) {
    c.pop();
    roots.push([0, 0]);
  }
  if (c.length === 2) roots.push([qToNumber(q(-c[1], c[0])), 0]);
  else if (c.length > 2) {
    const z = separate(exactStart(c));
    aberthSweeps(z, (x, y) => exactNewton(c, x, y), 4 * EPS, EXACT_SWEEPS);
    roots.push(...conjugatePairs(z));
  }
  return tidyRoots(roots);
}

/** Integer multiples of the coefficients (common denominator cleared), leading zeros dropped. */
function integerCoefficients(desc: readonly Q[]): bigint[] {
  const first = desc.findIndex((x) => x.n !== 0n);
  const a = first < 0 ? [] : desc.slice(first);
  const l = a.reduce((acc, x) => (acc / bigGcd(acc, x.d)) * x.d, 1n);
  return a.map((x) => x.n * (l / x.d));
}

/** The double roots when the scaled coefficients fit in doubles; else points on the Newton-polygon circles. */
function exactStart(c: readonly bigint[]): [number, number][] {
  const logs = c.map(logAbs);
  const finite = logs.filter((l) => l > -Infinity);
  const top = Math.max(...finite);
  if (Math.min(...finite) > top - 1000 * Math.LN2) {
    const z = polyRoots(c.map((x) => bigScaled(x, Math.round(top / Math.LN2))));
    if (z.length === c.length - 1 && z.every(([x, y]) => Number.isFinite(x) && Number.isFinite(y) && (x !== 0 || y !== 0))) return z;
  }
  return startingPoints(logs.reverse());
}

/** Moves points that coincide (a cluster the doubles could not resolve) slightly apart, so Aberth can separate them. */
function separate(z: [number, number][]): [number, number][] {
  const seen = new Set<string>();
  return z.map(([x, y], k) => {
    if (seen.has(`${x},${y}`)) {
      const r = Math.hypot(x, y) * 2 ** -26;
      [x, y] = [x + r * Math.cos(k), y + r * Math.sin(k)];
    }
    seen.add(`${x},${y}`);
    return [x, y];
  });
}

/** Newton correction from the exact p(z), p'(z); converged only at an exact root. */
function exactNewton(c: readonly bigint[], x: number, y: number): NewtonStep {
  const { p, dp } = bigEvalWithDerivative(c, x, y);
  if (p.m[0] === 0 && p.m[1] === 0) return { re: 0, im: 0, converged: true };
  const [re, im] = cdiv(p.m[0], p.m[1], dp.m[0], dp.m[1]);
  return { re: ldexp(re, p.e - dp.e), im: ldexp(im, p.e - dp.e), converged: false };
}

/** Real coefficients: makes each complex pair exactly conjugate (the mean of the two polished values). */
function conjugatePairs(z: [number, number][]): [number, number][] {
  const out = z.map(([x, y]): [number, number] => [x, y]);
  const lower = new Set(out.flatMap((r, i) => (r[1] < 0 ? [i] : [])));
  out.forEach(([x, y], i) => {
    if (y <= 0) return;
    let [best, dist] = [-1, Infinity];
    for (const j of lower) {
      const d = Math.hypot(x - out[j][0], y + out[j][1]);
      if (d < dist) [best, dist] = [j, d];
    }
    if (best < 0 || dist > 2 ** -40 * Math.hypot(x, y)) return;
    lower.delete(best);
    const [re, im] = [(x + out[best][0]) / 2, (y - out[best][1]) / 2];
    out[i] = [re, im];
    out[best] = [re, -im];
  });
  return out;
}

/**
 * Roots with imaginary (or real) parts that are rounding noise next to the root's size dropped, sorted by
 * real then imaginary part (the order every root list here uses). Example: tidyRoots([[1, 1e-20]]) is [[1, 0]].
 */
export function tidyRoots(roots: readonly [number, number][]): [number, number][] {
  return roots.map(tidy).sort((x, y) => x[0] - y[0] || x[1] - y[1]);
}

/** Drops imaginary (or real) parts that are rounding noise next to the root's size. */
function tidy([re, im]: [number, number]): [number, number] {
  const r = Math.hypot(re, im);
  return [Math.abs(re) <= 1e-14 * r ? 0 : re, Math.abs(im) <= 1e-12 * r ? 0 : im];
}

function quadratic(a: number, b: number, c: number): [number, number][] {
  const disc = b * b - 4 * a * c;
  if (disc >= 0) {
    const t = -(b + (b >= 0 ? 1 : -1) * Math.sqrt(disc)) / 2;
    return t === 0 ? [[0, 0], [0, 0]] : [[t / a, 0], [c / t, 0]];
  }
  const re = -b / (2 * a);
  const im = Math.sqrt(-disc) / (2 * Math.abs(a));
  return [[re, -im], [re, im]];
}

/**
 * Aberth–Ehrlich starting points from the natural logs of |a_i| (ASCENDING powers, −Infinity for a zero
 * coefficient): for each edge of the upper convex hull of (i, log|a_i|), that many points on its circle.
 * Example: startingPoints([0, -Infinity, 0]) (s² + 1) gives two points on the unit circle.
 */
export function startingPoints(logAbsAscending: readonly number[]): [number, number][] {
  const n = logAbsAscending.length - 1;
  const pts = logAbsAscending.map((l, i) => [i, l] as const).filter((p) => p[1] > -Infinity);
  const hull: (readonly [number, number])[] = [];
  for (const p of pts) {
    while (hull.length >= 2) {
      const [o, m] = [hull[hull.length - 2], hull[hull.length - 1]];
      if ((m[0] - o[0]) * (p[1] - o[1]) - (m[1] - o[1]) * (p[0] - o[0]) >= 0) hull.pop();
      else break;
    }
    hull.push(p);
  }
  const out: [number, number][] = [];
  for (let h = 0; h + 1 < hull.length; h++) {
    const [i, li] = hull[h];
    const [j, lj] = hull[h + 1];
    const r = Math.exp((li - lj) / (j - i));
    for (let k = 0; k < j - i; k++) {
      const t = (2 * Math.PI * k) / (j - i) + (2 * Math.PI * h) / n + 0.4;
      out.push([r * Math.cos(t), r * Math.sin(t)]);
    }
  }
  return out;
}

/** A Newton correction p(z)/p'(z) and whether z is already as good as the arithmetic allows. */
export interface NewtonStep {
  re: number;
  im: number;
  converged: boolean;
}

interface Step extends NewtonStep {
  /** |p(z)| against its rounding-error bound: a smaller value means a better point. */
  residual: number;
}

/** Newton correction at z; outside the unit disc through q(w) = w^n p(1/w), w = 1/z (no overflow). */
function newton(desc: number[], asc: number[], x: number, y: number): Step {
  const n = desc.length - 1;
  const outside = x * x + y * y > 1;
  const [wx, wy] = outside ? cdiv(1, 0, x, y) : [x, y];
  const coeffs = outside ? asc : desc;
  let [pr, pi, dr, di] = [coeffs[0], 0, 0, 0];
  let bound = Math.abs(coeffs[0]);
  const wm = Math.hypot(wx, wy);
  for (let i = 1; i <= n; i++) {
    [dr, di] = [dr * wx - di * wy + pr, dr * wy + di * wx + pi];
    [pr, pi] = [pr * wx - pi * wy + coeffs[i], pr * wy + pi * wx];
    bound = bound * wm + Math.abs(coeffs[i]);
  }
  const residual = Math.hypot(pr, pi) / bound;
  // Outside: p/p' = z·q / (n·q − w·q').
  const [re, im] = outside
    ? cdiv(...cmul(x, y, pr, pi), n * pr - (wx * dr - wy * di), n * pi - (wx * di + wy * dr))
    : cdiv(pr, pi, dr, di);
  return { re, im, residual, converged: residual <= 4 * n * EPS };
}

/**
 * Aberth–Ehrlich sweeps over the points z (updated in place, each with the others' newest values): a point is
 * final once newtonAt reports it converged or its correction is at most tol·|z|. Returns whether all are final.
 * Example: aberthSweeps(startingPoints(logs), (x, y) => newtonStepAt(x, y), 2 ** -52, 1000).
 */
export function aberthSweeps(z: [number, number][], newtonAt: (x: number, y: number) => NewtonStep, tol: number, maxSweeps: number): boolean {
  const n = z.length;
  const done = new Array<boolean>(n).fill(false);
  for (let iter = 0; iter < maxSweeps && done.includes(false); iter++) {
    for (let k = 0; k < n; k++) {
      if (done[k]) continue;
      const [x, y] = z[k];
      const step = newtonAt(x, y);
      if (step.converged) {
        done[k] = true;
        continue;
      }
      let [sr, si] = [0, 0];
      for (let j = 0; j < n; j++) {
        if (j === k) continue;
        const [ir, ii] = cdiv(1, 0, x - z[j][0], y - z[j][1]);
        sr += ir;
        si += ii;
      }
      const [mr, mi] = cmul(step.re, step.im, sr, si);
      let [cr, ci] = cdiv(step.re, step.im, 1 - mr, -mi);
      // Two points on the same double (a cluster finer than the grid): plain Newton for this one.
      if (!Number.isFinite(cr) || !Number.isFinite(ci)) [cr, ci] = [step.re, step.im];
      if (!Number.isFinite(cr) || !Number.isFinite(ci)) continue;
      z[k] = [x - cr, y - ci];
      if (Math.hypot(cr, ci) <= tol * Math.hypot(x, y)) done[k] = true;
    }
  }
  return !done.includes(false);
}

function aberth(desc: number[]): [number, number][] {
  const asc = desc.slice().reverse();
  const z = startingPoints(asc.map((x) => (x === 0 ? -Infinity : Math.log(Math.abs(x)))));
  aberthSweeps(z, (x, y) => newton(desc, asc, x, y), EPS, 1000);
  return z.map(([x, y]) => polish(desc, asc, x, y));
}

/** Up to two plain Newton steps, each kept only if it lowers the residual. */
function polish(desc: number[], asc: number[], x: number, y: number): [number, number] {
  let step = newton(desc, asc, x, y);
  for (let i = 0; i < 2 && step.residual > 0; i++) {
    const next = newton(desc, asc, x - step.re, y - step.im);
    if (!(next.residual < step.residual)) break;
    [x, y] = [x - step.re, y - step.im];
    step = next;
  }
  return [x, y];
}

function cmul(a: number, b: number, c: number, d: number): [number, number] {
  return [a * c - b * d, a * d + b * c];
}

/** Complex quotient (a + bi)/(c + di), scaled against overflow. Example: cdiv(1, 0, 0, 1) is [0, −1]. */
export function cdiv(a: number, b: number, c: number, d: number): [number, number] {
  if (Math.abs(c) >= Math.abs(d)) {
    const r = d / c;
    const t = c + d * r;
    return [(a + b * r) / t, (b - a * r) / t];
  }
  const r = c / d;
  const t = c * r + d;
  return [(a * r + b) / t, (b * r - a) / t];
}

/**
 * Real roots of a polynomial in ONE parameter (no s), e.g. the values where a loop becomes singular.
 * Throws AlgebraError "not-univariate" otherwise; a constant has none. Example: polyParamRoots(K - 1) is
 * { name: "K", roots: [1] }.
 */
export function polyParamRoots(p: Poly): { name: string; roots: number[] } {
  const names = polyParams(p);
  if (polyDegree(p) > 0 || names.length > 1) {
    throw new AlgebraError("not-univariate", "Expected a polynomial in a single parameter without s.");
  }
  if (!names.length || typeof p.z === "bigint") return { name: names[0] ?? "", roots: [] };
  const desc = p.z.c.map((c) => qToNumber(qMul(p.q, q(c as bigint)))).reverse();
  const roots = polyRoots(desc)
    .filter(([re, im]) => Math.abs(im) <= 1e-9 * Math.max(1, Math.abs(re)))
    .map(([re]) => re);
  return { name: names[0], roots };
}
