/**
 * Newton's method for a handful of nonlinear equations R(x) = 0, with a central-difference
 * Jacobian, Gaussian elimination with partial pivoting and step halving on ‖R‖. Written for the
 * reduced reference problems in this folder (2 or 3 unknowns); independent of the solver.
 * Numerical Jacobian: J_ij ≈ (R_i(x + h e_j) − R_i(x − h e_j)) / 2h, h = relStep · max(|x_j|, scale_j)
 * (standard practice, e.g. Dennis & Schnabel, Numerical Methods for Unconstrained Optimization and
 * Nonlinear Equations, 1983, §5.4).
 */

export interface SmallNewtonOptions {
  /** Typical magnitude of each unknown, used for the difference step and the step test. */
  scale: number[];
  /** Stop when ‖R‖∞ ≤ residualTol (units of R). */
  residualTol: number;
  maxIterations?: number;
  relStep?: number;
}

export interface SmallNewtonResult {
  x: number[];
  residual: number;
  iterations: number;
}

export function solveSmallNewton(
  residual: (x: number[]) => number[], x0: number[], options: SmallNewtonOptions,
): SmallNewtonResult {
  const n = x0.length;
  const relStep = options.relStep ?? 1e-6;
  const maxIterations = options.maxIterations ?? 100;
  let x = x0.slice();
  let r = residual(x);
  let norm = maxAbs(r);
  for (let it = 0; it < maxIterations; it++) {
    if (norm <= options.residualTol) return { x, residual: norm, iterations: it };
    const J: number[][] = Array.from({ length: n }, () => new Array<number>(n).fill(0));
    for (let j = 0; j < n; j++) {
      const h = relStep * Math.max(Math.abs(x[j]), options.scale[j]);
      const xp = x.slice(); xp[j] += h;
      const xm = x.slice(); xm[j] -= h;
      const rp = residual(xp), rm = residual(xm);
      for (let i = 0; i < n; i++) J[i][j] = (rp[i] - rm[i]) / (2 * h);
    }
    const dx = gaussSolve(J, r.map((v) => -v));
    let s = 1;
    for (let k = 0; k < 40; k++, s *= 0.5) {
      const trial = x.map((v, i) => v + s * dx[i]);
      const rt = residual(trial);
      const nt = maxAbs(rt);
      if (Number.isFinite(nt) && nt < norm) { x = trial; r = rt; norm = nt; break; }
      if (k === 39) throw new Error(`small Newton: no descent at iteration ${it} (‖R‖ = ${norm})`);
    }
  }
  if (norm <= options.residualTol) return { x, residual: norm, iterations: maxIterations };
  throw new Error(`small Newton: not converged, ‖R‖ = ${norm}`);
}

function maxAbs(v: number[]): number {
  let m = 0;
  for (const a of v) m = Math.max(m, Math.abs(a));
  return Number.isNaN(m) ? Infinity : m;
}

/** Solve A x = b for a small dense A (copied), partial pivoting. Throws on a singular matrix. */
export function gaussSolve(A: number[][], b: number[]): number[] {
  const n = b.length;
  const M = A.map((row, i) => [...row, b[i]]);
  for (let c = 0; c < n; c++) {
    let p = c;
    for (let r = c + 1; r < n; r++) if (Math.abs(M[r][c]) > Math.abs(M[p][c])) p = r;
    if (M[p][c] === 0) throw new Error('small Newton: singular Jacobian');
    [M[c], M[p]] = [M[p], M[c]];
    for (let r = c + 1; r < n; r++) {
      const f = M[r][c] / M[c][c];
      for (let k = c; k <= n; k++) M[r][k] -= f * M[c][k];
    }
  }
  const x = new Array<number>(n).fill(0);
  for (let r = n - 1; r >= 0; r--) {
    let s = M[r][n];
    for (let k = r + 1; k < n; k++) s -= M[r][k] * x[k];
    x[r] = s / M[r][r];
  }
  return x;
}
