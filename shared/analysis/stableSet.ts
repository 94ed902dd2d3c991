// The set of one parameter's values for which a polynomial is Hurwitz. The first-column conditions of the
// Routh array change sign only where a root crosses the imaginary axis or the degree drops; those places are
// found exactly (Orlando: Δ_{n−1} = 0 ⇔ two roots sum to zero), and each piece is decided exactly.
import { polyCoeffsS, polyDegree, type Poly } from "@shared/algebra/poly";
import { q, qDiv, qMul, qNeg, qOne, qSub, type Q } from "@shared/algebra/rational";
import { zDeg, type ZPoly } from "@shared/algebra/zpoly";
import { exactFactors } from "@shared/analysis/factors";
import { exactValue, polySubstitute } from "@shared/analysis/nominal";
import { shownLatex, shownRational, shownRealRoots, shownText, shownValue } from "@shared/analysis/shown";
import { stabilityOf } from "@shared/analysis/stability";
import { realRoots } from "@shared/analysis/sturm";
import { upAdd, upDeg, upFrom, upFromPoly, upMul, upScale, upText, type UPoly } from "@shared/analysis/upoly";

export interface Endpoint {
  value: number;
  /** Exact text (rational or quadratic surd), or the value to 6 significant digits. */
  text: string;
  latex: string;
  exact: boolean;
  /** The polynomial in the parameter this endpoint is a root of, when it is not exact. */
  polynomial: string | null;
}

export interface StableInterval {
  lower: Endpoint | null; // null: −∞
  upper: Endpoint | null; // null: +∞
  lowerIncluded: boolean;
  upperIncluded: boolean;
}

export interface StableSet {
  parameter: string;
  intervals: StableInterval[];
  /** E.g. "0 < K < 30", "K > 2 or K < −1", "no value of K", "every value of K". */
  text: string;
}

/** Ascending coefficients of an integer polynomial in the one parameter (s absent). */
function inParameter(z: ZPoly): UPoly {
  return typeof z === "bigint" ? upFrom([q(z)]) : upFrom(z.c.map((c) => q(c as bigint)));
}

/** Exact determinant by Gaussian elimination over Q. */
function determinant(m: Q[][]): Q {
  const a = m.map((r) => r.slice());
  let det = qOne;
  for (let c = 0; c < a.length; c++) {
    const p = a.findIndex((r, i) => i >= c && r[c].n !== 0n);
    if (p < 0) return q(0);
    if (p !== c) [a[p], a[c], det] = [a[c], a[p], qNeg(det)];
    det = qMul(det, a[c][c]);
    for (let i = c + 1; i < a.length; i++) {
      const f = qDiv(a[i][c], a[c][c]);
      if (f.n !== 0n) for (let j = c; j < a.length; j++) a[i][j] = qSub(a[i][j], qMul(f, a[c][j]));
    }
  }
  return det;
}

/** Δ_{n−1}, the Hurwitz minor that vanishes exactly when two roots sum to zero (Orlando's formula). */
function hurwitzMinor(desc: Q[]): Q {
  const n = desc.length - 1;
  const a = (k: number) => (k >= 0 && k <= n ? desc[k] : q(0));
  return determinant(Array.from({ length: n - 1 }, (_, i) => Array.from({ length: n - 1 }, (_, j) => a(2 * (j + 1) - (i + 1)))));
}

/** Exact polynomial through points (x_i, y_i) (Newton's divided differences). */
function interpolate(xs: Q[], ys: Q[]): UPoly {
  const c = ys.slice();
  for (let k = 1; k < xs.length; k++) for (let i = xs.length - 1; i >= k; i--) c[i] = qDiv(qSub(c[i], c[i - 1]), qSub(xs[i], xs[i - k]));
  let out = upFrom([c[c.length - 1]]);
  for (let i = c.length - 2; i >= 0; i--) out = upAdd(upMul(out, upFrom([qNeg(xs[i]), qOne])), upFrom([c[i]]));
  return out;
}

/**
 * Polynomials in the parameter whose real roots are the only places the verdict can change: the leading
 * and constant coefficients (degree drop, root through s = 0) and Δ_{n−1} (a pair ±z, e.g. crossing the axis).
 */
function boundaryPolys(p: Poly, parameter: string): UPoly[] {
  const coeffs = polyCoeffsS(p);
  const n = coeffs.length - 1;
  const polys = [coeffs[n], coeffs[0]].map((c) => upScale(inParameter(c.z), c.q));
  if (n >= 2) {
    const degree = (n - 1) * Math.max(...coeffs.map((c) => zDeg(c.z, parameter)));
    const xs = Array.from({ length: degree + 1 }, (_, i) => q(i));
    const ys = xs.map((x) => hurwitzMinor(descExact(polySubstitute(p, new Map([[parameter, x]])), n)));
    polys.push(interpolate(xs, ys));
  }
  return polys.filter((u) => upDeg(u) >= 1);
}

/** Exact descending coefficients of a parameter-free polynomial, padded to degree n. */
function descExact(p: Poly, n: number): Q[] {
  const u = upFromPoly(p);
  return Array.from({ length: n + 1 }, (_, i) => u[n - i] ?? q(0));
}

interface Boundary extends Endpoint {
  rational: Q | null;
}

/** Real roots of one monic factor as endpoints: exact for degree ≤ 2 (rational or quadratic surd). */
function endpointsOf(f: UPoly, name: string): Boundary[] {
  const exact = shownRealRoots(f);
  if (exact) {
    return exact.map((x) => ({ value: shownValue(x), text: shownText(x), latex: shownLatex(x), exact: true, polynomial: null, rational: shownRational(x) }));
  }
  const polynomial = upText(f, name);
  return realRoots(f).map((x) => {
    const t = String(Number(x.toPrecision(6)));
    return { value: x, text: t, latex: t, exact: false, polynomial, rational: null };
  });
}

/**
 * Values of `parameter` for which p (a polynomial in s; other parameters at `values`) has every root in the
 * open left half-plane, as a union of intervals. The boundaries are where a root crosses the imaginary
 * axis or the degree drops; each piece and each rational boundary is then decided exactly.
 * Example: s^3 + 3s^2 + 3s + 1 + K → −1 < K < 8.
 */
export function stableSet(p: Poly, parameter: string, values: Readonly<Record<string, number>>): StableSet {
  const others = new Map(Object.entries(values).filter(([k]) => k !== parameter).map(([k, v]) => [k, exactValue(v, k)]));
  const inK = polySubstitute(p, others);
  const factors = boundaryPolys(inK, parameter).flatMap((u) => exactFactors(u, "boundary polynomial"));
  const unique = factors.filter((f, i) => factors.findIndex((g) => upText(g.poly) === upText(f.poly)) === i);
  const points = unique.flatMap((f) => endpointsOf(f.poly, parameter)).sort((a, b) => a.value - b.value);
  const stableAt = (x: Q): boolean => {
    const at = polySubstitute(inK, new Map([[parameter, x]]));
    return polyDegree(at) >= 0 && stabilityOf(upFromPoly(at)).verdict === "stable";
  };
  const pieceStable = pieceSamples(points.map((e) => e.value)).map((x) => stableAt(exactValue(x)));
  const pointStable = points.map((e) => e.rational !== null && stableAt(e.rational));
  const intervals: StableInterval[] = [];
  pieceStable.forEach((ok, i) => {
    if (!ok) return;
    const lower = i > 0 ? strip(points[i - 1]) : null;
    const upper = i < points.length ? strip(points[i]) : null;
    const prev = intervals[intervals.length - 1];
    const joins = prev && i > 0 && pointStable[i - 1] && prev.upper?.value === points[i - 1].value;
    if (joins) prev.upper = upper;
    else intervals.push({ lower, upper, lowerIncluded: i > 0 && pointStable[i - 1], upperIncluded: false });
    intervals[intervals.length - 1].upperIncluded = i < points.length && pointStable[i];
  });
  return { parameter, intervals, text: describe(parameter, intervals) };
}

const strip = ({ rational: _, ...e }: Boundary): Endpoint => e;

/** One sample strictly inside each piece between sorted boundary values (and beyond both ends). */
function pieceSamples(xs: number[]): number[] {
  if (!xs.length) return [1];
  const out = [xs[0] - Math.max(1, Math.abs(xs[0]))];
  for (let i = 0; i + 1 < xs.length; i++) out.push((xs[i] + xs[i + 1]) / 2);
  out.push(xs[xs.length - 1] + Math.max(1, Math.abs(xs[xs.length - 1])));
  return out;
}

function describe(name: string, intervals: StableInterval[]): string {
  if (!intervals.length) return `no value of ${name}`;
  return intervals
    .map(({ lower, upper, lowerIncluded, upperIncluded }) => {
      if (!lower && !upper) return `every value of ${name}`;
      const lo = lower ? `${lower.text} ${lowerIncluded ? "≤" : "<"} ` : "";
      const hi = upper ? ` ${upperIncluded ? "≤" : "<"} ${upper.text}` : "";
      if (!lower) return `${name}${hi}`;
      if (!upper) return `${name} ${lowerIncluded ? "≥" : ">"} ${lower.text}`;
      return `${lo}${name}${hi}`;
    })
    .join(" or ");
}
