import { describe, expect, it } from 'vitest';
import { tuneProject } from '../../../solver/tuning/tune-project.ts';
import { solveNamedCases } from '../../../solver/tuning/project-case-solver.ts';
import type { ProjectFile } from '../../../solver/project/types.ts';
import { singleSpan } from './fixtures.ts';
import { findBracketedRoot } from '../../../solver/installation/bracketed-root.ts';

import { tuningDiagnosisText } from '../../../main/common/tuning/tuning-text.ts';
const P_TRUE = 30e3;

function solvedDead(p: ProjectFile) {
  const r = solveNamedCases(p, ['dead']).get('dead')!;
  expect(r.converged).toBe(true);
  return r.members[0];
}

describe('pretension tuning through the nonlinear solver', () => {
  it('recovers a known pretension from the sag it produced (inverse problem, round trip)', () => {
    // Solve with P, read the sag, then tune from another start back to P (method check: the forward
    // solve is the reference, the tuner must invert it).
    const sag = solvedDead(singleSpan(P_TRUE)).sag;
    for (const start of [12e3, 70e3]) {
      const p = singleSpan(start);
      p.tuning = { variables: [{ group: 'span', by: 'pretension', min: 1e3, max: 200e3 }], targets: [{ kind: 'sag', group: 'span', case: 'dead', limit: { absolute: sag } }] };
      const res = tuneProject(p, { solveCases: solveNamedCases, margin: 0 });
      if (start > P_TRUE) {
        // Starting tighter: the sag limit is already met; the tuner must not move the cable.
        expect(res.status).toBe('met');
        expect(res.variables[0].final).toBe(start);
      } else {
        expect(res.status).toBe('met');
        expect(res.variables[0].final / P_TRUE).toBeCloseTo(1, 3);
      }
    }
  });

  it('recovers P exactly from an equality target (tension share in the reference case)', () => {
    const share = solvedDead(singleSpan(P_TRUE)).tensionMax / 560e3;
    const p = singleSpan(60e3);
    p.tuning = { variables: [{ group: 'span', by: 'pretension' }], targets: [{ kind: 'tensionShare', group: 'span', share }] };
    const res = tuneProject(p, { solveCases: solveNamedCases });
    expect(res.status).toBe('met');
    expect(res.variables[0].final / P_TRUE).toBeCloseTo(1, 2);
    expect(res.targets[0].value / share).toBeCloseTo(1, 3);
    // The input project is untouched; the tuned copy carries the new pretension.
    expect(p.members[0].pretension).toBe(60e3);
    expect(res.project.members[0].pretension).toBeCloseTo(res.variables[0].final, 6);
  });

  it('tunes by unstressed length as a factor and reaches the same state', () => {
    const share = solvedDead(singleSpan(P_TRUE)).tensionMax / 560e3;
    const p = singleSpan(60e3);
    p.tuning = { variables: [{ group: 'span', by: 'unstressedLength' }], targets: [{ kind: 'tensionShare', group: 'span', share }] };
    const res = tuneProject(p, { solveCases: solveNamedCases });
    expect(res.status).toBe('met');
    expect(res.variables[0].final).toBeGreaterThan(1); // a lower tension needs a longer cable
    // The same state: the unstressed length L0 that carries P_TRUE at the 100 m chord under the
    // Green–Lagrange law, N = EA λ(λ² − 1)/2 with λ = Lc/L0 (solved here independently).
    const lambda = findBracketedRoot((x) => x * (x * x - 1) - (2 * P_TRUE) / (160e9 * 400e-6), 1, 1.1);
    expect(res.project.members[0].unstressedLength! / (100 / lambda)).toBeCloseTo(1, 5);
  });

  it('explains a conflict: the sag limit needs more pretension than the tension-share cap allows', () => {
    const p = singleSpan(20e3);
    p.tuning = {
      variables: [{ group: 'span', by: 'pretension' }],
      targets: [
        { kind: 'sag', group: 'span', case: 'dead', limit: { absolute: 0.5 } },
        { kind: 'tensionShare', group: 'span', share: 0.08 },
      ],
    };
    const res = tuneProject(p, { solveCases: solveNamedCases });
    expect(res.status).toBe('unmet');
    const text = tuningDiagnosisText(res, p, 'SI').join('\n');
    expect(text).toMatch(/sag ≤ 500 mm in 'dead' for 'main span' needs the pretension of 'main span' higher/);
    expect(text).toMatch(/tension share 8\.0 %/);
    expect(text).toMatch(/conflict/);
  });

  it('explains a target unmet at a bound', () => {
    const p = singleSpan(20e3);
    p.tuning = { variables: [{ group: 'span', by: 'pretension', min: 5e3, max: 25e3 }], targets: [{ kind: 'sag', group: 'span', case: 'dead', limit: { absolute: 0.5 } }] };
    const res = tuneProject(p, { solveCases: solveNamedCases });
    expect(res.status).toBe('unmet');
    expect(res.variables[0].atBound).toBe('upper');
    expect(tuningDiagnosisText(res, p, 'SI').join('\n')).toMatch(/above its upper bound 25\.00 kN/);
    // 25 kN = 25000 / 4448.2216152605 N per kip = 5.620 kip (NIST SP 811: 1 lbf = 4.4482216152605 N).
    expect(tuningDiagnosisText(res, p, 'US').join('\n')).toMatch(/above its upper bound 5\.620 kip/);
  });

  it('explains a target no variable influences (zero sensitivity)', () => {
    const p = singleSpan(20e3);
    // A second, separate span that no variable acts on.
    p.nodes.push({ id: 'C', at: [0, 10, 0], fixed: 'xyz' }, { id: 'D', at: [100, 10, 0], fixed: 'xyz' });
    p.members.push({ id: 'C2', kind: 'cable', from: 'C', to: 'D', section: 'S26', segments: 8, pretension: 5e3, groups: ['other'] });
    p.tuning = { variables: [{ group: 'span', by: 'pretension' }], targets: [{ kind: 'sag', group: 'other', case: 'dead', limit: { absolute: 0.2 } }] };
    const res = tuneProject(p, { solveCases: solveNamedCases });
    expect(res.status).toBe('unmet');
    expect(res.diagnosis.map((n) => n.code)).toEqual(['noInfluence']);
    expect(tuningDiagnosisText(res, p, 'SI').join('\n')).toMatch(/no tuning variable changes it/);
  });

  it('rejects bad input naming the entry', () => {
    const p = singleSpan(20e3);
    p.tuning = { variables: [{ group: 'nope', by: 'pretension' }], targets: [{ kind: 'noSlack', group: 'span', case: 'dead' }] };
    expect(() => tuneProject(p, { solveCases: solveNamedCases })).toThrow(/tuning\.variables\[0\] \(group "nope"\): group does not exist/);
    p.tuning = { variables: [{ group: 'span', by: 'pretension' }], targets: [{ kind: 'noSlack', group: 'span', case: 'storm' }] };
    expect(() => tuneProject(p, { solveCases: solveNamedCases })).toThrow(/tuning\.targets\[0\] \(noSlack\): case "storm" does not exist/);
  });

  it('stops when cancelled, keeping the start state and saying so', () => {
    const p = singleSpan(12e3);
    p.tuning = { variables: [{ group: 'span', by: 'pretension' }], targets: [{ kind: 'tensionShare', group: 'span', share: 0.1 }] };
    const res = tuneProject(p, { isCancelled: () => true });
    expect(res.cancelled).toBe(true);
    expect(res.iterations).toBe(0);
    expect(res.status).toBe('unmet');
    expect(res.variables[0].final).toBe(12e3);
    expect(res.summary).toMatch(/^cancelled:/);
  });
});
