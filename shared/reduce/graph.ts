/**
 * The signal-flow graph the reducer works on: one node per block output signal, one edge per element
 * that scales a signal on its way to another point (a transfer block, or a bare wire with sign ±1).
 * Edges are never mutated: a rule removes edges and adds new ones, so subgraphs can share them.
 * Example: r →(+1) e →(c) c →(p) p is the cascade "r into sum e, then c, then p".
 */
export interface SfgEdge<T> {
  /** Creation order; the tie-breaker that keeps every run deterministic. */
  readonly seq: number;
  readonly from: string;
  readonly to: string;
  readonly gain: T;
  /** The element the edge stands for (a document block or "eqN"); null for a bare wire. */
  readonly label: string | null;
  /** gain = sign × (the label's own gain), so "−h" needs no new equivalent block. */
  readonly sign: 1 | -1;
  /** Document blocks and wires merged into this edge, listed as consumed with it. */
  readonly blocks: readonly string[];
  readonly wires: readonly string[];
}

export interface SfgNode<T> {
  readonly id: string;
  /** Position in the document; orders ties between nodes. */
  readonly order: number;
  /** Block consumed when the node is eliminated (sum and branch blocks; others live on as labels). */
  readonly own: string | null;
  readonly ins: Set<SfgEdge<T>>;
  readonly outs: Set<SfgEdge<T>>;
  /** Edges from the node to itself. */
  readonly loops: Set<SfgEdge<T>>;
}

export type EdgeDraft<T> = Omit<SfgEdge<T>, "seq">;

/** Mutable signal-flow graph. Example: g.addNode("e", 1, "e"); g.addEdge({ from: "r", to: "e", … }). */
export class SignalFlowGraph<T> {
  readonly nodes = new Map<string, SfgNode<T>>();
  private nextSeq = 0;
  /** Nodes whose edges changed since the last drain (the reducer re-examines them). */
  readonly touched = new Set<string>();

  addNode(id: string, order: number, own: string | null): SfgNode<T> {
    const node: SfgNode<T> = { id, order, own, ins: new Set(), outs: new Set(), loops: new Set() };
    this.nodes.set(id, node);
    return node;
  }

  node(id: string): SfgNode<T> {
    const node = this.nodes.get(id);
    if (!node) throw new Error(`Signal-flow graph has no node "${id}"`);
    return node;
  }

  addEdge(draft: EdgeDraft<T>): SfgEdge<T> {
    const { from, to, gain, label, sign, blocks, wires } = draft; // written out: a spread is slow on this hot path
    const edge: SfgEdge<T> = { seq: this.nextSeq++, from, to, gain, label, sign, blocks, wires };
    this.attach(edge);
    return edge;
  }

  removeEdge(edge: SfgEdge<T>): void {
    if (edge.from === edge.to) this.node(edge.from).loops.delete(edge);
    else {
      this.node(edge.from).outs.delete(edge);
      this.node(edge.to).ins.delete(edge);
    }
    this.touched.add(edge.from).add(edge.to);
  }

  /** Removes a node with all its edges. */
  removeNode(id: string): void {
    const node = this.node(id);
    for (const e of [...node.ins, ...node.outs, ...node.loops]) this.removeEdge(e);
    this.nodes.delete(id);
    this.touched.delete(id);
  }

  /** A graph over `ids` (kept in document order) with the edges between them; edges are shared. */
  subgraph(ids: Iterable<string>): SignalFlowGraph<T> {
    const sub = new SignalFlowGraph<T>();
    const keep = [...ids].map((id) => this.node(id)).sort((a, b) => a.order - b.order);
    for (const n of keep) sub.addNode(n.id, n.order, n.own);
    const edges: SfgEdge<T>[] = [];
    for (const n of keep) for (const e of [...n.outs, ...n.loops]) if (sub.nodes.has(e.to)) edges.push(e);
    edges.sort((a, b) => a.seq - b.seq);
    for (const e of edges) sub.attach(e);
    sub.nextSeq = this.nextSeq;
    sub.touched.clear();
    return sub;
  }

  /** Every edge, in creation order. */
  edges(): SfgEdge<T>[] {
    const all: SfgEdge<T>[] = [];
    for (const n of this.nodes.values()) all.push(...n.outs, ...n.loops);
    return all.sort((a, b) => a.seq - b.seq);
  }

  private attach(edge: SfgEdge<T>): void {
    if (edge.from === edge.to) this.node(edge.from).loops.add(edge);
    else {
      this.node(edge.from).outs.add(edge);
      this.node(edge.to).ins.add(edge);
    }
    this.touched.add(edge.from).add(edge.to);
  }
}
