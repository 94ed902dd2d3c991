import type { ImplementationView } from "@shared/implement/view";
import { Button } from "@/components/Button";
import { digits17 } from "@shared/implement/differenceEquation";
import { saveText } from "@/features/editor/lib/saveText";
import { stateSpaceCsv, stateSpaceFileName, stateSpaceJson } from "@/features/editor/lib/stateSpaceFiles";
import { formatNumber } from "@/features/editor/lib/analysisFormat";

type Realised = Extract<Extract<ImplementationView, { ok: true }>["stateSpace"], { ok: true }>;

const BASIS_WORDS: Record<string, string> = {
  controllable: "controllable canonical form",
  observable: "observable canonical form",
  balanced: "balanced realisation (equal, diagonal Gramians)",
};

function MatrixTable({ name, rows }: { name: string; rows: number[][] }) {
  const empty = rows.length === 0 || rows[0].length === 0;
  return (
    <table aria-label={`Matrix ${name}`} className="border-collapse font-mono text-xs">
      <caption className="text-left font-sans text-sm font-semibold">{name}</caption>
      <tbody>
        {empty ? (
          <tr><td className="text-ink-faint">[] (no states)</td></tr>
        ) : (
          rows.map((row, i) => (
            <tr key={i}>
              {row.map((x, j) => (
                <td key={j} title={digits17(x)} className="border border-rule px-1.5 py-0.5 text-right">{formatNumber(x, 6)}</td>
              ))}
            </tr>
          ))
        )}
      </tbody>
    </table>
  );
}

/** The realisation's matrices (6 significant digits shown, 17 in each cell's title and in the files) and its downloads. */
export function StateSpaceMatrices({ ss, id }: { ss: Realised; id: string }) {
  return (
    <section aria-label="State-space realisation" className="flex flex-col gap-2">
      <h3 className="text-sm font-semibold">State space: ẋ = A x + B u, y = C x + D u</h3>
      <p className="text-xs text-ink-soft">
        The {BASIS_WORDS[ss.basis] ?? ss.basis}, order {ss.A.length}.{ss.hankel && ` Hankel singular values: ${ss.hankel.map((h) => formatNumber(h, 4)).join(", ")}.`}
      </p>
      {ss.note && <p role="note" className="rounded border border-trace bg-trace-tint px-3 py-1.5 text-sm">{ss.note}</p>}
      <div className="flex flex-wrap items-start gap-4 overflow-x-auto">
        <MatrixTable name="A" rows={ss.A} />
        <MatrixTable name="B" rows={ss.B} />
        <MatrixTable name="C" rows={ss.C} />
        <MatrixTable name="D" rows={ss.D} />
      </div>
      <div className="flex flex-wrap gap-2">
        <Button size="sm" onClick={() => saveText(stateSpaceCsv(ss), stateSpaceFileName(id, "csv"))}>Download matrices (CSV)</Button>
        <Button size="sm" onClick={() => saveText(stateSpaceJson(ss.form, ss), stateSpaceFileName(id, "json"), "application/json")}>Download matrices (JSON)</Button>
      </div>
    </section>
  );
}
