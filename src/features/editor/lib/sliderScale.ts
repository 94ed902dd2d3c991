import { rangeFraction, rangeValueAt } from "@shared/analysis/scale";

/** Positions of a parameter slider (0…SLIDER_STEPS). */
export const SLIDER_STEPS = 200;

/** Four significant digits: slider values read as 3.981, not 3.9810717055349722. */
const tidy = (x: number): number => Number(x.toPrecision(4));

/** The value at slider position `step`. Example: sliderToValue([0.4, 40], 100) === 4. */
export function sliderToValue(range: [number, number], step: number, steps = SLIDER_STEPS): number {
  return tidy(rangeValueAt(range, Math.min(Math.max(step / steps, 0), 1)));
}

/** The nearest slider position of `value`, clamped to the range. Example: valueToSlider([0, 10], 2.5) === 50. */
export function valueToSlider(range: [number, number], value: number, steps = SLIDER_STEPS): number {
  if (range[1] === range[0] || !Number.isFinite(value)) return 0;
  const f = rangeFraction(range, value);
  return Math.min(Math.max(Math.round(f * steps), 0), steps);
}
