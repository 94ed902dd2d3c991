import { charPoly } from "@shared/implement/charPoly";
import { matMul, type Matrix } from "@shared/algebra/matrix";
import type { StateSpace } from "@shared/implement/stateSpace";

/** A float transfer: coefficients in DESCENDING powers (of s or of z), constant last. */
export interface FloatTf {
  numerator: number[];
  denominator: number[];
}

/**
 * The transfer C(sI − A)⁻¹B + D of a single-input single-output realisation (the same in z for a discrete one):
 * the denominator det(sI − A) from the Hessenberg form, the numerator from the Markov parameters CAᵏB,
 * b_k = D·a_k + Σ_{j<k} a_j·CA^(k−1−j)B. Leading zeros of the numerator are dropped.
 * Example: ssToTf({ A: [[-1]], B: [[1]], C: [[2]], D: [[0]] }) is { numerator: [2], denominator: [1, 1] }.
 */
export function ssToTf({ A, B, C, D }: StateSpace): FloatTf {
  const n = A.length;
  const den = charPoly(A);
  const markov: number[] = [];
  let x: Matrix = B;
  for (let k = 0; k < n; k++) {
    markov.push(matMul(C, x)[0][0]);
    x = matMul(A, x);
  }
  const d = D[0][0];
  const num = den.map((a, k) => {
    let s = d * a;
    for (let j = 0; j < k; j++) s += den[j] * markov[k - 1 - j];
    return s;
  });
  let first = 0;
  while (first < num.length - 1 && num[first] === 0) first++;
  return { numerator: num.slice(first), denominator: den };
}
