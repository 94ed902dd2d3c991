/** Positions of a parameter slider (0…SLIDER_STEPS). */
export const SLIDER_STEPS = 200;

/** Logarithmic when both ends are positive and a decade or more apart — the rule of the sweep's sample values. */
export const isLogRange = ([lo, hi]: [number, number]): boolean => lo > 0 && hi / lo >= 10;

/** Four significant digits: slider values read as 3.981, not 3.9810717055349722. */
const tidy = (x: number): number => Number(x.toPrecision(4));

/** The value at slider position `step`. Example: sliderToValue([0.4, 40], 100) === 4. */
export function sliderToValue(range: [number, number], step: number, steps = SLIDER_STEPS): number {
  const [lo, hi] = range;
  const f = Math.min(Math.max(step / steps, 0), 1);
  return tidy(isLogRange(range) ? lo * (hi / lo) ** f : lo + (hi - lo) * f);
}

/** The nearest slider position of `value`, clamped to the range. Example: valueToSlider([0, 10], 2.5) === 50. */
export function valueToSlider(range: [number, number], value: number, steps = SLIDER_STEPS): number {
  const [lo, hi] = range;
  if (hi === lo || !Number.isFinite(value)) return 0;
  const f = isLogRange(range) ? (value > 0 ? Math.log(value / lo) / Math.log(hi / lo) : 0) : (value - lo) / (hi - lo);
  return Math.min(Math.max(Math.round(f * steps), 0), steps);
}
