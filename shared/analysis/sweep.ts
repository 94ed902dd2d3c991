// Parameter sweeps: slider ranges, root locus of the closed-loop poles and step-response overlays. The
// symbolic work is already done in prepareAnalysis; here only values change.
import { polyEvaluateAt } from "@shared/algebra/poly";
import { ratDenominator } from "@shared/algebra/ratfn";
import { polyRoots } from "@shared/algebra/roots";
import type { DiagramDocument } from "@shared/diagram/schema";
import { AnalysisError } from "@shared/analysis/errors";
import { transferAt } from "@shared/analysis/nominal";
import type { PreparedAnalysis } from "@shared/analysis/prepare";
import { rangeValueAt } from "@shared/analysis/scale";
import { sampleResponse } from "@shared/analysis/stepMetrics";
import { timeResponse } from "@shared/analysis/timeResponse";

/**
 * Slider range of a parameter: its table min/max, else a decade either side of a non-zero value (−1…1 at 0).
 * Example: parameterRange(doc, "K") → [0.4, 40] for { K: 4 }.
 */
export function parameterRange(doc: DiagramDocument, name: string): [number, number] {
  const spec = (doc.parameters ?? {})[name];
  if (spec === undefined) throw new AnalysisError("unknown-parameter", `There is no parameter "${name}".`, name);
  const value = typeof spec === "number" ? spec : spec.value;
  const lo = typeof spec === "number" ? undefined : spec.min;
  const hi = typeof spec === "number" ? undefined : spec.max;
  const span: [number, number] = value === 0 ? [-1, 1] : value > 0 ? [value / 10, value * 10] : [value * 10, value / 10];
  return [lo ?? span[0], hi ?? span[1]];
}

/** n values across [lo, hi]: logarithmic when both ends are positive and a decade or more apart, else linear. */
export function sweepValues(range: [number, number], n: number): number[] {
  return Array.from({ length: n }, (_, i) => rangeValueAt(range, n === 1 ? 0 : i / (n - 1)));
}

export interface RootLocus {
  parameter: string;
  values: number[];
  /** branches[b][i]: the b-th closed-loop pole at values[i] (null where the degree drops). */
  branches: ([number, number] | null)[][];
}

/**
 * Closed-loop poles (roots of the pair's denominator) as one parameter runs over a range, the others at
 * `base` (default nominal), matched point to point into continuous branches.
 * Example: rootLocus(p, "K", [0.1, 100], 200).branches.length === degree of the denominator.
 */
export function rootLocus(p: PreparedAnalysis, name: string, range: [number, number], n = 200, base: Record<string, number> = p.nominal): RootLocus {
  return locusAt(p, name, sweepValues(range, n), base);
}

/** The locus at given values of the parameter (in the order given). Example: locusAt(p, "K", [0, 1, 2], p.nominal). */
export function locusAt(p: PreparedAnalysis, name: string, values: number[], base: Record<string, number>): RootLocus {
  if (!p.parameters.includes(name)) throw new AnalysisError("unknown-parameter", `There is no parameter "${name}".`, name);
  const den = ratDenominator(p.transfer);
  const branches: ([number, number] | null)[][] = [];
  const last: [number, number][] = []; // last known position of each branch
  values.forEach((v, i) => {
    const slots = match(last, polyRoots(polyEvaluateAt(den, { ...base, [name]: v })));
    slots.forEach((r, b) => {
      branches[b] ??= new Array<[number, number] | null>(i).fill(null);
      branches[b][i] = r;
      if (r) last[b] = r;
    });
    for (const b of branches) if (b.length <= i) b[i] = null;
  });
  return { parameter: name, values, branches };
}

/** Slot b gets the root closest to last[b] (greedy, smallest distances first); extra roots open new slots. */
function match(last: [number, number][], roots: [number, number][]): ([number, number] | null)[] {
  const pairs: [number, number, number][] = [];
  last.forEach((a, i) => roots.forEach((b, j) => pairs.push([Math.hypot(a[0] - b[0], a[1] - b[1]), i, j])));
  pairs.sort((x, y) => x[0] - y[0]);
  const out: ([number, number] | null)[] = new Array(last.length).fill(null);
  const used = new Set<number>();
  const filled = new Set<number>();
  for (const [, i, j] of pairs) {
    if (filled.has(i) || used.has(j)) continue;
    out[i] = roots[j];
    filled.add(i);
    used.add(j);
  }
  roots.forEach((r, j) => {
    if (!used.has(j)) out.push(r);
  });
  return out;
}

/**
 * Step responses at several values of one parameter, sampled on [0, tEnd] for an overlay plot.
 * Example: stepOverlay(p, "K", [1, 2, 4], 10) → three series of 201 [t, y] points.
 */
export function stepOverlay(p: PreparedAnalysis, name: string, values: number[], tEnd: number, n = 200): { value: number; points: [number, number][] }[] {
  return values.map((value) => {
    const { num, den } = transferAt(p.transfer, { ...p.nominal, [name]: value });
    return { value, points: sampleResponse(timeResponse(num, den, "step"), tEnd, n) };
  });
}
