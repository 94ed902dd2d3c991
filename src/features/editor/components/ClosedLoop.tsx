import type { LiveAnalysis, LiveResult } from "@/features/editor/hooks/useLiveDiagram";
import { LargeTex } from "@/features/editor/components/LargeTex";
import { transferText } from "@/features/editor/lib/resultText";
import { resultView } from "@/features/editor/lib/resultView";
import { counted } from "@shared/text/words";

/**
 * A saved version's closed-loop transfer function of the default pair, typeset as the editor shows it, with its
 * text; or, when the version has no result, how many problems it has and the first of them.
 */
export function ClosedLoop({ label, title = label, live, analysis }: { label: string; title?: string; live: LiveResult; analysis: LiveAnalysis }) {
  const { transfer, problems } = resultView(live.outcome, null);
  return (
    <section aria-label={`Closed loop of ${label}`} className="min-w-0 rounded border border-rule bg-paper px-3 py-2">
      <h3 className="text-sm font-medium">{title}</h3>
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
