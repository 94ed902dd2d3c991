// Own printing of exact polynomials: the canonical text is what results, tests and reviews compare.
import type { Poly } from "@shared/algebra/poly";
import { qMul, type Q } from "@shared/algebra/rational";
import { zCoeffsS, type ZPoly } from "@shared/algebra/zpoly";
import { nameLatex, nameText, readsAsWord } from "@shared/expr/names";

type Mono = [name: string, exp: number][];
/** A monomial with its coefficient's digits converted once for both styles (BigInt printing is costly). */
interface Term {
  neg: boolean;
  num: string; // |numerator|
  den: string; // "" when the denominator is 1
  unit: boolean; // |coefficient| = 1
  mono: Mono; // parameter powers, alphabetical
}
/** One power of s with its non-zero parameter terms, in printing order. */
interface Row {
  k: number;
  terms: Term[];
}

const NO_FACTORS: Mono = [];

/**
 * The term list both printings share, highest power of s first. Built once per polynomial: the coefficient
 * products (and their gcds) are the costly part of printing. Module-level helpers, not closures, on this hot path.
 */
function rowsOf(p: Poly): Row[] {
  if (p.q.n === 0n) return [];
  const coeffs = zCoeffsS(p.z);
  const rows: Row[] = [];
  for (let k = coeffs.length - 1; k >= 0; k--) {
    const terms: Term[] = [];
    collectTerms(coeffs[k], p.q, NO_FACTORS, terms);
    if (terms.length > 1) terms.sort(termOrder);
    if (terms.length) rows.push({ k, terms });
  }
  return rows;
}

/** Monomials of a polynomial in the parameters, times k, appended to out. */
function collectTerms(a: ZPoly, k: Q, mono: Mono, out: Term[]): void {
  if (typeof a === "bigint") {
    if (a !== 0n) out.push(termOf(qMul(k, { n: a, d: 1n }), mono));
    return;
  }
  for (let i = 0; i < a.c.length; i++) collectTerms(a.c[i], k, i === 0 ? mono : [...mono, [a.v, i]], out);
}

function termOf(c: Q, mono: Mono): Term {
  const neg = c.n < 0n;
  const abs = neg ? -c.n : c.n;
  return { neg, num: abs.toString(), den: c.d === 1n ? "" : c.d.toString(), unit: abs === 1n && c.d === 1n, mono };
}

const totalDegree = (m: Mono): number => m.reduce((t, [, e]) => t + e, 0);

/** Higher total degree first, then lexicographic in the alphabetical parameter order. */
function termOrder(a: Term, b: Term): number {
  const d = totalDegree(b.mono) - totalDegree(a.mono);
  if (d !== 0) return d;
  for (let i = 0; i < Math.min(a.mono.length, b.mono.length); i++) {
    const [na, ea] = a.mono[i];
    const [nb, eb] = b.mono[i];
    if (na !== nb) return na < nb ? -1 : 1;
    if (ea !== eb) return eb - ea;
  }
  return b.mono.length - a.mono.length;
}

interface Style {
  num(n: string, d: string): string; // positive rational from its digits, d "" for an integer
  power(base: string, e: number): string;
  name(n: string): string;
  /** The product sign between two factors, given by their names ("s" for the power of s). */
  times(left: string, right: string): string;
  /** The product sign after a number or a parenthesised group. */
  scale: string;
  group(inner: string): string;
}

const textStyle: Style = {
  num: (n, d) => (d ? `${n}/${d}` : n),
  power: (b, e) => (e === 1 ? b : `${b}^${e}`),
  name: nameText,
  times: () => "*",
  scale: "*",
  group: (inner) => `(${inner})`,
};

const latexStyle: Style = {
  num: (n, d) => (d ? `\\frac{${n}}{${d}}` : n),
  power: (b, e) => (e === 1 ? b : `${b}^{${e}}`),
  name: nameLatex,
  // Juxtaposed names run together when typeset (2 Kp s reads "2Kps"): a centred dot next to a word-like name, a
  // thin space between single letters.
  times: (l, r) => (readsAsWord(l) || readsAsWord(r) ? " \\cdot " : "\\,"),
  scale: "\\,",
  group: (inner) => `\\left(${inner}\\right)`,
};

/** The parameter factors of a term, then the power of s (may be ""), joined by the style's product sign. */
function factorText(mono: Mono, sPart: string, st: Style): string {
  let f = "";
  for (let i = 0; i < mono.length; i++) f += (i ? st.times(mono[i - 1][0], mono[i][0]) : "") + st.power(st.name(mono[i][0]), mono[i][1]);
  return sPart ? (f ? f + st.times(mono[mono.length - 1][0], "s") + sPart : sPart) : f;
}

/** One monomial without its sign: |c| (omitted when 1 and there are factors) times its factors. */
function monoBody(t: Term, factors: string, st: Style): string {
  if (!factors) return st.num(t.num, t.den);
  return t.unit ? factors : `${st.num(t.num, t.den)}${st.scale}${factors}`;
}

/** The sign joining a part: a bare leading "-" first, " - " / " + " after. */
const joiner = (neg: boolean, first: boolean): string => (first ? (neg ? "-" : "") : neg ? " - " : " + ");

function render(rows: readonly Row[], st: Style): string {
  if (!rows.length) return "0";
  let out = "";
  for (const { k, terms } of rows) {
    const sPart = k === 0 ? "" : st.power("s", k);
    if (terms.length === 1 || k === 0) {
      for (const t of terms) out += joiner(t.neg, !out) + monoBody(t, factorText(t.mono, sPart, st), st);
      continue;
    }
    const flip = terms[0].neg; // pull a leading minus out of the group: -(K - 3/2)*s
    let inner = "";
    for (const t of terms) inner += joiner(t.neg !== flip, !inner) + monoBody(t, factorText(t.mono, "", st), st);
    out += joiner(flip, !out) + st.group(inner) + st.scale + sPart;
  }
  return out;
}

/**
 * Diagram expression syntax: expanded, descending powers of s, exact integer or p/q coefficients, explicit `*`.
 * A power of s whose coefficient has several parameter terms is written once with the coefficient in
 * parentheses; parameter terms run by total degree, then alphabetically. "0" for zero.
 * Example: "(2*K + 1)*s^2 + 3/2*s - K + 4", "s^2 - (K - 3/2)*s + 1".
 */
export const polyToText = (p: Poly): string => render(rowsOf(p), textStyle);

/**
 * LaTeX with the same layout: \frac{p}{q} numbers, s^{2}, \tau, k_{p}; a thin space after a number and between
 * single letters, a centred dot beside a word-like name. Example: "\frac{3}{2}\,K\,s^{2} + 2\,\mathit{Kp} \cdot s + 1".
 */
export const polyToLatex = (p: Poly): string => render(rowsOf(p), latexStyle);

/** Both printings from one term list (half the work of calling the two). Example: polyToTextAndLatex(s^2).latex === "s^{2}". */
export function polyToTextAndLatex(p: Poly): { text: string; latex: string } {
  const rows = rowsOf(p);
  return { text: render(rows, textStyle), latex: render(rows, latexStyle) };
}
