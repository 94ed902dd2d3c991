import { useId, useMemo } from "react";
import { CartesianGrid, Line, LineChart, XAxis, YAxis } from "recharts";
import type { Analysis } from "@shared/analysis/analyze";
import { sampleResponse } from "@shared/analysis/stepMetrics";
import { RootLocusView } from "@/features/editor/components/analysis/RootLocusView";
import { niceStep } from "@shared/analysis/axisSteps";
import { formatNumber } from "@/features/editor/lib/analysisFormat";
import type { SweepData } from "@shared/analysis/answer";

/** Series colours; the legend below the chart uses the same classes (recharts' legend cannot read currentColor). */
const SERIES = ["text-signal", "text-trace", "text-steady", "text-fault", "text-ink-soft"];

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

/** Root locus of the closed-loop poles over all gains of one parameter and step responses across its slider range. */
export function SweepView({ sweep, analysis, negative, onNegative }: { sweep: SweepData | null; analysis: Analysis; negative: boolean; onNegative: (on: boolean) => void }) {
  if (!sweep) return <p className="text-sm text-ink-soft">No parameters to sweep: add one in the parameter table.</p>;
  const p = sweep.parameter;
  const [lo, hi] = sweep.range;
  return (
    <div className="flex flex-col gap-5">
      <RootLocusView sweep={sweep} analysis={analysis} negative={negative} onNegative={onNegative} />
      <Overlay sweep={sweep} analysis={analysis} />
      <p className="text-xs text-ink-soft">
        The slider range of {p} is {formatNumber(lo)} to {formatNumber(hi)}; the other parameters stay at their current values.
      </p>
    </div>
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
