// Exact factor splitting of numeric polynomials, reusing the reducer's square-free + rational splitter and
// adding the one case it leaves whole: rational quadratics with two real irrational roots.
import { zSplitFactors } from "@shared/algebra/factor";
import { polyFromZ } from "@shared/algebra/poly";
import { q, qOne, qToNumber } from "@shared/algebra/rational";
import { polyRoots } from "@shared/algebra/roots";
import { allInt, zContentInt, zDivExact, zEquals, zMake, zNormSign, zQuo, S, type ZPoly } from "@shared/algebra/zpoly";
import { AnalysisError, ROOT_DEGREE_LIMIT } from "@shared/analysis/errors";
import { memoByPoly } from "@shared/analysis/memo";
import { upDeg, upFromPoly, upMonic, upToPoly, type UPoly } from "@shared/analysis/upoly";

/** A monic factor and how often it divides. */
export interface Factor {
  readonly poly: UPoly;
  readonly multiplicity: number;
}

/** Degree up to which real root pairs are tried as rational quadratics (pairs grow with the square). */
const PAIRING_LIMIT = 30;

/**
 * Monic factors with EXACT multiplicities (square-free decomposition over Q), rational linear and quadratic
 * factors split off; the leading coefficient is dropped. Throws AnalysisError "degree-limit" above degree 100.
 * Example: exactFactors(2(s + 1)^2(s^2 − 2)) is [{ s + 1, 2 }, { s^2 − 2, 1 }].
 */
export function exactFactors(u: UPoly, what = "polynomial"): Factor[] {
  if (upDeg(u) <= ROOT_DEGREE_LIMIT) return cachedFactors(u);
  throw new AnalysisError(
    "degree-limit",
    `The ${what} has degree ${upDeg(u)}; roots are computed up to degree ${ROOT_DEGREE_LIMIT}. Simplify the diagram.`,
  );
}

const cachedFactors = memoByPoly(factorsOf);

function factorsOf(u: UPoly): Factor[] {
  if (upDeg(u) < 1) return [];
  const out: { z: ZPoly; multiplicity: number }[] = [];
  for (const f of zSplitFactors(upToPoly(u).z).flatMap(splitRealPairs)) {
    const known = out.find((g) => zEquals(g.z, f));
    if (known) known.multiplicity++;
    else out.push({ z: f, multiplicity: 1 });
  }
  return out
    .map(({ z, multiplicity }) => ({ poly: upMonic(upFromPoly(polyFromZ(qOne, z))), multiplicity }))
    .sort((a, b) => upDeg(a.poly) - upDeg(b.poly));
}

const absBig = (x: bigint): bigint => (x < 0n ? -x : x);

/** Tries every pair of real roots r1, r2 as a factor s² − (r1 + r2)s + r1·r2 with rational coefficients. */
function splitRealPairs(f: ZPoly): ZPoly[] {
  if (typeof f === "bigint" || f.v !== S || !allInt(f.c) || f.c.length < 5 || f.c.length > PAIRING_LIMIT + 1) return [f];
  const c = f.c;
  const lead = Number(c[c.length - 1]);
  const top = c.reduce((m, x) => (absBig(x) > m ? absBig(x) : m), 0n);
  const real = polyRoots(c.map((x) => qToNumber(q(x, top))).reverse())
    .filter(([, im]) => im === 0)
    .map(([re]) => re);
  let rest: ZPoly = f;
  const found: ZPoly[] = [];
  const used = new Set<number>();
  for (let i = 0; i < real.length; i++) {
    for (let j = i + 1; j < real.length && !used.has(i); j++) {
      if (used.has(j)) continue;
      const guess = [Math.round(real[i] * real[j] * lead), -Math.round((real[i] + real[j]) * lead), lead];
      if (!guess.every(Number.isSafeInteger)) continue;
      const cand = zMake(S, guess.map(BigInt));
      if (typeof cand === "bigint") continue;
      const primitive = zNormSign(zQuo(cand, zContentInt(cand)));
      const quotient = zDivExact(rest, primitive);
      if (quotient === null) continue;
      found.push(primitive);
      rest = quotient;
      used.add(i).add(j);
    }
  }
  return typeof rest === "bigint" ? found : [...found, zNormSign(rest)];
}
