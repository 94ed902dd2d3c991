// The Routh array on exact rational functions, so the same code serves numeric coefficients, the ε of the
// zero-first-element case (a parameter ε → 0+) and symbolic parameters.
import { polyCoeffsS, polyDegree, polyParams, type Poly } from "@shared/algebra/poly";
import {
  ratConst, ratDiv, ratFromExpr, ratIsZero, ratMul, ratSub, ratToLatex, ratToText, type RatFn,
} from "@shared/algebra/ratfn";
import { q, qDiv, qMul, qSign, qSub, qZero, type Q } from "@shared/algebra/rational";
import { polyToText } from "@shared/algebra/polytext";
import type { ZPoly } from "@shared/algebra/zpoly";
import { counted } from "@shared/text/words";

/** The small positive number that replaces a zero first element; signs are read as ε → 0+. */
const EPSILON = "ε";
const eps: RatFn = ratFromExpr({ kind: "param", name: EPSILON });

export interface RouthRow {
  power: number;
  entries: string[];
  latex: string[];
}

export interface RouthSpecial {
  power: number;
  kind: "zero-first-element" | "zero-row";
  explanation: string;
}

export interface RouthArray {
  polynomial: string;
  rows: RouthRow[];
  firstColumn: string[];
  special: RouthSpecial[];
  /** Sign changes down the first column (ε → 0+); null when entries depend on parameters. */
  signChanges: number | null;
  /** Roots on the imaginary axis read from the auxiliary polynomial (distinct ones only); null when symbolic. */
  axisRoots: number | null;
  conclusion: string;
}

/** Row entries as exact rational functions (ε and parameters allowed), with the special cases recorded. */
export function routhRows(p: Poly): { rows: RatFn[][]; special: RouthSpecial[]; aux: { power: number; degree: number } | null } {
  const plain = polyParams(p).length ? null : numericRows(p);
  if (plain) return { rows: plain, special: [], aux: null };
  const n = polyDegree(p);
  const desc = polyCoeffsS(p).reverse().map(ratFromPoly);
  const rows: RatFn[][] = [desc.filter((_, i) => i % 2 === 0)];
  if (n > 0) rows.push(desc.filter((_, i) => i % 2 === 1));
  const special: RouthSpecial[] = [];
  let aux: { power: number; degree: number } | null = null;
  const width = rows[0].length;
  for (let power = n - 1; power >= 0; power--) {
    const idx = n - power;
    if (idx >= 2) {
      const [a, b] = [rows[idx - 2], rows[idx - 1]];
      const at = (r: RatFn[], j: number) => r[j] ?? ratConst(q(0));
      rows.push(Array.from({ length: width - 1 }, (_, j) => ratDiv(ratSub(ratMul(b[0], at(a, j + 1)), ratMul(a[0], at(b, j + 1))), b[0])));
    }
    const row = (rows[idx] = trimRow(rows[idx] ?? []));
    if (row.every(ratIsZero)) {
      const above = rows[idx - 1];
      rows[idx] = above.map((c, j) => ratMul(c, ratConst(q(power + 1 - 2 * j)))).filter((_, j) => power + 1 - 2 * j >= 1);
      const auxText = above.map((c, j) => `(${ratToText(c)})*s^${power + 1 - 2 * j}`).join(" + ");
      aux ??= { power: power + 1, degree: power + 1 };
      special.push({
        power,
        kind: "zero-row",
        explanation:
          `Row s^${power} is all zero: the row above gives the auxiliary polynomial A(s) = ${auxText.replace(/\*s\^0/g, "")}, ` +
          `whose roots are symmetric about the origin and are roots of the polynomial too; the row is replaced by the coefficients of dA/ds.`,
      });
    } else if (ratIsZero(row[0])) {
      row[0] = eps;
      special.push({
        power,
        kind: "zero-first-element",
        explanation: `Row s^${power} starts with 0 but is not all zero: the 0 is replaced by a small ε > 0 and the signs below are read as ε → 0+.`,
      });
    }
  }
  return { rows: rows.map((r) => (r.length ? r : [ratConst(q(0))])), special, aux };
}

/**
 * The same rows in plain rationals for a numeric polynomial (rational-function arithmetic is several times
 * slower); null when some row is all zero or starts with 0, which the general path handles with ε or A(s).
 */
function numericRows(p: Poly): RatFn[][] | null {
  const n = polyDegree(p);
  const desc = polyCoeffsS(p).reverse().map((c) => c.q); // a numeric coefficient is c.q·1
  const rows: Q[][] = [desc.filter((_, i) => i % 2 === 0)];
  if (n > 0) rows.push(desc.filter((_, i) => i % 2 === 1));
  const width = rows[0].length;
  for (let power = n - 1; power >= 0; power--) {
    const idx = n - power;
    if (idx >= 2) {
      const [a, b] = [rows[idx - 2], rows[idx - 1]];
      const at = (r: Q[], j: number) => r[j] ?? qZero;
      rows.push(Array.from({ length: width - 1 }, (_, j) => qDiv(qSub(qMul(b[0], at(a, j + 1)), qMul(a[0], at(b, j + 1))), b[0])));
    }
    const row = rows[idx] ?? [];
    while (row.length > 1 && row[row.length - 1].n === 0n) row.pop();
    rows[idx] = row;
    if (!row.length || row[0].n === 0n) return null;
  }
  return rows.map((r) => r.map(ratConst));
}

const trimRow = (r: RatFn[]): RatFn[] => {
  const out = r.slice();
  while (out.length > 1 && ratIsZero(out[out.length - 1])) out.pop();
  return out;
};

/** A Poly (coefficient of s^k, free of s) as a RatFn. */
const ratFromPoly = (c: Poly): RatFn => (c.q.n === 0n ? ratConst(q(0)) : { k: c.q, n: c.z, d: 1n });

/** Sign of the lowest-order term in ε of an integer polynomial in ε alone; null if it has other variables. */
function lowSign(z: ZPoly): number | null {
  if (typeof z === "bigint") return z > 0n ? 1 : z < 0n ? -1 : 0;
  if (z.v !== EPSILON) return null;
  const first = z.c.find((c) => c !== 0n);
  return first === undefined ? 0 : lowSign(first);
}

/** Sign of an entry as ε → 0+; null when it depends on a parameter. Example: (2ε − 1)/ε → 1 (the 1/ε term). */
export function signAsEpsilonVanishes(r: RatFn): number | null {
  const [n, d] = [lowSign(r.n), lowSign(r.d)];
  return n === null || d === null ? null : qSign(r.k) * n * d;
}

const countChanges = (signs: number[]): number =>
  signs.reduce((acc, s, i) => (i > 0 && s !== 0 && signs[i - 1] !== 0 && s !== signs[i - 1] ? acc + 1 : acc), 0);

/**
 * The Routh array of a polynomial in s (numeric or with parameters), with both special cases handled and
 * explained, the sign changes of the first column and what they mean.
 * Example: routhArray(s^3 + s^2 + 2s + 24) has first column 1, 1, −22, 24: two sign changes, two roots in the RHP.
 */
export function routhArray(p: Poly): RouthArray {
  const { rows, special, aux } = routhRows(p);
  const n = polyDegree(p);
  const first = rows.map((r) => r[0]);
  const signs = first.map(signAsEpsilonVanishes);
  const symbolic = polyParams(p).length > 0 || signs.some((s) => s === null);
  const out: RouthArray = {
    polynomial: polyToText(p),
    rows: rows.map((r, i) => ({ power: n - i, entries: r.map(ratToText), latex: r.map((x) => ratToLatex(x).replace(/ε/g, "\\varepsilon ")) })),
    firstColumn: first.map(ratToText),
    special,
    signChanges: null,
    axisRoots: null,
    conclusion: "",
  };
  if (symbolic) {
    out.conclusion =
      "The entries depend on parameters: every root is in the left half-plane exactly when all first-column entries have the sign of the first (for the parameter values where none of them is 0).";
    return out;
  }
  const numeric = signs as number[];
  out.signChanges = countChanges(numeric);
  const rhp = `${counted(out.signChanges, "sign change")} in the first column: ${counted(out.signChanges, "root")} in the right half-plane`;
  if (!aux) {
    out.conclusion = `${rhp}${out.signChanges === 0 ? " and none on the imaginary axis: all roots in the left half-plane" : ""}.`;
    return out;
  }
  const below = countChanges(numeric.slice(n - aux.power));
  out.axisRoots = aux.degree - 2 * below;
  out.conclusion =
    `${rhp}. The auxiliary polynomial (degree ${aux.degree}) has ${counted(below, "root")} in the right half-plane, as many mirrored in the left, ` +
    `and ${out.axisRoots} on the imaginary axis (the array cannot tell repeated axis roots; the exact factorisation does).`;
  return out;
}
