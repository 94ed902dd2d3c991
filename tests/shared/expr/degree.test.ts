import { describe, expect, it } from "vitest";
import { exprDegreeBound } from "@shared/expr/degree";
import { parseExpression } from "@shared/expr/parse";
import { runPython } from "./pythonReference";

const degreeOf = (text: string): number => {
  const r = parseExpression(text, { allowS: true, parameters: ["K", "tau", "a"] });
  if (!r.ok) throw new Error(r.message);
  return exprDegreeBound(r.ast);
};

// Reference: max(deg numerator, deg denominator) in s of sympy's together() form (Debian python3-sympy).
const SYMPY_DEGREES = `
import json, sys
from sympy import Symbol, together, fraction, degree
from sympy.parsing.sympy_parser import parse_expr, standard_transformations, convert_xor, rationalize
s = Symbol("s")
tr = standard_transformations + (convert_xor, rationalize)
out = []
for t in json.load(sys.stdin):
    n, d = fraction(together(parse_expr(t, local_dict={"s": s}, transformations=tr)))
    out.append(int(max(degree(n, s), degree(d, s))))
print(json.dumps(out))
`;

describe("exprDegreeBound", () => {
  // tight: no common factor between numerator and denominator as written, so the bound is the degree itself.
  const tight = ["0.5", "K", "s", "K*(s+2)/s", "1/(tau*s^2 + s)", "(s+1)^3/(s^2+1)", "s + 1/s", "a/(s^2+a^2)", "(s+a)^0", "-(s^2+1)^50"];
  // loose: the bound counts factors that cancel, so it may exceed the true degree.
  const loose = ["1/(1/s + 1/s^2)", "s/s", "(s^2-1)/(s-1)", "(1/s)^2*s^3"];

  it("equals sympy's degree when nothing cancels and bounds it otherwise", () => {
    const texts = [...tight, ...loose];
    const reference = runPython<number[]>(SYMPY_DEGREES, texts);
    texts.forEach((text, i) => {
      if (tight.includes(text)) expect(degreeOf(text), text).toBe(reference[i]);
      else expect(degreeOf(text), text).toBeGreaterThanOrEqual(reference[i]);
    });
  });

  it("is cheap on exponents: (s+1)^50 counts 50 without expanding", () => {
    // source: common practice — deg (p^n) = n·deg p.
    expect(degreeOf("(s+1)^50/(s^2+1)^20")).toBe(50);
  });
});
