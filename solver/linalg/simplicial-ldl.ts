/**
 * Simplicial up-looking LDLᵀ factorisation without pivoting (T. A. Davis, Direct Methods for
 * Sparse Linear Systems, SIAM 2006, ch. 4, up-looking Cholesky, in its LDLᵀ form).
 *
 * Works on a matrix C that is already permuted: its upper triangle by columns (`ptr`, `idx`,
 * column k holds rows i <= k). L is unit lower triangular, stored by columns without the unit
 * diagonal: column j holds rows Li[Lp[j] .. Lp[j+1]-1] (ascending) with values Lx; D is diagonal.
 * All storage is allocated at construction; factor() and solve() allocate nothing.
 * Kept as the simple reference implementation; the supernodal factorisation is the fast one.
 */
export class SimplicialLDL {
  readonly n: number;
  readonly Lp: Int32Array;
  readonly Li: Int32Array;
  readonly Lx: Float64Array;
  readonly D: Float64Array;
  private readonly ptr: Int32Array;
  private readonly idx: Int32Array;
  private readonly parent: Int32Array;
  private readonly lnz: Int32Array;
  private readonly y: Float64Array;
  private readonly flag: Int32Array;
  private readonly pattern: Int32Array;

  constructor(n: number, ptr: Int32Array, idx: Int32Array, parent: Int32Array, colCount: Int32Array) {
    this.n = n;
    this.ptr = ptr;
    this.idx = idx;
    this.parent = parent;
    this.Lp = new Int32Array(n + 1);
    for (let j = 0; j < n; j++) this.Lp[j + 1] = this.Lp[j] + colCount[j];
    this.Li = new Int32Array(this.Lp[n]);
    this.Lx = new Float64Array(this.Lp[n]);
    this.D = new Float64Array(n);
    this.lnz = new Int32Array(n);
    this.y = new Float64Array(n);
    this.flag = new Int32Array(n);
    this.pattern = new Int32Array(n);
  }

  /**
   * Factorises C given its upper-triangle values cx (aligned with idx). aDiag[k] = |C[k,k]| is
   * the scale of the pivot test. Returns -1, or the (permuted) column k of the first pivot with
   * |d_k| <= tol · max(aDiag[k], tiny); in that case the factor is incomplete.
   */
  factor(cx: Float64Array, tol: number, tiny: number): number {
    const { n, ptr, idx, parent, Lp, Li, Lx, D, lnz, y, flag, pattern } = this;
    for (let k = 0; k < n; k++) {
      y[k] = 0;
      let top = n;
      flag[k] = k;
      lnz[k] = 0;
      let akk = 0;
      for (let q = ptr[k]; q < ptr[k + 1]; q++) {
        let i = idx[q];
        y[i] += cx[q];
        if (i === k) { akk = Math.abs(cx[q]); continue; }
        let len = 0;
        for (; flag[i] !== k; i = parent[i]) { pattern[len++] = i; flag[i] = k; }
        while (len > 0) pattern[--top] = pattern[--len];
      }
      let d = y[k];
      y[k] = 0;
      for (; top < n; top++) {
        const i = pattern[top];
        const yi = y[i];
        y[i] = 0;
        const p2 = Lp[i] + lnz[i];
        for (let p = Lp[i]; p < p2; p++) y[Li[p]] -= Lx[p] * yi;
        const lki = yi / D[i];
        d -= lki * yi;
        Li[p2] = k;
        Lx[p2] = lki;
        lnz[i]++;
      }
      D[k] = d;
      if (!(Math.abs(d) > tol * Math.max(akk, tiny))) return k;
    }
    return -1;
  }

  /** In place: x ← C⁻¹ x (permuted numbering). */
  solveInPlace(x: Float64Array): void {
    const { n, Lp, Li, Lx, D } = this;
    for (let j = 0; j < n; j++) {
      const xj = x[j];
      for (let p = Lp[j]; p < Lp[j + 1]; p++) x[Li[p]] -= Lx[p] * xj;
    }
    for (let j = 0; j < n; j++) x[j] /= D[j];
    for (let j = n - 1; j >= 0; j--) {
      let s = x[j];
      for (let p = Lp[j]; p < Lp[j + 1]; p++) s -= Lx[p] * x[Li[p]];
      x[j] = s;
    }
  }

  /** Number of negative entries of D. */
  negativeCount(): number {
    let c = 0;
    for (let k = 0; k < this.n; k++) if (this.D[k] < 0) c++;
    return c;
  }
}
