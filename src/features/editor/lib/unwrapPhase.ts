// bodeAt adds up each root's angle, continuous for roots in the left half-plane; for a root in the right
// half-plane with Im > 0 that angle crosses atan2's branch cut at ω = Im and jumps by 360°. The plots take
// such jumps out here, the way numpy.unwrap does with a period of 360°.

/**
 * Phase samples in degrees with each step between neighbours larger than 180° in size brought into
 * [−180°, 180°] by adding a multiple of 360° to it and everything after it.
 * Example: unwrapDegrees([170, -170, -150]) → [170, 190, 210].
 */
export function unwrapDegrees(phases: readonly number[]): number[] {
  let shift = 0;
  return phases.map((p, i) => {
    if (i > 0) {
      const d = p - phases[i - 1];
      if (Math.abs(d) >= 180) {
        let wrapped = ((((d + 180) % 360) + 360) % 360) - 180;
        if (wrapped === -180 && d > 0) wrapped = 180;
        shift += wrapped - d;
      }
    }
    return p + shift;
  });
}
