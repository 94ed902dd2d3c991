// Own heuristic multivariate gcd on BigInt: nerdamer/mathjs are too slow and inexact for the reduction hot path.
import { checkClock } from "@shared/algebra/timeGuard";
import { zContentInt, zDivExact, zDivInt, zLeadNum, zMake, zNormSign, zScale, zAdd, zSub, type ZPoly, type ZRec } from "@shared/algebra/zpoly";

const ATTEMPTS = 6;

/**
 * Heuristic gcd (GCDHEU): evaluate the main variable at a large integer ξ, take the gcd of the images with `gcd`
 * (one variable fewer), rebuild a candidate from its ξ-adic digits and keep it only if it divides both inputs
 * exactly — so a returned value is always correct; null after a few unlucky ξ. Avoids the coefficient swell of
 * remainder sequences in several variables. Inputs: primitive in the same main variable.
 * Example: heuristicGcd((s+K)(s+1), (s+K)(s+2), zGcd) is s + K.
 */
export function heuristicGcd(a: ZRec, b: ZRec, gcd: (x: ZPoly, y: ZPoly) => ZPoly): ZPoly | null {
  const na = maxNorm(a);
  const nb = maxNorm(b);
  const bound = 2n * (na < nb ? na : nb) + 29n;
  const ratio = (n: bigint, p: ZPoly) => n / abs(zLeadNum(p));
  const ra = ratio(na, a);
  const rb = ratio(nb, b);
  let xi = max(min(bound, 99n * isqrt(bound)), 2n * min(ra, rb) + 2n);
  for (let i = 0; i < ATTEMPTS; i++) {
    checkClock();
    const h = gcd(evalAt(a, xi), evalAt(b, xi));
    const candidate = primitiveInMain(interpolate(h, xi, a.v), gcd);
    if (candidate !== null && zDivExact(a, candidate) !== null && zDivExact(b, candidate) !== null) return candidate;
    xi = (73794n * xi * isqrt(isqrt(xi))) / 27011n;
  }
  return null;
}

const abs = (x: bigint): bigint => (x < 0n ? -x : x);
const min = (x: bigint, y: bigint): bigint => (x < y ? x : y);
const max = (x: bigint, y: bigint): bigint => (x > y ? x : y);

/** Integer square root by Newton's iteration from a power-of-two start above the root. */
function isqrt(n: bigint): bigint {
  if (n < 2n) return n;
  let x = 1n << BigInt(Math.ceil(n.toString(2).length / 2));
  for (;;) {
    const y = (x + n / x) >> 1n;
    if (y >= x) return x;
    x = y;
  }
}

function maxNorm(a: ZPoly): bigint {
  if (typeof a === "bigint") return abs(a);
  let m = 0n;
  for (const c of a.c) m = max(m, maxNorm(c));
  return m;
}

/** a with its main variable replaced by ξ (Horner). */
function evalAt(a: ZRec, xi: bigint): ZPoly {
  let acc: ZPoly = 0n;
  for (let i = a.c.length - 1; i >= 0; i--) {
    checkClock();
    acc = zAdd(zScale(acc, xi), a.c[i]);
  }
  return acc;
}

/** Integer leaves reduced to the symmetric range (−ξ/2, ξ/2]. */
function symmetricMod(h: ZPoly, xi: bigint): ZPoly {
  if (typeof h === "bigint") {
    let r = h % xi;
    if (r > xi / 2n) r -= xi;
    else if (r <= -xi / 2n) r += xi;
    return r;
  }
  return zMake(h.v, h.c.map((c) => symmetricMod(c, xi)));
}

/** The polynomial in v whose value at ξ is h, read off from symmetric ξ-adic digits. */
function interpolate(h: ZPoly, xi: bigint, v: string): ZPoly {
  const digits: ZPoly[] = [];
  while (h !== 0n) {
    checkClock();
    const g = symmetricMod(h, xi);
    digits.push(g);
    const next = zDivInt(zSub(h, g), xi);
    if (next === null) throw new Error("internal: ξ-adic digit left a remainder");
    h = next;
  }
  return zMake(v, digits);
}

/** Content in the main variable removed, sign normalised; null when the candidate is a constant (caller retries). */
function primitiveInMain(p: ZPoly, gcd: (x: ZPoly, y: ZPoly) => ZPoly): ZPoly | null {
  if (typeof p === "bigint") return null;
  let c: ZPoly = 0n;
  for (const x of p.c) c = gcd(c, x);
  const q = zDivExact(p, c);
  return q === null ? null : zNormSign(zContentInt(q) === 1n ? q : (zDivInt(q, zContentInt(q)) as ZPoly));
}
