import type { SymmetricPattern } from './symmetric-pattern.ts';

/**
 * Matrix Market text (NIST Matrix Market exchange format, "coordinate real symmetric"):
 * lower triangle, 1-based indices, one "row col value" line per stored entry.
 */
export function writeMatrixMarketSymmetric(p: SymmetricPattern, values: Float64Array): string {
  const { n, colPtr, rowIdx } = p;
  const nz = colPtr[n];
  if (values.length !== nz) throw new Error(`Matrix Market: ${values.length} values for ${nz} pattern entries`);
  const lines: string[] = ['%%MatrixMarket matrix coordinate real symmetric', `${n} ${n} ${nz}`];
  for (let j = 0; j < n; j++) {
    for (let q = colPtr[j]; q < colPtr[j + 1]; q++) lines.push(`${rowIdx[q] + 1} ${j + 1} ${formatReal(values[q])}`);
  }
  return lines.join('\n') + '\n';
}

/** Matrix Market "array real general" text of a dense n × 1 vector (column-major). */
export function writeMatrixMarketDenseVector(v: Float64Array): string {
  const lines: string[] = ['%%MatrixMarket matrix array real general', `${v.length} 1`];
  for (let i = 0; i < v.length; i++) lines.push(formatReal(v[i]));
  return lines.join('\n') + '\n';
}

/** Shortest text that reads back to the same double. */
function formatReal(x: number): string {
  if (!Number.isFinite(x)) throw new Error(`Matrix Market: value ${x} is not finite`);
  return String(x);
}
