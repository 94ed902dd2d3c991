import { polyAtInfinityRatio, polyCoeffsS, polyGcd, polyLeading, polyMul, polyParams, type Poly } from "@shared/algebra/poly";
import { polyToText } from "@shared/algebra/polytext";
import { ratDegrees, ratDenominator, ratIsZero, ratNumerator, ratReduceTracked, type RatFn } from "@shared/algebra/ratfn";
import { polyParamRoots } from "@shared/algebra/roots";
import type { Problem } from "@shared/diagram/problems";
import type { LoopDeterminant } from "@shared/reduce/reduce";

const MAX_NAMED = 8;

/** "a, b, c" — or the first few and a count, for loops of many blocks. */
export function listBlocks(ids: readonly string[]): string {
  if (ids.length <= MAX_NAMED) return ids.join(", ");
  return `${ids.slice(0, MAX_NAMED).join(", ")} and ${ids.length - MAX_NAMED} more`;
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
export function loopProblems(loops: readonly LoopDeterminant<RatFn>[], gains: ReadonlyMap<string, RatFn>): Problem[] {
  const problems: Problem[] = [];
  for (const { nodes, det } of loops) {
    const where = { blockId: nodes[0], related: nodes };
    const names = listBlocks(nodes);
    if (ratIsZero(det)) {
      problems.push({
        severity: "error",
        code: "algebraic-loop",
        ...where,
        message: `Algebraic loop through ${names}: its return difference is identically zero, so the loop has no unique solution. Change a gain or sign in the loop, or add dynamics (e.g. an integrator) to it.`,
      });
      continue;
    }
    const num = ratNumerator(det);
    const proper = nodes.every((id) => {
      const g = gains.get(id);
      return !g || ratDegrees(g).num <= ratDegrees(g).den;
    });
    if (polyAtInfinityRatio(num, ratDenominator(det)) === "zero") {
      problems.push({
        severity: proper ? "error" : "warning",
        code: "improper-loop",
        ...where,
        message: `The loop through ${names} has a return difference that vanishes as s → ∞, so the closed loop would be improper (an algebraic loop at high frequency). Change a gain in the loop or make one of its blocks strictly proper.`,
      });
      continue;
    }
    const content = polyCoeffsS(num).reduce(polyGcd);
    const never = zeroSet(content);
    if (never) {
      problems.push({
        severity: "warning",
        code: "singular-at-values",
        ...where,
        message: `The loop through ${names} has no unique solution when ${never}: its return difference is then identically zero. Keep the parameters away from that value.`,
      });
    }
    if (polyAtInfinityRatio(num, ratDenominator(det)) !== "finite-nonzero" || !proper) continue;
    // Δ(∞) = lc(num)/lc(den) in lowest terms; zeros already reported with the content are left out.
    const den = ratDenominator(det);
    const lead = ratNumerator(ratReduceTracked(polyLeading(num), polyMul(content, polyLeading(den))).value);
    const improper = zeroSet(lead);
    if (improper) {
      problems.push({
        severity: "warning",
        code: "singular-at-values",
        ...where,
        message: `The loop through ${names} becomes improper when ${improper}: its return difference then vanishes as s → ∞. Keep the parameters away from that value.`,
      });
    }
  }
  return problems;
}
