import type { DiagramDocument } from "@shared/diagram/schema";
import { cAdd, cDiv, cMul, cNeg, cx, ONE, type Complex } from "./complex";
import type { ParamValues } from "./evalExpr";
import type { BlockSolution, PairValue } from "./blockSolve";
import { numericGraph } from "./signalGraph";

/**
 * Reference 2: Mason's gain formula T = Σ_k P_k·Δ_k / Δ on the signal-flow graph at one complex s.
 * Loops are the elementary circuits (each found once, from its lowest node, as in Johnson's
 * enumeration without the blocking refinement); Δ sums over every set of pairwise non-touching loops.
 * Parallel wires between two signals are merged into one branch (their gains add).
 */
const MAX_NODES = 31; // node sets are 31-bit masks
const MAX_LOOPS = 50_000;

interface Loop {
  mask: number;
  gain: Complex;
}

/** Δ over `loops`: 1 − Σ L_i + Σ L_iL_j (non-touching) − … by recursion over independent sets. */
function delta(loops: Loop[]): Complex {
  const rec = (start: number, used: number): Complex => {
    let sum = ONE;
    for (let i = start; i < loops.length; i++) {
      if (loops[i].mask & used) continue;
      sum = cAdd(sum, cNeg(cMul(loops[i].gain, rec(i + 1, used | loops[i].mask))));
    }
    return sum;
  };
  return rec(0, 0);
}

export function mason(doc: DiagramDocument, s: Complex, params: ParamValues): BlockSolution {
  const g = numericGraph(doc, s, params);
  const n = g.ids.length;
  if (n > MAX_NODES) throw new RangeError(`Mason reference handles at most ${MAX_NODES} blocks, got ${n}`);
  const adj: Map<number, Complex>[] = Array.from({ length: n }, () => new Map());
  for (const b of g.branches) adj[b.from].set(b.to, cAdd(adj[b.from].get(b.to) ?? cx(0), b.gain));

  const loops: Loop[] = [];
  for (let start = 0; start < n; start++) {
    const walk = (node: number, mask: number, gain: Complex): void => {
      for (const [next, w] of adj[node]) {
        if (next === start) {
          loops.push({ mask, gain: cMul(gain, w) });
          if (loops.length > MAX_LOOPS) throw new RangeError("too many loops for the Mason reference");
        } else if (next > start && !(mask & (1 << next))) {
          walk(next, mask | (1 << next), cMul(gain, w));
        }
      }
    };
    walk(start, 1 << start, ONE);
  }
  const det = delta(loops);

  const transfers: PairValue[] = [];
  for (const input of g.inputs) {
    for (const output of g.outputs) {
      const target = g.index.get(output)!;
      let sum = cx(0);
      const walk = (node: number, mask: number, gain: Complex): void => {
        if (node === target) {
          sum = cAdd(sum, cMul(gain, delta(loops.filter((l) => !(l.mask & mask)))));
          return;
        }
        for (const [next, w] of adj[node]) {
          if (!(mask & (1 << next))) walk(next, mask | (1 << next), cMul(gain, w));
        }
      };
      const from = g.index.get(input)!;
      walk(from, 1 << from, ONE);
      transfers.push({ input, output, value: cDiv(sum, det) });
    }
  }
  return { transfers, det };
}
