import { polyConst, polyDegree, polyEvaluateAt, polyMonic, polyMul, type Poly } from "@shared/algebra/poly";
import { polyToText } from "@shared/algebra/polytext";
import { qOne } from "@shared/algebra/rational";
import { ratDenominator, ratMul, ratNumerator, ratReduceTracked, type RatFn } from "@shared/algebra/ratfn";
import { polyRoots } from "@shared/algebra/roots";
import type { LoopDeterminant } from "@shared/reduce/reduce";
import type { Cancellation } from "@shared/reduce/result";

const ONE = polyConst(qOne);

/** A polynomial as a rational function (over 1). */
const asRat = (p: Poly): RatFn => ratReduceTracked(p, ONE).value;

/**
 * The characteristic polynomial χ(s) = Δ(s) · Π den_b: the signal-flow determinant times the denominator
 * of every block (integrator: s), nothing cancelled — the modes of the whole interconnection. Formed loop
 * component by component (Δ of a component times the denominators of its blocks is a polynomial), then
 * multiplied by the denominators of the blocks outside every loop. Monic when its leading coefficient is a
 * number; a factor free of s (a parameter content) is dropped.
 * Example: unity negative feedback around 1/(s(s+1)) gives s^2 + s + 1.
 */
export function characteristicPolynomial(
  loops: readonly LoopDeterminant<RatFn>[],
  gains: ReadonlyMap<string, RatFn>,
): Poly {
  const inLoop = new Set(loops.flatMap((l) => l.nodes));
  let chi = ONE;
  for (const { nodes, det } of loops) {
    const dens = nodes.flatMap((id) => (gains.has(id) ? [ratDenominator(gains.get(id)!)] : []));
    chi = polyMul(chi, ratNumerator(ratMul(det, asRat(dens.reduce(polyMul, ONE)))));
  }
  for (const [id, g] of gains) if (!inLoop.has(id)) chi = polyMul(chi, ratDenominator(g));
  return polyMonic(chi);
}

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
  const quotient = ratNumerator(ratReduceTracked(chi, ratDenominator(transfer)).value);
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
