import type { ExprNode } from "@shared/expr/ast";
import type { Problem } from "@shared/diagram/problems";
import type { DiagramDocument } from "@shared/diagram/schema";
import { loadDiagram, validateDiagram } from "@shared/diagram/validate";

/** A document that passed the format and every validation check, with each block's parsed expression. */
export interface ParsedDiagram {
  doc: DiagramDocument;
  expressions: ReadonlyMap<string, ExprNode>;
  /** Warnings of validation (never errors). */
  warnings: Problem[];
}

export type ParseOutcome =
  | { ok: true; diagram: ParsedDiagram }
  /** The format was wrong: there is no document. */
  | { ok: false; problems: Problem[]; doc?: undefined }
  /** The format was right but validation found errors: the document and the expressions that parsed. */
  | { ok: false; problems: Problem[]; doc: DiagramDocument; expressions: ReadonlyMap<string, ExprNode> };

const isError = (p: Problem) => p.severity === "error";

/**
 * The format-and-validation stage: an untrusted value (parsed JSON) read once as a diagram, with every
 * problem found, not only the first. Later stages take the ParsedDiagram and never parse again.
 * Example: parseDiagram(json).diagram.expressions.get("c") is the tree of block c's "K*(s+2)/s".
 */
export function parseDiagram(raw: unknown): ParseOutcome {
  const loaded = loadDiagram(raw);
  if (!loaded.doc) return { ok: false, problems: loaded.problems };
  const { problems, expressions } = validateDiagram(loaded.doc);
  const found = [...loaded.problems, ...problems];
  if (found.some(isError)) return { ok: false, problems: found, doc: loaded.doc, expressions };
  return { ok: true, diagram: { doc: loaded.doc, expressions, warnings: found } };
}
