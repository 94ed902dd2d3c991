import { identity, solve, type Matrix } from "@shared/algebra/matrix";

// Own small symmetric solvers for the balanced realisation (Lyapunov, Cholesky, Jacobi eigenvalues): no package
// shared/ may load has them, and at the orders realised here (≤ 20) the plain methods are accurate and quick.

/**
 * X with A·X + X·Aᵀ + Q = 0 (A stable, Q symmetric), from the Kronecker form (I⊗A + A⊗I)·vec X = −vec Q.
 * Example: lyapunov([[-1]], [[2]]) is [[1]].
 */
export function lyapunov(a: Matrix, qm: Matrix): Matrix {
  const n = a.length;
  const m = Array.from({ length: n * n }, () => new Array<number>(n * n).fill(0));
  for (let i = 0; i < n; i++)
    for (let j = 0; j < n; j++)
      for (let l = 0; l < n; l++) {
        m[i * n + j][l * n + j] += a[i][l];
        m[i * n + j][i * n + l] += a[j][l];
      }
  const x = solve(m, qm.flatMap((row) => row.map((v) => [-v])));
  return Array.from({ length: n }, (_, i) => Array.from({ length: n }, (_, j) => (x[i * n + j][0] + x[j * n + i][0]) / 2));
}

/** Lower-triangular L with L·Lᵀ = S, or null when S is not positive definite. Example: cholesky([[4]]) is [[2]]. */
export function cholesky(s: Matrix): Matrix | null {
  const n = s.length;
  const l = Array.from({ length: n }, () => new Array<number>(n).fill(0));
  for (let j = 0; j < n; j++) {
    let d = s[j][j];
    for (let k = 0; k < j; k++) d -= l[j][k] * l[j][k];
    if (!(d > 0)) return null;
    l[j][j] = Math.sqrt(d);
    for (let i = j + 1; i < n; i++) {
      let v = s[i][j];
      for (let k = 0; k < j; k++) v -= l[i][k] * l[j][k];
      l[i][j] = v / l[j][j];
    }
  }
  return l;
}

/**
 * Eigenvalues (descending) and orthonormal eigenvectors (the columns of `vectors`) of a symmetric matrix, by
 * cyclic Jacobi rotations. Example: symmetricEigen([[2, 0], [0, 3]]).values is [3, 2].
 */
export function symmetricEigen(s: Matrix): { values: number[]; vectors: Matrix } {
  const n = s.length;
  const a = s.map((row) => row.slice());
  const v = identity(n);
  const scale = Math.hypot(...a.flat());
  for (let sweep = 0; sweep < 100; sweep++) {
    let off = 0;
    for (let p = 0; p < n; p++) for (let q = p + 1; q < n; q++) off += a[p][q] * a[p][q];
    if (Math.sqrt(off) <= 1e-17 * scale) break;
    for (let p = 0; p < n; p++)
      for (let q = p + 1; q < n; q++) {
        if (a[p][q] === 0) continue;
        const theta = (a[q][q] - a[p][p]) / (2 * a[p][q]);
        const t = Math.sign(theta || 1) / (Math.abs(theta) + Math.sqrt(theta * theta + 1));
        const c = 1 / Math.sqrt(t * t + 1);
        const sn = t * c;
        for (let k = 0; k < n; k++) {
          const akp = a[k][p];
          const akq = a[k][q];
          a[k][p] = c * akp - sn * akq;
          a[k][q] = sn * akp + c * akq;
        }
        for (let k = 0; k < n; k++) {
          const apk = a[p][k];
          const aqk = a[q][k];
          a[p][k] = c * apk - sn * aqk;
          a[q][k] = sn * apk + c * aqk;
        }
        for (let k = 0; k < n; k++) {
          const vkp = v[k][p];
          const vkq = v[k][q];
          v[k][p] = c * vkp - sn * vkq;
          v[k][q] = sn * vkp + c * vkq;
        }
      }
  }
  const order = Array.from({ length: n }, (_, i) => i).sort((i, j) => a[j][j] - a[i][i]);
  return { values: order.map((i) => a[i][i]), vectors: v.map((row) => order.map((i) => row[i])) };
}
