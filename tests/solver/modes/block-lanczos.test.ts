import { describe, expect, it } from 'vitest';
import { lowestModes } from '../../../solver/modes/block-lanczos.ts';
import type { EigenProblem } from '../../../solver/modes/eigen-problem.ts';

/** Lower-triangle CSC of a tridiagonal (spring chain) matrix with diagonal a and off-diagonal b. */
function springChain(n: number, k: number, masses: number[]): EigenProblem {
  const colPtr = new Int32Array(n + 1), rows: number[] = [], vals: number[] = [];
  for (let j = 0; j < n; j++) {
    rows.push(j); vals.push(2 * k);
    if (j + 1 < n) { rows.push(j + 1); vals.push(-k); }
    colPtr[j + 1] = rows.length;
  }
  return {
    n, colPtr, rowIdx: Int32Array.from(rows), stiffness: Float64Array.from(vals),
    mass: Float64Array.from(masses), free: new Uint8Array(n).fill(1), blockSize: 1,
  };
}

describe('block Lanczos on K⁻¹M', () => {
  it('a fixed–fixed chain of n equal masses: ω_j² = (4k/m) sin²(jπ / (2(n+1))) (closed form, e.g. Weaver, Timoshenko & Young, Vibration Problems in Engineering, 1990, ch. 5)', () => {
    const n = 400, k = 1e4, m = 2;
    const out = lowestModes(springChain(n, k, Array(n).fill(m)), { count: 10 });
    expect(out.ok).toBe(true);
    if (!out.ok) return;
    const s = out.solution;
    expect(s.converged).toBe(true);
    for (let j = 1; j <= 10; j++) {
      const exact = ((4 * k) / m) * Math.sin((j * Math.PI) / (2 * (n + 1))) ** 2;
      expect(s.eigenvalues[j - 1] / exact).toBeCloseTo(1, 11);
      // Mode shape sin(i j π/(n+1)) up to sign and M-normalisation.
      const v = s.vectors[j - 1];
      let dot = 0, nn = 0, mm = 0;
      for (let i = 0; i < n; i++) {
        const e = Math.sin(((i + 1) * j * Math.PI) / (n + 1));
        dot += m * e * v[i]; nn += m * e * e; mm += m * v[i] * v[i];
      }
      expect(mm).toBeCloseTo(1, 10);
      expect(Math.abs(dot) / Math.sqrt(nn * mm)).toBeCloseTo(1, 9);
    }
  });

  it('finds both copies of a double eigenvalue (two identical uncoupled chains)', () => {
    const half = 50, n = 2 * half, k = 3e3, m = 1.5;
    const p = springChain(n, k, Array(n).fill(m));
    // Cut the coupling between the halves: entry (half, half − 1).
    for (let q = p.colPtr[half - 1]; q < p.colPtr[half]; q++) if (p.rowIdx[q] === half) p.stiffness[q] = 0;
    const out = lowestModes(p, { count: 6 });
    if (!out.ok) throw new Error(out.failure.code);
    for (let j = 1; j <= 3; j++) {
      const exact = ((4 * k) / m) * Math.sin((j * Math.PI) / (2 * (half + 1))) ** 2;
      expect(out.solution.eigenvalues[2 * j - 2] / exact).toBeCloseTo(1, 10);
      expect(out.solution.eigenvalues[2 * j - 1] / exact).toBeCloseTo(1, 10);
    }
  });

  it('massless DOFs have no finite mode; fewer massive DOFs than wanted gives them all exactly', () => {
    // 3 DOFs, mass only on DOF 0 and 2: two finite eigenvalues of the statically condensed system.
    const p = springChain(3, 10, [1, 0, 4]);
    const out = lowestModes(p, { count: 5 });
    if (!out.ok) throw new Error(out.failure.code);
    expect(out.solution.eigenvalues.length).toBe(2);
    // Condensed stiffness: K̂ = [[20 − 5, −5], [−5, 20 − 5]] = [[15, −5], [−5, 15]]; M = diag(1, 4).
    // det(K̂ − λM) = (15 − λ)(15 − 4λ) − 25 = 4λ² − 75λ + 200 = 0.
    const disc = Math.sqrt(75 * 75 - 4 * 4 * 200);
    expect(out.solution.eigenvalues[0]).toBeCloseTo((75 - disc) / 8, 10);
    expect(out.solution.eigenvalues[1]).toBeCloseTo((75 + disc) / 8, 10);
  });

  it('refuses a mechanism (naming the DOF) and a structure without mass', () => {
    const p = springChain(4, 10, [1, 1, 1, 1]);
    p.stiffness.fill(0);
    const out = lowestModes(p, { count: 2 });
    expect(out.ok).toBe(false);
    if (!out.ok) expect(out.failure.code).toBe('mechanism');
    const q = springChain(4, 10, [0, 0, 0, 0]);
    const none = lowestModes(q, { count: 2 });
    expect(none.ok ? '' : none.failure.code).toBe('noMass');
  });
});
