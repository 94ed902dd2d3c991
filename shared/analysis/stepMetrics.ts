// Step metrics read off the closed-form response: an adaptive grid finds each event, bisection on the
// closed form pins it down; the horizon comes from an envelope bound, so nothing after it can matter.
import { responseAt, responseSlopeAt, type TimeResponse } from "@shared/analysis/timeResponse";

export interface StepMetrics {
  riseTime: number | null;
  peakTime: number | null;
  overshootPercent: number | null;
  settlingTime: number | null;
  finalValue: number | null;
  /** The settling band used, as a fraction (0.02 = ±2 %). */
  settlingBand: number;
}

/** Overshoot below this fraction of the final value is rounding, not overshoot. */
const OVERSHOOT_FLOOR = 1e-9;

/** Σ |c|·t^k·e^{−σt} over the decaying terms: a bound on |y(t) − y(∞)|. */
function envelope(r: TimeResponse, t: number): number {
  let e = 0;
  for (const x of r.terms) if (x.decay > 0) e += Math.abs(x.coefficient) * t ** x.power * Math.exp(-x.decay * t);
  return e;
}

/**
 * A time after which |y(t) − y(∞)| stays below tol (the envelope decreases for t > k/σ).
 * Example: horizon(step of 1/(s + 1), 1e-6) ≈ 13.8.
 */
export function horizon(r: TimeResponse, tol: number): number {
  const decaying = r.terms.filter((x) => x.decay > 0);
  if (!decaying.length) return 1;
  let t = Math.max(...decaying.map((x) => (x.power + 1) / x.decay));
  for (let i = 0; i < 200 && envelope(r, t) >= tol; i++) t *= 1.25;
  return t;
}

/** |c|·(t + 1)^k·e^{−σt}: the size of a term, which the grid compares with 1e-12 of the final value. */
const size = (x: TimeResponse["terms"][number], t: number): number => Math.abs(x.coefficient) * (t + 1) ** x.power * Math.exp(-x.decay * t);

/**
 * The time from which a decaying term's size stays below tol for good: past its peak (t + 1 = k/σ) the size only
 * falls, so one bisection replaces a test at every grid point. −Infinity when it never reaches tol.
 */
export function negligibleFrom(x: TimeResponse["terms"][number], tol: number): number {
  if (!(tol > 0)) return Infinity; // a tolerance that underflowed to 0 is never reached
  const peak = Math.max(0, x.power / x.decay - 1);
  if (size(x, peak) < tol) return -Infinity;
  let [a, b] = [peak, peak + 1 / x.decay];
  while (size(x, b) >= tol && Number.isFinite(b)) [a, b] = [b, b + 2 * (b - peak)];
  for (let i = 0; i < 200 && b - a > 1e-15 * b; i++) {
    const m = (a + b) / 2;
    if (size(x, m) >= tol) a = m;
    else b = m;
  }
  return b;
}

/** Most points a metrics grid may have: a lightly damped or widely spread response would otherwise need billions. */
export const MAX_GRID = 100_000;

/** The fastest rate (|σ + jω|) of the terms, which sets the grid step. */
const fastestRate = (r: TimeResponse): number => Math.max(0, ...r.terms.map((x) => Math.hypot(x.decay, x.frequency)));

/**
 * Grid from 0 towards tEnd whose step follows the fastest term still alive (1/20 of its time scale), at most
 * MAX_GRID points: `complete` says whether it reached tEnd.
 */
function grid(r: TimeResponse, tEnd: number, scale: number): { ts: number[]; complete: boolean } {
  const ts = [0];
  const maxStep = tEnd / 400;
  const tol = 1e-12 * scale;
  const terms = r.terms.map((x) => ({
    rate: Math.hypot(x.decay, x.frequency),
    decaying: x.decay > 0,
    rising: x.decay > 0 && x.power > 0 ? x.power / x.decay - 1 : 0,
    until: x.decay > 0 ? negligibleFrom(x, tol) : Infinity,
    x,
  }));
  while (ts[ts.length - 1] < tEnd && ts.length < MAX_GRID) {
    const t = ts[ts.length - 1];
    let rate = 0;
    for (const d of terms) {
      const alive = !d.decaying || (t < d.until && (t >= d.rising || size(d.x, t) >= tol));
      if (alive) rate = Math.max(rate, d.rate);
    }
    ts.push(Math.min(tEnd, t + Math.min(maxStep, rate > 0 ? 1 / (20 * rate) : maxStep)));
  }
  return { ts, complete: ts[ts.length - 1] >= tEnd };
}

/** Root of f in [a, b] where f(a), f(b) differ in sign (bisection to full double precision). */
function bisect(f: (t: number) => number, a: number, b: number): number {
  let fa = f(a);
  for (let i = 0; i < 200 && b - a > 1e-15 * Math.max(1, Math.abs(b)); i++) {
    const m = (a + b) / 2;
    const fm = f(m);
    if (fm === 0) return m;
    if (fm > 0 === fa > 0) [a, fa] = [m, fm];
    else b = m;
  }
  return (a + b) / 2;
}

/**
 * Rise time (10–90 %), peak time, percent overshoot, settling time (last exit from the ±band) and final
 * value of a step response whose final value is finalValue ≠ 0 (metrics on y/finalValue). Call only for
 * stable systems. When the response needs more than MAX_GRID points (time scales decades apart, a lightly damped
 * mode), the early metrics come from the first MAX_GRID points, the settling time from the envelope, and `notes`
 * says what could not be resolved. Example: for 1/(s^2 + s + 1) the overshoot is 16.30 % (= 100·exp(−ζπ/√(1−ζ²)), ζ = 1/2).
 */
export function stepMetrics(r: TimeResponse, finalValue: number, band = 0.02, notes: string[] = []): StepMetrics {
  const g = (t: number) => responseAt(r, t) / finalValue;
  const scale = Math.abs(finalValue);
  const tEnd = horizon(r, 1e-6 * scale);
  const { ts, complete } = grid(r, tEnd, scale);
  const ys = ts.map(g);
  const firstReach = (level: number): number | null => {
    if (ys[0] >= level) return 0;
    const i = ys.findIndex((y) => y >= level);
    return i < 0 ? null : bisect((t) => g(t) - level, ts[i - 1], ts[i]);
  };
  const t10 = firstReach(0.1);
  const t90 = firstReach(0.9);
  const seen = ts[ts.length - 1];
  if (!complete && (t10 === null || t90 === null)) notes.push(`The rise time is not resolved: the response does not reach 90 % of its final value within the first ${MAX_GRID} grid points (t ≤ ${seen.toPrecision(3)} s).`);
  let iMax = 0;
  for (let i = 1; i < ys.length; i++) if (ys[i] > ys[iMax]) iMax = i;
  let peakTime: number | null = null;
  let overshoot = 0;
  if (ys[iMax] - 1 > OVERSHOOT_FLOOR) {
    const [a, b] = [ts[Math.max(0, iMax - 1)], ts[Math.min(ts.length - 1, iMax + 1)]];
    const slope = (t: number) => responseSlopeAt(r, t) / finalValue;
    peakTime = slope(a) > 0 && slope(b) < 0 ? bisect(slope, a, b) : ts[iMax];
    overshoot = 100 * (Math.max(g(peakTime), ys[iMax]) - 1);
  }
  if (!complete && 1 + envelope(r, seen) / scale > ys[iMax]) notes.push(`The peak is the largest value within t ≤ ${seen.toPrecision(3)} s; a later one cannot be ruled out on a grid of ${MAX_GRID} points.`);
  const outside = (t: number) => Math.abs(g(t) - 1) - band;
  // The last exit among the grid's samples: 0 when always inside, null when still outside at the grid's end.
  const onGrid = (): number | null => {
    let last = ys.length - 1;
    while (last >= 0 && Math.abs(ys[last] - 1) <= band) last--;
    return last < 0 ? 0 : last === ts.length - 1 ? null : bisect(outside, ts[last], ts[last + 1]);
  };
  const settlingTime = complete ? (onGrid() ?? tEnd) : settlingFromEnvelope(r, outside, band * scale, seen, onGrid, notes);
  return {
    riseTime: t10 !== null && t90 !== null ? t90 - t10 : null,
    peakTime,
    overshootPercent: overshoot,
    settlingTime,
    finalValue,
    settlingBand: band,
  };
}

/**
 * The last exit from the band of a response too long for one grid: past tS, where the envelope (a bound on
 * |y − y∞|) falls below the band for good, the response stays inside; the last exit is found by stepping back
 * from tS at the fastest term's pace (and looking at each peak between samples), at most MAX_GRID steps. Null
 * (with a note) when it lies further back.
 */
function settlingFromEnvelope(r: TimeResponse, outside: (t: number) => number, width: number, from: number, onGrid: () => number | null, notes: string[]): number | null {
  let [a, b] = [from, from * 2];
  while (envelope(r, b) >= width && b < Number.MAX_VALUE / 2) [a, b] = [b, b * 2];
  for (let i = 0; i < 200 && b - a > 1e-15 * b; i++) {
    const m = (a + b) / 2;
    if (envelope(r, m) >= width) a = m;
    else b = m;
  }
  const tS = b;
  const step = 1 / (20 * fastestRate(r));
  if (tS - step === tS) {
    notes.push(`The settling time is the envelope's bound: the fastest oscillation's period is below the resolution of a double at t = ${tS.toPrecision(3)} s.`);
    return tS;
  }
  // Stepping back, a peak of y between two samples inside the band still counts: its top is found on the slope.
  const slope = (t: number) => responseSlopeAt(r, t);
  for (let k = 0; k < MAX_GRID; k++) {
    const [t0, t1] = [tS - (k + 1) * step, tS - k * step];
    if (t1 <= from) return onGrid() ?? from; // back inside the first grid: its samples hold the last exit
    if (outside(t1) > 0) return bisect(outside, t1, Math.min(tS, t1 + step));
    if (slope(t0) > 0 !== slope(t1) > 0) {
      const top = bisect(slope, t0, t1);
      if (outside(top) > 0) return bisect(outside, top, t1);
    }
  }
  notes.push(`The settling time is not resolved: the response is inside the band from ${(tS - MAX_GRID * step).toPrecision(3)} s to ${tS.toPrecision(3)} s, and its last exit lies earlier than a grid of ${MAX_GRID} points reaches.`);
  return null;
}

/** Samples of a plotted response (and of its CSV). */
export const PLOT_SAMPLES = 400;

/** n + 1 evenly spaced samples [t, y(t)] on [0, tEnd] (y(0) as the limit t → 0+). Example: for plotting. */
export function sampleResponse(r: TimeResponse, tEnd: number, n = PLOT_SAMPLES): [number, number][] {
  return Array.from({ length: n + 1 }, (_, i) => {
    const t = (tEnd * i) / n;
    return [t, responseAt(r, t)];
  });
}
