// Own small dense float matrices: the realisations here are of order ≤ ~20, and mathjs/number (the one build
// shared/ may load) has no matrices; the full mathjs would add its whole matrix layer to the editor's worker.

/** A dense real matrix as rows. */
export type Matrix = number[][];

/** r × c zeros. Example: zeros(1, 2) is [[0, 0]]. */
export const zeros = (r: number, c: number): Matrix => Array.from({ length: r }, () => new Array<number>(c).fill(0));

/** The n × n identity. Example: identity(2) is [[1, 0], [0, 1]]. */
export const identity = (n: number): Matrix => Array.from({ length: n }, (_, i) => Array.from({ length: n }, (_, j) => (i === j ? 1 : 0)));

/** Aᵀ; an r × 0 matrix (rows of length 0) transposes to 0 rows. Example: transpose([[1, 2]]) is [[1], [2]]. */
export const transpose = (a: Matrix, cols = a[0]?.length ?? 0): Matrix => Array.from({ length: cols }, (_, j) => a.map((row) => row[j]));

/** A·B. Example: matMul([[1, 2]], [[3], [4]]) is [[11]]. */
export function matMul(a: Matrix, b: Matrix): Matrix {
  const cols = b[0]?.length ?? 0;
  return a.map((row) => {
    const out = new Array<number>(cols).fill(0);
    row.forEach((x, k) => {
      if (x !== 0) for (let j = 0; j < cols; j++) out[j] += x * b[k][j];
    });
    return out;
  });
}

/** A + k·B. Example: matAdd(I, I, -1) is the zero matrix. */
export const matAdd = (a: Matrix, b: Matrix, k = 1): Matrix => a.map((row, i) => row.map((x, j) => x + k * b[i][j]));

/** k·A. Example: matScale(I, 2) is 2I. */
export const matScale = (a: Matrix, k: number): Matrix => a.map((row) => row.map((x) => k * x));

/** The largest absolute row sum, ‖A‖∞. Example: normInf([[1, -2], [3, 0]]) === 3. */
export const normInf = (a: Matrix): number => Math.max(0, ...a.map((row) => row.reduce((s, x) => s + Math.abs(x), 0)));

/**
 * X with A·X = B, by Gaussian elimination with partial pivoting; throws RangeError for a singular A.
 * Example: solve([[2, 0], [0, 4]], [[2], [2]]) is [[1], [0.5]].
 */
export function solve(a: Matrix, b: Matrix): Matrix {
  const n = a.length;
  const m = a.map((row) => row.slice());
  const x = b.map((row) => row.slice());
  const scale = normInf(a);
  for (let k = 0; k < n; k++) {
    let p = k;
    for (let i = k + 1; i < n; i++) if (Math.abs(m[i][k]) > Math.abs(m[p][k])) p = i;
    if (Math.abs(m[p][k]) <= 1e-14 * scale || m[p][k] === 0) throw new RangeError("solve: the matrix is singular");
    [m[k], m[p]] = [m[p], m[k]];
    [x[k], x[p]] = [x[p], x[k]];
    for (let i = k + 1; i < n; i++) {
      const f = m[i][k] / m[k][k];
      if (f === 0) continue;
      for (let j = k; j < n; j++) m[i][j] -= f * m[k][j];
      for (let j = 0; j < x[i].length; j++) x[i][j] -= f * x[k][j];
    }
  }
  for (let k = n - 1; k >= 0; k--) {
    for (let j = 0; j < x[k].length; j++) {
      let s = x[k][j];
      for (let i = k + 1; i < n; i++) s -= m[k][i] * x[i][j];
      x[k][j] = s / m[k][k];
    }
  }
  return x;
}
