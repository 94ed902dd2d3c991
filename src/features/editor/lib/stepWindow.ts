/** Up to this many steps are listed in full; a longer reduction lists a window around the current step. */
export const STEP_LIST_LIMIT = 40;
/** Steps listed either side of the current one in a long reduction. */
export const STEP_WINDOW_RADIUS = 5;

/**
 * The half-open range [from, to) of step indices to list: every step when there are few, else the current step
 * ± STEP_WINDOW_RADIUS (shifted to stay inside the list), or the first steps when not stepping.
 * Example: stepWindow(500, 250) → { from: 245, to: 256 }.
 */
export function stepWindow(count: number, current: number | null): { from: number; to: number } {
  if (count <= STEP_LIST_LIMIT) return { from: 0, to: count };
  const size = 2 * STEP_WINDOW_RADIUS + 1;
  const from = Math.min(Math.max(0, (current ?? 0) - STEP_WINDOW_RADIUS), count - size);
  return { from, to: from + size };
}
