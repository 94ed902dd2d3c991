// Poles and zeros with exact multiplicities: each exact factor's roots are found on their own (a
// square-free factor has simple roots, which the root finder gets to full accuracy), exact text for
// rational and quadratic-surd roots, damping ratio and natural frequency for complex pairs.
import { qMul, qNeg, qSub, q } from "@shared/algebra/rational";
import { polyRootsExact } from "@shared/algebra/roots";
import { exactFactors, type Factor } from "@shared/analysis/factors";
import { memoByPoly } from "@shared/analysis/memo";
import { shownQ, shownText } from "@shared/analysis/shown";
import { sqrtRational, surdText } from "@shared/analysis/surd";
import { upDeg, upText, type UPoly } from "@shared/analysis/upoly";

export interface RootInfo {
  re: number;
  im: number;
  multiplicity: number;
  /** The exact factor (monic) the root belongs to, e.g. "s^2 + s + 1". */
  factor: string;
  /** Exact value for rational and quadratic-surd roots ("-1/2 + sqrt(3)/2*j"), else null. */
  exact: string | null;
  /** ζ = −Re/|p| and ωn = |p| for a complex root; null for a real one. */
  damping: number | null;
  naturalFrequency: number | null;
}

/**
 * Numeric roots of one exact (square-free) factor, each to a few units in the last place, sorted by real then
 * imaginary part; memoised, since poles, zeros, responses and Bode data all ask for the same factors.
 * Example: factorRoots(s^2 + 1) is [[0, −1], [0, 1]].
 */
export const factorRoots = memoByPoly((f: UPoly): [number, number][] => polyRootsExact(f.slice().reverse()));

/** Exact texts of the roots of a monic linear or quadratic factor, in polyRoots order (re, then im). */
function exactTexts(f: UPoly): string[] | null {
  if (upDeg(f) === 1) return [shownText(shownQ(qNeg(f[0])))];
  if (upDeg(f) !== 2) return null;
  const disc = qSub(qMul(f[1], f[1]), qMul(q(4), f[0]));
  const mid = shownText(shownQ(qMul(qNeg(f[1]), q(1, 2))));
  const { coef, rad } = sqrtRational(disc.n < 0n ? qNeg(disc) : disc);
  const off = surdText(qMul(coef, q(1, 2)), rad);
  const lead = mid === "0" ? "" : `${mid} `;
  if (disc.n < 0n) return [`${lead}- ${off}*j`, `${lead}+ ${off}*j`].map((t) => t.replace(/^- /, "-").replace(/^\+ /, ""));
  return [`${lead}- ${off}`, `${lead}+ ${off}`].map((t) => t.replace(/^- /, "-").replace(/^\+ /, ""));
}

/**
 * Roots of a numeric polynomial with exact multiplicities, sorted by real then imaginary part.
 * Throws AnalysisError "degree-limit" above degree 100. Example: rootsOf((s + 1)^2) → [{ re: −1, im: 0, multiplicity: 2 }].
 */
export function rootsOf(u: UPoly, factors: Factor[] = exactFactors(u)): RootInfo[] {
  const out: RootInfo[] = [];
  for (const { poly, multiplicity } of factors) {
    const roots = factorRoots(poly);
    const texts = exactTexts(poly);
    const factor = upText(poly);
    roots.forEach(([re, im], i) => {
      const wn = Math.hypot(re, im);
      out.push({
        re,
        im,
        multiplicity,
        factor,
        exact: texts ? texts[i] : null,
        damping: im !== 0 ? -re / wn : null,
        naturalFrequency: im !== 0 ? wn : null,
      });
    });
  }
  return out.sort((a, b) => a.re - b.re || a.im - b.im);
}

/** Each root repeated by its multiplicity, as [re, im] pairs. Example: flatRoots((s + 1)^2) is [[−1, 0], [−1, 0]]. */
export const flatRoots = (roots: RootInfo[]): [number, number][] =>
  roots.flatMap((r) => Array.from({ length: r.multiplicity }, (): [number, number] => [r.re, r.im]));

/**
 * The dominant poles: the real pole or complex pair closest to the imaginary axis (largest real part).
 * Example: poles −1 ± 2j and −10 → the pair −1 ± 2j.
 */
export function dominantPoles(poles: RootInfo[]): RootInfo[] {
  if (!poles.length) return [];
  const right = Math.max(...poles.map((p) => p.re));
  return poles.filter((p) => p.re >= right - 1e-9 * Math.max(1, Math.abs(right)));
}
