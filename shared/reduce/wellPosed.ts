import { polyCoeffsS, polyConst, polyGcd, polyLeading, polyParams, type Poly } from "@shared/algebra/poly";
import { qOne } from "@shared/algebra/rational";
import { polyToText } from "@shared/algebra/polytext";
import {
  ratDegrees, ratDenominator, ratDiv, ratField, ratIsZero, ratNumerator, ratOnlyS, ratReduceTracked, type RatFn,
} from "@shared/algebra/ratfn";
import { polyParamRoots } from "@shared/algebra/roots";
import { ratAtZero } from "@shared/algebra/substitute";
import { isDelaySymbol } from "@shared/expr/names";
import type { Problem } from "@shared/diagram/problems";
import { fieldProduct } from "@shared/reduce/eliminate";

const MAX_NAMED = 8;

/** Block ids for a message: "a, b, c", or the first 8 and a count. Example: listBlocks(["e", "g"]) === "e, g". */
export function listBlocks(ids: readonly string[]): string {
  if (ids.length <= MAX_NAMED) return ids.join(", ");
  return `${ids.slice(0, MAX_NAMED).join(", ")} and ${ids.length - MAX_NAMED} more`;
}

/** A loop component (or a group of them) and its determinant Δ, given as factors whose product is Δ. */
export interface FactoredLoop {
  nodes: string[];
  factors: RatFn[];
}

/** Where a polynomial in the parameters vanishes, as words ("K = 1", "K*tau - 2 = 0"); null if never. */
function zeroSet(p: Poly): string | null {
  const names = polyParams(p);
  if (names.length === 0) return null;
  if (names.length > 1) return `${polyToText(p)} = 0`;
  const { name, roots } = polyParamRoots(p);
  if (roots.length === 0) return null;
  return roots.map((r) => `${name} = ${Number(r.toPrecision(6))}`).join(" or ");
}

const ONE = polyConst(qOne);

const delaysIn = (f: RatFn): string[] => [...polyParams(ratNumerator(f)), ...polyParams(ratDenominator(f))].filter(isDelaySymbol);

/**
 * Δ's factors as s → ∞ along the real axis, where every e^(−sT) (T > 0) vanishes, so a loop through a dead time
 * is never algebraic. The symbols are set to 0 in the product (a single factor may hold e^(−sT) in its denominator).
 */
function withoutDelays(factors: readonly RatFn[]): readonly RatFn[] {
  if (!factors.some((f) => delaysIn(f).length)) return factors;
  const delta = fieldProduct(ratField, factors);
  return [[...new Set(delaysIn(delta))].reduce((g, v) => ratAtZero(g, v), delta)];
}
const ratio = (num: Poly, den: Poly): RatFn => ratReduceTracked(num, den).value;
/** Content in the parameters (gcd of the coefficients in s); 1 without parameters, where it cannot vanish. */
const content = (p: Poly): Poly => (polyParams(p).length === 0 ? ONE : polyCoeffsS(p).reduce(polyGcd));

/**
 * What Δ looks like at s → ∞ and as a function of the parameters, read off its factors without multiplying
 * them out — each is multiplicative: the order at infinity (deg num − deg den), the ratio of leading
 * coefficients in s, and the ratio of parameter contents (Gauss's lemma). Without parameters the last two
 * are numbers that cannot vanish, and are not formed.
 */
function shape(factors: readonly RatFn[]) {
  const order = factors.reduce((n, f) => n + ratDegrees(f).num - ratDegrees(f).den, 0);
  if (factors.every(ratOnlyS)) return { order, params: null };
  const parts = factors.map((f) => [ratNumerator(f), ratDenominator(f)] as const);
  const leads = parts.map(([num, den]) => ratio(polyLeading(num), polyLeading(den)));
  const contents = parts.map(([num, den]) => ratio(content(num), content(den)));
  return { order, params: { lead: fieldProduct(ratField, leads), content: fieldProduct(ratField, contents) } };
}

/**
 * Well-posedness of each loop component from its determinant Δ = det(I − A):
 * - Δ ≡ 0: error "algebraic-loop" (the loop equations have no unique solution);
 * - Δ → 0 as s → ∞ with every block of the loop proper: error "improper-loop" (the closed loop would be
 *   improper). Improper blocks (e.g. a PD "K*(s+1)") are allowed and reduced exactly like any other; a
 *   loop containing one that has Δ(∞) = 0 only gets a warning with the same code;
 * - Δ ≡ 0 or Δ(∞) = 0 only for particular parameter values: warning "singular-at-values" giving them.
 * Every problem names the loop's blocks (blockId = the first, related = all).
 * Example: positive unity feedback around a gain of 1 → [{ code: "algebraic-loop", related: ["e", "g"] }].
 */
export function loopProblems(loops: readonly FactoredLoop[], gains: ReadonlyMap<string, RatFn>): Problem[] {
  const problems: Problem[] = [];
  for (const { nodes, factors } of loops) {
    const where = { blockId: nodes[0], related: nodes };
    const names = listBlocks(nodes);
    const say = (severity: Problem["severity"], code: string, message: string) =>
      problems.push({ severity, code, ...where, message });
    if (factors.some(ratIsZero)) {
      say("error", "algebraic-loop", `Algebraic loop through ${names}: its return difference is identically zero, so the loop has no unique solution. Change a gain or sign in the loop, or add dynamics (e.g. an integrator) to it.`);
      continue;
    }
    const proper = nodes.every((id) => {
      const g = gains.get(id);
      return !g || ratDegrees(g).num <= ratDegrees(g).den;
    });
    const { order, params } = shape(withoutDelays(factors));
    if (order < 0) {
      say(proper ? "error" : "warning", "improper-loop", `The loop through ${names} has a return difference that vanishes as s → ∞, so the closed loop would be improper (an algebraic loop at high frequency). Change a gain in the loop or make one of its blocks strictly proper.`);
      continue;
    }
    if (!params) continue;
    const never = zeroSet(ratNumerator(params.content));
    if (never) {
      say("warning", "singular-at-values", `The loop through ${names} has no unique solution when ${never}: its return difference is then identically zero. Keep the parameters away from that value.`);
    }
    if (order > 0 || !proper) continue;
    // Zeros of Δ(∞) already reported with the content are left out.
    const improper = zeroSet(ratNumerator(ratDiv(params.lead, params.content)));
    if (improper) {
      say("warning", "singular-at-values", `The loop through ${names} becomes improper when ${improper}: its return difference then vanishes as s → ∞. Keep the parameters away from that value.`);
    }
  }
  return problems;
}
