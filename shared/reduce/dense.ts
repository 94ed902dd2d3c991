import type { Field } from "@shared/algebra/field";
import type { SignalFlowGraph } from "@shared/reduce/graph";

/**
 * The last resort of the reducer: when every node left has a zero pivot (a loop of gain exactly 1 around
 * one junction) single-node elimination cannot go on, yet the diagram can still be well-posed. Solves
 * (I − A) x = b for the remaining nodes by Gaussian elimination with row exchanges, exactly in the field.
 * `source` is the node whose signal is 1 (the pair's input); null computes the determinant only.
 * Example: two junctions each feeding itself with gain 1 and each other with a and b: det = −a·b.
 */
export function solveDense<T>(
  field: Field<T>,
  graph: SignalFlowGraph<T>,
  source: string | null,
): { det: T; solution: Map<string, T> | null } {
  const unknowns = [...graph.nodes.keys()].filter((id) => id !== source);
  const index = new Map(unknowns.map((id, i) => [id, i]));
  const n = unknowns.length;
  const m: T[][] = unknowns.map((_, i) => unknowns.map((__, j) => (i === j ? field.one : field.zero)));
  const rhs: T[] = unknowns.map(() => field.zero);
  for (const e of graph.edges()) {
    const row = index.get(e.to);
    if (row === undefined) continue;
    if (e.from === source) rhs[row] = field.add(rhs[row], e.gain);
    else m[row][index.get(e.from)!] = field.sub(m[row][index.get(e.from)!], e.gain);
  }
  let det = field.one;
  for (let c = 0; c < n; c++) {
    let p = c;
    while (p < n && field.isZero(m[p][c])) p++;
    if (p === n) return { det: field.zero, solution: null };
    if (p !== c) {
      [m[p], m[c]] = [m[c], m[p]];
      [rhs[p], rhs[c]] = [rhs[c], rhs[p]];
      det = field.neg(det);
    }
    det = field.mul(det, m[c][c]);
    for (let r = c + 1; r < n; r++) {
      if (field.isZero(m[r][c])) continue;
      const factor = field.div(m[r][c], m[c][c]);
      for (let k = c; k < n; k++) m[r][k] = field.sub(m[r][k], field.mul(factor, m[c][k]));
      rhs[r] = field.sub(rhs[r], field.mul(factor, rhs[c]));
    }
  }
  const x: T[] = new Array(n);
  for (let r = n - 1; r >= 0; r--) {
    let acc = rhs[r];
    for (let k = r + 1; k < n; k++) acc = field.sub(acc, field.mul(m[r][k], x[k]));
    x[r] = field.div(acc, m[r][r]);
  }
  return { det, solution: new Map(unknowns.map((id, i) => [id, x[i]])) };
}

/** The loop equations of these nodes have no unique solution. */
export class SingularLoopError extends Error {
  constructor(readonly nodes: string[]) {
    super(`Algebraic loop through ${nodes.join(", ")}`);
    this.name = "SingularLoopError";
  }
}
