import { beforeAll, describe, expect, it } from "vitest";
import { qToString } from "@shared/algebra/rational";
import { upDeg, type UPoly } from "@shared/analysis/upoly";
import { inverseCoefficients } from "@shared/implement/differenceEquation";
import { discretise, type DiscretisationMethod } from "@shared/implement/discretise";
import { discreteResponse, type DiscreteResponse } from "@shared/implement/discreteResponse";
import { descendingFloats, implement } from "@shared/implement/implement";
import { realise, REALISATION_FORMS } from "@shared/implement/realise";
import { ssToTf, type FloatTf } from "@shared/implement/ssToTf";
import type { ExactTf, StateSpace } from "@shared/implement/stateSpace";
import { unityFeedback } from "../../support/docBuilder";
import { reduced } from "../../support/reduced";
import { relativeDifference, runScipyImplement, tfOf, type ScipyAnswer, type ScipyCase, type ScipyTf } from "./scipyReference";

// Live comparison with Debian's python3-scipy 1.10 (general reference library): cont2discrete "bilinear" and
// "zoh", bilinear with the pre-warped sampling frequency fs = ω/(2·tan(ωTs/2)), tf2ss, ss2tf,
// solve_continuous_lyapunov and freqz; and with python3-sympy / python3-mpmath for the last bits: the bilinear
// substitutions in exact rationals and the ZOH in 50 digits. Tolerances, relative to a list's largest
// coefficient: against the precise references 1e-14 (Tustin) and 1e-12 (ZOH); against scipy's float results
// 1e-10 of the largest denominator coefficient, the accuracy of its own state-space paths (its sixth-order
// numerator at Ts = 0.01 is off by 6e-6 of its own size, ours by 1e-15);
// realisations' transfers 1e-9; balanced Gramians 1e-9; the frequency response to 100× the rounding-error bound
// of evaluating a polynomial on the unit circle.

interface Case {
  id: string;
  tf: ExactTf;
  ts: number;
  prewarp: number;
}

const pairOf = (doc: unknown, input = "r", output = "y") => implement(reduced(doc), { input, output }).tf;

const CASES: Case[] = [
  { id: "first order 1/(s+1)", tf: tfOf([1], [1, 1]), ts: 0.1, prewarp: 1 },
  { id: "2/((s+1)(s+3))", tf: tfOf([2], [3, 4, 1]), ts: 0.05, prewarp: 3 },
  { id: "PI 2(0.5s+1)/(0.5s)", tf: tfOf([2, 1], [0, 0.5]), ts: 0.01, prewarp: 20 },
  { id: "lead (s+1)/(0.1s+1)", tf: tfOf([1, 1], [1, 0.1]), ts: 0.02, prewarp: 10 },
  { id: "lightly damped 100/(s^2+2s+100)", tf: tfOf([100], [100, 2, 1]), ts: 0.01, prewarp: 10 },
  { id: "6/((s+1)(s+2)(s+3))", tf: tfOf([6], [6, 11, 6, 1]), ts: 0.1, prewarp: 2 },
  { id: "zero (s+3)/((s+1)(s+2))", tf: tfOf([3, 1], [2, 3, 1]), ts: 0.2, prewarp: 1.5 },
  { id: "non-minimum phase (1-s)/((s+1)(s+2))", tf: tfOf([1, -1], [2, 3, 1]), ts: 0.1, prewarp: 1 },
  { id: "type 1 1/(s(s+1))", tf: tfOf([1], [0, 1, 1]), ts: 0.1, prewarp: 1 },
  { id: "unstable 1/(s-1)", tf: tfOf([1], [-1, 1]), ts: 0.05, prewarp: 2 },
  { id: "double integrator 1/s^2", tf: tfOf([1], [0, 0, 1]), ts: 0.5, prewarp: 1 },
  { id: "notch (s^2+0.1s+25)/(s^2+5s+25)", tf: tfOf([25, 0.1, 1], [25, 5, 1]), ts: 0.05, prewarp: 5 },
  { id: "improper PD 2(s+1)", tf: tfOf([2, 2], [1]), ts: 0.01, prewarp: 10 },
  { id: "fifth order 2/((s+1)^5+1)", tf: tfOf([2], [2, 5, 10, 10, 5, 1]), ts: 0.1, prewarp: 1 },
  { id: "closed loop of K/(s(s+2)), K = 4 (from a diagram)", tf: pairOf(unityFeedback("K/(s*(s + 2))", { K: 4 })), ts: 0.05, prewarp: 2 },
  {
    id: "closed loop of 20000/((s+1)(s+2)(s+3)(s+4)(s^2+s+4)) (from a diagram)",
    tf: pairOf(unityFeedback("20000/((s + 1)*(s + 2)*(s + 3)*(s + 4)*(s^2 + s + 4))")),
    ts: 0.01,
    prewarp: 5,
  },
];

const proper = (c: Case) => upDeg(c.tf.num) <= upDeg(c.tf.den);
const subject = { what: "the test transfer" };
const methodsOf = (c: Case): DiscretisationMethod[] => (proper(c) ? ["tustin", "prewarp", "zoh"] : ["tustin", "prewarp"]);
const ours = (c: Case, method: DiscretisationMethod): FloatTf => discretise(c.tf, { ts: c.ts, method, prewarp: c.prewarp }, subject);
const realisations = (c: Case): Record<string, StateSpace> =>
  proper(c) ? Object.fromEntries(REALISATION_FORMS.map((f) => [f, realise(c.tf, f, subject).ss])) : {};
const exactDesc = (u: UPoly) => u.map(qToString).reverse();
/** Every 10th point of our frequency grid: where freqz is asked. */
const sampled = (r: DiscreteResponse) => r.omega.filter((_, i) => i % 10 === 0);
const tfDifference = (got: FloatTf, want: ScipyTf) => Math.max(relativeDifference(got.numerator, want.num), relativeDifference(got.denominator, want.den));
/**
 * Against scipy's float paths: differences over the largest denominator coefficient, the scale of its rounding
 * (ss2tf subtracts two characteristic polynomials, so small numerator coefficients carry an absolute error).
 */
const scipyDifference = (got: FloatTf, want: ScipyTf) => {
  const scale = Math.max(...want.den.map(Math.abs));
  return Math.max(relativeDifference(got.numerator, want.num) * Math.max(...want.num.map(Math.abs)), relativeDifference(got.denominator, want.den) * scale) / scale;
};

describe("discretisation and realisation against scipy.signal (python3-scipy, python3-sympy)", { timeout: 180_000 }, () => {
  let answers: ScipyAnswer[] = [];
  const responses = new Map<string, DiscreteResponse>();
  const worst: Record<string, number> = {};
  const record = (key: string, d: number) => (worst[key] = Math.max(worst[key] ?? 0, d));

  beforeAll(async () => {
    const cases: ScipyCase[] = CASES.map((c) => ({
      id: c.id,
      num: descendingFloats(c.tf.num),
      den: descendingFloats(c.tf.den),
      ts: c.ts,
      prewarp: c.prewarp,
      numExact: exactDesc(c.tf.num),
      denExact: exactDesc(c.tf.den),
      tsExact: String(c.ts),
      prewarpC: c.prewarp / Math.tan((c.prewarp * c.ts) / 2),
      realisations: realisations(c),
      discrete: Object.fromEntries(
        methodsOf(c).map((m) => {
          const tf = ours(c, m);
          const response = discreteResponse(c.tf, tf, c.ts);
          responses.set(`${c.id}|${m}`, response);
          const { b, a } = inverseCoefficients(tf); // freqz reads powers of z⁻¹
          return [m, { numerator: b, denominator: a, w: sampled(response) }];
        }),
      ),
    }));
    answers = (await runScipyImplement(cases)).results;
  }, 180_000);

  const answerOf = (c: Case) => answers[CASES.indexOf(c)];

  it("covers proper, biproper, improper, unstable, type-1 and -2 and closed loops of order up to 6", () => {
    expect(answers).toHaveLength(CASES.length);
    expect(CASES.filter((c) => !proper(c))).toHaveLength(1);
    expect(Math.max(...CASES.map((c) => upDeg(c.tf.den)))).toBe(6);
  });

  it("Tustin and pre-warped Tustin: exact substitutions (sympy, 1e-14) and scipy's bilinear (1e-8)", () => {
    for (const c of CASES) {
      for (const method of ["tustin", "prewarp"] as const) {
        const got = ours(c, method);
        const precise = answerOf(c).precise[method];
        const scipy = answerOf(c)[method];
        if (!precise || !scipy) throw new Error(`${c.id}: no reference for ${method}`);
        record(`${method} vs sympy`, tfDifference(got, precise));
        record(`${method} vs scipy`, scipyDifference(got, scipy));
        expect(tfDifference(got, precise), `${c.id} ${method} vs sympy`).toBeLessThan(1e-14);
        expect(scipyDifference(got, scipy), `${c.id} ${method} vs scipy`).toBeLessThan(1e-10);
      }
    }
  });

  it("zero-order hold: 50-digit reference (mpmath, 1e-12) and cont2discrete('zoh') (1e-8), every proper transfer", () => {
    for (const c of CASES.filter(proper)) {
      const got = ours(c, "zoh");
      const { precise, zoh } = answerOf(c);
      if (!precise.zoh || !zoh) throw new Error(`${c.id}: no zoh reference`);
      record("zoh vs mpmath", tfDifference(got, precise.zoh));
      record("zoh vs scipy", scipyDifference(got, zoh));
      expect(tfDifference(got, precise.zoh), `${c.id} vs mpmath`).toBeLessThan(1e-12);
      expect(scipyDifference(got, zoh), `${c.id} vs scipy`).toBeLessThan(1e-10);
    }
  });

  it("the controllable canonical form is scipy's tf2ss, entry for entry (1e-12)", () => {
    for (const c of CASES.filter(proper)) {
      const want = answerOf(c).tf2ss;
      if (!want) throw new Error(`${c.id}: no scipy tf2ss`);
      const got = realise(c.tf, "controllable", subject).ss;
      for (const key of ["A", "B", "C", "D"] as const) {
        expect(relativeDifference(got[key].flat(), want[key].flat()), `${c.id} ${key}`).toBeLessThan(1e-12);
      }
    }
  });

  it("every realisation's transfer, by scipy's ss2tf and by ours, is the continuous transfer (1e-9)", () => {
    for (const c of CASES.filter(proper)) {
      const want = { num: descendingFloats(c.tf.num), den: descendingFloats(c.tf.den) };
      for (const form of REALISATION_FORMS) {
        const dScipy = tfDifference({ numerator: answerOf(c).ss2tf[form].num, denominator: answerOf(c).ss2tf[form].den }, want);
        const dOurs = tfDifference(ssToTf(realise(c.tf, form, subject).ss), want);
        record(`ss2tf ${form} (scipy)`, dScipy);
        record(`ssToTf ${form} (ours)`, dOurs);
        expect(dScipy, `${c.id} ${form} scipy ss2tf`).toBeLessThan(1e-9);
        expect(dOurs, `${c.id} ${form} our ssToTf`).toBeLessThan(1e-9);
      }
    }
  });

  it("the minimal realisation of a stable system is balanced: both Gramians are diag(Hankel singular values)", () => {
    const stable = CASES.filter((c) => answerOf(c).gramians.minimal);
    expect(stable.length).toBeGreaterThanOrEqual(8);
    for (const c of stable) {
      const { wc, wo } = answerOf(c).gramians.minimal;
      const r = realise(c.tf, "minimal", subject);
      expect(r.basis, c.id).toBe("balanced");
      const h = r.hankel ?? [];
      const diag = h.flatMap((x, i) => h.map((_, j) => (i === j ? x : 0)));
      const d = Math.max(relativeDifference(wc.flat(), diag), relativeDifference(wo.flat(), diag));
      record("balanced Gramians", d);
      expect(d, c.id).toBeLessThan(1e-9);
    }
  });

  it("the discrete Bode data match scipy's freqz up to Nyquist, the phase unwrapped onto the continuous one", () => {
    for (const c of CASES) {
      for (const method of methodsOf(c)) {
        const r = responses.get(`${c.id}|${method}`);
        const h = answerOf(c).freqz[method];
        if (!r) throw new Error("no response");
        expect(r.omega[r.omega.length - 1], c.id).toBeCloseTo(Math.PI / c.ts, 9);
        const { b, a } = inverseCoefficients(ours(c, method));
        sampled(r).forEach((w, k) => {
          const i = k * 10;
          const mag = Math.hypot(...h[k]);
          // Rounding bound of evaluating both polynomials on |z| = 1: 2n·eps·(Σ|b|/|N| + Σ|a|/|D|), |N|/|D| = |H|.
          const zk = (p: number[]) => Math.hypot(...p.reduce<[number, number]>(([re, im], x) => [re * Math.cos(w * c.ts) + im * Math.sin(w * c.ts) + x, im * Math.cos(w * c.ts) - re * Math.sin(w * c.ts)], [0, 0]));
          const bound = 2 * a.length * 2.2e-16 * (b.reduce((s, x) => s + Math.abs(x), 0) / zk(b) + a.reduce((s, x) => s + Math.abs(x), 0) / zk(a));
          const dB = r.discrete.magDb[i];
          if (dB === null) {
            // A zero on the unit circle (Tustin's z = −1 at Nyquist): freqz finds |H| ≈ 0 there too.
            expect(mag, `${c.id} ${method} zero at ${w}`).toBeLessThan(1e-9);
            return;
          }
          expect(Math.abs(10 ** (dB / 20) - mag), `${c.id} ${method} |H| at ${w}`).toBeLessThanOrEqual(100 * bound * mag + 1e-300);
          const phase = r.discrete.phaseDeg[i] ?? NaN;
          const wrapped = phase - (Math.atan2(h[k][1], h[k][0]) * 180) / Math.PI;
          expect(Math.abs(wrapped - 360 * Math.round(wrapped / 360)), `${c.id} ${method} phase at ${w}`).toBeLessThan(1e-6 + 100 * bound * 57.3);
        });
        // Well below Nyquist the discrete phase lies on the continuous curve's branch (within 10°).
        expect(Math.abs((r.discrete.phaseDeg[0] ?? NaN) - r.continuous.phaseDeg[0]), `${c.id} ${method} branch`).toBeLessThan(10);
      }
    }
    console.info(`implement vs references, worst relative coefficient differences: ${Object.entries(worst).map(([k, v]) => `${k} ${v.toExponential(1)}`).join("; ")}`);
  });
});
