// Dead times e^(−sT) replaced by their Padé approximant of a chosen order, so that poles, the Routh array and
// time responses — which need a rational function of s — can be formed from a delayed loop.
import { polyAdd, polyConst, polyMul, polyS, polyScale, polyZero, type Poly } from "@shared/algebra/poly";
import { q, type Q } from "@shared/algebra/rational";
import { ratDenominator, ratNumerator, type RatFn } from "@shared/algebra/ratfn";
import { polyHomogenized, ratSubstitute } from "@shared/algebra/substitute";
import type { DelaySymbol } from "@shared/reduce/blockGains";

export const PADE_DEFAULT = 3;
export const PADE_MIN = 1;
export const PADE_MAX = 10;

const factorial = (n: number): bigint => (n <= 1 ? 1n : BigInt(n) * factorial(n - 1));

/**
 * Coefficients c_k of the order-N Padé approximant e^(−x) ≈ Σ c_k (−x)^k / Σ c_k x^k, c_0 = 1.
 * Example: padeCoefficients(1) is [1, 1/2] (e^(−x) ≈ (1 − x/2)/(1 + x/2)).
 */
export function padeCoefficients(n: number): Q[] {
  return Array.from({ length: n + 1 }, (_, k) => q(factorial(2 * n - k) * factorial(n), factorial(2 * n) * factorial(k) * factorial(n - k)));
}

/**
 * Numerator P and denominator Q of the Padé approximant of e^(−sT), T = Tn/Td exact (T may hold parameters),
 * both multiplied by Td^N so they are polynomials. Example: padeOfDelay(1/2, 1) is P = 4 − s, Q = 4 + s (up to a factor).
 */
export function padeOfDelay(T: RatFn, n: number): { P: Poly; Q: Poly } {
  const tn = ratNumerator(T);
  const td = ratDenominator(T);
  const c = padeCoefficients(n);
  let P = polyZero;
  let Qp = polyZero;
  let sT = polyConst(q(1)); // (s·Tn)^k
  const tdPow: Poly[] = [polyConst(q(1))];
  for (let k = 1; k <= n; k++) tdPow.push(polyMul(tdPow[k - 1], td));
  for (let k = 0; k <= n; k++) {
    const term = polyMul(polyScale(sT, c[k]), tdPow[n - k]);
    Qp = polyAdd(Qp, term);
    P = polyAdd(P, k % 2 ? polyScale(term, q(-1)) : term);
    sT = polyMul(sT, polyMul(polyS(), tn));
  }
  return { P, Q: Qp };
}

/** Every dead time of a reduction with its Padé numerator and denominator. */
export type PadeTable = { symbol: string; P: Poly; Q: Poly }[];

/** The Padé table of a reduction's dead times at order n. */
export const padeTable = (delays: readonly DelaySymbol[], n: number): PadeTable =>
  delays.map((d) => ({ symbol: d.symbol, ...padeOfDelay(d.T, n) }));

/** A transfer with every dead time replaced by its Padé approximant. Example: K·E/(1 + K·E) at N = 1, T = 1. */
export const ratPade = (r: RatFn, table: PadeTable): RatFn => table.reduce((acc, d) => ratSubstitute(acc, d.symbol, d.P, d.Q), r);

/**
 * A characteristic polynomial with every dead time replaced: χ(P/Q)·Q^deg, the denominators of the
 * approximants standing in as block denominators. Example: 1 + K·E at N = 1, T = 2 → (1 + s) + K(1 − s).
 */
export const polyPade = (p: Poly, table: PadeTable): Poly => table.reduce((acc, d) => polyHomogenized(acc, d.symbol, d.P, d.Q).value, p);
