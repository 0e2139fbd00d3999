// The check editor's lists beyond limits of nodes: minimum cable tension, bar design data and twist
// limits are added and removed as one undoable edit each, through the project store's validation
// (so an unknown group is refused with the validator's message, nothing changed), and the design
// checks read what was added (runChecks lists a minimum-tension result per guy of the group).
import { beforeEach, describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { createPinia, setActivePinia } from 'pinia';
import type { ProjectFile } from '../../solver/index.ts';
import { resolveVariables, runChecks, solveProject } from '../../solver/index.ts';
import { useProjectStore } from '../../renderer/stores/project.ts';
import { addCheckEntry, removeCheckEntry } from '../../renderer/model/settings-edits.ts';
import { setVariableBounds } from '../../renderer/tuning/tuning-edits.ts';

const demo = JSON.parse(readFileSync(fileURLToPath(new URL('../../assets/demo-mast.stayset', import.meta.url)), 'utf8')) as ProjectFile;

describe('check-setting lists: minimum tension, bar design, twist', () => {
  beforeEach(() => setActivePinia(createPinia()));
  const loaded = (project: ProjectFile) => {
    const s = useProjectStore();
    s.load({ path: '/projects/demo.stayset', name: 'demo.stayset', project });
    return s;
  };

  it('adds and removes each list entry as one undo step', () => {
    const start = { ...demo, checks: { ...demo.checks, minimumTension: undefined, memberDesign: undefined, twistLimits: undefined } };
    delete start.checks.minimumTension; delete start.checks.memberDesign; delete start.checks.twistLimits;
    const s = loaded(start);
    expect(s.edit('Minimum tension', (p) => addCheckEntry(p, 'minimumTension', { group: 'mast/guys level 1', shareOfBreaking: 0.05 })).ok).toBe(true);
    expect(s.edit('Bar design', (p) => addCheckEntry(p, 'memberDesign', { group: 'mast/mast legs', role: 'leg', bucklingLengthFactor: 0.9 })).ok).toBe(true);
    expect(s.edit('Twist', (p) => addCheckEntry(p, 'twistLimits', { nodes: ['mast/P49a', 'mast/P49b', 'mast/P49c'], limit: 0.5 })).ok).toBe(true);
    expect(s.project!.checks!.twistLimits).toEqual([{ nodes: ['mast/P49a', 'mast/P49b', 'mast/P49c'], limit: 0.5 }]);
    s.undo();
    expect(s.project!.checks!.twistLimits).toBeUndefined();
    expect(s.project!.checks!.memberDesign).toEqual([{ group: 'mast/mast legs', role: 'leg', bucklingLengthFactor: 0.9 }]);
    expect(s.edit('Remove', (p) => removeCheckEntry(p, 'memberDesign', 0)).ok).toBe(true);
    expect(s.project!.checks!.memberDesign).toBeUndefined();
    s.undo();
    s.undo();
    expect(s.project!.checks!.memberDesign).toBeUndefined();
    expect(s.project!.checks!.minimumTension).toEqual([{ group: 'mast/guys level 1', shareOfBreaking: 0.05 }]);
  });

  it('refuses a rule on a group that does not exist, naming it; the project is unchanged', () => {
    const s = loaded(demo);
    const before = s.project;
    const r = s.edit('Minimum tension', (p) => addCheckEntry(p, 'minimumTension', { group: 'no such group', shareOfInstallation: 0.1 }));
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.errors.join(' ')).toContain('no such group');
    expect(s.project).toBe(before);
    const t = s.edit('Twist', (p) => addCheckEntry(p, 'twistLimits', { nodes: ['mast/P49a', 'mast/P99z'], limit: 0.5 }));
    expect(t.ok).toBe(false);
    if (!t.ok) expect(t.errors.join(' ')).toContain('mast/P99z');
    expect(s.project).toBe(before);
  });

  it('accepts "*" (every cable) as the group of a rule, as the design checks do (solver/checks/groups.ts)', () => {
    const s = loaded(demo);
    expect(s.edit('Minimum tension', (p) => addCheckEntry(p, 'minimumTension', { group: '*', shareOfBreaking: 0.02 })).ok).toBe(true);
  });

  it('the design checks use an added minimum-tension rule: T_min ≥ share × breaking load (definition of the rule)', () => {
    const p = addCheckEntry({ ...demo, checks: { ...demo.checks, minimumTension: [] }, patchWind: [], combinations: [] }, 'minimumTension', { group: 'mast/guys level 1', shareOfBreaking: 0.05 });
    const report = solveProject({ ...p, loadCases: p.loadCases.slice(0, 2) }).report;
    const check = runChecks({ ...p, loadCases: p.loadCases.slice(0, 2) }, report);
    const rows = check.results.filter((r) => r.code === 'minimumTension');
    expect(rows.map((r) => r.item).sort()).toEqual(['mast/guy L1-1', 'mast/guy L1-2', 'mast/guy L1-3']);
    const mbl = demo.sections.find((x) => x.id === demo.members.find((m) => m.id === 'mast/guy L1-1')!.section)!.breakingLoad!;
    for (const r of rows) expect(r.limit).toBeCloseTo(0.05 * mbl, 6);
  });
});

describe('tuning variable bounds', () => {
  beforeEach(() => setActivePinia(createPinia()));

  it('sets and clears min/max as one undo step each; the tuner reads them (resolveVariables)', () => {
    const s = useProjectStore();
    const start: ProjectFile = { ...demo, tuning: { variables: [{ group: 'mast/guys level 1', by: 'pretension' }], targets: [] } };
    s.load({ path: '/projects/demo.stayset', name: 'demo.stayset', project: start });
    expect(s.edit('Bounds', (p) => setVariableBounds(p, 0, 8000, 30000)).ok).toBe(true);
    expect(s.project!.tuning!.variables[0]).toEqual({ group: 'mast/guys level 1', by: 'pretension', min: 8000, max: 30000 });
    const v = resolveVariables(s.project!)[0];
    expect([v.lower, v.upper]).toEqual([8000, 30000]);
    expect(s.edit('Clear max', (p) => setVariableBounds(p, 0, 8000, undefined)).ok).toBe(true);
    expect(s.project!.tuning!.variables[0].max).toBeUndefined();
    s.undo();
    expect(s.project!.tuning!.variables[0].max).toBe(30000);
    const bad = s.edit('Bounds', (p) => setVariableBounds(p, 0, 30000, 8000));
    expect(bad.ok).toBe(false);
    if (!bad.ok) expect(bad.errors.join(' ')).toContain('min 30000 must be below max 8000');
  });
});
