import { describe, expect, it } from "vitest";
import { runPythonSync } from "../../support/python";
import { unityFeedback } from "../../support/docBuilder";
import { analyzeDocument } from "@shared/analysis/analyzeDiagram";
import type { Analysis } from "@shared/analysis/analyze";
import { q, qFromDouble, qToNumber } from "@shared/algebra/rational";
import { qSqrtToNumber, surdToNumber } from "@shared/analysis/surd";
import type { Complex } from "@shared/analysis/frequency";
import { clockwiseEncirclements } from "@shared/analysis/nyquist";
import { negligibleFrom } from "@shared/analysis/stepMetrics";

// Real plants, not tidy ones: time constants decades apart, gains near the ends of the double range, modes with
// almost no damping. Each case used to fail (an array of billions of grid points, a hang in an integer square
// root, a coefficient lost to cancellation); each now ends with figures or says what it cannot resolve.


function analysed(G: string): Analysis {
  const out = analyzeDocument(unityFeedback(G));
  if (!out.ok) throw new Error(JSON.stringify(out.problems));
  return out.analysis;
}

const python = <T>(code: string, input: unknown): T => runPythonSync<T>({ code }, input);

describe("analysis of plants with widely spread scales", () => {
  it("a nearly undamped loop, 1/(s(s + 1e-6)): overshoot, peak and the last exit from ±2 % (settling ≈ 7.8e6 s)", () => {
    const a = analysed("1/(s*(s+0.000001))");
    const zeta = 5e-7;
    // Common practice: overshoot 100·exp(−ζπ/√(1 − ζ²)), peak at π/ωd for a standard second-order loop.
    expect(a.step.overshootPercent).toBeCloseTo(100 * Math.exp((-zeta * Math.PI) / Math.sqrt(1 - zeta * zeta)), 6);
    expect(a.step.peakTime).toBeCloseTo(Math.PI / Math.sqrt(1 - zeta * zeta), 6);
    // Reference: numpy on the closed form 1 − e^(−σt)(cos ωd·t + σ/ωd·sin ωd·t), last |y − 1| > 0.02 on a 1 ms grid.
    const last = python<number>(
      `
import json, sys
import numpy as np
s = 5e-7; wd = np.sqrt(1 - s * s)
tS = np.log(50 * (1 + s / wd)) / s
t = np.arange(tS - 200, tS + 1, 1e-3)
e = np.abs(np.exp(-s * t) * (np.cos(wd * t) + s / wd * np.sin(wd * t)))
print(json.dumps(float(t[e > 0.02][-1])))
`,
      null,
    );
    expect(Math.abs((a.step.settlingTime ?? 0) - last)).toBeLessThan(2e-3);
    // The plot cannot draw millions of periods: it shows about 20 (its end rounded up to a round value) and says so.
    expect(a.plotHorizon).toBeGreaterThanOrEqual(20 * 2 * Math.PI);
    expect(a.plotHorizon).toBeLessThanOrEqual(2 * 20 * 2 * Math.PI);
    expect(a.notes.some((n) => n.startsWith("The plots show the first 20 periods"))).toBe(true);
  });

  it("a gain of 1e-300: the response is tiny, its shape that of 1/((s + 1)(s + 2)) (rise 2.59 s, settling 4.60 s)", () => {
    const a = analysed("1e-300/((s+1)*(s+2))");
    expect((a.dcGain?.value ?? 0) / 5e-301).toBeCloseTo(1, 12); // T(0) = 1e-300/(2 + 1e-300)
    // Reference: scipy.optimize.brentq on y/y∞ = 1 − 2e^(−t) + e^(−2t): 10 %, 90 % and the last exit from ±2 %.
    const ref = python<{ rise: number; settle: number }>(
      `
import json, sys, math
from scipy.optimize import brentq
g = lambda t: 1 - 2 * math.exp(-t) + math.exp(-2 * t)
t10 = brentq(lambda t: g(t) - 0.1, 0, 10); t90 = brentq(lambda t: g(t) - 0.9, 0, 10)
print(json.dumps({"rise": t90 - t10, "settle": brentq(lambda t: g(t) - 0.98, 0, 20)}))
`,
      null,
    );
    expect(a.step.riseTime).toBeCloseTo(ref.rise, 9);
    expect(a.step.settlingTime).toBeCloseTo(ref.settle, 9);
    expect(a.responses.step.terms.map((t) => t.coefficient / 5e-301)).toEqual([expect.closeTo(1, 9), expect.closeTo(-2, 9), expect.closeTo(1, 9)]);
    // Ends on a horizon where the response has settled, not on 1 s (the old absolute floor of 1e-12).
    expect(a.plotHorizon).toBeGreaterThanOrEqual(5);
  });

  it("a gain of 1e300: ωn = 1e150 rad/s with ζ = 1.5e-150; overshoot ≈ 100 %, settling from the envelope, resolution notes", () => {
    const a = analysed("1e300/((s+1)*(s+2))");
    expect(a.stability.verdict).toBe("stable");
    expect((a.poles[0].naturalFrequency ?? 0) / 1e150).toBeCloseTo(1, 9);
    expect(a.step.overshootPercent).toBeCloseTo(100, 5);
    // Common practice: the envelope e^(−1.5t) falls to 2 % at t = ln(50)/1.5 (the period, 6e-150 s, is below a double's resolution there).
    expect(a.step.settlingTime).toBeCloseTo(Math.log(50 * (1 + 1.5e-150)) / 1.5, 9);
    expect(a.notes.some((n) => n.includes("below the resolution of a double"))).toBe(true);
  });

  it("time constants from 1 µs to 1000 s in one loop: the poles agree with numpy's roots of the characteristic polynomial", () => {
    const a = analysed("10/((0.000001*s + 1)*(1000*s + 1))");
    // Reference: numpy.roots of (1e-6 s + 1)(1e3 s + 1) + 10.
    const ref = python<[number, number][]>(
      `
import json
import numpy as np
r = np.roots(np.polyadd(np.polymul([1e-6, 1], [1e3, 1]), [10]))
print(json.dumps(sorted([[float(x.real), float(x.imag)] for x in r])))
`,
      null,
    );
    const ours = a.poles.map((p) => [p.re, p.im]).sort((x, y) => x[0] - y[0] || x[1] - y[1]);
    ours.forEach(([re, im], i) => {
      expect(re / ref[i][0]).toBeCloseTo(1, 8);
      expect(im).toBeCloseTo(ref[i][1], 3);
    });
    expect(a.bode.omega.length).toBeLessThanOrEqual(2000);
    expect(a.step.settlingTime).not.toBeNull();
  });
});

describe("the Nyquist curve near repeated poles on the axis", () => {
  it("L = 1/((s + 1)(s² + 1))³ (a triple pole pair at ±j): the verdict agrees with numpy's roots of 1 + L", () => {
    const a = analysed("1/(s^3+s^2+s+1)^3");
    // Reference: numpy.roots of (s³ + s² + s + 1)³ + 1, counted in the right half-plane.
    const rhp = python<number>(
      `
import json
import numpy as np
d = np.polymul(np.polymul([1, 1, 1, 1], [1, 1, 1, 1]), [1, 1, 1, 1])
print(json.dumps(int(sum(1 for r in np.roots(np.polyadd(d, [1])) if r.real > 0))))
`,
      null,
    );
    expect(a.loop?.nyquist.closedLoopRhpPoles).toBe(rhp);
    expect(a.loop?.nyquist.verdict).toBe(rhp === 0 ? "stable" : "unstable");
  });

  it("gives up on a curve whose phase is noise, within its evaluation budget, instead of halving forever", () => {
    let seed = 1;
    const noise = (): Complex => {
      seed = (seed * 16807) % 2147483647;
      const th = (2 * Math.PI * seed) / 2147483647;
      return [Math.cos(th) - 1, Math.sin(th)];
    };
    expect(clockwiseEncirclements(noise, [], 10, 1e-3)).toBeNull();
  });
});

describe("a tolerance that underflows", () => {
  it("a term compared with a tolerance of 0 is never negligible, and the search ends (it used to double t forever)", () => {
    const term = { kind: "exp" as const, coefficient: 5e-324, power: 0, decay: 1, frequency: 0, text: "", latex: "" };
    expect(negligibleFrom(term, 1e-3 * 5e-324)).toBe(Infinity);
    expect(negligibleFrom({ ...term, coefficient: 1 }, 1e-300)).toBeCloseTo(Math.log(1e300), 6); // e^(−t) = 1e-300
  });
});

describe("exact numbers read as doubles at any size", () => {
  it("qToNumber keeps the digits of a ratio far from 1 with 2000-bit parts (common practice: 10^-600·10^300 = 10^-300)", () => {
    expect(qToNumber(q(10n ** 300n, 10n ** 600n)) / 1e-300).toBeCloseTo(1, 14);
    expect(qToNumber(q(3n * 10n ** 700n, 10n ** 400n)) / 3e300).toBeCloseTo(1, 14);
  });
  it("qFromDouble is exact, subnormals included (IEEE 754 binary64)", () => {
    for (const x of [0.75, -1e-300, 5e-324, 1.7976931348623157e308, 0.1]) expect(qToNumber(qFromDouble(x))).toBe(x);
    expect(qFromDouble(0.75)).toEqual(q(3n, 4n));
  });
  it("surd values without cancellation: 1 − √(1 − 4e-300) = 2e-300 (common practice: (a² − b²d)/(a + b√d))", () => {
    const d = 10n ** 300n - 4n; // √(1 − 4e-300) = √d / 10^150
    expect(surdToNumber(q(1), q(-1n, 10n ** 150n), d) / 2e-300).toBeCloseTo(1, 10);
    expect(qSqrtToNumber(q(10n ** 601n)) / Math.sqrt(10) / 1e300).toBeCloseTo(1, 14);
  });
});
