import { lazy, Suspense, useMemo } from "react";
import { ProblemAlert } from "@/components/ProblemAlert";
import type { EditorDoc } from "@/features/editor/commands/types";
import { ClosedLoop } from "@/features/editor/components/ClosedLoop";
import { useLiveDiagram } from "@/features/editor/hooks/useLiveDiagram";
import { formatNumber } from "@/features/editor/lib/analysisFormat";
import { versionMetrics } from "@/features/editor/lib/compareMetrics";
import { SAVED_VERSION_ANALYSIS } from "@/features/editor/lib/savedAnalysis";

// The charting library loads apart from the page, as in the editor and the comparison.
const StepOverlay = lazy(() => import("@/features/editor/components/compare/CompareCharts").then((m) => ({ default: m.StepOverlay })));
const BodeOverlay = lazy(() => import("@/features/editor/components/compare/CompareCharts").then((m) => ({ default: m.BodeOverlay })));

// Chart heights (px) sized so the whole review sheet fits the shorter of A4 and Letter.
const STEP_HEIGHT = 165;
const BODE_HEIGHT = 110;

const plotsLoading = <p className="text-xs text-ink-soft">Loading the plots…</p>;

/**
 * One saved version analysed the way the comparison analyses each side (default pair and break, nominal values):
 * its closed loop, its key metrics, and its step and closed-loop Bode plots, laid out compactly for a printed page.
 * A version whose document has errors shows them instead.
 */
export function SavedVersionAnalysis({ label, doc }: { label: string; doc: EditorDoc }) {
  const { result, analysis } = useLiveDiagram(doc, SAVED_VERSION_ANALYSIS);
  const a = analysis.result?.analysis ?? null;
  const curves = useMemo(() => [{ label, analysis: a }], [label, a]);
  const metrics = useMemo(() => (a ? versionMetrics(a) : []), [a]);

  if (result.outcome && !result.outcome.ok)
    return <ProblemAlert title={`${label} has no closed-loop result: the diagram has problems.`} problems={result.outcome.problems.map((p) => p.message)} />;
  return (
    <div className="flex flex-col gap-3">
      <ClosedLoop label={label} title="Closed-loop transfer function (default input and output)" live={result} analysis={analysis} />
      <div className="grid grid-cols-2 gap-4">
        {a ? (
          <table className="w-full self-start text-left text-xs">
            <caption className="mb-1 text-left text-sm font-medium">
              Key metrics
              {analysis.parameters.length > 0 && (
                <span className="block text-xs font-normal text-ink-soft">
                  at {analysis.parameters.map((p) => `${p.name} = ${formatNumber(p.nominal)}${p.unit ? ` ${p.unit}` : ""}`).join(", ")}
                </span>
              )}
            </caption>
            <tbody>
              {metrics.map((m) => (
                <tr key={m.name} className="border-b border-rule last:border-b-0">
                  <th scope="row" className="py-0.5 pr-3 font-normal whitespace-nowrap">
                    {m.name}
                    {m.unit && <span className="text-ink-faint"> ({m.unit})</span>}
                  </th>
                  <td className="py-0.5 font-mono tabular-nums">{m.value}</td>
                </tr>
              ))}
            </tbody>
          </table>
        ) : (
          <p className="text-sm text-ink-soft">{analysis.pending ? "Analysing…" : `No analysis: ${analysis.problems[0]?.message ?? analysis.crash ?? "none available"}`}</p>
        )}
        {a && (
          <div className="flex min-w-0 flex-col gap-1">
            <h3 className="text-sm font-medium">Unit-step response</h3>
            <Suspense fallback={plotsLoading}>
              <StepOverlay curves={curves} height={STEP_HEIGHT} />
            </Suspense>
            <h3 className="text-sm font-medium">Bode plot of the closed loop</h3>
            <Suspense fallback={plotsLoading}>
              <BodeOverlay curves={curves} height={BODE_HEIGHT} />
            </Suspense>
          </div>
        )}
      </div>
    </div>
  );
}
