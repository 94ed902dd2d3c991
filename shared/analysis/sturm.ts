// Exact real-root counting (Sturm) so crossovers, axis roots and stability endpoints are never missed or
// invented by a float tolerance; the roots themselves are then located numerically and polished.
import { q, qDiv, qNeg, qSign, qToNumber, type Q } from "@shared/algebra/rational";
import { polyRoots } from "@shared/algebra/roots";
import {
  upDeg, upDeriv, upDivMod, upEval, upEvalFloat, upFloatsDesc, upFrom, upGcd, upLead, upScale, type UPoly,
} from "@shared/analysis/upoly";

/** A point of the extended real line. */
export type Point = Q | "-inf" | "+inf";

/** The Sturm sequence p, p', −rem, … (each scaled positively to keep numbers small). Example: of s^2 − 1. */
export function sturmSequence(p: UPoly): UPoly[] {
  const seq = [p, upDeriv(p)];
  while (seq[seq.length - 1].length > 1) {
    const r = upDivMod(seq[seq.length - 2], seq[seq.length - 1]).rem;
    if (!r.length) break;
    const lead = upLead(r);
    seq.push(upScale(r, qDiv(q(-1), lead.n < 0n ? qNeg(lead) : lead))); // −r / |lead|: same signs, small numbers
  }
  return seq;
}

function signAt(u: UPoly, x: Point): number {
  if (!u.length) return 0;
  if (x === "+inf") return qSign(upLead(u));
  if (x === "-inf") return qSign(upLead(u)) * (upDeg(u) % 2 ? -1 : 1);
  return qSign(upEval(u, x));
}

function variations(seq: readonly UPoly[], x: Point): number {
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
