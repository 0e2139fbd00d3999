import { describe, expect, it } from 'vitest';
import type { CaseResult, ProjectFile } from '../../solver/index.ts';
import { memberRows, sortRows } from '../../renderer/results/member-rows.ts';

const project: ProjectFile = {
  format: 'stayset-project', version: 2,
  nodes: [{ id: 'A', at: [0, 0, 0] }, { id: 'B', at: [1, 0, 0] }],
  sections: [{ id: 'S', E: 1, area: 1, breakingLoad: 200 }, { id: 'T', E: 1, area: 1 }],
  members: [
    { id: 'M1', kind: 'cable', from: 'A', to: 'B', section: 'S', groups: ['g2'] },
    { id: 'M2', kind: 'cable', from: 'A', to: 'B', section: 'S' },
    { id: 'M10', kind: 'bar', from: 'A', to: 'B', section: 'T' },
  ],
  groups: [{ id: 'g1', members: ['M1', 'M2'] }],
  loadCases: [{ id: 'L' }],
  designBasis: { format: 'allowable', allowable: { cableSafetyFactor: 2 } },
};
const m = (id: string, t: number) => ({ id, tensionMax: t, tensionMin: t - 1, tensionStart: t, tensionEnd: t, slack: false, sag: 0, chordLength: 1 });
const result = { id: 'L', converged: true, status: 'converged', slackMembers: [], nodes: [], reactions: [], stats: { dofs: 0, iterations: 0, seconds: 0, loadSteps: 0, residual: 0 }, members: [m('M1', 50), m('M2', 150), m('M10', 10)] } as CaseResult;

describe('results strip rows', () => {
  it('computes utilisation = T max / (k_e·MBL / SF), the definition of the checks, and lists groups', () => {
    const rows = memberRows(project, result);
    // 50 / (1.0 · 200 / 2) and 150 / 100 (k_e = 1.0 when no fitting is given).
    expect(rows[0].utilisation).toBe(0.5);
    expect(rows[1].utilisation).toBe(1.5);
    expect(Number.isNaN(rows[2].utilisation)).toBe(true);
    expect(rows[0].group).toBe('g1, g2');
  });

  it('sorts numbers with missing utilisation last, ids naturally', () => {
    const rows = memberRows(project, result);
    expect(sortRows(rows, 'utilisation', true).map((r) => r.id)).toEqual(['M2', 'M1', 'M10']);
    expect(sortRows(rows, 'utilisation', false).map((r) => r.id)).toEqual(['M1', 'M2', 'M10']);
    expect(sortRows(rows, 'id', false).map((r) => r.id)).toEqual(['M1', 'M2', 'M10']);
    expect(sortRows(rows, 'tensionMax', true).map((r) => r.id)).toEqual(['M2', 'M1', 'M10']);
  });
});
