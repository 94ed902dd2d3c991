import { useId } from "react";
import { Button } from "@/components/Button";
import type { Analysis } from "@shared/analysis/analyze";
import { useEditorActions } from "@/features/editor/components/EditorContext";
import { LargeTex } from "@/features/editor/components/LargeTex";
import { TransferBox } from "@/features/editor/components/panels/TransferBox";
import { ClosedLoopAtValues } from "@/features/editor/components/panels/ClosedLoopAtValues";
import { pairKey, pairName, type ResultView } from "@/features/editor/lib/resultView";
import { resultLatex, resultPlainText } from "@/features/editor/lib/resultText";
import { copyText } from "@/features/editor/lib/copyText";
import type { LiveResult } from "@/features/editor/hooks/useLiveDiagram";
import { plural } from "@shared/text/words";

interface Props {
  live: LiveResult;
  view: ResultView;
  /** The outcome belongs to an older document than the one on the canvas. */
  stale: boolean;
  onPair: (key: string) => void;
  /** The analysis of a pair at the slider values (nominal unless moved), for the numeric closed loop. */
  atValues?: { analysis: Analysis; moved: boolean } | null;
}

const copy = (text: string, what: string) => copyText(text, `result as ${what}`);

/** The closed-loop transfer function of the chosen pair, its characteristic polynomial and cancelled modes. */
export function ResultsPanel({ live, view, stale, onPair, atValues = null }: Props) {
  const pairId = useId();
  const { readOnly } = useEditorActions();
  const { result, transfer, transfers } = view;
  const status = live.crash
    ? "The reducer stopped unexpectedly."
    : stale || live.pending
      ? "Updating…"
      : live.ms !== null
        ? `Computed in ${live.ms < 10 ? live.ms.toFixed(1) : Math.round(live.ms)} ms`
        : "";
  return (
    <div className="flex flex-col gap-3">
      <p className="text-xs text-ink-faint" role="status">{status}</p>
      {live.crash && <p role="alert" className="text-sm text-fault">{live.crash}</p>}
      {!result && !live.crash && (
        <p className="text-sm text-ink-soft">
          {live.outcome ? (readOnly ? "No result: the diagram has the errors listed under Problems." : "No result while the diagram has errors: fix the problems listed.") : "Working out the result…"}
        </p>
      )}
      {result && transfer && (
        <>
          {transfers.length > 1 && (
            <div className="flex items-center gap-2 text-sm">
              <label htmlFor={pairId} className="text-ink-soft">Input → output</label>
              <select id={pairId} value={pairKey(transfer)} onChange={(e) => onPair(e.target.value)} className="rounded border border-rule-strong bg-paper-raised px-2 py-1">
                {transfers.map((t) => (
                  <option key={pairKey(t)} value={pairKey(t)}>{pairName(live.doc?.blocks, t)}</option>
                ))}
              </select>
            </div>
          )}
          <TransferBox
            name="Closed-loop transfer function"
            heading={
              <>
                From <span className="font-mono">{transfer.input}</span> to <span className="font-mono">{transfer.output}</span>
              </>
            }
            transfer={transfer}
            what="T(s)"
          />
          {atValues && atValues.analysis.input === transfer.input && atValues.analysis.output === transfer.output && !stale && (
            <ClosedLoopAtValues analysis={atValues.analysis} moved={atValues.moved} />
          )}
          <section aria-label="Characteristic polynomial" className="text-sm">
            <p className="text-xs text-ink-soft">Characteristic polynomial (all modes of the loop, nothing cancelled)</p>
            <div className="overflow-x-auto">
              <LargeTex
                latex={`\\Delta(s) = ${result.characteristicLatex}`}
                what="Δ(s)"
                plain={<span className="font-mono text-xs break-all">Δ(s) = {result.characteristic}</span>}
              />
            </div>
          </section>
          <Cancellations transfer={transfer} />
          <div className="flex flex-wrap gap-2">
            <Button size="sm" onClick={() => void copy(resultLatex(transfer, result.characteristicLatex), "LaTeX")}>Copy as LaTeX</Button>
            <Button size="sm" onClick={() => void copy(resultPlainText(transfer, result.characteristic), "text")}>Copy as text</Button>
          </div>
        </>
      )}
      <p className="border-t border-rule pt-2 text-xs text-ink-soft">Results describe the linear model as drawn; validate on the plant.</p>
    </div>
  );
}

const rootText = ([re, im]: [number, number]) =>
  im === 0 ? re.toPrecision(4) : `${re.toPrecision(4)} ${im < 0 ? "−" : "+"} ${Math.abs(im).toPrecision(4)}j`;

/** Cancelled common factors: an unstable one is a hidden unstable mode and is shown as an alarm. */
function Cancellations({ transfer }: { transfer: ResultView["transfer"] & object }) {
  if (transfer.cancelled.length === 0) return null;
  return (
    <ul className="flex flex-col gap-1.5 text-sm">
      {transfer.cancelled.map((c) => (
        <li
          key={c.factor}
          role={c.unstable ? "alert" : undefined}
          className={c.unstable ? "rounded border-2 border-fault bg-fault-tint px-3 py-2" : "rounded border border-rule bg-paper px-3 py-1.5"}
        >
          <p className={c.unstable ? "font-semibold text-fault" : "font-medium"}>
            {c.unstable ? "Hidden unstable mode" : "Cancelled stable mode"}: <span className="font-mono">({c.factor})</span>
          </p>
          <p className="text-xs">
            Cancels between numerator and denominator of {transfer.input} → {transfer.output}; {plural(c.roots.length, "root")} at nominal values:{" "}
            <span className="font-mono">{c.roots.map(rootText).join(", ")}</span>.
            {c.unstable && " The transfer function hides it, but the loop is internally unstable."}
          </p>
        </li>
      ))}
    </ul>
  );
}
