import { reduceDocument } from "@shared/reduce/reduceDiagram";
import type { ReductionResult } from "@shared/reduce/result";
import { cDiv, type Complex } from "./complex";
import { evalExpr, type ParamValues } from "./evalExpr";

/** Our engine as the cross-checks see it: the public pipeline, then its printed strings evaluated by mathjs. */
export function reduceOurs(doc: unknown): ReductionResult {
  const out = reduceDocument(doc);
  if (!out.ok) {
    const lines = out.problems.map((p) => `${p.severity} ${p.code} ${p.blockId ?? p.wireId ?? ""}: ${p.message}`);
    throw new Error(`reduceDocument refused a well-posed diagram:\n${lines.join("\n")}\n${JSON.stringify(doc)}`);
  }
  return out.result;
}

/** numerator(s)/denominator(s) of a printed transfer at one point. */
export const evalTransfer = (t: { numerator: string; denominator: string }, s: Complex, params: ParamValues): Complex =>
  cDiv(evalExpr(t.numerator, s, params), evalExpr(t.denominator, s, params));
