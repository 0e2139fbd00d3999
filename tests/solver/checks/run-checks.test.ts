import { describe, expect, it } from 'vitest';
import type { ProjectFile } from '../../../solver/index.ts';
import { CheckInputError, membersOfGroup, runChecks } from '../../../solver/index.ts';
import { caseResult } from './synthetic-report.ts';

function project(): ProjectFile {
  return {
    format: 'stayset-project', version: 2,
    nodes: [{ id: 'BASE', at: [0, 0, 0], fixed: 'xyz' }, { id: 'TOP', at: [0, 0, 50] }, { id: 'A1', at: [30, 0, 0], fixed: 'xyz' }],
    sections: [{ id: 'strand', E: 1.6e11, area: 1e-4, breakingLoad: 100e3 }, { id: 'bar', E: 2e11, area: 1e-3 }],
    members: [
      { id: 'G1', kind: 'cable', from: 'A1', to: 'TOP', section: 'strand', groups: ['guys'] },
      { id: 'G2', kind: 'cable', from: 'A1', to: 'TOP', section: 'strand' },
      { id: 'M', kind: 'bar', from: 'BASE', to: 'TOP', section: 'bar' },
    ],
    groups: [{ id: 'guys', members: ['G2'] }, { id: 'empty', members: [] }],
    loadCases: [{ id: 'dead' }, { id: 'wind' }],
    designBasis: { format: 'allowable', allowable: { cableSafetyFactor: 2 } },
    checks: {
      noSlackGroups: ['guys'], sagLimits: [{ group: 'guys', limit: { fractionOfSpan: 0.02 } }],
      displacementLimits: [{ node: 'TOP', limit: 0.25 }], tiltLimits: [{ base: 'BASE', top: 'TOP', limit: 1 / 500 }],
      upliftNodes: ['BASE'],
    },
  };
}

const ok = caseResult('dead', [{ id: 'G1', tensionMax: 20e3 }, { id: 'G2', tensionMax: 30e3, sag: 0.1, chordLength: 58 }, { id: 'M', tensionMax: -5e3 }],
  [{ id: 'TOP', at: [0, 0, 50], u: [0.05, 0, 0] }, { id: 'BASE', at: [0, 0, 0], u: [0, 0, 0] }], [{ node: 'BASE', force: [0, 0, 60e3] }]);

describe('membersOfGroup', () => {
  it('is GroupSpec.members ∪ members naming the group', () => {
    expect([...membersOfGroup(project(), 'guys')]).toEqual(['G1', 'G2']);
    expect([...membersOfGroup(project(), '*')]).toEqual(['G1', 'G2', 'M']);
  });
});

describe('runChecks', () => {
  it('passes a case within every limit; utilisation = T / (φ MBL) with default φ = 0.5', () => {
    const r = runChecks(project(), { cases: [ok] });
    expect(r.pass).toBe(true);
    expect(r.resistanceFactor).toBe(0.5); // common practice: factor of safety 2.0 on breaking load
    // 30 kN / (0.5 · 100 kN) = 0.6 (hand arithmetic).
    expect(r.members.find((m) => m.id === 'G2')!.utilisation).toBeCloseTo(0.6, 12);
    expect(r.members.find((m) => m.id === 'M')!.status).toBe('unchecked');
    expect(r.warnings[0]).toMatch(/no breaking load/);
    // tilt 0.05 / 50 = 1/1000 < 1/500: pass.
    expect(r.nodes.find((n) => n.id === 'TOP')!.status).toBe('pass');
  });

  it('reports each failing kind with its governing case, value, limit and ratio', () => {
    const bad = caseResult('wind', [
      { id: 'G1', tensionMax: 60e3, slack: true }, { id: 'G2', tensionMax: 45e3, sag: 1.5, chordLength: 58 }, { id: 'M', tensionMax: 0 },
    ], [{ id: 'TOP', at: [0, 0, 50], u: [0.3, 0, 0] }, { id: 'BASE', at: [0, 0, 0], u: [0, 0, 0] }], [{ node: 'BASE', force: [0, 0, -1e3] }]);
    const p = project();
    p.designBasis = { format: 'allowable', allowable: { cableSafetyFactor: 1 / 0.8 } };
    const r = runChecks(p, { cases: [ok, bad] });
    expect(r.pass).toBe(false);
    const by = (k: string, id: string) => r.failures.find((f) => f.kind === k && f.id === id)!;
    // 60 kN / (0.8 · 100 kN) = 0.75 → passes with φ = 0.8; 45/80 passes too.
    expect(r.failures.some((f) => f.kind === 'utilisation')).toBe(false);
    expect(by('slack', 'G1').case).toBe('wind');
    // sag limit 0.02 · 58 = 1.16 m; ratio 1.5 / 1.16.
    expect(by('sag', 'G2').limit).toBeCloseTo(1.16, 12);
    expect(by('sag', 'G2').ratio).toBeCloseTo(1.5 / 1.16, 12);
    expect(by('displacement', 'TOP').ratio).toBeCloseTo(0.3 / 0.25, 12);
    // tilt 0.3 / 50 = 0.006 against 0.002 → ratio 3.
    expect(by('tilt', 'BASE→TOP').ratio).toBeCloseTo(3, 12);
    expect(by('uplift', 'BASE').value).toBe(-1e3);
    expect(r.cases.map((c) => c.pass)).toEqual([true, false]);
    expect(r.members.find((m) => m.id === 'G1')!.status).toBe('fail');
  });

  it('utilisation above 1 fails; a non-converged case fails the report', () => {
    const over = caseResult('ice', [{ id: 'G1', tensionMax: 55e3 }]);
    const r = runChecks(project(), { cases: [over, caseResult('x', [], [], [], false)] });
    const f = r.failures.find((x) => x.kind === 'utilisation')!;
    expect(f.ratio).toBeCloseTo(1.1, 12); // 55 / 50
    expect(r.allConverged).toBe(false);
    expect(r.failures.some((x) => x.kind === 'notConverged' && x.id === 'x')).toBe(true);
  });

  it('names missing groups and nodes in the settings', () => {
    const p = project();
    p.checks = { noSlackGroups: ['nope'], displacementLimits: [{ node: 'Q', limit: 1 }] };
    expect(() => runChecks(p, { cases: [] })).toThrow(CheckInputError);
    try { runChecks(p, { cases: [] }); } catch (e) {
      const msg = (e as CheckInputError).problems.join('\n');
      expect(msg).toMatch(/noSlackGroups\[0\]: group "nope"/);
      expect(msg).toMatch(/displacementLimits\[0\]: node "Q"/);
    }
  });
});
