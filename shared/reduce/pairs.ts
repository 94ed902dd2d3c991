import type { Problem } from "@shared/diagram/problems";
import type { DiagramDocument } from "@shared/diagram/schema";
import { BLOCK_KINDS } from "@shared/diagram/blockKinds";
import { withArticle } from "@shared/text/words";

/** Most (input, output) pairs one reduction computes; beyond it, ask for one pair. */
export const MAX_PAIRS = 1000;

/**
 * The (input, output) pairs to reduce, in document order: all of them, or those with the chosen input
 * and/or output. An id that is not an input (or output) block is a problem "unknown-pair-id".
 * Example: selectPairs(doc, { output: "y" }) → { pairs: [["r", "y"], ["d", "y"]], problems: [] }.
 */
export function selectPairs(
  doc: DiagramDocument,
  opts: { input?: string; output?: string },
): { pairs: [string, string][]; problems: Problem[] } {
  const problems: Problem[] = [];
  const pick = (kind: "input" | "output", chosen: string | undefined): string[] => {
    const all = doc.blocks.filter((b) => b.type === kind).map((b) => b.id);
    if (chosen === undefined || all.includes(chosen)) return chosen === undefined ? all : [chosen];
    const block = doc.blocks.find((b) => b.id === chosen);
    const why = block ? `block "${chosen}" is ${withArticle(BLOCK_KINDS[block.type].name)}, not an ${kind}` : `there is no block "${chosen}"`;
    problems.push({
      severity: "error",
      code: "unknown-pair-id",
      field: kind,
      ...(block ? { blockId: chosen } : {}),
      message: `Cannot reduce for ${kind} "${chosen}": ${why}. The ${kind}s are: ${all.join(", ") || "none"}.`,
    });
    return [];
  };
  const inputs = pick("input", opts.input);
  const outputs = pick("output", opts.output);
  const pairs = inputs.flatMap((i) => outputs.map((o): [string, string] => [i, o]));
  if (pairs.length > MAX_PAIRS) {
    problems.push({
      severity: "error",
      code: "too-many-pairs",
      message: `The diagram has ${pairs.length} input/output pairs; at most ${MAX_PAIRS} are reduced at once. Choose an input or an output.`,
    });
  }
  return { pairs, problems };
}
