import type { Field } from "@shared/algebra/field";

/** Exact rationals on BigInt: the plain-number field the graph rules are tested with. */
export interface Frac {
  n: bigint;
  d: bigint;
}

const gcd = (a: bigint, b: bigint): bigint => {
  a = a < 0n ? -a : a;
  b = b < 0n ? -b : b;
  while (b) [a, b] = [b, a % b];
  return a;
};

export function frac(n: bigint | number, d: bigint | number = 1n): Frac {
  let [nn, dd] = [BigInt(n), BigInt(d)];
  if (dd === 0n) throw new Error("zero denominator");
  if (dd < 0n) [nn, dd] = [-nn, -dd];
  const g = gcd(nn, dd) || 1n;
  return { n: nn / g, d: dd / g };
}

export const fracText = (a: Frac): string => (a.d === 1n ? `${a.n}` : `${a.n}/${a.d}`);

export const fracField: Field<Frac> = {
  zero: frac(0),
  one: frac(1),
  add: (a, b) => frac(a.n * b.d + b.n * a.d, a.d * b.d),
  sub: (a, b) => frac(a.n * b.d - b.n * a.d, a.d * b.d),
  mul: (a, b) => frac(a.n * b.n, a.d * b.d),
  div: (a, b) => {
    if (b.n === 0n) throw new Error("division by zero");
    return frac(a.n * b.d, a.d * b.n);
  },
  neg: (a) => frac(-a.n, a.d),
  isZero: (a) => a.n === 0n,
  isOne: (a) => a.n === 1n && a.d === 1n,
};

export const showFrac = (a: Frac) => ({ expr: fracText(a), latex: fracText(a) });

/**
 * Independent reference: solves x_v = Σ gain(u→v)·x_u with x_source = 1 by Gauss–Jordan elimination on
 * fractions (common practice: the signal equations of a flow graph are a linear system). Returns null when
 * the system is singular; `det` is det(I − A) over all nodes.
 */
export function solveSignals(
  nodes: readonly string[],
  edges: readonly { from: string; to: string; gain: Frac }[],
  source: string,
): { x: Map<string, Frac> | null; det: Frac } {
  const f = fracField;
  const n = nodes.length;
  const at = new Map(nodes.map((id, i) => [id, i]));
  const m: Frac[][] = nodes.map((_, i) => nodes.map((__, j) => (i === j ? f.one : f.zero)));
  for (const e of edges) m[at.get(e.to)!][at.get(e.from)!] = f.sub(m[at.get(e.to)!][at.get(e.from)!], e.gain);
  let det = f.one;
  for (let c = 0; c < n && !f.isZero(det); c++) {
    const p = m.findIndex((row, r) => r >= c && !f.isZero(row[c]));
    if (p < 0) det = f.zero;
    else {
      if (p !== c) [m[p], m[c]] = [m[c], m[p]];
      if (p !== c) det = f.neg(det);
      det = f.mul(det, m[c][c]);
      for (let r = c + 1; r < n; r++) {
        const k = f.div(m[r][c], m[c][c]);
        m[r] = m[r].map((v, j) => f.sub(v, f.mul(k, m[c][j])));
      }
    }
  }
  // Solve with the source's row replaced by x_source = 1.
  const a: Frac[][] = nodes.map((id, i) => {
    if (id === source) return [...nodes.map((__, j) => (i === j ? f.one : f.zero)), f.one];
    const row = nodes.map((__, j) => (i === j ? f.one : f.zero));
    for (const e of edges) if (e.to === id) row[at.get(e.from)!] = f.sub(row[at.get(e.from)!], e.gain);
    return [...row, f.zero];
  });
  for (let c = 0; c < n; c++) {
    const p = a.findIndex((row, r) => r >= c && !f.isZero(row[c]));
    if (p < 0) return { x: null, det };
    [a[p], a[c]] = [a[c], a[p]];
    const piv = a[c][c];
    a[c] = a[c].map((v) => f.div(v, piv));
    for (let r = 0; r < n; r++) {
      if (r === c || f.isZero(a[r][c])) continue;
      const k = a[r][c];
      a[r] = a[r].map((v, j) => f.sub(v, f.mul(k, a[c][j])));
    }
  }
  return { x: new Map(nodes.map((id, i) => [id, a[i][n]])), det };
}
