// Frequency response of a transfer with dead times kept: sampled where the phase of e^(−jωT) turns, unwrapped,
// and searched for crossings. Rational transfers keep their exact polynomial methods (margins.ts); e^(−jωT)
// has no polynomial form, so here every crossing is found by bisection on a grid fine enough for the phase.
import type { BodeData, Complex } from "@shared/analysis/frequency";

/** A frequency response ω ↦ F(jω) on ω > 0. */
export type Response = (w: number) => Complex;

const angle = (z: Complex) => Math.atan2(z[1], z[0]);
const magDb = (z: Complex) => 20 * Math.log10(Math.hypot(z[0], z[1]));
const MAX_POINTS = 6000;

/**
 * Log-spaced samples of F on [lo, hi], refined until no step turns the phase by more than π/8, the phase
 * unwrapped and aligned to `phase0` (degrees) at lo. Example: sampleResponse(e^(−jω), [0.1, 10], 0) ends near −573°.
 */
export function sampleResponse(F: Response, [lo, hi]: [number, number], phase0: number, perDecade = 50): BodeData & { values: Complex[] } {
  const decades = Math.log10(hi / lo);
  const n = Math.max(2, Math.round(decades * perDecade));
  let omega = Array.from({ length: n + 1 }, (_, i) => lo * 10 ** ((decades * i) / n));
  let values = omega.map(F);
  for (let pass = 0; pass < 12 && omega.length < MAX_POINTS; pass++) {
    const w2: number[] = [omega[0]];
    const v2: Complex[] = [values[0]];
    let refined = false;
    for (let i = 1; i < omega.length; i++) {
      let d = angle(values[i]) - angle(values[i - 1]);
      d -= 2 * Math.PI * Math.round(d / (2 * Math.PI));
      if (Math.abs(d) > Math.PI / 8 && w2.length + omega.length - i < MAX_POINTS) {
        const mid = Math.sqrt(omega[i - 1] * omega[i]);
        w2.push(mid);
        v2.push(F(mid));
        refined = true;
      }
      w2.push(omega[i]);
      v2.push(values[i]);
    }
    omega = w2;
    values = v2;
    if (!refined) break;
  }
  const phaseDeg: number[] = [];
  let prev = angle(values[0]);
  let acc = (phase0 * Math.PI) / 180;
  // Align the first angle with the given phase (a multiple of 2π apart).
  acc = prev + 2 * Math.PI * Math.round((acc - prev) / (2 * Math.PI));
  values.forEach((v, i) => {
    if (i > 0) {
      let d = angle(v) - prev;
      d -= 2 * Math.PI * Math.round(d / (2 * Math.PI));
      acc += d;
      prev = angle(v);
    }
    phaseDeg.push((acc * 180) / Math.PI);
  });
  return { omega, magDb: values.map(magDb), phaseDeg, values };
}

/** Bisection of a sign change of f on [a, b] (f(a)·f(b) ≤ 0), in log ω. */
export function bisect(f: (w: number) => number, a: number, b: number): number {
  let [x, y] = [Math.log(a), Math.log(b)];
  let fx = f(a);
  for (let i = 0; i < 80 && y - x > 1e-14; i++) {
    const m = (x + y) / 2;
    const fm = f(Math.exp(m));
    if (fm === 0) return Math.exp(m);
    if (Math.sign(fm) === Math.sign(fx)) [x, fx] = [m, fm];
    else y = m;
  }
  return Math.exp((x + y) / 2);
}

/** Frequencies on the samples where g changes sign, refined by bisection. */
export function signChanges(data: { omega: number[] }, sampled: number[], g: (w: number) => number): number[] {
  const out: number[] = [];
  for (let i = 1; i < sampled.length; i++) {
    if (sampled[i - 1] === 0) out.push(data.omega[i - 1]);
    else if (Math.sign(sampled[i - 1]) !== Math.sign(sampled[i]) && sampled[i] !== 0) out.push(bisect(g, data.omega[i - 1], data.omega[i]));
  }
  return out;
}

/**
 * Where the unwrapped phase crosses an odd multiple of 180°, refined by bisection on the phase continued from
 * the left sample. Example: e^(−jω)/(jω + 1) crosses −180° once below ω = 3.
 */
export function phaseCrossings(F: Response, data: BodeData): number[] {
  const out: number[] = [];
  for (let i = 1; i < data.omega.length; i++) {
    const [p0, p1] = [data.phaseDeg[i - 1], data.phaseDeg[i]];
    const k0 = Math.floor((p0 - 180) / 360);
    const k1 = Math.floor((p1 - 180) / 360);
    if (k0 === k1) continue;
    const level = 180 + 360 * Math.max(k0, k1);
    const phaseNear = (w: number) => {
      let d = angle(F(w)) - (p0 * Math.PI) / 180;
      d -= 2 * Math.PI * Math.round(d / (2 * Math.PI));
      return p0 + (d * 180) / Math.PI - level;
    };
    out.push(bisect(phaseNear, data.omega[i - 1], data.omega[i]));
  }
  return out;
}
