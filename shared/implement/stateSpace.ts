import { qMul, qNeg, qSub, qToNumber, qZero } from "@shared/algebra/rational";
import { upDeg, type UPoly } from "@shared/analysis/upoly";
import { ImplementError, type Subject } from "@shared/implement/errors";
import { transpose, type Matrix } from "@shared/algebra/matrix";

/** A transfer at fixed values: exact ascending coefficients, lowest terms, monic denominator (transferAt's). */
export interface ExactTf {
  num: UPoly;
  den: UPoly;
}

/** ẋ = A x + B u, y = C x + D u (single input, single output). */
export interface StateSpace {
  A: Matrix;
  B: Matrix;
  C: Matrix;
  D: Matrix;
}

/** Refuses a transfer with more zeros than poles, naming what it is and what cannot be done (`purpose`). */
export function requireProper(tf: ExactTf, subject: Subject, purpose: string): void {
  if (upDeg(tf.num) > upDeg(tf.den)) {
    throw new ImplementError(
      "improper",
      `The transfer of ${subject.what} has more zeros (${upDeg(tf.num)}) than poles (${upDeg(tf.den)}): it is improper, so ${purpose}. Add a filter pole (e.g. K·(s + a)/(τs + 1)) to make it proper.`,
      subject.id,
    );
  }
}

/**
 * The controllable canonical form of a proper transfer b(s)/(sⁿ + a₁sⁿ⁻¹ + … + aₙ): first row of A is −a₁…−aₙ,
 * ones below the diagonal, B = e₁, C the coefficients of b(s) − D·a(s), D the direct feed-through.
 * Exact until the last step. Example: (s + 3)/(s² + 3s + 2) → A = [[−3, −2], [1, 0]], B = [[1], [0]], C = [[1, 3]], D = [[0]].
 */
export function controllableForm(tf: ExactTf): StateSpace {
  const n = upDeg(tf.den);
  const d = tf.num[n] ?? qZero;
  const rest = (i: number) => qSub(tf.num[i] ?? qZero, qMul(d, tf.den[i]));
  const A = Array.from({ length: n }, (_, i) =>
    Array.from({ length: n }, (_, j) => (i === 0 ? qToNumber(qNeg(tf.den[n - 1 - j])) : j === i - 1 ? 1 : 0)),
  );
  const B = Array.from({ length: n }, (_, i) => [i === 0 ? 1 : 0]);
  const C = [Array.from({ length: n }, (_, j) => qToNumber(rest(n - 1 - j)))];
  return { A, B, C, D: [[qToNumber(d)]] };
}

/** The observable canonical form: the dual of the controllable one (Aᵀ, Cᵀ, Bᵀ, D). Example: C = e₁ᵀ. */
export function observableForm(tf: ExactTf): StateSpace {
  const c = controllableForm(tf);
  const n = c.A.length;
  return { A: transpose(c.A, n), B: transpose(c.C, n), C: transpose(c.B, 1), D: c.D };
}
