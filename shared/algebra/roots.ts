// Own root finder (Aberth–Ehrlich) so reported modes do not depend on a slow general CAS.
import { AlgebraError } from "@shared/algebra/errors";
import { polyDegree, polyParams, type Poly } from "@shared/algebra/poly";
import { q, qMul, qToNumber } from "@shared/algebra/rational";

const EPS = 2 ** -52;

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

/** Starting points: for each edge of the upper convex hull of (i, log|a_i|), that many points on its circle. */
function startingPoints(asc: number[]): [number, number][] {
  const n = asc.length - 1;
  const pts = asc.map((x, i) => [i, x === 0 ? -Infinity : Math.log(Math.abs(x))] as const).filter((p) => p[1] > -Infinity);
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

interface Step {
  /** Newton correction p/p'. */
  re: number;
  im: number;
  /** |p(z)| against its rounding-error bound: a smaller value means a better point. */
  residual: number;
  /** |p(z)| is at rounding-error level: the root cannot be improved. */
  converged: boolean;
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

function aberth(desc: number[]): [number, number][] {
  const n = desc.length - 1;
  const asc = desc.slice().reverse();
  const z = startingPoints(asc);
  const done = new Array<boolean>(n).fill(false);
  for (let iter = 0; iter < 1000 && done.includes(false); iter++) {
    for (let k = 0; k < n; k++) {
      if (done[k]) continue;
      const [x, y] = z[k];
      const step = newton(desc, asc, x, y);
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
      const [cr, ci] = cdiv(step.re, step.im, 1 - mr, -mi);
      if (!Number.isFinite(cr) || !Number.isFinite(ci)) continue;
      z[k] = [x - cr, y - ci];
      if (Math.hypot(cr, ci) <= EPS * Math.hypot(x, y)) done[k] = true;
    }
  }
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

function cdiv(a: number, b: number, c: number, d: number): [number, number] {
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
