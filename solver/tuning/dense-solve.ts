/**
 * Small dense linear solve A x = b by Gaussian elimination with partial pivoting
 * (Golub & Van Loan, Matrix Computations, alg. 3.4.1). A is row-major n × n (number[][]), copied.
 * Throws when a pivot is zero (singular system). Sizes here are the number of tuning variables.
 */
export function solveDense(a: readonly number[][], b: readonly number[]): number[] {
  const n = b.length;
  const m = a.map((row, i) => [...row, b[i]]);
  for (let k = 0; k < n; k++) {
    let p = k;
    for (let i = k + 1; i < n; i++) if (Math.abs(m[i][k]) > Math.abs(m[p][k])) p = i;
    if (m[p][k] === 0 || !Number.isFinite(m[p][k])) throw new Error('singular system in the tuning step');
    [m[k], m[p]] = [m[p], m[k]];
    for (let i = k + 1; i < n; i++) {
      const f = m[i][k] / m[k][k];
      for (let j = k; j <= n; j++) m[i][j] -= f * m[k][j];
    }
  }
  const x = new Array<number>(n).fill(0);
  for (let i = n - 1; i >= 0; i--) {
    let s = m[i][n];
    for (let j = i + 1; j < n; j++) s -= m[i][j] * x[j];
    x[i] = s / m[i][i];
  }
  return x;
}
