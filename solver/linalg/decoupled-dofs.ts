import type { SymmetricPattern } from './symmetric-pattern.ts';

/**
 * Leaves out of the factorisation the off-diagonal entries of DOFs that are decoupled by value:
 * a restrained DOF kept in the system as an identity row (diagonal 1, couplings 0) still has the
 * full node blocks in an assembler's pattern, which costs fill for nothing.
 *
 * `reduced` keeps every diagonal and every entry between two coupled DOFs; keep[q] is the index
 * in reduced.rowIdx of original entry q, or -1 for a dropped entry, whose value must stay 0.
 */
export interface DecoupledReduction {
  reduced: SymmetricPattern;
  keep: Int32Array;
}

export function dropDecoupledEntries(p: SymmetricPattern, decoupled: ArrayLike<number>): DecoupledReduction {
  const { n, colPtr, rowIdx } = p;
  if (decoupled.length !== n) throw new Error(`SparseLDL: decoupledDofs has ${decoupled.length} entries, the matrix has ${n} DOFs`);
  const keep = new Int32Array(colPtr[n]).fill(-1);
  const ptr = new Int32Array(n + 1);
  let len = 0;
  for (let j = 0; j < n; j++) {
    for (let q = colPtr[j]; q < colPtr[j + 1]; q++) {
      const i = rowIdx[q];
      if (i === j || (!decoupled[i] && !decoupled[j])) keep[q] = len++;
    }
    ptr[j + 1] = len;
  }
  const idx = new Int32Array(len);
  for (let q = 0; q < keep.length; q++) if (keep[q] >= 0) idx[keep[q]] = rowIdx[q];
  return { reduced: { n, colPtr: ptr, rowIdx: idx }, keep };
}

/**
 * out[keep[q]] = values[q] for kept entries; returns the first dropped entry q whose value is not
 * 0, or -1. No allocation. With `finite` given, finite[0] receives the first entry q (kept or
 * dropped) that is NaN or infinite, or -1 — the same pass instead of a scan of its own.
 */
export function gatherKeptValues(keep: Int32Array, values: Float64Array, out: Float64Array, finite?: Int32Array): number {
  let bad = -1, nonFinite = -1;
  for (let q = 0; q < keep.length; q++) {
    const k = keep[q], v = values[q];
    if (v - v !== 0 && nonFinite < 0) nonFinite = q; // NaN or ±∞
    if (k >= 0) out[k] = v;
    else if (v !== 0 && bad < 0) bad = q;
  }
  if (finite) finite[0] = nonFinite;
  return bad;
}
