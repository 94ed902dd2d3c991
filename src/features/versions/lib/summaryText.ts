import type { VersionListItem } from "@shared/api/versions";
import { counted } from "@shared/text/words";

const VERDICT = { stable: "stable", marginal: "marginally stable", unstable: "unstable" } as const;
const MINUS = "\u2212";
const oneDecimal = (x: number) => x.toFixed(1).replace("-", MINUS);

/**
 * A version table's result cell: the default pair's order, verdict, phase margin and overshoot, or why there is none.
 * `problem` marks the text to be shown as a fault. Example: "r → y: order 2, stable, PM 51.8°, overshoot 16.3 %".
 */
export function summaryText(v: Pick<VersionListItem, "ok" | "problemCount" | "summary">): { text: string; problem: boolean } {
  if (v.ok === false) return { text: `Saved with ${counted(v.problemCount, "problem")}`, problem: true };
  if (v.ok === null) return { text: "Not checked", problem: false };
  const s = v.summary;
  if (!s) return { text: "Checked; no input–output pair to summarise", problem: false };
  const parts = [`order ${s.order}`];
  if (s.stable === null) parts.push("not analysed (order too high)");
  else parts.push(VERDICT[s.stable]);
  if (s.phaseMarginDeg !== null) parts.push(`PM ${oneDecimal(s.phaseMarginDeg)}°`);
  if (s.overshootPercent !== null) parts.push(`overshoot ${oneDecimal(s.overshootPercent)} %`);
  return { text: `${s.input} → ${s.output}: ${parts.join(", ")}`, problem: false };
}
