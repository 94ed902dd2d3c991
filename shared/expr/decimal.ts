/**
 * Exact rationals from decimal literals, read from the source text so 0.1 is exactly 1/10 (a float
 * would give 3602879701896397/36028797018963968).
 */
export interface Rational {
  num: bigint;
  den: bigint;
}

/** Decimal exponents beyond this are refused: they are never a real plant constant and cost big integers. */
export const MAX_DECIMAL_EXPONENT = 300;

/** Greatest common divisor of |a| and |b|. Example: gcdBig(12n, -18n) === 6n. */
export function gcdBig(a: bigint, b: bigint): bigint {
  let [x, y] = [a < 0n ? -a : a, b < 0n ? -b : b];
  while (y !== 0n) [x, y] = [y, x % y];
  return x;
}

/** A rational in lowest terms with a positive denominator. Example: rationalOf(4n, -6n) → -2/3. */
export function rationalOf(num: bigint, den: bigint): Rational {
  if (den === 0n) throw new RangeError("Zero denominator");
  const g = gcdBig(num, den) || 1n;
  const sign = den < 0n ? -1n : 1n;
  return { num: (sign * num) / g, den: (sign * den) / g };
}

/**
 * Exact value of a non-negative decimal literal, or undefined when its exponent is out of range.
 * Example: decimalToRational("2.50") → 5/2; decimalToRational("1e-3") → 1/1000.
 */
export function decimalToRational(text: string): Rational | undefined {
  const m = /^(\d*)(?:\.(\d*))?(?:[eE]([+-]?\d+))?$/.exec(text);
  if (!m || (m[1] === "" && (m[2] ?? "") === "")) throw new SyntaxError(`Not a decimal literal: ${text}`);
  const [whole, frac = "", expText = "0"] = [m[1], m[2], m[3]];
  const exponent = Number(expText) - frac.length;
  if (Math.abs(Number(expText)) > MAX_DECIMAL_EXPONENT) return undefined;
  const digits = BigInt(whole + frac || "0");
  const scale = 10n ** BigInt(Math.abs(exponent));
  return exponent >= 0 ? rationalOf(digits * scale, 1n) : rationalOf(digits, scale);
}

/** Whether a finite number's shortest decimal text is within the exponent range. Example: inDecimalRange(1e-306) === false. */
export const inDecimalRange = (x: number): boolean => Number.isFinite(x) && decimalToRational(String(Math.abs(x))) !== undefined;
