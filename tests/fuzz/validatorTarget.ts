import fc from "fast-check";
import { parseDiagram } from "@shared/diagram/parseDiagram";
import { mutatedDocument } from "./docMutation";
import { problemsFault, truncated, type FuzzTarget } from "./harness";

/** parseDiagram: a parsed diagram with its expressions, or every problem, each with a message and its block. */
export const validatorTarget: FuzzTarget<unknown> = {
  name: "document validator",
  arbitrary: fc.oneof({ arbitrary: mutatedDocument, weight: 4 }, fc.anything(), fc.jsonValue()),
  check(raw) {
    const parsed = parseDiagram(raw);
    if (parsed.ok) return parsed.diagram.doc.blocks.every((b) => !("expr" in b) || parsed.diagram.expressions.has(b.id)) ? null : "a block's expression is missing";
    return problemsFault(parsed.problems, true);
  },
  show: (raw) => truncated(JSON.stringify(raw) ?? String(raw)),
};
