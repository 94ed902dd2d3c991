import {
  polyCoeffsS, polyConst, polyDegree, polyEvaluateAt, polyGcd, polyMonic, polyMul, type Poly,
} from "@shared/algebra/poly";
import { polyToText } from "@shared/algebra/polytext";
import { qOne } from "@shared/algebra/rational";
import {
  ratDenominator, ratField, ratIsZero, ratMul, ratNumerator, ratReduceTracked, type RatFn,
} from "@shared/algebra/ratfn";
import { polyRoots } from "@shared/algebra/roots";
import type { LoopCheck } from "@shared/engine/loops";
import { fieldProduct } from "@shared/reduce/eliminate";
import type { PairTransfer } from "@shared/reduce/reduce";
import type { Cancellation } from "@shared/reduce/result";

const ONE = polyConst(qOne);

/** A polynomial as a rational function (over 1). */
const asRat = (p: Poly): RatFn => ratReduceTracked(p, ONE).value;

/**
 * The characteristic polynomial χ(s) = Δ(s) · Π den_b: the signal-flow determinant times the denominator
 * of every block (integrator: s), nothing cancelled — the modes of the whole interconnection. Formed part
 * by part, each part a polynomial: Δ of a loop component times the denominators of its blocks; the
 * denominators of blocks outside every loop; and for the nodes `covered` by the first pair (see
 * checkLoops) Δ·Π den over those nodes, which is that pair's own denominator D whenever D has its full
 * degree Σ deg den_b (nothing cancelled), else the pair's pivots multiplied out. Printed monic when the
 * leading coefficient is a number; a factor free of s (a numeric or parameter content) is dropped.
 * Example: unity negative feedback around 1/(s(s+1)) gives s^2 + s + 1.
 */
export function characteristicPolynomial(
  check: LoopCheck,
  gains: ReadonlyMap<string, RatFn>,
  first: PairTransfer<RatFn> | undefined,
): Poly {
  const densOf = (nodes: readonly string[]) => nodes.flatMap((id) => (gains.has(id) ? [ratDenominator(gains.get(id)!)] : []));
  const parts: Poly[] = [];
  if (check.covered.length > 0 && first?.pivots) {
    const dens = densOf(check.covered);
    const d = ratDenominator(first.gain);
    const full = dens.reduce((n, p) => n + polyDegree(p), 0);
    const whole = !ratIsZero(first.gain) && polyDegree(d) === full;
    parts.push(whole ? d : ratNumerator(ratMul(fieldProduct(ratField, first.pivots), asRat(dens.reduce(polyMul, ONE)))));
  }
  for (const { nodes, det } of check.loops) parts.push(ratNumerator(ratMul(det, asRat(densOf(nodes).reduce(polyMul, ONE)))));
  const counted = new Set([...check.covered, ...check.loops.flatMap((l) => l.nodes)]);
  for (const [id, g] of gains) if (!counted.has(id)) parts.push(ratDenominator(g));
  return withoutContent(parts.reduce(polyMul, ONE));
}

/** The polynomial divided by its content (the gcd of its coefficients in s), made monic. */
const withoutContent = (p: Poly): Poly =>
  polyMonic(ratNumerator(ratReduceTracked(p, polyCoeffsS(p).reduce(polyGcd)).value));

/** Has a root with real part ≥ 0, allowing for rounding (1e-9 relative). */
const unstableRoot = ([re, im]: [number, number]): boolean => re >= -1e-9 * Math.max(1, Math.hypot(re, im));

/**
 * The modes a pair's transfer hides: T = P/χ and, in lowest terms, N/D; the cancelled part is χ/D, split
 * into factors where possible (parameter-free rational linear and quadratic factors, square-free parts),
 * each with its roots at the nominal parameter values and `unstable` when one has Re ≥ 0.
 * `cache` maps a quotient's text to its result, since many pairs share it.
 * Example: plant 1/(s - 1) behind a controller (s - 1)/(s + 1) → [{ factor: "s - 1", roots: [[1, 0]], unstable: true }].
 */
export function cancelledModes(
  chi: Poly,
  transfer: RatFn,
  nominal: Readonly<Record<string, number>>,
  cache: Map<string, Cancellation[]>,
): Cancellation[] {
  const den = ratDenominator(transfer);
  // Same degree: the quotient is a constant, nothing is hidden (the common case, worth skipping a division).
  if (polyDegree(den) === polyDegree(chi)) return [];
  const quotient = ratNumerator(ratReduceTracked(chi, den).value);
  const key = polyToText(quotient);
  const known = cache.get(key);
  if (known) return known;
  const factors = polyDegree(quotient) > 0 ? ratReduceTracked(quotient, quotient).cancelled : [];
  const result = factors
    .filter((f) => polyDegree(f) > 0)
    .map((f) => {
      const roots = polyRoots(polyEvaluateAt(f, nominal));
      return { factor: polyToText(f), roots, unstable: roots.some(unstableRoot) };
    });
  cache.set(key, result);
  return result;
}
