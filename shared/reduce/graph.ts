/**
 * The signal-flow graph the reducer works on: one node per block output signal, one edge per element
 * that scales a signal on its way to another point (a transfer block, or a bare wire with sign ±1).
 * Edges are never mutated: a rule removes edges and adds new ones, so subgraphs can share them.
 * Example: r →(+1) e →(c) c →(p) p is the cascade "r into sum e, then c, then p".
 */
/** A document wire or a folded junction (sum or pickoff block) that an edge passes through. Example: { kind: "wire", id: "w2", key: "w:w2" }. */
export interface Part {
  readonly kind: "wire" | "block";
  readonly id: string;
  /** kind and id in one string, for counting. */
  readonly key: string;
}

export const wirePart = (id: string): Part => ({ kind: "wire", id, key: `w:${id}` });
export const blockPart = (id: string): Part => ({ kind: "block", id, key: `b:${id}` });

/** A sum or pickoff block, the node of its output signal; a sum's job is to join signals, a pickoff's to split one. */
export interface Junction {
  readonly id: string;
  readonly joins: boolean;
}

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
  /**
   * The wires and folded junctions the edge passes through, in signal order: from its start to its label and from
   * its label to its end (a bare edge keeps them all in `before`). A step consumes those that end up inside it.
   */
  readonly before: readonly Part[];
  readonly after: readonly Part[];
}

export interface SfgNode<T> {
  readonly id: string;
  /** Position in the document; orders ties between nodes. */
  readonly order: number;
  /** The sum or pickoff block the node is (others live on as edge labels): consumed once it joins or splits nothing. */
  readonly own: Junction | null;
  readonly ins: Set<SfgEdge<T>>;
  readonly outs: Set<SfgEdge<T>>;
  /** Edges from the node to itself. */
  readonly loops: Set<SfgEdge<T>>;
}

export type EdgeDraft<T> = Omit<SfgEdge<T>, "seq">;

/** Mutable signal-flow graph. Example: g.addNode("e", 1, { id: "e", joins: true }); g.addEdge({ from: "r", to: "e", … }). */
export class SignalFlowGraph<T> {
  readonly nodes = new Map<string, SfgNode<T>>();
  private nextSeq = 0;
  /** Nodes whose edges changed since the last drain (the reducer re-examines them). */
  readonly touched = new Set<string>();

  addNode(id: string, order: number, own: Junction | null): SfgNode<T> {
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
    const { from, to, gain, label, sign, before, after } = draft; // written out: a spread is slow on this hot path
    const edge: SfgEdge<T> = { seq: this.nextSeq++, from, to, gain, label, sign, before, after };
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
