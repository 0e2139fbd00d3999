// Minimum tension judged by a member-level measure: the same verdict at 1, 10 and 40 elements.
// Reference: the elastic catenary (Irvine, Cable Structures, 1981, §2.2), checked against the
// solver's own 40-element solution of the same cable (which converges to it).
import { describe, expect, it } from 'vitest';
import type { ProjectFile } from '../../../solver/index.ts';
import { chordTension, runChecks, solveProject, STANDARD_GRAVITY } from '../../../solver/index.ts';

const MBL = 200e3;
/** A cable hung between two fixed points 40 m apart horizontally and 30 m vertically (chord 50 m), 2 cm longer than its chord. */
function hanging(segments: number, shareOfBreaking: number): ProjectFile {
  return {
    format: 'stayset-project', version: 2,
    nodes: [{ id: 'A', at: [0, 0, 0], fixed: 'xyz' }, { id: 'T', at: [40, 0, 30], fixed: 'xyz' }],
    sections: [{ id: 'strand', E: 1.5e11, area: 1.15e-4, massPerLength: 0.95, breakingLoad: MBL, termination: 'socketMetal' }],
    members: [{ id: 'G', kind: 'cable', from: 'A', to: 'T', section: 'strand', segments, unstressedLength: 50.02, groups: ['guys'] }],
    loadCases: [{ id: 'dead' }],
    designBasis: { format: 'limitState' },
    checks: { minimumTension: [{ group: 'guys', shareOfBreaking }], noSlackGroups: ['guys'] },
  };
}

describe('elastic catenary through the end points', () => {
  it('matches the 40-element solution of the same cable to 0.2 % at both ends', () => {
    const r = solveProject(hanging(40, 0.01)).report.cases[0].members[0];
    const t = chordTension({ span: 40, rise: 30, unstressedLength: 50.02, weightPerLength: 0.95 * STANDARD_GRAVITY, axialStiffness: 1.5e11 * 1.15e-4 })!;
    expect(t.start).toBeCloseTo(r.tensionStart, -1);
    expect(Math.abs(t.start / r.tensionStart - 1)).toBeLessThan(2e-3);
    expect(Math.abs(t.end / r.tensionEnd - 1)).toBeLessThan(2e-3);
  });

  it('a taut weightless cable is a straight elastic bar: T = EA(c − L0)/L0', () => {
    const t = chordTension({ span: 30, rise: 40, unstressedLength: 49.9, weightPerLength: 0, axialStiffness: 1e7 })!;
    expect(t.start).toBeCloseTo((1e7 * 0.1) / 49.9, 9);
  });
});

describe('minimum tension: the verdict does not depend on the mesh', () => {
  for (const [share, verdict] of [[0.01, true], [0.05, false]] as const) {
    it(`limit ${share} · MBL: ${verdict ? 'passes' : 'fails'} at 1, 10 and 40 elements`, () => {
      const values: number[] = [];
      for (const n of [1, 10, 40]) {
        const p = hanging(n, share);
        const r = runChecks(p, solveProject(p).report);
        const m = r.results.find((x) => x.code === 'minimumTension')!;
        expect(m.pass, `${n} elements`).toBe(verdict);
        expect(m.limit).toBeCloseTo(share * MBL, 6);
        values.push(m.value);
      }
      // The member measure agrees across meshes to 0.5 % (about 4.5 kN here).
      for (const v of values) expect(Math.abs(v / values[2] - 1)).toBeLessThan(5e-3);
    });
  }

  it('strain-slack, by contrast, is a model-state check: the one-element cable is slack, the ten-element one is not', () => {
    const one = solveProject(hanging(1, 0.01)).report.cases[0].members[0];
    const ten = solveProject(hanging(10, 0.01)).report.cases[0].members[0];
    expect(one.slack).toBe(true);
    expect(ten.slack).toBe(false);
  });
});
