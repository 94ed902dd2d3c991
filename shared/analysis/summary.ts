// The analysis as `analyze --json` prints it: the fields first, the details the panel also shows after.
import type { Analysis } from "@shared/analysis/analyze";
import { flatRoots } from "@shared/analysis/poles";
import type { AnalysisResult } from "@shared/analysis/schema";
import type { TimeResponse } from "@shared/analysis/timeResponse";
import type { Problem } from "@shared/diagram/problems";

const response = (r: TimeResponse) => ({ formula: r.formula, latex: r.latex, exact: r.exact });

/**
 * The JSON result of one analysis (matches analysisResultSchema). Example: analysisSummary(a, warnings).stable === "stable".
 */
export function analysisSummary(a: Analysis, warnings: Problem[]): AnalysisResult {
  const { riseTime, peakTime, overshootPercent, settlingTime, finalValue } = a.step;
  const m = a.loop?.margins;
  return {
    input: a.input,
    output: a.output,
    values: a.values,
    transfer: a.transfer,
    poles: flatRoots(a.poles),
    zeros: flatRoots(a.zeros),
    poleDetails: a.poles,
    dominantPoles: flatRoots(a.dominantPoles),
    stable: a.stability.verdict,
    stabilityReason: a.stability.reason,
    characteristic: { polynomial: a.characteristic.polynomial, stable: a.characteristic.stability?.verdict ?? null, sameVerdict: a.characteristic.sameVerdict },
    hiddenModes: a.hiddenModes,
    dcGain: a.dcGain?.value ?? null,
    step: { riseTime, peakTime, overshootPercent, settlingTime, finalValue },
    margins: {
      gainMarginDb: m?.gainMarginDb ?? null,
      phaseMarginDeg: m?.phaseMarginDeg ?? null,
      gainCrossover: m?.gainCrossover ?? null,
      phaseCrossover: m?.phaseCrossover ?? null,
    },
    routh: {
      polynomial: a.routh.polynomial,
      rows: a.routh.rows.map(({ power, entries }) => ({ power, entries })),
      firstColumn: a.routh.firstColumn,
      special: a.routh.special,
      signChanges: a.routh.signChanges,
      conclusion: a.routh.conclusion,
      stableSets: a.stableSets.map((s) => ({
        parameter: s.parameter,
        text: s.text,
        intervals: s.intervals.map(({ lower, upper, lowerIncluded, upperIncluded }) => ({
          lower: lower && { value: lower.value, text: lower.text, exact: lower.exact, polynomial: lower.polynomial },
          upper: upper && { value: upper.value, text: upper.text, exact: upper.exact, polynomial: upper.polynomial },
          lowerIncluded,
          upperIncluded,
        })),
      })),
      conditions: a.conditions,
    },
    steadyState: a.steadyState,
    bandwidth: a.bandwidth,
    sensitivityPeak: a.loop?.sensitivityPeak?.value ?? null,
    delayMargin: a.loop?.delayMargin ?? null,
    nyquist: a.loop
      ? {
          encirclements: a.loop.nyquist.encirclements,
          openLoopRhpPoles: a.loop.nyquist.openLoopRhpPoles,
          closedLoopRhpPoles: a.loop.nyquist.closedLoopRhpPoles,
          verdict: a.loop.nyquist.verdict,
          reason: a.loop.nyquist.reason,
        }
      : null,
    break: a.loop ? { wire: a.loop.breakPoint.label, index: a.loop.breakPoint.index, chosen: a.loop.breakPoint.chosen } : null,
    loopGain: a.loop ? { numerator: a.loop.L.numerator, denominator: a.loop.L.denominator } : null,
    responses: { step: response(a.responses.step), impulse: response(a.responses.impulse), ramp: response(a.responses.ramp) },
    deadTime: a.deadTime && { ...a.deadTime, exactStep: exactStep(a) },
    notes: a.notes,
    warnings,
  };
}

/** The step metrics of the delayed loop with its dead times kept exactly (simulated), when there are any. */
function exactStep(a: Analysis) {
  const r = a.delayedResponses;
  if (!r) return null;
  const m = r.stepMetrics;
  return {
    method: r.method,
    stepSize: r.stepSize,
    riseTime: m?.riseTime ?? null,
    peakTime: m?.peakTime ?? null,
    overshootPercent: m?.overshootPercent ?? null,
    settlingTime: m?.settlingTime ?? null,
  };
}
