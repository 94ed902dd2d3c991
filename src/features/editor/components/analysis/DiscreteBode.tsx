import { useMemo } from "react";
import { CartesianGrid, Legend, Line, LineChart, ReferenceLine, Tooltip, XAxis, YAxis } from "recharts";
import type { DiscreteResponse } from "@shared/implement/discreteResponse";
import { formatNumber } from "@/features/editor/lib/analysisFormat";
import { frequencyAxisProps } from "@/features/editor/lib/logTicks";

// The continuous curve in graphite and dashed, the discrete one in the action colour, as the compare page draws two versions.
const CONTINUOUS = { stroke: "#4d5663", strokeDasharray: "6 4" };
const DISCRETE = { stroke: "#1d5c63" };

/** Bode magnitude and phase of G(jω) and H(e^(jωTs)) overlaid up to the Nyquist frequency π/Ts. */
export function DiscreteBode({ response, bandwidth }: { response: DiscreteResponse; bandwidth: number | null }) {
  const rows = useMemo(
    () => response.omega.map((w, i) => ({ w, cMag: response.continuous.magDb[i], cPhase: response.continuous.phaseDeg[i], dMag: response.discrete.magDb[i], dPhase: response.discrete.phaseDeg[i] })),
    [response],
  );
  const domain: [number, number] = [response.omega[0], response.nyquist];
  const plot = (keys: ["cMag", "dMag"] | ["cPhase", "dPhase"], unit: string, height: number) => (
    <LineChart responsive style={{ width: "100%", height }} data={rows} syncId="discrete-bode" margin={{ top: 8, right: 16, bottom: 8, left: 4 }}>
      <CartesianGrid className="text-rule" stroke="currentColor" strokeDasharray="2 4" />
      <XAxis {...frequencyAxisProps(domain)} />
      <YAxis type="number" domain={["auto", "auto"]} width={56} fontSize={11} tickFormatter={(v: number) => formatNumber(v, 3)}
        label={{ value: unit, angle: -90, position: "insideLeft", fontSize: 11 }} />
      <Tooltip labelFormatter={(w) => `ω = ${formatNumber(Number(w), 5)} rad/s`} formatter={(v) => `${formatNumber(Number(v), 5)} ${unit}`} />
      {keys[0] === "cMag" && <Legend wrapperStyle={{ fontSize: 12 }} />}
      {bandwidth !== null && bandwidth < response.nyquist && (
        <ReferenceLine x={bandwidth} className="text-steady" stroke="currentColor" strokeDasharray="5 3" label={{ value: "bandwidth", position: "insideTopLeft", fontSize: 10, fill: "currentColor" }} />
      )}
      <Line dataKey={keys[0]} name="continuous G(jω)" dot={false} isAnimationActive={false} strokeWidth={2} {...CONTINUOUS} />
      <Line dataKey={keys[1]} name="discrete H(e^jωTs)" dot={false} isAnimationActive={false} strokeWidth={2} connectNulls={false} {...DISCRETE} />
    </LineChart>
  );
  return (
    <figure aria-label={`Bode plots of the continuous and the discrete transfer up to the Nyquist frequency ${formatNumber(response.nyquist)} rad/s`} className="flex flex-col gap-1">
      {plot(["cMag", "dMag"], "dB", 200)}
      {plot(["cPhase", "dPhase"], "°", 180)}
      <figcaption className="text-xs text-ink-soft">
        Up to the Nyquist frequency π/Ts = {formatNumber(response.nyquist)} rad/s, the right edge; the discrete phase is unwrapped onto the continuous one.
        {bandwidth !== null && bandwidth < response.nyquist && " Green dashed line: the closed-loop bandwidth of the analysed pair."}
      </figcaption>
    </figure>
  );
}
