import { describe, it, expect } from 'vitest';
import { multiply, matrix } from 'mathjs';
import {
  patternFromCoordinates, validatePattern, findEntry, symmetricMultiply,
} from '../../../solver/linalg/index.ts';
import { adjacencyGraph } from '../../../solver/linalg/symmetric-pattern.ts';
import { prng, randomSystem } from './random-systems.ts';

describe('SymmetricPattern helpers', () => {
  it('builds the lower triangle from coordinates: sorted, deduplicated, diagonal first', () => {
    // entries given in both triangles and twice, column 2 has no explicit diagonal
    const rows = [0, 3, 1, 1, 0, 3, 2];
    const cols = [0, 1, 3, 3, 1, 3, 0];
    const { pattern, slot } = patternFromCoordinates(4, rows, cols);
    expect(Array.from(pattern.colPtr)).toEqual([0, 3, 5, 6, 7]);
    expect(Array.from(pattern.rowIdx)).toEqual([0, 1, 2, 1, 3, 2, 3]);
    expect(() => validatePattern(pattern)).not.toThrow();
    // every coordinate entry lands on its lower-triangle slot
    for (let k = 0; k < rows.length; k++) {
      const i = Math.max(rows[k], cols[k]), j = Math.min(rows[k], cols[k]);
      expect(pattern.rowIdx[slot[k]]).toBe(i);
      expect(slot[k]).toBeGreaterThanOrEqual(pattern.colPtr[j]);
      expect(slot[k]).toBeLessThan(pattern.colPtr[j + 1]);
    }
    expect(slot[2]).toBe(slot[3]); // duplicates share a slot
    expect(findEntry(pattern, 1, 3)).toBe(findEntry(pattern, 3, 1));
    expect(findEntry(pattern, 3, 2)).toBe(-1);
  });

  it('names the entry and the problem on bad input', () => {
    expect(() => patternFromCoordinates(3, [0, 5], [0, 1])).toThrow(/entry 1 \(5, 1\) is outside the 3×3 matrix/);
    expect(() => patternFromCoordinates(3, [0], [0, 1])).toThrow(/1 row indices but 2 column indices/);
    const good = patternFromCoordinates(3, [1, 2], [0, 1]).pattern;
    expect(() => validatePattern({ ...good, rowIdx: Int32Array.from([1, 0, 1, 2, 2]) })).toThrow(/column 0 must start with its diagonal/);
    expect(() => validatePattern({ n: 2, colPtr: Int32Array.from([0, 1, 1]), rowIdx: Int32Array.from([0]) })).toThrow(/column 1 is empty/);
    expect(() => validatePattern({ n: 2, colPtr: Int32Array.from([0, 2, 3]), rowIdx: Int32Array.from([0, 5, 1]) })).toThrow(/row 5 outside/);
  });

  it('builds sorted, symmetric adjacency lists without the diagonal', () => {
    const sys = randomSystem(prng(4), 40, 3, 0.1);
    const g = adjacencyGraph(sys.pattern);
    const n = sys.pattern.n;
    let edges = 0;
    for (let v = 0; v < n; v++) {
      for (let q = g.ptr[v]; q < g.ptr[v + 1]; q++) {
        const u = g.idx[q];
        expect(u).not.toBe(v);
        if (q > g.ptr[v]) expect(u).toBeGreaterThan(g.idx[q - 1]);
        expect(sys.dense[u][v]).not.toBe(0);
        edges++;
      }
    }
    let offDiagonal = 0;
    for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) if (i !== j && sys.dense[i][j] !== 0) offDiagonal++;
    expect(edges).toBe(offDiagonal);
  });

  it('multiplies like mathjs on the dense matrix', () => {
    // Reference: mathjs dense matrix–vector product.
    const rand = prng(21);
    const sys = randomSystem(rand, 15, 2, 0.2, 0.3);
    const x = Float64Array.from({ length: sys.pattern.n }, () => rand() - 0.5);
    const y = new Float64Array(sys.pattern.n);
    symmetricMultiply(sys.pattern, sys.values, x, y);
    const ref = (multiply(matrix(sys.dense), Array.from(x)) as unknown as { toArray(): number[] }).toArray();
    for (let i = 0; i < ref.length; i++) expect(y[i]).toBeCloseTo(ref[i], 12);
  });
});
