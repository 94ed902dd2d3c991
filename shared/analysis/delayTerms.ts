// A polynomial in s and dead-time symbols at parameter values, split by the total delay of each term: the form in
// which a quasi-rational transfer becomes a delay differential equation.
import { q, qMul, qToNumber, type Q } from "@shared/algebra/rational";
import type { Poly } from "@shared/algebra/poly";
import { S, type ZPoly } from "@shared/algebra/zpoly";
import { polySubstitute } from "@shared/analysis/nominal";
import { AnalysisError } from "@shared/analysis/errors";

/** Σ coeffs[j]·s^j·e^(−s·tau): one delay's share of a polynomial, coefficients ascending in s. */
export interface DelayTerm {
  tau: number;
  coeffs: number[];
}

/**
 * The terms of p grouped by total delay (ascending tau), parameters at their values, delays in seconds.
 * Example: (s + 1) + 2·E with E = e^(−0.5s) gives [{ tau: 0, coeffs: [1, 1] }, { tau: 0.5, coeffs: [2] }].
 */
export function delayTerms(p: Poly, values: ReadonlyMap<string, Q>, delays: ReadonlyMap<string, number>): DelayTerm[] {
  const at = polySubstitute(p, values);
  const byTau = new Map<number, number[]>();
  const add = (tau: number, power: number, c: Q) => {
    const key = Number(tau.toPrecision(15));
    const row = byTau.get(key) ?? [];
    while (row.length <= power) row.push(0);
    row[power] += qToNumber(qMul(at.q, c));
    byTau.set(key, row);
  };
  // Walks the delay symbols of one coefficient of s^power, summing each monomial's delays.
  const walk = (z: ZPoly, power: number, tau: number) => {
    if (typeof z === "bigint") {
      if (z !== 0n) add(tau, power, q(z));
      return;
    }
    const T = delays.get(z.v);
    if (T === undefined) throw new AnalysisError("bad-value", `No value for parameter ${z.v}: give it a nominal value.`, z.v);
    z.c.forEach((c, e) => walk(c, power, tau + e * T));
  };
  const z = at.z;
  if (typeof z !== "bigint" && z.v === S) z.c.forEach((c, power) => walk(c, power, 0));
  else walk(z, 0, 0);
  return [...byTau.entries()].sort(([a], [b]) => a - b).map(([tau, coeffs]) => ({ tau, coeffs: trim(coeffs) }));
}

function trim(c: number[]): number[] {
  let n = c.length;
  while (n > 0 && c[n - 1] === 0) n--;
  return c.slice(0, n);
}
