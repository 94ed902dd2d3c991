import { lazy, Suspense, useMemo } from "react";
import { diffDiagrams } from "@shared/diagram/diff";
import { Panel } from "@/components/Panel";
import type { EditorDoc } from "@/features/editor/commands/types";
import { CompareCanvas } from "@/features/editor/components/compare/CompareCanvas";
import { CompareMetricsTable } from "@/features/editor/components/compare/CompareMetricsTable";
import { DiffList } from "@/features/editor/components/compare/DiffList";
import { LargeTex } from "@/features/editor/components/LargeTex";
import { useLiveDiagram, type AnalysisOptions, type LiveAnalysis, type LiveResult } from "@/features/editor/hooks/useLiveDiagram";
import { compareMarks } from "@/features/editor/lib/compareMarks";
import { compareMetrics } from "@/features/editor/lib/compareMetrics";
import { transferText } from "@/features/editor/lib/resultText";
import { resultView } from "@/features/editor/lib/resultView";
import { counted } from "@shared/text/words";

// The charting library loads apart from the canvas, as in the editor.
const StepOverlay = lazy(() => import("@/features/editor/components/compare/CompareCharts").then((m) => ({ default: m.StepOverlay })));
const BodeOverlay = lazy(() => import("@/features/editor/components/compare/CompareCharts").then((m) => ({ default: m.BodeOverlay })));

/** One side of a comparison: a label ("v3", "Your changes") and its document. */
export interface CompareSide {
  label: string;
  doc: EditorDoc;
}

// Both sides are analysed the same way: the default pair, the default break, nominal values, a 2 % band.
const DEFAULTS: AnalysisOptions = { input: null, output: null, break: null, values: {}, band: 0.02, sweepParameter: null, sweepShown: false };

function ClosedLoop({ label, live, analysis }: { label: string; live: LiveResult; analysis: LiveAnalysis }) {
  const { transfer, problems } = resultView(live.outcome, null);
  return (
    <section aria-label={`Closed loop of ${label}`} className="min-w-0 rounded border border-rule bg-paper px-3 py-2">
      <h3 className="text-sm font-medium">{label}</h3>
      {!live.outcome ? (
        <p className="text-sm text-ink-soft">Working out the result…</p>
      ) : transfer ? (
        <>
          <p className="text-xs text-ink-soft">
            From <span className="font-mono">{transfer.input}</span> to <span className="font-mono">{transfer.output}</span>
          </p>
          <div className="overflow-x-auto py-1">
            <LargeTex display latex={`T(s) = ${transfer.latex}`} what={`T(s) of ${label}`} plain={<span className="text-xs text-ink-soft">A large result: its text is below.</span>} />
          </div>
          <output aria-label={`Closed-loop transfer function of ${label} as text`} className="block font-mono text-xs break-all text-ink-soft">
            {transferText(transfer)}
          </output>
        </>
      ) : (
        <p className="text-sm font-medium text-fault">No result: {counted(problems.filter((p) => p.severity === "error").length, "problem")}, e.g. {problems[0]?.message ?? "no input–output pair"}</p>
      )}
      {analysis.problems.length > 0 && !analysis.result && <p className="mt-1 text-xs text-ink-soft">No analysis: {analysis.problems[0].message}</p>}
    </section>
  );
}

/**
 * Two diagrams side by side, as a reviewer reads a change: what differs in the model (listed, and highlighted on
 * each canvas), both closed loops, overlaid step and Bode plots, and the key metrics with their change.
 */
export function CompareView({ before, after }: { before: CompareSide; after: CompareSide }) {
  const diff = useMemo(() => diffDiagrams(before.doc, after.doc), [before.doc, after.doc]);
  const marksBefore = useMemo(() => compareMarks(diff, "before"), [diff]);
  const marksAfter = useMemo(() => compareMarks(diff, "after"), [diff]);
  const a = useLiveDiagram(before.doc, DEFAULTS);
  const b = useLiveDiagram(after.doc, DEFAULTS);
  const analysisA = a.analysis.result?.analysis ?? null;
  const analysisB = b.analysis.result?.analysis ?? null;
  const curves = useMemo(
    () =>
      [
        { label: before.label, analysis: analysisA },
        { label: after.label, analysis: analysisB },
      ] as [{ label: string; analysis: typeof analysisA }, { label: string; analysis: typeof analysisB }],
    [before.label, after.label, analysisA, analysisB],
  );
  const analysing = a.analysis.pending || b.analysis.pending;
  return (
    <div className="flex flex-col gap-4">
      <Panel title={`What changed from ${before.label} to ${after.label}`}>
        <DiffList diff={diff} before={before.label} after={after.label} />
      </Panel>
      <div className="grid gap-4 lg:grid-cols-2">
        <CompareCanvas label={before.label} doc={before.doc} marks={marksBefore} />
        <CompareCanvas label={after.label} doc={after.doc} marks={marksAfter} />
      </div>
      <div className="grid gap-4 lg:grid-cols-2">
        <ClosedLoop label={before.label} live={a.result} analysis={a.analysis} />
        <ClosedLoop label={after.label} live={b.result} analysis={b.analysis} />
      </div>
      <Panel title="Key metrics (default input and output, nominal parameter values)">
        {analysing && !analysisA && !analysisB ? (
          <p className="text-sm text-ink-soft">Analysing both versions…</p>
        ) : (
          <CompareMetricsTable rows={compareMetrics(analysisA, analysisB)} before={before.label} after={after.label} />
        )}
      </Panel>
      <div className="grid gap-4 lg:grid-cols-2">
        <Panel title="Step responses">
          <Suspense fallback={<p className="text-sm text-ink-soft">Loading the plots…</p>}>
            <StepOverlay curves={curves} />
          </Suspense>
        </Panel>
        <Panel title="Bode plots of the closed loop">
          <Suspense fallback={<p className="text-sm text-ink-soft">Loading the plots…</p>}>
            <BodeOverlay curves={curves} />
          </Suspense>
        </Panel>
      </div>
    </div>
  );
}
