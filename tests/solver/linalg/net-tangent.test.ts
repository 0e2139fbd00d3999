import { describe, it, expect } from 'vitest';
import { SparseLDL, symmetricMultiply } from '../../../solver/linalg/index.ts';
import { netTangent } from '../../bench/linalg/net-tangent.ts';

// The benchmark tangent (flat pretensioned net, see tests/bench/linalg/net-tangent.ts) is SPD:
// the material term EA/L d dᵀ is positive semi-definite and the geometric term N/L I with N > 0
// is positive definite (every cable tensioned, boundary fixed) — standard truss stiffness
// reasoning, common practice. All kernels must agree on it.
describe('SparseLDL on a pretensioned net tangent', () => {
  const net = netTangent(16);
  const b = Float64Array.from({ length: net.n }, (_, i) => Math.cos(0.7 * i));
  const solve = (opts: Parameters<typeof SparseLDL.analyse>[1]) => {
    const ldl = SparseLDL.analyse(net.pattern, opts);
    expect(ldl.factor(net.values)).toBe(-1);
    expect(ldl.negativePivots).toBe(0);
    const x = new Float64Array(net.n);
    ldl.solve(b, x);
    return { ldl, x };
  };

  it('gives the same fill and solution with the simplicial and supernodal kernels', () => {
    const simp = solve({ kernel: 'simplicial' });
    const sup = solve({ kernel: 'supernodal' });
    const relaxed = solve({ kernel: 'supernodal', relaxedSupernodes: true });
    expect(sup.ldl.factorNonzeros).toBe(simp.ldl.factorNonzeros);
    expect(relaxed.ldl.factorNonzeros).toBe(simp.ldl.factorNonzeros);
    const r = new Float64Array(net.n);
    for (const x of [simp.x, sup.x, relaxed.x]) {
      symmetricMultiply(net.pattern, net.values, x, r);
      let rn = 0, bn = 0;
      for (let i = 0; i < net.n; i++) { rn += (r[i] - b[i]) ** 2; bn += b[i] ** 2; }
      expect(Math.sqrt(rn / bn)).toBeLessThan(1e-12);
    }
  });

  it('node-blocked AMD gives about the fill of plain AMD and far less than natural', () => {
    const plain = SparseLDL.analyse(net.pattern, { blockSize: 1 }).factorNonzeros;
    const blocked = SparseLDL.analyse(net.pattern, { blockSize: 3 }).factorNonzeros;
    const natural = SparseLDL.analyse(net.pattern, { ordering: 'natural' }).factorNonzeros;
    expect(blocked).toBeLessThan(1.15 * plain);
    expect(blocked).toBeLessThan(0.6 * natural);
  });

  it('rejects bad input with a clear message', () => {
    const ldl = SparseLDL.analyse(net.pattern);
    expect(() => ldl.factor(new Float64Array(3))).toThrow(/values has 3 entries, the pattern has/);
    expect(() => SparseLDL.analyse(net.pattern, { blockSize: 0 })).toThrow(/blockSize must be a positive integer/);
    expect(() => SparseLDL.analyse(net.pattern, { ordering: 'metis' as never })).toThrow(/unknown ordering 'metis'/);
    expect(() => ldl.factor(net.values, -1)).toThrow(/pivotTolerance must be in \[0, 1\)/);
    const broken = Float64Array.from(net.values);
    broken[net.pattern.colPtr[5] + 1] = Number.NaN;
    const row = net.pattern.rowIdx[net.pattern.colPtr[5] + 1];
    expect(() => ldl.factor(broken)).toThrow(new RegExp(`entry \\(${row}, 5\\) is NaN`));
    expect(() => ldl.solve(new Float64Array(net.n), new Float64Array(net.n))).toThrow(/no successful factorisation/);
    expect(ldl.factor(net.values)).toBe(-1); // the instance stays usable
  });

  it('reports the first out-of-plane DOF of an unpretensioned flat net as a zero pivot', () => {
    // A flat net without pretension has no stiffness normal to its plane (a first-order mechanism;
    // common practice: the transverse stiffness of a straight cable element is N/L, the geometric
    // term of its tangent, zero for N = 0). K's z block is then zero, so the first z DOF in
    // elimination order gives d = 0 exactly.
    const slackNet = netTangent(8, 0);
    for (const kernel of ['supernodal', 'simplicial'] as const) {
      const ldl = SparseLDL.analyse(slackNet.pattern, { kernel });
      const firstZ = Array.from(ldl.perm).find((dof) => dof % 3 === 2);
      expect(ldl.factor(slackNet.values)).toBe(firstZ);
    }
  });

  it('counts negative pivots of an indefinite tangent (compressed net)', () => {
    // Negating the pretension makes the geometric term −|N|/L I: the out-of-plane (z) stiffness of
    // every free node is then negative, so K has exactly one negative eigenvalue per free node
    // (z DOFs decouple from x, y in a flat net; their block is −(|N|/L)·graph Laplacian, negative
    // definite with the boundary fixed). In-plane the material term dominates on this 16-cell net:
    // the smallest eigenvalue of a fixed-end chain Laplacian of 16 cells is 2(1 − cos(π/16)) ≈ 0.038
    // (closed form), so EA·0.038 ≈ 9.2e5 N/m exceeds the largest geometric term |N|·8 = 4e5 N/m
    // (Gershgorin bound 4 + 4 on the two grid Laplacians) and x, y stay positive.
    const flipped = netTangent(16, -50e3);
    const ldl = SparseLDL.analyse(flipped.pattern);
    expect(ldl.factor(flipped.values)).toBe(-1);
    expect(ldl.negativePivots).toBe(flipped.n / 3);
  });
});
