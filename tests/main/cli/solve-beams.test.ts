// `stayset solve` on a beam cantilever: JSON carries beam end actions and support moments, the
// table shows them; checked against statics (root moment P·L, shear P) and the Euler–Bernoulli
// tip deflection P·L³/(3EI) (any strength-of-materials text).
import { describe, expect, it } from 'vitest';
import type { CaseResult } from '../../../solver/index.ts';
import { fixture, runStayset } from './run-stayset.ts';

describe('stayset solve with beams', () => {
  it('--json: root moment P·L, end actions, tip deflection PL³/(3EI)', () => {
    const r = runStayset(['solve', fixture('cantilever-beam.stayset.json'), '--json']);
    expect(r.stderr).toBe('');
    expect(r.code).toBe(0);
    const c = (JSON.parse(r.stdout) as { cases: CaseResult[] }).cases[0];
    const P = 1000, L = 4, EI = 210e9 * 2e-5;
    const root = c.reactions.find((q) => q.node === 'ROOT')!;
    expect(root.force[2]).toBeCloseTo(P, 6);
    // Geometrically nonlinear: the lever arm shortens by ~1e-6 L, so compare to 1e-5.
    expect(root.moment![1] / (-P * L)).toBeCloseTo(1, 5);
    const tip = c.nodes.find((n) => n.id === 'TIP')!;
    expect(-tip.displacement[2] / ((P * L ** 3) / (3 * EI))).toBeCloseTo(1, 4);
    const beam = c.members[0].beam!;
    // orientation [0, 1, 0]: local y = global y, local z = x × y = global z; the root end moment about local y is P·L.
    expect(Math.abs(beam.start.my) / (P * L)).toBeCloseTo(1, 5);
    expect(Math.abs(beam.start.fz)).toBeCloseTo(P, 3);
    expect(beam.maxBendingMoment / (P * L)).toBeCloseTo(1, 5);
  });

  it('table: beam end actions and support moments in kN and kN·m', () => {
    const r = runStayset(['solve', fixture('cantilever-beam.stayset.json')]);
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/Beam end actions/);
    expect(r.stdout).toMatch(/My kN·m/);
    expect(r.stdout).toMatch(/Support moments/);
    expect(r.stdout).toMatch(/ROOT\s+0\.00\s+-4\.00\s+0\.00/);
    expect(r.stdout).toMatch(/qualified engineer/);
  });
});
