import { describe, expect, it } from "vitest";
import { bandwidth, delayMargin, margins, sensitivityPeak } from "@shared/analysis/margins";
import { ratEvalComplex } from "@shared/analysis/frequency";
import { upInts, type UPoly } from "@shared/analysis/upoly";

const rel = (a: number, b: number) => Math.abs(a - b) / Math.max(Math.abs(b), 1e-300);

/** Independent reference for Ms: a very dense log scan of |1/(1 + L(jω))|. */
function scanMs(num: UPoly, den: UPoly): number {
  let best = 0;
  for (let i = 0; i <= 200_000; i++) {
    const w = 10 ** (-3 + (6 * i) / 200_000);
    const [re, im] = ratEvalComplex(num, den, [0, w]);
    best = Math.max(best, 1 / Math.hypot(1 + re, im));
  }
  return best;
}

describe("gain and phase margins", () => {
  it("L = 2/(s+1)^3: phase crossover at √3 (3·atan √3 = 180°), gain margin 20·log10 4; phase margin 180° − 3·atan ωc with (1 + ωc²)^{3/2} = 2 (closed forms, common practice)", () => {
    const m = margins(upInts([2]), upInts([1, 3, 3, 1]));
    expect(rel(m.phaseCrossover!, Math.sqrt(3))).toBeLessThan(1e-12);
    expect(rel(m.gainMarginDb!, 20 * Math.log10(4))).toBeLessThan(1e-12);
    const wc = Math.sqrt(2 ** (2 / 3) - 1);
    expect(rel(m.gainCrossover!, wc)).toBeLessThan(1e-12);
    expect(rel(m.phaseMarginDeg!, 180 - (3 * Math.atan(wc) * 180) / Math.PI)).toBeLessThan(1e-12);
  });

  it("reported negative when the closed loop is unstable: L = 10/(s+1)^3 has gain margin 20·log10(8/10) < 0 (common practice)", () => {
    const m = margins(upInts([10]), upInts([1, 3, 3, 1]));
    expect(rel(m.gainMarginDb!, 20 * Math.log10(0.8))).toBeLessThan(1e-12);
    expect(m.phaseMarginDeg!).toBeLessThan(0);
  });

  it("no crossover gives null with the reason: L = 1/(s+1) never reaches −180° (common practice)", () => {
    const m = margins(upInts([1]), upInts([1, 1]));
    expect(m.gainMarginDb).toBeNull();
    expect(m.phaseCrossover).toBeNull();
    expect(m.notes.join(" ")).toMatch(/gain margin is infinite/);
    expect(m.gainCrossover).toBeNull(); // |L| = 1 only at ω = 0, which is not a finite ω > 0
  });

  it("several crossovers: the smallest |margin| is reported (conditionally stable L = 100(s+1)^2/s^3 crossing −180° at ω = 1, |L| = 200)", () => {
    const m = margins(upInts([100, 200, 100]), upInts([0, 0, 0, 1]));
    expect(m.phaseCrossovers.map((c) => c.omega)).toEqual([1]);
    expect(rel(m.gainMarginDb!, -20 * Math.log10(200))).toBeLessThan(1e-12);
  });

  it("phase margin lies in (−180°, 180°]: L = 4/s^3 has phase +90° at crossover, margin −90° (common practice)", () => {
    const m = margins(upInts([4]), upInts([0, 0, 0, 1]));
    expect(m.phaseMarginDeg).toBeCloseTo(-90, 10);
  });
});

describe("delay margin, sensitivity peak, bandwidth", () => {
  it("L = 1/s: phase margin 90° at ω = 1, delay margin π/2 (common practice: τ = PM/ωc)", () => {
    const m = margins(upInts([1]), upInts([0, 1]));
    expect(delayMargin(m.gainCrossovers)).toBeCloseTo(Math.PI / 2, 12);
  });

  it.each([
    ["2/(s+1)^3", upInts([2]), upInts([1, 3, 3, 1])],
    ["lightly damped 1/(s(s+0.1))·0.5", upInts([5]), upInts([0, 1, 10])],
    ["K/(s(s+1)(s+2)), K = 5", upInts([5]), upInts([0, 2, 3, 1])],
  ])("Ms of %s matches a dense scan of |1/(1 + L)| (common practice)", (_, num, den) => {
    const ms = sensitivityPeak(num, den)!;
    expect(rel(ms.value, scanMs(num, den))).toBeLessThan(1e-6);
  });

  it("Ms is null (infinite) when the closed loop has poles on the imaginary axis: L = 1/s^2", () => {
    expect(sensitivityPeak(upInts([1]), upInts([0, 0, 1]))).toBeNull();
  });

  it("bandwidth of 1/(s+1) is 1 rad/s; of the standard second order ωn·√(1 − 2ζ² + √(4ζ⁴ − 4ζ² + 2)) (common practice)", () => {
    expect(bandwidth(upInts([1]), upInts([1, 1]))).toBeCloseTo(1, 12);
    const [zeta, wn] = [0.5, 2];
    const bw = bandwidth(upInts([4]), upInts([4, 2, 1]))!;
    expect(rel(bw, wn * Math.sqrt(1 - 2 * zeta ** 2 + Math.sqrt(4 * zeta ** 4 - 4 * zeta ** 2 + 2)))).toBeLessThan(1e-12);
    expect(bandwidth(upInts([0, 1]), upInts([1, 1]))).toBeNull(); // T(0) = 0
  });
});
