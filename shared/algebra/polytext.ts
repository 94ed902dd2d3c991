// Own printing of exact polynomials: the canonical text is what results, tests and reviews compare.
import type { Poly } from "@shared/algebra/poly";
import { q, qMul, qNeg, qToString, type Q } from "@shared/algebra/rational";
import { zCoeffsS, type ZPoly } from "@shared/algebra/zpoly";

type Mono = [name: string, exp: number][];
interface Term {
  c: Q;
  mono: Mono; // parameter powers, alphabetical
}

/** Monomials of a polynomial in the parameters, in printing order. */
function paramTerms(z: ZPoly, k: Q): Term[] {
  const out: Term[] = [];
  const walk = (a: ZPoly, mono: Mono): void => {
    if (typeof a === "bigint") {
      if (a !== 0n) out.push({ c: qMul(k, q(a)), mono });
      return;
    }
    a.c.forEach((x, i) => walk(x, i === 0 ? mono : [...mono, [a.v, i]]));
  };
  walk(z, []);
  return out.sort(termOrder);
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
  num(c: Q): string; // positive rational
  power(base: string, e: number): string;
  name(n: string): string;
  times: string;
  group(inner: string): string;
}

const textStyle: Style = {
  num: qToString,
  power: (b, e) => (e === 1 ? b : `${b}^${e}`),
  name: (n) => n,
  times: "*",
  group: (inner) => `(${inner})`,
};

const latexStyle: Style = {
  num: (c) => (c.d === 1n ? c.n.toString() : `\\frac{${c.n}}{${c.d}}`),
  power: (b, e) => (e === 1 ? b : `${b}^{${e}}`),
  name: latexName,
  times: " ",
  group: (inner) => `\\left(${inner}\\right)`,
};

const GREEK = new Set(
  ("alpha beta gamma delta epsilon zeta eta theta iota kappa lambda mu nu xi pi rho sigma tau upsilon phi chi psi " +
    "omega Gamma Delta Theta Lambda Xi Pi Sigma Upsilon Phi Psi Omega").split(" "),
);

/** LaTeX for a parameter name: tau → \tau, k_p → k_{p}, Kp → \mathit{Kp}. */
function latexName(n: string): string {
  const cut = n.indexOf("_");
  const base = cut < 0 ? n : n.slice(0, cut);
  const sub = cut < 0 ? "" : `_{${n.slice(cut + 1).replace(/_/g, "\\_")}}`;
  const b = GREEK.has(base) ? `\\${base}` : base.length === 1 ? base : `\\mathit{${base}}`;
  return b + sub;
}

interface Signed {
  neg: boolean;
  body: string;
}

/** One monomial without its sign: |c| (omitted when 1 and there are factors) times its factors. */
function monoBody(c: Q, factors: string[], st: Style): string {
  const abs = c.n < 0n ? qNeg(c) : c;
  if (!factors.length) return st.num(abs);
  const f = factors.join(st.times);
  return abs.n === 1n && abs.d === 1n ? f : `${st.num(abs)}${st.times}${f}`;
}

function render(p: Poly, st: Style): string {
  if (p.q.n === 0n) return "0";
  const coeffs = zCoeffsS(p.z);
  const parts: Signed[] = [];
  for (let k = coeffs.length - 1; k >= 0; k--) {
    const terms = paramTerms(coeffs[k], p.q);
    if (!terms.length) continue;
    const sPart = k === 0 ? [] : [st.power("s", k)];
    const factorsOf = (t: Term): string[] => t.mono.map(([n, e]) => st.power(st.name(n), e));
    if (terms.length === 1 || k === 0) {
      for (const t of terms) parts.push({ neg: t.c.n < 0n, body: monoBody(t.c, [...factorsOf(t), ...sPart], st) });
      continue;
    }
    const flip = terms[0].c.n < 0n; // pull a leading minus out of the group: -(K - 3/2)*s
    const inner = joinSigned(
      terms.map((t) => ({ neg: (t.c.n < 0n) !== flip, body: monoBody(t.c, factorsOf(t), st) })),
    );
    parts.push({ neg: flip, body: [st.group(inner), ...sPart].join(st.times) });
  }
  return joinSigned(parts);
}

function joinSigned(parts: Signed[]): string {
  return parts.map((t, i) => (i === 0 ? (t.neg ? "-" : "") : t.neg ? " - " : " + ") + t.body).join("");
}

/**
 * Diagram expression syntax: expanded, descending powers of s, exact integer or p/q coefficients, explicit `*`.
 * A power of s whose coefficient has several parameter terms is written once with the coefficient in
 * parentheses; parameter terms run by total degree, then alphabetically. "0" for zero.
 * Example: "(2*K + 1)*s^2 + 3/2*s - K + 4", "s^2 - (K - 3/2)*s + 1".
 */
export const polyToText = (p: Poly): string => render(p, textStyle);

/** LaTeX with the same layout: \frac{p}{q} numbers, s^{2}, \tau, k_{p}. Example: "\frac{3}{2} K s^{2} + 1". */
export const polyToLatex = (p: Poly): string => render(p, latexStyle);
