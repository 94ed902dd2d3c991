// Number formatting for the analysis views: significant digits, a true minus sign (U+2212) so negative
// numbers line up and read well, ∞ for infinite limits, and the exact texts of shared/analysis made readable.
import type { RootInfo } from "@shared/analysis/poles";
import type { Verdict } from "@shared/analysis/stability";
import type { Quantity } from "@shared/analysis/steadyState";

const MINUS = "\u2212";

/** The verdict as the views print it. Example: verdictWord("marginal") === "Marginally stable". */
export const verdictWord = (v: Verdict): string => ({ stable: "Stable", marginal: "Marginally stable", unstable: "Unstable" })[v];

/** ASCII minus signs to U+2212. Example: withMinus("-1/2") === "−1/2". */
export const withMinus = (text: string): string => text.replace(/-/g, MINUS);

/**
 * A number to `digits` significant digits, trailing zeros dropped, exponent form outside 1e-4 … 1e6.
 * Example: formatNumber(-1.7320508) === "−1.732"; formatNumber(Infinity) === "∞"; formatNumber(2.5e-7) === "2.5e−7".
 */
export function formatNumber(x: number, digits = 4): string {
  if (Number.isNaN(x)) return "NaN";
  if (!Number.isFinite(x)) return x > 0 ? "∞" : `${MINUS}∞`;
  if (x === 0) return "0"; // also −0
  const abs = Math.abs(x);
  if (abs >= 1e6 || abs < 1e-4) {
    const [mantissa, exponent] = x.toExponential(Math.max(0, digits - 1)).split("e");
    return withMinus(`${trimZeros(mantissa)}e${Number(exponent)}`);
  }
  const text = trimZeros(x.toPrecision(digits));
  // toPrecision switches to exponent form itself when the integer part has more digits than asked for.
  return withMinus(text.includes("e") ? String(Number(text)) : text);
}

function trimZeros(text: string): string {
  return text.includes(".") ? text.replace(/0+$/, "").replace(/\.$/, "") : text;
}

export interface ComplexFormat {
  digits?: number;
  /** Print a conjugate pair as "a ± bj" instead of the one number "a + bj". */
  pair?: boolean;
}

/**
 * A complex number [re, im] as "a + bj"; a real one without the j part, a pure imaginary one without the real part.
 * Example: formatComplex([-1, 1.7320508], { pair: true }) === "−1 ± 1.732j"; formatComplex([-2, 0]) === "−2".
 */
export function formatComplex([re, im]: readonly [number, number], opts: ComplexFormat = {}): string {
  const digits = opts.digits ?? 4;
  const imText = formatNumber(Math.abs(im), digits);
  if (imText === "0") return formatNumber(re, digits);
  const reText = formatNumber(re, digits);
  const sign = opts.pair ? "±" : im < 0 ? MINUS : "+";
  if (reText === "0") return opts.pair ? `±${imText}j` : `${im < 0 ? MINUS : ""}${imText}j`;
  return `${reText} ${sign} ${imText}j`;
}

/**
 * Exact text from the analysis made readable: U+2212 minus, √ for sqrt(n), "·" for an inner product.
 * Example: formatExact("-1/2 + sqrt(3)/2*j") === "−1/2 + √3/2 j"; formatExact("2*sqrt(5)") === "2√5".
 */
export function formatExact(text: string): string {
  return withMinus(
    text
      .replace(/sqrt\((\d+)\)/g, "√$1")
      .replace(/\*j\b/g, " j")
      .replace(/(\d)\*√/g, "$1√")
      .replace(/\*/g, "·"),
  );
}

/**
 * A limit quantity: "∞" / "−∞" when infinite, "—" when it does not exist, else the exact value with its decimal
 * when the two differ. Example: { value: 0.3333, exact: "1/3" } → "1/3 ≈ 0.3333"; { value: "Infinity" } → "∞".
 */
export function formatQuantity(q: Pick<Quantity, "value" | "exact">, digits = 4): string {
  if (q.value === null) return "—";
  if (q.value === "Infinity") return "∞";
  if (q.value === "-Infinity") return `${MINUS}∞`;
  const decimal = formatNumber(q.value, digits);
  if (!q.exact) return decimal;
  const exact = formatExact(q.exact);
  return exact === decimal ? exact : `${exact} ≈ ${decimal}`;
}

export interface RootRow {
  /** "−1 ± 1.732j" for a conjugate pair, "−2" for a real root. */
  value: string;
  /** Exact form in the same shape ("−1/2 ± √3/2 j"), or null. */
  exact: string | null;
  root: RootInfo;
  /** 2 for a conjugate pair (one row), else 1. */
  count: number;
}

/**
 * One table row per real root and per conjugate pair (the member with im > 0 stands for both).
 * Example: roots of s² + 2s + 5 → one row "−1 ± 2j" with exact "−1 ± 2 j".
 */
export function rootRows(roots: readonly RootInfo[], digits = 4): RootRow[] {
  return roots
    .filter((r) => r.im >= 0)
    .map((root) => {
      const pair = root.im > 0;
      const exact = root.exact && pair ? pairExact(root.exact) : root.exact;
      return { value: formatComplex([root.re, root.im], { digits, pair }), exact: exact && formatExact(exact), root, count: pair ? 2 : 1 };
    });
}

/** "a + b*j" → "a ± b*j"; "b*j" → "±b*j". */
const pairExact = (text: string): string => {
  const at = text.lastIndexOf(" + ");
  return at < 0 ? `±${text}` : `${text.slice(0, at)} ± ${text.slice(at + 3)}`;
};

/**
 * Sign of a Routh first-column entry as ε → 0+, read from its text: a rational, or a ratio "(N)/(D)" of
 * polynomials in ε, whose sign is that of the lowest-order terms. null for anything else (a parameter).
 * Example: firstColumnSign("(4*ε - 12)/(ε)") === −1; firstColumnSign("338/3") === 1.
 */
export function firstColumnSign(text: string): number | null {
  const ratio = /^\((.*)\)\/\((.*)\)$/.exec(text.trim());
  const parts = ratio ? [ratio[1], ratio[2]] : [text];
  const signs = parts.map(lowestTermSign);
  return signs.some((s) => s === null) ? null : (signs as number[]).reduce((a, b) => a * b, 1);
}

const TERM = /^(-?)(\d+(?:\/\d+)?)?\*?(ε(?:\^(\d+))?)?$/;

/** Sign of the lowest power of ε in a polynomial text such as "-5/2*ε^2 + 6*ε - 18". */
function lowestTermSign(poly: string): number | null {
  let best: { power: number; sign: number } | null = null;
  for (const raw of poly.trim().replace(/ - /g, " + -").split(" + ")) {
    const m = TERM.exec(raw.trim());
    if (!m || (!m[2] && !m[3])) return null;
    if (m[2] && /^0+(\/|$)/.test(m[2])) continue;
    const power = m[3] ? Number(m[4] ?? 1) : 0;
    if (!best || power < best.power) best = { power, sign: m[1] ? -1 : 1 };
  }
  return best?.sign ?? 0;
}
