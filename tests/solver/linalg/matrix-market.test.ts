import { describe, it, expect } from 'vitest';
import { writeMatrixMarketSymmetric, writeMatrixMarketDenseVector } from '../../../solver/linalg/index.ts';
import { fromDense } from './random-systems.ts';

// Format: NIST Matrix Market exchange format (R. F. Boisvert, R. Pozo, K. Remington, "The Matrix
// Market Exchange Formats: Initial Design", NISTIR 5935, 1996): banner line, size line, then
// 1-based "row col value" entries; symmetric files store the lower triangle only; dense "array"
// files list values in column-major order.
describe('Matrix Market writers', () => {
  it('writes the lower triangle, 1-based, with the banner and the size line', () => {
    const sys = fromDense([[4, -1, 0], [-1, 4, 0.5], [0, 0.5, 2]]);
    const text = writeMatrixMarketSymmetric(sys.pattern, sys.values);
    expect(text.split('\n')).toEqual([
      '%%MatrixMarket matrix coordinate real symmetric', '3 3 5',
      '1 1 4', '2 1 -1', '2 2 4', '3 2 0.5', '3 3 2', '',
    ]);
  });

  it('round-trips doubles exactly and writes dense vectors column-major', () => {
    const v = Float64Array.from([Math.PI, -1e-300, 2.5e17, 1 / 3]);
    const lines = writeMatrixMarketDenseVector(v).trim().split('\n');
    expect(lines.slice(0, 2)).toEqual(['%%MatrixMarket matrix array real general', '4 1']);
    expect(lines.slice(2).map(Number)).toEqual(Array.from(v));
  });

  it('refuses mismatched or non-finite values', () => {
    const sys = fromDense([[1, 0], [0, 1]]);
    expect(() => writeMatrixMarketSymmetric(sys.pattern, new Float64Array(3))).toThrow(/3 values for 2 pattern entries/);
    expect(() => writeMatrixMarketDenseVector(Float64Array.from([1, NaN]))).toThrow(/NaN is not finite/);
  });
});
