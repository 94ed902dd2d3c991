import { polyToLatex, polyToText } from "@shared/algebra/polytext";
import { ratDenominator, ratNumerator, ratToLatex } from "@shared/algebra/ratfn";
import type { ExactReduction } from "@shared/reduce/reduceDiagram";
import { showRat } from "@shared/reduce/ratView";
import type { ReductionResult } from "@shared/reduce/result";
import { printSteps } from "@shared/reduce/trace";

/**
 * The last step of the reducer: its exact values printed in the published form (expression syntax,
 * descending powers of s, exact coefficients; LaTeX beside). Nothing downstream reads this text back.
 * Example: printReduction(reduction).transfers[0] → { numerator: "K*s + 2*K", denominator: "s^2 + …", … }.
 */
export function printReduction(r: ExactReduction): ReductionResult {
  return {
    transfers: r.transfers.map(({ input, output, gain, cancelled }) => ({
      input,
      output,
      numerator: polyToText(ratNumerator(gain)),
      denominator: polyToText(ratDenominator(gain)),
      latex: ratToLatex(gain),
      cancelled: cancelled.map((c) => ({ ...c, factor: polyToText(c.factor) })),
    })),
    characteristic: polyToText(r.characteristic),
    characteristicLatex: polyToLatex(r.characteristic),
    steps: printSteps(r.steps, showRat),
    warnings: r.warnings,
  };
}
