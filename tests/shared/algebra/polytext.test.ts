import { describe, expect, it } from "vitest";
import { polyAdd, polyConst, polyFromCoeffs, polyMul, polyParam, polyS, polyScale, polyZero, type Poly } from "@shared/algebra/poly";
import { polyToLatex, polyToText } from "@shared/algebra/polytext";
import { q } from "@shared/algebra/rational";

const s = polyS();
const K = polyParam("K");
const tau = polyParam("tau");
const kp = polyParam("k_p");
const c = (n: number, d = 1) => polyConst(q(n, d));
const sum = (...ps: Poly[]) => ps.reduce(polyAdd, polyZero);
const prod = (...ps: Poly[]) => ps.reduce(polyMul, c(1));
const P = (...desc: number[]) => polyFromCoeffs(desc.map((x) => q(x)));

// Expected strings follow the diagram expression syntax (common practice: expanded, descending powers of s,
// exact p/q coefficients, explicit *), written by hand from the polynomial each row builds.
describe("polyToText / polyToLatex", () => {
  const table: [string, Poly, string, string][] = [
    ["zero", polyZero, "0", "0"],
    ["constant", c(-5, 2), "-5/2", "-\\frac{5}{2}"],
    ["s^2 + 3/2 s + 1", sum(prod(s, s), polyScale(s, q(3, 2)), c(1)), "s^2 + 3/2*s + 1", "s^{2} + \\frac{3}{2}\\,s + 1"],
    ["-s^3 + s", P(-1, 0, 1, 0), "-s^3 + s", "-s^{3} + s"],
    ["(2K + 1)s^2 + tau s + 4", sum(prod(sum(polyScale(K, q(2)), c(1)), s, s), prod(tau, s), c(4)), "(2*K + 1)*s^2 + tau*s + 4", "\\left(2\\,K + 1\\right)\\,s^{2} + \\tau\\,s + 4"],
    ["s^2 + (3/2 − K)s + 1", sum(prod(s, s), polyScale(s, q(3, 2)), polyScale(prod(K, s), q(-1)), c(1)), "s^2 - (K - 3/2)*s + 1", "s^{2} - \\left(K - \\frac{3}{2}\\right)\\,s + 1"],
    ["constant term with parameters", sum(s, prod(K, K, tau), polyScale(K, q(-1, 3)), c(7)), "s + K^2*tau - 1/3*K + 7", "s + K^{2}\\,\\tau - \\frac{1}{3}\\,K + 7"],
    ["k_p parameter", prod(c(3), kp, s), "3*k_p*s", "3\\,k_{p}\\,s"],
    ["-K s", polyScale(prod(K, s), q(-1)), "-K*s", "-K\\,s"],
  ];
  it.each(table)("%s", (_label, p, text, latex) => {
    expect(polyToText(p)).toBe(text);
    expect(polyToLatex(p)).toBe(latex);
  });

  it("keeps the factors of a product apart when typeset: a dot beside a word-like name, a thin space otherwise (common practice)", () => {
    const [Kp, Ti, Kpos, Kv] = ["Kp", "Ti", "Kpos", "Kv"].map(polyParam);
    expect(polyToLatex(polyScale(prod(Kp, s), q(2)))).toBe("2\\,\\mathit{Kp} \\cdot s");
    expect(polyToLatex(polyScale(prod(Kp, Ti, s), q(32)))).toBe("32\\,\\mathit{Kp} \\cdot \\mathit{Ti} \\cdot s");
    expect(polyToLatex(polyScale(prod(Kpos, Kv), q(800)))).toBe("800\\,\\mathit{Kpos} \\cdot \\mathit{Kv}");
    expect(polyToLatex(prod(kp, tau, s))).toBe("k_{p}\\,\\tau\\,s");
  });

  it("parameter names in LaTeX: Greek letters, subscripts, longer names (common practice)", () => {
    expect(polyToLatex(polyParam("omega_n"))).toBe("\\omega_{n}");
    expect(polyToLatex(polyParam("Kp"))).toBe("\\mathit{Kp}");
    expect(polyToLatex(polyParam("T_1"))).toBe("T_{1}");
    expect(polyToLatex(polyParam("zeta"))).toBe("\\zeta");
  });
});
