import { describe, it, expect } from 'vitest';
import { lusolve, eigs, matrix } from 'mathjs';
import { SparseLDL, symmetricMultiply, patternFromCoordinates } from '../../../solver/linalg/index.ts';
import { prng, randomSystem, gridLaplacian } from './random-systems.ts';

// Reference: mathjs dense LU solve (partial pivoting) and symmetric eigenvalues, a general-purpose
// library independent of this code. Factorisation method under test: T. A. Davis, Direct Methods
// for Sparse Linear Systems, SIAM 2006, ch. 4 (LDLᵀ), ordering by AMD (Amestoy, Davis & Duff,
// SIAM J. Matrix Anal. Appl. 17(4), 1996).

const kernels = [
  { kernel: 'simplicial' as const, relaxedSupernodes: false },
  { kernel: 'supernodal' as const, relaxedSupernodes: false },
  { kernel: 'supernodal' as const, relaxedSupernodes: true },
];

function relErr(x: Float64Array, ref: number[]): number {
  let num = 0, den = 0;
  for (let i = 0; i < ref.length; i++) { num += (x[i] - ref[i]) ** 2; den += ref[i] ** 2; }
  return Math.sqrt(num / den);
}

function denseSolve(dense: number[][], b: Float64Array): number[] {
  const sol = lusolve(matrix(dense), Array.from(b)) as unknown as { toArray(): number[][] };
  return sol.toArray().map((r) => r[0]);
}

describe.each(kernels)('SparseLDL (%o)', (kernelOptions) => {
  const cases = [
    { nodes: 12, block: 1, density: 0.3, ordering: 'amd' as const },
    { nodes: 40, block: 1, density: 0.08, ordering: 'amd' as const },
    { nodes: 30, block: 3, density: 0.1, ordering: 'amd' as const },
    { nodes: 25, block: 3, density: 0.2, ordering: 'natural' as const },
    { nodes: 60, block: 2, density: 0.05, ordering: 'amd' as const },
  ];

  it.each(cases)('solves random SPD systems like mathjs lusolve (%o)', ({ nodes, block, density, ordering }) => {
    const rand = prng(1000 + nodes * 7 + block);
    for (let trial = 0; trial < 3; trial++) {
      const sys = randomSystem(rand, nodes, block, density);
      const ldl = SparseLDL.analyse(sys.pattern, { blockSize: block, ordering, ...kernelOptions });
      expect(ldl.factor(sys.values)).toBe(-1);
      expect(ldl.negativePivots).toBe(0);
      const b = Float64Array.from({ length: ldl.n }, () => rand() - 0.5);
      const x = new Float64Array(ldl.n);
      ldl.solve(b, x);
      expect(relErr(x, denseSolve(sys.dense, b))).toBeLessThan(1e-10);
      // Refactorise with new values on the same pattern and solve in place (x aliases b).
      const scaled = sys.values.map((v) => 2 * v);
      expect(ldl.factor(scaled)).toBe(-1);
      const bb = Float64Array.from(b);
      ldl.solve(bb, bb);
      for (let i = 0; i < ldl.n; i++) expect(bb[i]).toBeCloseTo(x[i] / 2, 10);
    }
  });

  it('matches mathjs on symmetric indefinite systems and counts the negative eigenvalues', () => {
    const rand = prng(77);
    for (const [nodes, block] of [[10, 1], [8, 3], [20, 1], [12, 2]]) {
      const sys = randomSystem(rand, nodes, block, 0.25, 0.4);
      const ldl = SparseLDL.analyse(sys.pattern, { blockSize: block, ...kernelOptions });
      expect(ldl.factor(sys.values)).toBe(-1);
      // Sylvester's law of inertia: D has as many negative entries as K has negative eigenvalues.
      const ev = eigs(matrix(sys.dense)).values as unknown as { toArray(): number[] };
      const negatives = ev.toArray().filter((v) => v < 0).length;
      expect(negatives).toBeGreaterThan(0);
      expect(ldl.negativePivots).toBe(negatives);
      const b = Float64Array.from({ length: ldl.n }, () => rand() - 0.5);
      const x = new Float64Array(ldl.n);
      ldl.solve(b, x);
      expect(relErr(x, denseSolve(sys.dense, b))).toBeLessThan(1e-10);
    }
  });

  it('reports the original index of a zero pivot (spring chain with an unsupported DOF)', () => {
    // Common practice: a DOF with no stiffness (a mechanism) gives a zero pivot.
    // Chain of 6 nodes along x: springs k = 1 between neighbours, node 0 grounded in x;
    // y and z grounded with springs except z of node 4 (DOF 14), which has no stiffness.
    const nodes = 6, n = 3 * nodes;
    const dense = Array.from({ length: n }, () => new Array<number>(n).fill(0));
    for (let a = 0; a + 1 < nodes; a++) {
      const i = 3 * a, j = 3 * (a + 1);
      dense[i][i] += 1; dense[j][j] += 1; dense[i][j] -= 1; dense[j][i] -= 1;
    }
    dense[0][0] += 1;
    for (let a = 0; a < nodes; a++) { dense[3 * a + 1][3 * a + 1] += 2; if (a !== 4) dense[3 * a + 2][3 * a + 2] += 3; }
    const sys = (() => {
      const rows: number[] = [], cols: number[] = [], vals: number[] = [];
      // Full 3×3 node-pair blocks in the pattern (zeros included), as an assembler stores them.
      for (let j = 0; j < n; j++) for (let i = j; i < n; i++) {
        const sameOrNeighbour = Math.abs(Math.floor(i / 3) - Math.floor(j / 3)) <= 1;
        if (!sameOrNeighbour) continue;
        rows.push(i); cols.push(j); vals.push(dense[i][j]);
      }
      return { rows, cols, vals };
    })();
    for (const ordering of ['natural', 'amd'] as const) {
      const built = patternFromCoords(n, sys.rows, sys.cols, sys.vals);
      const ldl = SparseLDL.analyse(built.pattern, { ordering, ...kernelOptions });
      expect(ldl.factor(built.values)).toBe(14);
      expect(() => ldl.solve(new Float64Array(n), new Float64Array(n))).toThrow(/no successful factorisation/);
      // Support the DOF: now positive definite.
      built.values[built.diag(14)] = 5;
      expect(ldl.factor(built.values)).toBe(-1);
      expect(ldl.negativePivots).toBe(0);
    }
  });

  it('finds the mechanism of a 1D spring chain: a free end DOF and a free-free chain', () => {
    // Chain of 10 DOFs, unit springs between neighbours. (a) DOF 0 grounded, the last spring
    // missing (value 0, still in the pattern): the free end DOF 9 has no stiffness → zero pivot 9.
    // (b) No grounding at all: a rigid-body mode. Every proper principal submatrix of a connected
    // graph Laplacian is positive definite, so only the last pivot in elimination order vanishes
    // (in the natural order exactly: d_k = 1 for k < n−1 and d_{n−1} = 1 − 1 = 0).
    const n = 10;
    const chain = (grounded: boolean, lastSpring: number) => {
      const rows: number[] = [], cols: number[] = [], vals: number[] = [];
      for (let i = 0; i + 1 < n; i++) {
        const k = i + 1 === n - 1 ? lastSpring : 1;
        rows.push(i, i + 1, i + 1); cols.push(i, i + 1, i); vals.push(k, k, -k);
      }
      if (grounded) { rows.push(0); cols.push(0); vals.push(1); }
      return patternFromCoords(n, rows, cols, vals);
    };
    const freeEnd = chain(true, 0);
    const freeFree = chain(false, 1);
    for (const ordering of ['natural', 'amd'] as const) {
      const a = SparseLDL.analyse(freeEnd.pattern, { ordering, blockSize: 1, ...kernelOptions });
      expect(a.factor(freeEnd.values)).toBe(9);
      const b = SparseLDL.analyse(freeFree.pattern, { ordering, blockSize: 1, ...kernelOptions });
      expect(b.factor(freeFree.values)).toBe(b.perm[n - 1]);
      if (ordering === 'natural') expect(b.perm[n - 1]).toBe(9);
    }
  });

  it('solves a 2D grid Laplacian with relative residual below 1e-12', () => {
    const sys = gridLaplacian(60);
    const ldl = SparseLDL.analyse(sys.pattern, { blockSize: 1, ...kernelOptions });
    expect(ldl.factor(sys.values)).toBe(-1);
    const rand = prng(5);
    const b = Float64Array.from({ length: ldl.n }, () => rand() - 0.5);
    const x = new Float64Array(ldl.n), r = new Float64Array(ldl.n);
    ldl.solve(b, x);
    symmetricMultiply(sys.pattern, sys.values, x, r);
    let rn = 0, bn = 0;
    for (let i = 0; i < ldl.n; i++) { rn += (r[i] - b[i]) ** 2; bn += b[i] ** 2; }
    expect(Math.sqrt(rn / bn)).toBeLessThan(1e-12);
  });
});

function patternFromCoords(n: number, rows: number[], cols: number[], vals: number[]) {
  const { pattern, slot } = patternFromCoordinates(n, rows, cols);
  const values = new Float64Array(pattern.rowIdx.length);
  for (let q = 0; q < slot.length; q++) values[slot[q]] += vals[q];
  return { pattern, values, diag: (j: number) => pattern.colPtr[j] };
}
