import { describe, expect, it } from "vitest";
import { sweepValues } from "@shared/analysis/sweep";
import { isLogRange } from "@shared/analysis/scale";
import { SLIDER_STEPS, sliderToValue, valueToSlider } from "@/features/editor/lib/sliderScale";

const positions = Array.from({ length: SLIDER_STEPS + 1 }, (_, i) => i);

describe("parameter slider scale", () => {
  it.each([
    [[0.4, 40], true],
    [[1, 10], true],
    [[1, 9.99], false],
    [[-1, 1], false],
    [[0, 100], false],
  ] as [[number, number], boolean][])("range %j is logarithmic: %s (the sweep's rule)", (range, log) => {
    expect(isLogRange(range)).toBe(log);
  });

  it.each([[[0.4, 40]], [[0.1, 30]], [[-2, 3]], [[0, 1]], [[5e-4, 2e3]]] as [[number, number]][])(
    "on %j follows the sweep's sample values to 4 digits and round-trips every position",
    (range) => {
      const reference = sweepValues(range, SLIDER_STEPS + 1);
      for (const i of positions) {
        const v = sliderToValue(range, i);
        expect(Math.abs(v - reference[i])).toBeLessThanOrEqual(Math.abs(reference[i]) * 5e-4 + 1e-12);
        expect(valueToSlider(range, v)).toBe(i);
      }
    },
  );

  it("puts a decade's geometric middle at the middle (common practice: log scale) and clamps outside values", () => {
    expect(sliderToValue([0.4, 40], SLIDER_STEPS / 2)).toBe(4);
    expect(valueToSlider([0.4, 40], 4)).toBe(SLIDER_STEPS / 2);
    expect(valueToSlider([0, 10], 2.5)).toBe(50);
    expect(valueToSlider([0.4, 40], 1000)).toBe(SLIDER_STEPS);
    expect(valueToSlider([0.4, 40], -3)).toBe(0);
    expect(valueToSlider([2, 2], 2)).toBe(0);
  });
});
