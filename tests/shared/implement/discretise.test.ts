import { describe, expect, it } from "vitest";
import { discretise, type DiscretisationMethod } from "@shared/implement/discretise";
import { ImplementError } from "@shared/implement/errors";
import type { FloatTf } from "@shared/implement/ssToTf";
import { tfOf } from "./scipyReference";

const subject = { what: 'transfer function "g"', id: "g" };
const at = (tf: ReturnType<typeof tfOf>, method: DiscretisationMethod, ts: number, prewarp?: number) => discretise(tf, { ts, method, prewarp }, subject);

/** Every coefficient within 1e-14 of the largest one. */
function expectTf(got: FloatTf, numerator: number[], denominator: number[]) {
  const scale = Math.max(...denominator.map(Math.abs), ...numerator.map(Math.abs));
  expect(got.numerator).toHaveLength(numerator.length);
  expect(got.denominator).toHaveLength(denominator.length);
  got.numerator.forEach((c, i) => expect(Math.abs(c - numerator[i])).toBeLessThan(1e-14 * scale));
  got.denominator.forEach((c, i) => expect(Math.abs(c - denominator[i])).toBeLessThan(1e-14 * scale));
}

const valueAt = (tf: FloatTf, x: number, y: number): [number, number] => {
  const ev = (p: number[]) => p.reduce<[number, number]>(([re, im], a) => [re * x - im * y + a, re * y + im * x], [0, 0]);
  const [a, b] = ev(tf.numerator);
  const [c, d] = ev(tf.denominator);
  const m = c * c + d * d;
  return [(a * c + b * d) / m, (b * c - a * d) / m];
};

describe("discretise: textbook pairs", () => {
  const a = 2;
  const T = 0.1;
  const e = Math.exp(-a * T);
  const firstOrder = tfOf([a], [a, 1]);

  it("zero-order hold of a/(s + a) is (1 − e^(−aT))/(z − e^(−aT))", () => {
    // from memory: the ZOH equivalent of a first-order lag.
    expectTf(at(firstOrder, "zoh", T), [1 - e], [1, -e]);
  });

  it("zero-order hold of 1/s is T/(z − 1) and of 1/s² is T²(z + 1)/(2(z − 1)²)", () => {
    // from memory: the ZOH equivalents of one and two integrators.
    expectTf(at(tfOf([1], [0, 1]), "zoh", T), [T], [1, -1]);
    expectTf(at(tfOf([1], [0, 0, 1]), "zoh", T), [(T * T) / 2, (T * T) / 2], [1, -2, 1]);
  });

  it("Tustin of 1/s is (T/2)(z + 1)/(z − 1) and of a/(s + a) is aT/(2 + aT)·(z + 1)/(z − (2 − aT)/(2 + aT))", () => {
    // from memory: the trapezoidal integrator and the bilinear first-order lag.
    expectTf(at(tfOf([1], [0, 1]), "tustin", T), [T / 2, T / 2], [1, -1]);
    const k = (a * T) / (2 + a * T);
    expectTf(at(firstOrder, "tustin", T), [k, k], [1, -(2 - a * T) / (2 + a * T)]);
  });

  it("matched pole-zero of a/(s + a) is (1 − e^(−aT))/2·(z + 1)/(z − e^(−aT)), of 1/s is (T/2)(z + 1)/(z − 1)", () => {
    // from memory: a zero at infinity maps to z = −1, the gain matched at low frequency.
    expectTf(at(firstOrder, "matched", T), [(1 - e) / 2, (1 - e) / 2], [1, -e]);
    expectTf(at(tfOf([1], [0, 1]), "matched", T), [T / 2, T / 2], [1, -1]);
  });

  it("matched pole-zero maps a complex pair to z² − 2e^(−ζωnT)cos(ωdT)z + e^(−2ζωnT)", () => {
    // from memory: z = e^(sT) for s = −σ ± jωd. Here 100/(s² + 2s + 100): σ = 1, ωd = √99.
    const got = at(tfOf([100], [100, 2, 1]), "matched", T);
    const wd = Math.sqrt(99);
    expect(got.denominator[1]).toBeCloseTo(-2 * Math.exp(-T) * Math.cos(wd * T), 13);
    expect(got.denominator[2]).toBeCloseTo(Math.exp(-2 * T), 13);
  });

  it("every method keeps the DC gain of a stable lag: H(1) = G(0)", () => {
    // common practice: ZOH is step invariant, Tustin maps s = 0 to z = 1, matched pole-zero matches it by design.
    const g = tfOf([3, 1], [2, 3, 1]); // (s + 3)/((s + 1)(s + 2)), G(0) = 1.5
    for (const method of ["tustin", "prewarp", "zoh", "matched"] as const) {
      const [re, im] = valueAt(at(g, method, 0.2, 1.5), 1, 0);
      expect(re, method).toBeCloseTo(1.5, 12);
      expect(im).toBeCloseTo(0, 12);
    }
  });

  it("pre-warped Tustin matches the continuous response exactly at the pre-warp frequency", () => {
    // from memory: s = (ω₀/tan(ω₀T/2))(z − 1)/(z + 1) maps jω₀ onto e^(jω₀T).
    const g = tfOf([25, 0.1, 1], [25, 5, 1]); // a notch at 5 rad/s
    const w0 = 5;
    const ts = 0.1;
    const [re, im] = valueAt(at(g, "prewarp", ts, w0), Math.cos(w0 * ts), Math.sin(w0 * ts));
    // G(j5) = (−25 + 0.5j + 25)/(−25 + 25j + 25) = 0.5j/25j = 0.02.
    expect(re).toBeCloseTo(0.02, 12);
    expect(im).toBeCloseTo(0, 12);
    const [tre, tim] = valueAt(at(g, "tustin", ts), Math.cos(w0 * ts), Math.sin(w0 * ts));
    expect(Math.hypot(tre - 0.02, tim)).toBeGreaterThan(1e-3); // plain Tustin misses it: the warping is real
  });

  it("a static gain is the same gain for every method", () => {
    for (const method of ["tustin", "prewarp", "zoh", "matched"] as const) expectTf(at(tfOf([3], [1]), method, 0.1, 1), [3], [1]);
  });

  it("Tustin makes an improper PD proper; ZOH and matched pole-zero refuse it naming the block", () => {
    // from memory: Tustin of K(s + 1) at T is K((2/T + 1)z − (2/T − 1))/(z + 1).
    expectTf(at(tfOf([2, 2], [1]), "tustin", 0.1), [2 * 21, -2 * 19], [1, 1]);
    for (const method of ["zoh", "matched"] as const) {
      const error = (() => {
        try {
          at(tfOf([2, 2], [1]), method, 0.1);
        } catch (e) {
          return e;
        }
      })();
      expect(error).toBeInstanceOf(ImplementError);
      expect((error as ImplementError).code).toBe("improper");
      expect((error as ImplementError).subject).toBe("g");
      expect((error as ImplementError).message).toContain('transfer function "g"');
    }
  });

  it("refuses a non-positive Ts and a pre-warp frequency outside (0, π/Ts), saying the range", () => {
    const codeOf = (f: () => unknown) => {
      try {
        f();
      } catch (e) {
        return e instanceof ImplementError ? `${e.code}: ${e.message}` : String(e);
      }
      return "no error";
    };
    expect(codeOf(() => at(firstOrder, "tustin", 0))).toMatch(/^bad-sample-time: .*positive/);
    expect(codeOf(() => at(firstOrder, "zoh", Number.NaN))).toMatch(/^bad-sample-time/);
    expect(codeOf(() => at(firstOrder, "prewarp", 0.1))).toMatch(/^bad-prewarp: .*31\.4159 rad\/s/);
    expect(codeOf(() => at(firstOrder, "prewarp", 0.1, 40))).toMatch(/^bad-prewarp: .*not 40/);
    expect(codeOf(() => at(firstOrder, "prewarp", 0.1, -1))).toMatch(/^bad-prewarp/);
  });
});
