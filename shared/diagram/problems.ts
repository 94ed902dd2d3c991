import { z } from "zod";

/**
 * What the validator and the reducer report about a diagram. Every problem names what it is about
 * (a block id, a wire id or `wire #i (from → to)`) and says what to do in a sentence.
 * Example: { severity: "error", code: "unknown-name", blockId: "c", field: "expr", message: "…" }.
 */
export const severitySchema = z.enum(["error", "warning"]);
export type Severity = z.infer<typeof severitySchema>;

export const problemSchema = z.object({
  severity: severitySchema,
  code: z.string().describe('Stable machine-readable code, e.g. "port-occupied", "algebraic-loop".'),
  message: z.string(),
  blockId: z.string().optional(),
  wireId: z.string().optional().describe("The wire's id, or its label `wire #i (from → to)` when it has none."),
  field: z
    .string()
    .optional()
    .describe('Document field the problem is in, e.g. "expr", "signs", "port", "parameters.K".'),
  position: z.number().int().min(0).optional().describe("0-based character position inside the field's text."),
  related: z.array(z.string()).optional().describe("Extra ids involved (e.g. all blocks of an algebraic loop)."),
});
export type Problem = z.infer<typeof problemSchema>;

/** Thrown for a document that cannot be reduced; carries every problem found. */
export class DiagramError extends Error {
  readonly problems: Problem[];
  constructor(problems: Problem[]) {
    super(problems.filter((p) => p.severity === "error").map((p) => p.message).join("\n") || "Invalid diagram");
    this.name = "DiagramError";
    this.problems = problems;
  }
}
