import { useId } from "react";
import type { DeadTimeReport } from "@shared/analysis/deadTime";
import { PADE_MAX, PADE_MIN } from "@shared/analysis/pade";
import { formatNumber } from "@/features/editor/lib/analysisFormat";
import { plural } from "@shared/text/words";

interface Props {
  deadTime: DeadTimeReport;
  onOrder: (order: number) => void;
}

const ORDERS = Array.from({ length: PADE_MAX - PADE_MIN + 1 }, (_, i) => PADE_MIN + i);

/** Says which figures rest on a Padé approximation of the diagram's dead times, and lets the user pick its order. */
export function DeadTimeBar({ deadTime, onOrder }: Props) {
  const id = useId();
  const { delays, padeOrder } = deadTime;
  return (
    <section aria-label="Dead times" className="flex flex-wrap items-center gap-x-3 gap-y-1 rounded border-l-4 border-trace bg-trace-tint px-3 py-2 text-sm">
      <span>
        {plural(delays.length, "Dead time", "Dead times")}{" "}
        {delays.map((d, i) => (
          <span key={d.blocks.join()} className="font-mono">
            {i > 0 && ", "}
            {d.blocks.join(", ")}: T = {formatNumber(d.seconds)} s
          </span>
        ))}
        . Poles, Routh array, stable ranges and time responses use <strong>Padé order {padeOrder}</strong> for each
        e^(−sT); margins, Ms, bandwidth, Bode and Nyquist use the exact e^(−jωT).
      </span>
      <label htmlFor={id} className="flex items-center gap-1.5">
        Padé order
        <select id={id} value={padeOrder} onChange={(e) => onOrder(Number(e.target.value))} className="rounded border border-rule bg-paper px-1.5 py-0.5">
          {ORDERS.map((n) => (
            <option key={n} value={n}>
              {n}
            </option>
          ))}
        </select>
      </label>
    </section>
  );
}
