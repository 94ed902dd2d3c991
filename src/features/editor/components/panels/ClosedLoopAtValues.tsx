import type { Analysis } from "@shared/analysis/analyze";
import { TransferBox } from "@/features/editor/components/panels/TransferBox";

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
    <TransferBox
      name="Closed loop at the parameter values"
      heading={`At the ${moved ? "slider" : "nominal"} values (${valueList(values)})`}
      transfer={transfer}
      what="T(s) at the values"
    />
  );
}
