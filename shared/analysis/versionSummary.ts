import { z } from "zod";
import { AlgebraError } from "@shared/algebra/errors";
import { polyDegree } from "@shared/algebra/poly";
import { ratDenominator } from "@shared/algebra/ratfn";
import { analyzeAt, type Analysis } from "@shared/analysis/analyze";
import { AnalysisError } from "@shared/analysis/errors";
import { prepareAnalysis } from "@shared/analysis/prepare";
import type { ExactReduction } from "@shared/reduce/reduceDiagram";

/** Above this closed-loop order the save-time check gives the order only: the full analysis would cost seconds. */
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

/** The summary of a reduction, or null when its default pair cannot be analysed (the reason is in the editor). */
export function versionSummary(reduction: ExactReduction): VersionSummary | null {
  const pair = analyzeDefaultPair(reduction, SUMMARY_MAX_ORDER);
  if (!pair) return null;
  const { input, output, order, analysis: a } = pair;
  if (!a) return order > SUMMARY_MAX_ORDER ? { input, output, order, stable: null, phaseMarginDeg: null, overshootPercent: null } : null;
  return {
    input,
    output,
    order: a.poles.length,
    stable: a.stability.verdict,
    phaseMarginDeg: a.loop?.margins.phaseMarginDeg ?? null,
    overshootPercent: a.step.overshootPercent,
  };
}
