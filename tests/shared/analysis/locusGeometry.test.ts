import { describe, expect, it } from "vitest";
import { runPythonSync } from "../../support/python";
import { affineSplit, locusGeometry, type LocusGeometry } from "@shared/analysis/locusGeometry";
import { ratDenominator } from "@shared/algebra/ratfn";
import { upInts, upText } from "@shared/analysis/upoly";
import { prepared } from "../../support/reduced";
import { unityFeedback } from "../../support/docBuilder";

interface Reference {
  centroid: number | null;
  breakaways: [number, number, number][]; // [Re s, Im s, K]
  crossings: [number, number][]; // [ω, K]
  exactMatches: boolean[];
}

/**
 * sympy (Debian python3-sympy), by other means than ours: breakaways from d/ds(−A/B) = 0 at 40 digits; crossings
 * by solving Re and Im of A(jω) + K·B(jω) = 0 together for real ω > 0 and K; our exact texts are checked
 * against those values to 40 digits (a 6-digit float would fail).
 */
function sympyReference(A: number[], B: number[], texts: string[]): Reference {
  return runPythonSync<Reference>({
    code: `
import json, sys
import sympy as sp
d = json.load(sys.stdin)
s = sp.Symbol('s')
A = sum(sp.Integer(c) * s**i for i, c in enumerate(d['A']))
B = sum(sp.Integer(c) * s**i for i, c in enumerate(d['B']))
n, m = sp.degree(A, s), sp.degree(B, s) if B.has(s) else 0
pa, pb = sp.Poly(A, s), sp.Poly(B, s)
cent = None
if n > m:
    cent = float((sum(sp.roots(pa, multiple=True)) - sum(sp.roots(pb, multiple=True) if m > 0 else [])) / (n - m))
num = sp.Poly(sp.numer(sp.together(sp.diff(-A / B, s))), s)
brk, values = [], []
for r in num.all_roots():
    z = sp.N(r, 40)
    k = sp.N((-A / B).subs(s, z), 40)
    if k != 0 and abs(sp.im(k)) < 1e-25 * abs(k):
        brk.append([float(sp.re(z)), float(sp.im(z)), float(sp.re(k))])
        values += [z, sp.re(k)]
w, K = sp.Symbol('w', real=True), sp.Symbol('K', real=True)
re, im = sp.expand((A + K * B).subs(s, sp.I * w)).as_real_imag()
cr = []
for ww in sp.Poly(sp.resultant(re, im, K), w).real_roots():
    if ww <= 0:
        continue
    eq = re if sp.Poly(re, K).degree() == 1 and re.coeff(K).subs(w, ww) != 0 else im
    kk = sp.N(sp.solve(eq.subs(w, ww), K)[0], 40)
    if kk != 0 and sp.Abs(sp.N((re.subs({w: ww, K: kk})), 30)) < 1e-20 and sp.Abs(sp.N(im.subs({w: ww, K: kk}), 30)) < 1e-20:
        cr.append([float(sp.N(ww, 40)), float(kk)])
        values += [sp.N(ww, 40), kk]
cr = [c for i, c in enumerate(sorted(cr)) if i == 0 or abs(c[0] - sorted(cr)[i - 1][0]) > 1e-12]
match = [any(abs(sp.N(sp.sympify(t), 45) - v) < 1e-35 for v in values) for t in d['texts']]
print(json.dumps({'centroid': cent, 'breakaways': sorted(brk), 'crossings': sorted(cr), 'exactMatches': match}))
`,
  }, { A, B, texts });
}

const exactTexts = (g: LocusGeometry) => [
  ...g.breakaways.filter((b) => b.gain.exact).flatMap((b) => [b.gain.text, ...(b.s[1] === 0 ? [b.text] : [])]),
  ...g.crossings.flatMap((c) => [c.omega, c.gain]).filter((x) => x.exact).map((x) => x.text),
];

function agreesWithSympy(A: number[], B: number[]) {
  const g = locusGeometry(upInts(A), upInts(B));
  const texts = exactTexts(g);
  const ref = sympyReference(A, B, texts);
  expect(g.centroid?.value ?? null).toBeCloseTo(ref.centroid ?? 0, 12);
  expect(g.breakaways.map((b) => [...b.s, b.gain.value])).toHaveLength(ref.breakaways.length);
  const ours = g.breakaways.map((b) => [...b.s, b.gain.value]).sort((x, y) => x[0] - y[0] || x[1] - y[1]);
  ours.forEach((b, i) => b.forEach((v, j) => expect(v).toBeCloseTo(ref.breakaways[i][j], 8)));
  expect(g.crossings).toHaveLength(ref.crossings.length);
  g.crossings.forEach((c, i) => {
    expect(c.omega.value).toBeCloseTo(ref.crossings[i][0], 9);
    expect(c.gain.value).toBeCloseTo(ref.crossings[i][1], 8);
  });
  expect(ref.exactMatches).toEqual(texts.map(() => true));
  return g;
}

describe("root-locus landmarks of A + K·B", () => {
  it("K/(s(s+1)(s+2)): centroid −1, asymptotes ±60° and 180°, breakaway −0.4226, crossing ω = √2 at K = 6", () => {
    // from memory: the standard textbook example of a third-order type-1 loop; cross-checked with sympy.
    const g = agreesWithSympy([0, 2, 3, 1], [1]);
    expect(g.centroid?.text).toBe("-1");
    expect(g.asymptotes.positive).toEqual([-60, 60, 180]);
    expect(g.poles.map(([re]) => re).sort((a, b) => a - b).map((x) => Math.round(x * 1e9) / 1e9)).toEqual([-2, -1, 0]);
    const breakaway = g.breakaways.find((b) => b.gain.value > 0)!;
    expect(breakaway.s[0]).toBeCloseTo(-0.4226, 4);
    expect(breakaway.text).toBe("-1 + sqrt(3)/3");
    expect(g.crossings.map((c) => [c.omega.text, c.gain.text])).toEqual([["sqrt(2)", "6"]]);
  });

  it("K(s+3)/(s(s+1)(s+2)(s+4)): a zero moves the centroid to −4/3 and the crossing gain (sympy)", () => {
    // common practice: centroid (Σp − Σz)/(n − m) = (−7 + 3)/3; the rest from sympy.
    const g = agreesWithSympy([0, 8, 14, 7, 1], [3, 1]);
    expect(g.centroid?.text).toBe("-4/3");
    expect(g.zeros).toEqual([[-3, 0]]);
    expect(g.crossings.every((c) => c.gain.value > 0)).toBe(true);
  });

  it("negative gains: the asymptotes turn to 0° and ±120° and the breakaway between −2 and −1 has K < 0", () => {
    // from memory: for K < 0 the asymptote angles are 2kπ/(n − m); sympy gives the breakaway and its gain.
    const g = agreesWithSympy([0, 2, 3, 1], [1]);
    expect(g.asymptotes.negative).toEqual([-120, 0, 120]);
    const neg = g.breakaways.find((b) => b.gain.value < 0)!;
    expect(neg.text).toBe("-1 - sqrt(3)/3");
    expect(neg.gain.text).toBe("-2*sqrt(3)/9");
  });

  it("K/(s(s+4)(s²+4s+20)): a complex breakaway pair at −2 ± j√6 besides the real one at −2 (sympy)", () => {
    // from memory: the textbook four-pole example whose branches meet off the real axis; values from sympy.
    const g = agreesWithSympy([0, 80, 36, 8, 1], [1]);
    const complex = g.breakaways.filter((b) => b.s[1] !== 0);
    expect(complex).toHaveLength(2);
    expect(complex[0].s[0]).toBeCloseTo(-2, 9);
    expect(Math.abs(complex[0].s[1])).toBeCloseTo(Math.sqrt(6), 9);
  });

  it("splits the closed-loop denominator as A + K·B, and refuses K² (common practice: χ affine in K)", () => {
    const affine = affineSplit(ratDenominator(prepared(unityFeedback("K*(s+3)/(s*(s+1)*(s+2)*(s+4))", { K: 1 })).transfer), "K", { K: 1 });
    expect(affine && [upText(affine.A), upText(affine.B)]).toEqual(["s^4 + 7*s^3 + 14*s^2 + 8*s", "s + 3"]);
    const quadratic = ratDenominator(prepared(unityFeedback("1/(s*(K*s+1)*(K*s+2))", { K: 1 })).transfer);
    expect(affineSplit(quadratic, "K", { K: 1 })).toBeNull();
    // The other parameters are fixed at their values first: K·T with T = 2 is affine in K.
    const twoParams = ratDenominator(prepared(unityFeedback("K*T/(s*(s+1))", { K: 1, T: 2 })).transfer);
    const split = affineSplit(twoParams, "K", { K: 1, T: 2 });
    expect(split && [upText(split.A), upText(split.B)]).toEqual(["s^2 + s", "2"]);
  });
});
