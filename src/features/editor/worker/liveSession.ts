// The editor worker's work as a pure object, so it can be tested without a worker: one reduction per change of
// what the result depends on, and the analysis of that same reduction.
import { createAnalyzer } from "@shared/analysis/analyzeDiagram";
import type { AnalysisAnswer, AnalysisQuery } from "@shared/analysis/answer";
import { implementationView, type ImplementationView, type ImplementRequest } from "@shared/implement/view";
import { printReduction } from "@shared/reduce/printReduction";
import { reduceDocumentExact, type ExactOutcome } from "@shared/reduce/reduceDiagram";
import { LIVE_LIMITS, type LiveOutcome } from "@/features/editor/worker/liveProtocol";

/**
 * What the reduction depends on: the diagram's blocks, wires and parameter table — not the layout, title or
 * notes, so moving a block on the canvas reuses the reduction and the analysis prepared from it.
 */
export function reductionKey(document: unknown): string {
  const d = (document ?? {}) as Record<string, unknown>;
  return JSON.stringify([d.format, d.version, d.blocks, d.wires, d.parameters]);
}

export interface LiveSession {
  /** The result for a document; `reduced` is false when the last reduction still holds. */
  reduce(document: unknown): { outcome: LiveOutcome; reduced: boolean };
  /** The analysis of the last reduced document; its problems when that document did not reduce. */
  analyze(query: AnalysisQuery): AnalysisAnswer;
  /** The Implementation tab's results for the last reduced document, beside the analysed pair `answer`. */
  implement(request: ImplementRequest, answer: AnalysisAnswer): ImplementationView | null;
}

export function createLiveSession(): LiveSession {
  let last: { key: string; exact: ExactOutcome; outcome: LiveOutcome } | null = null;
  const analyzer = createAnalyzer();

  return {
    reduce(document) {
      const key = reductionKey(document);
      if (last?.key === key) return { outcome: last.outcome, reduced: false };
      last = null; // set again only once the reduction has not thrown
      const exact: ExactOutcome = reduceDocumentExact(document, { limits: LIVE_LIMITS });
      const outcome: LiveOutcome = exact.ok ? { ok: true, result: printReduction(exact.reduction) } : { ok: false, problems: exact.problems };
      last = { key, exact, outcome };
      return { outcome, reduced: true };
    },
    analyze(query) {
      if (!last) throw new Error("analyze before reduce");
      if (!last.exact.ok) return { ok: false, problems: last.exact.problems, parameters: [] };
      const { reduction } = last.exact;
      // A chosen pair whose block was deleted since: the results panel falls back to the first pair, and so does this.
      const pairGone = query.input !== null && !reduction.transfers.some((t) => t.input === query.input && t.output === query.output);
      if (pairGone) query = { ...query, input: null, output: null };
      const brk = query.break;
      if (brk === null || reduction.diagram.doc.wires.some((w) => w.id === brk)) return analyzer(reduction, query);
      // The chosen wire was deleted since: keep analysing, at the default break, and say so.
      const answer = analyzer(reduction, { ...query, break: null });
      const note = `The chosen break wire ${brk} is no longer in the diagram: the loop is broken at the default wire instead.`;
      return answer.ok ? { ...answer, analysis: { ...answer.analysis, notes: [note, ...answer.analysis.notes] } } : answer;
    },
    implement(request, answer) {
      if (!last?.exact.ok || !answer.ok) return null;
      const { input, output, bandwidth, values } = answer.analysis;
      return implementationView(last.exact.reduction, request, { input, output, bandwidth, values });
    },
  };
}
