import katex from "katex";
import { describe, expect, it } from "vitest";
import { parseExpression } from "@shared/expr/parse";
import { expressionLatex, exprLatex, nameLatex } from "@/features/editor/lib/exprLatex";

const latexOf = (text: string, parameters: string[] = ["K", "tau", "K_p", "Kp", "a"]) => {
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
    ["Kp*s", "\\mathit{Kp}\\,s"],
  ])("%s → %s", (text, latex) => {
    expect(latexOf(text)).toBe(latex);
  });

  it("every output is LaTeX KaTeX accepts (KaTeX as the reference parser)", () => {
    for (const text of ["K*(s+2)/s", "1/(tau*s^2+s)", "(s+1)^2*(s-3)/(2*s^3)", "-K/(-(s+1))", "0.25*s/(1e-3*s+1)"]) {
      expect(() => katex.renderToString(latexOf(text), { throwOnError: true })).not.toThrow();
    }
  });

  it("draws undeclared names instead of hiding them, and gives null for text that does not parse", () => {
    expect(expressionLatex("Kd*s/(T*s+1)")).toBe("\\frac{\\mathit{Kd}\\,s}{T\\,s + 1}");
    expect(expressionLatex("K/(s+")).toBeNull();
    expect(nameLatex("omega_n")).toBe("\\omega_{n}");
  });
});
