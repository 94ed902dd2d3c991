// Impulse, step and ramp responses in closed form by partial fractions: exact for rational and
// quadratic-surd poles, 12 significant digits for the others, impulse terms of an improper T reported.
import { q, qAdd, qDiv, qMul, qNeg, qSub, type Q } from "@shared/algebra/rational";
import { exactFactors, type Factor } from "@shared/analysis/factors";
import { factorRoots } from "@shared/analysis/poles";
import { poleCoefficients } from "@shared/analysis/residues";
import { shownQ, shownValue, type Shown } from "@shared/analysis/shown";
import { complexField, sqrtRational, surdField, type NumberField, type Surd } from "@shared/analysis/surd";
import { impulseText, joinTerms, termText, type TermKind } from "@shared/analysis/termText";
import {
  upDeg, upDivMod, upFrom, upInts, upMul, upZeroOrder, type UPoly,
} from "@shared/analysis/upoly";

export type InputKind = "impulse" | "step" | "ramp";

/** One term c·t^power·e^{−decay·t}·(1 | cos ωt | sin ωt). */
export interface ResponseTerm {
  kind: TermKind;
  coefficient: number;
  power: number;
  decay: number;
  frequency: number;
  text: string;
  latex: string;
}

/** c·δ^(order)(t): what an improper transfer function puts into the response at t = 0. */
export interface ImpulseTerm {
  order: number;
  coefficient: number;
  text: string;
  latex: string;
}

export interface TimeResponse {
  input: InputKind;
  /** True when every term is exact (rational or quadratic-surd poles); else numbers have 12 significant digits. */
  exact: boolean;
  impulses: ImpulseTerm[];
  terms: ResponseTerm[];
  formula: string;
  latex: string;
}

const INPUT_ORDER: Record<InputKind, number> = { impulse: 0, step: 1, ramp: 2 };
const factorial = (k: number): Q => q(Array.from({ length: k }, (_, i) => BigInt(i + 1)).reduce((a, b) => a * b, 1n));

/**
 * y(t) for the input (unit impulse, unit step, unit ramp) through T = num/den (lowest terms, den ≠ 0).
 * `denFactors` may pass exactFactors(den) when already known. Example: timeResponse(1, s + 1, "step") is
 * "1 - exp(-t)".
 */
export function timeResponse(num: UPoly, den: UPoly, input: InputKind, denFactors?: Factor[]): TimeResponse {
  const z = Math.min(INPUT_ORDER[input], upZeroOrder(num));
  const extra = INPUT_ORDER[input] - z;
  const n = upFrom(num.slice(z));
  const dTot = upMul(den, upFrom([...new Array(extra).fill(q(0)), q(1)]));
  const factors = withOrigin(denFactors ?? exactFactors(den), extra);
  const { quo, rem } = upDivMod(n, dTot);
  const impulses = quo.flatMap((c, order) => (c.n === 0n ? [] : [{ order, coefficient: shownValue(shownQ(c)), ...impulseText(shownQ(c), order) }]));
  const terms: ResponseTerm[] = [];
  let exact = true;
  for (const f of factors) {
    let cofactor = dTot;
    for (let i = 0; i < f.multiplicity; i++) cofactor = upDivMod(cofactor, f.poly).quo;
    if (upDeg(f.poly) <= 2) terms.push(...exactTerms(rem, cofactor, f));
    else {
      exact = false;
      terms.push(...numericTerms(rem, cofactor, f));
    }
  }
  // Slowest modes first (growing ones before them), then by frequency, power and cos before sin.
  terms.sort((x, y) => x.decay - y.decay || x.frequency - y.frequency || x.power - y.power || (x.kind < y.kind ? -1 : x.kind > y.kind ? 1 : 0));
  const all = [...impulses.map((i) => ({ text: i.text, latex: i.latex })), ...terms];
  return {
    input,
    exact,
    impulses,
    terms,
    formula: joinTerms(all.map((t) => t.text)),
    latex: joinTerms(all.map((t) => t.latex)),
  };
}

/** Adds s^extra to the factor list (merging with a pole at the origin). */
function withOrigin(factors: Factor[], extra: number): Factor[] {
  if (extra === 0) return factors;
  const s = upInts([0, 1]);
  const at = factors.findIndex((f) => upDeg(f.poly) === 1 && f.poly[0].n === 0n);
  if (at < 0) return [{ poly: s, multiplicity: extra }, ...factors];
  return factors.map((f, i) => (i === at ? { poly: s, multiplicity: f.multiplicity + extra } : f));
}

function term(kind: TermKind, c: Shown, power: number, decay: Shown, omega: Shown): ResponseTerm {
  const [cv, dv, wv] = [shownValue(c), shownValue(decay), shownValue(omega)];
  return { kind, coefficient: cv, power, decay: dv, frequency: wv, ...termText(kind, c, power, decay, omega) };
}

/** Exact terms of a linear or quadratic factor, in Q or Q(√d). */
function exactTerms(rem: UPoly, cofactor: UPoly, f: Factor): ResponseTerm[] {
  const m = f.multiplicity;
  const zero = shownQ(q(0));
  const emit = (coeffs: Surd[], each: (a: Surd, j: number) => ResponseTerm[]) =>
    coeffs.flatMap((a, j) => each(a, j + 1)).filter((t) => t.coefficient !== 0);
  if (upDeg(f.poly) === 1 || hasRationalRoots(f.poly)) {
    const roots = rationalRoots(f.poly);
    const F = surdField(-1n);
    return roots.flatMap((r, i) =>
      emit(poleCoefficients(F, rem, cofactor, F.fromQ(r), roots.map(F.fromQ), i, m), (a, j) => [
        term("exp", shownQ(qDiv(a.a, factorial(j - 1))), j - 1, shownQ(qNeg(r)), zero),
      ]),
    );
  }
  const c1 = f.poly[1];
  const disc = discriminantOf(f.poly);
  const { coef, rad } = sqrtRational(disc.n < 0n ? qNeg(disc) : disc);
  const d = disc.n < 0n ? -rad : rad;
  const F = surdField(d);
  const half = qMul(coef, q(1, 2));
  const alpha = qMul(c1, q(-1, 2));
  const rho: Surd = { a: alpha, b: half };
  const conj: Surd = { a: alpha, b: qNeg(half) };
  const coeffs = poleCoefficients(F, rem, cofactor, rho, [rho, conj], 0, m);
  if (d < 0n) {
    const sigma = shownQ(qNeg(alpha));
    const omega: Shown = { a: q(0), b: half, rad };
    return emit(coeffs, (a, j) => {
      const k = factorial(j - 1);
      return [
        term("cos", shownQ(qDiv(qMul(q(2), a.a), k)), j - 1, sigma, omega),
        term("sin", { a: q(0), b: qDiv(qMul(q(-2), a.b), k), rad }, j - 1, sigma, omega),
      ];
    });
  }
  return emit(coeffs, (a, j) => {
    const k = factorial(j - 1);
    const at = (sign: bigint): ResponseTerm =>
      term("exp", { a: qDiv(a.a, k), b: qDiv(qMul(q(sign), a.b), k), rad }, j - 1, { a: qNeg(alpha), b: qMul(q(-sign), half), rad }, zero);
    return [at(1n), at(-1n)];
  });
}

/** b² − 4c of a monic quadratic s² + bs + c. */
const discriminantOf = (f: UPoly): Q => qSub(qMul(f[1], f[1]), qMul(q(4), f[0]));

/** A quadratic whose discriminant is a rational square (the factor splitter normally splits those). */
const hasRationalRoots = (f: UPoly): boolean => {
  const disc = discriminantOf(f);
  return disc.n >= 0n && sqrtRational(disc).rad === 1n;
};

/** Rational roots of a monic linear or rational-root quadratic factor. */
function rationalRoots(f: UPoly): Q[] {
  if (upDeg(f) === 1) return [qNeg(f[0])];
  const { coef } = sqrtRational(discriminantOf(f));
  return [qSub(qNeg(f[1]), coef), qAdd(qNeg(f[1]), coef)].map((x) => qMul(x, q(1, 2)));
}

/** Terms of a factor of degree ≥ 3, from its numeric roots (conjugate pairs merged into cos/sin). */
function numericTerms(rem: UPoly, cofactor: UPoly, f: Factor): ResponseTerm[] {
  const F: NumberField<[number, number]> = complexField;
  const roots = factorRoots(f.poly);
  const out: ResponseTerm[] = [];
  roots.forEach((r, i) => {
    if (r[1] < 0) return;
    const coeffs = poleCoefficients(F, rem, cofactor, r, roots, i, f.multiplicity);
    coeffs.forEach(([re, im], idx) => {
      const k = Number(factorial(idx).n);
      if (r[1] === 0) out.push(term("exp", re / k, idx, -r[0], 0));
      else out.push(term("cos", (2 * re) / k, idx, -r[0], r[1]), term("sin", (-2 * im) / k, idx, -r[0], r[1]));
    });
  });
  return out.filter((t) => t.coefficient !== 0);
}

/** y(t) for t > 0 (impulse terms act at t = 0 only). Example: responseAt(step of 1/(s + 1), 1) ≈ 0.632. */
export function responseAt(r: TimeResponse, t: number): number {
  let y = 0;
  for (const x of r.terms) {
    const base = x.coefficient * (x.power === 0 ? 1 : t ** x.power) * Math.exp(-x.decay * t);
    y += x.kind === "exp" ? base : base * (x.kind === "cos" ? Math.cos(x.frequency * t) : Math.sin(x.frequency * t));
  }
  return y;
}

/** dy/dt for t > 0, term by term. Example: responseSlopeAt(step of 1/(s + 1), 0) === 1. */
export function responseSlopeAt(r: TimeResponse, t: number): number {
  let dy = 0;
  for (const x of r.terms) {
    const e = x.coefficient * Math.exp(-x.decay * t);
    const tk = t ** x.power;
    const dtk = x.power === 0 ? 0 : x.power * t ** (x.power - 1);
    const radial = e * (dtk - x.decay * tk);
    if (x.kind === "exp") dy += radial;
    else {
      const [c, s] = [Math.cos(x.frequency * t), Math.sin(x.frequency * t)];
      dy += x.kind === "cos" ? radial * c - e * tk * x.frequency * s : radial * s + e * tk * x.frequency * c;
    }
  }
  return dy;
}
