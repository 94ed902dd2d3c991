import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { balancedForm } from "@shared/implement/balanced";
import { charPoly } from "@shared/implement/charPoly";
import { ImplementError } from "@shared/implement/errors";
import { expm } from "@shared/algebra/expm";
import { matMul, transpose } from "@shared/algebra/matrix";
import { realise } from "@shared/implement/realise";
import { ssToTf } from "@shared/implement/ssToTf";
import { controllableForm, observableForm } from "@shared/implement/stateSpace";
import { lyapunov } from "@shared/implement/symmetric";
import { relativeDifference, tfOf } from "./scipyReference";

const subject = { what: 'transfer function "c"', id: "c" };
const close = (a: number[][], b: number[][], tol = 1e-14) => expect(relativeDifference(a.flat(), b.flat())).toBeLessThan(tol);

describe("matrix exponential", () => {
  it("e^(Nt) of a nilpotent block, e^(Ωt) of a rotation and e^(−50) (from memory: series and Euler's formula)", () => {
    close(expm([[0, 2], [0, 0]]), [[1, 2], [0, 1]]);
    const w = 3;
    close(expm([[0, -w], [w, 0]]), [[Math.cos(w), -Math.sin(w)], [Math.sin(w), Math.cos(w)]]);
    expect(expm([[-50]])[0][0] / Math.exp(-50) - 1).toBeLessThan(1e-13);
  });
});

describe("characteristic polynomial", () => {
  it("of a triangular matrix is Π(s − diagonal) and of a companion matrix its polynomial (from memory)", () => {
    expect(relativeDifference(charPoly([[2, 5, 1], [0, -1, 7], [0, 0, 3]]), [1, -4, 1, 6])).toBeLessThan(1e-15);
    expect(relativeDifference(charPoly([[-6, -11, -6], [1, 0, 0], [0, 1, 0]]), [1, 6, 11, 6])).toBeLessThan(1e-15);
  });

  it("is invariant under similarity: charPoly(T⁻¹AT) = charPoly(A) for random well-conditioned T (property)", () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: -3, max: 3, noNaN: true }), { minLength: 9, maxLength: 9 }), fc.double({ min: -0.4, max: 0.4, noNaN: true }), (a, t) => {
        const A = [a.slice(0, 3), a.slice(3, 6), a.slice(6, 9)];
        // T = I + t·N with N strictly upper triangular: T⁻¹ = I − tN + t²N².
        const T = [[1, t, t], [0, 1, t], [0, 0, 1]];
        const Ti = [[1, -t, t * t - t], [0, 1, -t], [0, 0, 1]];
        const p = charPoly(A);
        const q = charPoly(matMul(matMul(Ti, A), T));
        const scale = Math.max(1, ...p.map(Math.abs));
        return p.every((c, i) => Math.abs(c - q[i]) < 1e-12 * scale);
      }),
    );
  });
});

describe("canonical forms", () => {
  const tf = tfOf([3, 1], [2, 3, 1]); // (s + 3)/(s² + 3s + 2)

  it("the controllable canonical form of (s + 3)/(s² + 3s + 2) (from memory: companion row on top, B = e₁)", () => {
    const ss = controllableForm(tf);
    expect(ss).toEqual({ A: [[-3, -2], [1, 0]], B: [[1], [0]], C: [[1, 3]], D: [[0]] });
  });

  it("the observable form is its dual, and a biproper transfer gets its feed-through D", () => {
    expect(observableForm(tf)).toEqual({ A: [[-3, 1], [-2, 0]], B: [[1], [3]], C: [[1, 0]], D: [[0]] });
    // (2s + 1)/(s + 3) = 2 − 5/(s + 3): D = 2, C = −5.
    expect(controllableForm(tfOf([1, 2], [3, 1]))).toEqual({ A: [[-3]], B: [[1]], C: [[-5]], D: [[2]] });
  });

  it("a static gain is an order-0 realisation", () => {
    expect(realise(tfOf([4], [1]), "minimal", subject).ss).toEqual({ A: [], B: [], C: [[]], D: [[4]] });
    expect(ssToTf({ A: [], B: [], C: [[]], D: [[4]] })).toEqual({ numerator: [4], denominator: [1] });
  });

  it("refuses an improper transfer, naming the block", () => {
    try {
      realise(tfOf([1, 1, 1], [1, 1]), "controllable", subject);
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(ImplementError);
      expect((e as ImplementError).code).toBe("improper");
      expect((e as ImplementError).subject).toBe("c");
      expect((e as ImplementError).message).toMatch(/transfer function "c" has more zeros \(2\) than poles \(1\)/);
    }
  });
});

describe("minimal realisation", () => {
  it("of 1/(s + 1) is balanced with σ = 1/2 (from memory: Wc = Wo = 1/(2a) for a/(s + a) with b = c = √a)", () => {
    const r = realise(tfOf([1], [1, 1]), "minimal", subject);
    expect(r.basis).toBe("balanced");
    expect(r.hankel?.[0]).toBeCloseTo(0.5, 15);
    close(r.ss.A, [[-1]]);
    close(r.ss.B, [[1]]);
    close(r.ss.C, [[1]]);
  });

  it("its Gramians (our own Lyapunov solve) are equal and diagonal, Hankel values descending", () => {
    const r = realise(tfOf([6], [6, 11, 6, 1]), "minimal", subject);
    const { A, B, C } = r.ss;
    const wc = lyapunov(A, matMul(B, transpose(B, 1)));
    const wo = lyapunov(transpose(A, 3), matMul(transpose(C, 3), C));
    const h = r.hankel ?? [];
    const diag = h.map((x, i) => h.map((_, j) => (i === j ? x : 0)));
    close(wc, diag, 1e-12);
    close(wo, diag, 1e-12);
    expect(h[0]).toBeGreaterThan(h[1]);
    expect(h[1]).toBeGreaterThan(h[2]);
  });

  it("of an unstable or marginal system is the controllable canonical form, with the reason", () => {
    for (const den of [[-1, 1], [0, 1, 1]]) {
      const r = realise(tfOf([1], den), "minimal", subject);
      expect(r.basis).toBe("controllable");
      expect(r.ss).toEqual(controllableForm(tfOf([1], den)));
      expect(r.note).toMatch(/not asymptotically stable.*controllable canonical form of the transfer in lowest terms/);
    }
  });

  it("balancing changes the coordinates, not the transfer: ssToTf agrees with the controllable form (property)", () => {
    let balanced = 0;
    fc.assert(
      fc.property(fc.array(fc.integer({ min: 2, max: 50 }), { minLength: 1, maxLength: 4 }), fc.array(fc.integer({ min: -300, max: 300 }), { minLength: 4, maxLength: 4 }), (tenths, hundredths) => {
        // den = Π(s + p) for poles −p (p = tenths/10), num of lower degree with coefficients hundredths/100.
        const den = tenths.reduce<number[]>((acc, t) => acc.map((c, i) => (c * t) / 10 + (acc[i - 1] ?? 0)).concat(acc[acc.length - 1]), [1]);
        const num = hundredths.slice(0, tenths.length).map((x) => x / 100);
        if (num.every((x) => x === 0)) return true;
        const tf = tfOf(num, den);
        const b = balancedForm(controllableForm(tf));
        if (!b) return true; // a zero cancelling a pole: not minimal, nothing to balance
        balanced++;
        const want = ssToTf(controllableForm(tf));
        const got = ssToTf(b.ss);
        return relativeDifference(got.denominator, want.denominator) < 1e-8 && relativeDifference(got.numerator, want.numerator) < 1e-7;
      }),
      { numRuns: 200 },
    );
    expect(balanced).toBeGreaterThan(150);
  });
});
