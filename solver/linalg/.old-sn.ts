import type { FactorBackend } from './factor-backend.ts';
import type { SupernodalStructure } from './supernodal-symbolic.ts';

/**
 * Supernodal left-looking LDLᵀ without pivoting (the supernodal form of the left-looking
 * algorithm: T. A. Davis, Direct Methods for Sparse Linear Systems, SIAM 2006, §4.8 and the
 * supernodal remarks of ch. 9; Ng & Peyton, SIAM J. Sci. Comput. 14(5), 1993).
 *
 * For each supernode s (columns f..l−1, in order):
 *  1. every descendant d with rows in [f, l) contributes  −L_d(R,:) · D_d · L_d(C,:)ᵀ  where C are
 *     d's rows inside [f, l) and R its rows from C on; the product is formed one target column at
 *     a time in a dense buffer and subtracted through a relative-row map; d then moves to the list
 *     of the supernode holding its next row (Davis 2006 §4.8 linked lists);
 *  2. the panel (diagonal block and rows below) is factorised densely, column by column:
 *     l_ij = (a_ij − Σ_t l_it d_t l_jt) / d_j.
 * Storage as in SupernodalStructure; D separately (length n); unit diagonal stored as 1.
 * All memory is allocated in the constructor; factor() and solveInPlace() allocate nothing.
 */
export class SupernodalLDL implements FactorBackend {
  readonly factorNonzeros: number;
  private readonly st: SupernodalStructure;
  private readonly map: Int32Array;
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

  constructor(st: SupernodalStructure, scatterMap: Int32Array) {
    this.st = st;
    this.map = scatterMap;
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
    const { st, map, Lx, D, diagPos, aDiag, relMap, relBuf, tmp, tmp2, w, w2, head, link, pos } = this;
    const { n, nsuper, superStart, colToSuper, rowPtr, rows, valPtr } = st;
    Lx.fill(0);
    for (let q = 0; q < map.length; q++) Lx[map[q]] += values[q];
    for (let j = 0; j < n; j++) aDiag[j] = Math.abs(Lx[diagPos[j]]);
    head.fill(-1);
    for (let s = 0; s < nsuper; s++) {
      const f = superStart[s], l = superStart[s + 1], nc = l - f;
      const rp = rowPtr[s], nr = rowPtr[s + 1] - rp, base = valPtr[s];
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
      const bad = factorPanel(Lx, base, nr, nc, D, f, aDiag, tol, tiny, w, tmp);
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
    const { st, Lx, D } = this;
    const { n, nsuper, superStart, rowPtr, rows, valPtr } = st;
    for (let s = 0; s < nsuper; s++) {
      const f = superStart[s], nc = superStart[s + 1] - f;
      const rp = rowPtr[s], nr = rowPtr[s + 1] - rp, base = valPtr[s];
      for (let j = 0; j < nc; j++) {
        const xj = x[f + j];
        if (xj === 0) continue;
        const cj = base + j * nr;
        for (let i = j + 1; i < nc; i++) x[f + i] -= Lx[cj + i] * xj;
        for (let i = nc; i < nr; i++) x[rows[rp + i]] -= Lx[cj + i] * xj;
      }
    }
    for (let j = 0; j < n; j++) x[j] /= D[j];
    for (let s = nsuper - 1; s >= 0; s--) {
      const f = superStart[s], nc = superStart[s + 1] - f;
      const rp = rowPtr[s], nr = rowPtr[s + 1] - rp, base = valPtr[s];
      for (let j = nc - 1; j >= 0; j--) {
        const cj = base + j * nr;
        let sum = x[f + j];
        for (let i = j + 1; i < nc; i++) sum -= Lx[cj + i] * x[f + i];
        for (let i = nc; i < nr; i++) sum -= Lx[cj + i] * x[rows[rp + i]];
        x[f + j] = sum;
      }
    }
  }

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

/**
 * Dense LDLᵀ of a supernode panel (nr × nc, column-major at base, leading dimension nr) whose
 * updates from other supernodes are already applied. Returns -1, or the global column f + j of
 * the first pivot with |d_j| <= tol · max(aDiag, tiny).
 */
function factorPanel(
  Lx: Float64Array, base: number, nr: number, nc: number, D: Float64Array, f: number,
  aDiag: Float64Array, tol: number, tiny: number, w: Float64Array, tmp: Float64Array,
): number {
  for (let j = 0; j < nc; j++) {
    const cj = base + j * nr;
    if (j > 0) {
      // column j −= Σ_{t<j} L(:,t) · d_t · l_jt, rows j..nr−1, as one dense matrix–vector product
      for (let t = 0; t < j; t++) w[t] = Lx[base + t * nr + j] * D[f + t];
      const len = nr - j;
      accumulateColumns(Lx, base + j, nr, w, j, tmp, len);
      for (let i = 0; i < len; i++) Lx[cj + j + i] -= tmp[i];
    }
    const dj = Lx[cj + j];
    if (!(Math.abs(dj) > tol * Math.max(aDiag[f + j], tiny))) return f + j;
    D[f + j] = dj;
    Lx[cj + j] = 1;
    const inv = 1 / dj;
    for (let i = j + 1; i < nr; i++) Lx[cj + i] *= inv;
  }
  return -1;
}

/**
 * tmp[0..len) = Σ_t w[t] · Lx[off + t·ld + (0..len)] — a dense matrix–vector product over k
 * columns of leading dimension ld, unrolled by four columns.
 */
function accumulateColumns(
  Lx: Float64Array, off: number, ld: number, w: Float64Array, k: number, tmp: Float64Array, len: number,
): void {
  let t = 0;
  if (k >= 4) {
    {
      const w0 = w[0], w1 = w[1], w2 = w[2], w3 = w[3];
      const o0 = off, o1 = off + ld, o2 = off + 2 * ld, o3 = off + 3 * ld;
      for (let i = 0; i < len; i++) tmp[i] = Lx[o0 + i] * w0 + Lx[o1 + i] * w1 + Lx[o2 + i] * w2 + Lx[o3 + i] * w3;
    }
    t = 4;
    for (; t + 4 <= k; t += 4) {
      const w0 = w[t], w1 = w[t + 1], w2 = w[t + 2], w3 = w[t + 3];
      const o0 = off + t * ld, o1 = o0 + ld, o2 = o1 + ld, o3 = o2 + ld;
      for (let i = 0; i < len; i++) tmp[i] += Lx[o0 + i] * w0 + Lx[o1 + i] * w1 + Lx[o2 + i] * w2 + Lx[o3 + i] * w3;
    }
  } else {
    for (let i = 0; i < len; i++) tmp[i] = 0;
  }
  for (; t + 2 <= k; t += 2) {
    const w0 = w[t], w1 = w[t + 1];
    const o0 = off + t * ld, o1 = o0 + ld;
    for (let i = 0; i < len; i++) tmp[i] += Lx[o0 + i] * w0 + Lx[o1 + i] * w1;
  }
  for (; t < k; t++) {
    const w0 = w[t];
    const o0 = off + t * ld;
    for (let i = 0; i < len; i++) tmp[i] += Lx[o0 + i] * w0;
  }
}

/**
 * tmp[i] = Σ_t w[t] · Lx[off + t·ld + i] and tmp2[i] = Σ_t w2[t] · Lx[off + t·ld + i], i < len:
 * two dense matrix–vector products sharing the loads of the matrix, unrolled by two columns.
 */
function accumulateColumnsTwice(
  Lx: Float64Array, off: number, ld: number, w: Float64Array, w2: Float64Array, k: number,
  tmp: Float64Array, tmp2: Float64Array, len: number,
): void {
  for (let i = 0; i < len; i++) { tmp[i] = 0; tmp2[i] = 0; }
  let t = 0;
  for (; t + 4 <= k; t += 4) {
    const a0 = w[t], a1 = w[t + 1], a2 = w[t + 2], a3 = w[t + 3];
    const b0 = w2[t], b1 = w2[t + 1], b2 = w2[t + 2], b3 = w2[t + 3];
    const o0 = off + t * ld, o1 = o0 + ld, o2 = o1 + ld, o3 = o2 + ld;
    for (let i = 0; i < len; i++) {
      const x0 = Lx[o0 + i], x1 = Lx[o1 + i], x2 = Lx[o2 + i], x3 = Lx[o3 + i];
      tmp[i] += x0 * a0 + x1 * a1 + x2 * a2 + x3 * a3;
      tmp2[i] += x0 * b0 + x1 * b1 + x2 * b2 + x3 * b3;
    }
  }
  for (; t + 2 <= k; t += 2) {
    const a0 = w[t], a1 = w[t + 1], b0 = w2[t], b1 = w2[t + 1];
    const o0 = off + t * ld, o1 = o0 + ld;
    for (let i = 0; i < len; i++) {
      const x0 = Lx[o0 + i], x1 = Lx[o1 + i];
      tmp[i] += x0 * a0 + x1 * a1;
      tmp2[i] += x0 * b0 + x1 * b1;
    }
  }
  if (t < k) {
    const a0 = w[t], b0 = w2[t];
    const o0 = off + t * ld;
    for (let i = 0; i < len; i++) {
      const x0 = Lx[o0 + i];
      tmp[i] += x0 * a0;
      tmp2[i] += x0 * b0;
    }
  }
}
