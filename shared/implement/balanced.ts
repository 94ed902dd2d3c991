import { matMul, solve, identity, transpose } from "@shared/algebra/matrix";
import type { StateSpace } from "@shared/implement/stateSpace";
import { cholesky, lyapunov, symmetricEigen } from "@shared/implement/symmetric";

/** Highest order balanced here: the Kronecker Lyapunov solve grows as n⁶. */
export const BALANCE_MAX_ORDER = 20;

/**
 * The balanced realisation of a stable minimal system: controllability and observability Gramians both equal
 * diag(σ₁ ≥ … ≥ σₙ), the Hankel singular values. Square-root method: Wc = L·Lᵀ, Lᵀ·Wo·L = V·Σ²·Vᵀ,
 * T = L·V·Σ^(−1/2). Each state's sign makes its entry of B non-negative. Null when a Gramian is not
 * positive definite to working precision (nearly uncontrollable or unobservable). Example: 1/(s + 1) → A = [[−1]],
 * B = [[1]], C = [[1]], σ = [0.5].
 */
export function balancedForm(ss: StateSpace): { ss: StateSpace; hankel: number[] } | null {
  const { A, B, C, D } = ss;
  const n = A.length;
  const ct = transpose(C, n);
  const wc = lyapunov(A, matMul(B, transpose(B, 1)));
  const wo = lyapunov(transpose(A, n), matMul(ct, C));
  const l = cholesky(wc);
  if (!l) return null;
  const { values, vectors } = symmetricEigen(matMul(matMul(transpose(l, n), wo), l));
  if (values.some((x) => !(x > 0))) return null;
  const sigma = values.map(Math.sqrt);
  const lInv = solve(l, identity(n));
  const t = matMul(matMul(l, vectors), diag(sigma.map((s) => 1 / Math.sqrt(s))));
  const tInv = matMul(matMul(diag(sigma.map(Math.sqrt)), transpose(vectors, n)), lInv);
  const b = matMul(tInv, B);
  const flip = diag(b.map((row) => (row[0] < 0 ? -1 : 1)));
  const tf = matMul(t, flip);
  const tfInv = matMul(flip, tInv);
  return { ss: { A: matMul(matMul(tfInv, A), tf), B: matMul(tfInv, B), C: matMul(C, tf), D: D.map((row) => row.slice()) }, hankel: sigma };
}

const diag = (d: number[]) => d.map((x, i) => d.map((_, j) => (i === j ? x : 0)));
