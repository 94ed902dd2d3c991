import { expm } from "@shared/algebra/expm";
import { zeros } from "@shared/algebra/matrix";
import { ssToTf, type FloatTf } from "@shared/implement/ssToTf";
import { controllableForm, type ExactTf } from "@shared/implement/stateSpace";

/**
 * The zero-order-hold equivalent of a proper transfer: Φ = e^(A·Ts) and Γ = ∫₀^Ts e^(Aτ)dτ·B from one exponential
 * of [[A, B], [0, 0]]·Ts, then C(zI − Φ)⁻¹Γ + D. Example (from memory): a/(s + a) → (1 − e^(−aTs))/(z − e^(−aTs)).
 */
export function zoh(tf: ExactTf, ts: number): FloatTf {
  const { A, B, C, D } = controllableForm(tf);
  const n = A.length;
  const m = zeros(n + 1, n + 1);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) m[i][j] = A[i][j] * ts;
    m[i][n] = B[i][0] * ts;
  }
  const e = expm(m);
  const phi = e.slice(0, n).map((row) => row.slice(0, n));
  const gamma = e.slice(0, n).map((row) => [row[n]]);
  return ssToTf({ A: phi, B: gamma, C, D });
}
