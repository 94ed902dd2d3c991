/** Axis tick step of 1, 2 or 5 × 10^k giving about `count` ticks over `span`. Example: niceStep(7, 5) === 2. */
export function niceStep(span: number, count: number): number {
  const raw = span / count;
  const mag = 10 ** Math.floor(Math.log10(raw));
  const f = raw / mag;
  return (f <= 1 ? 1 : f <= 2 ? 2 : f <= 5 ? 5 : 10) * mag;
}

/**
 * `x` rounded up to a whole number of about-fifth steps, so an axis ending there ends on a tick.
 * Example: roundAxisEnd(7.3) === 8, roundAxisEnd(0.0123) === 0.015.
 */
export function roundAxisEnd(x: number): number {
  if (!(x > 0) || !Number.isFinite(x)) return x;
  const step = niceStep(x, 5);
  // Rounding error in x / step must not add a whole step (10 / 2 computed as 5.0000000001).
  return Number((Math.ceil(x / step - 1e-9) * step).toPrecision(12));
}
