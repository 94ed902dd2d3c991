// From the reducer's exact symbolic transfer to exact numeric polynomials at given parameter values:
// the one place parameters are substituted, so sweeps and the CLI agree.
import { qFromString, q, qAdd, qMul, qDiv, qOne, qZero, type Q } from "@shared/algebra/rational";
import type { RatFn } from "@shared/algebra/ratfn";
import { S, type ZPoly } from "@shared/algebra/zpoly";
import { polyAdd, polyConst, polyMul, polyParam, polyS, type Poly } from "@shared/algebra/poly";
import { AlgebraError } from "@shared/algebra/errors";
import { AnalysisError } from "@shared/analysis/errors";
import { MAX_DECIMAL_EXPONENT } from "@shared/expr/decimal";
import { upDeg, upDivMod, upFrom, upGcd, upLead, upScale, type UPoly } from "@shared/analysis/upoly";

/** The exact rational a finite number's shortest decimal text denotes. Example: exactValue(0.1) is 1/10. */
export function exactValue(x: number, name = "value"): Q {
  if (!Number.isFinite(x)) throw new AnalysisError("bad-value", `Parameter ${name} has no finite value (${x}).`, name);
  try {
    return qFromString(String(x));
  } catch (e) {
    if (!(e instanceof AlgebraError)) throw e;
    throw new AnalysisError("bad-value", `Parameter ${name} = ${x} is beyond the exact-number range (powers of ten up to ±${MAX_DECIMAL_EXPONENT}).`, name);
  }
}

/** Exact values of a value table, keyed by parameter. Example: exactValues({ K: 0.5 }).get("K") is 1/2. */
export const exactValues = (values: Readonly<Record<string, number>>): Map<string, Q> =>
  new Map(Object.entries(values).map(([k, v]) => [k, exactValue(v, k)]));

/** Value of an integer polynomial in the parameters (no s) at exact values. */
function atValues(z: ZPoly, values: ReadonlyMap<string, Q>): Q {
  if (typeof z === "bigint") return q(z);
  const x = values.get(z.v);
  if (!x) throw new AnalysisError("bad-value", `No value for parameter ${z.v}: give it a nominal value.`, z.v);
  let acc = qZero;
  for (let i = z.c.length - 1; i >= 0; i--) acc = qAdd(qMul(acc, x), atValues(z.c[i], values));
  return acc;
}

/** Ascending coefficients in s of k·z at the values. */
function inS(z: ZPoly, k: Q, values: ReadonlyMap<string, Q>): UPoly {
  const coeffs = typeof z !== "bigint" && z.v === S ? z.c : [z];
  return upFrom(coeffs.map((c) => qMul(k, atValues(c, values))));
}

/**
 * A polynomial with some parameters replaced by exact values (the others stay symbolic).
 * Example: polySubstitute(K*tau*s + 1, { tau: 1/2 }) is 1/2*K*s + 1.
 */
export function polySubstitute(p: Poly, values: ReadonlyMap<string, Q>): Poly {
  const walk = (z: ZPoly): Poly => {
    if (typeof z === "bigint") return polyConst(q(z));
    const x = values.get(z.v);
    const v = x ? polyConst(x) : z.v === S ? polyS() : polyParam(z.v);
    let acc = polyConst(qZero);
    for (let i = z.c.length - 1; i >= 0; i--) acc = polyAdd(polyMul(acc, v), walk(z.c[i]));
    return acc;
  };
  return polyMul(polyConst(p.q), walk(p.z));
}

/** A transfer at fixed parameter values, in lowest terms with a monic denominator. */
export interface NumericTransfer {
  num: UPoly;
  den: UPoly;
  /** Common factor that cancels only at these values (monic; degree 0 when none). */
  cancelled: UPoly;
}

/**
 * T at exact parameter values, reduced again (a common factor may appear at particular values).
 * Throws AnalysisError "singular-at-values" when the denominator vanishes identically there.
 * Example: transferAt(K/(s + K), { K: 2 }) is 2/(s + 2).
 */
export function transferAt(r: RatFn, values: Readonly<Record<string, number>>): NumericTransfer {
  const exact = exactValues(values);
  const num0 = inS(r.n, r.k, exact);
  const den0 = inS(r.d, qOne, exact);
  if (!den0.length) {
    const at = Object.entries(values).map(([k, v]) => `${k} = ${v}`).join(", ");
    throw new AnalysisError("singular-at-values", `The transfer function's denominator is identically 0 at ${at}: choose other parameter values.`);
  }
  const g = num0.length ? upGcd(num0, den0) : upFrom([qOne]);
  const lead = upLead(upDivMod(den0, g).quo);
  const scale = (u: UPoly) => upScale(upDivMod(u, g).quo, qDiv(qOne, lead));
  return { num: num0.length ? scale(num0) : num0, den: scale(den0), cancelled: upDeg(g) >= 1 ? g : upFrom([qOne]) };
}
