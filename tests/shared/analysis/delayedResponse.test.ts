import { describe, expect, it } from "vitest";
import { join } from "node:path";
import { runPythonSync } from "../../support/python";
import { analyzeDocument } from "@shared/analysis/analyzeDiagram";
import type { Analysis } from "@shared/analysis/analyze";
import { simulateDelayed } from "@shared/analysis/delaySimulation";
import { AnalysisError } from "@shared/analysis/errors";

const REFERENCE = { file: join(__dirname, "../../reference/scipy_delay_sim.py") };

type Block = Record<string, unknown> & { id: string; type: string };
const doc = (blocks: Block[], wires: { from: string; to: string; port?: number }[], parameters: Record<string, number> = {}) => ({
  format: "loopwright-diagram",
  version: 1,
  parameters,
  blocks,
  wires,
});

/** Unity negative feedback: r → e → chain… → y, y back to e's minus port. */
function unityLoop(chain: Block[], parameters: Record<string, number> = {}) {
  const ids = ["e", ...chain.map((b) => b.id)];
  return doc(
    [{ id: "r", type: "input" }, { id: "e", type: "sum", signs: ["+", "-"] }, ...chain, { id: "y", type: "output" }],
    [
      { from: "r", to: "e", port: 0 },
      ...ids.slice(1).map((id, i) => ({ from: ids[i], to: id })),
      { from: ids[ids.length - 1], to: "y" },
      { from: ids[ids.length - 1], to: "e", port: 1 },
    ],
    parameters,
  );
}

function analysed(d: unknown): Analysis {
  const out = analyzeDocument(d);
  if (!out.ok) throw new Error(JSON.stringify(out.problems));
  return out.analysis;
}

/** The simulated samples against a fine-step simulation of the block diagram itself (RK4, h = 1 ms). */
function againstBlockSimulation(d: ReturnType<typeof doc>, signal: "step" | "ramp") {
  const a = analysed(d);
  const r = a.delayedResponses;
  if (!r) throw new Error("no delayed response");
  const ys = signal === "step" ? r.step : r.ramp;
  // Reference: tests/reference/scipy_delay_sim.py (scipy.signal.tf2ss per block, classical RK4, delay buffers).
  const ref = runPythonSync<{ y: number[] }>(REFERENCE, { doc: d, values: {}, input: "r", output: "y", signal, tEnd: r.t[r.t.length - 1], h: 1e-3, times: r.t }, 120_000);
  const scale = Math.max(...ref.y.map(Math.abs));
  const worst = Math.max(...ys.map((y, i) => Math.abs(y - ref.y[i])));
  return { a, r, worst, scale };
}

describe("time response with the dead time kept exactly (simulated)", () => {
  const firstOrder = (K: number) => unityLoop([{ id: "c", type: "gain", expr: String(K) }, { id: "d", type: "delay", expr: "0.5" }, { id: "G", type: "transfer", expr: "1/(s+1)" }]);

  it("is 0 before the dead time and K(1 − e^(−(t − T))) until 2T (common practice: the method of steps)", () => {
    const r = analysed(firstOrder(2)).delayedResponses;
    expect(r?.method).toBe("simulation");
    r?.t.forEach((t, i) => {
      if (t < 0.5) expect(r.step[i]).toBe(0);
      else if (t <= 1) expect(r.step[i]).toBeCloseTo(2 * (1 - Math.exp(-(t - 0.5))), 10);
    });
    expect(r?.t.filter((t) => t > 0.5 && t <= 1).length).toBeGreaterThan(10);
  });

  it("is a staircase for a gain with a dead time in the loop: y = K·Σ(−K)^i after each multiple of T (common practice)", () => {
    const r = analysed(unityLoop([{ id: "c", type: "gain", expr: "0.5" }, { id: "d", type: "delay", expr: "0.25" }])).delayedResponses;
    if (!r) throw new Error("no delayed response");
    const at = (t: number) => r.step[r.t.findIndex((x) => x >= t)];
    const stair = (k: number) => 0.5 * Array.from({ length: k }, (_, i) => (-0.5) ** i).reduce((x, y) => x + y, 0);
    [0.1, 0.3, 0.6, 0.8, 1.1].forEach((t) => expect(at(t)).toBeCloseTo(stair(Math.floor(t / 0.25)), 12));
  });

  it.each([
    ["a gain, a dead time and a first-order plant", firstOrder(2), "step"],
    ["a PI controller, a dead time and a second-order plant, step", unityLoop([
      { id: "C", type: "transfer", expr: "(0.8*s+0.5)/s" },
      { id: "d", type: "delay", expr: "0.3" },
      { id: "G", type: "transfer", expr: "1/(s^2+1.2*s+1)" },
    ]), "step"],
    ["the same loop, ramp", unityLoop([
      { id: "C", type: "transfer", expr: "(0.8*s+0.5)/s" },
      { id: "d", type: "delay", expr: "0.3" },
      { id: "G", type: "transfer", expr: "1/(s^2+1.2*s+1)" },
    ]), "ramp"],
    ["a biproper lead controller with the dead time in the sensor path", doc(
      [
        { id: "r", type: "input" }, { id: "e", type: "sum", signs: ["+", "-"] },
        { id: "C", type: "transfer", expr: "(s+2)/(s+5)" }, { id: "G", type: "transfer", expr: "4/(s*(s+3))" },
        { id: "d", type: "delay", expr: "0.2" }, { id: "y", type: "output" },
      ],
      [{ from: "r", to: "e", port: 0 }, { from: "e", to: "C" }, { from: "C", to: "G" }, { from: "G", to: "y" }, { from: "G", to: "d" }, { from: "d", to: "e", port: 1 }],
    ), "step"],
    ["two dead times, one inside an inner loop", doc(
      [
        { id: "r", type: "input" }, { id: "e", type: "sum", signs: ["+", "-"] }, { id: "C", type: "gain", expr: "1.5" },
        { id: "v", type: "sum", signs: ["+", "-"] }, { id: "M", type: "transfer", expr: "2/(s+2)" }, { id: "p", type: "branch" },
        { id: "di", type: "delay", expr: "0.1" }, { id: "P", type: "integrator" }, { id: "do", type: "delay", expr: "0.4" }, { id: "y", type: "output" },
      ],
      [
        { from: "r", to: "e", port: 0 }, { from: "e", to: "C" }, { from: "C", to: "v", port: 0 }, { from: "v", to: "M" }, { from: "M", to: "p" },
        { from: "p", to: "di" }, { from: "di", to: "v", port: 1 }, { from: "p", to: "P" }, { from: "P", to: "y" }, { from: "P", to: "do" }, { from: "do", to: "e", port: 1 },
      ],
    ), "step"],
  ] as const)("agrees with a fine-step simulation of the block diagram: %s", (_name, d, signal) => {
    const { worst, scale, r } = againstBlockSimulation(d, signal);
    expect(r.t.length).toBeGreaterThan(300);
    expect(worst).toBeLessThan(1e-5 * Math.max(1, scale));
  });

  it("gives step metrics of the delayed loop that match the fine-step simulation's samples", () => {
    const d = firstOrder(2);
    const a = analysed(d);
    const m = a.delayedResponses?.stepMetrics;
    // Reference: the overshoot and peak of the RK4 block simulation's samples (h = 1 ms), final value K/(1 + K).
    const times = Array.from({ length: 10001 }, (_, i) => i * 1e-3);
    const ref = runPythonSync<{ y: number[] }>(REFERENCE, { doc: d, values: {}, input: "r", output: "y", signal: "step", tEnd: 10, h: 1e-3, times }, 120_000);
    const peak = Math.max(...ref.y);
    expect(m?.overshootPercent).toBeCloseTo(100 * (peak / (2 / 3) - 1), 2);
    expect(m?.peakTime).toBeCloseTo(times[ref.y.indexOf(peak)], 2);
    // The Padé-3 model's overshoot differs from the exact one: the figure is not a copy of it.
    expect(Math.abs((m?.overshootPercent ?? 0) - (a.step.overshootPercent ?? 0))).toBeGreaterThan(0.01);
  });

  it("has no metrics when the delayed loop is unstable (K = 5 > 3.8069, the exact limit)", () => {
    const a = analysed(firstOrder(5));
    expect(a.delayedResponses?.stepMetrics).toBeNull();
    expect(a.notes).toContain("No step metrics with the exact dead time: the delayed closed loop is not stable.");
  });

  it("is absent for a diagram without dead times, whose closed form is already exact", () => {
    expect(analysed(unityLoop([{ id: "G", type: "transfer", expr: "2/(s+1)" }])).delayedResponses).toBeNull();
  });

  it("refuses a denominator whose every term carries a dead time, naming why", () => {
    expect(() => simulateDelayed([{ tau: 0, coeffs: [1] }], [{ tau: 0.5, coeffs: [1, 1] }], "step", 5)).toThrow(AnalysisError);
    expect(() => simulateDelayed([{ tau: 0, coeffs: [1] }], [{ tau: 0.5, coeffs: [1, 1] }], "step", 5)).toThrow(/depend on the future/);
  });
});
