import { describe, it, expect } from 'vitest';
import { lusolve, matrix } from 'mathjs';
import { SparseLDL } from '../../../solver/linalg/index.ts';
import { prng, randomSystem } from './random-systems.ts';

// Restrained DOFs kept as identity rows (common practice in direct stiffness assembly: diagonal 1,
// couplings 0, right-hand side 0) give the same solution whether or not their (zero) couplings are
// factorised. Reference: mathjs dense LU solve.
describe('SparseLDL with decoupled (restrained) DOFs', () => {
  const rand = prng(31);
  const sys = randomSystem(rand, 40, 3, 0.12);
  const n = sys.pattern.n;
  const restrained = new Uint8Array(n);
  for (let i = 0; i < n; i++) if (rand() < 0.25) restrained[i] = 1;
  // Identity rows: zero every coupling of a restrained DOF (pattern unchanged), diagonal 1.
  const values = Float64Array.from(sys.values);
  const dense = sys.dense.map((r) => [...r]);
  const { colPtr, rowIdx } = sys.pattern;
  for (let j = 0; j < n; j++) {
    for (let q = colPtr[j]; q < colPtr[j + 1]; q++) {
      const i = rowIdx[q];
      if (i === j) { if (restrained[j]) { values[q] = 1; dense[j][j] = 1; } continue; }
      if (restrained[i] || restrained[j]) { values[q] = 0; dense[i][j] = 0; dense[j][i] = 0; }
    }
  }
  const b = Float64Array.from({ length: n }, (_, i) => (restrained[i] ? 0 : rand() - 0.5));

  it('gives the mathjs solution with less fill', () => {
    const plain = SparseLDL.analyse(sys.pattern);
    const reduced = SparseLDL.analyse(sys.pattern, { decoupledDofs: restrained });
    expect(reduced.factorNonzeros).toBeLessThan(plain.factorNonzeros);
    const ref = (lusolve(matrix(dense), Array.from(b)) as unknown as { toArray(): number[][] }).toArray().map((r) => r[0]);
    for (const ldl of [plain, reduced]) {
      expect(ldl.factor(values)).toBe(-1);
      const x = new Float64Array(n);
      ldl.solve(b, x);
      for (let i = 0; i < n; i++) expect(x[i]).toBeCloseTo(ref[i], 10);
    }
  });

  it('refuses a non-zero coupling of a decoupled DOF, naming the entry', () => {
    const reduced = SparseLDL.analyse(sys.pattern, { decoupledDofs: restrained });
    const j = restrained.indexOf(1);
    let q = -1;
    for (let c = 0; c < n && q < 0; c++) {
      for (let p = colPtr[c] + 1; p < colPtr[c + 1]; p++) if (rowIdx[p] === j || c === j) { q = p; break; }
    }
    expect(q).toBeGreaterThanOrEqual(0);
    const broken = Float64Array.from(values);
    broken[q] = 0.5;
    expect(() => reduced.factor(broken)).toThrow(/couples a DOF declared decoupled but is 0.5, not 0/);
    expect(() => SparseLDL.analyse(sys.pattern, { decoupledDofs: new Uint8Array(3) })).toThrow(/decoupledDofs has 3 entries/);
  });

  it('names the first non-finite entry, kept or dropped, before any decoupling complaint', () => {
    const reduced = SparseLDL.analyse(sys.pattern, { decoupledDofs: restrained });
    const dropped: number[] = [], kept: number[] = [];
    for (let c = 0; c < n; c++) {
      for (let p = colPtr[c] + 1; p < colPtr[c + 1]; p++) (restrained[rowIdx[p]] || restrained[c] ? dropped : kept).push(p);
    }
    const name = (q: number): string => { let c = 0; while (colPtr[c + 1] <= q) c++; return `(${rowIdx[q]}, ${c})`; };
    for (const [q, v] of [[kept[0], Number.NaN], [dropped[0], Number.POSITIVE_INFINITY]] as const) {
      const broken = Float64Array.from(values);
      broken[q] = v;
      broken[dropped[dropped.length - 1]] = 0.5; // a later decoupling fault: the non-finite entry is named first
      if (q === dropped[dropped.length - 1]) continue;
      expect(() => reduced.factor(broken)).toThrow(`matrix entry ${name(q)} is ${v}; the tangent must be finite`);
    }
    expect(reduced.factor(values)).toBe(-1); // and the next finite tangent factorises as usual
  });
});
