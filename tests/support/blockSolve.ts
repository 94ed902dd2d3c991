import type { DiagramDocument } from "@shared/diagram/schema";
import { cAbs, cDiv, cMul, cSub, cx, ONE, type Complex } from "./complex";
import type { ParamValues } from "./evalExpr";
import { numericGraph } from "./signalGraph";

/**
 * Reference 1: the block equations x = A·x + u solved numerically at one complex s by Gaussian
 * elimination with partial pivoting on (I − A). Input blocks are unknowns whose row is x_i = u_i.
 */
export interface PairValue {
  input: string;
  output: string;
  value: Complex;
}

export interface BlockSolution {
  transfers: PairValue[];
  /** det(I − A): the signal-flow determinant Δ at s. */
  det: Complex;
}

/** LU-factorise in place; returns the row permutation and the determinant. */
function factor(m: Complex[][]): { perm: number[]; det: Complex } {
  const n = m.length;
  const perm = Array.from({ length: n }, (_, i) => i);
  let det = ONE;
  for (let k = 0; k < n; k++) {
    let p = k;
    for (let i = k + 1; i < n; i++) if (cAbs(m[i][k]) > cAbs(m[p][k])) p = i;
    if (cAbs(m[p][k]) === 0) return { perm, det: cx(0) };
    if (p !== k) {
      [m[p], m[k]] = [m[k], m[p]];
      [perm[p], perm[k]] = [perm[k], perm[p]];
      det = cx(-det.re, -det.im);
    }
    det = cMul(det, m[k][k]);
    for (let i = k + 1; i < n; i++) {
      const f = cDiv(m[i][k], m[k][k]);
      m[i][k] = f;
      for (let j = k + 1; j < n; j++) m[i][j] = cSub(m[i][j], cMul(f, m[k][j]));
    }
  }
  return { perm, det };
}

function solveFactored(lu: Complex[][], perm: number[], rhs: Complex[]): Complex[] {
  const n = lu.length;
  const x = perm.map((p) => rhs[p]);
  for (let i = 0; i < n; i++) for (let j = 0; j < i; j++) x[i] = cSub(x[i], cMul(lu[i][j], x[j]));
  for (let i = n - 1; i >= 0; i--) {
    for (let j = i + 1; j < n; j++) x[i] = cSub(x[i], cMul(lu[i][j], x[j]));
    x[i] = cDiv(x[i], lu[i][i]);
  }
  return x;
}

/** Every (input, output) transfer at s, other inputs zero, and det(I − A). Throws when singular. */
export function blockSolve(doc: DiagramDocument, s: Complex, params: ParamValues): BlockSolution {
  const g = numericGraph(doc, s, params);
  const n = g.ids.length;
  const m = Array.from({ length: n }, (_, i) => Array.from({ length: n }, (_, j) => (i === j ? ONE : cx(0))));
  for (const b of g.branches) m[b.to][b.from] = cSub(m[b.to][b.from], b.gain);
  const { perm, det } = factor(m);
  if (cAbs(det) === 0) throw new RangeError("block equations are singular at this s");
  const transfers: PairValue[] = [];
  for (const input of g.inputs) {
    const rhs = g.ids.map((id) => (id === input ? ONE : cx(0)));
    const x = solveFactored(m, perm, rhs);
    for (const output of g.outputs) transfers.push({ input, output, value: x[g.index.get(output)!] });
  }
  return { transfers, det };
}
