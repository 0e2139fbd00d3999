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
  it('passes a case within every limit; cable utilisation = T / (k_e·MBL / SF) in the allowable format', () => {
    const r = runChecks(project(), { cases: [ok] });
    expect(r.pass).toBe(true);
    expect(r.basis.format).toBe('allowable');
    expect(r.basis.allowable.cableSafetyFactor).toEqual({ value: 2, source: 'project file (designBasis)' });
    // 30 kN / (1.0 · 100 kN / 2) = 0.6 (hand arithmetic; k_e = 1.0 assumed and flagged).
    expect(r.members.find((m) => m.id === 'G2')!.utilisation).toBeCloseTo(0.6, 12);
    expect(r.members.find((m) => m.id === 'M')!.status).toBe('unchecked');
    expect(r.warnings.map((w) => w.code)).toEqual(expect.arrayContaining(['terminationNotSet', 'noYieldStrength']));
    // tilt 0.05 / 50 = 1/1000 < 1/500: pass.
    expect(r.nodes.find((n) => n.id === 'TOP')!.status).toBe('pass');
    const res = r.results.find((x) => x.code === 'cableResistance' && x.item === 'G2')!;
    expect(res).toMatchObject({ format: 'allowable', case: 'dead', purpose: 'serviceability', value: 30e3, limit: 50e3, pass: true });
    expect(res.source).toMatch(/k_e: not set/);
  });

  it('reports each failing check with its governing case, value, limit, ratio and source', () => {
    const bad = caseResult('wind', [
      { id: 'G1', tensionMax: 60e3, slack: true }, { id: 'G2', tensionMax: 45e3, sag: 1.5, chordLength: 58 }, { id: 'M', tensionMax: 0 },
    ], [{ id: 'TOP', at: [0, 0, 50], u: [0.3, 0, 0.2] }, { id: 'BASE', at: [0, 0, 0], u: [0, 0, 0] }], [{ node: 'BASE', force: [0, 0, -1e3] }]);
    const p = project();
    p.designBasis = { format: 'allowable', allowable: { cableSafetyFactor: 1.25 } };
    const r = runChecks(p, { cases: [ok, bad] });
    expect(r.pass).toBe(false);
    const by = (k: string, id: string) => r.failures.find((f) => f.code === k && f.item === id)!;
    // 60 kN / (100 kN / 1.25) = 0.75 → passes; 45/80 passes too.
    expect(r.failures.some((f) => f.code === 'cableResistance')).toBe(false);
    expect(by('slack', 'G1').case).toBe('wind');
    // sag limit 0.02 · 58 = 1.16 m; ratio 1.5 / 1.16.
    expect(by('sag', 'G2').limit).toBeCloseTo(1.16, 12);
    expect(by('sag', 'G2').ratio).toBeCloseTo(1.5 / 1.16, 12);
    // Horizontal by default: the 0.2 m vertical part does not count; 0.3 / 0.25.
    expect(by('displacement', 'TOP').ratio).toBeCloseTo(0.3 / 0.25, 12);
    expect(by('displacement', 'TOP').source).toBe('project file (checks.displacementLimits)');
    // tilt 0.3 / 50 = 0.006 against 0.002 → ratio 3.
    expect(by('tilt', 'BASE→TOP').ratio).toBeCloseTo(3, 12);
    expect(by('uplift', 'BASE').value).toBe(-1e3);
    expect(r.cases.map((c) => c.pass)).toEqual([true, false]);
    expect(r.members.find((m) => m.id === 'G1')!.status).toBe('fail');
  });

  it('a total or directed displacement limit counts the vertical part as asked', () => {
    const c = caseResult('dead', [], [{ id: 'TOP', at: [0, 0, 50], u: [0.3, 0, 0.4] }]);
    const p = project();
    p.checks = { displacementLimits: [{ node: 'TOP', limit: 1, direction: 'total' }, { node: 'TOP', limit: 1, direction: [0, 0, 2] }] };
    const rows = runChecks(p, { cases: [c] }).results.filter((x) => x.code === 'displacement');
    // One governing row per node: the larger of |u| = 0.5 and |u_z| = 0.4.
    expect(rows).toHaveLength(1);
    expect(rows[0].value).toBeCloseTo(0.5, 12);
  });

  it('strength on ultimate cases only, serviceability on serviceability cases only, component cases skipped (limit state)', () => {
    const p = project();
    p.designBasis = { format: 'limitState' };
    p.loadCases = [{ id: 'dead' }, { id: 'wind', purpose: 'componentOnly' }];
    p.combinations = [{ id: 'uls', factors: [{ case: 'dead', factor: 1.1 }, { case: 'wind', factor: 1.4 }] }];
    const big = (id: string) => caseResult(id, [{ id: 'G1', tensionMax: 70e3, slack: true }], [{ id: 'TOP', at: [0, 0, 50], u: [1, 0, 0] }]);
    const r = runChecks(p, { cases: [big('dead'), big('wind'), big('uls')] });
    expect(r.cases.map((c) => [c.id, c.purpose, c.checked])).toEqual([['dead', 'serviceability', true], ['wind', 'componentOnly', false], ['uls', 'ultimate', true]]);
    // F_Rd = 1.0 · 100 kN / (1.5 · 1.0) = 66.7 kN (EN 1993-1-11 §6.2 form, recalled defaults): 70 / 66.7 = 1.05 in "uls" only.
    const res = r.failures.find((f) => f.code === 'cableResistance')!;
    expect(res.case).toBe('uls');
    expect(res.ratio).toBeCloseTo(70e3 / (100e3 / 1.5), 12);
    // Serviceability tension 0.5 · MBL = 50 kN checked in "dead" only: 70 / 50.
    const sls = r.failures.find((f) => f.code === 'cableServiceTension')!;
    expect([sls.case, sls.purpose]).toEqual(['dead', 'serviceability']);
    expect(r.failures.find((f) => f.code === 'displacement')!.case).toBe('dead');
    expect(r.results.every((x) => x.case !== 'wind')).toBe(true);
  });

  it('a non-converged checked case fails the report; the governing result names it', () => {
    const over = caseResult('ice', [{ id: 'G1', tensionMax: 55e3 }]);
    const r = runChecks(project(), { cases: [over, caseResult('x', [], [], [], false)] });
    const f = r.failures.find((x) => x.code === 'cableResistance')!;
    expect(f.ratio).toBeCloseTo(1.1, 12); // 55 / (100 / 2)
    expect(r.allConverged).toBe(false);
    expect(r.failures.some((x) => x.code === 'notConverged' && x.item === 'x')).toBe(true);
  });

  it('names missing groups and nodes in the settings', () => {
    const p = project();
    p.checks = { noSlackGroups: ['nope'], displacementLimits: [{ node: 'Q', limit: 1 }], minimumTension: [{ group: 'nada', shareOfBreaking: 0.05 }], twistLimits: [{ nodes: ['TOP', 'Z'], limit: 1 }] };
    expect(() => runChecks(p, { cases: [] })).toThrow(CheckInputError);
    try { runChecks(p, { cases: [] }); } catch (e) {
      const msg = (e as CheckInputError).problems.join('\n');
      expect(msg).toMatch(/noSlackGroups\[0\]: group "nope"/);
      expect(msg).toMatch(/displacementLimits\[0\]: node "Q"/);
      expect(msg).toMatch(/minimumTension\[0\]: group "nada"/);
      expect(msg).toMatch(/twistLimits\[0\]: node "Z"/);
    }
  });
});

describe('runChecks case summary', () => {
  it("a serviceability case's highest ratio counts its serviceability checks too (limit-state format)", () => {
    const p = project();
    p.designBasis = { format: 'limitState' };
    const r = runChecks(p, { cases: [ok] });
    const dead = r.cases.find((c) => c.id === 'dead')!;
    expect(dead.purpose).toBe('serviceability');
    // The case's ratios: cable service tension 30 kN / (0.5 · 1.0 · 100 kN) = 0.6 (hand arithmetic),
    // sag 0.1 / (0.02 · 58) = 0.086, displacement 0.05 / 0.25 = 0.2, tilt (1/1000)/(1/500) = 0.5.
    const own = r.results.filter((x) => x.case === 'dead' && x.ratio !== null).map((x) => x.ratio!);
    expect(own.length).toBeGreaterThan(3);
    expect(dead.maxUtilisation).toBeCloseTo(Math.max(...own), 12);
    expect(dead.maxUtilisation).toBeCloseTo(0.6, 12);
    expect(dead.maxUtilisationMember).toBe('G2');
  });
});
