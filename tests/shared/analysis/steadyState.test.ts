import { describe, expect, it } from "vitest";
import { limitAtZero, steadyState } from "@shared/analysis/steadyState";
import { upAdd, upInts, type UPoly } from "@shared/analysis/upoly";

/** Unity negative feedback around L = n/d: T = n/(d + n). */
const unity = (n: UPoly, d: UPoly) => ({ num: n, den: upAdd(d, n), loop: { num: n, den: d } });

describe("steady-state error and error constants (from memory: Nise, Control Systems Engineering, Table 7.2: type 0, 1, 2 against step, ramp, parabola)", () => {
  it("type 0: L = 10/((s+1)(s+2)): Kp = 5, e_step = 1/(1 + Kp) = 1/6, ramp and parabola errors infinite", () => {
    const u = unity(upInts([10]), upInts([2, 3, 1]));
    const ss = steadyState(u.num, u.den, "stable", u.loop);
    expect(ss.systemType).toBe(0);
    expect(ss.constants?.Kp).toMatchObject({ value: 5, exact: "5" });
    expect(ss.constants?.Kv).toMatchObject({ value: 0, exact: "0" });
    expect(ss.errors.step).toMatchObject({ value: 1 / 6, exact: "1/6" });
    expect(ss.errors.ramp.value).toBe("Infinity");
    expect(ss.errors.parabola.value).toBe("Infinity");
    expect(ss.errorsFromConstants?.step.exact).toBe("1/6");
    expect(ss.errorsFromConstants?.ramp.value).toBe("Infinity");
  });

  it("type 1: L = 10/(s(s+2)): Kv = 5, e_step = 0, e_ramp = 1/Kv = 1/5", () => {
    const u = unity(upInts([10]), upInts([0, 2, 1]));
    const ss = steadyState(u.num, u.den, "stable", u.loop);
    expect(ss.systemType).toBe(1);
    expect(ss.constants?.Kp.value).toBe("Infinity");
    expect(ss.constants?.Kv.exact).toBe("5");
    expect(ss.errors.step.exact).toBe("0");
    expect(ss.errors.ramp.exact).toBe("1/5");
    expect(ss.errors.parabola.value).toBe("Infinity");
    expect(ss.errorsFromConstants?.ramp.exact).toBe("1/5");
  });

  it("type 2: L = 4(s+1)/(s^2(s+2)): Ka = 2, e_parabola = 1/Ka = 1/2", () => {
    const u = unity(upInts([4, 4]), upInts([0, 0, 2, 1]));
    const ss = steadyState(u.num, u.den, "stable", u.loop);
    expect(ss.systemType).toBe(2);
    expect(ss.constants?.Ka.exact).toBe("2");
    expect(ss.errors.ramp.exact).toBe("0");
    expect(ss.errors.parabola.exact).toBe("1/2");
  });

  it("the final value theorem refuses an unstable T and says why (common practice: every pole of sY(s) in the open LHP)", () => {
    const ss = steadyState(upInts([1]), upInts([-1, 1]), "unstable", null);
    expect(ss.finalValue.value).toBeNull();
    expect(ss.finalValue.note).toMatch(/final value theorem does not apply/);
    expect(ss.errors.step.value).toBeNull();
    expect(ss.constants).toBeNull();
  });

  it("final and initial value theorems: T = (2s + 1)/(s + 4): y(∞) = 1/4, y(0+) = 2 (common practice)", () => {
    const ss = steadyState(upInts([1, 2]), upInts([4, 1]), "stable", null);
    expect(ss.finalValue.exact).toBe("1/4");
    expect(ss.initialValue.exact).toBe("2");
    expect(steadyState(upInts([0, 0, 1]), upInts([1, 1]), "stable", null).initialValue.value).toBeNull(); // improper
  });

  it("non-unity feedback: e = r − y differs from the unity-feedback equivalent (common practice: H ≠ 1)", () => {
    // G = 10/(s + 1), H = 1/2: T = 10/(s + 6), L = 5/(s + 1)
    const ss = steadyState(upInts([10]), upInts([6, 1]), "stable", { num: upInts([5]), den: upInts([1, 1]) });
    expect(ss.errors.step.exact).toBe("-2/3"); // 1 − 10/6
    expect(ss.errorsFromConstants?.step.exact).toBe("1/6"); // 1/(1 + 5)
  });

  it("limits at s → 0 are exact: s·1/s^2 is infinite with its sign, s^2·1/s is 0", () => {
    expect(limitAtZero(upInts([-1]), upInts([0, 0, 1]), 1)).toEqual({ kind: "infinite", sign: -1 });
    expect(limitAtZero(upInts([1]), upInts([0, 1]), 2)).toEqual({ kind: "finite", value: { n: 0n, d: 1n } });
  });
});
