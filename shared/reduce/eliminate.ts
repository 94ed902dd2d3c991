import type { Field } from "@shared/algebra/field";
import type { Budget } from "@shared/reduce/budget";
import { solveDense } from "@shared/reduce/dense";
import type { SfgEdge, SignalFlowGraph } from "@shared/reduce/graph";
import { MinHeap } from "@shared/reduce/heap";
import { comparePlans, planNode, type Plan } from "@shared/reduce/plan";
import { applyPlan, type RuleContext } from "@shared/reduce/rules";
import type { StepLog } from "@shared/reduce/trace";

type Entry = Plan & { id: string; order: number; stamp: number };

/** Applies rules, most urgent first, until no node but the terminals can be eliminated by one rule. */
function runRules<T>(ctx: RuleContext<T>): void {
  const { graph } = ctx;
  const stamps = new Map<string, number>();
  const agenda = new MinHeap<Entry>(comparePlans);
  const schedule = (id: string) => {
    const node = graph.nodes.get(id);
    if (!node) return;
    const stamp = (stamps.get(id) ?? 0) + 1;
    stamps.set(id, stamp);
    const plan = planNode(graph, node, ctx.terminals, ctx.blocked);
    if (plan) agenda.push({ ...plan, id, order: node.order, stamp });
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
  budget,
  terminals: new Set(terminals),
  blocked: { pivot: new Map(), pair: new Map() },
  pivots: determinant ? [] : null,
});

/** Product by halves, so the operands of each multiplication stay about the same size. Example: fieldProduct(f, [a, b, c]) = a·b·c. */
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
export function loopDeterminant<T>(graph: SignalFlowGraph<T>, field: Field<T>, budget: Budget): T {
  const ctx = context(graph, field, [], null, budget, true);
  runRules(ctx);
  if (graph.nodes.size > 0) ctx.pivots!.push(solveDense(field, graph, null).det);
  return fieldProduct(field, ctx.pivots!);
}

/**
 * Reduces a graph holding only the nodes on paths from `input` to `output` to one edge input → output,
 * recording every step in `log`. Returns the transfer, the label of the final edge (null for a bare
 * wire) and, when `determinant` is set, the pivots whose product is det(I − A) of the graph (multiplying
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
  determinant = false,
): { gain: T; final: string | null; pivots: T[] | null } {
  const ctx = context(graph, field, [input, output], log, budget, determinant);
  runRules(ctx);
  if (graph.nodes.size > 2) solveRemaining(ctx, input, output);
  const [edge] = graph.node(output).ins;
  const pivots = ctx.pivots;
  return edge ? { gain: edge.gain, final: edge.label, pivots } : { gain: field.zero, final: null, pivots };
}

/** One general elimination of every node left, solved together (see solveDense). */
function solveRemaining<T>(ctx: RuleContext<T>, input: string, output: string): void {
  const { graph, field } = ctx;
  const { solution, det } = solveDense(field, graph, input);
  ctx.pivots?.push(det);
  if (!solution) throw new SingularLoopError([...graph.nodes.keys()].filter((id) => id !== input && id !== output));
  const edges: SfgEdge<T>[] = graph.edges();
  const inner = [...graph.nodes.values()].filter((n) => n.id !== input && n.id !== output);
  const gain = solution.get(output)!;
  const names = inner.map((n) => n.id).join(", ");
  const label = ctx.log
    ? ctx.log.record("eliminate-node", edges, inner.map((n) => n.own), gain, (eq) =>
        `Eliminate ${names} together (a loop of gain exactly 1 around one of them leaves no single-node pivot): ${input} to ${output} becomes ${eq}.`,
      )
    : "~";
  for (const n of inner) graph.removeNode(n.id);
  for (const e of [...graph.node(output).ins]) graph.removeEdge(e);
  graph.addEdge({ from: input, to: output, gain, label, sign: 1, blocks: [], wires: [] });
}

/** The loop equations of these nodes have no unique solution. */
export class SingularLoopError extends Error {
  constructor(readonly nodes: string[]) {
    super(`Algebraic loop through ${nodes.join(", ")}`);
    this.name = "SingularLoopError";
  }
}
