import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { heuristicGcd } from "@shared/algebra/heugcd";
import { bigMod, gcdModP, modPrime, mulMod, remModP } from "@shared/algebra/modp";
import { polyIsZero, polyMul } from "@shared/algebra/poly";
import { ratFromExpr, ratNumerator } from "@shared/algebra/ratfn";
import { withGcdTimeLimit, zContent, zGcd, zGcdSplit } from "@shared/algebra/zgcd";
import { AlgebraError } from "@shared/algebra/errors";
import { zDivExact, zEquals, zMul, zQuo, type ZPoly, type ZRec } from "@shared/algebra/zpoly";
import { parseExpression } from "@shared/expr/parse";
import { polyExpr } from "./support";

const zOf = (e: Parameters<typeof ratFromExpr>[0]) => ratNumerator(ratFromExpr(e)).z;
const primitive = (z: ZPoly) => zQuo(z, zContent(z));

describe("gcd building blocks", () => {
  it("Euclid over Z/p on hand-checked cases (common practice)", () => {
    const p = 7;
    expect(remModP([0, 0, 1], [1, 1], p)).toEqual([1]); // s^2 mod (s + 1) = 1
    expect(gcdModP([6, 0, 1], [6, 1], p)).toEqual([6, 1]); // gcd(s^2 − 1, s − 1) = s − 1
    expect(gcdModP([1, 1], [2, 1], p)).toEqual([1]);
    expect(modPrime(0)).toBe(67108859);
    expect(modPrime(1) < modPrime(0)).toBe(true);
  });

  it("residue products and reductions agree with exact BigInt arithmetic, up to the largest prime (fast-check)", () => {
    const p = modPrime(0);
    fc.assert(
      fc.property(fc.integer({ min: 0, max: p - 1 }), fc.integer({ min: 0, max: p - 1 }), (a, b) => {
        expect(mulMod(a, b, p)).toBe(Number((BigInt(a) * BigInt(b)) % BigInt(p)));
      }),
      { numRuns: 2000 },
    );
    expect(mulMod(p - 1, p - 1, p)).toBe(1);
    fc.assert(
      fc.property(fc.bigInt({ min: -(1n << 70n), max: 1n << 70n }), (x) => {
        expect(bigMod(x, p)).toBe(Number(((x % BigInt(p)) + BigInt(p)) % BigInt(p)));
      }),
      { numRuns: 2000 },
    );
  });

  it("the heuristic gcd recovers planted factors with parameters on its own, without the fallback (fast-check)", () => {
    let found = 0;
    fc.assert(
      fc.property(polyExpr(true), polyExpr(true), polyExpr(true, 2), (a, b, c) => {
        const [x, y] = [a, b].map((e) => polyMul(ratNumerator(ratFromExpr(e)), ratNumerator(ratFromExpr(c))));
        fc.pre(!polyIsZero(x) && !polyIsZero(y));
        const [px, py] = [primitive(x.z), primitive(y.z)];
        fc.pre(typeof px !== "bigint" && typeof py !== "bigint" && px.v === "s" && py.v === "s");
        const h = heuristicGcd(px as ZRec, py as ZRec, zGcd);
        if (h === null) return;
        found++;
        expect(zDivExact(px, h) !== null && zDivExact(py, h) !== null).toBe(true);
        const planted = primitive(zOf(c));
        if (typeof planted !== "bigint" && planted.v === "s") expect(zDivExact(h, planted)).not.toBeNull();
      }),
      { numRuns: 200 },
    );
    expect(found).toBeGreaterThan(150);
  });
});

function parseExprTree(text: string) {
  const r = parseExpression(text, { allowS: true, parameters: ["K", "a", "b", "c"] });
  if (!r.ok) throw new Error(r.message);
  return r.ast;
}

describe("gcd with cofactors", () => {
  it("zGcdSplit gives zGcd and exact cofactors: a = g·ca, b = g·cb, on planted common factors (fast-check; common practice)", () => {
    for (const symbolic of [false, true]) {
      fc.assert(
        fc.property(polyExpr(symbolic), polyExpr(symbolic), polyExpr(symbolic, 2), (a, b, c) => {
          const [x, y] = [a, b].map((e) => zMul(zOf(e), zOf(c)));
          fc.pre(x !== 0n && y !== 0n);
          for (const [u, v] of [[x, y], [primitive(x), primitive(y)], [y, x]]) {
            const { g, ca, cb } = zGcdSplit(u, v);
            expect(zEquals(g, zGcd(u, v))).toBe(true);
            expect(zEquals(zMul(g, ca), u)).toBe(true);
            expect(zEquals(zMul(g, cb), v)).toBe(true);
          }
        }),
        { numRuns: 150 },
      );
    }
  });
});

describe("the multivariate gcd's own time budget", () => {
  it("a gcd whose fallback runs past its budget is an AlgebraError naming the budget, not a hang (common practice: bounded work)", () => {
    const common = "(s + K + a + b + c + 1)^5";
    const x = zOf(parseExprTree(`(K*s + a + 2*b + 3)^5*${common}`));
    const y = zOf(parseExprTree(`(c*s + K + 3*a + 5)^5*${common}`));
    let caught: unknown;
    try {
      withGcdTimeLimit(5, () => zGcd(x, y));
    } catch (e) {
      caught = e;
    }
    expect(caught).toBeInstanceOf(AlgebraError);
    expect((caught as AlgebraError).code).toBe("gcd-time-limit");
    expect((caught as AlgebraError).message).toContain("gcd time budget of 0.005 s");
    // Under the default budget the same gcd finishes: the planted common factor, exactly.
    expect(zEquals(zGcd(x, y), zOf(parseExprTree(common)))).toBe(true);
  });
});
