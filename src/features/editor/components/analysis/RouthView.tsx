import { useId, useState, type ReactNode } from "react";
import type { Analysis } from "@shared/analysis/analyze";
import type { RouthArray } from "@shared/analysis/routh";
import type { Endpoint, StableSet } from "@shared/analysis/stableSet";
import { Tex } from "@/features/editor/components/Tex";
import { firstColumnSign, formatExact, verdictWord } from "@/features/editor/lib/analysisFormat";
import { counted } from "@shared/text/words";

type Source = "pair" | "diagram";

const TH = "border-b border-rule-strong px-2 py-1 text-left font-medium text-ink-soft";
const TD = "border-b border-rule px-2 py-1";

/** Signs of the first column as ε → 0+, or null when they cannot be read or disagree with the array's count. */
function signsOf(r: RouthArray): number[] | null {
  if (r.signChanges === null) return null;
  const signs = r.firstColumn.map(firstColumnSign);
  if (signs.some((s) => s === null || s === 0)) return null;
  const changes = signs.filter((s, i) => i > 0 && s !== signs[i - 1]).length;
  return changes === r.signChanges ? (signs as number[]) : null;
}

/** The Routh array of the pair's denominator or of the diagram's characteristic polynomial, with stable parameter ranges. */
export function RouthView({ analysis }: { analysis: Analysis }) {
  const [source, setSource] = useState<Source>("pair");
  const name = useId();
  const reasonId = useId();
  const diagram = analysis.routhCharacteristic;
  const shown: Source = diagram ? source : "pair";
  const routh = shown === "diagram" && diagram ? diagram : analysis.routh;
  const { characteristic: chi, stability } = analysis;
  const options: { value: Source; text: string; disabled: boolean }[] = [
    { value: "pair", text: "This pair's denominator", disabled: false },
    { value: "diagram", text: "The diagram's characteristic polynomial, hidden modes included", disabled: diagram === null },
  ];
  return (
    <div className="flex flex-col gap-4">
      <fieldset className="flex flex-col gap-1 text-sm">
        <legend className="mb-1 font-semibold">Polynomial for the Routh array</legend>
        {options.map((o) => (
          <label key={o.value} className={`flex items-center gap-2 ${o.disabled ? "text-ink-faint" : ""}`}>
            <input
              type="radio"
              name={name}
              value={o.value}
              checked={shown === o.value}
              disabled={o.disabled}
              aria-describedby={o.disabled ? reasonId : undefined}
              onChange={() => setSource(o.value)}
              className="accent-signal"
            />
            {o.text}
          </label>
        ))}
        {diagram === null && (
          <p id={reasonId} className="text-xs text-ink-soft">
            Not available: the diagram&apos;s characteristic polynomial is above degree 100.
          </p>
        )}
      </fieldset>
      {chi.sameVerdict === false && chi.stability && (
        <p role="note" className="rounded border border-fault/60 bg-paper-raised px-3 py-2 text-sm">
          The two disagree: T(s) is {verdictWord(stability.verdict).toLowerCase()}, but the diagram&apos;s characteristic polynomial is{" "}
          {verdictWord(chi.stability.verdict).toLowerCase()} — a hidden mode cancels out of T(s).
        </p>
      )}
      <RouthTable routh={routh} />
      <p className="text-sm">
        <span className="font-semibold">Conclusion: </span>
        {routh.conclusion}
      </p>
      <StableSets sets={analysis.stableSets} conditions={analysis.conditions} several={Object.keys(analysis.values).length > 1} />
    </div>
  );
}

function RouthTable({ routh }: { routh: RouthArray }) {
  const signs = signsOf(routh);
  const width = Math.max(...routh.rows.map((r) => r.entries.length));
  const columns = Array.from({ length: width }, (_, j) => j);
  return (
    <div className="overflow-x-auto">
      <table className="border-collapse text-sm">
        <caption className="pb-1 text-left">
          <span className="font-semibold">Routh array</span> of <span className="font-mono">{routh.polynomial}</span>
        </caption>
        <thead>
          <tr>
            <th scope="col" className={TH}>Row</th>
            {columns.map((j) => (
              <th key={j} scope="col" className={`${TH} ${j === 0 ? "bg-paper-sunk text-ink" : ""}`}>{j === 0 ? "First column" : `Column ${j + 1}`}</th>
            ))}
            {signs && <th scope="col" className={TH}>Sign</th>}
          </tr>
        </thead>
        <tbody>
          {routh.rows.map((row, i) => {
            const special = routh.special.find((s) => s.power === row.power);
            const change = signs !== null && i > 0 && signs[i] !== signs[i - 1];
            return (
              <RowGroup key={row.power} colSpan={width + (signs ? 2 : 1)} explanation={special?.explanation}>
                <tr className={change ? "bg-fault-tint/60" : undefined}>
                  <th scope="row" className={`${TH} font-mono font-normal text-ink`}>
                    s<sup>{row.power}</sup>
                  </th>
                  {columns.map((j) => (
                    <td key={j} className={`${TD} ${j === 0 ? "bg-paper-sunk font-semibold" : ""}`}>
                      {row.latex[j] !== undefined ? <Tex latex={row.latex[j]} /> : ""}
                    </td>
                  ))}
                  {signs && (
                    <td className={`${TD} whitespace-nowrap font-mono`}>
                      {signs[i] > 0 ? "+" : "\u2212"}
                      {change && <span className="ml-2 font-sans text-xs font-semibold text-fault">sign change</span>}
                    </td>
                  )}
                </tr>
              </RowGroup>
            );
          })}
        </tbody>
      </table>
      {signs && routh.signChanges !== null && (
        <p className="pt-1 text-xs text-ink-soft">
          {counted(routh.signChanges, "sign change")} down the first column{routh.special.some((s) => s.kind === "zero-first-element") ? " (signs read as ε → 0+)" : ""}.
        </p>
      )}
    </div>
  );
}

/** A row followed by the explanation of its special case, when it has one. */
function RowGroup({ children, explanation, colSpan }: { children: ReactNode; explanation?: string; colSpan: number }) {
  return (
    <>
      {children}
      {explanation && (
        <tr>
          <td colSpan={colSpan} className="border-b border-rule bg-trace-tint px-2 py-1 text-xs text-ink">
            {explanation}
          </td>
        </tr>
      )}
    </>
  );
}

function StableSets({ sets, conditions, several }: { sets: StableSet[]; conditions: string[] | null; several: boolean }) {
  if (!sets.length && !conditions) return null;
  return (
    <section aria-label="Stable parameter values" className="flex flex-col gap-2 text-sm">
      <h4 className="font-semibold">Parameter values that keep T(s) stable</h4>
      {several && <p className="text-xs text-ink-soft">Each range holds the other parameters at their current values.</p>}
      <ul className="flex flex-col gap-1">
        {sets.map((set) => {
          const roots = set.intervals.flatMap((iv) => [iv.lower, iv.upper]).filter((e): e is Endpoint => e !== null && !e.exact && e.polynomial !== null);
          return (
            <li key={set.parameter}>
              <span className="font-mono">{formatExact(set.text)}</span>
              {roots.map((e) => (
                <span key={e.text} className="block pl-4 text-xs text-ink-soft">
                  {formatExact(e.text)} is a root of <span className="font-mono">{e.polynomial}</span> (6 significant digits shown).
                </span>
              ))}
            </li>
          );
        })}
      </ul>
      {conditions && (
        <div>
          <p className="text-ink-soft">With every parameter free, all roots are in the left half-plane exactly when:</p>
          <ul className="list-disc pl-6 font-mono">
            {conditions.map((c) => (
              <li key={c}>{formatExact(c)}</li>
            ))}
          </ul>
        </div>
      )}
    </section>
  );
}
