import { describe, expect, it } from "vitest";
import { nyquist } from "@shared/analysis/nyquist";
import { rootCounts } from "@shared/analysis/stability";
import { upAdd, upInts, upMul } from "@shared/analysis/upoly";

describe("Nyquist criterion Z = N + P", () => {
  it("K/(s − 1) with K = 2: one counter-clockwise encirclement cancels the open-loop RHP pole (common practice: closed loop s + 1)", () => {
    const n = nyquist(upInts([2]), upInts([-1, 1]));
    expect(n).toMatchObject({ encirclements: -1, openLoopRhpPoles: 1, closedLoopRhpPoles: 0, verdict: "stable" });
  });

  it("K/(s − 1) with K = 1/2: no encirclement, one RHP pole stays (closed loop s − 1/2)", () => {
    const n = nyquist(upInts([1]), upInts([-2, 2]));
    expect(n).toMatchObject({ encirclements: 0, openLoopRhpPoles: 1, closedLoopRhpPoles: 1, verdict: "unstable" });
  });

  it("10/(s+1)^3: two clockwise encirclements, two closed-loop RHP poles (Routh: unstable for K > 8)", () => {
    expect(nyquist(upInts([10]), upInts([1, 3, 3, 1]))).toMatchObject({ encirclements: 2, closedLoopRhpPoles: 2, verdict: "unstable" });
  });

  it("conditionally stable: L = 2(s+1)^2/s^3 has a negative gain margin but is stable (Routh on s^3 + 2s^2 + 4s + 2: K > 1/2)", () => {
    const n = nyquist(upInts([2, 4, 2]), upInts([0, 0, 0, 1]));
    expect(n).toMatchObject({ encirclements: 0, openLoopRhpPoles: 0, verdict: "stable" });
  });

  it("poles on the axis are passed on the right: 1/(s(s+1)) and 1/(s(s^2+1)) (indented contour, common practice)", () => {
    expect(nyquist(upInts([1]), upInts([0, 1, 1]))).toMatchObject({ encirclements: 0, verdict: "stable" });
    // s^3 + s + 1 has two RHP roots (Routh: 1, 0 → ε, …)
    expect(nyquist(upInts([1]), upInts([0, 1, 0, 1]))).toMatchObject({ closedLoopRhpPoles: 2, verdict: "unstable" });
  });

  it("the count read from the curve agrees with the exact closed-loop root count on a family of loops", () => {
    const plants = [upInts([1, 3, 3, 1]), upInts([0, 2, 3, 1]), upInts([-1, 0, 1]), upMul(upInts([4, 1, 1]), upInts([-2, 1]))];
    for (const den of plants) {
      for (const k of [1, 2, 3, 10, 30]) {
        const num = upInts([k]);
        const n = nyquist(num, den);
        if (n.encirclements === null) continue;
        expect(n.closedLoopRhpPoles, `K = ${k}`).toBe(rootCounts(upAdd(den, num)).rhp);
      }
    }
  });

  it("L through −1 has no encirclement count: L = 1/s^2 (closed loop s^2 + 1)", () => {
    expect(nyquist(upInts([1]), upInts([0, 0, 1]))).toMatchObject({ encirclements: null, verdict: "marginal" });
  });
});
