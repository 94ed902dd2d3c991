import type { SfgEdge } from "@shared/reduce/graph";
import type { ReductionRule, ReductionStep } from "@shared/reduce/result";

/** How a gain is printed in a step: plain expression syntax and LaTeX. */
export type ShowGain<T> = (gain: T) => { expr: string; latex: string };

/** A step as the reducer records it: the exact gain it produced, printed only at the end (printSteps). */
export type TraceStep<T> = Omit<ReductionStep, "expr" | "latex"> & { gain: T };

/** The trace in the published form. Example: printSteps(steps, showRat)[0].expr === "1/(s + 1)". */
export const printSteps = <T>(steps: readonly TraceStep<T>[], show: ShowGain<T>): ReductionStep[] =>
  steps.map(({ gain, ...step }) => {
    const { expr, latex } = show(gain);
    return { ...step, expr, latex };
  });

/** How a step names an edge in its sentence: its label with sign ("c", "−h"), or a bare wire's sign. */
export const edgeName = <T>(e: SfgEdge<T>): string =>
  e.label === null ? (e.sign < 0 ? "−1" : "1") : e.sign < 0 ? `−${e.label}` : e.label;

/**
 * "a·b" with the signs of the names pulled to the front and unit factors ("1", a bare "−") left out.
 * Example: times("eq3", "−k2") === "−eq3·k2"; times("−1", "g") === "−g".
 */
export function times(...names: string[]): string {
  const negative = names.filter((n) => n.startsWith("−")).length % 2 === 1;
  const body = names.map((n) => n.replace(/^−/, "")).filter((n) => n !== "" && n !== "1");
  return `${negative ? "−" : ""}${body.join("·") || "1"}`;
}

/**
 * The reduction trace: numbers equivalent blocks eq1, eq2, … across all pairs of one document and tags each step
 * with its pair; what a step consumed is filled in by the pair's Footprint once its rule is done.
 * Example: log.record("series", g, (eq) => `Series: c then p become ${eq} = c·p.`).produced === "eq1".
 */
export class StepLog<T> {
  readonly steps: TraceStep<T>[] = [];
  private nextEq = 1;
  private pair: { input: string; output: string } | null = null;

  /** Steps recorded from now on belong to this input → output pair. */
  beginPair(input: string, output: string): void {
    this.pair = { input, output };
  }

  record(rule: ReductionRule, gain: T, describe: (eq: string) => string): TraceStep<T> {
    const produced = `eq${this.nextEq++}`;
    const step: TraceStep<T> = {
      index: this.steps.length,
      rule,
      description: describe(produced),
      consumedBlocks: [],
      consumedWires: [],
      produced,
      gain,
      ...(this.pair ?? {}),
    };
    this.steps.push(step);
    return step;
  }
}
