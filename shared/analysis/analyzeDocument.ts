import { AlgebraError } from "@shared/algebra/errors";
import type { Problem } from "@shared/diagram/problems";
import { analyzeAt, type Analysis, type AnalyzeOptions } from "@shared/analysis/analyze";
import { AnalysisError } from "@shared/analysis/errors";
import { prepareAnalysis, type PrepareOptions, type PreparedAnalysis } from "@shared/analysis/prepare";
import type { AnalysisResult } from "@shared/analysis/schema";
import { analysisSummary } from "@shared/analysis/summary";

export type AnalyzeOutcome =
  | { ok: true; prepared: PreparedAnalysis; analysis: Analysis; result: AnalysisResult }
  | { ok: false; problems: Problem[] };

/**
 * The whole analysis of one untrusted document, never throwing for bad input: every failure is a Problem
 * with a code ("unknown-break-wire", "degree-limit", the engine's codes…).
 * Example: analyzeDocument(doc, { break: "w6" }).result.margins.phaseMarginDeg.
 */
export function analyzeDocument(raw: unknown, opts: PrepareOptions & AnalyzeOptions = {}): AnalyzeOutcome {
  let prepared: ReturnType<typeof prepareAnalysis>;
  try {
    prepared = prepareAnalysis(raw, opts);
  } catch (err) {
    if (!(err instanceof AnalysisError)) throw err;
    return { ok: false, problems: [{ severity: "error", code: err.code, message: err.message }] };
  }
  if (!prepared.ok) return prepared;
  try {
    const analysis = analyzeAt(prepared.prepared, opts);
    return { ok: true, prepared: prepared.prepared, analysis, result: analysisSummary(analysis, prepared.prepared) };
  } catch (err) {
    if (!(err instanceof AnalysisError || err instanceof AlgebraError)) throw err;
    const subject = err instanceof AnalysisError && err.code === "bad-value" && err.subject ? { field: `parameters.${err.subject}` } : {};
    return { ok: false, problems: [...prepared.prepared.warnings, { severity: "error", code: err.code, message: err.message, ...subject }] };
  }
}
