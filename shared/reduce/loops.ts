import { ratField, type RatFn } from "@shared/algebra/ratfn";
import type { Problem } from "@shared/diagram/problems";
import { weighRat } from "@shared/reduce/ratView";
import { loopProblems, type FactoredLoop } from "@shared/reduce/wellPosed";
import type { Budget } from "@shared/reduce/budget";
import type { SignalFlowGraph } from "@shared/reduce/graph";
import { loopDeterminants, type PairTransfer } from "@shared/reduce/reduce";
import { loopComponents } from "@shared/reduce/scc";

export interface LoopCheck {
  /** The loops on the first pair's paths as one group, factors = that pair's pivots; null when split up. */
  group: FactoredLoop | null;
  /** Every other loop component with its determinant. */
  loops: FactoredLoop[];
  /** Problems of all of them. */
  problems: Problem[];
}

/**
 * Determinants and well-posedness (loopProblems) of every loop component. The loops on the first reduced
 * pair's paths come as one group whose determinant is that reduction's pivots, never multiplied out; only
 * when the group shows a problem are its components computed one by one, so the problem names the right
 * blocks. Loops off that pair's paths are computed on their own. `first` is undefined when no pair was
 * reduced with its pivots.
 * Example: checkLoops(graph, gains, transfers[0], budget) → { group: { nodes: ["e", "c", "p", "h"], factors }, loops: [], problems: [] }.
 */
export function checkLoops(
  graph: SignalFlowGraph<RatFn>,
  gains: ReadonlyMap<string, RatFn>,
  first: PairTransfer<RatFn> | undefined,
  budget: Budget,
): LoopCheck {
  const onPath = new Set(first?.pivots ? first.nodes : []);
  const inLoops = loopComponents(graph).flat();
  const apart = (ids: string[]) =>
    loopDeterminants(graph.subgraph(ids), ratField, budget, weighRat).map(({ nodes, det }) => ({ nodes, factors: [det] }));
  const loops = apart(inLoops.filter((id) => !onPath.has(id)));
  const nodes = inLoops.filter((id) => onPath.has(id));
  const group: FactoredLoop | null = first?.pivots && nodes.length > 0 ? { nodes, factors: first.pivots } : null;
  const groupProblems = group ? loopProblems([group], gains) : [];
  if (group && groupProblems.length > 0) {
    loops.unshift(...apart(nodes));
    return { group: null, loops, problems: loopProblems(loops, gains) };
  }
  return { group, loops, problems: [...groupProblems, ...loopProblems(loops, gains)] };
}
