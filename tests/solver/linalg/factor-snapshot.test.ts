/**
 * SparseLDL.saveFactor / restoreFactor (solver/linalg/sparse-ldl.ts): a restored factor solves
 * exactly as it did right after its factor() — bit for bit, since the same stored numbers are used —
 * and its inertia comes back with it. Reference for the solutions themselves: mathjs dense LU
 * (lusolve), independent of this code. The snapshot belongs to the factorisation that made it.
 */
import { describe, expect, it } from 'vitest';
import { lusolve, matrix } from 'mathjs';
import { SparseLDL } from '../../../solver/linalg/index.ts';
import { prng, randomSystem } from './random-systems.ts';

const kernels = [{ kernel: 'simplicial' as const }, { kernel: 'supernodal' as const }];

describe.each(kernels)('factor snapshots (%o)', (options) => {
  it('a restored factor solves as it did, bit for bit; the inertia comes back', () => {
    const rand = prng(4242);
    const a = randomSystem(rand, 30, 3, 0.12);
    const b = { ...a, values: a.values.map((v, q) => v * (1 + 0.3 * Math.sin(q))) };
    // The same pattern with a negative diagonal share, so the two factors differ in inertia too.
    const c = randomSystem(prng(4242), 30, 3, 0.12, 0.2);
    const ldl = SparseLDL.analyse(a.pattern, { blockSize: 3, ...options });
    const rhs = Float64Array.from({ length: a.pattern.n }, (_, i) => Math.cos(i));
    const xA = new Float64Array(rhs.length), xAgain = new Float64Array(rhs.length), xB = new Float64Array(rhs.length);
    expect(ldl.factor(a.values)).toBe(-1);
    ldl.solve(rhs, xA);
    const snapshot = ldl.saveFactor();
    expect(snapshot).not.toBeNull();
    expect(ldl.factor(c.values)).toBe(-1);
    expect(ldl.negativePivots).toBeGreaterThan(0);
    ldl.restoreFactor(snapshot!);
    expect(ldl.negativePivots).toBe(0);
    ldl.solve(rhs, xAgain);
    expect(Array.from(xAgain)).toEqual(Array.from(xA));
    const ref = (lusolve(matrix(a.dense), Array.from(rhs)) as unknown as { toArray(): number[][] }).toArray().map((r) => r[0]);
    for (let i = 0; i < ref.length; i++) expect(xAgain[i]).toBeCloseTo(ref[i], 10);
    // b (another tangent on the same pattern) is factorised afresh after the restore as usual.
    expect(ldl.factor(b.values)).toBe(-1);
    ldl.solve(rhs, xB);
    expect(Array.from(xB)).not.toEqual(Array.from(xA));
  });

  it('no snapshot before a successful factor; another factorisation refuses the snapshot', () => {
    const a = randomSystem(prng(7), 10, 3, 0.3);
    const ldl = SparseLDL.analyse(a.pattern, { blockSize: 3, ...options });
    expect(ldl.saveFactor()).toBeNull();
    ldl.factor(a.values);
    const other = SparseLDL.analyse(a.pattern, { blockSize: 3, ...options });
    expect(() => other.restoreFactor(ldl.saveFactor()!)).toThrow(/another factorisation/);
  });
});
