// Own float matrix exponential: shared/ may use only mathjs's number build, which has no matrix functions.
// Scaling and squaring with the degree-6 diagonal Padé approximant, accurate to double precision once the
// scaled norm is at most 1/2.

export type Matrix = number[][];

const identity = (n: number): Matrix => Array.from({ length: n }, (_, i) => Array.from({ length: n }, (_, j) => (i === j ? 1 : 0)));

/** A·B of square matrices. Example: matMul([[0, 1], [0, 0]], [[0, 1], [0, 0]]) is the zero matrix. */
export function matMul(a: Matrix, b: Matrix): Matrix {
  const n = a.length;
  const out = Array.from({ length: n }, () => new Array<number>(n).fill(0));
  for (let i = 0; i < n; i++) {
    for (let k = 0; k < n; k++) {
      const aik = a[i][k];
      if (aik === 0) continue;
      for (let j = 0; j < n; j++) out[i][j] += aik * b[k][j];
    }
  }
  return out;
}

/** X with A·X = B by Gaussian elimination with partial pivoting (A square and regular). */
function solve(a: Matrix, b: Matrix): Matrix {
  const n = a.length;
  const m = a.map((row, i) => [...row, ...b[i]]);
  for (let c = 0; c < n; c++) {
    let p = c;
    for (let r = c + 1; r < n; r++) if (Math.abs(m[r][c]) > Math.abs(m[p][c])) p = r;
    [m[c], m[p]] = [m[p], m[c]];
    for (let r = c + 1; r < n; r++) {
      const f = m[r][c] / m[c][c];
      if (f !== 0) for (let j = c; j < m[r].length; j++) m[r][j] -= f * m[c][j];
    }
  }
  const x = Array.from({ length: n }, () => new Array<number>(b[0].length).fill(0));
  for (let r = n - 1; r >= 0; r--) {
    for (let j = 0; j < b[0].length; j++) {
      let v = m[r][n + j];
      for (let k = r + 1; k < n; k++) v -= m[r][k] * x[k][j];
      x[r][j] = v / m[r][r];
    }
  }
  return x;
}

/** Padé (6, 6) coefficients of e^x: c_k = (12 − k)!·6! / (12!·k!·(6 − k)!). */
const PADE6 = [1, 1 / 2, 5 / 44, 1 / 66, 1 / 792, 1 / 15840, 1 / 665280];

/**
 * e^A of a square matrix. Example: expm([[0, 1], [0, 0]]) is [[1, 1], [0, 1]].
 */
export function expm(a: Matrix): Matrix {
  const n = a.length;
  const norm = Math.max(0, ...a[0].map((_, j) => a.reduce((sum, row) => sum + Math.abs(row[j]), 0)));
  const squarings = norm > 0.5 ? Math.ceil(Math.log2(norm / 0.5)) : 0;
  const scale = 2 ** -squarings;
  const x = a.map((row) => row.map((v) => v * scale));
  let power = identity(n);
  const num = identity(n);
  const den = identity(n);
  for (let k = 1; k < PADE6.length; k++) {
    power = matMul(power, x);
    const sign = k % 2 ? -1 : 1;
    for (let i = 0; i < n; i++) {
      for (let j = 0; j < n; j++) {
        num[i][j] += PADE6[k] * power[i][j];
        den[i][j] += sign * PADE6[k] * power[i][j];
      }
    }
  }
  let e = solve(den, num);
  for (let s = 0; s < squarings; s++) e = matMul(e, e);
  return e;
}
