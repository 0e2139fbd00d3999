import { describe, expect, it } from 'vitest';
import { solveBoundedLeastSquares, finiteDifferenceJacobian } from '../../../solver/tuning/levenberg-marquardt.ts';
import { solveDense } from '../../../solver/tuning/dense-solve.ts';
import { diagnoseTargets } from '../../../solver/tuning/conflict-diagnosis.ts';

// Rosenbrock's function as least squares: r1 = 10 (x2 − x1²), r2 = 1 − x1, minimum at (1, 1),
// standard start (−1.2, 1) (Moré, Garbow & Hillstrom, ACM TOMS 7 (1981), problem 1).
const rosenbrock = (x: number[]) => [10 * (x[1] - x[0] * x[0]), 1 - x[0]];

describe('bounded Levenberg–Marquardt', () => {
  it('solves the Rosenbrock least-squares problem from the standard start', () => {
    const out = solveBoundedLeastSquares({
      x0: [-1.2, 1], lower: [-10, -10], upper: [10, 10], scale: [1, 1], senses: ['equal', 'equal'], evaluate: rosenbrock,
    }, { maxIterations: 200, equalityTolerance: 1e-8, fdStep: 1e-7 });
    expect(out.x[0]).toBeCloseTo(1, 5);
    expect(out.x[1]).toBeCloseTo(1, 5);
  });

  it('stops on the bound with the projected solution (x1 ≥ 1.5 → x2 = x1² = 2.25)', () => {
    const out = solveBoundedLeastSquares({
      x0: [2, 3], lower: [1.5, -10], upper: [10, 10], scale: [1, 1], senses: ['equal', 'equal'], evaluate: rosenbrock,
    }, { maxIterations: 200, equalityTolerance: 1e-8, fdStep: 1e-7 });
    expect(out.x[0]).toBe(1.5);
    expect(out.x[1]).toBeCloseTo(2.25, 5);
  });

  it('treats "≤" targets as inactive until within the margin of their limit', () => {
    // g = x − 1 ≤ 0 is met at the start x = 0.5: nothing to do, no solve beyond the first.
    const calls: number[][] = [];
    const out = solveBoundedLeastSquares({
      x0: [0.5], lower: [0], upper: [2], scale: [1], senses: ['atMost'], evaluate: (x) => { calls.push(x); return [x[0] - 1]; },
    });
    expect(out.iterations).toBe(0);
    expect(calls.length).toBe(1);
    // From x = 1.5 it moves to just inside the margin: g ≤ 0.
    const moved = solveBoundedLeastSquares({
      x0: [1.5], lower: [0], upper: [2], scale: [1], senses: ['atMost'], evaluate: (x) => [x[0] - 1],
    });
    expect(moved.gaps![0]).toBeLessThanOrEqual(0);
    expect(moved.gaps![0]).toBeGreaterThan(-0.011);
  });

  it('finite differences match the analytic Jacobian of Rosenbrock', () => {
    const p = { x0: [0.3, 0.7], lower: [-5, -5], upper: [5, 5], scale: [1, 1], senses: ['equal', 'equal'] as const, evaluate: rosenbrock };
    const J = finiteDifferenceJacobian({ ...p, senses: [...p.senses] }, p.x0, rosenbrock(p.x0), 1e-7)!;
    expect(J[0][0]).toBeCloseTo(-20 * 0.3, 4);
    expect(J[0][1]).toBeCloseTo(10, 4);
    expect(J[1][0]).toBeCloseTo(-1, 6);
    expect(J[1][1]).toBeCloseTo(0, 6);
  });

  it('dense solve: a 3 × 3 system with a known solution, and a singular one refused', () => {
    expect(solveDense([[2, 1, -1], [-3, -1, 2], [-2, 1, 2]], [8, -11, -3]).map((v) => Number(v.toFixed(12)))).toEqual([2, 3, -1]);
    expect(() => solveDense([[1, 2], [2, 4]], [1, 2])).toThrow(/singular/);
  });
});

describe('conflict diagnosis from sensitivities', () => {
  const base = {
    senses: ['atMost', 'equal'] as ('atMost' | 'equal')[], margin: 0.01,
    variables: [{ group: 'G', by: 'pretension' as const, value: 10e3, lower: 1e3, upper: 50e3 }],
  };
  it('names the opposing target when the needed direction breaks a binding one', () => {
    const out = diagnoseTargets({ ...base, gaps: [0.2, 0], met: [false, true], jacobian: [[-1], [1]] });
    expect(out).toEqual([{ code: 'conflict', quantities: {}, refs: { target: '0', other: '1', group: 'G', by: 'pretension', direction: 'up' } }]);
  });
  it('says when no variable acts on a target', () => {
    const out = diagnoseTargets({ ...base, gaps: [0.2, 0], met: [false, true], jacobian: [[0], [1]] });
    expect(out).toEqual([{ code: 'noInfluence', quantities: {}, refs: { target: '0', groups: ['G'] } }]);
  });
  it('gives the bound a variable would have to pass as a force quantity', () => {
    const out = diagnoseTargets({ ...base, variables: [{ ...base.variables[0], value: 50e3 }], gaps: [0.2, -0.5], met: [false, true], jacobian: [[-1], [0]] });
    expect(out).toEqual([{ code: 'atBound', quantities: { bound: { value: 50e3, kind: 'force' } }, refs: { target: '0', group: 'G', by: 'pretension', bound: 'upper', direction: 'up' } }]);
  });
});
