// The one rule for spreading a parameter over its range, shared by sweeps and the editor's sliders. Kept free
// of imports so the client's main bundle can use it without the analysis code.

/** Logarithmic when both ends are positive and a decade or more apart. Example: isLogRange([0.4, 40]) === true. */
export const isLogRange = ([lo, hi]: readonly [number, number]): boolean => lo > 0 && hi / lo >= 10;

/** The value a fraction f ∈ [0, 1] of the way along the range, on its scale. Example: rangeValueAt([0.4, 40], 0.5) ≈ 4. */
export function rangeValueAt(range: readonly [number, number], f: number): number {
  const [lo, hi] = range;
  return isLogRange(range) ? lo * (hi / lo) ** f : lo + (hi - lo) * f;
}

/** Where a value lies along the range as a fraction (unclamped); inverse of rangeValueAt. Example: rangeFraction([0, 10], 2.5) === 0.25. */
export function rangeFraction(range: readonly [number, number], value: number): number {
  const [lo, hi] = range;
  if (!isLogRange(range)) return (value - lo) / (hi - lo);
  return value > 0 ? Math.log(value / lo) / Math.log(hi / lo) : 0;
}
