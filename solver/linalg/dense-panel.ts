import { accumulateColumns, accumulateColumnsTwice } from './dense-kernels.ts';

/**
 * Dense LDLᵀ of a supernode panel (nr × nc, column-major at base, leading dimension nr) whose
 * updates from other supernodes are already applied: left-looking within the panel,
 * l_ij = (a_ij − Σ_{t<j} l_it d_t l_jt) / d_j (Davis 2006, ch. 4, dense case), two columns at a time.
 * D receives d_j at f + j; the unit diagonal is stored as 1; w, w2, tmp, tmp2 are workspaces.
 * Returns -1, or the global column f + j of the first pivot with |d_j| <= tol · max(aDiag, tiny)
 * (aDiag = |original diagonal|; a NaN pivot from non-finite input is reported the same way).
 */
export function factorPanel(
  Lx: Float64Array, base: number, nr: number, nc: number, D: Float64Array, f: number,
  aDiag: Float64Array, tol: number, tiny: number, w: Float64Array, w2: Float64Array,
  tmp: Float64Array, tmp2: Float64Array,
): number {
  if (nc === 3) return factorPanel3(Lx, base, nr, D, f, aDiag, tol, tiny);
  return factorPanelGeneral(Lx, base, nr, nc, D, f, aDiag, tol, tiny, w, w2, tmp, tmp2);
}

/** factorPanel for any number of columns (the reference of factorPanel3). */
export function factorPanelGeneral(
  Lx: Float64Array, base: number, nr: number, nc: number, D: Float64Array, f: number,
  aDiag: Float64Array, tol: number, tiny: number, w: Float64Array, w2: Float64Array,
  tmp: Float64Array, tmp2: Float64Array,
): number {
  let j = 0;
  // Two columns at a time: the updates from columns t < j share their loads (as in the update).
  for (; j + 2 <= nc; j += 2) {
    const cj = base + j * nr, cj1 = cj + nr;
    const len = nr - j;
    if (j > 0) {
      for (let t = 0; t < j; t++) {
        const o = base + t * nr + j, dt = D[f + t];
        w[t] = Lx[o] * dt;
        w2[t] = Lx[o + 1] * dt;
      }
      accumulateColumnsTwice(Lx, base + j, nr, w, w2, j, tmp, tmp2, len);
      for (let i = 0; i < len; i++) Lx[cj + j + i] -= tmp[i];
      for (let i = 1; i < len; i++) Lx[cj1 + j + i] -= tmp2[i];
    }
    const bad = finishColumn(Lx, cj, j, nr, D, f, aDiag, tol, tiny);
    if (bad >= 0) return bad;
    // column j+1 −= L(:,j) · d_j · l_{j+1,j}
    const wj = Lx[cj + j + 1] * D[f + j];
    if (wj !== 0) for (let i = j + 1; i < nr; i++) Lx[cj1 + i] -= Lx[cj + i] * wj;
    const bad1 = finishColumn(Lx, cj1, j + 1, nr, D, f, aDiag, tol, tiny);
    if (bad1 >= 0) return bad1;
  }
  for (; j < nc; j++) {
    const cj = base + j * nr;
    if (j > 0) {
      // column j −= Σ_{t<j} L(:,t) · d_t · l_jt, rows j..nr−1, as one dense matrix–vector product
      for (let t = 0; t < j; t++) w[t] = Lx[base + t * nr + j] * D[f + t];
      const len = nr - j;
      accumulateColumns(Lx, base + j, nr, w, j, tmp, len);
      for (let i = 0; i < len; i++) Lx[cj + j + i] -= tmp[i];
    }
    const bad = finishColumn(Lx, cj, j, nr, D, f, aDiag, tol, tiny);
    if (bad >= 0) return bad;
  }
  return -1;
}

/**
 * factorPanel for a panel of 3 columns (one node's translations: most supernodes of chains and
 * masts) without the dense buffers: the same operations in the same order — column 2's update is
 * accumulateColumns' 0 + (l_i0 w_0 + l_i1 w_1) — so the same bits.
 */
export function factorPanel3(
  Lx: Float64Array, base: number, nr: number, D: Float64Array, f: number, aDiag: Float64Array, tol: number, tiny: number,
): number {
  const c0 = base, c1 = base + nr, c2 = base + 2 * nr;
  let bad = finishColumn(Lx, c0, 0, nr, D, f, aDiag, tol, tiny);
  if (bad >= 0) return bad;
  const wj = Lx[c0 + 1] * D[f];
  if (wj !== 0) for (let i = 1; i < nr; i++) Lx[c1 + i] -= Lx[c0 + i] * wj;
  bad = finishColumn(Lx, c1, 1, nr, D, f, aDiag, tol, tiny);
  if (bad >= 0) return bad;
  const w0 = Lx[c0 + 2] * D[f], w1 = Lx[c1 + 2] * D[f + 1];
  for (let i = 2; i < nr; i++) Lx[c2 + i] -= 0 + (Lx[c0 + i] * w0 + Lx[c1 + i] * w1);
  return finishColumn(Lx, c2, 2, nr, D, f, aDiag, tol, tiny);
}

/** Pivot test, D entry and scaling of an updated panel column j (at offset cj). */
function finishColumn(
  Lx: Float64Array, cj: number, j: number, nr: number, D: Float64Array, f: number,
  aDiag: Float64Array, tol: number, tiny: number,
): number {
  const dj = Lx[cj + j];
  if (!(Math.abs(dj) > tol * Math.max(aDiag[f + j], tiny))) return f + j;
  D[f + j] = dj;
  Lx[cj + j] = 1;
  const inv = 1 / dj;
  for (let i = j + 1; i < nr; i++) Lx[cj + i] *= inv;
  return -1;
}
