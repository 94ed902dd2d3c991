// One analysis of the chosen pair at given parameter values (the nominal ones by default): what the results
// panel shows and the CLI prints. Pure and synchronous, so it runs in the Web Worker as is.
import { polyConst, polyParams } from "@shared/algebra/poly";
import { polyToText } from "@shared/algebra/polytext";
import { ratDenominator, ratNumerator, ratReduceTracked } from "@shared/algebra/ratfn";
import { qDiv, qOne, qToNumber, qToString, qZero } from "@shared/algebra/rational";
import { deadTimeAt, type DeadTimeReport } from "@shared/analysis/deadTime";
import { analyzeDelayedLoop, delayedBandwidth, delayedBode } from "@shared/analysis/delayedLoop";
import { delayedResponses, type DelayedResponses } from "@shared/analysis/delayedResponse";
import { exactFactors } from "@shared/analysis/factors";
import { bode, frequencyRange, type BodeData } from "@shared/analysis/frequency";
import { analyzeLoop, fractionText, zpkOf, type LoopAnalysis } from "@shared/analysis/loopAnalysis";
import { bandwidth } from "@shared/analysis/margins";
import { exactValues, polySubstitute, transferAt } from "@shared/analysis/nominal";
import { roundAxisEnd } from "@shared/analysis/axisSteps";
import { dominantPoles, rootsOf, type RootInfo } from "@shared/analysis/poles";
import type { PreparedAnalysis } from "@shared/analysis/prepare";
import { routhArray, type RouthArray } from "@shared/analysis/routh";
import { rootCounts, stabilityOf, type Stability } from "@shared/analysis/stability";
import { stableSet, type StableSet } from "@shared/analysis/stableSet";
import { inputRole } from "@shared/analysis/inputRole";
import { steadyState, type SteadyState } from "@shared/analysis/steadyState";
import { horizon, negligibleFrom, PLOT_SAMPLES, stepMetrics, type StepMetrics } from "@shared/analysis/stepMetrics";
import { timeResponse, type TimeResponse } from "@shared/analysis/timeResponse";
import { upDeg, upFromPoly, upText, upToPoly, type UPoly } from "@shared/analysis/upoly";

export interface AnalyzeOptions {
  /** Parameter values (missing ones take their nominal value). */
  values?: Record<string, number>;
  /** Settling band as a fraction; default 0.02. */
  settlingBand?: number;
  /** Stable parameter ranges and symbolic conditions (the slow part); default true. */
  stableSets?: boolean;
}

export interface HiddenMode {
  factor: string;
  roots: [number, number][];
  unstable: boolean;
  /** "reduction": cancelled for all parameter values; "values": cancels only at these values. */
  source: "reduction" | "values";
}

export interface Analysis {
  input: string;
  /** Dead times and the Padé order the figures rest on; null without dead times. */
  deadTime: DeadTimeReport | null;
  /** Step and ramp responses with the dead times kept exactly (simulated); null without dead times in T. */
  delayedResponses: DelayedResponses | null;
  output: string;
  values: Record<string, number>;
  transfer: { numerator: string; denominator: string; latex: string };
  poles: RootInfo[];
  zeros: RootInfo[];
  dominantPoles: RootInfo[];
  stability: Stability;
  characteristic: { polynomial: string; stability: Stability | null; sameVerdict: boolean | null };
  hiddenModes: HiddenMode[];
  dcGain: { value: number; exact: string } | null;
  routh: RouthArray;
  routhCharacteristic: RouthArray | null;
  stableSets: StableSet[];
  conditions: string[] | null;
  responses: { step: TimeResponse; impulse: TimeResponse; ramp: TimeResponse };
  step: StepMetrics;
  plotHorizon: number;
  bandwidth: number | null;
  bode: BodeData;
  loop: LoopAnalysis | null;
  steadyState: SteadyState;
  notes: string[];
}

const ONE = polyConst(qOne);

/** Largest degree for which the Routh first column is shown with several symbolic parameters. */
const CONDITIONS_DEGREE = 8;

/**
 * Every result for the prepared pair at the given values. Throws AnalysisError for a polynomial above
 * degree 100 or a singular transfer at the values. Example: analyzeAt(prepared).stability.verdict === "stable".
 */
export function analyzeAt(p: PreparedAnalysis, opts: AnalyzeOptions = {}): Analysis {
  const values = { ...p.nominal, ...(opts.values ?? {}) };
  const notes: string[] = [];
  const deadTime = p.delay && deadTimeAt(p.delay, values);
  if (deadTime) notes.push(deadTime.note);
  const { num, den, cancelled } = transferAt(p.transfer, values);
  const denFactors = exactFactors(den, "denominator");
  const poles = rootsOf(den, denFactors);
  const stability = stabilityOf(den);
  const chi = upFromPoly(polySubstitute(p.characteristic, exactValues(values)));
  const characteristic = characteristicAt(chi, stability, notes);
  const t0 = den[0].n !== 0n ? qDiv(num[0] ?? qZero, den[0]) : null; // T(0) unless s = 0 is a pole
  const dc = t0 && { value: qToNumber(t0), exact: qToString(t0) };
  const responses = {
    step: timeResponse(num, den, "step", denFactors),
    impulse: timeResponse(num, den, "impulse", denFactors),
    ramp: timeResponse(num, den, "ramp", denFactors),
  };
  if (!responses.step.exact) notes.push("Some poles are neither rational nor quadratic surds: their response terms are numeric (12 significant digits).");
  const step = metricsOrWhy(num, den, stability, dc?.value ?? null, responses.step, opts.settlingBand ?? 0.02, notes);
  // Dead times: the frequency-domain figures come from the exact response with e^(−jωT), the rest from Padé.
  const delays = p.delay && deadTime ? new Map(p.delay.delays.map((d, i) => [d.symbol, deadTime.report.delays[i].seconds])) : null;
  const exactL = p.delay?.exactL;
  const loopAt = p.loop
    ? delays && exactL
      ? analyzeDelayedLoop(p.loop.breakPoint, exactL, p.loop.L, values, delays)
      : analyzeLoop(p.loop.breakPoint, p.loop.L, values)
    : (p.loopNote ?? "");
  const loop = typeof loopAt === "string" ? null : loopAt;
  if (typeof loopAt === "string" && loopAt) notes.push(loopAt);
  const loopNumeric = p.loop && loop ? transferAt(p.loop.L, values) : null;
  const denSym = ratDenominator(p.transfer);
  const symbolic = polyParams(denSym);
  const horizonT = plotHorizon(responses.step, stability, poles, dc?.value ?? 0, notes);
  const delayed = delays && p.delay
    ? delayedResponses(p.delay.exactTransfer, values, delays, horizonT, {
        stable: stability.verdict === "stable" && (!loop || loop.nyquist.verdict === "stable"),
        finalValue: dc?.value ?? null,
        band: opts.settlingBand ?? 0.02,
      })
    : null;
  if (typeof delayed === "string") notes.push(delayed);
  if (typeof delayed !== "string" && delayed) notes.push(...delayed.notes);
  const wantSets = opts.stableSets ?? true;
  return {
    input: p.input,
    output: p.output,
    values,
    transfer: fractionText(num, den),
    poles,
    zeros: rootsOf(num),
    dominantPoles: dominantPoles(poles),
    stability,
    characteristic,
    hiddenModes: hiddenModes(p, values, cancelled),
    dcGain: dc,
    routh: routhArray(upToPoly(den)),
    routhCharacteristic: characteristic.stability ? routhArray(upToPoly(chi)) : null,
    stableSets: wantSets ? symbolic.map((name) => stableSet(denSym, name, values)) : [],
    conditions: wantSets && symbolic.length >= 2 && upDeg(den) <= CONDITIONS_DEGREE ? conditionsOf(routhArray(denSym)) : null,
    responses,
    step,
    plotHorizon: horizonT,
    ...closedLoopFrequency(p, values, delays, num, den),
    loop,
    steadyState: steadyState(num, den, stability.verdict, loopNumeric, inputRole(p.doc, p.input)),
    deadTime: deadTime?.report ?? null,
    delayedResponses: typeof delayed === "string" ? null : delayed,
    notes: [...notes, ...(loop?.notes ?? [])],
  };
}

/** Bandwidth and Bode data of the pair's transfer: exact with e^(−jωT) when it has dead times. */
function closedLoopFrequency(p: PreparedAnalysis, values: Record<string, number>, delays: ReadonlyMap<string, number> | null, num: UPoly, den: UPoly): { bandwidth: number | null; bode: BodeData } {
  if (delays && p.delay) {
    const { F, data } = delayedBode(p.delay.exactTransfer, p.transfer, values, delays);
    return { bandwidth: delayedBandwidth(F, data), bode: { omega: data.omega, magDb: data.magDb, phaseDeg: data.phaseDeg } };
  }
  const zpk = zpkOf(num, den);
  return { bandwidth: bandwidth(num, den), bode: bode(zpk, frequencyRange(zpk)) };
}

function characteristicAt(chi: UPoly, pair: Stability, notes: string[]): Analysis["characteristic"] {
  const polynomial = upText(chi);
  if (upDeg(chi) > 100) return { polynomial, stability: null, sameVerdict: null };
  const stability = stabilityOf(chi);
  const same = stability.verdict === pair.verdict;
  if (!same) notes.push(`The diagram's characteristic polynomial (hidden modes included) is ${stability.verdict}, the transfer function is ${pair.verdict}: ${stability.reason}`);
  return { polynomial, stability, sameVerdict: same };
}

function hiddenModes(p: PreparedAnalysis, values: Record<string, number>, atValues: UPoly): HiddenMode[] {
  const exact = exactValues(values);
  const mode = (u: UPoly, factor: string, source: HiddenMode["source"]): HiddenMode => {
    const c = rootCounts(u);
    return { factor, roots: rootsOf(u).flatMap((r) => Array.from({ length: r.multiplicity }, (): [number, number] => [r.re, r.im])), unstable: c.rhp + c.axis > 0, source };
  };
  const fromReduction = p.cancelled.map((c) => {
    const poly = ratNumerator(ratReduceTracked(c.factor, ONE).value);
    return mode(upFromPoly(polySubstitute(poly, exact)), polyToText(c.factor), "reduction");
  });
  return upDeg(atValues) >= 1 ? [...fromReduction, mode(atValues, upText(atValues), "values")] : fromReduction;
}

function metricsOrWhy(num: UPoly, den: UPoly, st: Stability, t0: number | null, r: TimeResponse, band: number, notes: string[]): StepMetrics {
  const empty: StepMetrics = { riseTime: null, peakTime: null, overshootPercent: null, settlingTime: null, finalValue: null, settlingBand: band };
  let why: string | null = null;
  if (st.verdict !== "stable") why = `Step metrics are not defined: the transfer function is ${st.verdict}.`;
  else if (upDeg(num) > upDeg(den)) why = "Step metrics are not defined: T is improper (the step response starts with impulses).";
  else if (!t0) why = "Step metrics are not defined: T(0) = 0, the step response returns to 0.";
  if (why) {
    notes.push(why);
    return { ...empty, finalValue: st.verdict === "stable" ? t0 : null };
  }
  const m = stepMetrics(r, t0 as number, band, notes);
  if (m.peakTime === null) notes.push("No overshoot: the response never exceeds its final value, so there is no peak time.");
  return m;
}

/** Samples per period a plot needs to draw an oscillation: 400 samples hold 20 periods. */
const SAMPLES_PER_PERIOD = 20;

/**
 * How far in t the responses are plotted: until they settle (or ten time constants when unstable), to a round end;
 * never more periods of the fastest oscillation than the plot's samples can draw (a note says so).
 */
function plotHorizon(r: TimeResponse, st: Stability, poles: RootInfo[], t0: number, notes: string[]): number {
  // Settled to 1e-3 of the response's own size (its final value, else its largest term), whatever its units.
  const size = Math.abs(t0) || Math.max(0, ...r.terms.map((x) => Math.abs(x.coefficient)));
  let end: number;
  if (st.verdict === "stable") {
    end = (size > 0 && horizon(r, 1e-3 * size)) || 1;
  } else {
    end = 10 / Math.max(...poles.map((x) => Math.hypot(x.re, x.im)).filter((x) => x > 0), 1e-3);
  }
  // An oscillation still visible after 20 of its periods cannot be drawn with the plot's samples: the plot stops there.
  const periodsShown = PLOT_SAMPLES / SAMPLES_PER_PERIOD;
  const aliased = r.terms.filter((x) => {
    if (x.frequency === 0 || x.coefficient === 0) return false;
    const shown = (periodsShown * 2 * Math.PI) / x.frequency;
    const visibleUntil = x.decay > 0 ? negligibleFrom(x, 1e-3 * size) : Infinity;
    return visibleUntil > shown && end > shown;
  });
  if (aliased.length) {
    const omega = Math.max(...aliased.map((x) => x.frequency));
    const periods = (end * omega) / (2 * Math.PI);
    end = (periodsShown * 2 * Math.PI) / omega;
    notes.push(`The plots show the first ${periodsShown} periods of the oscillation at ω = ${omega.toPrecision(4)} rad/s (${PLOT_SAMPLES} samples cannot draw more); the response goes on for about ${Math.round(periods)} periods.`);
  }
  return roundAxisEnd(end);
}

function conditionsOf(r: RouthArray): string[] {
  const [first, ...rest] = r.firstColumn;
  const positive = /^\d+(\/\d+)?$/.test(first);
  return rest.map((e) => (positive ? `${e} > 0` : `sign(${e}) = sign(${first})`));
}
