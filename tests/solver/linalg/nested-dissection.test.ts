import { describe, it, expect } from 'vitest';
import { SparseLDL } from '../../../solver/linalg/index.ts';
import { validatePermutation } from '../../../solver/linalg/permutation.ts';
import { nestedDissection } from '../../../solver/linalg/nested-dissection.ts';
import { createSeparatorScratch, vertexSeparator } from '../../../solver/linalg/vertex-separator.ts';
import { fromDense, gridLaplacian, prng, randomSystem } from './random-systems.ts';

// Nested dissection: A. George, SIAM J. Numer. Anal. 10(2), 1973; George & Liu, Computer Solution
// of Large Sparse Positive Definite Systems, 1981 (level structures, ch. 8). Checked here against
// definitions, not numbers: a separator leaves no edge between its two sides; nnz(L) predicted
// from the elimination tree equals a brute-force count by the graph elimination model (George &
// Liu 1981: eliminating a vertex joins its remaining neighbours into a clique); the factor with
// the ordering reproduces dense products.

/** Adjacency (both directions) of an m × m five-point grid, vertex y·m + x. */
function grid(m: number): { ptr: Int32Array; idx: Int32Array } {
  const lists: number[][] = Array.from({ length: m * m }, () => []);
  for (let y = 0; y < m; y++) for (let x = 0; x < m; x++) {
    const v = y * m + x;
    if (x + 1 < m) { lists[v].push(v + 1); lists[v + 1].push(v); }
    if (y + 1 < m) { lists[v].push(v + m); lists[v + m].push(v); }
  }
  const ptr = new Int32Array(m * m + 1);
  lists.forEach((l, v) => { ptr[v + 1] = ptr[v] + l.length; });
  return { ptr, idx: Int32Array.from(lists.flat()) };
}

/** nnz(L) incl. diagonal by eliminating vertices of a dense boolean adjacency in order perm. */
function bruteForceFill(dense: number[][], perm: Int32Array): number {
  const n = dense.length;
  const adj = dense.map((row) => row.map((v) => v !== 0));
  const done = new Array<boolean>(n).fill(false);
  let nnz = 0;
  for (const p of perm) {
    const nb: number[] = [];
    for (let u = 0; u < n; u++) if (u !== p && !done[u] && adj[p][u]) nb.push(u);
    nnz += 1 + nb.length;
    for (const a of nb) for (const b of nb) if (a !== b) adj[a][b] = true;
    done[p] = true;
  }
  return nnz;
}

describe('nested dissection', () => {
  it('a level-structure separator of a grid leaves no edge between its sides, and is about one grid line long', () => {
    const m = 30;
    const g = grid(m);
    const n = m * m;
    const side = new Uint8Array(n);
    const ok = vertexSeparator(Int32Array.from({ length: n }, (_, i) => i), g.ptr, g.idx, new Int32Array(n).fill(1),
      new Int32Array(n), 0, side, createSeparatorScratch(n));
    expect(ok).toBe(true);
    for (let v = 0; v < n; v++) for (let q = g.ptr[v]; q < g.ptr[v + 1]; q++) {
      const u = g.idx[q];
      if (side[v] !== 2 && side[u] !== 2) expect(side[u]).toBe(side[v]);
    }
    const sizes = [0, 0, 0];
    for (let v = 0; v < n; v++) sizes[side[v]]++;
    expect(sizes[2]).toBeLessThanOrEqual(m + 2);
    expect(Math.min(sizes[0], sizes[1])).toBeGreaterThan(0.3 * (n - sizes[2]));
  });

  it('orders grids and random graphs as valid permutations', () => {
    for (const m of [1, 2, 7, 40]) {
      const g = grid(m);
      expect(() => validatePermutation(nestedDissection(m * m, g.ptr, g.idx, new Int32Array(m * m).fill(1)), m * m)).not.toThrow();
    }
    const rand = prng(11);
    for (let trial = 0; trial < 12; trial++) {
      const block = 1 + (trial % 3);
      const sys = randomSystem(rand, 20 + Math.floor(rand() * 150), block, 0.01 + 0.1 * rand());
      const ldl = SparseLDL.analyse(sys.pattern, { blockSize: block, ordering: 'nd' });
      expect(() => validatePermutation(ldl.perm, sys.pattern.n)).not.toThrow();
      expect(ldl.factor(sys.values)).toBe(-1);
      const x = Float64Array.from({ length: ldl.n }, () => rand());
      const b = new Float64Array(ldl.n);
      for (let i = 0; i < ldl.n; i++) for (let j = 0; j < ldl.n; j++) b[i] += sys.dense[i][j] * x[j];
      ldl.solve(b, b);
      for (let i = 0; i < ldl.n; i++) expect(b[i]).toBeCloseTo(x[i], 9);
    }
  });

  it('predicts nnz(L) exactly: the count from the elimination tree equals the graph elimination model', () => {
    const rand = prng(21);
    for (const ordering of ['amd', 'nd', 'natural'] as const) {
      for (let trial = 0; trial < 4; trial++) {
        const block = 1 + (trial % 3);
        const sys = randomSystem(rand, 30 + Math.floor(rand() * 40), block, 0.03 + 0.1 * rand());
        const ldl = SparseLDL.analyse(sys.pattern, { blockSize: block, ordering });
        expect(ldl.factorNonzeros).toBe(bruteForceFill(sys.dense, ldl.perm));
        expect(ldl.ordering.predicted[ordering]).toBe(ldl.factorNonzeros);
      }
    }
  });

  it("'auto' keeps the ordering with the smaller predicted fill", () => {
    for (const m of [12, 60]) {
      const ldl = SparseLDL.analyse(gridLaplacian(m).pattern, { blockSize: 1 });
      const { amd, nd } = ldl.ordering.predicted;
      expect(ldl.factorNonzeros).toBe(Math.min(amd!, nd!));
      expect(ldl.ordering.chosen).toBe(nd! < amd! ? 'nd' : 'amd');
    }
  });

  it('keeps the DOFs of each node together for mixed node sizes (3 and 6 DOFs) and solves exactly', () => {
    // Nodes alternate 3 and 6 DOFs; couplings between neighbouring nodes are full blocks.
    const sizes = Array.from({ length: 14 }, (_, i) => (i % 2 === 0 ? 3 : 6));
    const blockStart = [0];
    for (const s of sizes) blockStart.push(blockStart[blockStart.length - 1] + s);
    const n = blockStart[blockStart.length - 1];
    const nodeOf = (d: number) => blockStart.findIndex((b, i) => d >= b && d < blockStart[i + 1]);
    const rand = prng(5);
    const dense = Array.from({ length: n }, () => new Array<number>(n).fill(0));
    const links = [[0, 1], [1, 2], [2, 3], [3, 4], [4, 5], [5, 6], [6, 7], [7, 8], [8, 9], [9, 10], [10, 11], [11, 12], [12, 13], [0, 7], [3, 10]];
    for (const [a, b] of links) for (let i = blockStart[a]; i < blockStart[a + 1]; i++) for (let j = blockStart[b]; j < blockStart[b + 1]; j++) {
      const v = rand() - 0.5;
      dense[i][j] += v; dense[j][i] += v;
    }
    for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) if (nodeOf(i) === nodeOf(j) && i !== j) dense[i][j] = dense[j][i] = 0.01;
    for (let i = 0; i < n; i++) dense[i][i] = 1 + dense[i].reduce((s, v) => s + Math.abs(v), 0);
    const sys = fromDense(dense);
    for (const ordering of ['amd', 'nd', 'auto'] as const) {
      const ldl = SparseLDL.analyse(sys.pattern, { blockStart, ordering });
      for (let k = 0; k < n;) {
        const node = nodeOf(ldl.perm[k]);
        for (let t = 0; t < sizes[node]; t++) expect(ldl.perm[k + t]).toBe(blockStart[node] + t);
        k += sizes[node];
      }
      expect(ldl.factor(sys.values)).toBe(-1);
      const x = Float64Array.from({ length: n }, () => rand());
      const b = dense.map((row) => row.reduce((s, v, j) => s + v * x[j], 0));
      const y = Float64Array.from(b);
      ldl.solve(y, y);
      for (let i = 0; i < n; i++) expect(y[i]).toBeCloseTo(x[i], 9);
    }
  });
});
