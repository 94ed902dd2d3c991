// Micro-benchmark of the exact algebra (shared/algebra): prints a table of figures, asserts nothing.
import { performance } from "node:perf_hooks";
import { polyFromZ, polyGcd, polyMul, type Poly } from "@shared/algebra/poly";
import { ratAdd, ratConst, ratDegrees, ratDiv, ratFromExpr, ratMul, ratOne, type RatFn } from "@shared/algebra/ratfn";
import { q, qOne } from "@shared/algebra/rational";
import { zMake, type ZPoly } from "@shared/algebra/zpoly";
import type { ExprNode } from "@shared/expr/ast";

let seed = 12345;
const rand = (m: number): number => {
  seed = (Math.imul(seed, 1103515245) + 12345) >>> 0;
  return seed % m;
};
const randomPoly = (deg: number, range: number): Poly => {
  const c: ZPoly[] = Array.from({ length: deg + 1 }, () => BigInt(rand(2 * range + 1) - range));
  c[deg] = BigInt(1 + rand(range));
  return polyFromZ(qOne, zMake("s", c));
};

/** First (cold, includes JIT warm-up) and mean of later runs, in ms. */
function time(label: string, reps: number, run: () => unknown): [string, string, string, string] {
  let t0 = performance.now();
  run();
  const cold = performance.now() - t0;
  t0 = performance.now();
  for (let i = 0; i < reps; i++) run();
  const warm = (performance.now() - t0) / reps;
  return [label, cold.toFixed(2), warm.toFixed(3), String(reps)];
}

const num = (n: number): ExprNode => ({ kind: "num", num: BigInt(n), den: 1n });
const param = (name: string): ExprNode => ({ kind: "param", name });
const sNode: ExprNode = { kind: "s" };
const add = (l: ExprNode, r: ExprNode): ExprNode => ({ kind: "add", left: l, right: r });
const mul = (l: ExprNode, r: ExprNode): ExprNode => ({ kind: "mul", left: l, right: r });
const div = (l: ExprNode, r: ExprNode): ExprNode => ({ kind: "div", left: l, right: r });

/** Interlocked ladder: each section G_i joins the cascade, then a feedback h_i closes around everything so far. */
function ladder(n: number, section: (i: number) => RatFn, feedback: (i: number) => RatFn): RatFn {
  let x = ratOne;
  for (let i = 0; i < n; i++) {
    x = ratMul(x, section(i));
    x = ratDiv(x, ratAdd(ratOne, ratMul(x, feedback(i))));
  }
  return x;
}

const numericSection = (i: number) => ratFromExpr(div(num((i % 7) + 1), add(sNode, num((i % 5) + 1))));
const numericFeedback = (i: number) => ratConst(q(1, (i % 3) + 2));
const symbolicSection = (i: number) =>
  ratFromExpr(div(param("K"), add(mul(param("tau"), sNode), num((i % 4) + 1))));
const symbolicFeedback = (i: number) => (i % 3 === 2 ? ratFromExpr(param("k_p")) : ratConst(q(1, 2)));

const a100 = randomPoly(100, 1000);
const b100 = randomPoly(100, 1000);
const f50 = randomPoly(50, 100);
const withCommon = [polyMul(f50, randomPoly(50, 100)), polyMul(f50, randomPoly(50, 100))];

const rows: [string, string, string, string][] = [
  time("multiply two degree-100 integer polynomials", 200, () => polyMul(a100, b100)),
  time("gcd of two coprime degree-100 polynomials", 50, () => polyGcd(a100, b100)),
  time("gcd of two degree-100 polynomials, common degree-50 factor", 20, () => polyGcd(withCommon[0], withCommon[1])),
  time("150-stage numeric ladder (series + feedback)", 5, () => ladder(150, numericSection, numericFeedback)),
  time("30-stage ladder, parameters K, tau, k_p", 10, () => ladder(30, symbolicSection, symbolicFeedback)),
];
const d = ratDegrees(ladder(150, numericSection, numericFeedback));
console.log(`(150-stage ladder result degrees: num ${d.num}, den ${d.den})`);
const w = Math.max(...rows.map((r) => r[0].length));
console.log(`${"case".padEnd(w)}  ${"first ms".padStart(9)}  ${"mean ms".padStart(9)}  runs`);
for (const [label, cold, warm, reps] of rows) console.log(`${label.padEnd(w)}  ${cold.padStart(9)}  ${warm.padStart(9)}  ${reps}`);
