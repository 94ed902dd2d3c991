import { describe, expect, it } from "vitest";
import { STEP_LIST_LIMIT, STEP_WINDOW_RADIUS, stepWindow } from "@/features/editor/lib/stepWindow";

// Expected windows worked out by hand from the rule "current ± radius, shifted to stay in the list" (common practice for paged lists).
const size = 2 * STEP_WINDOW_RADIUS + 1;

describe("stepWindow", () => {
  it("lists every step of a short reduction", () => {
    expect(stepWindow(STEP_LIST_LIMIT, 7)).toEqual({ from: 0, to: STEP_LIST_LIMIT });
    expect(stepWindow(3, null)).toEqual({ from: 0, to: 3 });
  });

  it.each([
    [500, null, 0],
    [500, 0, 0],
    [500, 250, 250 - STEP_WINDOW_RADIUS],
    [500, 499, 500 - size],
    [500, 497, 500 - size],
  ])("of %i steps at %s starts at %i and always holds the current step", (count, current, from) => {
    const w = stepWindow(count, current);
    expect(w).toEqual({ from, to: from + size });
    if (current !== null) expect(current >= w.from && current < w.to).toBe(true);
  });
});
