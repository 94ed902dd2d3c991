import { q, qMul, qOne, qPow, type Q } from "@shared/algebra/rational";
import { upAdd, upDeg, upFrom, upMul, upScale, type UPoly } from "@shared/analysis/upoly";
import type { ExactTf } from "@shared/implement/stateSpace";

const Z_MINUS_1 = upFrom([q(-1), qOne]);
const Z_PLUS_1 = upFrom([qOne, qOne]);

const powers = (u: UPoly, n: number): UPoly[] => {
  const out = [upFrom([qOne])];
  for (let k = 1; k <= n; k++) out.push(upMul(out[k - 1], u));
  return out;
};

/**
 * p(c·(z − 1)/(z + 1))·(z + 1)ⁿ for a polynomial p of degree ≤ n: Σ p_i cⁱ (z − 1)ⁱ (z + 1)ⁿ⁻ⁱ, exact.
 * Example: mapped(s, 1, 2) is (z − 1)·(z + 1)·2.
 */
function mapped(p: UPoly, n: number, c: Q, minus: UPoly[], plus: UPoly[]): UPoly {
  return p.reduce((acc, pi, i) => upAdd(acc, upScale(upMul(minus[i], plus[n - i]), qMul(pi, qPow(c, i)))), upFrom([]));
}

/**
 * The bilinear substitution s = c·(z − 1)/(z + 1) in exact arithmetic: c = 2/Ts is Tustin's method, c = ω/tan(ωTs/2)
 * the pre-warped one that keeps the response at ω. Both polynomials have degree max(deg num, deg den) in z (so an
 * improper transfer comes out proper). Example: 1/s at c = 2/Ts → (Ts/2)·(z + 1)/(z − 1).
 */
export function bilinear(tf: ExactTf, c: Q): ExactTf {
  const n = Math.max(upDeg(tf.num), upDeg(tf.den));
  const minus = powers(Z_MINUS_1, n);
  const plus = powers(Z_PLUS_1, n);
  return { num: mapped(tf.num, n, c, minus, plus), den: mapped(tf.den, n, c, minus, plus) };
}
