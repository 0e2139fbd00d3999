import { describe, expect, it } from 'vitest';
import { memberPretension, memberUnstressedLength } from '../../../solver/tuning/tuning-variables.ts';
import { solveNamedCases } from '../../../solver/tuning/project-case-solver.ts';
import { singleSpan } from './fixtures.ts';

describe('pretension ↔ unstressed length of a member', () => {
  it('round-trips through the Green–Lagrange law at the chord and gives nearly the same sagged state', () => {
    const p = singleSpan(45e3);
    const l0 = memberUnstressedLength(p, p.members[0]);
    const q = singleSpan(45e3);
    delete q.members[0].pretension;
    q.members[0].unstressedLength = l0;
    expect(memberPretension(q, q.members[0]) / 45e3).toBeCloseTo(1, 10);
    // Both carry P at the chord; away from it the Green–Lagrange (St Venant–Kirchhoff) law depends
    // on the reference length, so the sagged states agree to the order of the strain (~1e-3 here).
    const a = solveNamedCases(p, ['dead']).get('dead')!.members[0];
    const b = solveNamedCases(q, ['dead']).get('dead')!.members[0];
    expect(Math.abs(b.tensionMax / a.tensionMax - 1)).toBeLessThan(1e-3);
  });
});
