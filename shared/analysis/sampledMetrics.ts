// Step metrics read off a sampled response (a simulation's grid), linear between samples: the counterpart of
// stepMetrics.ts, which reads them off a closed form.
import type { StepMetrics } from "@shared/analysis/stepMetrics";

/** Overshoot below this fraction of the final value is rounding, not overshoot. */
const OVERSHOOT_FLOOR = 1e-9;

/**
 * Rise time (10–90 %), peak time, overshoot and settling time (last exit from ±band) of samples y at times t,
 * on y/finalValue. The settling time is null when the last sample is still outside the band.
 * Example: samples of 1 − e^(−t) on [0, 10] give a rise time ≈ ln 9 = 2.197 s.
 */
export function sampledStepMetrics(t: readonly number[], y: readonly number[], finalValue: number, band: number): StepMetrics {
  const g = y.map((v) => v / finalValue);
  const cross = (i: number, level: number) => t[i - 1] + ((level - g[i - 1]) / (g[i] - g[i - 1])) * (t[i] - t[i - 1]);
  const reach = (level: number): number | null => {
    if (g[0] >= level) return 0;
    const i = g.findIndex((v) => v >= level);
    return i < 0 ? null : cross(i, level);
  };
  const [t10, t90] = [reach(0.1), reach(0.9)];
  let iMax = 0;
  for (let i = 1; i < g.length; i++) if (g[i] > g[iMax]) iMax = i;
  const overshoots = g[iMax] - 1 > OVERSHOOT_FLOOR;
  let last = g.length - 1;
  while (last >= 0 && Math.abs(g[last] - 1) <= band) last--;
  const exit = (i: number) => {
    const level = g[i] > 1 ? 1 + band : 1 - band;
    return t[i] + ((level - g[i]) / (g[i + 1] - g[i])) * (t[i + 1] - t[i]);
  };
  const peak = overshoots ? vertex(t, g, iMax) : null;
  return {
    riseTime: t10 !== null && t90 !== null ? t90 - t10 : null,
    peakTime: peak && peak.t,
    overshootPercent: peak ? 100 * (peak.g - 1) : 0,
    settlingTime: last < 0 ? 0 : last === g.length - 1 ? null : exit(last),
    finalValue,
    settlingBand: band,
  };
}

/** The top of the parabola through the samples around a largest one (the sample itself at an end or a kink). */
function vertex(t: readonly number[], g: readonly number[], i: number): { t: number; g: number } {
  if (i === 0 || i === g.length - 1) return { t: t[i], g: g[i] };
  const [a, b, c] = [g[i - 1], g[i], g[i + 1]];
  const h = t[i + 1] - t[i];
  const curve = a - 2 * b + c;
  if (curve >= 0 || Math.abs(t[i] - t[i - 1] - h) > 1e-9 * h) return { t: t[i], g: b };
  const shift = (0.5 * (a - c)) / curve; // in steps, within ±1/2
  return { t: t[i] + shift * h, g: b - 0.25 * (a - c) * shift };
}
