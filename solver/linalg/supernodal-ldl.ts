import type { FactorBackend } from './factor-backend.ts';
import type { ScatterPlan, SupernodalStructure } from './supernodal-symbolic.ts';
import { accumulateColumns, accumulateColumnsTwice } from './dense-kernels.ts';
import { factorPanel } from './dense-panel.ts';
import { updateFrom3, updateFrom6 } from './small-updates.ts';

/**
 * Supernodal left-looking LDLᵀ without pivoting (the supernodal form of the left-looking
 * algorithm: T. A. Davis, Direct Methods for Sparse Linear Systems, SIAM 2006, ch. 4 (left-looking and supernodal Cholesky) and the
 * supernodal remarks of ch. 9; Ng & Peyton, SIAM J. Sci. Comput. 14(5), 1993).
 *
 * For each supernode s (columns f..l−1, in order):
 *  1. every descendant d with rows in [f, l) contributes  −L_d(R,:) · D_d · L_d(C,:)ᵀ  where C are
 *     d's rows inside [f, l) and R its rows from C on; the product is formed one target column at
 *     a time in a dense buffer and subtracted through a relative-row map; d then moves to the list
 *     of the supernode holding its next row (the linked lists of the left-looking method);
 *  2. the panel (diagonal block and rows below) is factorised densely (dense-panel.ts).
 * Storage as in SupernodalStructure; D separately (length n); unit diagonal stored as 1.
 * All memory is allocated in the constructor; factor() and solveInPlace() allocate nothing.
 */
export class SupernodalLDL implements FactorBackend {
  readonly factorNonzeros: number;
  private readonly st: SupernodalStructure;
  /** A's entries in storage order: value aSrc[t] goes to Lx[aPos[t]]; supernode s owns t in aSupPtr[s]..aSupPtr[s+1]. */
  private readonly aSrc: Int32Array;
  private readonly aPos: Int32Array;
  private readonly aSupPtr: Int32Array;
  private readonly Lx: Float64Array;
  private readonly D: Float64Array;
  private readonly diagPos: Int32Array;
  private readonly aDiag: Float64Array;
  private readonly relMap: Int32Array;
  private readonly relBuf: Int32Array;
  private readonly tmp: Float64Array;
  private readonly w: Float64Array;
  private readonly w2: Float64Array;
  private readonly tmp2: Float64Array;
  private readonly head: Int32Array;
  private readonly link: Int32Array;
  private readonly pos: Int32Array;

  constructor(st: SupernodalStructure, scatter: ScatterPlan) {
    this.st = st;
    // A's entries grouped by supernode, in column order (supernodal-symbolic.ts supernodalScatter).
    this.aSrc = scatter.src;
    this.aPos = scatter.pos;
    this.aSupPtr = scatter.superPtr;
    this.factorNonzeros = st.factorNonzeros;
    this.Lx = new Float64Array(st.valPtr[st.nsuper]);
    this.D = new Float64Array(st.n);
    this.diagPos = new Int32Array(st.n);
    for (let s = 0; s < st.nsuper; s++) {
      const f = st.superStart[s], nr = st.rowPtr[s + 1] - st.rowPtr[s];
      for (let j = f; j < st.superStart[s + 1]; j++) this.diagPos[j] = st.valPtr[s] + (j - f) * (nr + 1);
    }
    this.aDiag = new Float64Array(st.n);
    this.relMap = new Int32Array(st.n);
    this.relBuf = new Int32Array(st.maxRows);
    this.tmp = new Float64Array(st.maxRows);
    this.w = new Float64Array(st.maxCols);
    this.w2 = new Float64Array(st.maxCols);
    this.tmp2 = new Float64Array(st.maxRows);
    this.head = new Int32Array(st.nsuper);
    this.link = new Int32Array(st.nsuper);
    this.pos = new Int32Array(st.nsuper);
  }

  factor(values: Float64Array, tol: number, tiny: number): number {
    const { st, aSrc, aPos, aSupPtr, Lx, D, diagPos, aDiag, relMap, relBuf, tmp, tmp2, w, w2, head, link, pos } = this;
    const { nsuper, superStart, colToSuper, rowPtr, rows, valPtr } = st;
    head.fill(-1);
    for (let s = 0; s < nsuper; s++) {
      const f = superStart[s], l = superStart[s + 1], nc = l - f;
      const rp = rowPtr[s], nr = rowPtr[s + 1] - rp, base = valPtr[s];
      // ---- this supernode's columns of A (block zeroed here, while it is about to be used) ----
      Lx.fill(0, base, valPtr[s + 1]);
      for (let t = aSupPtr[s]; t < aSupPtr[s + 1]; t++) Lx[aPos[t]] = values[aSrc[t]];
      for (let j = f; j < l; j++) aDiag[j] = Math.abs(Lx[diagPos[j]]);
      for (let t = 0; t < nr; t++) relMap[rows[rp + t]] = t;
      // ---- updates from descendants ----
      let d = head[s];
      while (d !== -1) {
        const dnext = link[d];
        const fd = superStart[d], ncd = superStart[d + 1] - fd;
        const rpd = rowPtr[d], nrd = rowPtr[d + 1] - rpd, based = valPtr[d];
        const i1 = pos[d];
        let i2 = i1 + 1;
        while (i2 < nrd && rows[rpd + i2] < l) i2++;
        updateFromDescendant(Lx, D, w, w2, tmp, tmp2, relMap, relBuf, rows, rpd, nrd, based, fd, ncd, i1, i2, base, nr);
        pos[d] = i2;
        if (i2 < nrd) {
          const s2 = colToSuper[rows[rpd + i2]];
          link[d] = head[s2];
          head[s2] = d;
        }
        d = dnext;
      }
      // ---- dense panel factorisation ----
      const bad = factorPanel(Lx, base, nr, nc, D, f, aDiag, tol, tiny, w, w2, tmp, tmp2);
      if (bad >= 0) return bad;
      pos[s] = nc;
      if (nc < nr) {
        const s2 = colToSuper[rows[rp + nc]];
        link[s] = head[s2];
        head[s2] = s;
      }
    }
    return -1;
  }

  solveInPlace(x: Float64Array): void {
    const { st, Lx, D, tmp } = this;
    const { n, nsuper, superStart, rowPtr, rows, valPtr } = st;
    // Forward: L y = b. Per supernode: the dense unit-triangular block, then the rows below are
    // accumulated densely in tmp and scattered once.
    for (let s = 0; s < nsuper; s++) {
      const f = superStart[s], nc = superStart[s + 1] - f;
      const rp = rowPtr[s], nr = rowPtr[s + 1] - rp, base = valPtr[s];
      const nb = nr - nc;
      for (let i = 0; i < nb; i++) tmp[i] = 0;
      for (let j = 0; j < nc; j++) {
        const xj = x[f + j];
        if (xj === 0) continue;
        const cj = base + j * nr;
        for (let i = j + 1; i < nc; i++) x[f + i] -= Lx[cj + i] * xj;
        const cb = cj + nc;
        for (let i = 0; i < nb; i++) tmp[i] += Lx[cb + i] * xj;
      }
      for (let i = 0; i < nb; i++) x[rows[rp + nc + i]] -= tmp[i];
    }
    for (let j = 0; j < n; j++) x[j] /= D[j];
    // Backward: Lᵀ x = y. Per supernode: gather the solution at the rows below into tmp once.
    for (let s = nsuper - 1; s >= 0; s--) {
      const f = superStart[s], nc = superStart[s + 1] - f;
      const rp = rowPtr[s], nr = rowPtr[s + 1] - rp, base = valPtr[s];
      const nb = nr - nc;
      for (let i = 0; i < nb; i++) tmp[i] = x[rows[rp + nc + i]];
      for (let j = nc - 1; j >= 0; j--) {
        const cj = base + j * nr;
        let sum = x[f + j];
        for (let i = j + 1; i < nc; i++) sum -= Lx[cj + i] * x[f + i];
        const cb = cj + nc;
        for (let i = 0; i < nb; i++) sum -= Lx[cb + i] * tmp[i];
        x[f + j] = sum;
      }
    }
  }


  factorArrays(): Float64Array[] { return [this.Lx, this.D]; }

  negativeCount(): number {
    let c = 0;
    for (let j = 0; j < this.st.n; j++) if (this.D[j] < 0) c++;
    return c;
  }
}

/**
 * Subtracts descendant d's contribution L_d(R,:) · D_d · L_d(C,:)ᵀ from the target panel, where
 * C = d's local rows i1..i2−1 (the target's columns) and R = its rows from i1 on. relMap maps a
 * global row to the target's local row; the product is built one target column at a time.
 */
function updateFromDescendant(
  Lx: Float64Array, D: Float64Array, w: Float64Array, w2: Float64Array, tmp: Float64Array, tmp2: Float64Array,
  relMap: Int32Array, relBuf: Int32Array,
  rows: Int32Array, rpd: number, nrd: number, based: number, fd: number, ncd: number, i1: number, i2: number,
  base: number, nr: number,
): void {
  const m = nrd - i1;
  for (let ii = 0; ii < m; ii++) relBuf[ii] = relMap[rows[rpd + i1 + ii]];
  const ncu = i2 - i1;
  if (ncd === 3) updateFrom3(Lx, D, relBuf, based, nrd, fd, i1, m, ncu, base, nr);
  else if (ncd === 6) updateFrom6(Lx, D, relBuf, based, nrd, fd, i1, m, ncu, base, nr);
  else updateGeneral(Lx, D, w, w2, tmp, tmp2, relBuf, based, nrd, fd, ncd, i1, m, ncu, base, nr);
}

/**
 * The update for any number of descendant columns, through the dense buffers (the reference of
 * small-updates.ts); relBuf holds the target's local rows of the descendant's rows i1.. (m of them).
 */
export function updateGeneral(
  Lx: Float64Array, D: Float64Array, w: Float64Array, w2: Float64Array, tmp: Float64Array, tmp2: Float64Array,
  relBuf: Int32Array, based: number, nrd: number, fd: number, ncd: number, i1: number, m: number, ncu: number,
  base: number, nr: number,
): void {
  let j = 0;
  // Two target columns at a time: each loaded entry of L_d serves both.
  for (; j + 2 <= ncu; j += 2) {
    const row0 = based + i1 + j; // Ld[i1 + j, 0]
    for (let t = 0; t < ncd; t++) {
      const dt = D[fd + t], o = row0 + t * nrd;
      w[t] = Lx[o] * dt;
      w2[t] = Lx[o + 1] * dt;
    }
    const len = m - j;
    accumulateColumnsTwice(Lx, row0, nrd, w, w2, ncd, tmp, tmp2, len);
    const colBase = base + relBuf[j] * nr; // target column = local row index (< nc)
    for (let ii = 0; ii < len; ii++) Lx[colBase + relBuf[j + ii]] -= tmp[ii];
    const colBase2 = base + relBuf[j + 1] * nr;
    for (let ii = 1; ii < len; ii++) Lx[colBase2 + relBuf[j + ii]] -= tmp2[ii];
  }
  for (; j < ncu; j++) {
    const row0 = based + i1 + j;
    for (let t = 0; t < ncd; t++) w[t] = Lx[row0 + t * nrd] * D[fd + t];
    const len = m - j;
    accumulateColumns(Lx, row0, nrd, w, ncd, tmp, len);
    const colBase = base + relBuf[j] * nr;
    for (let ii = 0; ii < len; ii++) Lx[colBase + relBuf[j + ii]] -= tmp[ii];
  }
}
