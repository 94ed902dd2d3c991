import { spawnSync } from "node:child_process";
import { beforeAll, describe, expect, it } from "vitest";
import { qToNumber } from "@shared/algebra/rational";
import { bodeAt, ratEvalComplex } from "@shared/analysis/frequency";
import { zpkOf } from "@shared/analysis/loopAnalysis";
import { transferAt } from "@shared/analysis/nominal";
import { flatRoots, rootsOf } from "@shared/analysis/poles";
import { prepared } from "../../support/reduced";
import { responseAt, timeResponse } from "@shared/analysis/timeResponse";
import { upFrom, upInts, type UPoly } from "@shared/analysis/upoly";
import { q } from "@shared/algebra/rational";
import { makeDoc } from "../../support/docBuilder";
import { runScipy, SCIPY_SCRIPT, SYSTEM_PYTHON, type ScipyAnswer, type ScipySystem } from "./scipyReference";

// Live comparison with Debian's python3-scipy 1.10 / python3-numpy 1.24 (general reference libraries):
// numpy.roots, scipy.signal.step / impulse (exact matrix-exponential simulation) and scipy.signal.freqresp.
// Tolerances: simple roots 1e-8 relative; roots of multiplicity m, where numpy's companion-matrix
// eigenvalues are only accurate to about eps^(1/m), 1e-4; responses 1e-8 of the response's scale; frequency
// response 1e-9 relative, Bode magnitude 1e-8 dB and phase 1e-7° (modulo 360).

interface Case {
  id: string;
  num: UPoly;
  den: UPoly;
  tEnd: number;
  repeated?: boolean;
}

/** Ascending rational coefficients from decimals, e.g. dec([4, 0.4, 1]) is s^2 + 0.4s + 4 exactly. */
const dec = (asc: number[]): UPoly => upFrom(asc.map((x) => q(Math.round(x * 1000), 1000)));

const CASES: Case[] = [
  { id: "first order 1/(s+1)", num: upInts([1]), den: upInts([1, 1]), tEnd: 8 },
  { id: "ζ = 0.5: 4/(s^2+2s+4)", num: upInts([4]), den: upInts([4, 2, 1]), tEnd: 10 },
  { id: "lightly damped ζ = 0.1: 100/(s^2+2s+100)", num: upInts([100]), den: upInts([100, 2, 1]), tEnd: 8 },
  { id: "very lightly damped ζ = 0.01: 1/(s^2+0.02s+1)", num: upInts([1]), den: dec([1, 0.02, 1]), tEnd: 40 },
  { id: "repeated real 1/(s+2)^2", num: upInts([1]), den: upInts([4, 4, 1]), tEnd: 8, repeated: true },
  { id: "triple 1/(s+1)^3", num: upInts([1]), den: upInts([1, 3, 3, 1]), tEnd: 15, repeated: true },
  { id: "zero (s+3)/((s+1)(s+2))", num: upInts([3, 1]), den: upInts([2, 3, 1]), tEnd: 8 },
  { id: "(s^2+2s+5)/((s+1)(s^2+s+4))", num: upInts([5, 2, 1]), den: upInts([4, 5, 2, 1]), tEnd: 15 },
  { id: "biproper (2s+1)/(s+3)", num: upInts([1, 2]), den: upInts([3, 1]), tEnd: 5 },
  { id: "repeated complex 1/(s^2+2s+5)^2", num: upInts([1]), den: upInts([25, 20, 14, 4, 1]), tEnd: 8, repeated: true },
  { id: "non-minimum phase (1-s)/((s+1)(s+2))", num: upInts([1, -1]), den: upInts([2, 3, 1]), tEnd: 8 },
  { id: "6/((s+1)(s+2)(s+3))", num: upInts([6]), den: upInts([6, 11, 6, 1]), tEnd: 10 },
  { id: "numeric poles 10/(s^3+6s^2+11s+16)", num: upInts([10]), den: upInts([16, 11, 6, 1]), tEnd: 12 },
  { id: "repeated complex (s^2+s+1)^2", num: upInts([1]), den: upInts([1, 2, 3, 2, 1]), tEnd: 20, repeated: true },
  { id: "real surds 1/(s^2+3s+1)", num: upInts([1]), den: upInts([1, 3, 1]), tEnd: 20 },
  { id: "fifth order (s+1)^5 + 1", num: upInts([2]), den: upInts([2, 5, 10, 10, 5, 1]), tEnd: 30 },
  { id: "zero at origin s/(s^2+s+1)", num: upInts([0, 1]), den: upInts([1, 1, 1]), tEnd: 12 },
  { id: "integrator 1/(s(s+1))", num: upInts([1]), den: upInts([0, 1, 1]), tEnd: 6 },
  { id: "unstable 1/(s-1)", num: upInts([1]), den: upInts([-1, 1]), tEnd: 4 },
  { id: "undamped 1/(s^2+4)", num: upInts([1]), den: upInts([4, 0, 1]), tEnd: 10 },
  { id: "repeated zeros and poles (s+1)^2/((s+2)^2(s+3))", num: upInts([1, 2, 1]), den: upInts([12, 16, 7, 1]), tEnd: 8, repeated: true },
  { id: "surd and rational 1/((s+1)(s^2+4s+2))", num: upInts([1]), den: upInts([2, 6, 5, 1]), tEnd: 15 },
];

/** The 12th-order loop, reduced by the reducer from a diagram: plant of order 12 in unity feedback. */
function twelfthOrder(): Case {
  const doc = makeDoc(
    [
      { id: "r", type: "input" },
      { id: "e", type: "sum", signs: ["+", "-"] },
      { id: "g1", type: "transfer", expr: "K/((s + 1)*(s + 2)*(s + 3)*(s + 4))" },
      { id: "g2", type: "transfer", expr: "1/((s^2 + s + 4)*(s^2 + 2*s + 9))" },
      { id: "g3", type: "transfer", expr: "1/((s^2 + 0.4*s + 16)*(s + 5)*(s + 6))" },
      { id: "b", type: "branch" },
      { id: "y", type: "output" },
    ],
    ["r->e:0", "e->g1", "g1->g2", "g2->g3", "g3->b", "b->y", "b->e:1"],
    { K: 20000 },
  );
  const p = prepared(doc);
  const { num, den } = transferAt(p.transfer, p.nominal);
  return { id: "12th-order loop (from a diagram)", num, den, tEnd: 20 };
}

const desc = (u: UPoly) => u.map(qToNumber).reverse();
const times = (tEnd: number) => Array.from({ length: 61 }, (_, i) => (tEnd * i) / 60);
const FREQS = Array.from({ length: 41 }, (_, i) => 10 ** (-2 + i / 10));

/** Greedy matching: every reference root has a distinct computed root within rtol·max(1, |root|). */
function sameRoots(got: [number, number][], want: [number, number][], rtol: number): boolean {
  if (got.length !== want.length) return false;
  const left = got.slice();
  return want.every(([re, im]) => {
    const i = left.findIndex(([a, b]) => Math.hypot(a - re, b - im) <= rtol * Math.max(1, Math.hypot(re, im)));
    if (i < 0) return false;
    left.splice(i, 1);
    return true;
  });
}

const wrapDeg = (d: number) => d - 360 * Math.round(d / 360);

describe("against scipy.signal and numpy (python3-scipy, python3-numpy)", { timeout: 180_000 }, () => {
  const all = [...CASES, twelfthOrder()];
  let answers: ScipyAnswer[] = [];
  beforeAll(async () => {
    const systems: ScipySystem[] = all.map((c) => ({ id: c.id, num: desc(c.num), den: desc(c.den), t: times(c.tEnd), w: FREQS }));
    answers = (await runScipy(systems)).results;
  }, 180_000);

  it("covers at least 20 systems, with repeated poles, lightly damped pairs and a 12th-order loop", () => {
    expect(answers).toHaveLength(all.length);
    expect(all.length).toBeGreaterThanOrEqual(20);
    expect(all.filter((c) => c.repeated).length).toBeGreaterThanOrEqual(3);
    expect(all.some((c) => c.den.length - 1 === 12)).toBe(true);
  });

  it("poles and zeros match numpy.roots (1e-8 simple, 1e-4 repeated)", () => {
    all.forEach((c, i) => {
      const rtol = c.repeated ? 1e-4 : 1e-8;
      expect(sameRoots(flatRoots(rootsOf(c.den)), answers[i].denRoots, rtol), `${c.id}: poles`).toBe(true);
      expect(sameRoots(flatRoots(rootsOf(c.num)), answers[i].numRoots, rtol), `${c.id}: zeros`).toBe(true);
    });
  });

  it("closed-form step and impulse responses match scipy.signal.step / impulse (1e-8 of the scale)", () => {
    all.forEach((c, i) => {
      const ts = times(c.tEnd);
      for (const kind of ["step", "impulse"] as const) {
        const ref = answers[i][kind];
        if (!ref) continue;
        const r = timeResponse(c.num, c.den, kind);
        const scale = Math.max(1, ...ref.map(Math.abs));
        ts.forEach((t, k) => {
          // scipy's impulse response at t = 0 is the value y(0+) too; both skip the δ terms
          expect(Math.abs(responseAt(r, t) - ref[k]), `${c.id}: ${kind} at t = ${t}`).toBeLessThanOrEqual(1e-8 * scale);
        });
      }
    });
  });

  it("frequency response matches scipy.signal.freqresp: T(jω) 1e-9, Bode dB 1e-8, phase 1e-7° mod 360", () => {
    all.forEach((c, i) => {
      const ref = answers[i].freq;
      if (!ref) return;
      const zpk = zpkOf(c.num, c.den);
      FREQS.forEach((w, k) => {
        const [re, im] = ratEvalComplex(c.num, c.den, [0, w]);
        const [rr, ri] = ref[k];
        const mag = Math.hypot(rr, ri);
        expect(Math.hypot(re - rr, im - ri), `${c.id} at ω = ${w}`).toBeLessThanOrEqual(1e-9 * Math.max(mag, 1e-300));
        const b = bodeAt(zpk, w);
        expect(Math.abs(b.magDb - 20 * Math.log10(mag)), `${c.id}: dB at ω = ${w}`).toBeLessThanOrEqual(1e-8);
        expect(Math.abs(wrapDeg(b.phaseDeg - (Math.atan2(ri, rr) * 180) / Math.PI)), `${c.id}: phase at ω = ${w}`).toBeLessThanOrEqual(1e-7);
      });
    });
  });

  it("degree 100: roots of a polynomial with pseudo-random integer coefficients match numpy.roots to 1e-9 relative", async () => {
    let seed = 12345;
    const next = () => ((seed = (seed * 1103515245 + 12345) % 2147483648) % 201) - 100;
    const den = upInts([...Array.from({ length: 100 }, next), 1]);
    const [ref] = (await runScipy([{ id: "deg100", num: [1], den: desc(den), t: [], w: [], rootsOnly: true }])).results;
    expect(ref.denRoots).toHaveLength(100);
    expect(sameRoots(flatRoots(rootsOf(den)), ref.denRoots, 1e-9)).toBe(true);
  });

  it("without scipy the script fails with an install hint, not a silent pass", () => {
    // -S drops site-packages, which is where Debian installs python3-scipy and python3-numpy
    const run = spawnSync(SYSTEM_PYTHON, ["-S", SCIPY_SCRIPT], { input: '{"systems": []}', encoding: "utf8" });
    expect(run.status).toBe(3);
    expect(run.stderr).toContain("apt-get install -y python3-scipy");
  });
});
