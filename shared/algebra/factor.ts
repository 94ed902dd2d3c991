// Own exact factor splitting on BigInt (for reporting cancelled modes): no CAS on the hot path.
import { qToNumber, q } from "@shared/algebra/rational";
import { polyRoots } from "@shared/algebra/roots";
import { zContent, zGcd, zPrimitive } from "@shared/algebra/zgcd";
import {
  S, allInt, zContentInt, zDeg, zDerivS, zDivExact, zMake, zNormSign, zQuo, zSub, type ZPoly,
} from "@shared/algebra/zpoly";

const MAX_NUMERIC_SPLIT = 100;

/**
 * Splits a polynomial into factors, each primitive with a positive leading coefficient, repeated by multiplicity:
 * the content in the parameters, then square-free parts in s (Yun), then — with numeric coefficients — the
 * rational linear and quadratic factors found from numeric roots and confirmed by exact division. What cannot be
 * split stays whole. Integer constants are dropped. Example: zSplitFactors(2*(s + 1)^2*(s^2 + 2)) is [s + 1, s + 1, s^2 + 2].
 */
export function zSplitFactors(g: ZPoly): ZPoly[] {
  if (zDeg(g, S) <= 0) return typeof g === "bigint" ? [] : [zNormSign(zQuo(g, zContentInt(g)))];
  const content = zContent(g);
  const out: ZPoly[] = typeof content === "bigint" ? [] : [content];
  for (const [f, m] of squareFree(zPrimitive(g))) {
    for (const piece of splitRational(f)) for (let i = 0; i < m; i++) out.push(piece);
  }
  return out;
}

/** Yun's square-free decomposition of a primitive polynomial in s: [factor, multiplicity] pairs. */
function squareFree(p: ZPoly): [ZPoly, number][] {
  const out: [ZPoly, number][] = [];
  const dp = zDerivS(p);
  const b = zGcd(p, dp);
  let c = zQuo(p, b);
  let d = zSub(zQuo(dp, b), zDerivS(c));
  for (let i = 1; zDeg(c, S) > 0; i++) {
    const a = zGcd(c, d);
    if (zDeg(a, S) > 0) out.push([zPrimitive(a), i]);
    c = zQuo(c, a);
    d = zSub(zQuo(d, a), zDerivS(c));
  }
  return out;
}

/** Rational linear and quadratic factors of a square-free integer polynomial in s, guessed from its roots. */
function splitRational(f: ZPoly): ZPoly[] {
  if (typeof f === "bigint" || f.v !== S || !allInt(f.c) || f.c.length < 3 || f.c.length > MAX_NUMERIC_SPLIT + 1) {
    return [f];
  }
  let rest: ZPoly = f;
  const found: ZPoly[] = [];
  const top = f.c.reduce((m, x) => (x < 0n ? -x : x) > m ? (x < 0n ? -x : x) : m, 0n);
  const roots = polyRoots(f.c.map((x) => qToNumber(q(x as bigint, top))).reverse());
  for (const [re, im] of roots) {
    if (im < 0 || zDeg(rest, S) < 2) continue;
    const lead = Number(zLeadS(rest));
    const guess = im === 0 ? [-Math.round(re * lead), lead] : [Math.round((re * re + im * im) * lead), -Math.round(2 * re * lead), lead];
    if (!guess.every(Number.isSafeInteger)) continue;
    const cand = zMake(S, guess.map(BigInt));
    const primitive = zNormSign(zQuo(cand, zContentInt(cand)));
    const quotient = zDivExact(rest, primitive);
    if (quotient === null) continue;
    found.push(primitive);
    rest = quotient;
  }
  return zDeg(rest, S) > 0 ? [...found, zNormSign(rest)] : found;
}

function zLeadS(a: ZPoly): bigint {
  return typeof a === "bigint" ? a : (a.c[a.c.length - 1] as bigint);
}
