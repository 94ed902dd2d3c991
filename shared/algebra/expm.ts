// Own matrix exponential (no package in reach of shared/ has one): diagonal [6/6] Padé approximant with
// scaling and squaring, ‖A/2^j‖∞ ≤ 1/2, whose truncation error is below 4e-16 relative there.
import { identity, matAdd, matMul, matScale, normInf, solve, type Matrix } from "@shared/algebra/matrix";

const Q = 6;

/** Coefficients c_k of the [6/6] Padé numerator of e^x (the denominator is the same at −x). */
const PADE: number[] = (() => {
  const c = [1];
  for (let k = 1; k <= Q; k++) c.push((c[k - 1] * (Q - k + 1)) / (k * (2 * Q - k + 1)));
  return c;
})();

/**
 * e^A for a square matrix. Example: expm([[0, 1], [0, 0]]) is [[1, 1], [0, 1]]; expm([[-1]]) is [[e^−1]].
 */
export function expm(a: Matrix): Matrix {
  const n = a.length;
  if (n === 0) return [];
  const norm = normInf(a);
  const j = norm > 0.5 ? Math.ceil(Math.log2(norm / 0.5)) : 0;
  const x = matScale(a, 2 ** -j);
  let num = matScale(identity(n), PADE[0]);
  let den = matScale(identity(n), PADE[0]);
  let power = identity(n);
  for (let k = 1; k <= Q; k++) {
    power = matMul(power, x);
    num = matAdd(num, power, PADE[k]);
    den = matAdd(den, power, k % 2 ? -PADE[k] : PADE[k]);
  }
  let e = solve(den, num);
  for (let i = 0; i < j; i++) e = matMul(e, e);
  return e;
}
