import katex from "katex";
import { describe, expect, it } from "vitest";
import { parseExpression } from "@shared/expr/parse";
import { runPythonSync } from "../../support/python";
import { expressionFraction, expressionLatex, exprLatex, exprText } from "@shared/expr/exprLatex";
import { nameLatex } from "@shared/expr/names";

const latexOf = (text: string, parameters: string[] = ["K", "tau", "K_p", "T_i", "Kp", "Kpos", "Kv", "a"]) => {
  const parsed = parseExpression(text, { allowS: true, parameters });
  if (!parsed.ok) throw new Error(parsed.message);
  return exprLatex(parsed.ast);
};

describe("block expressions as LaTeX", () => {
  // common practice: how transfer functions are typeset in control texts — fractions, parenthesised factors.
  it.each([
    ["K*(s+2)/s", "\\frac{K\\,\\left(s + 2\\right)}{s}"],
    ["K/(s*(s+2))", "\\frac{K}{s\\,\\left(s + 2\\right)}"],
    ["1/(tau*s^2 + s)", "\\frac{1}{\\tau\\,s^{2} + s}"],
    ["(s+1)^2", "\\left(s + 1\\right)^{2}"],
    ["2*3", "2 \\cdot 3"],
    ["0.5", "\\frac{1}{2}"],
    ["-(s-a)", "-\\left(s - a\\right)"],
    ["s-(s-a)", "s - \\left(s - a\\right)"],
    ["K_p*s", "K_{p}\\,s"],
    ["Kp*s", "\\mathit{Kp} \\cdot s"],
    ["K_p*T_i*s", "K_{p}\\,T_{i}\\,s"],
    ["2*Kpos*Kv", "2 \\cdot \\mathit{Kpos} \\cdot \\mathit{Kv}"],
  ])("%s → %s", (text, latex) => {
    expect(latexOf(text)).toBe(latex);
  });

  it("every output is LaTeX KaTeX accepts (KaTeX as the reference parser)", () => {
    for (const text of ["K*(s+2)/s", "1/(tau*s^2+s)", "(s+1)^2*(s-3)/(2*s^3)", "-K/(-(s+1))", "0.25*s/(1e-3*s+1)"]) {
      expect(() => katex.renderToString(latexOf(text), { throwOnError: true })).not.toThrow();
    }
  });

  it("draws undeclared names instead of hiding them, and gives null for text that does not parse", () => {
    expect(expressionLatex("Kd*s/(T*s+1)")).toBe("\\frac{\\mathit{Kd} \\cdot s}{T\\,s + 1}");
    expect(expressionLatex("K/(s+")).toBeNull();
    expect(nameLatex("omega_n")).toBe("\\omega_{n}");
  });
});

const PARAMETERS = ["K", "tau", "K_p", "a", "omega_n"];
const textOf = (text: string) => {
  const parsed = parseExpression(text, { allowS: true, parameters: PARAMETERS });
  if (!parsed.ok) throw new Error(parsed.message);
  return exprText(parsed.ast);
};

/**
 * Whether sympy (Debian's /usr/bin/python3) reads each plain-text drawing as the expression it came from:
 * `·` and juxtaposition as products, `−` as minus, Greek letters as their names.
 */
function sympyReadsSame(pairs: [string, string][]): boolean[] {
  const script = `
import json, sys
from sympy import simplify, Symbol
from sympy.parsing.sympy_parser import parse_expr, standard_transformations, convert_xor, rationalize, implicit_multiplication_application
names = {n: Symbol(n) for n in ["K", "tau", "K_p", "a", "omega_n", "s"]}
plain = standard_transformations + (convert_xor, rationalize)
loose = plain + (implicit_multiplication_application,)
greek = {"τ": " tau ", "ω": " omega "}
out = []
for source, drawn in json.load(sys.stdin):
    for letter, name in greek.items():
        drawn = drawn.replace(letter, name)
    drawn = drawn.replace("omega _n", "omega_n").replace("·", "*").replace("−", "-")
    out.append(bool(simplify(parse_expr(source, local_dict=names, transformations=plain) - parse_expr(drawn, local_dict=names, transformations=loose)) == 0))
print(json.dumps(out))
`;
  return runPythonSync<boolean[]>({ code: script }, pairs);
}

describe("block expressions as plain text (the far-zoom drawing)", () => {
  // common practice: how transfer functions are written in plain text — a slash, parenthesised sums and products.
  it.each([
    ["K*(s+2)/s", "K(s + 2)/s"],
    ["K/(s*(s+2))", "K/(s(s + 2))"],
    ["1/(tau*s^2 + s)", "1/(τs^2 + s)"],
    ["2*3", "2·3"],
    ["0.5*s", "(1/2)s"],
    ["s-(s-a)", "s − (s − a)"],
    ["-(s+1)^2", "−(s + 1)^2"],
    ["omega_n^2/(s^2+2*omega_n*s)", "ω_n^2/(s^2 + 2·ω_n·s)"],
    ["s^2*s", "s^2·s"],
  ])("%s → %s", (text, plain) => {
    expect(textOf(text)).toBe(plain);
  });

  it("reads back as the same expression (sympy as the reference reader)", () => {
    const sources = ["K*(s+2)/s", "K/(s*(s+2))", "1/(tau*s^2 + s)", "(s+1)^2*(s-3)/(2*s^3)", "-K/(-(s+1))", "0.25*s/(1e-3*s+1)", "K_p*(1 + 1/(tau*s))", "a/s/(s+a)", "2*3*s", "omega_n^2/(s^2+2*omega_n*s)", "s^2*s*K_p*a"];
    const pairs = sources.map((text): [string, string] => [text, textOf(text)]);
    expect(sympyReadsSame(pairs)).toEqual(sources.map(() => true));
  });

  it("splits a top-level fraction into numerator and denominator, and gives null for text that does not parse", () => {
    expect(expressionFraction("K/(s+2)")).toEqual({ num: "K", den: "s + 2" });
    expect(expressionFraction("Kd*s/(T*s+1)")).toEqual({ num: "Kd·s", den: "Ts + 1" });
    expect(expressionFraction("3*(s+1)")).toEqual({ num: "3(s + 1)", den: null });
    expect(expressionFraction("K/(s+")).toBeNull();
  });
});
