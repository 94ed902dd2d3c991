import { describe, expect, it } from "vitest";
import { ratDenominator, ratNumerator } from "@shared/algebra/ratfn";
import { parseTransfer } from "../../support/parseTransfer";
import { responseAt, responseSlopeAt, timeResponse, type InputKind, type TimeResponse } from "@shared/analysis/timeResponse";
import { upEvalFloat, upFromPoly, upInts, type UPoly } from "@shared/analysis/upoly";
import { cClose, cDiv, cx, type Complex } from "../../support/complex";

/** T = num/den from text, exactly. */
function tf(num: string, den: string): { num: UPoly; den: UPoly } {
  const r = parseTransfer(num, den, []);
  return { num: upFromPoly(ratNumerator(r)), den: upFromPoly(ratDenominator(r)) };
}

const close = (a: number, b: number, rtol = 1e-12, atol = 1e-13) => Math.abs(a - b) <= rtol * Math.max(Math.abs(a), Math.abs(b)) + atol;
const TIMES = [0.05, 0.3, 1, 2.5, 7];

describe("inverse Laplace by partial fractions: table pairs (Abramowitz & Stegun §29.3)", () => {
  const a = 3;
  const w = 2;
  const pairs: [string, string, string, InputKind, string, (t: number) => number][] = [
    ["1/s ↔ 1", "1", "1", "step", "1", () => 1],
    ["1/s^3 ↔ t^2/2", "1", "s", "ramp", "1/2*t^2", (t) => (t * t) / 2],
    ["a/(s+a) ↔ a·e^{−at}", `${a}`, `s + ${a}`, "impulse", "3*exp(-3*t)", (t) => a * Math.exp(-a * t)],
    ["1/(s+a)^2 ↔ t·e^{−at}", "1", `(s + ${a})^2`, "impulse", "t*exp(-3*t)", (t) => t * Math.exp(-a * t)],
    ["1/(s+a)^3 ↔ t^2·e^{−at}/2", "1", `(s + ${a})^3`, "impulse", "1/2*t^2*exp(-3*t)", (t) => (t * t * Math.exp(-a * t)) / 2],
    ["1/((s+1)(s+3)) ↔ (e^{−t} − e^{−3t})/2", "1", "(s + 1)*(s + 3)", "impulse", "1/2*exp(-t) - 1/2*exp(-3*t)", (t) => (Math.exp(-t) - Math.exp(-3 * t)) / 2],
    ["ω/(s^2+ω^2) ↔ sin ωt", `${w}`, `s^2 + ${w * w}`, "impulse", "sin(2*t)", (t) => Math.sin(w * t)],
    ["s/(s^2+ω^2) ↔ cos ωt", "s", `s^2 + ${w * w}`, "impulse", "cos(2*t)", (t) => Math.cos(w * t)],
    ["(s+a)/((s+a)^2+ω^2) ↔ e^{−at}cos ωt", `s + ${a}`, `(s + ${a})^2 + ${w * w}`, "impulse", "exp(-3*t)*cos(2*t)", (t) => Math.exp(-a * t) * Math.cos(w * t)],
    ["ω/((s+a)^2+ω^2) ↔ e^{−at}sin ωt", `${w}`, `(s + ${a})^2 + ${w * w}`, "impulse", "exp(-3*t)*sin(2*t)", (t) => Math.exp(-a * t) * Math.sin(w * t)],
    ["1/(s^2+ω^2)^2 ↔ (sin ωt − ωt·cos ωt)/(2ω^3)", "1", `(s^2 + ${w * w})^2`, "impulse", "1/16*sin(2*t) - 1/8*t*cos(2*t)", (t) => (Math.sin(w * t) - w * t * Math.cos(w * t)) / (2 * w ** 3)],
    ["s/(s^2+ω^2)^2 ↔ t·sin ωt/(2ω)", "s", `(s^2 + ${w * w})^2`, "impulse", "1/4*t*sin(2*t)", (t) => (t * Math.sin(w * t)) / (2 * w)],
    ["1/(s^2−a^2) ↔ sinh(at)/a", "1", `s^2 - ${a * a}`, "impulse", "1/6*exp(3*t) - 1/6*exp(-3*t)", (t) => Math.sinh(a * t) / a],
  ];
  it.each(pairs)("%s", (_, n, d, input, formula, f) => {
    const { num, den } = tf(n, d);
    const r = timeResponse(num, den, input);
    expect(r.exact).toBe(true);
    expect(r.formula).toBe(formula);
    for (const t of TIMES) expect(close(responseAt(r, t), f(t)), `t = ${t}`).toBe(true);
  });

  it("quadratic-surd poles stay exact: 1/(s^2 + 3s + 1) ↔ (e^{r1 t} − e^{r2 t})/√5 with r = (−3 ± √5)/2 (A&S §29.3, distinct real roots)", () => {
    const { num, den } = tf("1", "s^2 + 3*s + 1");
    const r = timeResponse(num, den, "impulse");
    expect(r.exact).toBe(true);
    expect(r.formula).toBe("sqrt(5)/5*exp((-3/2 + sqrt(5)/2)*t) - sqrt(5)/5*exp((-3/2 - sqrt(5)/2)*t)");
    const [r1, r2] = [(-3 + Math.sqrt(5)) / 2, (-3 - Math.sqrt(5)) / 2];
    for (const t of TIMES) expect(close(responseAt(r, t), (Math.exp(r1 * t) - Math.exp(r2 * t)) / Math.sqrt(5))).toBe(true);
  });

  it("complex pair with a surd frequency: step of 1/(s^2 + s + 1) (A&S §29.3 shifted sine and cosine, ω = √3/2)", () => {
    const { num, den } = tf("1", "s^2 + s + 1");
    const r = timeResponse(num, den, "step");
    expect(r.formula).toBe("1 - exp(-1/2*t)*cos(sqrt(3)/2*t) - sqrt(3)/3*exp(-1/2*t)*sin(sqrt(3)/2*t)");
    expect(r.latex).toContain("\\cos\\left(\\frac{\\sqrt{3}}{2} t\\right)");
  });
});

/** Y(s) recomputed from the terms with the forward table: L{t^k e^{−σt}(cos|sin) ωt} = k!/(s + σ ∓ jω)^{k+1}. */
function laplaceOfTerms(r: TimeResponse, s: Complex): Complex {
  let acc = cx(0);
  for (const x of r.terms) {
    const fact = [...Array(x.power).keys()].reduce((p, i) => p * (i + 1), 1);
    const pole = (sign: number) => {
      let d = cx(s.re + x.decay, s.im - sign * x.frequency);
      let p = cx(1);
      for (let i = 0; i <= x.power; i++) p = cx(p.re * d.re - p.im * d.im, p.re * d.im + p.im * d.re);
      d = cDiv(cx(fact), p);
      return d;
    };
    const [a, b] = [pole(1), pole(-1)];
    const v = x.kind === "exp" ? a : x.kind === "cos" ? cx((a.re + b.re) / 2, (a.im + b.im) / 2) : cx((a.im - b.im) / 2, -(a.re - b.re) / 2);
    acc = cx(acc.re + x.coefficient * v.re, acc.im + x.coefficient * v.im);
  }
  for (const i of r.impulses) {
    let p = cx(1);
    for (let k = 0; k < i.order; k++) p = cx(p.re * s.re - p.im * s.im, p.re * s.im + p.im * s.re);
    acc = cx(acc.re + i.coefficient * p.re, acc.im + i.coefficient * p.im);
  }
  return acc;
}

function evalRational(num: UPoly, den: UPoly, s: Complex, extraPoles: number): Complex {
  const ev = (u: UPoly): Complex => {
    let acc = cx(0);
    for (let i = u.length - 1; i >= 0; i--) acc = cx(acc.re * s.re - acc.im * s.im + Number(u[i].n) / Number(u[i].d), acc.re * s.im + acc.im * s.re);
    return acc;
  };
  let d = ev(den);
  for (let k = 0; k < extraPoles; k++) d = cx(d.re * s.re - d.im * s.im, d.re * s.im + d.im * s.re);
  return cDiv(ev(num), d);
}

describe("the terms transform back to Y(s) (forward table, A&S §29.3)", () => {
  const systems: [string, string][] = [
    ["1", "(s + 1)^2*(s^2 + 2*s + 5)^2"],
    ["s^2 + 1", "s^3 + 6*s^2 + 11*s + 16"],
    ["(s - 2)*(s + 7)", "(s^2 + s + 1)*(s^2 - 2)*(s + 3)^3"],
    ["s^4 + 3", "s^2 + 2*s + 2"],
    ["1", "s^7 + 3*s^5 + 2*s^2 + 9*s + 4"],
  ];
  it.each(systems)("T = (%s)/(%s), impulse, step and ramp", (n, d) => {
    const { num, den } = tf(n, d);
    (["impulse", "step", "ramp"] as const).forEach((input, k) => {
      const r = timeResponse(num, den, input);
      for (const s of [cx(0.7, 1.3), cx(2.5, -0.4), cx(1.1, 4)]) {
        expect(cClose(laplaceOfTerms(r, s), evalRational(num, den, s, k), 1e-9), `${input} at s = ${s.re}+${s.im}j`).toBe(true);
      }
    });
  });

  it("improper T reports its impulse terms: (s^2 + 1)/(s + 1) = s − 1 + 2/(s + 1) (polynomial division, common practice)", () => {
    const { num, den } = tf("s^2 + 1", "s + 1");
    const r = timeResponse(num, den, "impulse");
    expect(r.impulses.map((i) => [i.order, i.coefficient])).toEqual([[0, -1], [1, 1]]);
    expect(r.formula).toBe("-delta(t) + delta'(t) + 2*exp(-t)");
    expect(r.latex).toContain("\\delta^{(1)}(t)");
  });

  it("poles that are neither rational nor quadratic surds are numeric and flagged", () => {
    const { num, den } = tf("10", "s^3 + 6*s^2 + 11*s + 16");
    const r = timeResponse(num, den, "step");
    expect(r.exact).toBe(false);
    expect(r.formula).toMatch(/^5\/8 - 0\.\d{12}\*exp/);
  });
});

/** Classical RK4 on the controllable canonical realisation of a strictly proper T (an independent simulation). */
function simulateStep(num: number[], den: number[], tEnd: number, h: number): (t: number) => number {
  const n = den.length - 1;
  const a = den.map((c) => c / den[n]);
  const b = Array.from({ length: n }, (_, i) => (num[i] ?? 0) / den[n]);
  const f = (x: number[]) => x.map((_, i) => (i < n - 1 ? x[i + 1] : 1 - a.slice(0, n).reduce((acc, c, j) => acc + c * x[j], 0)));
  let x = new Array(n).fill(0);
  const out: number[] = [0];
  for (let k = 0; k * h < tEnd; k++) {
    const k1 = f(x);
    const k2 = f(x.map((v, i) => v + (h / 2) * k1[i]));
    const k3 = f(x.map((v, i) => v + (h / 2) * k2[i]));
    const k4 = f(x.map((v, i) => v + h * k3[i]));
    x = x.map((v, i) => v + (h / 6) * (k1[i] + 2 * k2[i] + 2 * k3[i] + k4[i]));
    out.push(b.reduce((acc, c, i) => acc + c * x[i], 0));
  }
  return (t) => out[Math.round(t / h)];
}

describe("closed form against a numeric simulation (RK4, step 1e-3, common practice)", () => {
  it.each([
    ["4", "s^2 + 0.8*s + 4"],
    ["s + 2", "(s + 1)^3"],
    ["5", "s^4 + 3*s^3 + 5*s^2 + 4*s + 2"],
  ])("step of (%s)/(%s)", (n, d) => {
    const { num, den } = tf(n, d);
    const r = timeResponse(num, den, "step");
    const sim = simulateStep(num.map((c) => Number(c.n) / Number(c.d)), den.map((c) => Number(c.n) / Number(c.d)), 12, 1e-3);
    for (const t of [0.5, 1, 2, 4, 8, 12]) expect(Math.abs(responseAt(r, t) - sim(t)), `t = ${t}`).toBeLessThan(1e-9);
    expect(Math.abs(responseSlopeAt(r, 1) - (sim(1.001) - sim(0.999)) / 0.002)).toBeLessThan(1e-5);
    expect(upEvalFloat(num, 0) / upEvalFloat(den, 0)).toBeCloseTo(responseAt(r, 200), 12);
  });

  it("sanity: the RK4 helper integrates 1/(s + 1) to 1 − e^{−t} (common practice)", () => {
    const sim = simulateStep([1], [1, 1], 2, 1e-3);
    expect(Math.abs(sim(2) - (1 - Math.exp(-2)))).toBeLessThan(1e-12);
    expect(upInts([1]).length).toBe(1);
  });
});
