import { polyParams } from "@shared/algebra/poly";
import { ratDenominator, ratNumerator, type RatFn } from "@shared/algebra/ratfn";
import { AnalysisError } from "@shared/analysis/errors";
import { transferAt } from "@shared/analysis/nominal";
import { carriesGain, namedBlock } from "@shared/diagram/blockKinds";
import { parameterValue } from "@shared/diagram/schema";
import type { ExactReduction } from "@shared/reduce/reduceDiagram";
import { ImplementError, type Subject } from "@shared/implement/errors";
import type { ExactTf } from "@shared/implement/stateSpace";

/** One block's own transfer, or the closed-loop transfer of an input → output pair. */
export type ImplementSelection = { block: string } | { input: string; output: string };

/** Words and id of a selection. Example: subjectOf(doc, { input: "r", output: "y" }).what === "the pair r → y". */
function subjectOf(reduction: ExactReduction, selection: ImplementSelection): { subject: Subject; gain: RatFn } {
  const { doc } = reduction.diagram;
  if ("block" in selection) {
    const block = doc.blocks.find((b) => b.id === selection.block);
    if (!block) throw new ImplementError("unknown-block", `There is no block "${selection.block}". The blocks with a transfer are: ${doc.blocks.filter(carriesGain).map((b) => b.id).join(", ") || "none"}.`, selection.block);
    const gain = reduction.gains.get(block.id);
    if (!carriesGain(block) || !gain) {
      throw new ImplementError("no-transfer", `The ${namedBlock(block)} has no transfer of its own to implement: choose a gain, transfer function or integrator, or an input → output pair.`, block.id);
    }
    return { subject: { what: namedBlock(block), id: block.id }, gain };
  }
  const pair = `${selection.input} → ${selection.output}`;
  const t = reduction.transfers.find((x) => x.input === selection.input && x.output === selection.output);
  if (!t) throw new ImplementError("unknown-pair-id", `The reduction holds no pair ${pair}: choose an input and an output block of the diagram.`, pair);
  return { subject: { what: `the pair ${pair}`, id: pair }, gain: t.gain };
}

/** The nominal parameter values of the document, overridden by `values`. */
export const valuesFor = (reduction: ExactReduction, values: Readonly<Record<string, number>> = {}): Record<string, number> => ({
  ...Object.fromEntries(Object.entries(reduction.diagram.doc.parameters).map(([k, v]) => [k, parameterValue(v)])),
  ...values,
});

/**
 * The selected transfer at parameter values (nominal unless given), in lowest terms with a monic denominator.
 * A transfer that holds a dead time is refused ("dead-time", naming its blocks): e^(−sT) has no finite-order
 * realisation and no exact rational z-transform unless T is a whole number of samples, and the published result
 * holds rational transfers only — give the dead time as a Padé transfer block to implement it.
 * Example: selectedTransfer(reduction, { block: "c" }).tf is (2s + 4)/s for c = "2*(s + 2)/s".
 */
export function selectedTransfer(reduction: ExactReduction, selection: ImplementSelection, values?: Readonly<Record<string, number>>): { subject: Subject; tf: ExactTf } {
  const { subject, gain } = subjectOf(reduction, selection);
  const names = new Set([...polyParams(ratNumerator(gain)), ...polyParams(ratDenominator(gain))]);
  const delays = reduction.delays.filter((d) => names.has(d.symbol));
  if (delays.length) {
    const blocks = delays.flatMap((d) => d.blocks);
    throw new ImplementError(
      "dead-time",
      `The transfer of ${subject.what} holds the dead time e^(−sT) of block${blocks.length > 1 ? "s" : ""} ${blocks.join(", ")}, which has no finite-order state-space realisation or rational discrete equivalent. Replace it by a transfer block with its Padé approximant, or implement a block or pair without it.`,
      "block" in selection ? selection.block : blocks[0],
    );
  }
  try {
    const { num, den } = transferAt(gain, valuesFor(reduction, values));
    return { subject, tf: { num, den } };
  } catch (err) {
    if (err instanceof AnalysisError) throw new ImplementError("singular-at-values", err.message, subject.id);
    throw err;
  }
}
