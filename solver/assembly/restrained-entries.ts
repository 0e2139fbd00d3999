/**
 * The tangent entries of restrained DOFs. A restrained DOF stays in the system as an identity row
 * (assemble.ts): its off-diagonal entries are zero and its diagonal is 1. Element kernels may add
 * into those entries without testing every pair; assemble() clears them afterwards from this list.
 */
import type { BlockPattern } from './block-pattern.ts';

/** Value indices of the off-diagonal pattern entries whose row or column is restrained. */
export function restrainedOffDiagonal(pattern: BlockPattern, fixed: Uint8Array): Int32Array {
  const cached = cache.get(pattern);
  if (cached && cached.fixed === fixed) return cached.entries;
  const { n, colPtr, rowIdx } = pattern;
  const out: number[] = [];
  for (let j = 0; j < n; j++) {
    for (let q = colPtr[j] + 1; q < colPtr[j + 1]; q++) if (fixed[j] || fixed[rowIdx[q]]) out.push(q);
  }
  const entries = Int32Array.from(out);
  cache.set(pattern, { fixed, entries });
  return entries;
}

/** Per pattern, the list for the restraint array it was made for (a model's `fixed` does not change). */
const cache = new WeakMap<BlockPattern, { fixed: Uint8Array; entries: Int32Array }>();
