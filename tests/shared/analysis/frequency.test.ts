import { describe, expect, it } from "vitest";
import { runPythonSync } from "../../support/python";
import { bode, type Zpk } from "@shared/analysis/frequency";

/** Runs a script with Debian's Python (`/usr/bin/python3`, which has numpy and scipy) on a JSON input. */
function python<T>(script: string, input: unknown): T {
  return runPythonSync<T>({ code: script }, input);
}

describe("Bode phase", () => {
  it("keeps the phase of a right-half-plane pair continuous, as scipy.signal.bode draws it", () => {
    // T = 1/((s^2 − 0.4 s + 4)(s + 1)): poles 0.2 ± 1.99j (unstable) and −1. Reference: scipy.signal.bode (Debian
    // python3-scipy), which unwraps the angle of freqresp; the two may differ by a constant multiple of 360°.
    const zpk: Zpk = { gain: 1, zeros: [], poles: [[0.2, Math.sqrt(3.96)], [0.2, -Math.sqrt(3.96)], [-1, 0]] };
    const data = bode(zpk, [0.01, 100]);
    const ours = data.phaseDeg;
    expect(Math.max(...ours.slice(1).map((p, i) => Math.abs(p - ours[i])))).toBeLessThan(90); // a sharp but real turn, no 360° jump
    const ref = python<number[]>(
      `
import json, sys
from scipy import signal
w = json.load(sys.stdin)
_, _, phase = signal.bode(([1.0], [1.0, 0.6, 3.6, 4.0]), w=w)
print(json.dumps(phase.tolist()))
`,
      data.omega,
    );
    const offset = ours[0] - ref[0];
    expect(Math.abs(offset / 360 - Math.round(offset / 360))).toBeLessThan(1e-9);
    ours.forEach((p, i) => expect(p - offset).toBeCloseTo(ref[i], 6));
  });

  it("gives the continuous phase of a left-half-plane system", () => {
    // from memory: Ogata, Modern Control Engineering, Bode diagrams of first-order factors — 1/(jω + 1) has phase
    // −arctan ω, so 1/(s + 1)^3 falls smoothly from 0° towards −270°.
    const data = bode({ gain: 1, zeros: [], poles: [[-1, 0], [-1, 0], [-1, 0]] }, [0.001, 1000]);
    const ours = data.phaseDeg;
    ours.forEach((p, i) => expect(p).toBeCloseTo((-3 * Math.atan(data.omega[i]) * 180) / Math.PI, 9));
    expect(ours[ours.length - 1]).toBeLessThan(-269);
  });
});
