import type { Analysis } from "@shared/analysis/analyze";
import type { Quantity } from "@shared/analysis/steadyState";
import { analysisOrder } from "@shared/analysis/versionSummary";
import { formatNumber, rootRows } from "@/features/editor/lib/analysisFormat";

/** One row of a comparison's metrics: each version's value as shown, and the change from the first to the second. */
export interface MetricRow {
  name: string;
  unit: string;
  before: string;
  after: string;
  /** "+2.3", "−0.41", "same", "changed" (a verdict), or "" when either side has no value. */
  change: string;
}

type Value = number | string | null;

const quantityNumber = (q: Quantity): number | null => (typeof q.value === "number" ? q.value : null);
const quantityText = (q: Quantity): string | null => (q.value === null ? null : q.value === "Infinity" ? "∞" : q.value === "-Infinity" ? "\u2212∞" : null);

/** The figures a reviewer compares, read the same way the analysis panel reads them. */
const METRICS: { name: string; unit: string; of: (a: Analysis) => Value }[] = [
  { name: "Closed-loop order", unit: "", of: analysisOrder },
  { name: "Stability", unit: "", of: (a) => a.stability.verdict },
  { name: "DC gain", unit: "", of: (a) => a.dcGain?.value ?? null },
  { name: "Rise time (10–90 %)", unit: "s", of: (a) => a.step.riseTime },
  { name: "Overshoot", unit: "%", of: (a) => a.step.overshootPercent },
  { name: "Peak time", unit: "s", of: (a) => a.step.peakTime },
  { name: "Settling time", unit: "s", of: (a) => a.step.settlingTime },
  { name: "Steady-state error, unit step", unit: "", of: (a) => quantityNumber(a.steadyState.errors.step) ?? quantityText(a.steadyState.errors.step) },
  { name: "Gain margin", unit: "dB", of: (a) => a.loop?.margins.gainMarginDb ?? null },
  { name: "Phase margin", unit: "°", of: (a) => a.loop?.margins.phaseMarginDeg ?? null },
  { name: "Gain crossover", unit: "rad/s", of: (a) => a.loop?.margins.gainCrossover ?? null },
  { name: "Sensitivity peak Ms", unit: "", of: (a) => a.loop?.sensitivityPeak?.value ?? null },
  { name: "Bandwidth (−3 dB)", unit: "rad/s", of: (a) => a.bandwidth },
];

const shown = (v: Value): string => (v === null ? "—" : typeof v === "number" ? formatNumber(v) : v);

function change(before: Value, after: Value): string {
  if (before === null || after === null) return before === after ? "" : "changed";
  if (typeof before === "number" && typeof after === "number") {
    // Compared as shown: a difference below the displayed digits is no change to a reader.
    if (formatNumber(before) === formatNumber(after)) return "same";
    const d = after - before;
    return d > 0 ? `+${formatNumber(d)}` : formatNumber(d);
  }
  return before === after ? "same" : "changed";
}

/**
 * The metrics of two analyses side by side; a missing analysis (problems, or too high an order) shows dashes.
 * Example: compareMetrics(pm45, pm60).find((r) => r.name === "Phase margin")?.change === "+15".
 */
export function compareMetrics(before: Analysis | null, after: Analysis | null): MetricRow[] {
  return METRICS.map(({ name, unit, of }) => {
    const b = before ? of(before) : null;
    const a = after ? of(after) : null;
    return { name, unit, before: shown(b), after: shown(a), change: change(b, a) };
  });
}

/** One figure of a single version as shown, e.g. { name: "Overshoot", unit: "%", value: "16.3" }. */
export interface VersionMetric {
  name: string;
  unit: string;
  value: string;
}

/**
 * One version's key figures, as a printed review lists them: the poles of T(s) (a conjugate pair on one entry,
 * a repeated pole with its multiplicity), then the same metrics a comparison shows.
 * Example: versionMetrics(servoK4)[0] → { name: "Poles", unit: "", value: "−1 ± 1.732j" }.
 */
export function versionMetrics(a: Analysis): VersionMetric[] {
  const poles = rootRows(a.poles)
    .map((r) => (r.root.multiplicity > 1 ? `${r.value} (×${r.root.multiplicity})` : r.value))
    .join(", ");
  return [{ name: "Poles", unit: "", value: poles || "none" }, ...METRICS.map(({ name, unit, of }) => ({ name, unit, value: shown(of(a)) }))];
}
