// Margins, sensitivity peak and bandwidth from exact polynomials in x = ω²: every crossover is a positive
// root counted exactly (Sturm), so none is missed between grid points.
import { q, qDiv, qMul, qToNumber, qZero, type Q } from "@shared/algebra/rational";
import { polyRoots } from "@shared/algebra/roots";
import { ratEvalComplex, upEvalComplex } from "@shared/analysis/frequency";
import { rootCounts } from "@shared/analysis/stability";
import { realRoots } from "@shared/analysis/sturm";
import {
  upAdd, upEvalFloat, upFloatsDesc, upFrom, upLead, upMagnitudeSquared, upMul, upOnAxis, upScale, upSub, type UPoly,
} from "@shared/analysis/upoly";

export interface Crossover {
  omega: number;
  /** dB for a phase crossover, degrees for a gain crossover. */
  margin: number;
}

export interface Margins {
  gainMarginDb: number | null;
  phaseMarginDeg: number | null;
  gainCrossover: number | null;
  phaseCrossover: number | null;
  gainCrossovers: Crossover[];
  phaseCrossovers: Crossover[];
  notes: string[];
}

const ZERO: Q = qZero;
const positiveOmegas = (px: UPoly): number[] => (px.length ? realRoots(px, ZERO).map(Math.sqrt) : []);

/** Phase in (−180°, 180°] of a complex number. */
const angleDeg = ([re, im]: [number, number]) => (Math.atan2(im, re) * 180) / Math.PI;
/** Into (−180, 180]. */
const wrap = (deg: number) => {
  const r = deg - 360 * Math.floor((deg + 180) / 360);
  return r === -180 ? 180 : r;
};

const smallest = (xs: Crossover[]): Crossover | null =>
  xs.reduce<Crossover | null>((best, x) => (best === null || Math.abs(x.margin) < Math.abs(best.margin) ? x : best), null);

/**
 * Gain and phase margins of a loop gain L = num/den: gain crossovers |L(jω)| = 1, phase crossovers where
 * L(jω) is real and negative, finite ω > 0; with several, the one with the smallest |margin|.
 * Example: L = 2/(s + 1)^3 → gain margin 12.04 dB at ω = √3, phase margin 67.6° at ω = 0.766.
 */
export function margins(num: UPoly, den: UPoly): Margins {
  const notes: string[] = [];
  const L = (w: number) => ratEvalComplex(num, den, [0, w]);
  const gainCrossovers = positiveOmegas(upSub(upMagnitudeSquared(num), upMagnitudeSquared(den))).map((omega) => ({
    omega,
    margin: wrap(180 + angleDeg(L(omega))),
  }));
  const n = upOnAxis(num);
  const d = upOnAxis(den);
  const imag = upSub(upMul(n.im, d.re), upMul(n.re, d.im)); // Im(N·conj D): odd in ω
  const real = upAdd(upMul(n.re, d.re), upMul(n.im, d.im));
  const oddToX = upFrom(imag.filter((_, i) => i % 2 === 1));
  if (!imag.length && num.length) notes.push("L(jω) is real at every frequency: no isolated phase crossover.");
  const phaseCrossovers = positiveOmegas(oddToX)
    .filter((w) => {
      const re = upEvalFloat(real, w);
      const scale = Math.hypot(...L(w));
      return re < 0 && Number.isFinite(scale) && scale > 0;
    })
    .map((omega) => ({ omega, margin: -20 * Math.log10(Math.hypot(...L(omega))) }));
  const gm = smallest(phaseCrossovers);
  const pm = smallest(gainCrossovers);
  if (!gm) notes.push("No phase crossover (L(jω) never real and negative at a finite ω > 0): the gain margin is infinite.");
  if (!pm) notes.push("No gain crossover (|L(jω)| never equals 1 at a finite ω > 0): the phase margin is infinite.");
  return {
    gainMarginDb: gm?.margin ?? null,
    phaseMarginDeg: pm?.margin ?? null,
    gainCrossover: pm?.omega ?? null,
    phaseCrossover: gm?.omega ?? null,
    gainCrossovers,
    phaseCrossovers,
    notes,
  };
}

/**
 * Smallest extra loop delay that makes a gain crossover reach −180°: min over crossovers of
 * (phase margin in [0°, 360°) in rad)/ω. Null without a gain crossover. Example: L = 1/s → π/2 s.
 */
export function delayMargin(crossovers: Crossover[]): number | null {
  if (!crossovers.length) return null;
  return Math.min(...crossovers.map(({ omega, margin }) => ((((margin % 360) + 360) % 360) * Math.PI) / 180 / omega));
}

/** Golden-section search for the maximum of f on [a, b] (f unimodal there). */
function goldenMax(f: (x: number) => number, a: number, b: number): number {
  const g = (Math.sqrt(5) - 1) / 2;
  let [c, d] = [b - g * (b - a), a + g * (b - a)];
  let [fc, fd] = [f(c), f(d)];
  for (let i = 0; i < 100 && b - a > 1e-12 * Math.max(1, Math.abs(b)); i++) {
    if (fc > fd) {
      [b, d, fd] = [d, c, fc];
      c = b - g * (b - a);
      fc = f(c);
    } else {
      [a, c, fc] = [c, d, fd];
      d = a + g * (b - a);
      fd = f(d);
    }
  }
  return (a + b) / 2;
}

/**
 * Ms = max over ω of |1/(1 + L(jω))| = |den/(den + num)|, with the frequency; null when the closed loop
 * has a pole on the imaginary axis (Ms infinite). A log grid is searched together with the closed-loop
 * poles' frequencies (where resonance peaks sit) and the best point refined by golden section.
 * Example: L = 1/s → Ms = 1 (approached as ω → ∞).
 */
export function sensitivityPeak(num: UPoly, den: UPoly): { value: number; omega: number } | null {
  const closed = upAdd(den, num);
  if (rootCounts(closed).axis > 0) return null;
  const S = (w: number) => Math.hypot(...upEvalComplex(den, [0, w])) / Math.hypot(...upEvalComplex(closed, [0, w]));
  const roots = polyRoots(upFloatsDesc(closed)).concat(polyRoots(upFloatsDesc(den)));
  const mags = roots.map(([re, im]) => Math.hypot(re, im)).filter((m) => m > 0);
  const lo = Math.log10(Math.min(1, ...mags)) - 2;
  const hi = Math.log10(Math.max(1, ...mags)) + 2;
  const grid = Array.from({ length: 401 }, (_, i) => 10 ** (lo + ((hi - lo) * i) / 400));
  const candidates = [...grid, ...roots.map(([, im]) => Math.abs(im)).filter((w) => w > 0)].sort((a, b) => a - b);
  const values = candidates.map(S);
  let best = { value: S(0), omega: 0 };
  // Refine every local maximum of the sampled values on its bracketing neighbours.
  values.forEach((v, i) => {
    if (v < (values[i - 1] ?? -Infinity) || v < (values[i + 1] ?? -Infinity)) return;
    const w = goldenMax(S, candidates[Math.max(0, i - 1)], candidates[Math.min(candidates.length - 1, i + 1)]);
    const at = S(w) > v ? w : candidates[i];
    if (S(at) > best.value) best = { value: S(at), omega: at };
  });
  const atInfinity = closed.length === den.length ? Math.abs(qToNumber(upLead(den)) / qToNumber(upLead(closed))) : 0;
  return atInfinity > best.value * (1 + 1e-12) ? { value: atInfinity, omega: Infinity } : best;
}

/**
 * Closed-loop bandwidth: the first ω > 0 where |T(jω)| falls to |T(0)|/√2; null when T(0) is 0 or infinite
 * or |T| never falls that far. Example: 1/(s + 1) → 1 rad/s.
 */
export function bandwidth(num: UPoly, den: UPoly): number | null {
  if (!num.length || !den.length || den[0].n === 0n || num[0].n === 0n) return null;
  const t0 = qDiv(num[0], den[0]);
  const half = qMul(qMul(t0, t0), q(1, 2));
  const roots = positiveOmegas(upSub(upMagnitudeSquared(num), upScale(upMagnitudeSquared(den), half)));
  return roots.length ? roots[0] : null;
}
