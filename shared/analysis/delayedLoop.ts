// The loop quantities of a loop with dead times, from the exact L(jω) with e^(−jωT): margins, crossovers,
// delay margin, Ms, Bode and Nyquist data and the Nyquist verdict. Only P, the open-loop right-half-plane poles,
// comes from the Padé model, whose extra poles all lie in the left half-plane.
import { polyToLatex, polyToText } from "@shared/algebra/polytext";
import { ratDenominator, ratNumerator, type RatFn } from "@shared/algebra/ratfn";
import { polyParams } from "@shared/algebra/poly";
import { isDelaySymbol } from "@shared/expr/names";
import { bisect, phaseCrossings, sampleResponse, signChanges, type Response } from "@shared/analysis/delayedFrequency";
import { bode, frequencyRange, type BodeData, type Complex } from "@shared/analysis/frequency";
import type { BreakPoint } from "@shared/analysis/loopGain";
import { zpkOf, type LoopAnalysis } from "@shared/analysis/loopAnalysis";
import { delayMargin, type Crossover, type Margins } from "@shared/analysis/margins";
import { exactValues, polySubstitute, transferAt } from "@shared/analysis/nominal";
import { clockwiseEncirclements, type Nyquist } from "@shared/analysis/nyquist";
import { polyRoots } from "@shared/algebra/roots";
import { quasiEvaluator } from "@shared/analysis/quasi";
import { rootCounts } from "@shared/analysis/stability";
import { upAdd, upFloatsDesc } from "@shared/analysis/upoly";
import { counted } from "@shared/text/words";

const wrap = (deg: number) => {
  const r = deg - 360 * Math.floor((deg + 180) / 360);
  return r === -180 ? 180 : r;
};
const smallest = (xs: Crossover[]): Crossover | null =>
  xs.reduce<Crossover | null>((best, x) => (best === null || Math.abs(x.margin) < Math.abs(best.margin) ? x : best), null);
const abs = (z: Complex) => Math.hypot(z[0], z[1]);

/** Text and LaTeX of a transfer at parameter values with its dead times kept. */
function quasiText(r: RatFn, values: Readonly<Record<string, number>>) {
  const exact = exactValues(values);
  const num = polySubstitute(ratNumerator(r), exact);
  const den = polySubstitute(ratDenominator(r), exact);
  return { numerator: polyToText(num), denominator: polyToText(den), latex: `\\frac{${polyToLatex(num)}}{${polyToLatex(den)}}` };
}

/**
 * The exact frequency response of a transfer with dead times on the range its Padé model suggests, phase
 * aligned with the Padé model's at the low end. Example: e^(−s/2)/(s + 1) → a phase that falls without bound.
 */
export function delayedBode(exact: RatFn, pade: RatFn, values: Readonly<Record<string, number>>, delays: ReadonlyMap<string, number>, extra: number[] = []) {
  const { num, den } = transferAt(pade, values);
  const zpk = zpkOf(num, den);
  const range = frequencyRange(zpk, [...extra, ...[...delays.values()].filter((T) => T > 0).map((T) => 1 / T)]);
  const F = quasiEvaluator(exact, values, delays);
  const response: Response = (w) => F([0, w]);
  const phase0 = bode(zpk, [range[0], range[0] * 1.0001], 1).phaseDeg[0];
  return { response, F, data: sampleResponse(response, range, phase0), padeNum: num, padeDen: den };
}

/**
 * Closed-loop bandwidth from the exact response: the first ω where |T(jω)| falls to |T(0)|/√2 (T(0) with every
 * e^0 = 1); null when T(0) is 0 or infinite or |T| never falls that far on the sampled range.
 */
export function delayedBandwidth(F: (s: Complex) => Complex, data: BodeData): number | null {
  const t0 = abs(F([0, 0]));
  if (!Number.isFinite(t0) || t0 === 0) return null;
  const g = (w: number) => abs(F([0, w])) - t0 / Math.SQRT2;
  const sampled = data.omega.map(g);
  return signChanges(data, sampled, g)[0] ?? null;
}

/**
 * The loop quantities of L with its dead times kept at parameter values; a sentence when L is 0 there.
 * Example: L = 2e^(−s/2)/(s + 1) → PM 70.4° at ω = √3, GM 5.59 dB at ω ≈ 3.67, delay margin 0.709 s.
 */
export function analyzeDelayedLoop(bp: BreakPoint, exactL: RatFn, padeL: RatFn, values: Readonly<Record<string, number>>, delays: ReadonlyMap<string, number>): LoopAnalysis | string {
  const { response, F, data, padeNum, padeDen } = delayedBode(exactL, padeL, values, delays);
  if (!padeNum.length) return `The loop gain at ${bp.label} is 0: no loop passes through that wire.`;
  const notes: string[] = [];
  const logMag = (w: number) => Math.log(abs(response(w)));
  const gainCrossovers = signChanges(data, data.omega.map(logMag), logMag).map((omega) => ({ omega, margin: wrap(180 + (Math.atan2(response(omega)[1], response(omega)[0]) * 180) / Math.PI) }));
  const phaseCrossovers = phaseCrossings(response, data).map((omega) => ({ omega, margin: -20 * Math.log10(abs(response(omega))) }));
  const hi = data.omega[data.omega.length - 1];
  notes.push(`Dead times are kept exact in L(jω) = e^(−jωT)·…: margins, crossovers, Ms and the Nyquist plot are searched on 0 < ω ≤ ${Number(hi.toPrecision(3))} rad/s.`);
  const gm = smallest(phaseCrossovers);
  const pm = smallest(gainCrossovers);
  if (!gm) notes.push("No phase crossover on the searched range: the gain margin is taken as infinite.");
  if (!pm) notes.push("No gain crossover on the searched range: the phase margin is taken as infinite.");
  const margins: Margins = {
    gainMarginDb: gm?.margin ?? null,
    phaseMarginDeg: pm?.margin ?? null,
    gainCrossover: pm?.omega ?? null,
    phaseCrossover: gm?.omega ?? null,
    gainCrossovers,
    phaseCrossovers,
    notes: [],
  };
  const nyquist = delayedNyquist(F, padeNum, padeDen, delays, exactL, notes);
  const stable = nyquist.verdict === "stable";
  if (!stable) notes.push("The delay margin is not defined: the closed loop at the break is not stable.");
  const peak = sensitivityPeakOn(response, data);
  return {
    breakPoint: { index: bp.index, label: bp.label, chosen: bp.chosen },
    L: quasiText(exactL, values),
    margins,
    delayMargin: stable ? delayMargin(gainCrossovers) : null,
    sensitivityPeak: peak,
    nyquist,
    bode: { omega: data.omega, magDb: data.magDb, phaseDeg: data.phaseDeg },
    nyquistPoints: data.values,
    notes,
  };
}

/** Ms = max |1/(1 + L(jω))| over the samples, the best refined by bisection on the slope. */
function sensitivityPeakOn(L: Response, data: BodeData & { values: Complex[] }): { value: number; omega: number } | null {
  const S = (w: number) => 1 / abs([1 + L(w)[0], L(w)[1]]);
  const sampled = data.values.map((v) => 1 / abs([1 + v[0], v[1]]));
  let i = sampled.indexOf(Math.max(...sampled));
  if (!Number.isFinite(sampled[i])) return null;
  const [a, b] = [data.omega[Math.max(0, i - 1)], data.omega[Math.min(data.omega.length - 1, i + 1)]];
  const slope = (w: number) => S(w * (1 + 1e-7)) - S(w * (1 - 1e-7));
  const w = a < b && Math.sign(slope(a)) !== Math.sign(slope(b)) ? bisect(slope, a, b) : data.omega[i];
  i = S(w) >= sampled[i] ? -1 : i;
  return i === -1 ? { value: S(w), omega: w } : { value: sampled[i], omega: data.omega[i] };
}

/**
 * Nyquist verdict from the exact curve: N from the winding of 1 + L(s) along the contour (e^(−sT) evaluated on
 * it), P from the Padé model's open-loop poles (its added poles are all stable). Undetermined when |L| does not
 * fall off at high frequency, where the curve never closes.
 */
function delayedNyquist(F: (s: Complex) => Complex, num: ReturnType<typeof transferAt>["num"], den: ReturnType<typeof transferAt>["den"], delays: ReadonlyMap<string, number>, exactL: RatFn, notes: string[]): Nyquist {
  const open = rootCounts(den);
  const P = open.rhp;
  if (polyParams(ratDenominator(exactL)).some(isDelaySymbol)) notes.push("L has a dead time in its denominator (a delay inside an inner loop): its count of open-loop right-half-plane poles P comes from the Padé model.");
  const roots = [...polyRoots(upFloatsDesc(den)), ...polyRoots(upFloatsDesc(upAdd(den, num)))];
  let R = 4 * (1 + Math.max(0, ...roots.map(([re, im]) => Math.hypot(re, im))));
  const small = (r: number) => [0, Math.PI / 4, Math.PI / 2].every((th) => abs(F([r * Math.cos(th), r * Math.sin(th)])) < 1e-2);
  for (let i = 0; i < 40 && !small(R); i++) R *= 2;
  if (!small(R)) {
    return { encirclements: null, openLoopRhpPoles: P, closedLoopRhpPoles: null, verdict: "marginal", reason: "|L(jω)| does not fall off at high frequency, so the Nyquist curve of the delayed loop never closes: the criterion cannot be applied." };
  }
  const axis = open.axisFrequencies.flatMap((w) => (w === 0 ? [0] : [-w, w]));
  const tMax = Math.max(0, ...delays.values());
  const gaps = roots.flatMap(([re, im]) => axis.map((w) => Math.hypot(re, im - w))).filter((g) => g > 1e-9);
  const delta = 1e-3 * Math.min(1, ...gaps);
  // Enough pieces that no single one spans a whole turn of e^(−jωT).
  const N = clockwiseEncirclements(F, axis, R, delta, Math.min(20000, 64 + Math.ceil((8 * R * tMax) / Math.PI)));
  if (N === null) {
    return { encirclements: null, openLoopRhpPoles: P, closedLoopRhpPoles: null, verdict: "marginal", reason: "The Nyquist curve of the delayed loop could not be followed (its phase is lost to rounding near a pole on the axis): the criterion cannot be applied." };
  }
  const Z = N + P;
  const circles = N === 0 ? "does not encircle −1" : `encircles −1 ${counted(Math.abs(N), "time")} ${N < 0 ? "counter-clockwise" : "clockwise"}`;
  const reason = `${counted(P, "open-loop pole")} in the right half-plane (P = ${P}); the exact L with e^(−sT) ${circles} (N = ${N}); Z = N + P = ${counted(Z, "closed-loop pole")} in the right half-plane.`;
  return { encirclements: N, openLoopRhpPoles: P, closedLoopRhpPoles: Z, verdict: Z === 0 ? "stable" : "unstable", reason };
}
