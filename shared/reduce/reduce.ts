import type { Field } from "@shared/algebra/field";
import type { Budget } from "@shared/reduce/budget";
import { loopDeterminant, reducePairGraph, type WeighGain } from "@shared/reduce/eliminate";
import type { SignalFlowGraph } from "@shared/reduce/graph";
import { loopComponents, reachable } from "@shared/reduce/scc";
import { StepLog, type TraceStep } from "@shared/reduce/trace";

/* Field-generic entry points of the reducer, on a signal-flow graph (see buildSignalGraph). */

/** A loop component (strongly connected part of the graph) and its det(I − A). */
export interface LoopDeterminant<T> {
  nodes: string[];
  det: T;
}

/**
 * det(I − A) of each loop component, one elimination each. The matrix is block-triangular in the order of
 * the components, so their product is det(I − A) of the whole graph, and a singular one can be named.
 * Example: loopDeterminants(graph, field, budget) → [{ nodes: ["e", "c", "p", "h"], det: 1 + c·p·h }].
 */
export function loopDeterminants<T>(
  graph: SignalFlowGraph<T>,
  field: Field<T>,
  budget: Budget,
  weigh?: WeighGain<T>,
): LoopDeterminant<T>[] {
  return loopComponents(graph).map((nodes) => ({ nodes, det: loopDeterminant(graph.subgraph(nodes), field, budget, weigh) }));
}

export interface PairTransfer<T> {
  input: string;
  output: string;
  gain: T;
  /** Label of the final edge: the equivalent block (or document block) that is the whole transfer. */
  final: string | null;
  /** Nodes on a path from input to output (the only ones that take part). */
  nodes: string[];
  /** Pivots whose product is det(I − A) over `nodes`: for the first pair with a path, when asked for. */
  pivots: T[] | null;
}

/**
 * Transfer of every (input, output) pair, each with all other inputs zero, with the steps of each pair's
 * reduction (tagged with the pair). Only nodes on a path from the input to the output take part: loops
 * elsewhere do not change this pair's transfer. A pair without a path has transfer 0 and no steps.
 * Steps carry exact gains (print them with printSteps); without `trace` none are recorded.
 * With `determinant`, the first pair with a path also returns the pivots of its reduction, whose product
 * is det(I − A) over its nodes: that saves a separate determinant run of the same loops. `weigh` sizes a
 * gain (e.g. its degree in s) to order ties between rules (see comparePlans).
 * Example: reducePairs(graph, field, [["r", "y"]], budget).transfers[0].gain is T(r → y).
 */
export function reducePairs<T>(
  graph: SignalFlowGraph<T>,
  field: Field<T>,
  pairs: readonly (readonly [string, string])[],
  budget: Budget,
  opts: { determinant?: boolean; weigh?: WeighGain<T>; trace?: boolean } = {},
): { transfers: PairTransfer<T>[]; steps: TraceStep<T>[] } {
  const log = opts.trace === false ? null : new StepLog<T>();
  const forward = new Map<string, Set<string>>();
  const backward = new Map<string, Set<string>>();
  const reach = (cache: Map<string, Set<string>>, id: string, dir: "forward" | "backward") => {
    if (!cache.has(id)) cache.set(id, reachable(graph, id, dir));
    return cache.get(id)!;
  };
  let wantDet = opts.determinant ?? false;
  const transfers = pairs.map(([input, output]): PairTransfer<T> => {
    const from = reach(forward, input, "forward");
    if (!from.has(output)) return { input, output, gain: field.zero, final: null, nodes: [], pivots: null };
    const to = reach(backward, output, "backward");
    const nodes = [...from].filter((id) => to.has(id));
    log?.beginPair(input, output);
    const reduced = reducePairGraph(graph.subgraph(nodes), field, input, output, log, budget, {
      determinant: wantDet,
      weigh: opts.weigh,
    });
    wantDet = false;
    return { input, output, ...reduced, nodes };
  });
  return { transfers, steps: log?.steps ?? [] };
}
