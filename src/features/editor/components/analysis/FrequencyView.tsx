import { useId, useMemo, useState, type ReactNode } from "react";
import { CartesianGrid, Line, LineChart, ReferenceDot, ReferenceLine, Tooltip, XAxis, YAxis } from "recharts";
import type { Analysis } from "@shared/analysis/analyze";
import type { BodeData } from "@shared/analysis/frequency";
import type { LoopAnalysis } from "@shared/analysis/loopAnalysis";
import { Tex } from "@/features/editor/components/Tex";
import { formatNumber } from "@/features/editor/lib/analysisFormat";
import { logTicks } from "@/features/editor/lib/logTicks";

type Which = "closed" | "loop";

/** Bode plots of T and L, the margins read from L at the break, and the Nyquist verdict beside them. */
export function FrequencyView({ analysis }: { analysis: Analysis }) {
  const [which, setWhich] = useState<Which>("closed");
  const name = useId();
  const loop = analysis.loop;
  const shown: Which = which === "loop" && loop ? "loop" : "closed";
  const choices: { value: Which; label: string; disabled: boolean }[] = [
    { value: "closed", label: "Closed loop T(jω)", disabled: false },
    { value: "loop", label: "Loop gain L(jω)", disabled: !loop },
  ];
  return (
    <div className="flex flex-col gap-4">
      <fieldset className="flex flex-wrap items-center gap-x-4 gap-y-1 text-sm">
        <legend className="mb-1 text-xs text-ink-soft">Bode plot of</legend>
        {choices.map((c) => (
          <label key={c.value} className={`flex items-center gap-1.5 ${c.disabled ? "text-ink-faint" : ""}`}>
            <input type="radio" name={name} value={c.value} checked={shown === c.value} disabled={c.disabled} onChange={() => setWhich(c.value)} className="accent-signal" />
            {c.label}
          </label>
        ))}
      </fieldset>
      {shown === "loop" && loop ? (
        <BodePlots data={loop.bode} title="Loop gain L(jω)" loop={loop} bandwidth={null} />
      ) : (
        <BodePlots data={analysis.bode} title="Closed loop T(jω)" loop={null} bandwidth={analysis.bandwidth} />
      )}
      {loop ? <LoopFigures analysis={analysis} loop={loop} /> : <NoLoop analysis={analysis} />}
    </div>
  );
}


/** The curve's value at ω, interpolated linearly in log ω between the samples around it. */
function valueAt(omega: readonly number[], ys: readonly number[], w: number): number {
  const i = omega.findIndex((x) => x >= w);
  if (i <= 0) return ys[Math.max(i, 0)];
  const f = (Math.log(w) - Math.log(omega[i - 1])) / (Math.log(omega[i]) - Math.log(omega[i - 1]));
  return ys[i - 1] + f * (ys[i] - ys[i - 1]);
}

/**
 * The margins as spans on the Bode plot: the gain margin from |L| at the phase crossover up to 0 dB, the phase
 * margin from the −180° line (the copy nearest the curve) up to the phase at the gain crossover.
 */
function marginSpans(data: BodeData, loop: LoopAnalysis | null) {
  const m = loop?.margins;
  const gm = m && m.gainMarginDb !== null && m.phaseCrossover !== null ? { omega: m.phaseCrossover, from: -m.gainMarginDb, to: 0, value: m.gainMarginDb } : null;
  let pm = null;
  if (m && m.phaseMarginDeg !== null && m.gainCrossover !== null) {
    const phase = valueAt(data.omega, data.phaseDeg, m.gainCrossover);
    pm = { omega: m.gainCrossover, from: phase - m.phaseMarginDeg, to: phase, value: m.phaseMarginDeg };
  }
  return { gm, pm };
}

const omegaText = (w: number) => (w === Infinity ? "ω → ∞" : `ω = ${formatNumber(w)} rad/s`);

function BodePlots({ data, title, loop, bandwidth }: { data: BodeData; title: string; loop: LoopAnalysis | null; bandwidth: number | null }) {
  const phase = data.phaseDeg;
  const rows = useMemo(() => data.omega.map((w, i) => ({ w, mag: data.magDb[i], phase: data.phaseDeg[i] })), [data]);
  const domain: [number, number] = [data.omega[0], data.omega[data.omega.length - 1]];
  const ticks = logTicks(...domain);
  const [pMin, pMax] = [Math.min(...phase), Math.max(...phase)];
  // −180° and its unwrapped copies that the phase curve actually reaches.
  const [kLo, kHi] = [Math.ceil((pMin + 180) / 360), Math.floor((pMax + 180) / 360)];
  const minus180 = loop ? Array.from({ length: Math.max(0, kHi - kLo + 1) }, (_, i) => -180 + 360 * (kLo + i)) : [];
  const gains = loop?.margins.gainCrossovers ?? [];
  const phases = loop?.margins.phaseCrossovers ?? [];
  const spans = marginSpans(data, loop);
  const xAxis = (withTitle: boolean) => (
    <XAxis type="number" dataKey="w" scale="log" domain={domain} ticks={ticks} allowDataOverflow tickFormatter={(w: number) => formatNumber(w, 3)} fontSize={11}
      label={withTitle ? { value: "frequency ω (rad/s)", position: "insideBottomRight", offset: -10, fontSize: 11 } : undefined} />
  );
  const tooltipLabel = (w: unknown) => `ω = ${formatNumber(Number(w), 5)} rad/s`;
  return (
    <figure aria-label={`Bode plot of ${title}: magnitude in dB and phase in degrees against ω in rad/s from ${formatNumber(domain[0])} to ${formatNumber(domain[1])}`} className="flex flex-col gap-1">
      <LineChart responsive style={{ width: "100%", height: 190 }} data={rows} syncId="bode" margin={{ top: 8, right: 16, bottom: 0, left: 4 }}>
        <CartesianGrid className="text-rule" stroke="currentColor" strokeDasharray="2 4" />
        {xAxis(false)}
        <YAxis type="number" domain={["auto", "auto"]} width={56} fontSize={11} tickFormatter={(v: number) => formatNumber(v, 3)}
          label={{ value: "magnitude (dB)", angle: -90, position: "insideLeft", fontSize: 11, style: { textAnchor: "middle" } }} />
        <Tooltip formatter={(v) => [`${formatNumber(Number(v), 5)} dB`, "magnitude"]} labelFormatter={tooltipLabel} />
        {loop && <ReferenceLine y={0} className="text-ink-faint" stroke="currentColor" strokeDasharray="4 3" />}
        {gains.map((c) => (
          <ReferenceLine key={`g${c.omega}`} x={c.omega} className="text-trace" stroke="currentColor"
            label={c.omega === loop?.margins.gainCrossover ? { value: "ω gc", position: "insideTopRight", fontSize: 10, fill: "currentColor" } : undefined} />
        ))}
        {phases.map((c) => [
          <ReferenceLine key={`p${c.omega}`} x={c.omega} className="text-fault" stroke="currentColor" strokeDasharray="5 3" />,
          <ReferenceDot key={`pd${c.omega}`} x={c.omega} y={-c.margin} r={3.5} className="text-fault" fill="currentColor" stroke="none" />,
        ])}
        {bandwidth !== null && (
          <ReferenceLine x={bandwidth} className="text-steady" stroke="currentColor" strokeDasharray="5 3"
            label={{ value: "bandwidth", position: "insideTopRight", fontSize: 10, fill: "currentColor" }} />
        )}
        {spans.gm && (
          <ReferenceLine segment={[{ x: spans.gm.omega, y: spans.gm.from }, { x: spans.gm.omega, y: spans.gm.to }]} ifOverflow="extendDomain"
            className="text-fault" stroke="currentColor" strokeWidth={4} strokeOpacity={0.55}
            label={{ value: `GM ${formatNumber(spans.gm.value, 3)} dB`, position: "right", fontSize: 10, fill: "currentColor" }} />
        )}
        <Line dataKey="mag" name="magnitude" dot={false} isAnimationActive={false} className="text-signal" stroke="currentColor" strokeWidth={2} />
      </LineChart>
      <LineChart responsive style={{ width: "100%", height: 200 }} data={rows} syncId="bode" margin={{ top: 8, right: 16, bottom: 22, left: 4 }}>
        <CartesianGrid className="text-rule" stroke="currentColor" strokeDasharray="2 4" />
        {xAxis(true)}
        <YAxis type="number" domain={["auto", "auto"]} width={56} fontSize={11} tickFormatter={(v: number) => formatNumber(v, 3)}
          label={{ value: "phase (degrees)", angle: -90, position: "insideLeft", fontSize: 11, style: { textAnchor: "middle" } }} />
        <Tooltip formatter={(v) => [`${formatNumber(Number(v), 5)}°`, "phase"]} labelFormatter={tooltipLabel} />
        {minus180.map((p) => (
          <ReferenceLine key={p} y={p} className="text-ink-faint" stroke="currentColor" strokeDasharray="4 3" />
        ))}
        {gains.map((c) => (
          <ReferenceLine key={`g${c.omega}`} x={c.omega} className="text-trace" stroke="currentColor" />
        ))}
        {phases.map((c) => (
          <ReferenceLine key={`p${c.omega}`} x={c.omega} className="text-fault" stroke="currentColor" strokeDasharray="5 3"
            label={c.omega === loop?.margins.phaseCrossover ? { value: "ω pc", position: "insideBottomRight", fontSize: 10, fill: "currentColor" } : undefined} />
        ))}
        {spans.pm && (
          <ReferenceLine segment={[{ x: spans.pm.omega, y: spans.pm.from }, { x: spans.pm.omega, y: spans.pm.to }]} ifOverflow="extendDomain"
            className="text-trace" stroke="currentColor" strokeWidth={4} strokeOpacity={0.6}
            label={{ value: `PM ${formatNumber(spans.pm.value, 3)}°`, position: "right", fontSize: 10, fill: "currentColor" }} />
        )}
        <Line dataKey="phase" name="phase" dot={false} isAnimationActive={false} className="text-signal" stroke="currentColor" strokeWidth={2} />
      </LineChart>
      <figcaption className="text-xs text-ink-soft">
        Phase unwrapped along ω &gt; 0. {loop
          ? `Amber lines: gain crossovers (|L| = 1); red dashed lines and dots: phase crossovers (L real and negative); grey dashed: 0 dB and −180°.${
              spans.gm ? ` Red bar: the gain margin, ${formatNumber(spans.gm.value, 4)} dB at ${omegaText(spans.gm.omega)}.` : ""
            }${spans.pm ? ` Amber bar: the phase margin, ${formatNumber(spans.pm.value, 4)}° at ${omegaText(spans.pm.omega)}.` : ""}`
          : bandwidth !== null
            ? `Green dashed line: the closed-loop bandwidth, ${omegaText(bandwidth)}.`
            : "No closed-loop bandwidth to mark."}
      </figcaption>
    </figure>
  );
}

function NoLoop({ analysis }: { analysis: Analysis }) {
  const why = analysis.notes.find((n) => n.startsWith("No break point") || n.startsWith("The loop "));
  return (
    <section aria-label="Margins" className="flex flex-col gap-2 text-sm">
      <p role="note" className="rounded border border-trace bg-trace-tint px-3 py-2">
        Margins and the Nyquist plot need a loop gain, and there is none here. {why}
        {!why?.includes("Pick a wire") && " Pick a wire on the canvas to break the loop there."}
      </p>
      <FigureTable rows={[bandwidthRow(analysis)]} />
    </section>
  );
}

type Row = { head: string; value: string; detail: string; bad?: boolean };

const bandwidthRow = (analysis: Analysis): Row => ({
  head: "Closed-loop bandwidth",
  value: analysis.bandwidth === null ? "—" : `${formatNumber(analysis.bandwidth)} rad/s`,
  detail: analysis.bandwidth === null ? "T(0) is 0 or infinite, or |T(jω)| never falls to |T(0)|/√2" : "first ω where |T(jω)| = |T(0)|/√2 (−3 dB)",
});

function FigureTable({ rows }: { rows: Row[] }) {
  return (
    <table className="w-full border-collapse">
      <tbody>
        {rows.map((r) => (
          <tr key={r.head} className="border-b border-rule last:border-b-0">
            <th scope="row" className="py-1 pr-3 text-left align-top font-medium whitespace-nowrap">{r.head}</th>
            <td className={`py-1 pr-3 align-top font-mono whitespace-nowrap ${r.bad ? "text-fault" : ""}`}>{r.value}</td>
            <td className="py-1 align-top text-xs text-ink-faint">{r.detail}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

function LoopFigures({ analysis, loop }: { analysis: Analysis; loop: LoopAnalysis }) {
  const m = loop.margins;
  const note = (start: string) => loop.notes.find((n) => n.startsWith(start)) ?? "";
  const ms = loop.sensitivityPeak;
  const rows: Row[] = [
    m.gainMarginDb === null
      ? { head: "Gain margin", value: "∞", detail: note("No phase crossover") }
      : { head: "Gain margin", value: `${formatNumber(m.gainMarginDb)} dB`, detail: `at the phase crossover ${omegaText(m.phaseCrossover ?? NaN)}`, bad: m.gainMarginDb < 0 },
    m.phaseMarginDeg === null
      ? { head: "Phase margin", value: "∞", detail: note("No gain crossover") }
      : { head: "Phase margin", value: `${formatNumber(m.phaseMarginDeg)}°`, detail: `at the gain crossover ${omegaText(m.gainCrossover ?? NaN)}`, bad: m.phaseMarginDeg < 0 },
    loop.delayMargin !== null
      ? { head: "Delay margin", value: `${formatNumber(loop.delayMargin)} s`, detail: "extra loop delay that brings a gain crossover to −180°" }
      : loop.nyquist.verdict === "stable"
        ? { head: "Delay margin", value: "∞", detail: "no gain crossover: no delay can destabilise the loop" }
        : { head: "Delay margin", value: "—", detail: note("The delay margin") },
    ms
      ? { head: "Sensitivity peak Ms", value: `${formatNumber(ms.value)} (${formatNumber(20 * Math.log10(ms.value))} dB)`, detail: `max |1/(1 + L(jω))|, ${ms.omega === 0 ? "at ω = 0" : omegaText(ms.omega)}` }
      : { head: "Sensitivity peak Ms", value: "∞", detail: note("The sensitivity peak") },
    bandwidthRow(analysis),
  ];
  return (
    <section aria-label="Margins" className="flex flex-col gap-3 text-sm">
      <div className="rounded border border-rule bg-paper px-3 py-2">
        <p className="text-xs text-ink-soft">
          Loop broken at <span className="font-mono">{loop.breakPoint.label}</span> (
          {loop.breakPoint.chosen === "given" ? "the wire you picked" : "default: the wire into the first minus-signed port the input reaches"}); L = −w/u.
        </p>
        <div className="overflow-x-auto py-1">
          <Tex display latex={`L(s) = ${loop.L.latex}`} />
        </div>
      </div>
      <div className="grid gap-4 @3xl:grid-cols-2">
        <div className="flex flex-col gap-2">
          <h3 className="text-sm font-semibold">Margins</h3>
          <FigureTable rows={rows} />
          <CrossoverList title="Gain crossovers" items={m.gainCrossovers.map((c) => `${omegaText(c.omega)}: ${formatNumber(c.margin)}°`)} />
          <CrossoverList title="Phase crossovers" items={m.phaseCrossovers.map((c) => `${omegaText(c.omega)}: ${formatNumber(c.margin)} dB`)} />
        </div>
        <NyquistFigures loop={loop} />
      </div>
    </section>
  );
}

/** All crossovers when there are several: the table reports the one with the smallest |margin|. */
function CrossoverList({ title, items }: { title: string; items: string[] }) {
  if (items.length < 2) return null;
  return (
    <p className="text-xs text-ink-soft">
      {title} ({items.length}): {items.join("; ")}. The table reports the one with the smallest |margin|.
    </p>
  );
}

function NyquistFigures({ loop }: { loop: LoopAnalysis }) {
  const ny = loop.nyquist;
  const { gainMarginDb: gm, phaseMarginDeg: pm } = loop.margins;
  // The caution matters most when margins and verdict seem to disagree.
  const stress = ny.openLoopRhpPoles > 0 || (ny.verdict === "stable" && ((gm ?? 0) < 0 || (pm ?? 0) < 0));
  const verdict: Record<typeof ny.verdict, ReactNode> = {
    stable: <span className="font-semibold text-steady">stable</span>,
    unstable: <span className="font-semibold text-fault">unstable</span>,
    marginal: <span className="font-semibold text-fault">marginal (the curve passes through −1)</span>,
  };
  return (
    <div className="flex flex-col gap-2">
      <h3 className="text-sm font-semibold">Nyquist criterion</h3>
      <NyquistPlot points={loop.nyquistPoints} />
      <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-0.5 text-xs">
        <dt className="text-ink-soft">Clockwise encirclements of −1</dt>
        <dd className="font-mono">N = {ny.encirclements ?? "undefined"}</dd>
        <dt className="text-ink-soft">Open-loop poles in the right half-plane</dt>
        <dd className="font-mono">P = {ny.openLoopRhpPoles}</dd>
        <dt className="text-ink-soft">Closed-loop poles in the right half-plane</dt>
        <dd className="font-mono">Z = N + P = {ny.closedLoopRhpPoles ?? "undefined"}</dd>
      </dl>
      <p>Closed loop by the Nyquist criterion: {verdict[ny.verdict]}. <span className="text-ink-soft">{ny.reason}</span></p>
      <p className={`text-xs ${stress ? "rounded border border-trace bg-trace-tint px-2 py-1" : "text-ink-soft"}`}>
        Negative margins alone do not mean instability when L has poles in the right half-plane or the loop is conditionally stable: the encirclement count decides.
      </p>
    </div>
  );
}

type Pt = { re: number; im: number };

/**
 * What the Nyquist plot shows: a square box (equal scaling) around −1, the origin and the curve, with the far
 * part of a curve that runs off towards a pole on the axis cut off at 4 × the median |L| (at least 4).
 */
function nyquistView(points: [number, number][], near: boolean) {
  const finite = points.filter(([re, im]) => Number.isFinite(re) && Number.isFinite(im));
  const mags = finite.map(([re, im]) => Math.hypot(re, im)).sort((a, b) => a - b);
  const cap = near ? 2 : Math.min(mags[mags.length - 1] ?? 1, 4 * Math.max(1, mags[mags.length >> 1] ?? 1));
  let [x0, x1, y1] = [-1, 0, 0];
  for (const [re, im] of finite) {
    if (Math.hypot(re, im) > cap) continue;
    [x0, x1, y1] = [Math.min(x0, re), Math.max(x1, re), Math.max(y1, Math.abs(im))];
  }
  const half = (1.08 * Math.max(x1 - x0, 2 * y1, 0.5)) / 2;
  const cx = (x0 + x1) / 2;
  // Points far outside are pulled in along their ray, so the SVG path stays finite and still leaves the box.
  const far = 20 * half;
  const clamp = ([re, im]: [number, number]): Pt => {
    const r = Math.hypot(re, im);
    return r > far ? { re: (re * far) / r, im: (im * far) / r } : { re, im };
  };
  const positive = points.map((p) => (Number.isFinite(p[0]) && Number.isFinite(p[1]) ? clamp(p) : null));
  const domainX: [number, number] = [cx - half, cx + half];
  const domainY: [number, number] = [-half, half];
  return { domainX, domainY, ticksX: niceTicks(domainX), ticksY: niceTicks(domainY), runs: splitRuns(positive) };
}

/** Round ticks (1, 2 or 5 × 10^k apart) inside a range, about five of them. */
function niceTicks([lo, hi]: [number, number]): number[] {
  const raw = (hi - lo) / 5;
  const p = 10 ** Math.floor(Math.log10(raw));
  const closeness = (d: number) => Math.abs(Math.log(d / raw));
  const step = [1, 2, 5, 10].map((m) => m * p).reduce((a, b) => (closeness(b) < closeness(a) ? b : a));
  const out: number[] = [];
  for (let k = Math.ceil(lo / step); k * step <= hi; k++) out.push(k * step);
  return out;
}

/** Consecutive finite points as separate curves (a pole on the sampled axis breaks the line). */
function splitRuns(points: (Pt | null)[]): Pt[][] {
  const runs: Pt[][] = [[]];
  for (const p of points) {
    if (p) runs[runs.length - 1].push(p);
    else if (runs[runs.length - 1].length) runs.push([]);
  }
  return runs.filter((r) => r.length > 1);
}

const UNIT_CIRCLE: Pt[] = Array.from({ length: 121 }, (_, i) => ({ re: Math.cos((i * Math.PI) / 60), im: Math.sin((i * Math.PI) / 60) }));

/** Plot area is PLOT × PLOT pixels: the axis gutters are added outside it, so re and im get the same scale. */
const PLOT = 260;
const Y_GUTTER = 52;
const X_GUTTER = 28;

function NyquistPlot({ points }: { points: [number, number][] }) {
  const [near, setNear] = useState(false);
  const zoomId = useId();
  const view = useMemo(() => nyquistView(points, near), [points, near]);
  const mirror = view.runs.map((run) => run.map((p) => ({ re: p.re, im: -p.im })));
  const fmt = (v: number) => formatNumber(v, 3);
  return (
    <figure aria-label="Nyquist plot of L(jω): solid for ω > 0, dashed for ω < 0, with the critical point −1 marked" className="flex flex-col gap-1">
      <div className="flex items-center gap-2 text-xs">
        <label htmlFor={zoomId} className="text-ink-soft">View</label>
        <select id={zoomId} value={near ? "near" : "whole"} onChange={(e) => setNear(e.target.value === "near")} className="rounded border border-rule-strong bg-paper-raised px-1.5 py-0.5">
          <option value="whole">Whole curve</option>
          <option value="near">Close to −1</option>
        </select>
      </div>
      <div className="overflow-x-auto">
        <LineChart width={PLOT + Y_GUTTER + 8} height={PLOT + X_GUTTER + 8} margin={{ top: 8, right: 8, bottom: 0, left: 0 }}>
          <CartesianGrid className="text-rule" stroke="currentColor" strokeDasharray="2 4" />
          <XAxis type="number" dataKey="re" domain={view.domainX} allowDataOverflow height={X_GUTTER} ticks={view.ticksX} tickFormatter={fmt} fontSize={11} />
          <YAxis type="number" dataKey="im" domain={view.domainY} allowDataOverflow width={Y_GUTTER} ticks={view.ticksY} tickFormatter={fmt} fontSize={11} />
          <ReferenceLine x={0} className="text-ink-faint" stroke="currentColor" />
          <ReferenceLine y={0} className="text-ink-faint" stroke="currentColor" />
          <Line data={UNIT_CIRCLE} dataKey="im" dot={false} isAnimationActive={false} className="text-rule-strong" stroke="currentColor" strokeDasharray="3 3" />
          {view.runs.map((run, i) => (
            <Line key={`p${i}`} data={run} dataKey="im" dot={false} isAnimationActive={false} className="text-signal" stroke="currentColor" strokeWidth={2} />
          ))}
          {mirror.map((run, i) => (
            <Line key={`m${i}`} data={run} dataKey="im" dot={false} isAnimationActive={false} className="text-signal" stroke="currentColor" strokeWidth={1.5} strokeDasharray="5 3" />
          ))}
          <ReferenceDot x={-1} y={0} r={4} className="text-fault" fill="currentColor" stroke="none"
            label={{ value: "−1", position: "bottom", fontSize: 11, fill: "currentColor" }} />
        </LineChart>
      </div>
      <figcaption className="text-xs text-ink-soft">
        Re L horizontally, Im L vertically, same scale; dotted: the unit circle.{!near && " A curve that runs off towards a pole on the imaginary axis is cut at the frame."}
      </figcaption>
    </figure>
  );
}
