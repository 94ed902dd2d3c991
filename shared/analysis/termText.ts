// How the terms of a closed-form time response are written: c·t^k·e^{−at}, with cos ωt or sin ωt.
import {
  shownAtomic, shownIsZero, shownLatex, shownNeg, shownText, shownValue, type Shown,
} from "@shared/analysis/shown";

export type TermKind = "exp" | "cos" | "sin";

const isOne = (x: Shown) => Math.abs(shownValue(x) - 1) === 0;

/** Coefficient, sign pulled out: { neg, body } where body is "" for a coefficient of magnitude 1. */
function coefficient(c: Shown, latex: boolean): { neg: boolean; body: string } {
  const neg = shownValue(c) < 0;
  const abs = neg ? shownNeg(c) : c;
  if (isOne(abs)) return { neg, body: "" };
  const t = latex ? shownLatex(abs) : shownText(abs);
  return { neg, body: shownAtomic(abs) ? t : latex ? `\\left(${t}\\right)` : `(${t})` };
}

/** Rate times t inside exp/cos/sin: "2*t", "sqrt(3)/2*t", "(1 + sqrt(2))*t", "t". */
function rateText(rate: Shown, latex: boolean): string {
  if (isOne(rate)) return "t";
  if (isOne(shownNeg(rate))) return "-t";
  const t = latex ? shownLatex(rate) : shownText(rate);
  const wrapped = shownAtomic(rate) ? t : latex ? `\\left(${t}\\right)` : `(${t})`;
  return latex ? `${wrapped} t` : `${wrapped}*t`;
}

/**
 * Plain text and LaTeX of c·t^k·e^{−decay·t}·[cos|sin](ω t), signed, factors of 1 left out.
 * Example: termText("cos", shownQ(2), 1, shownQ(1/2), shownQ(3)) → "2*t*exp(-1/2*t)*cos(3*t)".
 */
export function termText(kind: TermKind, c: Shown, k: number, decay: Shown, omega: Shown): { text: string; latex: string } {
  const render = (latex: boolean): string => {
    const { neg, body } = coefficient(c, latex);
    const factors: string[] = body ? [body] : [];
    if (k > 0) factors.push(k === 1 ? "t" : latex ? `t^{${k}}` : `t^${k}`);
    if (!shownIsZero(decay)) {
      const growth = shownNeg(decay);
      const r = rateText(growth, latex);
      factors.push(latex ? `e^{${r}}` : `exp(${r})`);
    }
    if (kind !== "exp") {
      const r = rateText(omega, latex);
      factors.push(latex ? `\\${kind}\\left(${r}\\right)` : `${kind}(${r})`);
    }
    const product = factors.length ? factors.join(latex ? " " : "*") : "1";
    return `${neg ? "-" : ""}${product}`;
  };
  return { text: render(false), latex: render(true) };
}

/** Plain text and LaTeX of c·δ^(k)(t). Example: impulseText(shownQ(2), 0) → "2*delta(t)". */
export function impulseText(c: Shown, k: number): { text: string; latex: string } {
  const render = (latex: boolean): string => {
    const { neg, body } = coefficient(c, latex);
    const d = latex ? (k === 0 ? "\\delta(t)" : `\\delta^{(${k})}(t)`) : `delta${"'".repeat(k)}(t)`;
    return `${neg ? "-" : ""}${body ? (latex ? `${body} ` : `${body}*`) : ""}${d}`;
  };
  return { text: render(false), latex: render(true) };
}

/** Terms joined with + and −. Example: joinTerms(["1", "-exp(-t)"]) === "1 - exp(-t)". */
export const joinTerms = (terms: string[]): string =>
  terms.length === 0 ? "0" : terms.map((t, i) => (i === 0 ? t : t.startsWith("-") ? ` - ${t.slice(1)}` : ` + ${t}`)).join("");
