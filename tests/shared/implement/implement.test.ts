import { describe, expect, it } from "vitest";
import { differenceEquation } from "@shared/implement/differenceEquation";
import { ImplementError } from "@shared/implement/errors";
import { implement } from "@shared/implement/implement";
import { samplingAdvice } from "@shared/implement/sampling";
import { implementResultSchema } from "@shared/implement/schema";
import type { ImplementSelection } from "@shared/implement/selection";
import { delayedLoop, piLoop, unityFeedback } from "../../support/docBuilder";
import { reduced } from "../../support/reduced";

const loop = () => piLoop("8/(0.25*s + 1)", { Kp: 0.5, Ti: 0.2 });

const failure = (f: () => unknown): ImplementError => {
  try {
    f();
  } catch (e) {
    if (e instanceof ImplementError) return e;
    throw e;
  }
  throw new Error("no error");
};

describe("implement: a block or a pair of a diagram", () => {
  it("a block's transfer at the nominal values, discretised and realised, in the published shape", () => {
    // Kp(Ti s + 1)/(Ti s) at Kp = 1/2, Ti = 1/5 is (s/2 + 5/2)/s; Tustin at Ts = 0.01 (from memory:
    // s → 200(z − 1)/(z + 1)): (0.5·200(z − 1) + 2.5(z + 1))/(200(z − 1)) = (0.5125z − 0.4875)/(z − 1).
    const out = implement(reduced(loop()), { block: "pi" }, { discretise: { ts: 0.01, method: "tustin" } });
    expect(implementResultSchema.parse(out.result)).toEqual(out.result);
    expect(out.result.continuous).toEqual({ numerator: [0.5, 2.5], denominator: [1, 0] });
    expect(out.result.discrete).toEqual({ ts: 0.01, method: "tustin", numerator: [0.5125, -0.4875], denominator: [1, -1] });
    expect(out.result.stateSpace).toEqual({ form: "controllable", A: [[0]], B: [[1]], C: [[2.5]], D: [[0.5]] });
    expect(out.subject).toEqual({ what: 'transfer function "pi"', id: "pi" });
  });

  it("a pair's closed loop, with parameter values over the nominal ones", () => {
    // unity feedback around K/(s(s + 2)): T = K/(s² + 2s + K) (from memory).
    const r = reduced(unityFeedback("K/(s*(s + 2))", { K: 4 }));
    expect(implement(r, { input: "r", output: "y" }).result.continuous).toEqual({ numerator: [4], denominator: [1, 2, 4] });
    expect(implement(r, { input: "r", output: "y" }, { values: { K: 9 } }).result.continuous).toEqual({ numerator: [9], denominator: [1, 2, 9] });
    expect(implement(r, { input: "r", output: "y" }).result.discrete).toBeNull();
  });

  it("names what is wrong: an unknown block, a block without a transfer, an unknown pair", () => {
    const r = reduced(loop());
    const cases: [ImplementSelection, string, string, RegExp][] = [
      [{ block: "nope" }, "unknown-block", "nope", /no block "nope".*pi, g/],
      [{ block: "e" }, "no-transfer", "e", /summing junction "e" has no transfer of its own/],
      [{ block: "b" }, "no-transfer", "b", /pickoff point "b"/],
      [{ input: "y", output: "r" }, "unknown-pair-id", "y → r", /no pair y → r/],
    ];
    for (const [selection, code, subject, message] of cases) {
      const e = failure(() => implement(r, selection));
      expect([e.code, e.subject]).toEqual([code, subject]);
      expect(e.message).toMatch(message);
    }
  });

  it("refuses a transfer holding a dead time, naming the dead-time block; a block beside it still works", () => {
    const doc = delayedLoop("2", "0.5", "1/(s + 1)");
    const r = reduced(doc);
    for (const selection of [{ block: "d" }, { input: "r", output: "y" }]) {
      const e = failure(() => implement(r, selection));
      expect(e.code).toBe("dead-time");
      expect(e.message).toMatch(/dead time e\^\(−sT\) of block d\b/);
    }
    expect(implement(r, { block: "g" }).result.continuous).toEqual({ numerator: [1], denominator: [1, 1] });
  });

  it("refuses to realise an improper block (a PD controller), naming it", () => {
    const r = reduced(unityFeedback("2*(s + 1)"));
    const e = failure(() => implement(r, { block: "g" }, { discretise: { ts: 0.01, method: "tustin" } }));
    expect([e.code, e.subject]).toEqual(["improper", "g"]);
    expect(e.message).toMatch(/transfer function "g" has more zeros \(1\) than poles \(0\).*no state-space realisation/);
  });
});

describe("difference equation", () => {
  it("the trapezoidal integrator (T/2)(z + 1)/(z − 1) as text, C and H(z⁻¹)", () => {
    // from memory: y[k] = y[k−1] + (T/2)(u[k] + u[k−1]) with T = 1.
    const d = differenceEquation({ numerator: [0.5, 0.5], denominator: [1, -1] }, { ts: 1, method: "tustin", id: "pi" });
    expect(d.b).toEqual([0.5, 0.5]);
    expect(d.a).toEqual([1, -1]);
    expect(d.text).toBe("y[k] = 0.50000000000000000*u[k] + 0.50000000000000000*u[k-1] + 1.0000000000000000*y[k-1]");
    expect(d.latex).toBe("H(z^{-1}) = \\frac{0.5 + 0.5\\,z^{-1}}{1 - z^{-1}}");
    expect(d.code).toContain("static const double b0 = 0.50000000000000000;");
    expect(d.code).toContain("static const double a1 = -1.0000000000000000;");
    expect(d.code).toContain("double pi_step(double u)");
    expect(d.code).toContain("double y = b0 * u + b1 * u_1 - a1 * y_1;");
    expect(d.code).toContain("u_1 = u;");
    expect(d.code).toContain("y_1 = y;");
  });

  it("pads the numerator to the denominator's length (a one-sample delay gives b0 = 0) and reads back every double", () => {
    // ZOH of 2/(s + 2) at 0.1 s (from memory: (1 − e^(−0.2))/(z − e^(−0.2))).
    const e = Math.exp(-0.2);
    const d = differenceEquation({ numerator: [1 - e], denominator: [1, -e] }, { ts: 0.1, method: "zoh", id: "r → y" });
    expect(d.b).toEqual([0, 1 - e]);
    expect(d.code).toContain("double r_y_step(double u)");
    const numbers = [...d.text.matchAll(/(\d+\.\d+(?:e[-+]\d+)?)\*/g)].map((m) => Number(m[1]));
    expect(numbers).toEqual([1 - e, e]); // 17 significant digits round-trip exactly
    expect(d.text).toMatch(/^y\[k\] = 0\.\d{17}\*u\[k-1\] \+ 0\.\d{17}\*y\[k-1\]$/);
  });
});

describe("sample time against the closed-loop bandwidth", () => {
  it("warns below 10 samples per bandwidth and says the Ts range (common practice: 10–30×)", () => {
    const slow = samplingAdvice(0.5, 2, "r → y");
    expect(slow.ratio).toBeCloseTo((2 * Math.PI) / 0.5 / 2, 12);
    expect(slow.warning).toMatch(/only 6\.283 times the closed-loop bandwidth 2 rad\/s of r → y.*Ts ≤ 0\.3142 s \(10×\) to 0\.1047 s \(30×\)/);
    expect(samplingAdvice(0.01, 2, "r → y").warning).toBeNull();
    expect(samplingAdvice(0.5, null, "r → y")).toEqual({ ratio: null, warning: null });
  });
});
