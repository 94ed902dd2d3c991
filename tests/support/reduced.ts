// Tests start from documents: these run the pipeline's first stages on one, failing loudly where it fails.
import { prepareAnalysis, type PrepareOptions, type PreparedAnalysis } from "@shared/analysis/prepare";
import { parseDiagram } from "@shared/diagram/parseDiagram";
import { reduceDiagram, type ExactReduction, type ReduceOptions } from "@shared/reduce/reduceDiagram";

const messages = (problems: { message: string }[]) => problems.map((p) => p.message).join("; ");

/** The exact reduction of a document that must reduce. */
export function reduced(doc: unknown, opts: ReduceOptions = {}): ExactReduction {
  const parsed = parseDiagram(doc);
  if (!parsed.ok) throw new Error(`does not parse: ${messages(parsed.problems)}`);
  const out = reduceDiagram(parsed.diagram, opts);
  if (!out.ok) throw new Error(`does not reduce: ${messages(out.problems)}`);
  return out.reduction;
}

/** parse → reduce (the chosen pair) → prepareAnalysis, as the analysis stage sees a document. */
export function preparedFor(doc: unknown, opts: PrepareOptions = {}): ReturnType<typeof prepareAnalysis> {
  return prepareAnalysis(reduced(doc, { input: opts.input, output: opts.output }), opts);
}

/** The prepared analysis of a document that must prepare. */
export function prepared(doc: unknown, opts: PrepareOptions = {}): PreparedAnalysis {
  const p = preparedFor(doc, opts);
  if (!p.ok) throw new Error(`does not prepare: ${messages(p.problems)}`);
  return p.prepared;
}
