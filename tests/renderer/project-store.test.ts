import { beforeEach, describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { createPinia, setActivePinia } from 'pinia';
import type { ProjectFile } from '../../solver/index.ts';
import { useProjectStore, HISTORY_CAP } from '../../renderer/stores/project.ts';
import { withField } from '../../renderer/model/project-edits.ts';

const demo = JSON.parse(readFileSync(fileURLToPath(new URL('../e2e/fixtures/demo-mast.stayset.json', import.meta.url)), 'utf8')) as ProjectFile;

describe('project store', () => {
  beforeEach(() => setActivePinia(createPinia()));

  function loaded() {
    const s = useProjectStore();
    s.load({ path: '/projects/demo.stayset', name: 'demo.stayset', project: demo });
    return s;
  }

  it('opens clean, becomes dirty on an edit and clean again on undo', () => {
    const s = loaded();
    expect(s.dirty).toBe(false);
    expect(s.problems).toEqual([]);
    const r = s.updateRowsIn('members', [2], (m) => ({ ...m, pretension: 9500 }), 'Pretension of GL1');
    expect(r.ok).toBe(true);
    expect(s.dirty).toBe(true);
    expect(s.project!.members[2].pretension).toBe(9500);
    expect(s.undoLabel).toBe('Pretension of GL1');
    s.undo();
    expect(s.dirty).toBe(false);
    expect(s.project!.members[2].pretension).toBe(9000);
    s.redo();
    expect(s.project!.members[2].pretension).toBe(9500);
  });

  it('never mutates the opened document (snapshots share unchanged parts)', () => {
    const s = loaded();
    const before = s.project!;
    s.updateRowsIn('nodes', [1], (n) => ({ ...n, at: [0.1, 0, 20] }), 'Move MID');
    expect(demo.nodes[1].at).toEqual([0, 0, 20]);
    expect(s.project!.members).toBe(before.members);
  });

  it('refuses an edit the file validator rejects and reports its message for that row', () => {
    const s = loaded();
    const before = s.project;
    const r = s.updateRowsIn('members', [2], (m) => ({ ...m, from: 'NOPE' }), 'From of GL1');
    expect(r.ok).toBe(false);
    expect(!r.ok && r.errors[0]).toMatch(/^members\[2\].*NOPE/);
    expect(s.project).toBe(before);
    expect(s.canUndo).toBe(false);
  });

  it('refuses deleting a node that members still use', () => {
    const s = loaded();
    const r = s.removeRows('nodes', [2]);
    expect(r.ok).toBe(false);
    expect(s.project!.nodes.length).toBe(demo.nodes.length);
  });

  it('marks saved and caps history', () => {
    const s = loaded();
    for (let k = 0; k < HISTORY_CAP + 5; k++) s.updateRowsIn('members', [2], (m) => withField(m, 'pretension', 9000 + k + 1), 'p');
    let undos = 0;
    while (s.undo()) undos++;
    expect(undos).toBe(HISTORY_CAP);
    s.markSaved('/projects/other.stayset', 'other.stayset');
    expect(s.dirty).toBe(false);
    expect(s.name).toBe('other.stayset');
  });

  it('is dirty after opening a migrated file until saved', () => {
    const s = useProjectStore();
    s.load({ path: '/p/old.stayset', name: 'old.stayset', project: demo, migratedFrom: 0 });
    expect(s.dirty).toBe(true);
  });
});

describe('validation once per edit', () => {
  beforeEach(() => setActivePinia(createPinia()));
  it('an edit validates the new document once; undo and redo reuse what is known', () => {
    const s = useProjectStore();
    s.load({ path: '/p/d.stayset', name: 'd.stayset', project: demo });
    const afterLoad = s.validationCount();
    expect(s.edit('Rename', (p) => ({ ...p, meta: { ...p.meta, name: 'x' } }))).toEqual({ ok: true });
    expect(s.validationCount()).toBe(afterLoad + 1);
    s.undo();
    s.redo();
    expect(s.validationCount()).toBe(afterLoad + 1);
  });
});
