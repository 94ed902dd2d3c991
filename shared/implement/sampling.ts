/** Common practice: sample at 10 to 30 times the closed-loop bandwidth. */
export const SAMPLES_PER_BANDWIDTH = { low: 10, high: 30 } as const;

const shown = (x: number) => String(Number(x.toPrecision(4)));

/**
 * How Ts compares with the closed-loop bandwidth ωB (rad/s): the ratio ωs/ωB (ωs = 2π/Ts) and a warning when it
 * is below 10, with the Ts that would reach it. Example: samplingAdvice(0.5, 2, "r → y").warning says ωs/ωB = 6.28.
 */
export function samplingAdvice(ts: number, bandwidth: number | null, loop: string): { ratio: number | null; warning: string | null } {
  if (bandwidth === null || !(bandwidth > 0) || !Number.isFinite(bandwidth)) return { ratio: null, warning: null };
  const ratio = (2 * Math.PI) / ts / bandwidth;
  if (ratio >= SAMPLES_PER_BANDWIDTH.low) return { ratio, warning: null };
  const { low, high } = SAMPLES_PER_BANDWIDTH;
  const tsMax = (2 * Math.PI) / (low * bandwidth);
  return {
    ratio,
    warning: `Ts = ${shown(ts)} s is too large for the loop: the sampling frequency 2π/Ts = ${shown((2 * Math.PI) / ts)} rad/s is only ${shown(ratio)} times the closed-loop bandwidth ${shown(bandwidth)} rad/s of ${loop}. Common practice samples at ${low}–${high} times the bandwidth: Ts ≤ ${shown(tsMax)} s (${low}×) to ${shown((2 * Math.PI) / (high * bandwidth))} s (${high}×).`,
  };
}
