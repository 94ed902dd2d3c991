import { useMemo } from "react";
import { CartesianGrid, Legend, Line, LineChart, Tooltip, XAxis, YAxis } from "recharts";
import type { Analysis } from "@shared/analysis/analyze";
import { sampleResponse } from "@shared/analysis/stepMetrics";
import { formatNumber } from "@/features/editor/lib/analysisFormat";
import { frequencyAxisProps } from "@/features/editor/lib/logTicks";

/** One version's curve: its label in the legend and its analysis (null: nothing to draw, e.g. saved with problems). */
export interface Curve {
  label: string;
  analysis: Analysis | null;
}

// The older version in graphite and dashed, the newer in the action colour: readable in print and for colour-blind readers.
const STYLES = [
  { stroke: "#4d5663", strokeDasharray: "6 4" },
  { stroke: "#1d5c63", strokeDasharray: undefined },
] as const;

const SAMPLES = 300;

/** One curve alone is drawn solid in the action colour, as the newer of two would be. */
const styleOf = (i: number, count: number) => STYLES[count === 1 ? 1 : i];

/** "v1 and v2", or "v3" for one curve. */
const labels = (curves: readonly Curve[]) => curves.map((c) => c.label).join(" and ");

/** The versions' unit-step responses (one or two) on one time axis, long enough for the slowest; `height` in px. */
export function StepOverlay({ curves, height = 240 }: { curves: readonly Curve[]; height?: number }) {
  const horizon = Math.max(...curves.map((c) => c.analysis?.plotHorizon ?? 0));
  const series = useMemo(
    () => curves.map((c) => (c.analysis && horizon > 0 ? sampleResponse(c.analysis.responses.step, horizon, SAMPLES).map(([t, y]) => ({ t, y })) : [])),
    [curves, horizon],
  );
  if (horizon === 0) return <p className="text-sm text-ink-soft">{curves.length === 1 ? "This version has no" : "Neither version has a"} step response to draw.</p>;
  return (
    <figure aria-label={`Unit-step response${curves.length === 1 ? "" : "s"} of ${labels(curves)}, t from 0 to ${formatNumber(horizon)} s`}>
      <LineChart responsive style={{ width: "100%", height }} margin={{ top: 8, right: 16, bottom: 8, left: 4 }}>
        <CartesianGrid className="text-rule" stroke="currentColor" strokeDasharray="2 4" />
        <XAxis type="number" dataKey="t" domain={[0, horizon]} tickFormatter={(t: number) => formatNumber(t, 3)} fontSize={11}
          label={{ value: "t (s)", position: "insideBottomRight", offset: -4, fontSize: 11 }} />
        <YAxis type="number" domain={["auto", "auto"]} width={56} fontSize={11} tickFormatter={(v: number) => formatNumber(v, 3)} />
        <Tooltip labelFormatter={(t) => `t = ${formatNumber(Number(t), 4)} s`} formatter={(v) => formatNumber(Number(v), 5)} />
        {curves.length > 1 && <Legend wrapperStyle={{ fontSize: 12 }} />}
        {curves.map((c, i) =>
          series[i].length ? (
            <Line key={c.label} data={series[i]} dataKey="y" name={c.label} dot={false} isAnimationActive={false} strokeWidth={2} {...styleOf(i, curves.length)} />
          ) : null,
        )}
      </LineChart>
    </figure>
  );
}

/** The versions' closed-loop Bode plots (magnitude, then phase) over the union of their frequency ranges; `height` of each in px. */
export function BodeOverlay({ curves, height = 190 }: { curves: readonly Curve[]; height?: number }) {
  const series = useMemo(
    () => curves.map(({ analysis: a }) => (a ? a.bode.omega.map((w, i) => ({ w, mag: a.bode.magDb[i], phase: a.bode.phaseDeg[i] })) : [])),
    [curves],
  );
  const omegas = series.flatMap((s) => (s.length ? [s[0].w, s[s.length - 1].w] : []));
  if (!omegas.length) return <p className="text-sm text-ink-soft">{curves.length === 1 ? "This version has no" : "Neither version has a"} frequency response to draw.</p>;
  const domain: [number, number] = [Math.min(...omegas), Math.max(...omegas)];
  const plot = (key: "mag" | "phase", unit: string) => (
    <LineChart responsive style={{ width: "100%", height }} syncId="compare-bode" margin={{ top: 8, right: 16, bottom: 8, left: 4 }}>
      <CartesianGrid className="text-rule" stroke="currentColor" strokeDasharray="2 4" />
      <XAxis {...frequencyAxisProps(domain)} />
      <YAxis type="number" domain={["auto", "auto"]} width={56} fontSize={11} tickFormatter={(v: number) => formatNumber(v, 3)}
        label={{ value: unit, angle: -90, position: "insideLeft", fontSize: 11 }} />
      <Tooltip labelFormatter={(w) => `ω = ${formatNumber(Number(w), 5)} rad/s`} formatter={(v) => `${formatNumber(Number(v), 5)} ${unit}`} />
      {key === "mag" && curves.length > 1 && <Legend wrapperStyle={{ fontSize: 12 }} />}
      {curves.map((c, i) =>
        series[i].length ? (
          <Line key={c.label} data={series[i]} dataKey={key} name={c.label} dot={false} isAnimationActive={false} strokeWidth={2} {...styleOf(i, curves.length)} />
        ) : null,
      )}
    </LineChart>
  );
  return (
    <figure aria-label={`Closed-loop Bode plots of ${labels(curves)}: magnitude in dB and phase in degrees`} className="flex flex-col gap-1">
      {plot("mag", "dB")}
      {plot("phase", "°")}
    </figure>
  );
}
