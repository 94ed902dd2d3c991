import { qDiv, qOne, qToNumber } from "@shared/algebra/rational";
import { exactValue } from "@shared/analysis/nominal";
import { upDeg, upLead, upScale } from "@shared/analysis/upoly";
import { bilinear } from "@shared/implement/bilinear";
import { ImplementError, type Subject } from "@shared/implement/errors";
import { matched } from "@shared/implement/matched";
import type { FloatTf } from "@shared/implement/ssToTf";
import { requireProper, type ExactTf } from "@shared/implement/stateSpace";
import { zoh } from "@shared/implement/zoh";

export const DISCRETISATION_METHODS = ["tustin", "prewarp", "zoh", "matched"] as const;
export type DiscretisationMethod = (typeof DISCRETISATION_METHODS)[number];

export interface DiscretiseOptions {
  /** Sample time in seconds, > 0. */
  ts: number;
  method: DiscretisationMethod;
  /** The pre-warp frequency in rad/s, 0 < ω < π/Ts (method "prewarp" only). */
  prewarp?: number;
}

/** Coefficients as floats in DESCENDING powers with the leading denominator coefficient 1; 0 is [0] over [1]. */
function descending(tf: ExactTf): FloatTf {
  const k = qDiv(qOne, upLead(tf.den));
  const desc = (u: ExactTf["num"]) => (u.length ? upScale(u, k).map(qToNumber).reverse() : [0]);
  return { numerator: desc(tf.num), denominator: desc(tf.den) };
}

const monic = ({ numerator, denominator }: FloatTf): FloatTf => ({
  numerator: numerator.map((c) => c / denominator[0]),
  denominator: denominator.map((c) => c / denominator[0]),
});

/** Checks Ts, and for "prewarp" ω, throwing "bad-sample-time" / "bad-prewarp" with the allowed range. */
export function checkSampling({ ts, method, prewarp }: DiscretiseOptions): void {
  if (!Number.isFinite(ts) || ts <= 0) throw new ImplementError("bad-sample-time", `The sample time must be a positive number of seconds, not ${ts}.`);
  if (method !== "prewarp") return;
  const nyquist = Math.PI / ts;
  if (prewarp === undefined || !Number.isFinite(prewarp) || prewarp <= 0 || prewarp >= nyquist) {
    throw new ImplementError(
      "bad-prewarp",
      `Pre-warping needs a frequency ω in rad/s with 0 < ω < π/Ts = ${Number(nyquist.toPrecision(6))} rad/s${prewarp === undefined ? "" : `, not ${prewarp}`}.`,
    );
  }
}

/**
 * The discrete equivalent of a continuous transfer at sample time Ts, in DESCENDING powers of z with a monic
 * denominator. Tustin and pre-warped Tustin are exact substitutions (improper transfers allowed, they come out
 * proper); zero-order hold and matched pole-zero need a proper transfer. Example: discretise(1/s, { ts: 0.1,
 * method: "tustin" }) is (0.05z + 0.05)/(z − 1).
 */
export function discretise(tf: ExactTf, opts: DiscretiseOptions, subject: Subject): FloatTf {
  checkSampling(opts);
  const { ts, method } = opts;
  if (!tf.num.length) return { numerator: [0], denominator: [1] };
  if (method === "tustin" || method === "prewarp") {
    const w = opts.prewarp ?? 0;
    const c = method === "tustin" ? qDiv(exactValue(2), exactValue(ts, "Ts")) : exactValue(w / Math.tan((w * ts) / 2), "c");
    const z = bilinear(tf, c);
    if (upDeg(z.den) < upDeg(z.num)) {
      throw new ImplementError("bad-sample-time", `A pole of ${subject.what} at s = ${qToNumber(c)} maps to z = ∞ under this substitution: choose another sample time.`, subject.id);
    }
    return descending(z);
  }
  requireProper(tf, subject, `it has no ${method === "zoh" ? "zero-order-hold" : "matched pole-zero"} equivalent (the difference equation would need future inputs)`);
  return monic(method === "zoh" ? zoh(tf, ts) : matched(tf, ts, subject));
}
