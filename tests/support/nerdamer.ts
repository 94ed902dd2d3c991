// nerdamer 1.1.13, an in-process computer-algebra system, as a second reference beside Debian's sympy.
// Everything goes through its parser as text; results are compared by meaning, never by string
// (it prints the constant term first and turns decimals into fractions).
import nerdamer from "nerdamer";
import "nerdamer/Algebra.js"; // registers gcd, div, deg, partfrac with the parser
import type { ExprNode } from "@shared/expr/ast";
import { printForCas, type CasSyntax } from "./exprText";

/** A quotient of two polynomials as nerdamer text. */
export interface Fraction {
  num: string;
  den: string;
}

/** The internal symbol behind an Expression (undocumented, so not in the package's typings). */
interface CoreSymbol {
  group: number;
  power: { toString(): string };
  multiplier: { toString(): string };
  symbols?: Record<string, CoreSymbol>;
  text(): string;
}
// A vector result such as div's [quotient, remainder] holds an array of symbols instead.
const coreOf = <T = CoreSymbol>(e: nerdamer.Expression): T => (e as unknown as { symbol: T }).symbol;
// nerdamer's symbol groups for sums: PL (powers of one variable) and CP (anything else).
const SUM_GROUPS = new Set([6, 8]);

const run = (text: string): nerdamer.Expression => nerdamer(text);

/** Expanded form. Example: nExpand("(s+1)*(s-1)") is "-1+s^2". */
export const nExpand = (text: string): string => run(`expand(${text})`).toString();

/** Polynomials equal by meaning: their difference expands to 0. Example: nEqual("s^2-1", "(s+1)*(s-1)"). */
export const nEqual = (a: string, b: string): boolean => nExpand(`(${a})-(${b})`) === "0";

/** Quotients equal by meaning, cross-multiplied. Example: nEqualFraction({ num: "2", den: "2*s" }, { num: "1", den: "s" }). */
export const nEqualFraction = (a: Fraction, b: Fraction): boolean =>
  nEqual(`(${a.num})*(${b.den})`, `(${b.num})*(${a.den})`);

/** Degree in s. Example: nDegree("s^2+K") === 2. */
export const nDegree = (p: string): number => Number(run(`deg(${p}, s)`).toString());

/**
 * The exact quotient a/b in s, or undefined when b does not divide a. nerdamer's div answers [0, a] when a is a
 * single term (div(s^2, s)), so such a quotient is read from its parser, which cancels powers itself.
 * Example: nQuotient("s^2-1", "s+1") is "-1+s"; nQuotient("s^2", "s") is "s"; nQuotient("s", "s+1") is undefined.
 */
export function nQuotient(a: string, b: string): string | undefined {
  const [quo, rem] = coreOf<CoreSymbol[]>(run(`div(${a}, ${b})`)).map((e) => e.text());
  if (rem === "0") return quo;
  const direct = run(`(${a})/(${b})`);
  return direct.denominator().toString() === "1" && nEqual(`(${direct})*(${b})`, a) ? direct.toString() : undefined;
}

/** True when a is a non-zero constant multiple of b. Example: nAssociates("2*s+2", "s+1"). */
export function nAssociates(a: string, b: string): boolean {
  const quo = nQuotient(a, b);
  return quo !== undefined && quo !== "0" && run(quo).isNumber();
}

/**
 * gcd over Q[s]. nerdamer leaves gcd(0, p) and gcd(c, p) for a constant c unevaluated, so those are answered here.
 * Example: nGcd("s^2-1", "s^2+s") is "1+s".
 */
export function nGcd(a: string, b: string): string {
  const [zeroA, zeroB] = [a, b].map((p) => nExpand(p) === "0");
  if (zeroA || zeroB) return zeroA ? b : a;
  if (nDegree(a) === 0 || nDegree(b) === 0) return "1";
  return run(`gcd(${a}, ${b})`).toString();
}

/**
 * Lowest terms from nerdamer's gcd and division (not its simplify, which returns wrong values on some inputs).
 * Example: nCancel("s^2-1", "s^2+s") is { num: "-1+s", den: "s" }.
 */
export function nCancel(num: string, den: string): Fraction {
  const g = nGcd(num, den);
  const part = (p: string) => {
    const quo = nQuotient(p, g);
    if (quo === undefined) throw new Error(`nerdamer: its gcd ${g} does not divide ${p}`);
    return quo;
  };
  return { num: part(num), den: part(den) };
}

/** The terms of a sum, nested sums (partfrac groups the powers of one factor) flattened; itself otherwise. */
function termTexts(sym: CoreSymbol): string[] {
  const isSum = SUM_GROUPS.has(sym.group) && sym.power.toString() === "1" && sym.symbols;
  if (!isSum) return [sym.text()];
  return Object.values(sym.symbols!).flatMap((t) => termTexts(t).map((x) => `(${sym.multiplier})*(${x})`));
}

const fractionOf = (text: string): Fraction => {
  const e = run(text);
  return { num: e.numerator().toString(), den: e.denominator().toString() };
};

/**
 * partfrac(num/den, s), its terms over proportional denominators summed, so a quadratic factor gives one
 * (a*s + b)/q term as a decomposition is usually written. Example: nPartialFractions("1", "(s+1)*(s+2)") is
 * [1/(1+s), -1/(2+s)] (as fractions).
 */
export function nPartialFractions(num: string, den: string): Fraction[] {
  const groups: Fraction[] = [];
  for (const t of termTexts(coreOf(run(`partfrac((${num})/(${den}), s)`))).map(fractionOf)) {
    const at = groups.findIndex((g) => nAssociates(g.den, t.den));
    if (at < 0) groups.push(t);
    else groups[at] = { num: `(${groups[at].num})*(${t.den})+(${t.num})*(${groups[at].den})`, den: `(${groups[at].den})*(${t.den})` };
  }
  return groups;
}

const NERDAMER: CasSyntax = { number: (n, d) => `(${n}/${d})`, spacing: "", power: "^" };

/** Fully parenthesised nerdamer text of an expression tree. Example: (s + 1/2)^2 is "((s+(1/2)))^2". */
export const exprNerdamer = (e: ExprNode): string => printForCas(e, NERDAMER);
