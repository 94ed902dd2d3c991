// Own characteristic polynomial (Householder Hessenberg form, then its leading minors): mathjs/number has no
// matrices, and expanding det(sI − A) symbolically is neither stable nor needed at the orders realised here.
import type { Matrix } from "@shared/algebra/matrix";

/**
 * Orthogonal similarity to upper Hessenberg form by Householder reflections (same eigenvalues, and
 * backward stable, unlike expanding det(sI − A) directly).
 */
function hessenberg(a: Matrix): Matrix {
  const n = a.length;
  const h = a.map((row) => row.slice());
  for (let k = 0; k < n - 2; k++) {
    const v = h.slice(k + 1).map((row) => row[k]);
    const alpha = Math.hypot(...v);
    if (alpha === 0) continue;
    v[0] += v[0] >= 0 ? alpha : -alpha;
    const vv = v.reduce((s, x) => s + x * x, 0);
    if (vv === 0) continue;
    // H ← P·H·P with P = I − 2vvᵀ/vᵀv acting on rows and columns k+1…n−1.
    for (let j = 0; j < n; j++) {
      let s = 0;
      for (let i = 0; i < v.length; i++) s += v[i] * h[k + 1 + i][j];
      const f = (2 * s) / vv;
      for (let i = 0; i < v.length; i++) h[k + 1 + i][j] -= f * v[i];
    }
    for (let i = 0; i < n; i++) {
      let s = 0;
      for (let j = 0; j < v.length; j++) s += h[i][k + 1 + j] * v[j];
      const f = (2 * s) / vv;
      for (let j = 0; j < v.length; j++) h[i][k + 1 + j] -= f * v[j];
    }
  }
  return h;
}

/**
 * det(sI − A) in DESCENDING powers (monic, length n + 1), from the Hessenberg form's leading minors:
 * p_m = (s − h_mm)·p_{m−1} − Σ_{i<m} h_im·(h_{i+1,i}…h_{m,m−1})·p_{i−1}.
 * Example: charPoly([[0, 1], [-2, -3]]) is [1, 3, 2].
 */
export function charPoly(a: Matrix): number[] {
  const n = a.length;
  const h = hessenberg(a);
  // p[m] ascending coefficients of the m-th leading minor's characteristic polynomial.
  const p: number[][] = [[1]];
  for (let m = 1; m <= n; m++) {
    const next = new Array<number>(m + 1).fill(0);
    const prev = p[m - 1];
    prev.forEach((c, i) => {
      next[i + 1] += c;
      next[i] -= h[m - 1][m - 1] * c;
    });
    let sub = 1;
    for (let i = m - 1; i >= 1; i--) {
      sub *= h[i][i - 1];
      if (sub === 0) break;
      const f = h[i - 1][m - 1] * sub;
      p[i - 1].forEach((c, k) => (next[k] -= f * c));
    }
    p.push(next);
  }
  return p[n].slice().reverse();
}
