import { lazy, Suspense, type ComponentProps } from "react";
import type { Problem } from "@shared/diagram/problems";
import { Panel } from "@/components/Panel";
import type { EditorDoc } from "@/features/editor/commands/types";
import { ParameterTable } from "@/features/editor/components/panels/ParameterTable";
import { ProblemList } from "@/features/editor/components/panels/ProblemList";
import { ResultsPanel } from "@/features/editor/components/panels/ResultsPanel";
import { StepThrough } from "@/features/editor/components/panels/StepThrough";
import type { AnalysisPanel as AnalysisPanelType } from "@/features/editor/components/analysis/AnalysisPanel";

// The analysis views carry the charting library: a chunk of their own, loaded after the canvas.
const AnalysisPanel = lazy(() => import("@/features/editor/components/analysis/AnalysisPanel").then((m) => ({ default: m.AnalysisPanel })));

interface Props {
  doc: EditorDoc;
  result: ComponentProps<typeof ResultsPanel>;
  steps: ComponentProps<typeof StepThrough>;
  /** Null until the first closed loop is in: the problems are not known yet and the analysis waits. */
  problems: Problem[] | null;
  onPickProblem: (p: Problem) => void;
  analysis: Omit<ComponentProps<typeof AnalysisPanelType>, "onPickProblem">;
}

// Each pane scrolls on its own where the editor fits the window (relative: KaTeX's hidden MathML is positioned
// and would otherwise stretch the page). Size containers: the panels lay out by the column's width, not the window's.
const pane = "@container flex flex-col gap-3 lg:relative lg:overflow-y-auto lg:overscroll-contain";

/**
 * What the diagram computes: the closed loop in a pane of its own at the top (at most 40 % of the column, so the
 * analysis below it always shows), then the analysis, the problems, the reduction steps and the parameter table.
 */
export function ResultsColumn({ doc, result, steps, problems, onPickProblem, analysis }: Props) {
  return (
    <>
      <div className={`${pane} lg:max-h-[40%] lg:shrink-0`}>
        <Panel dense title="Closed-loop result">
          <ResultsPanel {...result} />
        </Panel>
      </div>
      <div className={`${pane} lg:min-h-0 lg:flex-1`}>
        <Panel dense title="Analysis">
          {/* Its code (charts included) is fetched once the first result is in, not while the canvas is first drawn. */}
          {problems ? (
            <Suspense fallback={<p className="text-sm text-ink-soft">Loading the analysis…</p>}>
              <AnalysisPanel {...analysis} onPickProblem={onPickProblem} />
            </Suspense>
          ) : (
            <p className="text-sm text-ink-soft">The analysis starts once the closed loop is computed.</p>
          )}
        </Panel>
        <Panel dense title={`Problems${problems?.length ? ` (${problems.length})` : ""}`}>
          {problems ? <ProblemList problems={problems} onPick={onPickProblem} /> : <p className="text-sm text-ink-soft">Checking the diagram…</p>}
        </Panel>
        <Panel dense title="Reduction steps">
          <StepThrough {...steps} />
        </Panel>
        <Panel dense title="Parameters">
          <ParameterTable doc={doc} />
        </Panel>
      </div>
    </>
  );
}
