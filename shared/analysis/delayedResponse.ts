// The step and ramp responses of a pair with its dead times kept exactly (simulated), beside the Padé model's
// closed form; with step metrics read off the simulated samples.
import { polyParams } from "@shared/algebra/poly";
import { ratDenominator, ratNumerator, type RatFn } from "@shared/algebra/ratfn";
import { isDelaySymbol } from "@shared/expr/names";
import { delayTerms } from "@shared/analysis/delayTerms";
import { simulateDelayed } from "@shared/analysis/delaySimulation";
import { AnalysisError } from "@shared/analysis/errors";
import { exactValues } from "@shared/analysis/nominal";
import { sampledStepMetrics } from "@shared/analysis/sampledMetrics";
import { PLOT_SAMPLES, type StepMetrics } from "@shared/analysis/stepMetrics";

export interface DelayedResponses {
  method: "simulation";
  /** The simulation's fixed step in seconds; the samples below are every few steps of it. */
  stepSize: number;
  t: number[];
  step: number[];
  ramp: number[];
  /** Null when the delayed loop is not stable or the response has no metrics (see notes). */
  stepMetrics: StepMetrics | null;
  notes: string[];
}

/**
 * Step and ramp responses of the exact transfer (dead times as e^(−sT)) on [0, tEnd], the sentence saying why
 * there are none, or null when the transfer has no dead time (its closed form is already exact). Example: for 2e^(−s/2)/(s + 1 + 2e^(−s/2)) the step response is 0 until t = 0.5 s.
 */
export function delayedResponses(exact: RatFn, values: Readonly<Record<string, number>>, delays: ReadonlyMap<string, number>, tEnd: number, metrics: { stable: boolean; finalValue: number | null; band: number }): DelayedResponses | string | null {
  const [numerator, denominator] = [ratNumerator(exact), ratDenominator(exact)];
  if (![...polyParams(numerator), ...polyParams(denominator)].some(isDelaySymbol)) return null;
  const exactAt = exactValues(values);
  try {
    const num = delayTerms(numerator, exactAt, delays);
    const den = delayTerms(denominator, exactAt, delays);
    const step = simulateDelayed(num, den, "step", tEnd);
    const ramp = simulateDelayed(num, den, "ramp", tEnd);
    const notes = [step.note, ramp.note !== step.note ? ramp.note : null].filter((n): n is string => n !== null);
    const { stable, finalValue, band } = metrics;
    let stepMetrics: StepMetrics | null = null;
    if (!stable) notes.push("No step metrics with the exact dead time: the delayed closed loop is not stable.");
    else if (!finalValue) notes.push("No step metrics with the exact dead time: the final value is 0.");
    else stepMetrics = sampledStepMetrics(step.t, step.y, finalValue, band);
    const n = step.t.length - 1;
    const picks = Array.from({ length: Math.min(PLOT_SAMPLES, n) + 1 }, (_, i) => Math.round((i * n) / Math.min(PLOT_SAMPLES, n)));
    return {
      method: "simulation",
      stepSize: step.stepSize,
      t: picks.map((i) => step.t[i]),
      step: picks.map((i) => step.y[i]),
      ramp: picks.map((i) => ramp.y[i] ?? Number.NaN),
      stepMetrics,
      notes,
    };
  } catch (e) {
    if (e instanceof AnalysisError) return `No exact dead-time response: ${e.message}`;
    throw e;
  }
}
