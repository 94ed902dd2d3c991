import type { Field } from "@shared/algebra/field";
import type { Budget } from "@shared/reduce/budget";
import { solveDense } from "@shared/reduce/dense";
import { Footprint } from "@shared/reduce/footprint";
import type { SignalFlowGraph } from "@shared/reduce/graph";
import { MinHeap } from "@shared/reduce/heap";
import { comparePlans, planNode, type Plan } from "@shared/reduce/plan";
import type { RuleContext } from "@shared/reduce/ruleEdits";
import { applyPlan, solveTogether } from "@shared/reduce/rules";
import type { StepLog } from "@shared/reduce/trace";

type Entry = Plan & { id: string; order: number; size: number; stamp: number };

/** How big a gain is, for ordering ties (e.g. its degree in s); 0 when not told. */
export type WeighGain<T> = (gain: T) => number;

/** Applies rules, most urgent first, until no node but the terminals can be eliminated by one rule. */
function runRules<T>(ctx: RuleContext<T>, weigh: WeighGain<T> = () => 0): void {
  const { graph } = ctx;
  const stamps = new Map<string, number>();
  const agenda = new MinHeap<Entry>(comparePlans);
  const schedule = (id: string) => {
    const node = graph.nodes.get(id);
    if (!node) return;
    const stamp = (stamps.get(id) ?? 0) + 1;
    stamps.set(id, stamp);
    const plan = planNode(graph, node, ctx.terminals, ctx.blocked);
    if (!plan) return;
    let size = 0;
    for (const edges of [node.ins, node.outs, node.loops]) for (const e of edges) size += weigh(e.gain);
    // Fields written out: an object spread here cost more than the rest of the reduction on small diagrams.
    agenda.push({ action: plan.action, urgency: plan.urgency, fill: plan.fill, id, order: node.order, size, stamp });
  };
  for (const id of graph.nodes.keys()) schedule(id);
  graph.touched.clear();
  for (let entry = agenda.pop(); entry; entry = agenda.pop()) {
    if (stamps.get(entry.id) !== entry.stamp || !graph.nodes.has(entry.id)) continue;
    const applied = applyPlan(ctx, graph.node(entry.id), entry.action);
    const touched = [...graph.touched];
    graph.touched.clear();
    for (const id of touched) schedule(id);
    if (!applied) schedule(entry.id);
  }
}

const context = <T>(
  graph: SignalFlowGraph<T>,
  field: Field<T>,
  terminals: string[],
  log: StepLog<T> | null,
  budget: Budget,
  determinant: boolean,
): RuleContext<T> => ({
  graph,
  field,
  log,
  footprint: log ? new Footprint(graph) : null,
  budget,
  terminals: new Set(terminals),
  blocked: { pivot: new Map(), pair: new Map() },
  pivots: determinant ? [] : null,
});

/**
 * Product by halves, so the operands of each multiplication stay about the same size.
 * Example: fieldProduct(f, [a, b, c]) is a·b·c; fieldProduct(f, []) is 1.
 */
export function fieldProduct<T>(field: Field<T>, items: readonly T[]): T {
  if (items.length === 0) return field.one;
  if (items.length === 1) return items[0];
  const half = items.length >> 1;
  return field.mul(fieldProduct(field, items.slice(0, half)), fieldProduct(field, items.slice(half)));
}

/**
 * det(I − A) of a graph (one strongly connected loop component): the product of the pivots of a full
 * elimination. Zero means an algebraic loop. The graph is consumed.
 * Example: a single loop of gain L gives 1 − L.
 */
export function loopDeterminant<T>(graph: SignalFlowGraph<T>, field: Field<T>, budget: Budget, weigh?: WeighGain<T>): T {
  const ctx = context(graph, field, [], null, budget, true);
  runRules(ctx, weigh);
  if (graph.nodes.size > 0) ctx.pivots!.push(solveDense(field, graph, null).det);
  return fieldProduct(field, ctx.pivots!);
}

/**
 * Reduces a graph holding only the nodes on paths from `input` to `output` to one edge input → output,
 * recording every step in `log` with what it consumed (see Footprint). Returns the transfer, the label of the final edge (null for a bare
 * wire) and, with `determinant`, the pivots whose product is det(I − A) of the graph (multiplying
 * them out costs as much as the rules, so it is left to the caller). The graph is consumed. Throws
 * SingularLoopError when the remaining loops are singular (an algebraic loop).
 * Example: r → e → c → p → y with p fed back through h to e gives c·p/(1 + c·p·h), final "eq2".
 */
export function reducePairGraph<T>(
  graph: SignalFlowGraph<T>,
  field: Field<T>,
  input: string,
  output: string,
  log: StepLog<T> | null,
  budget: Budget,
  opts: { determinant?: boolean; weigh?: WeighGain<T> } = {},
): { gain: T; final: string | null; pivots: T[] | null } {
  const ctx = context(graph, field, [input, output], log, budget, opts.determinant ?? false);
  runRules(ctx, opts.weigh);
  if (graph.nodes.size > 2) solveTogether(ctx, input, output);
  const [edge] = graph.node(output).ins;
  ctx.footprint?.finish(edge);
  const pivots = ctx.pivots;
  return edge ? { gain: edge.gain, final: edge.label, pivots } : { gain: field.zero, final: null, pivots };
}
