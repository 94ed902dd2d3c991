// Own exact rationals on BigInt: nerdamer/mathjs are too slow and not exact enough for the reduction hot path.
import { AlgebraError } from "@shared/algebra/errors";
import { decimalToRational, type Rational } from "@shared/expr/decimal";

/** An exact rational: den > 0, gcd(|num|, den) = 1. Example: { n: -5n, d: 2n } is -5/2. */
export interface Q {
  readonly n: bigint;
  readonly d: bigint;
}

const SAFE = 9007199254740991n;

/** Bits of |x|, or one more (a double's logarithm where the double is finite: far cheaper than printing it). */
function bitLength(x: bigint): number {
  if (x < 0n) x = -x;
  const approx = Number(x);
  return approx < Infinity ? Math.floor(Math.log2(approx)) + 1 : x.toString(16).length * 4;
}

/**
 * Non-negative gcd of two integers. Large ones by Lehmer's method: Euclid's steps are run on the leading 48 bits
 * in doubles while they are sure to match the full numbers' (Knuth's Algorithm L), then applied to the BigInts at
 * once as one 2×2 matrix: a few BigInt products replace dozens of BigInt divisions (printing a 500-block result
 * takes a gcd of hundreds-of-digit numbers per coefficient). Example: bigGcd(-12n, 18n) === 6n.
 */
export function bigGcd(a: bigint, b: bigint): bigint {
  if (a < 0n) a = -a;
  if (b < 0n) b = -b;
  if (a < b) [a, b] = [b, a];
  while (b !== 0n) {
    if (a <= SAFE) return BigInt(numGcd(Number(a), Number(b)));
    const shift = BigInt(bitLength(a) - 48); // leading bits < 2^48: every sum and product below stays exact
    let x = Number(a >> shift);
    let y = Number(b >> shift);
    let [A, B, C, D] = [1, 0, 0, 1];
    while (y + C !== 0 && y + D !== 0) {
      const q = Math.floor((x + A) / (y + C));
      if (q !== Math.floor((x + B) / (y + D))) break;
      [A, C] = [C, A - q * C];
      [B, D] = [D, B - q * D];
      [x, y] = [y, x - q * y];
    }
    if (B === 0) [a, b] = [b, a % b]; // no step was sure: one full division
    else [a, b] = [BigInt(A) * a + BigInt(B) * b, BigInt(C) * a + BigInt(D) * b];
  }
  return a;
}

function numGcd(a: number, b: number): number {
  while (b !== 0) [a, b] = [b, a % b];
  return a;
}

/** The normalised rational n/d. Example: q(4n, -6n) is -2/3; q(3) is 3. */
export function q(n: bigint | number, d: bigint | number = 1n): Q {
  let nn = BigInt(n);
  let dd = BigInt(d);
  if (dd === 0n) throw new AlgebraError("division-by-zero", "A rational number with denominator 0 was built.");
  if (dd < 0n) [nn, dd] = [-nn, -dd];
  if (dd === 1n) return { n: nn, d: 1n };
  const g = bigGcd(nn, dd);
  return g === 1n ? { n: nn, d: dd } : { n: nn / g, d: dd / g };
}

export const qZero: Q = { n: 0n, d: 1n };
export const qOne: Q = { n: 1n, d: 1n };

/** Sum. Example: qAdd(q(1,2), q(1,3)) is 5/6. */
export function qAdd(a: Q, b: Q): Q {
  if (a.d === 1n && b.d === 1n) return { n: a.n + b.n, d: 1n };
  return q(a.n * b.d + b.n * a.d, a.d * b.d);
}

/** Difference. Example: qSub(q(1), q(1,2)) is 1/2. */
export function qSub(a: Q, b: Q): Q {
  return qAdd(a, qNeg(b));
}

/** Product. Example: qMul(q(2,3), q(3,4)) is 1/2. */
export function qMul(a: Q, b: Q): Q {
  // Cross gcds only: a.n/a.d and b.n/b.d are already in lowest terms, and a denominator 1 needs none.
  const g1 = b.d === 1n ? 1n : bigGcd(a.n, b.d);
  const g2 = a.d === 1n ? 1n : bigGcd(b.n, a.d);
  const n = (g1 === 1n ? a.n : a.n / g1) * (g2 === 1n ? b.n : b.n / g2);
  const d = (g2 === 1n ? a.d : a.d / g2) * (g1 === 1n ? b.d : b.d / g1);
  return { n, d };
}

/** Quotient; throws AlgebraError "division-by-zero" for b = 0. Example: qDiv(q(1), q(2)) is 1/2. */
export function qDiv(a: Q, b: Q): Q {
  return qMul(a, qInv(b));
}

/** Reciprocal; throws for 0. Example: qInv(q(-2,3)) is -3/2. */
export function qInv(a: Q): Q {
  if (a.n === 0n) throw new AlgebraError("division-by-zero", "Division by the number 0.");
  return a.n < 0n ? { n: -a.d, d: -a.n } : { n: a.d, d: a.n };
}

/** Negation. Example: qNeg(q(1,2)) is -1/2. */
export function qNeg(a: Q): Q {
  return { n: -a.n, d: a.d };
}

/** Integer power (negative exponents invert). Example: qPow(q(2,3), 2) is 4/9. */
export function qPow(a: Q, e: number): Q {
  if (e < 0) return qPow(qInv(a), -e);
  const k = BigInt(e);
  return { n: a.n ** k, d: a.d ** k };
}

export const qIsZero = (a: Q): boolean => a.n === 0n;
export const qIsOne = (a: Q): boolean => a.n === 1n && a.d === 1n;
export const qEquals = (a: Q, b: Q): boolean => a.n === b.n && a.d === b.d;
/** -1, 0 or 1. Example: qSign(q(-1,3)) === -1. */
export const qSign = (a: Q): number => (a.n > 0n ? 1 : a.n < 0n ? -1 : 0);

/**
 * Exact value of a decimal, exponent or fraction literal (decimals via the expression parser's reader).
 * Example: qFromString("0.1") is 1/10, qFromString("-2.5e-3") is -1/400, qFromString("3/4") is 3/4.
 */
export function qFromString(text: string): Q {
  const t = text.trim();
  const bad = (why: string) => new AlgebraError("bad-number", `"${text}" ${why}`, text);
  const frac = /^([+-]?\d+)\/(\d+)$/.exec(t);
  if (frac) {
    if (BigInt(frac[2]) === 0n) throw bad("has denominator 0.");
    return q(BigInt(frac[1]), BigInt(frac[2]));
  }
  const negative = t.startsWith("-");
  let r: Rational | undefined;
  try {
    r = decimalToRational(/^[+-]/.test(t) ? t.slice(1) : t);
  } catch {
    throw bad("is not a number: write an integer, a decimal, 1e-3 or p/q.");
  }
  if (!r) throw bad("has an exponent out of range.");
  return q(negative ? -r.num : r.num, r.den);
}

/** Exact text: integer or p/q. Example: qToString(q(-5,2)) === "-5/2", qToString(q(3)) === "3". */
export function qToString(a: Q): string {
  return a.d === 1n ? a.n.toString() : `${a.n}/${a.d}`;
}

/** The exact rational value of a finite double (its binary mantissa times a power of 2). Example: qFromDouble(0.75) is 3/4. */
export function qFromDouble(x: number): Q {
  if (!Number.isFinite(x)) throw new RangeError(`qFromDouble of ${x}`);
  if (x === 0) return { n: 0n, d: 1n };
  const view = new DataView(new ArrayBuffer(8));
  view.setFloat64(0, x);
  const hi = view.getUint32(0);
  const biased = (hi >>> 20) & 0x7ff;
  const mantissa = (BigInt(hi & 0xfffff) << 32n) | BigInt(view.getUint32(4));
  const m = biased === 0 ? mantissa : mantissa | (1n << 52n); // subnormals have no hidden bit
  const e = (biased === 0 ? 1 : biased) - 1075;
  const signed = x < 0 ? -m : m;
  return e >= 0 ? q(signed << BigInt(e)) : q(signed, 1n << BigInt(-e));
}

/** Nearest double (huge num/den are scaled first so the ratio stays finite). Example: qToNumber(q(1,4)) === 0.25. */
export function qToNumber(a: Q): number {
  const n = Number(a.n);
  const d = Number(a.d);
  if (Number.isFinite(n) && Number.isFinite(d)) return n / d;
  // Each part cut to its top 64 bits on its own, so a ratio far from 1 keeps its digits; the scale 2^e is applied
  // in two halves, so neither factor overflows or underflows before the product does.
  const sn = Math.max(0, bitLength(a.n) - 64);
  const sd = Math.max(0, bitLength(a.d) - 64);
  const e = sn - sd;
  return (Number(a.n >> BigInt(sn)) / Number(a.d >> BigInt(sd))) * 2 ** Math.trunc(e / 2) * 2 ** (e - Math.trunc(e / 2));
}
