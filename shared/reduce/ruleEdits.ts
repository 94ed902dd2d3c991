import type { Field } from "@shared/algebra/field";
import { spend, type Budget } from "@shared/reduce/budget";
import type { Footprint } from "@shared/reduce/footprint";
import { blockPart, type Part, type SfgEdge, type SfgNode, type SignalFlowGraph } from "@shared/reduce/graph";
import type { Blocked } from "@shared/reduce/plan";
import type { ReductionRule } from "@shared/reduce/result";
import type { StepLog } from "@shared/reduce/trace";

/**
 * What the reduction rules (rules.ts) work on, and the graph edits they make through it: every edge added or
 * removed goes through link, unlink or removeNode, so the footprint of the trace stays in step with the graph.
 * `pivots` collects the pivots (return differences) when asked: their product is det(I − A) of the graph reduced.
 * Example: link(ctx, "a", "b", produce(ctx, "series", [x, y], [n], g, { before: x.before, after: y.after }, describe)).
 */
export interface RuleContext<T> {
  readonly graph: SignalFlowGraph<T>;
  readonly field: Field<T>;
  /** Null in determinant-only runs: no trace, equivalent blocks are not named. */
  readonly log: StepLog<T> | null;
  /** What each step consumes; present exactly when `log` is. */
  readonly footprint: Footprint<T> | null;
  readonly budget: Budget;
  readonly terminals: ReadonlySet<string>;
  readonly blocked: Blocked;
  /** Factors of det(I − A) collected so far, or null when the determinant is not wanted. */
  readonly pivots: T[] | null;
}

type Draft<T> = Omit<SfgEdge<T>, "seq" | "from" | "to">;

const ANONYMOUS = "~";

export function link<T>(ctx: RuleContext<T>, from: string, to: string, draft: Draft<T>): void {
  spend(ctx.budget, 1);
  // Fields written out: a spread is slow on this hot path.
  const edge = ctx.graph.addEdge({ from, to, gain: draft.gain, label: draft.label, sign: draft.sign, before: draft.before, after: draft.after });
  ctx.footprint?.carry(edge);
}

export function unlink<T>(ctx: RuleContext<T>, edge: SfgEdge<T>): void {
  ctx.graph.removeEdge(edge);
  ctx.footprint?.drop(edge);
}

export function removeNode<T>(ctx: RuleContext<T>, node: SfgNode<T>): void {
  for (const e of [...node.ins, ...node.outs, ...node.loops]) ctx.footprint?.drop(e);
  ctx.graph.removeNode(node.id);
}

/** What the new edge keeps of the old ones' parts: those outside the equivalent block. */
export interface Outside {
  before: readonly Part[];
  after: readonly Part[];
}

/**
 * Records the step (when tracing) and returns the new equivalent block's draft. `edges` and `nodes` are what the
 * step may consume: the footprint lists those of their blocks and wires that nothing else stands for any more.
 */
export function produce<T>(
  ctx: RuleContext<T>,
  rule: ReductionRule,
  edges: readonly SfgEdge<T>[],
  nodes: readonly SfgNode<T>[],
  gain: T,
  outside: Outside,
  describe: (eq: string) => string,
): Draft<T> {
  let label = ANONYMOUS;
  if (ctx.log) {
    const step = ctx.log.record(rule, gain, describe);
    ctx.footprint?.note(step, edges, nodes);
    label = step.produced;
  }
  return { gain, label, sign: 1, ...outside };
}

/** Parts before an edge's label; a bare edge's are all there (taken as ending in its label). */
export const head = <T>(e: SfgEdge<T>): readonly Part[] => (e.label === null ? [...e.before, ...e.after] : e.before);
/** Parts after an edge's label; a bare edge's are all there (taken as starting with its label). */
export const tail = <T>(e: SfgEdge<T>): readonly Part[] => (e.label === null ? [...e.before, ...e.after] : e.after);

/** A junction node's own block as a part of the edges it folds into, unless a step consumed it already. */
export function folded<T>(ctx: RuleContext<T>, node: SfgNode<T>): Part[] {
  return node.own && !ctx.footprint?.consumed(node.own.id) ? [blockPart(node.own.id)] : [];
}

/** True when the rule leaves a junction node with nothing to join or split (it is consumed by the step). */
export function freed<T>(ctx: RuleContext<T>, node: SfgNode<T>, added: { ins: number; outs: number }): boolean {
  if (!node.own || ctx.footprint?.consumed(node.own.id)) return false;
  const degree = node.own.joins ? node.ins.size + added.ins : node.outs.size + added.outs;
  return degree + node.loops.size < 2;
}
