import type { Analysis } from "@shared/analysis/analyze";
import { LargeTex } from "@/features/editor/components/LargeTex";
import { transferText } from "@/features/editor/lib/resultText";

interface Props {
  /** The analysis of the pair shown (it reduces the symbolic result at the values). */
  analysis: Pick<Analysis, "transfer" | "values">;
  /** The slider values differ from the parameter table's: say so, the result is not the nominal one. */
  moved: boolean;
}

const valueList = (values: Record<string, number>) =>
  Object.entries(values)
    .map(([name, v]) => `${name} = ${v}`)
    .join(", ");

/** The closed loop with numbers for its parameters, beside the symbolic one: what the plots and metrics describe. */
export function ClosedLoopAtValues({ analysis, moved }: Props) {
  const { transfer, values } = analysis;
  if (Object.keys(values).length === 0) return null;
  return (
    <section aria-label="Closed loop at the parameter values" className="rounded border border-rule bg-paper px-3 py-2">
      <p className="text-xs text-ink-soft">
        At the {moved ? "slider" : "nominal"} values ({valueList(values)})
      </p>
      <div className="overflow-x-auto py-1">
        <LargeTex display latex={`T(s) = ${transfer.latex}`} what="T(s) at the values" plain={<span className="text-xs text-ink-soft">A large result: its text is below.</span>} />
      </div>
      <output aria-label="Closed loop at the parameter values as text" className="block font-mono text-xs break-all text-ink-soft">
        {transferText(transfer)}
      </output>
    </section>
  );
}
