// Size guards of the exact algebra, checked before a product or a power is formed: a short expression such as
// ((2^50)^50)^50 or (K + a + b + c + s)^50 would otherwise take minutes and gigabytes to expand.
import { AlgebraError } from "@shared/algebra/errors";
import type { Q } from "@shared/algebra/rational";
import { zDeg, zVars, type ZPoly } from "@shared/algebra/zpoly";

/** Largest size in bits of one exact number (numerator or denominator of a coefficient): about 4,900 decimal digits. */
export const NUMBER_BITS_LIMIT = 16_384;
/** Most terms a polynomial in s and the parameters may have. */
export const TERMS_LIMIT = 20_000;

interface Sized {
  k: Q;
  n: ZPoly;
  d: ZPoly;
}

const bitLength = (x: bigint): number => (x < 0n ? -x : x).toString(2).length;

/** Number of non-zero integer coefficients. Example: zTerms(2*K*s + 3) === 2. */
export function zTerms(z: ZPoly): number {
  if (typeof z === "bigint") return z === 0n ? 0 : 1;
  return z.c.reduce((n, c) => n + zTerms(c), 0);
}

/** Largest coefficient size in bits. Example: zBits(255*s + 1) === 8. */
export function zBits(z: ZPoly): number {
  if (typeof z === "bigint") return bitLength(z);
  return z.c.reduce((m, c) => Math.max(m, zBits(c)), 0);
}

const log2Binomial = (n: number, k: number): number => {
  let s = 0;
  for (let i = 1; i <= k; i++) s += Math.log2(n - k + i) - Math.log2(i);
  return s;
};

function refuseBits(bits: number): never {
  throw new AlgebraError("size-limit", `The expression's exact numbers would grow to about ${Math.round(bits)} bits; the limit is ${NUMBER_BITS_LIMIT} bits (about 4,900 decimal digits). Use a smaller power or scale the model.`);
}

function refuseTerms(terms: number): never {
  throw new AlgebraError("size-limit", `The expression would expand to about ${terms.toPrecision(3)} terms in s and its parameters; the limit is ${TERMS_LIMIT}. Use a smaller power, or give some parameters values.`);
}

/** Throws AlgebraError "size-limit" when a·b would exceed the limits. Example: checkProductSize(x, y) for small x, y returns. */
export function checkProductSize(a: Sized, b: Sized): void {
  for (const [x, y] of [[a.n, b.n], [a.d, b.d]] as const) {
    const [tx, ty] = [zTerms(x), zTerms(y)];
    if (tx * ty > TERMS_LIMIT) {
      const vars = new Set([...zVars(x), ...zVars(y)]);
      // Dense bound: the product cannot have more terms than its degree box holds.
      const box = [...vars].reduce((p, v) => p * (zDeg(x, v) + zDeg(y, v) + 1), 1);
      if (Math.min(tx * ty, box) > TERMS_LIMIT) refuseTerms(Math.min(tx * ty, box));
    }
    const bits = zBits(x) + zBits(y) + Math.log2(Math.max(1, Math.min(tx, ty)));
    if (bits > NUMBER_BITS_LIMIT) refuseBits(bits);
  }
  const kBits = Math.max(bitLength(a.k.n) + bitLength(b.k.n), bitLength(a.k.d) + bitLength(b.k.d));
  if (kBits > NUMBER_BITS_LIMIT) refuseBits(kBits);
}

/** Throws AlgebraError "size-limit" when a^e would exceed the limits. Example: checkPowerSize(2, 50) returns. */
export function checkPowerSize(a: Sized, e: number): void {
  for (const x of [a.n, a.d]) {
    const t = zTerms(x);
    const vars = [...zVars(x)];
    // Multinomial bound C(t + e − 1, e), and the degree box Π (e·deg_v + 1), whichever is smaller (as log2).
    const log2Terms = Math.min(log2Binomial(t + e - 1, e), vars.reduce((s, v) => s + Math.log2(e * zDeg(x, v) + 1), 0));
    if (log2Terms > Math.log2(TERMS_LIMIT)) refuseTerms(2 ** log2Terms);
    const bits = e * (zBits(x) + Math.log2(Math.max(1, t)));
    if (bits > NUMBER_BITS_LIMIT) refuseBits(bits);
  }
  const kBits = e * Math.max(bitLength(a.k.n), bitLength(a.k.d));
  if (kBits > NUMBER_BITS_LIMIT) refuseBits(kBits);
}
