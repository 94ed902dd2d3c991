// Own exact polynomial code on BigInt: nerdamer/mathjs are too slow and not exact enough for the reduction hot path.
import { bigGcd } from "@shared/algebra/rational";
import { checkClock } from "@shared/algebra/timeGuard";

/**
 * Polynomials with integer coefficients in s and the diagram's parameters, stored recursively: an integer, or a
 * dense coefficient list (ASCENDING powers) in its main variable whose entries use only variables ordered below it.
 * Order: s is outermost, then parameters alphabetically (earlier name = outer). Canonical: lists have length ≥ 2
 * and a non-zero last entry (shorter ones collapse), so equal polynomials are structurally equal.
 * Example: 2*K*s + 3 is { v: "s", c: [3n, { v: "K", c: [0n, 2n] }] }.
 */
export type ZPoly = bigint | ZRec;
export interface ZRec {
  readonly v: string;
  readonly c: readonly ZPoly[];
}

export const S = "s";

/** True when variable a is ordered outside b (b null = a constant). Example: varOuter("s", "K") === true. */
export function varOuter(a: string, b: string | null): boolean {
  if (b === null) return true;
  if (a === b) return false;
  if (a === S) return true;
  if (b === S) return false;
  return a < b;
}

/** Main variable, null for an integer. Example: zVar(5n) === null. */
export const zVar = (a: ZPoly): string | null => (typeof a === "bigint" ? null : a.v);

/** Canonical polynomial from a coefficient list it takes ownership of. Example: zMake("s", [1n, 0n]) === 1n. */
export function zMake(v: string, c: ZPoly[]): ZPoly {
  let n = c.length;
  while (n > 0 && c[n - 1] === 0n) n--;
  if (n === 0) return 0n;
  if (n === 1) return c[0];
  if (n < c.length) c.length = n;
  return { v, c };
}

/** The variable itself. Example: zVarPoly("K") is K. */
export const zVarPoly = (v: string): ZPoly => ({ v, c: [0n, 1n] });

/** True when every entry is an integer (the fast dense path). Example: allInt([1n, 2n]) === true. */
export function allInt(c: readonly ZPoly[]): c is readonly bigint[] {
  for (const x of c) if (typeof x !== "bigint") return false;
  return true;
}

/** Sum. Example: zAdd(s, 1n) is s + 1. */
export function zAdd(a: ZPoly, b: ZPoly): ZPoly {
  if (typeof a === "bigint" && typeof b === "bigint") return a + b;
  if (a === 0n) return b;
  if (b === 0n) return a;
  const va = zVar(a);
  const vb = zVar(b);
  if (va === vb) {
    const A = (a as ZRec).c;
    const B = (b as ZRec).c;
    const c: ZPoly[] = new Array(Math.max(A.length, B.length));
    for (let i = 0; i < c.length; i++) {
      c[i] = i >= A.length ? B[i] : i >= B.length ? A[i] : zAdd(A[i], B[i]);
    }
    return zMake(va as string, c);
  }
  const [o, i] = va !== null && varOuter(va, vb) ? [a as ZRec, b] : [b as ZRec, a];
  const c = o.c.slice();
  c[0] = zAdd(c[0], i);
  return { v: o.v, c };
}

/** Negation. Example: zNeg(s) is -s. */
export function zNeg(a: ZPoly): ZPoly {
  return typeof a === "bigint" ? -a : { v: a.v, c: a.c.map(zNeg) };
}

/** Difference. Example: zSub(s, s) === 0n. */
export const zSub = (a: ZPoly, b: ZPoly): ZPoly => zAdd(a, zNeg(b));

/** Product with an integer. Example: zScale(s, 2n) is 2*s. */
export function zScale(a: ZPoly, k: bigint): ZPoly {
  if (k === 0n) return 0n;
  if (k === 1n) return a;
  return typeof a === "bigint" ? a * k : { v: a.v, c: a.c.map((x) => zScale(x, k)) };
}

/** Product. Example: zMul(s + 1, s - 1) is s^2 - 1. */
export function zMul(a: ZPoly, b: ZPoly): ZPoly {
  if (typeof a === "bigint") return typeof b === "bigint" ? a * b : zScale(b, a);
  if (typeof b === "bigint") return zScale(a, b);
  if (a.v === b.v) return zMake(a.v, convolve(a.c, b.c));
  const [o, i] = varOuter(a.v, b.v) ? [a, b] : [b, a];
  return { v: o.v, c: o.c.map((x) => zMul(x, i)) };
}

function convolve(A: readonly ZPoly[], B: readonly ZPoly[]): ZPoly[] {
  if (allInt(A) && allInt(B)) {
    const c: bigint[] = new Array(A.length + B.length - 1).fill(0n);
    for (let i = 0; i < A.length; i++) {
      checkClock();
      const ai = A[i];
      if (ai === 0n) continue;
      for (let j = 0; j < B.length; j++) c[i + j] += ai * B[j];
    }
    return c;
  }
  const c: ZPoly[] = new Array(A.length + B.length - 1).fill(0n);
  for (let i = 0; i < A.length; i++) {
    checkClock();
    if (A[i] === 0n) continue;
    for (let j = 0; j < B.length; j++) c[i + j] = zAdd(c[i + j], zMul(A[i], B[j]));
  }
  return c;
}

/** Non-negative integer power. Example: zPow(s + 1, 2) is s^2 + 2*s + 1. */
export function zPow(a: ZPoly, e: number): ZPoly {
  let result: ZPoly = 1n;
  let base = a;
  while (e > 0) {
    if (e & 1) result = zMul(result, base);
    e >>= 1;
    if (e > 0) base = zMul(base, base);
  }
  return result;
}

/** Structural (= mathematical) equality. Example: zEquals(zAdd(s, 0n), s) === true. */
export function zEquals(a: ZPoly, b: ZPoly): boolean {
  if (typeof a === "bigint" || typeof b === "bigint") return a === b;
  if (a.v !== b.v || a.c.length !== b.c.length) return false;
  for (let i = 0; i < a.c.length; i++) if (!zEquals(a.c[i], b.c[i])) return false;
  return true;
}

/** Degree in variable v (0 when v does not occur, -1 for zero). Example: zDeg(K*s^2 + 1, "K") === 1. */
export function zDeg(a: ZPoly, v: string): number {
  if (typeof a === "bigint") return a === 0n ? -1 : 0;
  if (a.v === v) return a.c.length - 1;
  if (varOuter(v, a.v)) return 0;
  let d = 0;
  for (const x of a.c) d = Math.max(d, zDeg(x, v));
  return d;
}

/** Coefficient list (ascending) in the outermost variable s. Example: zCoeffsS(2n) is [2n]. */
export const zCoeffsS = (a: ZPoly): readonly ZPoly[] => (typeof a !== "bigint" && a.v === S ? a.c : [a]);

/** Leading numeric coefficient in the recursive order (sign and scale normaliser). Example: zLeadNum(-2*s + 5) === -2n. */
export function zLeadNum(a: ZPoly): bigint {
  while (typeof a !== "bigint") a = a.c[a.c.length - 1];
  return a;
}

/** Sign-normalised: leading numeric coefficient ≥ 0. Example: zNormSign(-s) is s. */
export const zNormSign = (a: ZPoly): ZPoly => (zLeadNum(a) < 0n ? zNeg(a) : a);

/** Gcd of all integer coefficients (≥ 0). Example: zContentInt(4*s + 6) === 2n. */
export function zContentInt(a: ZPoly, acc = 0n): bigint {
  if (typeof a === "bigint") return bigGcd(acc, a);
  if (acc === 0n && allInt(a.c)) acc = smallest(a.c); // starting small makes Euclid on huge coefficients short
  for (const x of a.c) {
    acc = zContentInt(x, acc);
    if (acc === 1n) return 1n;
  }
  return acc;
}

function smallest(c: readonly bigint[]): bigint {
  let best = 0n;
  for (const x of c) {
    const m = x < 0n ? -x : x;
    if (m !== 0n && (best === 0n || m < best)) best = m;
  }
  return best;
}

/** Exact quotient by a non-zero integer, or null when some coefficient is not divisible. Example: zDivInt(4*s, 2n) is 2*s. */
export function zDivInt(a: ZPoly, k: bigint): ZPoly | null {
  if (k === 1n) return a;
  if (k === -1n) return zNeg(a);
  if (typeof a === "bigint") return a % k === 0n ? a / k : null;
  const c: ZPoly[] = [];
  for (const x of a.c) {
    const y = zDivInt(x, k);
    if (y === null) return null;
    c.push(y);
  }
  return { v: a.v, c };
}

/** Exact quotient a/b, or null when b does not divide a. Example: zDivExact(s^2 - 1, s - 1) is s + 1. */
export function zDivExact(a: ZPoly, b: ZPoly): ZPoly | null {
  if (b === 0n) throw new RangeError("zDivExact: division by the zero polynomial");
  if (a === 0n) return 0n;
  if (typeof b === "bigint") return zDivInt(a, b);
  if (typeof a === "bigint") return null;
  if (a.v !== b.v) {
    if (varOuter(b.v, a.v)) return null;
    const c: ZPoly[] = [];
    for (const x of a.c) {
      const y = zDivExact(x, b);
      if (y === null) return null;
      c.push(y);
    }
    return { v: a.v, c };
  }
  const Q = divCoeffs(a.c, b.c);
  return Q === null ? null : zMake(a.v, Q);
}

/** Exact quotient when it is known to exist (a bug otherwise). Example: zQuo(4n, 2n) === 2n. */
export function zQuo(a: ZPoly, b: ZPoly): ZPoly {
  const r = zDivExact(a, b);
  if (r === null) throw new Error("internal: expected an exact polynomial division");
  return r;
}

function divCoeffs(A: readonly ZPoly[], B: readonly ZPoly[]): ZPoly[] | null {
  const db = B.length - 1;
  const da = A.length - 1;
  if (da < db) return null;
  const R = A.slice();
  const Q: ZPoly[] = new Array(da - db + 1);
  const lb = B[db];
  if (allInt(R) && allInt(B)) {
    const r = R as bigint[];
    const lbi = lb as bigint;
    for (let k = da - db; k >= 0; k--) {
      const top = r[k + db];
      if (top % lbi !== 0n) return null;
      const t = top / lbi;
      Q[k] = t;
      if (t !== 0n) for (let j = 0; j < db; j++) r[k + j] -= t * B[j];
    }
    for (let j = 0; j < db; j++) if (r[j] !== 0n) return null;
    return Q;
  }
  for (let k = da - db; k >= 0; k--) {
    checkClock();
    const t = zDivExact(R[k + db], lb);
    if (t === null) return null;
    Q[k] = t;
    if (t !== 0n) for (let j = 0; j < db; j++) R[k + j] = zSub(R[k + j], zMul(t, B[j]));
  }
  for (let j = 0; j < db; j++) if (R[j] !== 0n) return null;
  return Q;
}

/** Derivative in s. Example: zDerivS(s^2 + K) is 2*s. */
export function zDerivS(a: ZPoly): ZPoly {
  const c = zCoeffsS(a);
  return zMake(S, c.slice(1).map((x, i) => zScale(x, BigInt(i + 1))));
}

/** True when no variable but s occurs (no parameter). Example: zOnlyS(2*s + 1) === true, zOnlyS(K*s) === false. */
export const zOnlyS = (a: ZPoly): boolean => typeof a === "bigint" || (a.v === S && allInt(a.c));

/** Names of the variables that occur. Example: zVars(K*s) is {"s", "K"}. */
export function zVars(a: ZPoly, into: Set<string> = new Set()): Set<string> {
  if (typeof a !== "bigint") {
    into.add(a.v);
    for (const x of a.c) zVars(x, into);
  }
  return into;
}
