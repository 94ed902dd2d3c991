import type { SignalFlowGraph } from "@shared/reduce/graph";

/**
 * Strongly connected components of the graph that contain a loop (two or more nodes, or a node wired
 * to itself), each listed in document order, components in order of their first node.
 * Iterative Tarjan: recursion would overflow on 2,000-block chains.
 * Example: r → e ⇄ p → y gives [["e", "p"]].
 */
export function loopComponents<T>(graph: SignalFlowGraph<T>): string[][] {
  const index = new Map<string, number>();
  const low = new Map<string, number>();
  const onStack = new Set<string>();
  const stack: string[] = [];
  const found: string[][] = [];
  let counter = 0;
  const successors = (id: string) => [...graph.node(id).outs].map((e) => e.to);

  for (const root of graph.nodes.keys()) {
    if (index.has(root)) continue;
    const work: { id: string; next: string[]; at: number }[] = [];
    const open = (id: string) => {
      index.set(id, counter);
      low.set(id, counter++);
      stack.push(id);
      onStack.add(id);
      work.push({ id, next: successors(id), at: 0 });
    };
    open(root);
    while (work.length > 0) {
      const top = work[work.length - 1];
      if (top.at < top.next.length) {
        const w = top.next[top.at++];
        if (!index.has(w)) open(w);
        else if (onStack.has(w)) low.set(top.id, Math.min(low.get(top.id)!, index.get(w)!));
        continue;
      }
      work.pop();
      if (work.length > 0) {
        const parent = work[work.length - 1].id;
        low.set(parent, Math.min(low.get(parent)!, low.get(top.id)!));
      }
      if (low.get(top.id) !== index.get(top.id)) continue;
      const component: string[] = [];
      for (;;) {
        const w = stack.pop()!;
        onStack.delete(w);
        component.push(w);
        if (w === top.id) break;
      }
      if (component.length > 1 || graph.node(top.id).loops.size > 0) found.push(component);
    }
  }
  const order = (id: string) => graph.node(id).order;
  for (const c of found) c.sort((a, b) => order(a) - order(b));
  return found.sort((a, b) => order(a[0]) - order(b[0]));
}

/**
 * Nodes reachable from `start` along edges (forward) or against them (backward), `start` included.
 * Example: reachable(g, "y", "backward") holds every node with a path to y.
 */
export function reachable<T>(graph: SignalFlowGraph<T>, start: string, direction: "forward" | "backward"): Set<string> {
  const seen = new Set<string>([start]);
  const queue = [start];
  while (queue.length > 0) {
    const node = graph.node(queue.pop()!);
    const edges = direction === "forward" ? node.outs : node.ins;
    for (const e of edges) {
      const next = direction === "forward" ? e.to : e.from;
      if (!seen.has(next)) {
        seen.add(next);
        queue.push(next);
      }
    }
  }
  return seen;
}
