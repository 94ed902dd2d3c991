// The Nyquist criterion from the curve itself: the winding of 1 + L(s) is tracked along the contour
// (imaginary axis with small detours right of axis poles, closed by a large arc), then Z = N + P.
import { polyRoots } from "@shared/algebra/roots";
import { ratEvalComplex, type Complex } from "@shared/analysis/frequency";
import { rootCounts } from "@shared/analysis/stability";
import { upAdd, upFloatsDesc, type UPoly } from "@shared/analysis/upoly";
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

/** Change of arg f along a path, subdividing any step that turns by more than π/8 (or leaves the finite). */
function argChange(f: (s: Complex) => Complex, path: Path, pieces = 64): number {
  const ang = (z: Complex) => Math.atan2(z[1], z[0]);
  let total = 0;
  const step = (u0: number, u1: number, z0: Complex, z1: Complex, depth: number): void => {
    let d = ang(z1) - ang(z0);
    d -= 2 * Math.PI * Math.round(d / (2 * Math.PI));
    if (Math.abs(d) > Math.PI / 8 && depth < 40) {
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
 * of radius δ right of the axis poles, closed by the arc of radius R through the right half-plane.
 * Example: L = 2/(s − 1) → −1.
 */
export function clockwiseEncirclements(L: (s: Complex) => Complex, axisPoles: number[], R: number, delta: number, pieces = 64): number {
  const f = (s: Complex): Complex => {
    const [re, im] = L(s);
    return [1 + re, im];
  };
  const turn = contour(axisPoles, R, delta).reduce((acc, path) => acc + argChange(f, path, pieces), 0);
  return -Math.round(turn / (2 * Math.PI)) || 0; // no −0
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
  const N = clockwiseEncirclements((s) => ratEvalComplex(num, den, s), axis, R, delta);
  const Z = N + P;
  const circles = N === 0 ? "does not encircle −1" : `encircles −1 ${counted(Math.abs(N), "time")} ${N < 0 ? "counter-clockwise" : "clockwise"}`;
  const reason =
    `${counted(P, "open-loop pole")} in the right half-plane (P = ${P}); L ${circles} (N = ${N}); ` +
    `Z = N + P = ${counted(Z, "closed-loop pole")} in the right half-plane.`;
  const check = Z === cl.rhp ? "" : ` (The exact count of closed-loop right-half-plane poles is ${cl.rhp}; the numeric encirclement count disagrees.)`;
  return { encirclements: N, openLoopRhpPoles: P, closedLoopRhpPoles: Z, verdict: Z === 0 ? "stable" : "unstable", reason: reason + check };
}
