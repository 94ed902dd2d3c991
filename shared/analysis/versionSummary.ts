import { z } from "zod";
import { AlgebraError } from "@shared/algebra/errors";
import { polyDegree } from "@shared/algebra/poly";
import { ratDenominator } from "@shared/algebra/ratfn";
import { analyzeAt, type Analysis } from "@shared/analysis/analyze";
import { AnalysisError } from "@shared/analysis/errors";
import { prepareAnalysis } from "@shared/analysis/prepare";
import type { Problem } from "@shared/diagram/problems";
import { printReduction } from "@shared/reduce/printReduction";
import { reduceDocumentExact, type ExactReduction, type ReduceOptions } from "@shared/reduce/reduceDiagram";
import type { ReductionResult } from "@shared/reduce/result";

/** Above this closed-loop order only the order is given: the analysis would cost seconds (save check, compare view). */
export const SUMMARY_MAX_ORDER = 40;

/**
 * What a version table shows of a checked version: the default pair (first input → first output) at the nominal
 * parameter values — its order, stability verdict, phase margin at the default break and step overshoot.
 * Example: { input: "r", output: "y", order: 2, stable: "stable", phaseMarginDeg: 51.8, overshootPercent: 16.3 }.
 */
export const versionSummarySchema = z.object({
  input: z.string(),
  output: z.string(),
  order: z.number().int(),
  stable: z.enum(["stable", "marginal", "unstable"]).nullable(),
  phaseMarginDeg: z.number().nullable(),
  overshootPercent: z.number().nullable(),
});
export type VersionSummary = z.infer<typeof versionSummarySchema>;

/** The closed loop's order as analysed: its poles counted with multiplicity. Example: 1/(s+1)² → 2. */
export const analysisOrder = (a: Pick<Analysis, "poles">): number => a.poles.reduce((n, p) => n + p.multiplicity, 0);

/** The default pair of a reduction analysed at the nominal values, without the (slow) stable parameter ranges. */
export interface DefaultPairAnalysis {
  input: string;
  output: string;
  order: number;
  /** null above `maxOrder`, or when the analysis fails (the editor shows why). */
  analysis: Analysis | null;
}

/** The default pair's analysis, or null when the reduction holds no default pair. */
export function analyzeDefaultPair(reduction: ExactReduction, maxOrder = Infinity): DefaultPairAnalysis | null {
  const prepared = prepareAnalysis(reduction);
  if (!prepared.ok) return null;
  const p = prepared.prepared;
  const base = { input: p.input, output: p.output, order: polyDegree(ratDenominator(p.transfer)) };
  if (base.order > maxOrder) return { ...base, analysis: null };
  try {
    return { ...base, analysis: analyzeAt(p, { stableSets: false }) };
  } catch (err) {
    if (err instanceof AnalysisError || err instanceof AlgebraError) return { ...base, analysis: null };
    throw err;
  }
}

/** The summary of the default pair's analysis (null when there is no default pair or its analysis failed). */
export function versionSummary(pair: DefaultPairAnalysis | null): VersionSummary | null {
  if (!pair) return null;
  const { input, output, order, analysis: a } = pair;
  if (!a) return order > SUMMARY_MAX_ORDER ? { input, output, order, stable: null, phaseMarginDeg: null, overshootPercent: null } : null;
  return {
    input,
    output,
    order: analysisOrder(a),
    stable: a.stability.verdict,
    phaseMarginDeg: a.loop?.margins.phaseMarginDeg ?? null,
    overshootPercent: a.step.overshootPercent,
  };
}

export type CheckedDocument =
  | { ok: true; result: ReductionResult; pair: DefaultPairAnalysis | null }
  | { ok: false; problems: Problem[] };

/**
 * A document's published result and its default pair's analysis from one parse and one reduction: the save-time
 * check (which keeps the summary) and the version comparison (which plots the analysis) both read it.
 * Example: checkDocument(json).pair?.analysis?.loop?.margins.phaseMarginDeg.
 */
export function checkDocument(raw: unknown, opts: { limits?: ReduceOptions["limits"]; maxOrder?: number } = {}): CheckedDocument {
  const reduced = reduceDocumentExact(raw, { limits: opts.limits });
  if (!reduced.ok) return reduced;
  return { ok: true, result: printReduction(reduced.reduction), pair: analyzeDefaultPair(reduced.reduction, opts.maxOrder ?? SUMMARY_MAX_ORDER) };
}
