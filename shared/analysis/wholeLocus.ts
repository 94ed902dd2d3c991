// The root locus over the whole gain range: 0 → ∞, and −∞ → 0 on request. The gains sampled are chosen from
// the problem (the decades around the landmarks and the slider range, out to where the branches run along
// their asymptotes), so the slider range is a part of the picture, not its edge.
import { ratDenominator } from "@shared/algebra/ratfn";
import { affineSplit, locusGeometry, type LocusGeometry } from "@shared/analysis/locusGeometry";
import type { PreparedAnalysis } from "@shared/analysis/prepare";
import { locusAt, sweepValues, type RootLocus } from "@shared/analysis/sweep";

/** Decades each side of the landmarks when K enters χ nonlinearly (no asymptote tells how far to go). */
const FALLBACK_DECADES = 3;

export interface WholeLocus {
  /** K from 0 to far out (values ascending from 0). */
  positive: RootLocus;
  /** K from 0 down to far out (values descending from 0), when asked or the slider range reaches below 0. */
  negative: RootLocus | null;
  /** Landmarks when χ is affine in K, else null. */
  geometry: LocusGeometry | null;
  /** Why there are no landmarks, in words; null when there are. */
  note: string | null;
}

/**
 * Gains of one sign to sample (signed, from 0 outwards): 0 (the open-loop poles), a log grid of n values
 * over the decades around the landmark gains and the slider range, and those gains themselves.
 * Example: gainGrid(null, [1, 10], 7, 1) is 0.001 … 10000 with 1 and 10 among them.
 */
export function gainGrid(geometry: LocusGeometry | null, range: [number, number], n: number, sign: 1 | -1): number[] {
  const marks = [
    ...range,
    ...(geometry ? [...geometry.breakaways, ...geometry.crossings].map((l) => l.gain.value) : []),
  ].filter((k) => k * sign > 0).map(Math.abs);
  const top = marks.length ? Math.max(...marks) : 1;
  const spread = 10 ** FALLBACK_DECADES;
  const hi = geometry ? Math.max(geometry.farGain ?? spread * top, 10 * top) : spread * top;
  const lo = Math.min(hi, ...marks) / spread;
  const grid = [...(geometry ? [0] : []), ...sweepValues([lo, hi], n), ...marks].sort((a, b) => a - b);
  return grid.filter((k, i) => i === 0 || k !== grid[i - 1]).map((k) => (k === 0 ? 0 : sign * k));
}

/**
 * The locus of the closed-loop poles over all gains of one parameter, the others at `base`.
 * Example: wholeLocus(p, "K", [0.4, 40], { n: 200, base: p.nominal }).geometry?.crossings[0].gain.text === "6"
 * for L = K/(s(s + 1)(s + 2)).
 */
export function wholeLocus(p: PreparedAnalysis, name: string, range: [number, number], opts: { n: number; base: Record<string, number>; negative?: boolean }): WholeLocus {
  const split = affineSplit(ratDenominator(p.transfer), name, opts.base);
  const geometry = split ? locusGeometry(split.A, split.B) : null;
  const side = (sign: 1 | -1) => locusAt(p, name, gainGrid(geometry, range, opts.n, sign), opts.base);
  const note = geometry
    ? null
    : `${name} does not enter the closed-loop denominator as A(s) + ${name}·B(s): the locus is sampled from ${FALLBACK_DECADES} decades below to ${FALLBACK_DECADES} decades above the slider range, without asymptotes, breakaway points or axis crossings.`;
  return { positive: side(1), negative: opts.negative || range[0] < 0 ? side(-1) : null, geometry, note };
}
