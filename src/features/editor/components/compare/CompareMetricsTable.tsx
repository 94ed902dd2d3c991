import type { MetricRow } from "@/features/editor/lib/compareMetrics";

const head = "py-1.5 pr-4 font-medium";
const cell = "py-1.5 pr-4 tabular-nums";

/** The two versions' key figures and the change from the first to the second. */
export function CompareMetricsTable({ rows, before, after }: { rows: MetricRow[]; before: string; after: string }) {
  return (
    <table className="w-full text-left text-sm">
      <caption className="sr-only">Metrics of {before} and {after}</caption>
      <thead className="border-b border-rule text-xs text-ink-soft">
        <tr>
          <th scope="col" className={head}>Metric</th>
          <th scope="col" className={head}>{before}</th>
          <th scope="col" className={head}>{after}</th>
          <th scope="col" className={head}>Change</th>
        </tr>
      </thead>
      <tbody>
        {rows.map((r) => (
          <tr key={r.name} className="border-b border-rule last:border-b-0">
            <th scope="row" className="py-1.5 pr-4 font-normal">
              {r.name}
              {r.unit && <span className="text-ink-faint"> ({r.unit})</span>}
            </th>
            <td className={cell}>{r.before}</td>
            <td className={cell}>{r.after}</td>
            <td className={`${cell} ${r.change && r.change !== "same" ? "font-medium text-trace" : "text-ink-faint"}`}>{r.change}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
