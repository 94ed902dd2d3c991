/** Statistics the benchmarks share. */

/** The middle value. Example: median([3, 1, 2]) === 2. */
export const median = (xs: number[]): number => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

/** Least-squares slope of log(time) against log(blocks): time ∝ blocks^k. Example: [(10, 1), (100, 100)] → 2. */
export function powerLawExponent(points: { blocks: number; ms: number }[]): number {
  const xs = points.map((p) => Math.log(p.blocks));
  const ys = points.map((p) => Math.log(p.ms));
  const mx = xs.reduce((a, b) => a + b, 0) / xs.length;
  const my = ys.reduce((a, b) => a + b, 0) / ys.length;
  const sxy = xs.reduce((a, x, i) => a + (x - mx) * (ys[i] - my), 0);
  const sxx = xs.reduce((a, x) => a + (x - mx) ** 2, 0);
  return sxy / sxx;
}
