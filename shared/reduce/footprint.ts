import type { Part, SfgEdge, SfgNode, SignalFlowGraph } from "@shared/reduce/graph";
import type { TraceStep } from "@shared/reduce/trace";

interface Pending<T> {
  step: TraceStep<T>;
  edges: readonly SfgEdge<T>[];
  nodes: readonly SfgNode<T>[];
}

const blockKey = (label: string) => `b:${label}`;

/**
 * What each step of one pair's reduction consumes: the blocks and wires that its equivalent block replaces, each
 * listed by the one step after which nothing in the reduced graph stands for it any more. Every live edge carries
 * its label and its parts (see SfgEdge); a label or wire is consumed once no edge carries it, a folded junction
 * once at most one edge carries it after several did (it joins or splits nothing any more, or is inside a step),
 * a junction node once a rule removes it or it joins (a sum) or splits (a pickoff) nothing. The pair's last step
 * takes what is left between the input and the output, so over a pair's steps every block on its paths and
 * loops is consumed exactly once. Rules report edges as they add and remove them (carry, drop), name each step's
 * edges and nodes (note), and settle once their graph changes are done.
 * Example: after "Feedback: eq1 with −h fed back to e", the step lists eq1, h and the sum e, and the loop's wires.
 */
export class Footprint<T> {
  private readonly carried = new Map<string, number>();
  /** Folded junctions carried by two edges or more at some point: they joined or split signals. */
  private readonly shared = new Set<string>();
  private readonly spent = new Set<string>();
  private pending: Pending<T>[] = [];
  private last: TraceStep<T> | null = null;

  constructor(graph: SignalFlowGraph<T>) {
    for (const e of graph.edges()) this.carry(e);
  }

  carry(edge: SfgEdge<T>): void {
    if (edge.label !== null) this.count(blockKey(edge.label), 1);
    for (const p of edge.before) this.count(p.key, 1, p);
    for (const p of edge.after) this.count(p.key, 1, p);
  }

  drop(edge: SfgEdge<T>): void {
    if (edge.label !== null) this.count(blockKey(edge.label), -1);
    for (const p of edge.before) this.count(p.key, -1);
    for (const p of edge.after) this.count(p.key, -1);
  }

  /** True once a step has consumed the block (a tidied junction then folds into no edge). */
  consumed(block: string): boolean {
    return this.spent.has(blockKey(block));
  }

  /** A step recorded by a rule that is still changing the graph: what it consumes is known at `settle`. */
  note(step: TraceStep<T>, edges: readonly SfgEdge<T>[], nodes: readonly SfgNode<T>[]): void {
    this.pending.push({ step, edges, nodes });
    this.last = step;
  }

  /** Called once the rule's edges are in place: each pending step takes what became free, edge by edge in signal order, then its nodes. */
  settle(graph: SignalFlowGraph<T>): void {
    for (const { step, edges, nodes } of this.pending) {
      for (const e of edges) {
        for (const p of e.before) if (this.free(p.key, p.kind === "block")) this.take(step, p);
        if (e.label !== null && this.free(blockKey(e.label), false)) {
          this.spent.add(blockKey(e.label));
          step.consumedBlocks.push(e.label);
        }
        for (const p of e.after) if (this.free(p.key, p.kind === "block")) this.take(step, p);
      }
      for (const n of nodes) {
        if (!n.own || this.spent.has(blockKey(n.own.id)) || (graph.nodes.get(n.id) === n && busy(n))) continue;
        this.spent.add(blockKey(n.own.id));
        step.consumedBlocks.push(n.own.id);
      }
    }
    this.pending = [];
  }

  /**
   * The pair is reduced to `final` (input → output): its last step also takes the junctions and wires left on that
   * edge, all but the wire out of the input and the wire into the output. Nothing when the pair took no step.
   */
  finish(final: SfgEdge<T> | undefined): void {
    if (!final || !this.last) return;
    const tail = final.label === null ? final.before : final.after;
    const ends = new Set([final.before[0], tail[tail.length - 1]]);
    for (const p of [...final.before, ...final.after]) {
      if (this.spent.has(p.key) || (p.kind === "wire" && ends.has(p))) continue;
      this.take(this.last, p);
    }
  }

  private take(step: TraceStep<T>, p: Part): void {
    this.spent.add(p.key);
    (p.kind === "block" ? step.consumedBlocks : step.consumedWires).push(p.id);
  }

  private free(key: string, junction: boolean): boolean {
    if (this.spent.has(key)) return false;
    const n = this.carried.get(key) ?? 0;
    return n === 0 || (junction && n === 1 && this.shared.has(key));
  }

  private count(key: string, by: 1 | -1, part?: Part): void {
    const n = (this.carried.get(key) ?? 0) + by;
    this.carried.set(key, n);
    if (n >= 2 && part?.kind === "block") this.shared.add(key);
  }
}

/** A junction node still at work: a sum joining two signals or more, a pickoff splitting one into two or more. */
const busy = <T>(n: SfgNode<T>): boolean => (n.own!.joins ? n.ins.size : n.outs.size) + n.loops.size >= 2;
