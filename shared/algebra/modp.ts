// Own modular polynomial code (gcd fast paths): nerdamer/mathjs are too slow and inexact for the reduction hot path.
import type { ZPoly } from "@shared/algebra/zpoly";

/**
 * Dense polynomials over Z/p with p < 2^26, so every product of two residues is exact in a double.
 * Coefficient lists are ASCENDING and trimmed (no zero last entry; [] is zero).
 * Example: gcdModP([p-1, 0, 1], [p-1, 1], p) is [p-1, 1] (x - 1 divides x^2 - 1).
 */
export type ModPoly = number[];

const primeCache: number[] = [];

/** The i-th prime below 2^26 counting downwards (generated on demand). Example: modPrime(0) === 67108859. */
export function modPrime(i: number): number {
  let n = primeCache.length ? primeCache[primeCache.length - 1] - 2 : 67108863;
  while (primeCache.length <= i) {
    if (isPrime(n)) primeCache.push(n);
    n -= 2;
  }
  return primeCache[i];
}

function isPrime(n: number): boolean {
  for (let d = 3; d * d <= n; d += 2) if (n % d === 0) return false;
  return true;
}

/**
 * a·b mod p for residues a, b. The product is exact in a double; its quotient is taken by a floating division and
 * corrected, several times faster than the `%` of doubles. Example: mulMod(3, 5, 7) === 1.
 */
export function mulMod(a: number, b: number, p: number): number {
  const x = a * b;
  const r = x - p * Math.floor(x / p);
  return r < 0 ? r + p : r >= p ? r - p : r;
}

/** Inverse of a non-zero residue. Example: invMod(3, 7) === 5. */
export function invMod(a: number, p: number): number {
  let [r0, r1, t0, t1] = [p, a, 0, 1];
  while (r1 !== 0) {
    const k = Math.floor(r0 / r1);
    [r0, r1] = [r1, r0 - k * r1];
    [t0, t1] = [t1, t0 - k * t1];
  }
  return t0 < 0 ? t0 + p : t0;
}

const SAFE = BigInt(Number.MAX_SAFE_INTEGER);

/** Residue of an integer in [0, p); one that fits a double is reduced as a double. Example: bigMod(-1n, 7) === 6. */
export function bigMod(a: bigint, p: number): number {
  const r = a <= SAFE && a >= -SAFE ? Number(a) % p : Number(a % BigInt(p));
  return r < 0 ? r + p : r;
}

function trim(a: ModPoly): ModPoly {
  while (a.length && a[a.length - 1] === 0) a.pop();
  return a;
}

/** Remainder of a by non-zero b. Example: remModP([0, 0, 1], [1, 1], 7) is [1] (x^2 mod x+1). */
export function remModP(a: ModPoly, b: ModPoly, p: number): ModPoly {
  const r = a.slice();
  const db = b.length - 1;
  const inv = invMod(b[db], p);
  for (let k = r.length - 1 - db; k >= 0; k--) {
    const t = mulMod(r[k + db], inv, p);
    if (t === 0) continue;
    for (let j = 0; j <= db; j++) {
      const x = r[k + j] - mulMod(t, b[j], p);
      r[k + j] = x < 0 ? x + p : x;
    }
  }
  r.length = Math.min(r.length, db);
  return trim(r);
}

/** Monic gcd over Z/p ([] when both are zero). Example: gcdModP([6, 1], [1, 1], 7) is [1, 1]. */
export function gcdModP(a: ModPoly, b: ModPoly, p: number): ModPoly {
  let x = trim(a.slice());
  let y = trim(b.slice());
  while (y.length) [x, y] = [y, remModP(x, y, p)];
  if (!x.length) return x;
  const inv = invMod(x[x.length - 1], p);
  return x.map((c) => mulMod(c, inv, p));
}

/**
 * Image mod p of a polynomial's coefficients in its main variable `v`, with every other variable replaced by
 * point(name). Example: evalModP(K*s + 1, "s", () => 2, 7) is [1, 2].
 */
export function evalModP(a: ZPoly, v: string, point: (name: string) => number, p: number): ModPoly {
  if (typeof a !== "bigint" && a.v === v) return trim(a.c.map((x) => evalFull(x, point, p)));
  return trim([evalFull(a, point, p)]);
}

function evalFull(a: ZPoly, point: (name: string) => number, p: number): number {
  if (typeof a === "bigint") return bigMod(a, p);
  const x = point(a.v);
  let acc = 0;
  for (let i = a.c.length - 1; i >= 0; i--) {
    acc = mulMod(acc, x, p) + evalFull(a.c[i], point, p);
    if (acc >= p) acc -= p;
  }
  return acc;
}
