import { describe, expect, it } from 'vitest';
import { memberPretension, memberUnstressedLength } from '../../../solver/tuning/tuning-variables.ts';
import { solveNamedCases } from '../../../solver/tuning/project-case-solver.ts';
import { singleSpan } from './fixtures.ts';

describe('pretension ↔ unstressed length of a member', () => {
  it('round-trips and gives the same solved state either way (Green–Lagrange law at the chord)', () => {
    const p = singleSpan(45e3);
    const l0 = memberUnstressedLength(p, p.members[0]);
    const q = singleSpan(45e3);
    delete q.members[0].pretension;
    q.members[0].unstressedLength = l0;
    expect(memberPretension(q, q.members[0]) / 45e3).toBeCloseTo(1, 10);
    // Both descriptions are one physical cable: same tension after the dead-load solve.
    const a = solveNamedCases(p, ['dead']).get('dead')!.members[0];
    const b = solveNamedCases(q, ['dead']).get('dead')!.members[0];
    expect(b.tensionMax / a.tensionMax).toBeCloseTo(1, 6);
  });
});
