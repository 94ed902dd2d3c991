import { useId, useMemo } from "react";
import { CartesianGrid, Line, LineChart, XAxis, YAxis } from "recharts";
import type { Analysis } from "@shared/analysis/analyze";
import { sampleResponse } from "@shared/analysis/stepMetrics";
import type { RootLocus } from "@shared/analysis/sweep";
import { SPlanePlot, type SPlaneMarker } from "@/features/editor/components/analysis/SPlanePlot";
import { niceStep } from "@shared/analysis/axisSteps";
import { formatComplex, formatNumber, rootRows } from "@/features/editor/lib/analysisFormat";
import type { SweepData } from "@shared/analysis/answer";
import { counted } from "@shared/text/words";

/** Series colours; the legend below the chart uses the same classes (recharts' legend cannot read currentColor). */
const SERIES = ["text-signal", "text-trace", "text-steady", "text-fault", "text-ink-soft"];

type Point = [number, number];

const ends = (branch: (Point | null)[]) => {
  const present = branch.filter((p): p is Point => p !== null);
  return present.length ? { first: present[0], last: present[present.length - 1] } : null;
};

type Curve = { t: number; y: number }[];

/**
 * A response that grows without bound would flatten every other curve: when the current one (first) is
 * stable, the axis spans the curves that stay within 4× its peak, on round ticks, and growing curves run off
 * the edge. null: let the chart choose.
 */
function yAxis(curves: Curve[], stable: boolean): { domain: [number, number]; ticks: number[] } | null {
  const peak = (c: Curve) => Math.max(0, ...c.map((d) => Math.abs(d.y)));
  const limit = 4 * peak(curves[0]);
  if (!stable || !(limit > 0)) return null;
  const ys = curves.filter((c) => peak(c) <= limit).flatMap((c) => c.map((d) => d.y));
  const [lo, hi] = [Math.min(0, ...ys), Math.max(0, ...ys)];
  const step = niceStep(hi - lo, 5);
  const [a, b] = [Math.floor(lo / step), Math.ceil(hi / step)];
  return { domain: [a * step, b * step], ticks: Array.from({ length: b - a + 1 }, (_, i) => (a + i) * step) };
}

/** Root locus of the closed-loop poles over one parameter's range and step responses across that range. */
export function SweepView({ sweep, analysis }: { sweep: SweepData | null; analysis: Analysis }) {
  if (!sweep) return <p className="text-sm text-ink-soft">No parameters to sweep: add one in the parameter table.</p>;
  const p = sweep.parameter;
  const [lo, hi] = sweep.range;
  return (
    <div className="flex flex-col gap-5">
      <Locus locus={sweep.locus} analysis={analysis} current={sweep.current} range={sweep.range} />
      <Overlay sweep={sweep} analysis={analysis} />
      <p className="text-xs text-ink-soft">
        {p} runs from {formatNumber(lo)} to {formatNumber(hi)}; the other parameters stay at their current values.
      </p>
    </div>
  );
}

function Locus({ locus, analysis, current, range }: { locus: RootLocus; analysis: Analysis; current: number; range: [number, number] }) {
  const headingId = useId();
  const p = locus.parameter;
  const branchEnds = locus.branches.map(ends);
  const markers: SPlaneMarker[] = [
    ...branchEnds.flatMap((e): SPlaneMarker[] =>
      e ? [{ re: e.first[0], im: e.first[1], kind: "start" }, { re: e.last[0], im: e.last[1], kind: "end" }] : [],
    ),
    ...analysis.poles.map((r): SPlaneMarker => ({ re: r.re, im: r.im, kind: "pole", emphasis: true, label: r.multiplicity > 1 ? String(r.multiplicity) : undefined })),
  ];
  const now = `${p} = ${formatNumber(current)}`;
  return (
    <section aria-labelledby={headingId} className="flex flex-col gap-2">
      <h4 id={headingId} className="text-sm font-semibold">Root locus of the closed-loop poles</h4>
      <SPlanePlot
        label={`Root locus: closed-loop poles as ${p} varies from ${formatNumber(range[0])} to ${formatNumber(range[1])}`}
        description={`${counted(locus.branches.length, "branch", "branches")}, one line each; the table below gives where each starts and ends.`}
        markers={markers}
        paths={locus.branches}
        legend={[
          { symbol: "line", text: "Branch" },
          { symbol: "start", text: `${p} = ${formatNumber(range[0])}` },
          { symbol: "end", text: `${p} = ${formatNumber(range[1])}` },
          { symbol: "ring", text: `Closed-loop poles now (${now})` },
        ]}
      />
      <p className="text-sm">
        Closed-loop poles at {now}:{" "}
        <span className="font-mono">{rootRows(analysis.poles).map((r) => r.value).join(", ") || "none"}</span>
      </p>
      <div className="overflow-x-auto">
        <table className="border-collapse text-sm">
          <caption className="pb-1 text-left font-semibold">Locus branches</caption>
          <thead>
            <tr>
              {["Branch", `At ${p} = ${formatNumber(range[0])}`, `At ${p} = ${formatNumber(range[1])}`].map((h) => (
                <th key={h} scope="col" className="border-b border-rule-strong px-2 py-1 text-left font-medium text-ink-soft">{h}</th>
              ))}
            </tr>
          </thead>
          <tbody>
            {branchEnds.map((e, i) => (
              <tr key={i}>
                <th scope="row" className="border-b border-rule px-2 py-1 text-left font-normal">{i + 1}</th>
                <td className="border-b border-rule px-2 py-1 font-mono">{e ? formatComplex(e.first) : "—"}</td>
                <td className="border-b border-rule px-2 py-1 font-mono">{e ? formatComplex(e.last) : "—"}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </section>
  );
}

function Overlay({ sweep, analysis }: { sweep: SweepData; analysis: Analysis }) {
  const headingId = useId();
  const p = sweep.parameter;
  const tEnd = Math.max(0, ...sweep.overlay.flatMap((s) => s.points.map(([t]) => t))) || analysis.plotHorizon;
  const series = useMemo(
    () => sweep.overlay.map((s) => ({ name: `${p} = ${formatNumber(s.value, 3)}`, data: s.points.map(([t, y]) => ({ t, y })) })),
    [sweep.overlay, p],
  );
  const now = useMemo(() => sampleResponse(analysis.responses.step, tEnd, 200).map(([t, y]) => ({ t, y })), [analysis.responses.step, tEnd]);
  const stable = analysis.stability.verdict === "stable";
  const axis = useMemo(() => yAxis([now, ...series.map((x) => x.data)], stable), [now, series, stable]);
  return (
    <section aria-labelledby={headingId} className="flex flex-col gap-2">
      <h4 id={headingId} className="text-sm font-semibold">Step responses across the range of {p}</h4>
      <figure aria-label={`Step responses from ${analysis.input} to ${analysis.output} for ${series.map((s) => s.name).join(", ")}`} className="flex flex-col gap-1">
        <LineChart responsive style={{ width: "100%", height: 240 }} margin={{ top: 12, right: 16, bottom: 12, left: 4 }}>
          <CartesianGrid className="text-rule" stroke="currentColor" strokeDasharray="2 4" />
          <XAxis type="number" dataKey="t" domain={[0, tEnd]} tickFormatter={(t: number) => formatNumber(t, 3)} fontSize={11}
            label={{ value: "t (s)", position: "insideBottomRight", offset: -8, fontSize: 11 }} />
          <YAxis type="number" domain={axis?.domain ?? ["auto", "auto"]} ticks={axis?.ticks} allowDataOverflow tickFormatter={(y: number) => formatNumber(y, 3)} width={56} fontSize={11} />
          {series.map((s, i) => (
            <Line key={s.name} data={s.data} dataKey="y" name={s.name} dot={false} isAnimationActive={false} className={SERIES[i % SERIES.length]} stroke="currentColor" strokeWidth={1.8} />
          ))}
          <Line data={now} dataKey="y" name="current" dot={false} isAnimationActive={false} className="text-ink" stroke="currentColor" strokeWidth={2} strokeDasharray="6 3" />
        </LineChart>
        <figcaption>
          <ul aria-label="Legend" className="flex flex-wrap gap-x-4 gap-y-1 text-xs text-ink-soft">
            {series.map((s, i) => (
              <li key={s.name} className="inline-flex items-center gap-1.5">
                <span aria-hidden="true" className={`inline-block h-0.5 w-5 bg-current ${SERIES[i % SERIES.length]}`} />
                {s.name}
              </li>
            ))}
            <li className="inline-flex items-center gap-1.5">
              <span aria-hidden="true" className="inline-block w-5 border-t-2 border-dashed border-ink" />
              {p} = {formatNumber(sweep.current, 3)} (current)
            </li>
          </ul>
        </figcaption>
      </figure>
    </section>
  );
}
