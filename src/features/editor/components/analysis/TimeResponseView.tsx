import { useId, useMemo, useState } from "react";
import { CartesianGrid, Legend, Line, LineChart, ReferenceArea, ReferenceDot, ReferenceLine, Tooltip, XAxis, YAxis } from "recharts";
import type { Analysis } from "@shared/analysis/analyze";
import { PLOT_SAMPLES, sampleResponse } from "@shared/analysis/stepMetrics";
import { responseAt, type InputKind, type TimeResponse } from "@shared/analysis/timeResponse";
import { Button } from "@/components/Button";
import { niceStep } from "@shared/analysis/axisSteps";
import { Tex } from "@/features/editor/components/Tex";
import { formatNumber, formatQuantity } from "@/features/editor/lib/analysisFormat";
import { responseCsv, responseCsvName } from "@/features/editor/lib/responseCsv";
import { saveText } from "@/features/editor/lib/saveText";

const KINDS: { kind: InputKind; label: string }[] = [
  { kind: "step", label: "Unit step" },
  { kind: "impulse", label: "Unit impulse" },
  { kind: "ramp", label: "Unit ramp" },
];
const BANDS = [0.02, 0.05, 0.01];

type Samples = [number, number][];

/** The delayed loop's exact (simulated) response for the chosen input, on the simulation's sample times. */
function exactSamplesOf(analysis: Analysis, kind: InputKind): Samples | null {
  const d = analysis.delayedResponses;
  if (!d || kind === "impulse") return null;
  const ys = d[kind];
  return d.t.map((t, i): [number, number] => [t, ys[i]]).filter(([, y]) => Number.isFinite(y));
}

/** Closed-form y(t) of the chosen pair for a unit step, impulse or ramp: formula, plot, step metrics, CSV. */
export function TimeResponseView({ analysis, band, onBand }: { analysis: Analysis; band: number; onBand: (b: number) => void }) {
  const [kind, setKind] = useState<InputKind>("step");
  const name = useId();
  const response = analysis.responses[kind];
  const exact = useMemo(() => exactSamplesOf(analysis, kind), [analysis, kind]);
  // With an exact response beside it, the Padé model is sampled at the same times so the CSV has one t column.
  const samples = useMemo(
    () => (exact ? exact.map(([t]): [number, number] => [t, responseAt(response, t)]) : sampleResponse(response, analysis.plotHorizon, PLOT_SAMPLES)),
    [exact, response, analysis.plotHorizon],
  );
  const label = KINDS.find((k) => k.kind === kind)?.label ?? kind;
  const pade = analysis.deadTime ? `Padé order ${analysis.deadTime.padeOrder}` : null;
  const csv = exact && pade
    ? responseCsv(samples.map(([t, y], i) => [t, y, exact[i][1]]), ["t", `y_pade${analysis.deadTime?.padeOrder}`, "y_exact"])
    : responseCsv(samples);
  const download = () => saveText(csv, responseCsvName(kind, analysis.input, analysis.output));
  return (
    <div className="flex flex-col gap-3">
      <fieldset className="flex flex-wrap items-center gap-x-4 gap-y-1 text-sm">
        <legend className="mb-1 text-xs text-ink-soft">Input signal at {analysis.input}</legend>
        {KINDS.map((k) => (
          <label key={k.kind} className="flex items-center gap-1.5">
            <input type="radio" name={name} value={k.kind} checked={kind === k.kind} onChange={() => setKind(k.kind)} className="accent-signal" />
            {k.label}
          </label>
        ))}
      </fieldset>
      <Formula response={response} pade={pade} />
      {pade && !exact && analysis.delayedResponses && (
        <p role="note" className="text-xs text-ink-soft">The response with the exact dead time is simulated for the step and the ramp; the impulse shows the {pade} model only.</p>
      )}
      <ResponsePlot analysis={analysis} response={response} samples={samples} exact={exact} pade={pade} label={`${label} response from ${analysis.input} to ${analysis.output}`} />
      {kind === "step" && <StepMetricsTable analysis={analysis} band={band} onBand={onBand} pade={pade} />}
      <div className="flex items-center gap-2">
        <Button size="sm" onClick={download}>Download CSV</Button>
        <span className="text-xs text-ink-faint">
          {exact ? `${samples.length} samples, columns t, y of the ${pade} model and y with the exact dead time` : `${samples.length} samples of y(t), columns t and y`}
        </span>
      </div>
    </div>
  );
}

function Formula({ response, pade }: { response: TimeResponse; pade: string | null }) {
  return (
    <section aria-label="Closed-form response" className="rounded border border-rule bg-paper px-3 py-2 text-sm">
      {pade && <p className="text-xs font-medium text-ink-soft">Closed form of the {pade} model of the dead times</p>}
      {/* Typeset inline, not as a display: KaTeX then breaks a long sum after its + and − signs to fit the width. */}
      <p className="py-1 text-base leading-loose">
        <Tex latex={`y(t) = ${response.latex}, \\quad t \\ge 0`} />
      </p>
      <p className="text-xs text-ink-soft">
        {response.exact
          ? "Exact: every pole is rational or a quadratic surd, so each coefficient and rate is written exactly."
          : "Numeric, 12 significant digits: some poles are roots of a factor of degree 3 or more and are found numerically."}
      </p>
      {response.impulses.length > 0 && (
        <div role="note" className="mt-1.5 rounded border border-trace bg-trace-tint px-2 py-1.5 text-xs">
          <p>T(s) is improper, so the response holds impulses at t = 0 (the plot shows only t &gt; 0):</p>
          <ul className="mt-1 flex flex-wrap gap-x-4">
            {response.impulses.map((i) => (
              <li key={i.order}><Tex latex={i.latex} /></li>
            ))}
          </ul>
        </div>
      )}
      <output aria-label="y(t) as text" className="mt-1 block font-mono text-xs break-all text-ink-soft">{response.formula}</output>
    </section>
  );
}

/** Time of the first sample at or above `level` (of y/final), linearly interpolated: where a plot marker goes. */
function firstReach(samples: Samples, final: number, level: number): number {
  const i = samples.findIndex(([, y]) => y / final >= level);
  if (i <= 0) return 0;
  const [[t0, y0], [t1, y1]] = [samples[i - 1], samples[i]];
  const [g0, g1] = [y0 / final, y1 / final];
  return t0 + ((level - g0) / (g1 - g0)) * (t1 - t0);
}

/** Ticks from 0 to a round axis end (the analysis rounds its horizon to one), one nice step apart. */
const axisTicks = (end: number): number[] => {
  const step = niceStep(end, 5);
  return Array.from({ length: Math.round(end / step) + 1 }, (_, i) => Number((i * step).toPrecision(12)));
};

interface PlotProps {
  analysis: Analysis;
  response: TimeResponse;
  samples: Samples;
  /** The exact dead-time response on the same sample times, when the loop has dead times. */
  exact: Samples | null;
  pade: string | null;
  label: string;
}

function ResponsePlot({ analysis, response, samples, exact, pade, label }: PlotProps) {
  const data = useMemo(() => samples.map(([t, y], i) => ({ t, y, exact: exact?.[i]?.[1] })), [samples, exact]);
  const m = analysis.step;
  const final = m.finalValue;
  const isStep = response.input === "step";
  const t10 = isStep && final && m.riseTime !== null ? firstReach(samples, final, 0.1) : null;
  const tEnd = analysis.plotHorizon;
  return (
    <figure aria-label={`${label}: y(t) for t from 0 to ${formatNumber(tEnd)} s`} className="flex flex-col gap-1">
      <LineChart responsive style={{ width: "100%", height: 240 }} data={data} margin={{ top: 12, right: 16, bottom: 12, left: 4 }}>
        <CartesianGrid className="text-rule" stroke="currentColor" strokeDasharray="2 4" />
        <XAxis type="number" dataKey="t" domain={[0, tEnd]} ticks={axisTicks(tEnd)} tickFormatter={(t: number) => formatNumber(t, 3)} fontSize={11}
          label={{ value: "time t (s)", position: "insideBottomRight", offset: -8, fontSize: 11 }} />
        <YAxis type="number" domain={["auto", "auto"]} tickFormatter={(y: number) => formatNumber(y, 3)} width={56} fontSize={11}
          label={{ value: "output y", angle: -90, position: "insideLeft", fontSize: 11 }} />
        <Tooltip formatter={(y, name) => [formatNumber(Number(y), 6), String(name)]} labelFormatter={(t) => `t = ${formatNumber(Number(t), 6)} s`} />
        {exact && <Legend verticalAlign="top" height={20} wrapperStyle={{ fontSize: 11 }} />}
        {isStep && final !== null && (
          <ReferenceLine y={final} ifOverflow="extendDomain" className="text-steady" stroke="currentColor" strokeDasharray="6 3"
            label={{ value: "final value", position: "insideTopRight", fontSize: 10, fill: "currentColor" }} />
        )}
        {isStep && final !== null && m.settlingTime !== null && [1 - m.settlingBand, 1 + m.settlingBand].map((f) => (
          <ReferenceLine key={f} y={final * f} ifOverflow="extendDomain" className="text-steady" stroke="currentColor" strokeOpacity={0.6} strokeDasharray="2 3" />
        ))}
        {isStep && m.settlingTime !== null && (
          <ReferenceLine x={m.settlingTime} className="text-steady" stroke="currentColor"
            label={{ value: "settled", position: "insideTopLeft", fontSize: 10, fill: "currentColor" }} />
        )}
        {t10 !== null && final !== null && m.riseTime !== null && [
          <ReferenceArea key="rise" x1={t10} x2={t10 + m.riseTime} className="text-trace" fill="currentColor" fillOpacity={0.12} />,
          <ReferenceDot key="10" x={t10} y={0.1 * final} r={3.5} className="text-trace" fill="currentColor" stroke="none" />,
          <ReferenceDot key="90" x={t10 + m.riseTime} y={0.9 * final} r={3.5} className="text-trace" fill="currentColor" stroke="none" />,
        ]}
        {isStep && m.peakTime !== null && (
          <ReferenceDot x={m.peakTime} y={responseAt(response, m.peakTime)} r={4} className="text-fault" fill="currentColor" stroke="none"
            label={{ value: "peak", position: "top", fontSize: 10, fill: "currentColor" }} />
        )}
        <Line dataKey="y" name={pade ? `y(t), ${pade}` : "y(t)"} dot={false} isAnimationActive={false} className="text-signal" stroke="currentColor" strokeWidth={2} />
        {exact && <Line dataKey="exact" name="y(t), exact dead time (simulated)" dot={false} isAnimationActive={false} className="text-ink" stroke="currentColor" strokeWidth={1.5} strokeDasharray="5 3" />}
      </LineChart>
      <figcaption className="text-xs text-ink-soft">
        {exact && analysis.delayedResponses && `Blue: the closed form of the ${pade} model; dark dashed: the exact dead time, simulated with a fixed step of ${formatNumber(analysis.delayedResponses.stepSize, 3)} s. Markers belong to the ${pade} model. `}
        {!isStep
          ? "Markers are drawn for the step response only."
          : [
              t10 !== null && "Amber dots: 10 % and 90 % of the final value; the shaded span between them is the rise time.",
              m.peakTime !== null && "Red dot: the peak.",
              final !== null && "Green dashed line: the final value.",
              m.settlingTime !== null && `Dotted green lines: the ±${formatNumber(100 * m.settlingBand)} % band; solid green line: the settling time.`,
            ].filter(Boolean).join(" ") || "No step metrics to mark."}
      </figcaption>
    </figure>
  );
}

function StepMetricsTable({ analysis, band, onBand, pade }: { analysis: Analysis; band: number; onBand: (b: number) => void; pade: string | null }) {
  const bandId = useId();
  const whyId = useId();
  const m = analysis.step;
  const why = analysis.notes.find((n) => n.startsWith("Step metrics are not defined"));
  const noPeak = analysis.notes.find((n) => n.startsWith("No overshoot"));
  const seconds = (x: number | null | undefined) => (x === null || x === undefined ? null : `${formatNumber(x)} s`);
  const percent = (x: number | null | undefined) => (x === null || x === undefined ? null : `${formatNumber(x)} %`);
  const delayed = analysis.delayedResponses;
  const e = delayed?.stepMetrics;
  const finalText = m.finalValue === null ? null : analysis.dcGain ? formatQuantity(analysis.dcGain) : formatNumber(m.finalValue);
  const rows: [string, string | null, string | null, string][] = [
    ["Rise time", seconds(m.riseTime), seconds(e?.riseTime), "from 10 % to 90 % of the final value"],
    ["Peak time", seconds(m.peakTime), seconds(e?.peakTime), "first time y/T(0) reaches its maximum"],
    ["Overshoot", percent(m.overshootPercent), percent(e?.overshootPercent), "above the final value"],
    ["Settling time", seconds(m.settlingTime), seconds(e?.settlingTime), `last exit from the ±${formatNumber(100 * m.settlingBand)} % band`],
    ["Final value", finalText, e ? finalText : null, "T(0)"],
  ];
  const reasons = [why, m.peakTime === null && m.overshootPercent !== null ? noPeak : undefined].filter(Boolean);
  return (
    <section aria-label="Step metrics" className="flex flex-col gap-2 text-sm">
      <div className="flex items-center gap-2">
        <label htmlFor={bandId} className="text-ink-soft">Settling band</label>
        <select id={bandId} value={String(band)} onChange={(e) => onBand(Number(e.target.value))} className="rounded border border-rule-strong bg-paper-raised px-2 py-1">
          {BANDS.map((b) => (
            <option key={b} value={String(b)}>±{formatNumber(100 * b)} %</option>
          ))}
        </select>
      </div>
      <table className="w-full border-collapse">
        {delayed && (
          <thead>
            <tr className="border-b border-rule text-left text-xs text-ink-soft">
              <th scope="col" className="py-1 pr-3 font-medium">Metric</th>
              <th scope="col" className="py-1 pr-3 font-medium">{pade}</th>
              <th scope="col" className="py-1 pr-3 font-medium">Exact dead time</th>
              <th scope="col" className="py-1 font-medium">Meaning</th>
            </tr>
          </thead>
        )}
        <tbody>
          {rows.map(([head, value, exactValue, meaning]) => (
            <tr key={head} className="border-b border-rule last:border-b-0">
              <th scope="row" className="py-1 pr-3 text-left font-medium whitespace-nowrap">{head}</th>
              <td className="py-1 pr-3 font-mono" aria-describedby={value === null && reasons.length ? whyId : undefined}>{value ?? "—"}</td>
              {delayed && <td className="py-1 pr-3 font-mono">{exactValue ?? "—"}</td>}
              <td className="py-1 text-xs text-ink-faint">{meaning}</td>
            </tr>
          ))}
        </tbody>
      </table>
      {reasons.length > 0 && (
        <p id={whyId} className="text-xs text-ink-soft">— : {reasons.join(" ")}</p>
      )}
    </section>
  );
}
