import { ratDegrees, ratToLatex, ratToText, type RatFn } from "@shared/algebra/ratfn";

/** How a step shows an exact gain: expression syntax and LaTeX. Example: showRat(1/(s+1)).expr === "1/(s + 1)". */
export const showRat = (g: RatFn) => ({ expr: ratToText(g), latex: ratToLatex(g) });

/** Size of an exact gain for ordering ties: degree of numerator plus denominator in s. Example: weighRat(1/(s+1)) === 1. */
export const weighRat = (g: RatFn): number => ratDegrees(g).num + ratDegrees(g).den;
