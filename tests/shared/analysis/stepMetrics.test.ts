import { describe, expect, it } from "vitest";
import { q } from "@shared/algebra/rational";
import { sampleResponse, stepMetrics } from "@shared/analysis/stepMetrics";
import { responseAt, timeResponse } from "@shared/analysis/timeResponse";
import { upFrom, upInts } from "@shared/analysis/upoly";

/** ωn²/(s² + 2ζωn s + ωn²) with ζ and ωn given as exact decimals (thousandths). */
function secondOrder(zeta: number, wn: number) {
  const [z, w] = [q(Math.round(zeta * 1000), 1000), q(Math.round(wn * 1000), 1000)];
  const w2 = q(w.n * w.n, w.d * w.d);
  const b = q(2n * z.n * w.n, z.d * w.d);
  return { num: upFrom([w2]), den: upFrom([w2, b, q(1)]) };
}

const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

describe("step metrics against the standard second-order formulas", () => {
  const cases: [number, number][] = [
    [0.1, 10],
    [0.3, 1],
    [0.5, 1],
    [0.5, 4],
    [0.7, 2],
    [0.05, 1],
  ];
  it.each(cases)("ζ = %s, ωn = %s: overshoot = 100·exp(−ζπ/√(1−ζ²)), peak time = π/(ωn√(1−ζ²)) (common practice, exact for this T)", (zeta, wn) => {
    const { num, den } = secondOrder(zeta, wn);
    const m = stepMetrics(timeResponse(num, den, "step"), 1);
    const root = Math.sqrt(1 - zeta * zeta);
    expect(rel(m.overshootPercent!, 100 * Math.exp((-zeta * Math.PI) / root))).toBeLessThan(1e-9);
    expect(rel(m.peakTime!, Math.PI / (wn * root))).toBeLessThan(1e-9);
    expect(m.finalValue).toBe(1);
  });

  it.each(cases)("ζ = %s, ωn = %s: settling time (2 %%) is near 4/(ζωn) (common practice approximation, within 35 %%)", (zeta, wn) => {
    const { num, den } = secondOrder(zeta, wn);
    const r = timeResponse(num, den, "step");
    const m = stepMetrics(r, 1);
    expect(rel(m.settlingTime!, 4 / (zeta * wn))).toBeLessThan(0.35);
    // it is the last exit from the band: inside just after, outside just before
    const ts = m.settlingTime!;
    expect(Math.abs(responseAt(r, ts) - 1)).toBeCloseTo(0.02, 9);
    for (let t = ts + 1e-6; t < ts + 20 / (zeta * wn); t += 0.01 / wn) expect(Math.abs(responseAt(r, t) - 1)).toBeLessThanOrEqual(0.02 + 1e-12);
  });

  it("first order a/(s+a): rise time 10–90 % = ln 9 / a, settling (2 %) = ln 50 / a, no overshoot (common practice)", () => {
    const m = stepMetrics(timeResponse(upInts([3]), upInts([3, 1]), "step"), 1);
    expect(rel(m.riseTime!, Math.log(9) / 3)).toBeLessThan(1e-12);
    expect(rel(m.settlingTime!, Math.log(50) / 3)).toBeLessThan(1e-12);
    expect(m.overshootPercent).toBe(0);
    expect(m.peakTime).toBeNull();
  });

  it("a selectable band: 5 % settling of a/(s+a) is ln 20 / a (common practice)", () => {
    const m = stepMetrics(timeResponse(upInts([2]), upInts([2, 1]), "step"), 1, 0.05);
    expect(rel(m.settlingTime!, Math.log(20) / 2)).toBeLessThan(1e-12);
    expect(m.settlingBand).toBe(0.05);
  });

  it("negative final value: metrics taken on y/T(0): −2/(s^2 + s + 1) has the ζ = 1/2 overshoot 16.30 % (common practice)", () => {
    const r = timeResponse(upInts([-2]), upInts([1, 1, 1]), "step");
    const m = stepMetrics(r, -2);
    expect(rel(m.overshootPercent!, 100 * Math.exp(-Math.PI / Math.sqrt(3)))).toBeLessThan(1e-9);
    expect(m.finalValue).toBe(-2);
  });

  it("samples for plotting start at y(0+) and end at tEnd", () => {
    const pts = sampleResponse(timeResponse(upInts([1]), upInts([1, 1]), "step"), 5, 10);
    expect(pts).toHaveLength(11);
    expect(pts[0]).toEqual([0, 0]);
    expect(pts[10][0]).toBe(5);
    expect(pts[10][1]).toBeCloseTo(1 - Math.exp(-5), 14);
  });
});
