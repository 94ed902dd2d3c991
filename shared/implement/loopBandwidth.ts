import { createAnalyzer } from "@shared/analysis/analyzeDiagram";
import type { ExactReduction } from "@shared/reduce/reduceDiagram";
import type { ImplementSelection } from "@shared/implement/selection";

/**
 * The closed-loop bandwidth a sample time is judged against: the pair's own for a pair, the default pair's (the
 * first input → the first output) for a block; null when the analysis has none. The editor reads the same figure
 * from the analysis it already shows. Example: loopBandwidth(reduction, { block: "pi" }) → { bandwidth: 4.1, loop: "r → y" }.
 */
export function loopBandwidth(reduction: ExactReduction, selection: ImplementSelection, values: Record<string, number> = {}): { bandwidth: number | null; loop: string } | null {
  const pair = "block" in selection ? { input: null, output: null } : selection;
  const answer = createAnalyzer()(reduction, { ...pair, break: null, values, settlingBand: 0.02, sweepParameter: null, withSweep: false });
  if (!answer.ok) return null;
  return { bandwidth: answer.analysis.bandwidth, loop: `${answer.analysis.input} → ${answer.analysis.output}` };
}
