import { describe, it, expect } from 'vitest';
import { SparseLDL, fillReducingOrdering } from '../../../solver/linalg/index.ts';
import { validatePermutation } from '../../../solver/linalg/permutation.ts';
import { gridLaplacian, prng, randomSystem } from './random-systems.ts';

// AMD: Amestoy, Davis & Duff, SIAM J. Matrix Anal. Appl. 17(4), 1996. Expected behaviour checked
// here: a valid permutation, and much less fill than the natural (banded) order on a 2D grid.
// On an m × m five-point grid the natural (row-by-row) order is a band of half-width m that fills
// completely, nnz(L) ≈ n·m = O(n^1.5), while good orderings give O(n log n) (A. George, Nested
// dissection of a regular finite element mesh, SIAM J. Numer. Anal. 10, 1973); the test only asks
// for a wide margin, not a specific number.

describe('fill-reducing ordering', () => {
  it('returns a valid permutation (plain and node-blocked)', () => {
    const rand = prng(3);
    for (const block of [1, 2, 3]) {
      const sys = randomSystem(rand, 50, block, 0.06);
      const perm = fillReducingOrdering(sys.pattern, 'amd', block);
      expect(() => validatePermutation(perm, sys.pattern.n)).not.toThrow();
      const ldl = SparseLDL.analyse(sys.pattern, { blockSize: block });
      expect(() => validatePermutation(ldl.perm, sys.pattern.n)).not.toThrow();
    }
  });

  it('orders many random graphs validly and the factor stays exact', () => {
    const rand = prng(123);
    for (let trial = 0; trial < 24; trial++) {
      const block = 1 + (trial % 3);
      const sys = randomSystem(rand, 10 + Math.floor(rand() * 60), block, 0.02 + 0.3 * rand());
      const ldl = SparseLDL.analyse(sys.pattern, { blockSize: block });
      expect(() => validatePermutation(ldl.perm, sys.pattern.n)).not.toThrow();
      // SPD by construction: the factor must succeed and reproduce K x = b.
      expect(ldl.factor(sys.values)).toBe(-1);
      const x = Float64Array.from({ length: ldl.n }, () => rand());
      const b = new Float64Array(ldl.n);
      for (let i = 0; i < ldl.n; i++) for (let j = 0; j < ldl.n; j++) b[i] += sys.dense[i][j] * x[j];
      ldl.solve(b, b);
      for (let i = 0; i < ldl.n; i++) expect(b[i]).toBeCloseTo(x[i], 9);
    }
  });

  it('keeps the DOFs of a node together when blockSize = 3', () => {
    const sys = randomSystem(prng(9), 40, 3, 0.08);
    const perm = fillReducingOrdering(sys.pattern, 'amd', 3);
    for (let k = 0; k < perm.length; k += 3) {
      const node = Math.floor(perm[k] / 3);
      expect([perm[k], perm[k + 1], perm[k + 2]]).toEqual([3 * node, 3 * node + 1, 3 * node + 2]);
    }
  });

  it('reduces fill versus the natural order on a 2D grid', () => {
    const sys = gridLaplacian(40);
    const natural = SparseLDL.analyse(sys.pattern, { ordering: 'natural', blockSize: 1 }).factorNonzeros;
    const amd = SparseLDL.analyse(sys.pattern, { ordering: 'amd', blockSize: 1 }).factorNonzeros;
    // Band fill of the natural order: every column below the diagonal holds about m entries.
    expect(natural).toBeGreaterThan(40 * 40 * 39);
    expect(amd).toBeLessThan(0.5 * natural);
  });
});

describe('edge cases', () => {
  it('handles 0×0, 1×1, diagonal, disconnected and dense patterns', () => {
    const rand = prng(11);
    const cases = [
      randomSystem(rand, 1, 1, 0),
      randomSystem(rand, 7, 3, 0), // diagonal blocks only: seven disconnected nodes
      randomSystem(rand, 12, 1, 1), // dense
      randomSystem(rand, 30, 3, 0.02), // sparse, likely disconnected
    ];
    for (const sys of cases) {
      for (const kernel of ['supernodal', 'simplicial'] as const) {
        const ldl = SparseLDL.analyse(sys.pattern, { kernel });
        expect(() => validatePermutation(ldl.perm, sys.pattern.n)).not.toThrow();
        expect(ldl.factor(sys.values)).toBe(-1);
        const b = Float64Array.from({ length: ldl.n }, (_, i) => i + 1);
        const x = new Float64Array(ldl.n), r = new Float64Array(ldl.n);
        ldl.solve(b, x);
        for (let i = 0; i < ldl.n; i++) {
          let s = 0;
          for (let j = 0; j < ldl.n; j++) s += sys.dense[i][j] * x[j];
          r[i] = s;
        }
        for (let i = 0; i < ldl.n; i++) expect(r[i]).toBeCloseTo(b[i], 10);
      }
    }
    const empty = SparseLDL.analyse({ n: 0, colPtr: Int32Array.from([0]), rowIdx: new Int32Array(0) });
    expect(empty.factor(new Float64Array(0))).toBe(-1);
    expect(empty.factorNonzeros).toBe(0);
    empty.solve(new Float64Array(0), new Float64Array(0));
  });
});
