// The Nyquist criterion from the curve itself: the winding of 1 + L(s) is tracked along the contour
// (imaginary axis with small detours right of axis poles, closed by a large arc), then Z = N + P.
import { polyRoots } from "@shared/algebra/roots";
import { qToNumber } from "@shared/algebra/rational";
import { exactFactors } from "@shared/analysis/factors";
import { upEvalComplex, type Complex } from "@shared/analysis/frequency";
import { rootCounts } from "@shared/analysis/stability";
import { upAdd, upFloatsDesc, upLead, type UPoly } from "@shared/analysis/upoly";
import { counted } from "@shared/text/words";

export interface Nyquist {
  /** Clockwise encirclements of −1 by L along the contour; null when the curve passes through −1. */
  encirclements: number | null;
  openLoopRhpPoles: number;
  /** Z = N + P by the criterion; null when N is undefined. */
  closedLoopRhpPoles: number | null;
  verdict: "stable" | "unstable" | "marginal";
  reason: string;
}

type Path = (u: number) => Complex;

/** Most evaluations one contour may take: where rounding makes the phase noise, halving would never end. */
const MAX_EVALUATIONS = 200_000;

class CurveLost extends Error {}

/** Change of arg f along a path, subdividing any step that turns by more than π/8 (or leaves the finite). */
function argChange(f: (s: Complex) => Complex, path: Path, pieces: number, spent: { evaluations: number }): number {
  const ang = (z: Complex) => Math.atan2(z[1], z[0]);
  let total = 0;
  const step = (u0: number, u1: number, z0: Complex, z1: Complex, depth: number): void => {
    let d = ang(z1) - ang(z0);
    d -= 2 * Math.PI * Math.round(d / (2 * Math.PI));
    if (Math.abs(d) > Math.PI / 8 && depth < 40) {
      if (++spent.evaluations > MAX_EVALUATIONS) throw new CurveLost();
      const um = (u0 + u1) / 2;
      const zm = f(path(um));
      step(u0, um, z0, zm, depth + 1);
      step(um, u1, zm, z1, depth + 1);
    } else total += d;
  };
  let prev = f(path(0));
  for (let i = 1; i <= pieces; i++) {
    const next = f(path(i / pieces));
    step((i - 1) / pieces, i / pieces, prev, next, 0);
    prev = next;
  }
  return total;
}

/** Piecewise path along the axis from −R to R, detouring right of the given axis points by radius δ. */
function contour(axisPoles: number[], R: number, delta: number): Path[] {
  const marks = [...new Set(axisPoles)].filter((w) => Math.abs(w) < R).sort((a, b) => a - b);
  const paths: Path[] = [];
  let from = -R;
  for (const w of marks) {
    const [a, b] = [from, w - delta];
    paths.push((u) => [0, a + (b - a) * u]);
    paths.push((u) => {
      const th = -Math.PI / 2 + Math.PI * u;
      return [delta * Math.cos(th), w + delta * Math.sin(th)];
    });
    from = w + delta;
  }
  const last = from;
  paths.push((u) => [0, last + (R - last) * u]);
  paths.push((u) => {
    const th = Math.PI / 2 - Math.PI * u; // clockwise large arc through the right half-plane
    return [R * Math.cos(th), R * Math.sin(th)];
  });
  return paths;
}

/**
 * Clockwise encirclements of −1 by L along the Nyquist contour: the imaginary axis from −R to R with detours
 * of radius δ right of the axis poles, closed by the arc of radius R through the right half-plane. Null when the
 * curve cannot be followed within MAX_EVALUATIONS (its phase is rounding noise somewhere). Example: L = 2/(s − 1) → −1.
 */
export function clockwiseEncirclements(L: (s: Complex) => Complex, axisPoles: number[], R: number, delta: number, pieces = 64): number | null {
  const f = (s: Complex): Complex => {
    const [re, im] = L(s);
    return [1 + re, im];
  };
  const spent = { evaluations: 0 };
  try {
    const turn = contour(axisPoles, R, delta).reduce((acc, path) => acc + argChange(f, path, pieces, spent), 0);
    return -Math.round(turn / (2 * Math.PI)) || 0; // no −0
  } catch (err) {
    if (err instanceof CurveLost) return null;
    throw err;
  }
}

/**
 * L = num/den evaluated through the exact factors of both, so that near a repeated pole on the axis each
 * factor is small on its own instead of the expanded polynomial cancelling to rounding noise.
 */
function factoredEvaluator(num: UPoly, den: UPoly): (s: Complex) => Complex {
  const mul = ([a, b]: Complex, [c, d]: Complex): Complex => [a * c - b * d, a * d + b * c];
  const product = (u: UPoly): ((s: Complex) => Complex) => {
    const lead = qToNumber(upLead(u));
    const factors = exactFactors(u);
    return (s) => factors.reduce<Complex>((acc, f) => {
      const v = upEvalComplex(f.poly, s);
      let out = acc;
      for (let i = 0; i < f.multiplicity; i++) out = mul(out, v);
      return out;
    }, [lead, 0]);
  };
  const [n, d] = [product(num), product(den)];
  return (s) => {
    const [a, b] = n(s);
    const [c, e] = d(s);
    const m = c * c + e * e;
    return [(a * c + b * e) / m, (b * c - a * e) / m];
  };
}

/**
 * Nyquist verdict for the loop gain L = num/den (lowest terms): P open-loop RHP poles (exact), N clockwise
 * encirclements of −1 (from the curve), Z = N + P closed-loop RHP poles. Example: L = 2/(s − 1) encircles
 * −1 once counter-clockwise: N = −1, P = 1, Z = 0 — stable.
 */
export function nyquist(num: UPoly, den: UPoly): Nyquist {
  const open = rootCounts(den);
  const P = open.rhp;
  const closed = upAdd(den, num);
  const cl = rootCounts(closed);
  if (cl.axis > 0) {
    return { encirclements: null, openLoopRhpPoles: P, closedLoopRhpPoles: null, verdict: "marginal", reason: "L(jω) passes through −1: the closed loop has poles on the imaginary axis." };
  }
  const all = [...polyRoots(upFloatsDesc(den)), ...polyRoots(upFloatsDesc(closed))];
  const R = 4 * (1 + Math.max(0, ...all.map(([re, im]) => Math.hypot(re, im))));
  const axis = open.axisFrequencies.flatMap((w) => (w === 0 ? [0] : [-w, w]));
  const gaps = all.flatMap(([re, im]) => axis.map((w) => Math.hypot(re, im - w))).filter((g) => g > 1e-9);
  const delta = 1e-3 * Math.min(1, ...gaps);
  const N = clockwiseEncirclements(factoredEvaluator(num, den), axis, R, delta);
  if (N === null) {
    const verdict = cl.rhp === 0 ? "stable" : "unstable";
    const reason = `The Nyquist curve could not be followed (its phase is lost to rounding near a pole on the axis); the exact count of closed-loop right-half-plane poles is ${cl.rhp} (P = ${P}).`;
    return { encirclements: null, openLoopRhpPoles: P, closedLoopRhpPoles: cl.rhp, verdict, reason };
  }
  const Z = N + P;
  const circles = N === 0 ? "does not encircle −1" : `encircles −1 ${counted(Math.abs(N), "time")} ${N < 0 ? "counter-clockwise" : "clockwise"}`;
  const reason =
    `${counted(P, "open-loop pole")} in the right half-plane (P = ${P}); L ${circles} (N = ${N}); ` +
    `Z = N + P = ${counted(Z, "closed-loop pole")} in the right half-plane.`;
  const check = Z === cl.rhp ? "" : ` (The exact count of closed-loop right-half-plane poles is ${cl.rhp}; the numeric encirclement count disagrees.)`;
  return { encirclements: N, openLoopRhpPoles: P, closedLoopRhpPoles: Z, verdict: Z === 0 ? "stable" : "unstable", reason: reason + check };
}
