import type { ReactNode } from "react";
import type { Analysis } from "@shared/analysis/analyze";
import type { Problem } from "@shared/diagram/problems";
import { DEFAULT_IMPLEMENT_REQUEST } from "@shared/implement/view";
import { AnalysisHelp } from "@/features/editor/components/analysis/AnalysisHelp";
import { AnalysisTabs, type TabSpec } from "@/features/editor/components/analysis/AnalysisTabs";
import { BreakInUse } from "@/features/editor/components/analysis/BreakPicker";
import { DeadTimeBar } from "@/features/editor/components/analysis/DeadTimeBar";
import { FrequencyView } from "@/features/editor/components/analysis/FrequencyView";
import { ImplementationView } from "@/features/editor/components/analysis/ImplementationView";
import { ParameterSliders } from "@/features/editor/components/analysis/ParameterSliders";
import { RouthView } from "@/features/editor/components/analysis/RouthView";
import { StabilityView } from "@/features/editor/components/analysis/StabilityView";
import { SteadyStateView } from "@/features/editor/components/analysis/SteadyStateView";
import { SweepView } from "@/features/editor/components/analysis/SweepView";
import { TimeResponseView } from "@/features/editor/components/analysis/TimeResponseView";
import { ProblemList } from "@/features/editor/components/panels/ProblemList";
import type { AnalysisSettings, LiveAnalysis } from "@/features/editor/hooks/useLiveDiagram";
import { formatNumber, verdictWord } from "@/features/editor/lib/analysisFormat";

interface Props {
  live: LiveAnalysis;
  settings: AnalysisSettings;
  onSettings: (change: Partial<AnalysisSettings>) => void;
  onPickProblem: (p: Problem) => void;
}

const CAUTION =
  "These results describe the linear model as drawn; dead times enter the poles, Routh array and closed-form responses through their Padé approximation (the simulated responses keep them exact); actuator limits, saturation and other nonlinearity are not in it. Validate on the plant and follow your functional-safety process and local codes.";

const VERDICT_TONE = { stable: "border-steady bg-steady-tint", marginal: "border-trace bg-trace-tint", unstable: "border-fault bg-fault-tint" } as const;

/** The analysis of the pair chosen in the results panel: summary, sliders and one tab per kind of result. */
export function AnalysisPanel({ live, settings, onSettings, onPickProblem }: Props) {
  const failed = live.problems.length > 0;
  const result = failed ? null : live.result;
  const status = live.crash
    ? "The analysis stopped unexpectedly."
    : live.pending
      ? "Updating…"
      : live.ms !== null
        ? `Analysed in ${live.ms < 10 ? live.ms.toFixed(1) : Math.round(live.ms)} ms`
        : "";
  const setValue = (name: string, value: number | null) => {
    const next = { ...settings.values };
    if (value === null) delete next[name];
    else next[name] = value;
    onSettings({ values: next });
  };
  // In a narrow column (under 48rem) the result tabs come first, then the sliders, then the summary, so the plots
  // start high in the column; wider, the summary leads and the sliders stand beside the tabs.
  return (
    <div className="flex flex-col gap-4">
      <p className="text-xs text-ink-faint" role="status">{status}</p>
      {live.crash && <p role="alert" className="text-sm text-fault">{live.crash}</p>}
      {failed && (
        <section aria-label="Why there is no analysis" className="flex flex-col gap-2">
          <p className="text-sm">The analysis cannot be computed for this diagram at these values:</p>
          <ProblemList problems={live.problems} onPick={onPickProblem} />
        </section>
      )}
      {!result && !failed && !live.crash && <p className="text-sm text-ink-soft">Working out the analysis…</p>}
      {result && (
        <Summary analysis={result.analysis} className="order-2 @3xl:order-none">
          <BreakInUse used={result.breakWire} chosen={settings.break} onDefault={() => onSettings({ break: null })} />
        </Summary>
      )}
      {result?.analysis.deadTime && (
        <div className="order-1 @3xl:order-none">
          <DeadTimeBar deadTime={result.analysis.deadTime} onOrder={(padeOrder) => onSettings({ padeOrder })} />
        </div>
      )}
      <div className="order-1 grid grid-cols-[minmax(0,1fr)] gap-4 @3xl:order-none @3xl:grid-cols-[18rem_minmax(0,1fr)]">
        <section aria-label="Parameter sliders" className="order-2 flex flex-col gap-2 @3xl:order-none">
          <h3 className="text-sm font-semibold">Sliders</h3>
          <ParameterSliders
            parameters={live.parameters}
            values={settings.values}
            onValue={setValue}
            sweep={result?.sweep?.parameter ?? settings.sweepParameter}
            onSweep={(sweepParameter) => onSettings({ sweepParameter })}
          />
        </section>
        {result && (
          <AnalysisTabs
            label="Analysis results"
            tabs={tabsFor(live, result, settings, onSettings)}
            onOpen={(key) => onSettings({ sweepShown: key === "sweep", implementationShown: key === "implementation" })}
          />
        )}
      </div>
      <p className="order-3 border-t border-rule pt-2 text-xs text-ink-soft @3xl:order-none">
        <strong className="font-semibold text-ink">Caution: </strong>
        {CAUTION}
      </p>
    </div>
  );
}

function tabsFor(live: LiveAnalysis, result: NonNullable<LiveAnalysis["result"]>, settings: AnalysisSettings, onSettings: Props["onSettings"]): TabSpec[] {
  const { analysis, sweep } = result;
  const hasParameters = live.parameters.length > 0;
  const request = settings.implementation ?? DEFAULT_IMPLEMENT_REQUEST;
  return [
    { key: "stability", label: "Stability", render: () => <StabilityView analysis={analysis} /> },
    { key: "routh", label: "Routh array", render: () => <RouthView analysis={analysis} /> },
    { key: "steady", label: "Steady state", render: () => <SteadyStateView analysis={analysis} /> },
    { key: "time", label: "Time response", render: () => <TimeResponseView analysis={analysis} band={settings.band} onBand={(band) => onSettings({ band })} /> },
    { key: "frequency", label: "Frequency", render: () => <FrequencyView analysis={analysis} /> },
    {
      key: "sweep",
      label: "Parameter sweep",
      // The sweep is computed only while this tab is open: the first answer after opening it brings it.
      render: () => (sweep || !hasParameters ? <SweepView sweep={sweep} analysis={analysis} negative={settings.sweepNegative} onNegative={(sweepNegative) => onSettings({ sweepNegative })} /> : <p className="text-sm text-ink-soft">Computing the root locus…</p>),
    },
    {
      key: "implementation",
      label: "Implementation",
      // Computed only while this tab is open, like the sweep.
      render: () => (
        <ImplementationView view={live.implementation} request={request} pair={`${analysis.input} → ${analysis.output}`} onRequest={(change) => onSettings({ implementation: { ...request, ...change } })} />
      ),
    },
    { key: "help", label: "Definitions", render: () => <AnalysisHelp /> },
  ];
}

/** One line per fact: the verdict, the values in use, the break, then the notes. */
function Summary({ analysis, className, children }: { analysis: Analysis; className: string; children: ReactNode }) {
  const { stability, values, input, output, notes } = analysis;
  const names = Object.keys(values);
  return (
    <section aria-label="Analysis summary" className={`flex flex-col gap-2 ${className}`}>
      <p className={`rounded border-l-4 px-3 py-2 text-sm ${VERDICT_TONE[stability.verdict]}`}>
        <span className="font-mono">{input} → {output}</span>: <strong>{verdictWord(stability.verdict)}</strong>. {stability.reason}
      </p>
      <p className="text-sm">
        {names.length === 0 ? "No parameters." : "Parameter values in use: "}
        {names.map((n, i) => (
          <span key={n} className="font-mono">
            {i > 0 && ", "}
            {n} = {formatNumber(values[n])}
          </span>
        ))}
      </p>
      {children}
      {notes.length > 0 && (
        <ul aria-label="Analysis notes" className="flex list-disc flex-col gap-0.5 pl-5 text-sm text-ink-soft">
          {notes.map((n) => (
            <li key={n}>{n}</li>
          ))}
        </ul>
      )}
    </section>
  );
}
