import { describe, expect, it } from "vitest";
import { implementationView, prewarpFor, type ImplementRequest } from "@shared/implement/view";
import { delayedLoop } from "../../support/docBuilder";
import { reduced } from "../../support/reduced";

const loop = delayedLoop("Kd*(s + 1)", "0.1", "2/(s + 2)", { Kd: 3 });
const request = (over: Partial<ImplementRequest>): ImplementRequest => ({ block: "g", ts: 0.1, method: "zoh", prewarp: null, form: "controllable", ...over });
const ctx = { input: "r", output: "y", bandwidth: 4, values: { Kd: 3 } };

describe("the Implementation tab's view", () => {
  it("lists the blocks with a transfer and implements one: H(z⁻¹), difference equation, Bode overlay, realisation", () => {
    const view = implementationView(reduced(loop), request({}), ctx);
    if (!view.ok || !view.discrete.ok || !view.stateSpace.ok) throw new Error("not implemented");
    expect(view.candidates.map((c) => c.id)).toEqual(["c", "d", "g"]);
    // from memory: ZOH of a/(s + a) is (1 − e^(−aT))/(z − e^(−aT)); a = 2, T = 0.1.
    const e = Math.exp(-0.2);
    expect(view.discrete.equation.b[1]).toBeCloseTo(1 - e, 15);
    expect(view.discrete.equation.a[1]).toBeCloseTo(-e, 15);
    expect(view.discrete.response.nyquist).toBeCloseTo(Math.PI / 0.1, 12);
    expect(view.stateSpace).toMatchObject({ A: [[-2]], B: [[1]], C: [[2]], D: [[0]], basis: "controllable" });
    // 2π/0.1 ≈ 62.8 rad/s is over 15 times ωB = 4: no warning.
    expect(view.advice).toMatchObject({ warning: null, loop: "r → y" });
    expect(view.advice.ratio).toBeCloseTo((2 * Math.PI) / 0.1 / 4, 12);
  });

  it("a PD block: Tustin works, the realisation is refused on its own", () => {
    const view = implementationView(reduced(loop), request({ block: "c", method: "tustin" }), ctx);
    if (!view.ok) throw new Error(view.message);
    expect(view.discrete.ok).toBe(true);
    expect(view.stateSpace).toMatchObject({ ok: false, code: "improper" });
  });

  it("the pair with the dead time in its loop is refused, naming the dead-time block; the blocks stay listed", () => {
    const view = implementationView(reduced(loop), request({ block: null }), ctx);
    expect(view).toMatchObject({ ok: false, code: "dead-time" });
    expect(!view.ok && view.message).toMatch(/of block d\b/);
    expect(view.candidates).toHaveLength(3);
  });

  it("pre-warps at the bandwidth when none is given and it lies below Nyquist, else at half of Nyquist", () => {
    expect(prewarpFor(null, 4, 0.1)).toBe(4);
    expect(prewarpFor(null, 40, 0.1)).toBeCloseTo(Math.PI / 0.2, 12);
    expect(prewarpFor(2, 4, 0.1)).toBe(2);
    const view = implementationView(reduced(loop), request({ method: "prewarp" }), ctx);
    expect(view.ok && view.discrete.ok && view.discrete.prewarp).toBe(4);
  });
});
