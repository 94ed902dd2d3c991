// Frequency response: values at s = jω, Bode data from the factored form (each factor's angle moves
// continuously, so their sum is the unwrapped phase) and an automatic decade range.
import { qToNumber } from "@shared/algebra/rational";
import type { UPoly } from "@shared/analysis/upoly";

export type Complex = [number, number];

/** Gain, zeros and poles (repeated by multiplicity) of a transfer function. */
export interface Zpk {
  gain: number;
  zeros: Complex[];
  poles: Complex[];
}

// Float coefficients per exact polynomial: margin and Nyquist searches evaluate the same one thousands of times.
const floats = new WeakMap<UPoly, number[]>();
const floatsOf = (u: UPoly): number[] => {
  let f = floats.get(u);
  if (!f) floats.set(u, (f = u.map(qToNumber)));
  return f;
};

/** p(s) at a complex point (Horner in doubles). Example: upEvalComplex(s^2 + 1, [0, 1]) is [0, 0]. */
export function upEvalComplex(u: UPoly, [x, y]: Complex): Complex {
  const c = floatsOf(u);
  let re = 0;
  let im = 0;
  for (let i = c.length - 1; i >= 0; i--) {
    const r = re * x - im * y + c[i];
    im = re * y + im * x;
    re = r;
  }
  return [re, im];
}

/** num(s)/den(s) at a complex point. Example: ratEvalComplex(1, s + 1, [0, 1]) is [0.5, −0.5]. */
export function ratEvalComplex(num: UPoly, den: UPoly, s: Complex): Complex {
  const [a, b] = upEvalComplex(num, s);
  const [c, d] = upEvalComplex(den, s);
  const m = c * c + d * d;
  return [(a * c + b * d) / m, (b * c - a * d) / m];
}

/**
 * Angle of jω − r, continuous in ω: atan2 for a root in the left half-plane; for one in the right half-plane
 * π − atan2(ω − Im, Re), which stays off atan2's branch cut where ω passes Im r.
 */
const rootAngle = (re: number, im: number, w: number) => (re > 0 ? Math.PI - Math.atan2(w - im, re) : Math.atan2(w - im, -re));

/** Magnitude in dB and phase in degrees (unwrapped along ω > 0) at s = jω. Example: 1/(s + 1) at ω = 1 → −3.01 dB, −45°. */
export function bodeAt(zpk: Zpk, w: number): { magDb: number; phaseDeg: number } {
  let logMag = Math.log10(Math.abs(zpk.gain));
  let phase = zpk.gain < 0 ? Math.PI : 0;
  for (const [re, im] of zpk.zeros) {
    logMag += Math.log10(Math.hypot(re, w - im));
    phase += rootAngle(re, im, w);
  }
  for (const [re, im] of zpk.poles) {
    logMag -= Math.log10(Math.hypot(re, w - im));
    phase -= rootAngle(re, im, w);
  }
  return { magDb: 20 * logMag, phaseDeg: (phase * 180) / Math.PI };
}

/**
 * A decade-aligned range one decade beyond the smallest and largest non-zero pole or zero magnitude (and
 * the crossover frequencies, when given); [0.1, 10] rad/s without any. Example: 1/(s + 1) → [0.01, 100].
 */
export function frequencyRange(zpk: Zpk, extra: number[] = []): [number, number] {
  const mags = [...zpk.zeros, ...zpk.poles].map(([re, im]) => Math.hypot(re, im)).concat(extra).filter((m) => m > 0 && Number.isFinite(m));
  if (!mags.length) return [0.1, 10];
  const lo = Math.floor(Math.log10(Math.min(...mags))) - 1;
  const hi = Math.ceil(Math.log10(Math.max(...mags))) + 1;
  return [10 ** lo, 10 ** Math.max(hi, lo + 2)];
}

export interface BodeData {
  omega: number[];
  magDb: number[];
  phaseDeg: number[];
}

/** Log-spaced Bode samples (perDecade points a decade, at most 2000). Example: bode(zpk, [0.01, 100], 50) → 201 points. */
export function bode(zpk: Zpk, [lo, hi]: [number, number], perDecade = 50): BodeData {
  const decades = Math.log10(hi / lo);
  const n = Math.min(2000, Math.max(2, Math.round(decades * perDecade)));
  const omega = Array.from({ length: n + 1 }, (_, i) => lo * 10 ** ((decades * i) / n));
  const at = omega.map((w) => bodeAt(zpk, w));
  return { omega, magDb: at.map((x) => x.magDb), phaseDeg: at.map((x) => x.phaseDeg) };
}
