/** Minimal complex arithmetic for the numeric reference methods (plain objects, no allocation tricks). */
export interface Complex {
  re: number;
  im: number;
}

export const cx = (re: number, im = 0): Complex => ({ re, im });
export const ZERO = cx(0);
export const ONE = cx(1);

export const cAdd = (a: Complex, b: Complex): Complex => cx(a.re + b.re, a.im + b.im);
export const cSub = (a: Complex, b: Complex): Complex => cx(a.re - b.re, a.im - b.im);
export const cMul = (a: Complex, b: Complex): Complex => cx(a.re * b.re - a.im * b.im, a.re * b.im + a.im * b.re);
export const cNeg = (a: Complex): Complex => cx(-a.re, -a.im);
export const cAbs = (a: Complex): number => Math.hypot(a.re, a.im);
export const cScale = (a: Complex, k: number): Complex => cx(a.re * k, a.im * k);

export function cDiv(a: Complex, b: Complex): Complex {
  const d = b.re * b.re + b.im * b.im;
  if (d === 0) throw new RangeError("complex division by zero");
  return cx((a.re * b.re + a.im * b.im) / d, (a.im * b.re - a.re * b.im) / d);
}

/** |a − b| ≤ rtol·max(|a|, |b|) + atol: relative agreement that still accepts two (near) zeros. */
export const cClose = (a: Complex, b: Complex, rtol: number, atol = 0): boolean =>
  cAbs(cSub(a, b)) <= rtol * Math.max(cAbs(a), cAbs(b)) + atol;

export const cText = (a: Complex): string => `${a.re.toPrecision(12)}${a.im < 0 ? "-" : "+"}${Math.abs(a.im).toPrecision(12)}i`;
