/**
 * What the validator and the engine report about a diagram. Every problem names what it is about
 * (a block id, a wire id or `wire #i (from → to)`) and says what to do in a sentence.
 * Example: { severity: "error", code: "unknown-name", blockId: "c", field: "expr", message: "…" }.
 */
export type Severity = "error" | "warning";

export interface Problem {
  severity: Severity;
  /** Stable machine-readable code, e.g. "port-occupied", "algebraic-loop". */
  code: string;
  message: string;
  blockId?: string;
  /** The wire's id, or its label `wire #i (from → to)` when it has none. */
  wireId?: string;
  /** Document field the problem is in, e.g. "expr", "signs", "port", "parameters.K". */
  field?: string;
  /** 0-based character position inside the field's text, for expression errors. */
  position?: number;
  /** Extra ids involved (e.g. all blocks of an algebraic loop). */
  related?: string[];
}

/** Thrown for a document that cannot be reduced; carries every problem found. */
export class DiagramError extends Error {
  readonly problems: Problem[];
  constructor(problems: Problem[]) {
    super(problems.filter((p) => p.severity === "error").map((p) => p.message).join("\n") || "Invalid diagram");
    this.name = "DiagramError";
    this.problems = problems;
  }
}
