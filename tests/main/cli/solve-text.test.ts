// `stayset solve` table output: one block per case, values equal to the JSON output rounded
// to the printed precision (kN with 2 decimals, lengths in m with 3, displacements in mm with 1), and the review caution.
import { describe, expect, it } from 'vitest';
import type { CaseResult } from '../../../solver/index.ts';
import { fixture, runStayset } from './run-stayset.ts';

describe('stayset solve (tables)', () => {
  it('prints each case with status, member, node and reaction tables, and the caution', () => {
    const text = runStayset(['solve', fixture('kestrel-moor-mast.stayset.json'), '--full']);
    const json = runStayset(['solve', fixture('kestrel-moor-mast.stayset.json'), '--json']);
    expect(text.code).toBe(0);
    expect(text.stderr).toBe('');
    const cases = (JSON.parse(json.stdout) as { cases: CaseResult[] }).cases;
    const out = text.stdout;
    expect(out).toContain('Load case "dead" (Self-weight and pretension)');
    expect(out).toContain('Combination "uls-wind" (1.5 x storm)');
    expect(out).toMatch(/converged: \d+ iterations, \d+ load steps, 66 DOFs/);
    expect(out).toContain('member  kind   T max kN  T min kN  T start kN  T end kN  slack  sag m');
    expect(out).toContain('All 4 case(s) converged.');
    expect(out.trimEnd().endsWith('Results are for review by a qualified engineer; local codes and licensed practice govern. Do not use results of an analysis that did not converge.')).toBe(true);

    const deadBlock = out.slice(out.indexOf('Load case "dead"'), out.indexOf('Load case "wind-x"'));
    const g1 = cases[0].members.find((m) => m.id === 'G1')!;
    const row = deadBlock.split('\n').find((l) => l.trim().startsWith('G1 '))!;
    expect(row.trim().split(/\s+/)).toEqual([
      'G1', 'cable', (g1.tensionMax / 1000).toFixed(2), (g1.tensionMin / 1000).toFixed(2),
      (g1.tensionStart / 1000).toFixed(2), (g1.tensionEnd / 1000).toFixed(2), g1.sag.toFixed(3),
    ]);
    const top = cases[0].nodes.find((n) => n.id === 'TOP')!;
    const topRow = deadBlock.split('\n').find((l) => l.trim().startsWith('TOP '))!;
    expect(topRow.trim().split(/\s+/)[3]).toBe((top.displacement[2] * 1000).toFixed(1)); // displacements in mm, 0.1 mm
    const base = cases[0].reactions.find((q) => q.node === 'BASE')!;
    const baseRow = deadBlock.split('\n').find((l) => l.trim().startsWith('BASE ') && l.split(/\s+/).length === 5)!;
    expect(baseRow.trim().split(/\s+/)[3]).toBe((base.force[2] / 1000).toFixed(2));
  });

  it('a case that did not converge shows the reason instead of tables, exit 1', () => {
    const r = runStayset(['solve', fixture('mechanism-free-node.stayset.json')]);
    expect(r.code).toBe(1);
    expect(r.stdout).toContain('NOT CONVERGED (singular)');
    expect(r.stdout).toContain('No results shown');
    expect(r.stdout).not.toContain('T max kN');
    expect(r.stdout).toContain('1 of 1 case(s) did NOT converge: dead.');
    expect(r.stdout).toContain('qualified engineer');
  });
});
