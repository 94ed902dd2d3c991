// The stability verdict decided exactly: square-free factors over Q, imaginary-axis roots by Sturm on
// gcd(Re p(jω), Im p(jω)), right-half-plane roots by the Routh array of the part without mirrored roots.
import { exactFactors } from "@shared/analysis/factors";
import { memoByPoly } from "@shared/analysis/memo";
import { routhRows, signAsEpsilonVanishes } from "@shared/analysis/routh";
import { countRealRoots, realRoots } from "@shared/analysis/sturm";
import { counted, plural } from "@shared/text/words";
import {
  upDeg, upDivMod, upGcd, upMonic, upNegVar, upOnAxis, upToPoly, upZeroOrder, type UPoly,
} from "@shared/analysis/upoly";

export type Verdict = "stable" | "marginal" | "unstable";

/** Root counts with multiplicity. */
export interface RootCounts {
  rhp: number;
  axis: number;
  lhp: number;
  /** Some root on the imaginary axis (s = 0 included) is repeated. */
  repeatedAxis: boolean;
  /** Multiplicity of the root s = 0. */
  atOrigin: number;
  /** Distinct axis roots as ω ≥ 0 (s = ±jω), for the explanation. */
  axisFrequencies: number[];
}

export interface Stability {
  verdict: Verdict;
  reason: string;
  counts: RootCounts;
}

/** Right-half-plane roots of a polynomial without roots mirrored through the origin (Routh, ε exact). */
function rhpByRouth(h: UPoly): number {
  if (upDeg(h) < 1) return 0;
  const signs = routhRows(upToPoly(h)).rows.map((r) => signAsEpsilonVanishes(r[0]) as number);
  return signs.reduce((acc, s, i) => (i > 0 && s !== signs[i - 1] ? acc + 1 : acc), 0);
}

/**
 * Exact root counts (multiplicity included) in the open right half-plane, on the imaginary axis and in the
 * open left half-plane. Example: rootCounts((s + 1)(s^2 + 4)^2) has rhp 0, axis 4, lhp 1, repeatedAxis true.
 */
export const rootCounts = (u: UPoly): RootCounts => countsOfMonic(upMonic(u));

// Keyed by the monic multiple: the characteristic polynomial is often the denominator times a constant.
const countsOfMonic = memoByPoly(countRoots);

function countRoots(u: UPoly): RootCounts {
  const counts: RootCounts = { rhp: 0, axis: 0, lhp: 0, repeatedAxis: false, atOrigin: upZeroOrder(u), axisFrequencies: [] };
  for (const { poly: f, multiplicity: m } of exactFactors(u)) {
    const { re, im } = upOnAxis(f);
    const g = upGcd(re, im); // real roots ω of g ↔ roots jω of f
    const axis = upDeg(g) >= 1 ? countRealRoots(g) : 0;
    if (axis > 0) counts.axisFrequencies.push(...realRoots(g).filter((w) => w >= 0));
    const mirrored = upGcd(f, upNegVar(f)); // roots z with −z also a root: axis roots and ± pairs
    const rhp = rhpByRouth(upDivMod(f, mirrored).quo) + (upDeg(mirrored) - axis) / 2;
    counts.rhp += m * rhp;
    counts.axis += m * axis;
    counts.lhp += m * (upDeg(f) - rhp - axis);
    if (axis > 0 && m > 1) counts.repeatedAxis = true;
  }
  counts.axisFrequencies = [...new Set(counts.axisFrequencies.map((w) => Math.abs(w)))].sort((a, b) => a - b);
  return counts;
}

const axisText = (ws: number[]) => ws.map((w) => (w === 0 ? "s = 0" : `s = ±${Number(w.toPrecision(6))}j`)).join(", ");

/**
 * Stable / marginal / unstable by the definitions of the analysis: marginal means simple roots on the
 * imaginary axis (s = 0 included) and none to the right; a repeated axis root is unstable.
 * Example: stabilityOf(s(s + 1)) is marginal ("simple pole on the imaginary axis at s = 0").
 */
export function stabilityOf(u: UPoly, noun = "pole"): Stability {
  const counts = rootCounts(u);
  if (counts.rhp > 0) {
    return { verdict: "unstable", counts, reason: `${counted(counts.rhp, noun)} in the right half-plane.` };
  }
  if (counts.repeatedAxis) {
    return { verdict: "unstable", counts, reason: `A repeated ${noun} on the imaginary axis (${axisText(counts.axisFrequencies)}): the response grows like a power of t.` };
  }
  if (counts.axis > 0) {
    return { verdict: "marginal", counts, reason: `${counts.axis === 1 ? `A simple ${noun}` : `Simple ${noun}s`} on the imaginary axis (${axisText(counts.axisFrequencies)}) and none to the right.` };
  }
  const all = upDeg(u) < 1 ? `No ${plural(0, noun)}.` : counts.lhp === 1 ? `The one ${noun} is in the open left half-plane.` : `All ${counted(counts.lhp, noun)} in the open left half-plane.`;
  return { verdict: "stable", counts, reason: all };
}
