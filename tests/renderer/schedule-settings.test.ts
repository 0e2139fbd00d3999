// The app's schedule print settings and tuning record as project edits: listing choice,
// revision block (shared with the calculation report), and the run kept when a tuning is applied.
// Each edit goes through the project store (validated, one undo step).
import { beforeEach, describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { createPinia, setActivePinia } from 'pinia';
import type { ProjectFile } from '../../solver/index.ts';
import { membersOfGroup, solveNamedCases, solveProject, tuneProject } from '../../solver/index.ts';
import { addRevision, nextRevisionMark, removeRevision, setListing, toggleListedGroup, updateRevision } from '../../renderer/schedule/schedule-edits.ts';
import { applyTuningResult } from '../../renderer/tuning/tuning-edits.ts';
import { useProjectStore } from '../../renderer/stores/project.ts';
import { schedulePageFrom, scheduleParts } from '../../renderer/schedule/schedule-document.ts';

const demo = JSON.parse(readFileSync(fileURLToPath(new URL('../../assets/demo-mast.stayset', import.meta.url)), 'utf8')) as ProjectFile;

beforeEach(() => {
  setActivePinia(createPinia());
});

describe('schedule print settings', () => {
  it('revision marks follow on: A → B, P01 → P02, 9 → 10', () => {
    expect(nextRevisionMark(undefined)).toBe('A');
    expect(nextRevisionMark('A')).toBe('B');
    expect(nextRevisionMark('P01')).toBe('P02');
    expect(nextRevisionMark('9')).toBe('10');
  });

  it('adds, edits and removes revisions as undoable edits; a bad date is refused naming the entry', () => {
    const store = useProjectStore();
    store.load({ path: '/tmp/demo.stayset', name: 'demo.stayset', project: demo });
    expect(store.edit('Add revision', (p) => addRevision(p, '2026-12-02')).ok).toBe(true);
    expect(store.project!.report!.revisions!.at(-1)).toEqual({ revision: 'B', date: '2026-12-02', description: 'Issued for review' });
    expect(store.edit('Checked by', (p) => updateRevision(p, 1, { checkedBy: ' C. Hecker ' })).ok).toBe(true);
    expect(store.project!.report!.revisions![1].checkedBy).toBe('C. Hecker');
    expect(store.project!.report!.documentNumber).toBe(demo.report!.documentNumber);
    const bad = store.edit('Date', (p) => updateRevision(p, 1, { date: '2/12/2026' }));
    expect(bad).toEqual({ ok: false, errors: ['report.revisions[1] "B": date must be YYYY-MM-DD, got "2/12/2026"'] });
    expect(store.edit('Clear checker', (p) => updateRevision(p, 1, { checkedBy: '' })).ok).toBe(true);
    expect('checkedBy' in store.project!.report!.revisions![1]).toBe(false);
    expect(store.edit('Remove', (p) => removeRevision(p, 0)).ok).toBe(true);
    expect(store.project!.report!.revisions!.map((r) => r.revision)).toEqual(['B']);
    store.undo();
    expect(store.project!.report!.revisions!.map((r) => r.revision)).toEqual(['A', 'B']);
  });

  it('chooses what the schedule lists; the page is laid out again from the same solver parts', () => {
    const store = useProjectStore();
    store.load({ path: '/tmp/demo.stayset', name: 'demo.stayset', project: demo });
    const report = solveProject(demo).report;
    const parts = scheduleParts(demo, report, false);
    const opts = { units: 'SI' as const, paper: 'a4' as const, issueDate: '2026-12-02' };
    expect(schedulePageFrom(store.project!, parts, opts).doc.memberSummary).toEqual([]);
    expect(store.edit('List all', (p) => setListing(p, 'all')).ok).toBe(true);
    expect(schedulePageFrom(store.project!, parts, opts).doc.memberSummary.map((r) => r.label)).toEqual(['mast legs', 'mast bracing']);
    expect(store.edit('List groups', (p) => setListing(p, 'groups')).ok).toBe(true);
    expect(store.project!.schedule).toEqual({ list: 'groups', groups: [demo.groups![0].id] });
    expect(store.edit('Guys level 1', (p) => toggleListedGroup(p, 'mast/guys level 1', true)).ok).toBe(true);
    expect(store.edit('No legs', (p) => toggleListedGroup(p, 'mast/mast legs', false)).ok).toBe(true);
    const doc = schedulePageFrom(store.project!, parts, opts).doc;
    expect(doc.members.map((m) => m.id)).toEqual([...membersOfGroup(demo, 'mast/guys level 1')]);
    expect(store.edit('None', (p) => toggleListedGroup(p, 'mast/guys level 1', false))).toEqual({ ok: false, errors: ['schedule: choose at least one group (or list the cables)'] });
    // The page's frequencies come from the modes about the reference case.
    expect(doc.frequencies!.modes.length).toBeGreaterThanOrEqual(3);
  });
});

describe('applying a tuning run in the app', () => {
  it('writes the tuned pretensions and keeps the run as tuning.lastRun', () => {
    const p: ProjectFile = structuredClone(demo);
    p.tuning = { variables: [{ group: 'mast/guys level 1', by: 'pretension' }], targets: [{ kind: 'tensionShare', group: 'mast/guys level 1', share: 0.12 }] };
    const run = tuneProject(p, { solveCases: solveNamedCases });
    const store = useProjectStore();
    store.load({ path: '/tmp/demo.stayset', name: 'demo.stayset', project: p });
    expect(store.edit('Tuned pretensions', (q) => applyTuningResult(q, run, '2026-12-02T11:00:00.000Z')).ok).toBe(true);
    const rec = store.project!.tuning!.lastRun!;
    expect(rec).toMatchObject({ date: '2026-12-02T11:00:00.000Z', summary: run.summary, status: run.status });
    expect(rec.targets![0]).toMatchObject({ kind: 'tensionShare', met: run.targets[0].met, value: run.targets[0].value });
    expect(rec.variables![0]).toMatchObject({ group: 'mast/guys level 1', final: run.variables[0].final });
    const guy = store.project!.members.find((m) => membersOfGroup(demo, 'mast/guys level 1').has(m.id))!;
    expect(guy.pretension).toBeCloseTo(run.variables[0].final, 6);
  });
});
