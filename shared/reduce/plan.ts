import type { SfgEdge, SfgNode, SignalFlowGraph } from "@shared/reduce/graph";

/**
 * Which rule applies at a node, and how urgent it is. The reducer always applies the most urgent plan
 * first — wire tidying, then parallel, series and feedback (the textbook rules), then moving a junction
 * or pickoff point or general node elimination (one class: a move is an elimination with one edge on
 * one side) — ties broken by the size of the gains involved, then by fill-in (new edges), then by the
 * node's position in the document, so the same document always gives the same steps. Smallest gains
 * first makes partial results grow in balanced merges instead of one sweep that reprints an ever longer
 * expression at every step (on a 500-block ladder about 4× less work than moves strictly first).
 * Example: a node with one labelled edge in and one out plans { action: "series", urgency: 2 }.
 */
export type Action =
  | "tidy" // series with a bare wire, or a junction next to a bare wire: no new expression
  | "drop" // a node with nothing in or nothing out (determinant runs only)
  | "parallel"
  | "series"
  | "feedback-pair" // sum e feeds only F, F's end p is fed only by e, and p feeds e back through H
  | "feedback-self"
  | "move-sum"
  | "move-pickoff"
  | "eliminate";

export interface Plan {
  action: Action;
  urgency: number;
  /** Edges the rule creates; orders plans of equal urgency. */
  fill: number;
}

/** Pivots already found to be zero, so their rules are not planned again until the edges change. */
export interface Blocked {
  /** node → seq of a self-loop whose return difference is zero */
  pivot: Map<string, number>;
  /** node → "F.seq:H.seq" of a feedback pair whose return difference is zero */
  pair: Map<string, string>;
}

const only = <T>(set: Set<T>): T => set.values().next().value as T;

const plan = (action: Action, urgency: number, fill = 0): Plan => ({ action, urgency, fill });

/** True when two edges run from the same node into `node`, or the node has two loops. Example: a → n twice → true. */
export function hasParallel<T>(node: SfgNode<T>): boolean {
  if (node.loops.size > 1) return true;
  const sources = new Set<string>();
  for (const e of node.ins) {
    if (sources.has(e.from)) return true;
    sources.add(e.from);
  }
  return false;
}

/** The forward edge e → p and feedback edge p → e of a feedback pair at p, when the pattern holds. Example: r → e ⇄ p → y at p. */
export function feedbackPair<T>(
  graph: SignalFlowGraph<T>,
  node: SfgNode<T>,
  terminals: ReadonlySet<string>,
): { forward: SfgEdge<T>; back: SfgEdge<T> } | null {
  if (node.ins.size !== 1 || node.loops.size > 0) return null;
  const forward = only(node.ins);
  const sum = graph.node(forward.from);
  if (terminals.has(sum.id) || sum.outs.size !== 1 || sum.loops.size > 0) return null;
  for (const back of node.outs) if (back.to === sum.id) return { forward, back };
  return null;
}

/** The plan for one node, or null when nothing can be done there (yet). Example: a terminal without parallel edges → null. */
export function planNode<T>(
  graph: SignalFlowGraph<T>,
  node: SfgNode<T>,
  terminals: ReadonlySet<string>,
  blocked: Blocked,
): Plan | null {
  if (hasParallel(node)) return plan("parallel", 1);
  if (terminals.has(node.id)) return null;
  const ins = node.ins.size;
  const outs = node.outs.size;
  const loop = node.loops.size > 0 ? only(node.loops) : null;
  if (loop && blocked.pivot.get(node.id) === loop.seq) return null;
  if (ins === 0 || outs === 0) return plan("drop", 0);
  if (loop) return ins === 1 || outs === 1 ? plan("feedback-self", 3, 1) : plan("eliminate", 4, ins * outs);
  if (ins === 1 && outs === 1) {
    const bare = only(node.ins).label === null || only(node.outs).label === null;
    return bare ? plan("tidy", 0) : plan("series", 2, 1);
  }
  const pair = feedbackPair(graph, node, terminals);
  if (pair && blocked.pair.get(node.id) !== `${pair.forward.seq}:${pair.back.seq}`) return plan("feedback-pair", 3, 1);
  if (outs === 1) return only(node.outs).label === null ? plan("tidy", 0) : plan("move-sum", 4, ins);
  if (ins === 1) return only(node.ins).label === null ? plan("tidy", 0) : plan("move-pickoff", 4, outs);
  return plan("eliminate", 4, ins * outs);
}

type Ranked = Plan & { size: number; order: number };

/**
 * Orders plans: more urgent, then smaller gains, then less fill, then earlier in the document.
 * Example: series (2) before move-sum (4); of two series steps, the one on lower-degree gains first.
 */
export const comparePlans = (a: Ranked, b: Ranked): number =>
  a.urgency - b.urgency || a.size - b.size || a.fill - b.fill || a.order - b.order;
