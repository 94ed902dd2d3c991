import { describe, expect, it } from "vitest";
import { parseExpression, type ParseErrorCode } from "@shared/expr/parse";
import type { ExprNode } from "@shared/expr/ast";
import { evalExact, evalExpr, showExpr } from "./exprTestKit";
import { runPython, SYMPY_EXACT_VALUES } from "./pythonReference";

const PARAMS = ["K", "tau", "a", "b", "K_1"];
const transfer = (text: string) => parseExpression(text, { allowS: true, parameters: PARAMS });
const ast = (text: string): ExprNode => {
  const r = transfer(text);
  if (!r.ok) throw new Error(`${text}: ${r.message}`);
  return r.ast;
};

describe("parseExpression accepts the grammar", () => {
  // source: common practice — usual precedence: ^ above unary minus above * / above + -; - and / associate left.
  const cases: [string, string][] = [
    ["2*s+0.5", "(+ (* 2 s) 1/2)"],
    ["K*(s+2)/s", "(/ (* K (+ s 2)) s)"],
    ["1/(tau*s^2 + s)", "(/ 1 (+ (* tau (^ s 2)) s))"],
    ["2-3-4", "(- (- 2 3) 4)"],
    ["2/3/4", "(/ (/ 2 3) 4)"],
    ["-s^2", "(neg (^ s 2))"],
    ["2*-3", "(* 2 (neg 3))"],
    ["s - -1", "(- s (neg 1))"],
    ["+s", "s"],
    ["-(s)", "(neg s)"],
    ["s^0", "(^ s 0)"],
    ["(s+1)^2", "(^ (+ s 1) 2)"],
    ["s^(3)", "(^ s 3)"],
    ["s^2.0", "(^ s 2)"],
    ["s^50", "(^ s 50)"],
    ["  s \n + 1 ", "(+ s 1)"],
    ["K_1*s", "(* K_1 s)"],
    ["1e-3*s", "(* 1/1000 s)"],
    ["(((s)))", "s"],
  ];
  it.each(cases)("%s → %s", (text, printed) => {
    expect(showExpr(ast(text))).toBe(printed);
  });

  it("keeps the same meaning as sympy for a table of expressions (Debian python3-sympy, exact values)", () => {
    const texts = [
      "K*(s+2)/s",
      "1/(tau*s^2 + s)",
      "2-3-4*s/5/7",
      "-s^2+a*s-b",
      "(s+a)^3/((s+b)^2*(s-1))",
      "0.25*K/(1e-2*s+1)",
      "s/(s^2+a^2)-2.5",
      "-(s-a)*-(s+b)",
    ];
    const values = { s: [3, 7], K: [5, 2], tau: [1, 3], a: [-2, 5], b: [7, 4] };
    const reference = runPython<string[]>(SYMPY_EXACT_VALUES, texts.map((text) => ({ text, values })));
    const point = (k: keyof typeof values): [bigint, bigint] => [BigInt(values[k][0]), BigInt(values[k][1])];
    const ours = texts.map((t) => evalExact(ast(t), point("s"), { K: point("K"), tau: point("tau"), a: point("a"), b: point("b") }));
    expect(ours).toEqual(reference);
  });
});

describe("decimals are exact rationals taken from the text", () => {
  // source: the format spec (0.1 is 1/10, 1e-3 is 1/1000) and common practice (2.50 = 5/2).
  it.each([
    ["0.1", "1/10"],
    ["1e-3", "1/1000"],
    ["2.50", "5/2"],
  ])("%s → %s", (text, exact) => {
    expect(showExpr(ast(text))).toBe(exact);
  });

  it("agrees with Python's fractions.Fraction on decimal literals (Debian python3 standard library)", () => {
    const texts = ["0.1", "0.3", "1e-3", "2.50", "12.5e2", ".5", "3.", "1.25E+1", "0.000", "7e0", "123456789.987654321", "4.2e-12"];
    const reference = runPython<string[]>(
      "import json,sys\nfrom fractions import Fraction\nprint(json.dumps([str(Fraction(t)) for t in json.load(sys.stdin)]))",
      texts,
    );
    expect(texts.map((t) => showExpr(ast(t)))).toEqual(reference);
  });
});

describe("parseExpression refuses what is outside the grammar, with a code and a position", () => {
  // source: the format spec's expression grammar; positions are 0-based character offsets.
  const cases: [string, ParseErrorCode, number, string?][] = [
    ["", "empty", 0],
    ["   ", "empty", 0],
    ["K 2", "implicit-multiplication", 2, "write K*2"],
    ["(s+1)2", "implicit-multiplication", 5, "or ^2 for a power"],
    ["2 3", "implicit-multiplication", 2],
    ["s mod 2", "implicit-multiplication", 6],
    ["1/2s", "ambiguous-product", 3, "Write /(2*s) for the product, or /2*s for 2 only"],
    ["K/s(s+1)", "ambiguous-product", 3, "/(s*(…))"],
    ["1/(s+1)(s+2)", "ambiguous-product", 7],
    ["1/s^2(s+1)", "ambiguous-product", 5],
    ["2 cm", "unknown-name", 2],
    ["0x1F", "unknown-name", 1],
    ["sin(s)", "function-call", 0, "`sin(`"],
    ["1/", "syntax", 2],
    ["s+*2", "syntax", 2],
    ["((s)", "syntax", 4],
    ["s)", "syntax", 1],
    ["s!", "syntax", 1, "`!`"],
    ["[1, 2]", "syntax", 0],
    ["a=1", "syntax", 1],
    ["s==1", "syntax", 1],
    ['"s"', "syntax", 0],
    ["s'", "syntax", 1],
    ["s;1", "syntax", 1],
    ["s%2", "syntax", 1],
    ["s>0?1:2", "syntax", 1],
    ["a.b", "syntax", 1],
    ["1.2.3", "syntax", 0],
    ["2e", "syntax", 0],
    ["s.*s", "syntax", 1],
    [`${"(".repeat(101)}s${")".repeat(101)}`, "syntax", 100],
    ["pi", "unknown-name", 0, "`pi`"],
    ["e*s", "unknown-name", 0],
    ["s+Kp", "unknown-name", 2, "`Kp`"],
    ["true", "unknown-name", 0],
    ["Infinity", "unknown-name", 0],
    ["s^-1", "bad-exponent", 2],
    ["s^(-2)", "bad-exponent", 2],
    ["s^K", "bad-exponent", 2],
    ["s^s", "bad-exponent", 2],
    ["s^2.5", "bad-exponent", 2],
    ["s^(2.5)", "bad-exponent", 3],
    ["s^(1+1)", "bad-exponent", 2],
    ["s^2^3", "bad-exponent", 2],
    ["s^51", "exponent-limit", 2, "51"],
    ["(s+1)^(60)", "exponent-limit", 7],
    [`${"s+".repeat(1000)}1`, "expr-too-long", 2000, "2001"],
    ["1/0", "division-by-zero", 2],
    ["s/(0.0)", "division-by-zero", 2],
    ["1/-0", "division-by-zero", 2],
    ["1e400", "number-range", 0],
  ];
  it.each(cases)("%j → %s at %i", (text, code, position, quoted) => {
    const r = transfer(text);
    expect(r).toMatchObject({ ok: false, code, position });
    if (!r.ok && quoted) expect(r.message).toContain(quoted);
  });

  it("refuses s in a gain and names its position", () => {
    const r = parseExpression("K*2*s", { allowS: false, parameters: ["K"] });
    expect(r).toMatchObject({ ok: false, code: "s-in-gain", position: 4 });
  });

  it("accepts an expression of exactly 2,000 characters (limit is inclusive)", () => {
    const text = `${"s+".repeat(999)}12`;
    expect(text.length).toBe(2000);
    expect(transfer(text).ok).toBe(true);
  });

  it("refuses a name that is not declared even if mathjs knows it as a constant or unit", () => {
    for (const name of ["pi", "e", "i", "cm", "Infinity", "NaN"]) {
      expect(parseExpression(`2*${name}`, { allowS: true, parameters: [] })).toMatchObject({ code: "unknown-name", position: 2 });
    }
  });
});

describe("products written without `*`", () => {
  // common practice: engineers write 2/((s+1)(s+3)), 2s, 10(s+1), K(s+a), 0.5s^2 for the explicit products.
  const same: [string, string][] = [
    ["2/((s+1)(s+3))", "2/((s+1)*(s+3))"],
    ["2s", "2*s"],
    ["10(s+1)", "10*(s+1)"],
    ["K(s+a)", "K*(s+a)"],
    ["0.5s^2", "0.5*s^2"],
    ["K s", "K*s"],
    ["s^2(s+1)", "s^2*(s+1)"],
    ["(s+1)(s+2)K", "(s+1)*(s+2)*K"],
  ];
  it.each(same)("%s reads as %s", (implicit, explicit) => {
    const p = { allowS: true, parameters: ["K", "a"] };
    const read = parseExpression(implicit, p);
    if (!read.ok) throw new Error(`${implicit}: ${read.message}`);
    expect(showExpr(read.ast)).toBe(showExpr(ast(explicit)));
  });
  it("says what a run-together name could mean when its parts are declared", () => {
    const r = parseExpression("Kps", { allowS: true, parameters: ["Kp"] });
    expect(r).toMatchObject({ ok: false, code: "unknown-name", position: 0 });
    expect(!r.ok && r.message).toContain("it could mean Kp·s: write Kp*s (or Kp s)");
  });
  it("keeps positions of later errors in the user's text", () => {
    expect(parseExpression("2s+*3", { allowS: true, parameters: [] })).toMatchObject({ code: "syntax", position: 3 });
  });
});

describe("every error of an expression at once", () => {
  // source: common practice — a compiler lists every independent error of a line, each at its own column.
  it.each([
    ["Kx*(s+", [["unknown-name", 0], ["syntax", 6]]],
    ["2*s + q + 1/(s+", [["unknown-name", 6], ["syntax", 15]]],
    ["1e999 + zeta", [["number-range", 0], ["unknown-name", 8]]],
    ["s^2 + foo(s) + bar", [["function-call", 6], ["unknown-name", 15]]],
  ] as [string, [ParseErrorCode, number][]][])("%s → %j", (text, expected) => {
    const r = transfer(text);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.errors.map((e) => [e.code, e.position])).toEqual(expected);
    // The first error stays the one a left-to-right reader meets first, with its own message.
    expect(r.errors).toContainEqual({ code: r.code, message: r.message, position: r.position });
  });

  it("lists s in a gain beside an unknown name", () => {
    const r = parseExpression("2*s + g", { allowS: false, parameters: [] });
    expect(r.ok ? [] : r.errors.map((e) => e.code)).toEqual(["s-in-gain", "unknown-name"]);
  });

  it("reports one error once even when two checks find it", () => {
    const r = transfer("s^q");
    expect(r.ok ? [] : r.errors.map((e) => [e.code, e.position])).toEqual([["bad-exponent", 2]]);
  });
});

describe("names are only parameters", () => {
  // source: the format spec — names are parameters only; mathjs keywords, constants and units get no meaning.
  it("reads declared names that mathjs treats as keywords or constants as plain parameters", () => {
    const names = ["not", "and", "mod", "in", "to", "true", "NaN", "Infinity", "pi", "e", "i", "end"];
    for (const name of names) {
      const r = parseExpression(`-${name}*s^2`, { allowS: true, parameters: names });
      expect(r.ok && showExpr(r.ast), name).toBe(`(* (neg ${name}) (^ s 2))`);
    }
  });
});

describe("parsed Laplace transforms evaluate to the transform of their time functions", () => {
  // source: Abramowitz & Stegun §29.3 (table of Laplace transforms). Each F(s) is parsed by us, then compared
  // with ∫₀^∞ e^(−st) f(t) dt computed numerically (composite Simpson on [0, 60]) from the table's f(t).
  const laplace = (f: (t: number) => number, s: number): number => {
    const [T, n] = [60, 30000];
    const h = T / n;
    let sum = f(0) + Math.exp(-s * T) * f(T);
    for (let k = 1; k < n; k += 1) sum += (k % 2 ? 4 : 2) * Math.exp(-s * k * h) * f(k * h);
    return (sum * h) / 3;
  };
  const [a, b] = [0.8, 1.3];
  const pairs: [string, (t: number) => number][] = [
    ["1/s", () => 1],
    ["1/s^2", (t) => t],
    ["1/s^3", (t) => t ** 2 / 2],
    ["1/(s+a)", (t) => Math.exp(-a * t)],
    ["1/(s+a)^2", (t) => t * Math.exp(-a * t)],
    ["a/(s^2+a^2)", (t) => Math.sin(a * t)],
    ["s/(s^2+a^2)", (t) => Math.cos(a * t)],
    ["1/((s+a)*(s+b))", (t) => (Math.exp(-a * t) - Math.exp(-b * t)) / (b - a)],
    ["b/((s+a)^2+b^2)", (t) => Math.exp(-a * t) * Math.sin(b * t)],
    ["a/(s^2-a^2)", (t) => Math.sinh(a * t)],
  ];
  it.each(pairs)("%s", (text, f) => {
    const tree = ast(text);
    for (const s of [1.5, 2, 3.7]) {
      const expected = laplace(f, s);
      expect(Math.abs(evalExpr(tree, s, { a, b }) - expected)).toBeLessThan(1e-7 * Math.max(1, Math.abs(expected)));
    }
  });

  it("reads printed text with wider limits given by the caller, and still refuses past them (common practice: limits are per caller)", () => {
    const wide = { exprLength: 5000, exponent: 1000 };
    expect(parseExpression("s^61 + 2", { allowS: true, parameters: [], limits: wide }).ok).toBe(true);
    const refused = parseExpression("s^1001", { allowS: true, parameters: [], limits: wide });
    expect(refused.ok ? null : refused.code).toBe("exponent-limit");
  });
});
