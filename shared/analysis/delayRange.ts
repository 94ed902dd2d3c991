import { qDiv, qToNumber } from "@shared/algebra/rational";
import { AnalysisError } from "@shared/analysis/errors";
import { transferAt } from "@shared/analysis/nominal";
import type { DelaySymbol } from "@shared/reduce/blockGains";

/**
 * Dead times the numeric analysis can take: 0 or 1 µs ≤ |T| ≤ 10⁶ s. Far outside, the Padé model's
 * coefficients span more than doubles hold and the root finder, the residues and the delay simulation
 * overflow or crawl (the fuzzer found T = 6e-228 taking 1.7 s and T = 3.2e1481 dividing by zero).
 */
export const DELAY_RANGE = { min: 1e-6, max: 1e6 } as const;

/**
 * Throws AnalysisError "delay-range", naming the blocks, for a dead time outside DELAY_RANGE at the values.
 * Example: checkDelayRange([{ T: 1e-9, blocks: ["d"], … }], {}) throws; T = 0.5 passes.
 */
export function checkDelayRange(delays: readonly DelaySymbol[], values: Readonly<Record<string, number>>): void {
  for (const d of delays) {
    const t = transferAt(d.T, values);
    if (!t.num.length) continue; // exactly 0 (a double of a tiny T may underflow to 0: that one is refused)
    const T = Math.abs(qToNumber(qDiv(t.num[0], t.den[0])));
    if (T >= DELAY_RANGE.min && T <= DELAY_RANGE.max) continue;
    throw new AnalysisError(
      "delay-range",
      `The dead time of ${d.blocks.map((b) => `block "${b}"`).join(", ")} is ${T.toPrecision(3)} s; the analysis takes 0 or ${DELAY_RANGE.min} s to ${DELAY_RANGE.max} s — rescale the time unit or drop the dead time.`,
      d.blocks[0],
    );
  }
}
