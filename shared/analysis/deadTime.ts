// What the analysis says about a diagram's dead times: which figures rest on their Padé approximation.
import { polyToText } from "@shared/algebra/polytext";
import { ratDenominator, ratNumerator, ratToTextAndLatex } from "@shared/algebra/ratfn";
import { qDiv, qToNumber } from "@shared/algebra/rational";
import { transferAt } from "@shared/analysis/nominal";
import type { DelayInfo } from "@shared/analysis/prepare";

/** The dead times at the analysed values and the pair's exact transfer with e^(−sT) kept. */
export interface DeadTimeReport {
  padeOrder: number;
  delays: { blocks: string[]; seconds: number; text: string }[];
  exactTransfer: { numerator: string; denominator: string; latex: string };
}

/**
 * The report of a prepared analysis's dead times at parameter values, and the note that names the Padé order.
 * Example: deadTimeAt(info, {}).report.delays[0].seconds === 0.5 for a block with expr "0.5".
 */
export function deadTimeAt(info: DelayInfo, values: Readonly<Record<string, number>>): { report: DeadTimeReport; note: string } {
  const delays = info.delays.map((d) => {
    const t = transferAt(d.T, values);
    // T may vanish at the values (T = Kp with Kp = 0): its numerator is then the empty polynomial.
    const seconds = t.num.length ? qToNumber(qDiv(t.num[0], t.den[0])) : 0;
    return { blocks: d.blocks, seconds, text: ratToTextAndLatex(d.T).text };
  });
  const { latex } = ratToTextAndLatex(info.exactTransfer);
  const report = {
    padeOrder: info.padeOrder,
    delays,
    exactTransfer: { numerator: polyToText(ratNumerator(info.exactTransfer)), denominator: polyToText(ratDenominator(info.exactTransfer)), latex },
  };
  const note = `Padé order ${info.padeOrder}: the poles, zeros, Routh array, stable ranges, time responses and steady state replace each dead time e^(−sT) by its Padé approximant of order ${info.padeOrder}; margins, crossovers, Ms, bandwidth, the Bode and Nyquist plots and the Nyquist verdict use the exact e^(−jωT).`;
  return { report, note };
}
