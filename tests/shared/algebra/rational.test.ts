import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { AlgebraError } from "@shared/algebra/errors";
import {
  bigGcd, q, qAdd, qDiv, qEquals, qFromString, qInv, qMul, qNeg, qPow, qSub, qToNumber, qToString, type Q,
} from "@shared/algebra/rational";
import { close } from "./support";

describe("exact rationals", () => {
  it.each([
    ["0.1", "1/10"],
    ["-2.5e-3", "-1/400"],
    ["3/4", "3/4"],
    ["6/4", "3/2"],
    ["1e3", "1000"],
    ["+.5", "1/2"],
    ["0", "0"],
    ["12.50", "25/2"],
  ])("qFromString(%s) = %s (common practice: decimal literals are exact)", (input, out) => {
    expect(qToString(qFromString(input))).toBe(out);
  });

  it.each(["", "abc", "1/0", "1.2.3", "--1", "e5"])("qFromString(%j) is refused with code bad-number", (input) => {
    expect(() => qFromString(input)).toThrow(AlgebraError);
    try {
      qFromString(input);
    } catch (e) {
      expect((e as AlgebraError).code).toBe("bad-number");
    }
  });

  it("arithmetic on a few hand-checked values (common practice)", () => {
    expect(qToString(qAdd(q(1, 2), q(1, 3)))).toBe("5/6");
    expect(qToString(qSub(q(1), q(1, 2)))).toBe("1/2");
    expect(qToString(qMul(q(2, 3), q(3, 4)))).toBe("1/2");
    expect(qToString(qDiv(q(1), q(-2)))).toBe("-1/2");
    expect(qToString(qInv(q(-2, 3)))).toBe("-3/2");
    expect(qToString(qPow(q(2, 3), -2))).toBe("9/4");
    expect(qToString(q(4n, -6n))).toBe("-2/3");
    expect(bigGcd(-12n, 18n)).toBe(6n);
    expect(bigGcd(2n ** 200n * 3n, 2n ** 100n * 9n)).toBe(2n ** 100n * 3n);
  });

  it("bigGcd on large integers equals Euclid's algorithm written out, with planted common factors (fast-check; common practice)", () => {
    const euclid = (x: bigint, y: bigint): bigint => {
      [x, y] = [x < 0n ? -x : x, y < 0n ? -y : y];
      while (y !== 0n) [x, y] = [y, x % y];
      return x;
    };
    const big = (bits: number) => fc.bigInt({ min: -(1n << BigInt(bits)), max: 1n << BigInt(bits) });
    fc.assert(
      fc.property(big(3000), big(3000), big(600), (x, y, g) => {
        for (const [u, v] of [[x, y], [x * g, y * g], [x * g, g], [g, 0n], [0n, y]]) expect(bigGcd(u, v)).toBe(euclid(u, v));
      }),
      { numRuns: 300 },
    );
    // Consecutive Fibonacci numbers: the longest run of Euclid steps for their size, every quotient 1.
    const fib = [1n, 1n];
    while (fib.length < 2000) fib.push(fib[fib.length - 1] + fib[fib.length - 2]);
    expect(bigGcd(fib[1999], fib[1998])).toBe(1n);
    expect(bigGcd(fib[1999] * 12345n, fib[1998] * 12345n)).toBe(12345n);
  });

  it("qToNumber stays finite and accurate for huge numerators and denominators (common practice)", () => {
    expect(qToNumber(q(1, 4))).toBe(0.25);
    const huge = q(10n ** 400n + 1n, 3n * 10n ** 400n);
    expect(close(qToNumber(huge), 1 / 3, 1e-15)).toBe(true);
    expect(close(qToNumber(q(-(10n ** 500n), 7n * 10n ** 499n)), -10 / 7, 1e-15)).toBe(true);
  });

  const rat = fc.tuple(fc.bigInt(-(10n ** 30n), 10n ** 30n), fc.bigInt(1n, 10n ** 20n)).map(([n, d]) => q(n, d));
  it("field laws and normal form (fast-check, common practice)", () => {
    fc.assert(
      fc.property(rat, rat, rat, (x: Q, y: Q, z: Q) => {
        expect(qEquals(qAdd(x, y), qAdd(y, x))).toBe(true);
        expect(qEquals(qMul(qAdd(x, y), z), qAdd(qMul(x, z), qMul(y, z)))).toBe(true);
        expect(qEquals(qSub(qAdd(x, y), y), x)).toBe(true);
        if (y.n !== 0n) expect(qEquals(qMul(qDiv(x, y), y), x)).toBe(true);
        expect(qEquals(qNeg(qNeg(x)), x)).toBe(true);
        for (const r of [qAdd(x, y), qMul(x, z)]) {
          expect(r.d > 0n && bigGcd(r.n, r.d) === 1n).toBe(true);
        }
        expect(qEquals(qFromString(qToString(x)), x)).toBe(true);
      }),
      { numRuns: 500 },
    );
  });
});
