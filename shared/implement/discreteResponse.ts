import { bode, frequencyRange } from "@shared/analysis/frequency";
import { zpkOf } from "@shared/analysis/loopAnalysis";
import type { FloatTf } from "@shared/implement/ssToTf";
import type { ExactTf } from "@shared/implement/stateSpace";

/** Continuous and discrete Bode data on one grid up to the Nyquist frequency π/Ts (null: |H| = 0 there). */
export interface DiscreteResponse {
  omega: number[];
  nyquist: number;
  continuous: { magDb: number[]; phaseDeg: number[] };
  discrete: { magDb: (number | null)[]; phaseDeg: (number | null)[] };
}

/** p(x) for DESCENDING real coefficients at a complex point. */
function evalDesc(c: readonly number[], x: number, y: number): [number, number] {
  let re = 0;
  let im = 0;
  for (const k of c) {
    const r = re * x - im * y + k;
    im = re * y + im * x;
    re = r;
  }
  return [re, im];
}

/**
 * H(e^(jωTs)) beside G(jω) on a log grid from below the slowest pole or zero to π/Ts. The discrete phase is
 * unwrapped along ω and started on the continuous one's branch, so the two curves overlay.
 * Example: discreteResponse(1/(s + 1), Tustin at 0.1 s, 0.1).nyquist ≈ 31.4 rad/s.
 */
export function discreteResponse(tf: ExactTf, discrete: FloatTf, ts: number, perDecade = 100): DiscreteResponse {
  const nyquist = Math.PI / ts;
  const zpk = zpkOf(tf.num.length ? tf.num : tf.den, tf.den);
  const lo = Math.min(frequencyRange(zpk)[0], nyquist / 100);
  const c = bode(tf.num.length ? zpk : { ...zpk, gain: 0 }, [lo, nyquist], perDecade);
  const magDb: (number | null)[] = [];
  const phaseDeg: (number | null)[] = [];
  let previous: number | null = null;
  c.omega.forEach((w, i) => {
    const [x, y] = [Math.cos(w * ts), Math.sin(w * ts)];
    const [nr, ni] = evalDesc(discrete.numerator, x, y);
    const [dr, di] = evalDesc(discrete.denominator, x, y);
    const mag = Math.hypot(nr, ni) / Math.hypot(dr, di);
    if (!(mag > 0) || !Number.isFinite(mag)) {
      magDb.push(null);
      phaseDeg.push(null);
      return;
    }
    let phase = ((Math.atan2(ni, nr) - Math.atan2(di, dr)) * 180) / Math.PI;
    const reference = previous ?? c.phaseDeg[i];
    phase += 360 * Math.round((reference - phase) / 360);
    previous = phase;
    magDb.push(20 * Math.log10(mag));
    phaseDeg.push(phase);
  });
  return { omega: c.omega, nyquist, continuous: { magDb: c.magDb, phaseDeg: c.phaseDeg }, discrete: { magDb, phaseDeg } };
}
