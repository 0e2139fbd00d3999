/**
 * The supernodal update (supernodal-ldl.ts, updateFromDescendant) for descendants of 3 and 6
 * columns — one node's translations, or two nodes' — fused into one pass per target column pair:
 * each product entry is formed and subtracted at once instead of through the dense buffers, so
 * the many small supernodes of chains and masts spend their time on arithmetic rather than on
 * loop set-up. Every entry is the same expression, summed in the same order, as
 * accumulateColumnsTwice / accumulateColumns (dense-kernels.ts) give it — including their leading
 * 0 + … where those start from a zeroed buffer — so the factor is the same to the last bit.
 * Target and descendant are different supernodes (disjoint storage), so the order of the writes
 * does not matter.
 */

/** Descendant of 3 columns; arguments as updateFromDescendant's. */
export function updateFrom3(
  Lx: Float64Array, D: Float64Array, relBuf: Int32Array, based: number, nrd: number, fd: number,
  i1: number, m: number, ncu: number, base: number, nr: number,
): void {
  const d0 = D[fd], d1 = D[fd + 1], d2 = D[fd + 2];
  const c1 = nrd, c2 = 2 * nrd;
  let j = 0;
  for (; j + 2 <= ncu; j += 2) {
    const row0 = based + i1 + j;
    const a0 = Lx[row0] * d0, a1 = Lx[row0 + c1] * d1, a2 = Lx[row0 + c2] * d2;
    const b0 = Lx[row0 + 1] * d0, b1 = Lx[row0 + 1 + c1] * d1, b2 = Lx[row0 + 1 + c2] * d2;
    const len = m - j;
    const col = base + relBuf[j] * nr, col2 = base + relBuf[j + 1] * nr;
    Lx[col + relBuf[j]] -= (0 + (Lx[row0] * a0 + Lx[row0 + c1] * a1)) + Lx[row0 + c2] * a2;
    for (let ii = 1; ii < len; ii++) {
      const r = row0 + ii, rel = relBuf[j + ii];
      const x0 = Lx[r], x1 = Lx[r + c1], x2 = Lx[r + c2];
      Lx[col + rel] -= (0 + (x0 * a0 + x1 * a1)) + x2 * a2;
      Lx[col2 + rel] -= (0 + (x0 * b0 + x1 * b1)) + x2 * b2;
    }
  }
  if (j < ncu) {
    const row0 = based + i1 + j;
    const a0 = Lx[row0] * d0, a1 = Lx[row0 + c1] * d1, a2 = Lx[row0 + c2] * d2;
    const len = m - j;
    const col = base + relBuf[j] * nr;
    for (let ii = 0; ii < len; ii++) {
      const r = row0 + ii;
      Lx[col + relBuf[j + ii]] -= (0 + (Lx[r] * a0 + Lx[r + c1] * a1)) + Lx[r + c2] * a2;
    }
  }
}

/** Descendant of 6 columns; arguments as updateFromDescendant's. */
export function updateFrom6(
  Lx: Float64Array, D: Float64Array, relBuf: Int32Array, based: number, nrd: number, fd: number,
  i1: number, m: number, ncu: number, base: number, nr: number,
): void {
  const d0 = D[fd], d1 = D[fd + 1], d2 = D[fd + 2], d3 = D[fd + 3], d4 = D[fd + 4], d5 = D[fd + 5];
  const c1 = nrd, c2 = 2 * nrd, c3 = 3 * nrd, c4 = 4 * nrd, c5 = 5 * nrd;
  let j = 0;
  for (; j + 2 <= ncu; j += 2) {
    const row0 = based + i1 + j;
    const a0 = Lx[row0] * d0, a1 = Lx[row0 + c1] * d1, a2 = Lx[row0 + c2] * d2;
    const a3 = Lx[row0 + c3] * d3, a4 = Lx[row0 + c4] * d4, a5 = Lx[row0 + c5] * d5;
    const r1 = row0 + 1;
    const b0 = Lx[r1] * d0, b1 = Lx[r1 + c1] * d1, b2 = Lx[r1 + c2] * d2;
    const b3 = Lx[r1 + c3] * d3, b4 = Lx[r1 + c4] * d4, b5 = Lx[r1 + c5] * d5;
    const len = m - j;
    const col = base + relBuf[j] * nr, col2 = base + relBuf[j + 1] * nr;
    for (let ii = 0; ii < len; ii++) {
      const r = row0 + ii, rel = relBuf[j + ii];
      const x0 = Lx[r], x1 = Lx[r + c1], x2 = Lx[r + c2], x3 = Lx[r + c3], x4 = Lx[r + c4], x5 = Lx[r + c5];
      Lx[col + rel] -= (0 + (x0 * a0 + x1 * a1 + x2 * a2 + x3 * a3)) + (x4 * a4 + x5 * a5);
      if (ii > 0) Lx[col2 + rel] -= (0 + (x0 * b0 + x1 * b1 + x2 * b2 + x3 * b3)) + (x4 * b4 + x5 * b5);
    }
  }
  if (j < ncu) {
    const row0 = based + i1 + j;
    const a0 = Lx[row0] * d0, a1 = Lx[row0 + c1] * d1, a2 = Lx[row0 + c2] * d2;
    const a3 = Lx[row0 + c3] * d3, a4 = Lx[row0 + c4] * d4, a5 = Lx[row0 + c5] * d5;
    const len = m - j;
    const col = base + relBuf[j] * nr;
    for (let ii = 0; ii < len; ii++) {
      const r = row0 + ii;
      // accumulateColumns with 6 columns starts from its first four (no zeroed buffer).
      Lx[col + relBuf[j + ii]] -= (Lx[r] * a0 + Lx[r + c1] * a1 + Lx[r + c2] * a2 + Lx[r + c3] * a3) + (Lx[r + c4] * a4 + Lx[r + c5] * a5);
    }
  }
}
