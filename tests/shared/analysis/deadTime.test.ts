import { describe, expect, it } from "vitest";
import { runPythonSync } from "../../support/python";
import { analyzeDocument } from "@shared/analysis/analyzeDiagram";
import { padeCoefficients } from "@shared/analysis/pade";
import { qToNumber } from "@shared/algebra/rational";
import { reduceDocument } from "@shared/reduce/reduceDiagram";

const python = <T>(script: string, input: unknown): T => runPythonSync<T>({ code: script }, input);

/** Unity negative feedback around K·e^(−sT)/(s + 1). */
const delayedLoop = (T: string, K = 2) => ({
  format: "loopwright-diagram",
  version: 1,
  parameters: { K },
  blocks: [
    { id: "r", type: "input" },
    { id: "e", type: "sum", signs: ["+", "-"] },
    { id: "c", type: "gain", expr: "K" },
    { id: "d", type: "delay", expr: T },
    { id: "G", type: "transfer", expr: "1/(s+1)" },
    { id: "y", type: "output" },
  ],
  wires: [
    { from: "r", to: "e", port: 0 },
    { from: "e", to: "c" },
    { from: "c", to: "d" },
    { from: "d", to: "G" },
    { from: "G", to: "y" },
    { from: "G", to: "e", port: 1 },
  ],
});

describe("Padé approximant of a dead time", () => {
  it.each([1, 3, 6, 8])("order %i has the coefficients scipy.interpolate.pade gives for e^(−x)", (n) => {
    // Reference: scipy.interpolate.pade (Debian python3-scipy) from the Taylor series of e^(−x).
    const ref = python<{ p: number[]; q: number[] }>(
      `
import json, sys, math
from scipy.interpolate import pade
n = json.load(sys.stdin)
an = [(-1) ** k / math.factorial(k) for k in range(2 * n + 1)]
p, q = pade(an, n)
print(json.dumps({"p": list(p.coeffs[::-1] / q.coeffs[-1]), "q": list(q.coeffs[::-1] / q.coeffs[-1])}))
`,
      n,
    );
    const c = padeCoefficients(n).map(qToNumber);
    c.forEach((ck, k) => {
      expect(ck).toBeCloseTo(ref.q[k], 9);
      expect((k % 2 ? -1 : 1) * ck).toBeCloseTo(ref.p[k], 9);
    });
  });

  it("order 10 matches e^(−x) through x^20 exactly, the defining property (sympy series, exact rationals)", () => {
    // Reference: sympy (Debian python3-sympy): Q(x)·e^(−x) − P(x) = O(x^(2N+1)) with our exact coefficients.
    const c = padeCoefficients(10).map((x) => [String(x.n), String(x.d)]);
    const order = python<number>(
      `
import json, sys
from sympy import symbols, exp, Rational, series, Poly
x = symbols("x")
c = [Rational(int(n), int(d)) for n, d in json.load(sys.stdin)]
P = sum(ck * (-x) ** k for k, ck in enumerate(c))
Q = sum(ck * x ** k for k, ck in enumerate(c))
r = series(Q * exp(-x) - P, x, 0, 23).removeO()
print(json.dumps(min(Poly(r, x).monoms())[0] if r != 0 else 99))
`,
      c,
    );
    expect(order).toBe(21);
  });
});

describe("a loop with a dead time", () => {
  it("keeps e^(−sT) in the exact closed loop, which sympy's own block algebra confirms", () => {
    const r = reduceDocument(delayedLoop("0.5"));
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    const t = r.result.transfers[0];
    expect(t.latex).toContain("e^{-\\frac{1}{2}\\,s}");
    // Reference: sympy (Debian python3-sympy) — G/(1 + G) with G = K·exp(−s/2)/(s + 1), compared with our text.
    const same = python<boolean>(
      `
import json, sys
from sympy import symbols, exp, Rational, simplify, sympify
s, K = symbols("s K")
d = json.load(sys.stdin)
G = K * exp(-Rational(1, 2) * s) / (s + 1)
ours = sympify(d["n"], locals={"s": s, "K": K}) / sympify(d["d"], locals={"s": s, "K": K})
print(json.dumps(bool(simplify(ours - G / (1 + G)) == 0)))
`,
      { n: t.numerator, d: t.denominator },
    );
    expect(same).toBe(true);
  });

  it("analyses the Padé model: poles agree with numpy's roots of the same approximant (scipy.interpolate.pade)", () => {
    for (const order of [3, 5]) {
      const out = analyzeDocument(delayedLoop("0.5"), { padeOrder: order });
      expect(out.ok).toBe(true);
      if (!out.ok) return;
      expect(out.result.deadTime?.padeOrder).toBe(order);
      expect(out.result.deadTime?.delays).toEqual([{ blocks: ["d"], seconds: 0.5, text: "1/2" }]);
      expect(out.result.notes.some((n) => n.startsWith(`Padé order ${order}`))).toBe(true);
      // Reference: closed loop K·P/((s + 1)·Q + K·P) with P/Q = scipy.interpolate.pade of e^(−sT), roots by numpy.
      const ref = python<[number, number][]>(
        `
import json, sys, math
import numpy as np
from scipy.interpolate import pade
d = json.load(sys.stdin)
n, T, K = d["n"], 0.5, 2.0
an = [(-T) ** k / math.factorial(k) for k in range(2 * n + 1)]
p, q = pade(an, n)
den = np.polyadd(np.polymul([1.0, 1.0], q.coeffs), K * p.coeffs)
print(json.dumps(sorted([[r.real, r.imag] for r in np.roots(den)])))
`,
        { n: order },
      );
      const ours = [...out.result.poles].sort((a, b) => a[0] - b[0] || a[1] - b[1]);
      expect(ours).toHaveLength(order + 1);
      ours.forEach((p, i) => {
        expect(p[0]).toBeCloseTo(ref[i][0], 6);
        expect(p[1]).toBeCloseTo(ref[i][1], 6);
      });
    }
  });

  it("approaches the exact critical gain of the delayed loop as the Padé order grows (scipy brentq on the phase condition)", () => {
    // Exact: the loop K·e^(−sT)/(s + 1) reaches −180° where atan ω + Tω = π, at K = √(1 + ω²). Reference: scipy.optimize.brentq.
    const exact = python<number>(
      `
import json, math
from scipy.optimize import brentq
w = brentq(lambda w: math.atan(w) + 0.5 * w - math.pi, 0.1, 20)
print(json.dumps(math.sqrt(1 + w * w)))
`,
      null,
    );
    const upper = (order: number) => {
      const out = analyzeDocument(delayedLoop("0.5"), { padeOrder: order });
      if (!out.ok) throw new Error("not analysed");
      return out.result.routh.stableSets[0].intervals.at(-1)!.upper!.value;
    };
    const e1 = Math.abs(upper(1) - exact);
    const e5 = Math.abs(upper(5) - exact);
    expect(e5).toBeLessThan(1e-4 * exact);
    expect(e5).toBeLessThan(e1);
  });

  it("treats a parameter dead time and names a negative or s-dependent one as a problem of its block", () => {
    const doc = { ...delayedLoop("Td"), parameters: { K: 2, Td: 0.5 } };
    const out = analyzeDocument(doc);
    expect(out.ok && out.result.deadTime?.delays[0].seconds).toBe(0.5);
    const negative = reduceDocument(delayedLoop("-0.1"));
    expect(!negative.ok && negative.problems.map((p) => [p.code, p.blockId, p.field])).toEqual([["negative-delay", "d", "expr"]]);
    const withS = reduceDocument(delayedLoop("s"));
    expect(!withS.ok && withS.problems[0]).toMatchObject({ code: "s-in-gain", blockId: "d", field: "expr" });
    expect(!withS.ok && withS.problems[0].message).toContain("dead time");
  });

  it("gives a zero dead time the gain 1: the same closed loop as without the block", () => {
    const zero = reduceDocument(delayedLoop("0"));
    expect(zero.ok && [zero.result.transfers[0].numerator, zero.result.transfers[0].denominator]).toEqual(["2", "s + 3"].map((x) => x.replace("2", "K").replace("s + 3", "s + K + 1")));
  });
});

describe("the frequency analysis of a delayed loop uses the exact e^(−jωT)", () => {
  // Reference: scipy.optimize.brentq (Debian python3-scipy) on the exact conditions for L = K·e^(−sT)/(s + 1):
  // |L(jω)| = 1 at ω = √(K² − 1); the phase −atan ω − Tω = −180° at the phase crossover.
  const reference = (K: number, T: number) =>
    python<{ wgc: number; pm: number; wpc: number; gm: number }>(
      `
import json, sys, math
from scipy.optimize import brentq
K, T = json.load(sys.stdin)
wgc = math.sqrt(K * K - 1)
pm = 180 - math.degrees(math.atan(wgc) + T * wgc)
wpc = brentq(lambda w: math.atan(w) + T * w - math.pi, 1e-6, 100)
gm = 20 * math.log10(math.sqrt(1 + wpc * wpc) / K)
print(json.dumps({"wgc": wgc, "pm": pm, "wpc": wpc, "gm": gm}))
`,
      [K, T],
    );

  it("gives margins, crossovers and the delay margin independent of the Padé order", () => {
    const ref = reference(2, 0.5);
    for (const order of [1, 3, 8]) {
      const out = analyzeDocument(delayedLoop("0.5"), { padeOrder: order });
      if (!out.ok) throw new Error("not analysed");
      const m = out.result.margins;
      expect(m.gainCrossover).toBeCloseTo(ref.wgc, 8);
      expect(m.phaseMarginDeg).toBeCloseTo(ref.pm, 6);
      expect(m.phaseCrossover).toBeCloseTo(ref.wpc, 8);
      expect(m.gainMarginDb).toBeCloseTo(ref.gm, 6);
      // common practice: delay margin = PM (rad) / ω_gc.
      expect(out.result.delayMargin).toBeCloseTo(((ref.pm * Math.PI) / 180) / ref.wgc, 8);
      expect(out.result.nyquist?.verdict).toBe("stable");
      expect(out.result.loopGain?.numerator).toBe("2*exp(-1/2*s)");
    }
  });

  it("finds the delayed loop unstable above its exact critical gain from the Nyquist curve", () => {
    // K = 5 > √(1 + ω_pc²) ≈ 3.807 (brentq above): the exact loop is unstable; the curve encircles −1 clockwise twice.
    const out = analyzeDocument({ ...delayedLoop("0.5"), parameters: { K: 5 } });
    if (!out.ok) throw new Error("not analysed");
    expect(out.result.nyquist).toMatchObject({ verdict: "unstable", encirclements: 2, openLoopRhpPoles: 0, closedLoopRhpPoles: 2 });
    expect(out.result.margins.gainMarginDb).toBeCloseTo(reference(5, 0.5).gm, 6);
    expect(out.result.margins.gainMarginDb).toBeLessThan(0);
  });
});
