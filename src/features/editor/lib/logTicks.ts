import { formatNumber } from "@/features/editor/lib/analysisFormat";

/** Powers of ten inside [lo, hi]: the ticks of a log axis. Example: logTicks(0.05, 300) is [0.1, 1, 10, 100]. */
export function logTicks(lo: number, hi: number): number[] {
  const out: number[] = [];
  for (let k = Math.ceil(Math.log10(lo) - 1e-9); k <= Math.floor(Math.log10(hi) + 1e-9); k++) out.push(10 ** k);
  return out;
}

/** The props of a log frequency axis in rad/s over `domain` (recharts XAxis), as the overlaid Bode plots draw it. */
export const frequencyAxisProps = (domain: [number, number]) =>
  ({
    type: "number",
    dataKey: "w",
    scale: "log",
    domain,
    ticks: logTicks(...domain),
    allowDataOverflow: true,
    fontSize: 11,
    tickFormatter: (w: number) => formatNumber(w, 3),
    label: { value: "ω (rad/s)", position: "insideBottomRight", offset: -4, fontSize: 11 },
  }) as const;
