import { qToNumber } from "@shared/algebra/rational";
import { flatRoots, rootsOf } from "@shared/analysis/poles";
import { upDeg, upFrom, upZeroOrder, type UPoly } from "@shared/analysis/upoly";
import { ImplementError, type Subject } from "@shared/implement/errors";
import type { FloatTf } from "@shared/implement/ssToTf";
import type { ExactTf } from "@shared/implement/stateSpace";

type Complex = [number, number];

/** Real coefficients (DESCENDING, monic) of Π (z − r) over roots that come in conjugate pairs. */
function fromRoots(roots: Complex[]): number[] {
  let re = [1];
  let im = [0];
  for (const [a, b] of roots) {
    const nre = [...re, 0];
    const nim = [...im, 0];
    for (let k = 0; k < re.length; k++) {
      nre[k + 1] -= a * re[k] - b * im[k];
      nim[k + 1] -= a * im[k] + b * re[k];
    }
    re = nre;
    im = nim;
  }
  return re;
}

/** Roots other than s = 0, each mapped to z = e^(s·Ts). */
const mappedRoots = (u: UPoly, zerosAtOrigin: number, ts: number): Complex[] =>
  upDeg(u) - zerosAtOrigin < 1 ? [] : flatRoots(rootsOf(upFrom(u.slice(zerosAtOrigin)))).map(([re, im]) => [Math.exp(re * ts) * Math.cos(im * ts), Math.exp(re * ts) * Math.sin(im * ts)]);

const valueAtOne = (roots: Complex[]) => fromRoots(roots).reduce((s, c) => s + c, 0);

/**
 * The matched pole-zero equivalent of a proper transfer: every pole and finite zero s maps to z = e^(s·Ts), every
 * zero at infinity to z = −1, and the gain matches the low-frequency asymptote g₀·s^k (s = 0 after removing the
 * poles and zeros there, with s ≈ (z − 1)/Ts). Example (from memory): a/(s + a) → (1 − e^(−aTs))/2 · (z + 1)/(z − e^(−aTs)).
 */
export function matched(tf: ExactTf, ts: number, subject: Subject): FloatTf {
  const kz = upZeroOrder(tf.num);
  const kp = upZeroOrder(tf.den);
  const zerosZ = mappedRoots(tf.num, kz, ts);
  const polesZ = mappedRoots(tf.den, kp, ts);
  const atInfinity = upDeg(tf.den) - upDeg(tf.num);
  const numRest = [...zerosZ, ...Array.from({ length: atInfinity }, (): Complex => [-1, 0])];
  const restNum = valueAtOne(numRest);
  const restDen = valueAtOne(polesZ);
  if (Math.abs(restNum) < 1e-300 || Math.abs(restDen) < 1e-300) {
    throw new ImplementError(
      "bad-sample-time",
      `At Ts = ${ts} s a pole or zero of ${subject.what} on the imaginary axis at a multiple of 2π/Ts maps onto z = 1: choose another sample time.`,
      subject.id,
    );
  }
  const g0 = qToNumber(tf.num[kz]) / qToNumber(tf.den[kp]);
  const k = (g0 * ts ** (kp - kz) * restDen) / restNum;
  const origin = (m: number): Complex[] => Array.from({ length: m }, () => [1, 0]);
  return { numerator: fromRoots([...numRest, ...origin(kz)]).map((c) => k * c), denominator: fromRoots([...polesZ, ...origin(kp)]) };
}
