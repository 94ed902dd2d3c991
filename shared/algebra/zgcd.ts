// Own exact gcd on BigInt: nerdamer/mathjs are too slow and not exact enough for the reduction hot path.
import { AlgebraError } from "@shared/algebra/errors";
import { heuristicGcd } from "@shared/algebra/heugcd";
import { bigGcd } from "@shared/algebra/rational";
import { bigMod, evalModP, gcdModP, invMod, modPrime, mulMod, type ModPoly } from "@shared/algebra/modp";
import { checkClock, limitText, withDeadline } from "@shared/algebra/timeGuard";
import {
  allInt, S, zContentInt, zDivExact, zEquals, zLeadNum, zMake, zMul, zNeg, zNormSign, zPow, zQuo, zSub, zVars, varOuter,
  type ZPoly, type ZRec,
} from "@shared/algebra/zpoly";

/**
 * Greatest common divisor in Z[s, params], sign-normalised (leading numeric coefficient > 0).
 * Strategy: split off contents recursively; one modular image at a random point answers the common
 * "coprime" case and the "one divides the other" case; otherwise a modular gcd with CRT (integers in s only)
 * or the heuristic gcd (with parameters), with the subresultant PRS as the last resort. Example: zGcd(s^2 - 1, 2*s + 2) is s + 1.
 */
export const zGcd = (a: ZPoly, b: ZPoly): ZPoly => gcdOf(a, b, null);

/** g = gcd(a, b) with its cofactors: a = g·ca, b = g·cb. */
export interface GcdSplit {
  g: ZPoly;
  ca: ZPoly;
  cb: ZPoly;
}

/**
 * The gcd and both cofactors. Where the gcd was checked by exact division (one input divides the other, the modular
 * gcd), that check's quotients are the cofactors, so callers that divide by the gcd next (the lowest terms of sums
 * and products) do not divide twice. Example: zGcdSplit(s^2 - 1, 2*s + 2) is { g: s + 1, ca: s - 1, cb: 2 }.
 */
export function zGcdSplit(a: ZPoly, b: ZPoly): GcdSplit {
  const known: Quotients = { a: null, b: null };
  const g = gcdOf(a, b, known);
  return { g, ca: known.a ?? zQuo(a, g), cb: known.b ?? zQuo(b, g) };
}

/** Quotients by the gcd found on the way (null: not found, the caller divides). */
interface Quotients {
  a: ZPoly | null;
  b: ZPoly | null;
}

function gcdOf(a: ZPoly, b: ZPoly, known: Quotients | null): ZPoly {
  if (a === 0n) return zNormSign(b);
  if (b === 0n) return zNormSign(a);
  if (typeof a === "bigint") return bigGcd(a, zContentInt(b));
  if (typeof b === "bigint") return bigGcd(b, zContentInt(a));
  if (a.v !== b.v) return varOuter(a.v, b.v) ? zGcd(zContent(a), b) : zGcd(a, zContent(b));
  if (zEquals(a, b)) return signed(a, 1n, 1n, known); // common in feedback: the loop's denominator meets itself
  // Probe before taking contents (each a gcd over every coefficient): most pairs a reduction meets are coprime
  // in the main variable, or one divides the other, and then the full contents are never needed.
  const swap = deg(a) < deg(b);
  const [hi, lo] = swap ? [b, a] : [a, b];
  const bound = probeDegree(hi, lo);
  if (bound === 0) {
    const g = commonContent(a, b);
    if (known && g === 1n) [known.a, known.b] = [a, b];
    return g;
  }
  const q = bound === deg(lo) ? zDivExact(hi, lo) : null;
  if (q !== null) return swap ? signed(lo, 1n, q, known) : signed(lo, q, 1n, known);
  const ca = zContent(a);
  const cb = zContent(b);
  const c = zGcd(ca, cb);
  // Only primitive inputs (every gain of the reducer) keep the check's quotients: otherwise contents mix in.
  const inner = ca === 1n && cb === 1n ? known : null;
  const g = gcdPrimitive(zQuo(a, ca) as ZRec, zQuo(b, cb) as ZRec, bound, inner);
  return inner ? signed(g, inner.a, inner.b, inner) : zNormSign(zMul(c, g));
}

/** g sign-normalised, the quotients qa, qb by g (null: unknown) recorded to match it. */
function signed(g: ZPoly, qa: ZPoly | null, qb: ZPoly | null, known: Quotients | null): ZPoly {
  const flip = zLeadNum(g) < 0n;
  if (known) [known.a, known.b] = flip ? [qa && zNeg(qa), qb && zNeg(qb)] : [qa, qb];
  return flip ? zNeg(g) : g;
}

/** gcd of all coefficients of a and b together (their gcd when it has degree 0 in the main variable). */
function commonContent(a: ZRec, b: ZRec): ZPoly {
  let g: ZPoly = 0n;
  for (const c of [a.c, b.c]) {
    for (const x of c) {
      g = zGcd(g, x);
      if (g === 1n) return 1n;
    }
  }
  return g;
}

/** Content in the main variable: gcd of the coefficients (sign-normalised). Example: zContent(K*s + K) is K. */
export function zContent(a: ZPoly): ZPoly {
  if (typeof a === "bigint") return a < 0n ? -a : a;
  if (allInt(a.c)) return zContentInt(a);
  let g: ZPoly = 0n;
  for (const x of a.c) {
    g = zGcd(g, x);
    if (g === 1n) return 1n;
  }
  return g;
}

/** Primitive part in the main variable. Example: zPrimitive(2*K*s + 4*K) is s + 2. */
export function zPrimitive(a: ZPoly): ZPoly {
  return zNormSign(zQuo(a, zContent(a)));
}

const deg = (a: ZRec): number => a.c.length - 1;

/**
 * gcd of primitive a, b; `bound` is a degree bound already probed on their multiples (-1: probe here). With `found`,
 * the quotients of a and b by the returned gcd where a check found them (else null).
 */
function gcdPrimitive(a: ZRec, b: ZRec, bound: number, found: Quotients | null = null): ZPoly {
  if (deg(a) < deg(b)) {
    const g = gcdPrimitive(b, a, bound, found);
    if (found) [found.a, found.b] = [found.b, found.a];
    return g;
  }
  if (found) [found.a, found.b] = [null, null];
  if (bound < 0) bound = probeDegree(a, b);
  const q = bound > 0 && bound === deg(b) ? zDivExact(a, b) : null;
  if (q !== null) {
    if (found) [found.a, found.b] = [q, 1n];
    return b;
  }
  const g = bound === 0 ? 1n : allInt(a.c) && allInt(b.c) ? modularGcd(a.v, a.c, b.c, found) : multivariateGcd(a, b);
  if (found && g === 1n) [found.a, found.b] = [a, b];
  return g;
}

/** The multivariate gcd fallback's own time budget, in ms (a reduction may give another: withGcdTimeLimit). */
export const GCD_TIME_LIMIT_MS = 5_000;
let gcdLimitMs = GCD_TIME_LIMIT_MS;
let inFallback = false;

/** Runs `work` with another time budget for each multivariate gcd. Example: withGcdTimeLimit(100, () => zGcd(a, b)). */
export function withGcdTimeLimit<T>(ms: number, work: () => T): T {
  const outer = gcdLimitMs;
  gcdLimitMs = ms;
  try {
    return work();
  } finally {
    gcdLimitMs = outer;
  }
}

/**
 * Heuristic gcd, then the subresultant PRS, under a time budget of their own (the recursion through images shares
 * the outermost one): their cost grows steeply with degrees and parameters, so one gcd could otherwise hang a
 * reduction between two of its steps.
 */
function multivariateGcd(a: ZRec, b: ZRec): ZPoly {
  const run = () => heuristicGcd(a, b, zGcd) ?? subresultantGcd(a, b);
  if (inFallback) return run();
  inFallback = true;
  try {
    return withDeadline(gcdLimitMs, () => gcdOverBudget(a, b), run);
  } finally {
    inFallback = false;
  }
}

function gcdOverBudget(a: ZRec, b: ZRec): AlgebraError {
  const names = [...zVars(b, zVars(a))].filter((v) => v !== S).sort();
  return new AlgebraError(
    "gcd-time-limit",
    `Cancelling the common factors of two polynomials in ${names.join(", ")} took longer than the gcd time budget of ` +
      `${limitText(gcdLimitMs)}. Simplify the expressions (lower powers, fewer symbolic parameters) or give parameters numeric values.`,
  );
}

let seed = 0x2545f491;
/** Deterministic pseudo-random residue in [1, p): results never depend on it, only speed. */
function nextRandom(p: number): number {
  seed = (Math.imul(seed, 1103515245) + 12345) >>> 0;
  return 1 + (seed % (p - 1));
}

/**
 * Degree of gcd(a, b) at one random image (an upper bound on the true degree), or -1 when the image lost a
 * leading coefficient. Valid because lc(gcd) divides lc(a), so a surviving lc(a) keeps the gcd's degree.
 */
function probeDegree(a: ZRec, b: ZRec): number {
  for (let attempt = 0; attempt < 3; attempt++) {
    const p = modPrime(attempt);
    const point = new Map<string, number>();
    const at = (v: string): number => {
      let x = point.get(v);
      if (x === undefined) point.set(v, (x = nextRandom(p)));
      return x;
    };
    const ia = evalModP(a, a.v, at, p);
    const ib = evalModP(b, b.v, at, p);
    if (ia.length === a.c.length && ib.length === b.c.length) return gcdModP(ia, ib, p).length - 1;
  }
  return -1;
}

/**
 * Small-primes modular gcd of primitive integer polynomials, checked by exact division. The images are combined
 * in the symmetric range, so a prime that leaves every coefficient unchanged means the lift has settled: only then
 * is a candidate built and tried (not once per prime).
 */
function modularGcd(v: string, A: readonly bigint[], B: readonly bigint[], found: Quotients | null): ZPoly {
  const lcA = A[A.length - 1];
  const lcB = B[B.length - 1];
  const gamma = bigGcd(lcA, lcB);
  let acc: bigint[] = [];
  let modulus = 1n;
  for (let i = 0; ; i++) {
    checkClock();
    const p = modPrime(i);
    const P = BigInt(p);
    if (lcA % P === 0n || lcB % P === 0n) continue;
    const img = gcdModP(A.map((x) => bigMod(x, p)), B.map((x) => bigMod(x, p)), p);
    if (img.length === 1) return 1n;
    if (acc.length && img.length > acc.length) continue; // unlucky prime
    const gp = bigMod(gamma, p);
    const scaled: ModPoly = img.map((x) => mulMod(x, gp, p));
    if (!acc.length || img.length < acc.length) {
      acc = scaled.map((x) => BigInt(x > p >> 1 ? x - p : x));
      modulus = P;
      continue;
    }
    const inv = BigInt(invMod(bigMod(modulus, p), p));
    const next = modulus * P;
    const half = next / 2n;
    let settled = true;
    for (let k = 0; k < acc.length; k++) {
      const t = ((((BigInt(scaled[k]) - acc[k]) % P) * inv) % P + P) % P;
      if (t === 0n) continue;
      settled = false;
      const x = acc[k] + modulus * t;
      acc[k] = x > half ? x - next : x;
    }
    modulus = next;
    if (!settled) continue;
    const candidate = zNormSign(zQuoContent(zMake(v, acc.slice())));
    const qa = zDivExact({ v, c: A }, candidate);
    const qb = qa === null ? null : zDivExact({ v, c: B }, candidate);
    if (qa !== null && qb !== null) {
      if (found) [found.a, found.b] = [qa, qb];
      return candidate;
    }
  }
}

const zQuoContent = (a: ZPoly): ZPoly => zQuo(a, zContentInt(a));

/** Pseudo-remainder lc(b)^(deg a − deg b + 1)·a mod b on coefficient lists of one variable. */
function prem(A: readonly ZPoly[], B: readonly ZPoly[]): ZPoly[] {
  const db = B.length - 1;
  const lb = B[db];
  let R = A.slice();
  let e = A.length - B.length + 1;
  while (R.length - 1 >= db) {
    checkClock();
    const dr = R.length - 1;
    const lr = R[dr];
    const k = dr - db;
    const next: ZPoly[] = new Array(dr);
    for (let i = 0; i < dr; i++) next[i] = zMul(R[i], lb);
    for (let j = 0; j < db; j++) next[k + j] = zSub(next[k + j], zMul(lr, B[j]));
    while (next.length && next[next.length - 1] === 0n) next.pop();
    R = next;
    e--;
  }
  if (e > 0 && R.length) {
    const f = zPow(lb, e);
    R = R.map((x) => zMul(x, f));
  }
  return R;
}

/** Subresultant PRS for primitive a, b in the same main variable, deg a ≥ deg b. */
function subresultantGcd(a: ZRec, b: ZRec): ZPoly {
  let A = a.c;
  let B = b.c;
  let g: ZPoly = 1n;
  let h: ZPoly = 1n;
  for (;;) {
    checkClock();
    const delta = A.length - B.length;
    const R = prem(A, B);
    if (R.length === 0) break;
    if (R.length === 1) return 1n;
    A = B;
    const divisor = zMul(g, zPow(h, delta));
    B = R.map((x) => zQuo(x, divisor));
    g = A[A.length - 1];
    if (delta > 0) h = zQuo(zPow(g, delta), zPow(h, delta - 1));
  }
  return zPrimitive(zMake(a.v, B.slice()));
}

/** Integer content times the sign of the leading coefficient. Example: zUnitContent(-4*s - 2) === -2n. */
export function zUnitContent(a: ZPoly): bigint {
  const c = zContentInt(a);
  return zLeadNum(a) < 0n ? -c : c;
}
