import type { TransferResult } from "@shared/reduce/result";

/** A numerator needs parentheses only around a sum: `2*K/(…)` already reads as (2*K)/(…). */
const isSum = (poly: string) => /[+-]/.test(poly.trim().replace(/^-/, ""));
/** A denominator needs them around anything but a single power: `K/2*s` would read as (K/2)*s. */
const isCompound = (poly: string) => /[+\-*/]/.test(poly.trim().replace(/^-/, ""));

/** One fraction in the diagram expression syntax. Example: numerator "K", denominator "s^2 + 2*s + K" → "K/(s^2 + 2*s + K)". */
export function transferText(t: Pick<TransferResult, "numerator" | "denominator">): string {
  if (t.denominator.trim() === "1") return t.numerator;
  const num = isSum(t.numerator) ? `(${t.numerator})` : t.numerator;
  const den = isCompound(t.denominator) ? `(${t.denominator})` : t.denominator;
  return `${num}/${den}`;
}

/** The name of a pair's closed-loop transfer function in plain text and LaTeX. */
const pairName = (t: Pick<TransferResult, "input" | "output">) => `T_${t.output}_${t.input}(s)`;
const pairLatex = (t: Pick<TransferResult, "input" | "output">) =>
  `T_{\\mathrm{${t.output.replaceAll("_", "\\_")}},\\mathrm{${t.input.replaceAll("_", "\\_")}}}(s)`;

/** What "Copy as text" puts on the clipboard. */
export const resultPlainText = (t: TransferResult, characteristic: string) =>
  `${pairName(t)} = ${transferText(t)}\nCharacteristic polynomial: ${characteristic}`;

/** What "Copy as LaTeX" puts on the clipboard: an align block a report can paste. */
export const resultLatex = (t: TransferResult, characteristicLatex: string) =>
  `\\begin{aligned}\n${pairLatex(t)} &= ${t.latex} \\\\\n\\Delta(s) &= ${characteristicLatex}\n\\end{aligned}`;
