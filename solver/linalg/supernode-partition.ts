/**
 * Partition of the (postordered) columns into supernodes.
 *
 * 1. Fundamental supernodes: column j+1 joins j when parent[j] = j+1 and
 *    |L(:,j)| = |L(:,j+1)| + 1 (identical structure below the diagonal block; Liu, Ng & Peyton,
 *    SIAM J. Matrix Anal. Appl. 14(1), 1993).
 * 2. Relaxed amalgamation (C. Ashcraft & R. Grimes, "The influence of relaxed supernode
 *    partitions on the multifrontal method", ACM TOMS 15(4), 1989): a supernode is merged with its
 *    parent when it is the parent's last child (its columns end right before the parent's) and
 *    the explicit zeros this adds stay within a budget that shrinks as the merged supernode grows.
 *    The thresholds below are our own tuning on the benchmark nets (the idea of a size-dependent
 *    zero budget is common practice in supernodal codes).
 * Fewer, larger supernodes mean fewer, longer dense kernel calls at the price of some zeros.
 */

/** [max merged columns, max fraction of explicit zeros in the merged block]. */
const RELAX: ReadonlyArray<readonly [number, number]> = [[4, 1], [16, 0.5], [48, 0.1], [Infinity, 0.05]];

/**
 * Returns superStart (length nsuper + 1). colCount = entries strictly below the diagonal per
 * column; `relax` = false gives the fundamental partition.
 */
export function supernodePartition(n: number, parent: Int32Array, colCount: Int32Array, relax = true): Int32Array {
  const starts: number[] = [];
  for (let j = 0; j < n; j++) {
    const joins = j > 0 && parent[j - 1] === j && colCount[j - 1] === colCount[j] + 1;
    if (!joins) starts.push(j);
  }
  starts.push(n);
  if (!relax) return Int32Array.from(starts);
  const ns = starts.length - 1;
  // Groups are contiguous runs of fundamental supernodes, built bottom-up. When supernode s is
  // reached, the group ending at s − 1 has its top at s − 1; per group top t: first[t] = its
  // first fundamental supernode, gCols = columns of the merged block, gTrue = true nnz in it.
  const first = new Int32Array(ns);
  const gCols = new Int32Array(ns);
  const gTrue = new Float64Array(ns);
  for (let s = 0; s < ns; s++) {
    const f = starts[s], nc = starts[s + 1] - f, nr = colCount[f] + 1;
    first[s] = s;
    gCols[s] = nc;
    gTrue[s] = nc * nr - (nc * (nc - 1)) / 2;
    if (s === 0) continue;
    const c = s - 1;
    const pc = parent[f - 1]; // parent of the previous group's top column
    if (pc < f || pc >= starts[s + 1]) continue; // not the last child of s
    const cols = gCols[c] + nc, rows = gCols[c] + nr;
    const stored = cols * rows - (cols * (cols - 1)) / 2;
    const trueNz = gTrue[c] + gTrue[s];
    const zeros = (stored - trueNz) / stored;
    let ok = false;
    for (const [maxCols, maxZeros] of RELAX) if (cols <= maxCols) { ok = zeros <= maxZeros; break; }
    if (!ok) continue;
    first[s] = first[c];
    gCols[s] = cols; gTrue[s] = trueNz;
  }
  const out: number[] = [];
  for (let s = 0; s < ns; s++) if (first[s] === s) out.push(starts[s]);
  out.push(n);
  return Int32Array.from(out);
}
