import {
  polyCoeffsS, polyConst, polyDegree, polyEvaluateAt, polyGcd, polyMonic, polyMul, polyParams, type Poly,
} from "@shared/algebra/poly";
import { polyToText } from "@shared/algebra/polytext";
import { qOne } from "@shared/algebra/rational";
import {
  ratDegrees, ratDenominator, ratField, ratIsZero, ratMul, ratNumerator, ratReduceTracked, type RatFn,
} from "@shared/algebra/ratfn";
import { polyRoots } from "@shared/algebra/roots";
import { isDelaySymbol } from "@shared/expr/names";
import type { LoopCheck } from "@shared/reduce/loops";
import { fieldProduct } from "@shared/reduce/eliminate";
import type { PairTransfer } from "@shared/reduce/reduce";

/** A common factor the reduction cancelled, exact; printed as a Cancellation of the published result. */
export interface ExactCancellation {
  factor: Poly;
  /** Its roots at the nominal parameter values, as [re, im] pairs. */
  roots: [number, number][];
  /** A root with non-negative real part: a hidden unstable mode. */
  unstable: boolean;
}

const ONE = polyConst(qOne);

/** A polynomial as a rational function (over 1). */
const asRat = (p: Poly): RatFn => ratReduceTracked(p, ONE).value;

/**
 * The characteristic polynomial χ(s) = Δ(s) · Π den_b: the signal-flow determinant times the denominator
 * of every block (integrator: s), nothing cancelled — the modes of the whole interconnection. Formed part
 * by part, each a polynomial: Δ of a loop component times the denominators of its blocks, and the
 * denominators of blocks outside every loop. For the first pair's group (see checkLoops), Δ·Π den over
 * that pair's nodes has degree order(Δ) + Σ deg den_b and is divisible by the pair's denominator D: when
 * D has that full degree (nothing cancelled) it is D itself, else the pair's pivots are multiplied out.
 * Printed monic when the leading coefficient is a number; a factor free of s (a numeric or parameter
 * content) is dropped. Example: unity negative feedback around 1/(s(s+1)) gives s^2 + s + 1.
 */
export function characteristicPolynomial(
  check: LoopCheck,
  gains: ReadonlyMap<string, RatFn>,
  first: PairTransfer<RatFn> | undefined,
): Poly {
  const densOf = (nodes: readonly string[]) => nodes.flatMap((id) => (gains.has(id) ? [ratDenominator(gains.get(id)!)] : []));
  const partOf = (nodes: readonly string[], factors: readonly RatFn[]) =>
    ratNumerator(ratMul(fieldProduct(ratField, factors), asRat(densOf(nodes).reduce(polyMul, ONE))));
  const parts: Poly[] = [];
  const counted = new Set<string>();
  if (check.group && first) {
    const order = check.group.factors.reduce((n, f) => n + ratDegrees(f).num - ratDegrees(f).den, 0);
    const full = densOf(first.nodes).reduce((n, p) => n + polyDegree(p), order);
    const d = ratDenominator(first.gain);
    const whole = !ratIsZero(first.gain) && polyDegree(d) === full;
    parts.push(whole ? d : partOf(check.group.nodes, check.group.factors));
    for (const id of whole ? first.nodes : check.group.nodes) counted.add(id);
  }
  for (const { nodes, factors } of check.loops) {
    parts.push(partOf(nodes, factors));
    for (const id of nodes) counted.add(id);
  }
  for (const [id, g] of gains) if (!counted.has(id)) parts.push(ratDenominator(g));
  return withoutContent(parts.reduce(polyMul, ONE));
}

/**
 * The polynomial divided by its content (the gcd of its coefficients in s), made monic. A content holding a dead
 * time's symbol stays: 1 + K·e^(−sT) is free of s only in the symbols, not in s, and its roots are modes.
 */
function withoutContent(p: Poly): Poly {
  const content = polyCoeffsS(p).reduce(polyGcd);
  return polyMonic(polyParams(content).some(isDelaySymbol) ? p : ratNumerator(ratReduceTracked(p, content).value));
}

/** Has a root with real part ≥ 0, allowing for rounding (1e-9 relative). */
const unstableRoot = ([re, im]: [number, number]): boolean => re >= -1e-9 * Math.max(1, Math.hypot(re, im));

/**
 * The modes a pair's transfer hides: T = P/χ and, in lowest terms, N/D; the cancelled part is χ/D, split
 * into factors where possible (parameter-free rational linear and quadratic factors, square-free parts),
 * each with its roots at the nominal parameter values and `unstable` when one has Re ≥ 0 (within 1e-9,
 * relative, so a cancelled integrator counts). A pair whose transfer is 0 hides every mode of χ.
 * `cache` maps a quotient's text to its result, since many pairs share it.
 * Example: plant 1/(s - 1) behind a controller (s - 1)/(s + 1) → [{ factor: s - 1, roots: [[1, 0]], unstable: true }].
 */
export function cancelledModes(
  chi: Poly,
  transfer: RatFn,
  nominal: Readonly<Record<string, number>>,
  cache: Map<string, ExactCancellation[]>,
): ExactCancellation[] {
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
      // A hidden mode through a dead time has infinitely many roots: the analysis's Padé poles stand for them.
      if (polyParams(f).some(isDelaySymbol)) return { factor: f, roots: [], unstable: false };
      const roots = polyRoots(polyEvaluateAt(f, nominal));
      return { factor: f, roots, unstable: roots.some(unstableRoot) };
    });
  cache.set(key, result);
  return result;
}
