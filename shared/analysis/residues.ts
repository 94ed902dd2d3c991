// Partial-fraction coefficients at one pole by a Laurent expansion, written once over any number field:
// exact in Q(√d) for rational and quadratic-surd poles, complex doubles for the rest.
import type { NumberField } from "@shared/analysis/surd";
import type { UPoly } from "@shared/analysis/upoly";

/** Coefficients of P(ρ + h) in powers of h up to h^(order−1) (repeated synthetic division by s − ρ). */
export function taylorShift<T>(F: NumberField<T>, p: UPoly, rho: T, order: number): T[] {
  let c = p.map((x) => F.fromQ(x));
  const out: T[] = [];
  for (let k = 0; k < order; k++) {
    if (!c.length) {
      out.push(F.zero);
      continue;
    }
    // c(s) = (s − ρ)·quotient + value, highest power first
    const quotient: T[] = new Array(Math.max(0, c.length - 1));
    let acc = F.zero;
    for (let i = c.length - 1; i >= 0; i--) {
      acc = F.add(F.mul(acc, rho), c[i]);
      if (i > 0) quotient[i - 1] = acc;
    }
    out.push(acc);
    c = quotient;
  }
  return out;
}

function seriesMul<T>(F: NumberField<T>, a: T[], b: T[], order: number): T[] {
  const out: T[] = new Array(order).fill(F.zero);
  for (let i = 0; i < Math.min(order, a.length); i++) {
    for (let j = 0; i + j < order && j < b.length; j++) out[i + j] = F.add(out[i + j], F.mul(a[i], b[j]));
  }
  return out;
}

function seriesDiv<T>(F: NumberField<T>, n: T[], e: T[], order: number): T[] {
  const out: T[] = [];
  for (let k = 0; k < order; k++) {
    let acc = n[k] ?? F.zero;
    for (let i = 1; i <= k; i++) acc = F.sub(acc, F.mul(e[i] ?? F.zero, out[k - i]));
    out.push(F.div(acc, e[0]));
  }
  return out;
}

/**
 * For Y = num / (cofactor · Π_{r ∈ roots} (s − r)^m) with ρ one of `roots`: the coefficients A_j of
 * A_j/(s − ρ)^j, j = 1…m, returned as [A_1, …, A_m].
 * Example: num 1, cofactor 1, roots [−1, −2] (m = 1) at ρ = −1 gives [1]: 1/((s+1)(s+2)) = 1/(s+1) − 1/(s+2).
 */
export function poleCoefficients<T>(
  F: NumberField<T>,
  num: UPoly,
  cofactor: UPoly,
  rho: T,
  roots: readonly T[],
  rhoIndex: number,
  m: number,
): T[] {
  let e = taylorShift(F, cofactor, rho, m);
  roots.forEach((r, i) => {
    if (i === rhoIndex) return;
    const lin = [F.sub(rho, r), F.one]; // (ρ + h − r)
    for (let k = 0; k < m; k++) e = seriesMul(F, e, lin, m);
  });
  const series = seriesDiv(F, taylorShift(F, num, rho, m), e, m);
  return series.reverse(); // series[k] multiplies h^(k−m): 1/(s − ρ)^(m−k)
}
