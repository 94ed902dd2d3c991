import { polyAtInfinityRatio, polyLeading, polyParams } from "@shared/algebra/poly";
import {
  ratDegrees, ratDenominator, ratField, ratIsZero, ratNumerator, ratReduceTracked, ratZero, type RatFn,
} from "@shared/algebra/ratfn";
import type { Problem } from "@shared/diagram/problems";
import { loopProblems } from "@shared/engine/wellPosed";
import type { Budget } from "@shared/reduce/budget";
import { fieldProduct, loopDeterminant } from "@shared/reduce/eliminate";
import type { SignalFlowGraph } from "@shared/reduce/graph";
import type { LoopDeterminant, PairTransfer } from "@shared/reduce/reduce";
import { loopComponents } from "@shared/reduce/scc";

export interface LoopCheck {
  /** Loop components with their determinants, except those of `covered`. */
  loops: LoopDeterminant<RatFn>[];
  /** Nodes of the first reduced pair when its loops were found clean as a group (their determinant is left
   *  as that pair's pivots); empty otherwise. */
  covered: string[];
  problems: Problem[];
}

/** Value as s → ∞ of a proper gain: 0 when strictly proper, else the ratio of leading coefficients. */
function atInfinity(g: RatFn): RatFn {
  const num = ratNumerator(g);
  const den = ratDenominator(g);
  if (polyAtInfinityRatio(num, den) === "zero") return ratZero;
  return ratReduceTracked(polyLeading(num), polyLeading(den)).value;
}

const isProper = (g: RatFn | undefined) => !g || ratDegrees(g).num <= ratDegrees(g).den;

/**
 * Determinants and well-posedness (loopProblems) of every loop component. The loops on the first reduced
 * pair's paths are first checked as one group, cheaply: when all their blocks are proper and Δ(∞) — the
 * determinant with every gain replaced by its value at s → ∞ — is a nonzero number, no component can be
 * singular, improper or singular at some parameter value, and the group's determinant is never needed
 * unless a mode cancels (see characteristicPolynomial). Otherwise the group's determinant (the pair's
 * pivots multiplied out) is checked, and split into components when it shows a problem, so the problem
 * names the right blocks. Loops off that pair's paths are computed on their own.
 * Example: checkLoops(graph, gains, transfers[0], budget) → { loops: [], covered: ["r", "e", …], problems: [] }.
 */
export function checkLoops(
  graph: SignalFlowGraph<RatFn>,
  gains: ReadonlyMap<string, RatFn>,
  first: PairTransfer<RatFn> | undefined,
  budget: Budget,
): LoopCheck {
  const single = (nodes: string[]) => ({ nodes, det: loopDeterminant(graph.subgraph(nodes), ratField, budget) });
  const onPath = new Set(first?.pivots ? first.nodes : []);
  const components = loopComponents(graph);
  const inside = components.filter((c) => onPath.has(c[0]));
  const loops = components.filter((c) => !onPath.has(c[0])).map(single);
  let covered: string[] = [];
  if (first?.pivots) {
    const nodes = inside.flat();
    if (nodes.every((id) => isProper(gains.get(id))) && numericNonZero(graph.subgraph(nodes).mapGains(atInfinity), budget)) {
      covered = first.nodes;
    } else {
      const group = { nodes, det: fieldProduct(ratField, first.pivots) };
      loops.unshift(...(loopProblems([group], gains).length === 0 ? [group] : inside.map(single)));
    }
  }
  return { loops, covered, problems: loopProblems(loops, gains) };
}

/** True when det(I − A) of the graph is a nonzero number (free of s and of every parameter). */
function numericNonZero(graph: SignalFlowGraph<RatFn>, budget: Budget): boolean {
  const det = loopDeterminant(graph, ratField, budget);
  return !ratIsZero(det) && polyParams(ratNumerator(det)).length === 0 && polyParams(ratDenominator(det)).length === 0;
}
