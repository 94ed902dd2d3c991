import { ratDegrees, ratToTextAndLatex, type RatFn } from "@shared/algebra/ratfn";

/** How a step shows an exact gain: expression syntax and LaTeX. Example: showRat(1/(s+1)).expr === "1/(s + 1)". */
export function showRat(g: RatFn): { expr: string; latex: string } {
  const { text, latex } = ratToTextAndLatex(g);
  return { expr: text, latex };
}

/** Size of an exact gain for ordering ties: degree of numerator plus denominator in s. Example: weighRat(1/(s+1)) === 1. */
export function weighRat(g: RatFn): number {
  const { num, den } = ratDegrees(g);
  return num + den;
}
