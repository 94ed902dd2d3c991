import type { ExprNode } from "@shared/expr/ast";
import type { Problem } from "@shared/diagram/problems";
import { DIAGRAM_FORMAT, DIAGRAM_VERSION, diagramDocumentSchema, type DiagramDocument } from "@shared/diagram/schema";
import { schemaProblems } from "@shared/diagram/schemaProblems";
import { identityProblems, portProblems, wireProblems } from "@shared/diagram/wiring";
import { expressionProblems, parameterProblems } from "@shared/diagram/expressions";
import { reachabilityProblems } from "@shared/diagram/reachability";

/**
 * Read an untrusted value (parsed JSON) as a diagram document. A wrong `format` or `version` is reported
 * on its own before any field checks; unknown fields are kept.
 * Example: loadDiagram({ format: "loopwright-diagram", version: 2 }).problems[0].code === "unsupported-version".
 */
export function loadDiagram(raw: unknown): { doc?: DiagramDocument; problems: Problem[] } {
  const refuse = (code: string, message: string, field?: string) => ({
    problems: [{ severity: "error" as const, code, message, ...(field ? { field } : {}) }],
  });
  if (typeof raw !== "object" || raw === null || Array.isArray(raw)) {
    const got = raw === null ? "null" : Array.isArray(raw) ? "an array" : `a ${typeof raw}`;
    return refuse("not-a-document", `A Loopwright diagram is a JSON object; this is ${got}`);
  }
  const record = raw as Record<string, unknown>;
  if (record.format !== DIAGRAM_FORMAT) {
    const message =
      record.format === undefined
        ? `This is not a Loopwright diagram: the field format is missing (expected "${DIAGRAM_FORMAT}")`
        : `This is not a Loopwright diagram: format is ${JSON.stringify(record.format)}, expected "${DIAGRAM_FORMAT}"`;
    return refuse("wrong-format", message, "format");
  }
  if (record.version !== DIAGRAM_VERSION) {
    const message =
      record.version === undefined
        ? `The diagram has no version: this Loopwright reads version ${DIAGRAM_VERSION}`
        : `unsupported version ${JSON.stringify(record.version)}: this Loopwright reads version ${DIAGRAM_VERSION}`;
    return refuse("unsupported-version", message, "version");
  }
  const parsed = diagramDocumentSchema.safeParse(raw);
  if (!parsed.success) return { problems: schemaProblems(parsed.error.issues, record) };
  return { doc: parsed.data, problems: [] };
}

/**
 * Every problem of a loaded document (wiring, ports, expressions, parameters, reachability, limits), not
 * only the first, plus the parsed expression of each gain and transfer block that parsed.
 * Example: validateDiagram(doc).expressions.get("c") is the tree of block c's "K*(s+2)/s".
 */
export function validateDiagram(doc: DiagramDocument): { problems: Problem[]; expressions: Map<string, ExprNode> } {
  const { problems: exprProblems, expressions } = expressionProblems(doc);
  const problems = [
    ...identityProblems(doc),
    ...wireProblems(doc),
    ...portProblems(doc),
    ...exprProblems,
    ...parameterProblems(doc),
    ...reachabilityProblems(doc),
  ];
  return { problems, expressions };
}
