/**
 * Counted calls, not time: one edit runs the project validator (main/common/project
 * validateProject) exactly once; undo, redo and reading the store run it not at all; the autosave
 * tick posts to the host only when the document differs from the one it last wrote.
 */
import { beforeEach, describe, expect, it, vi } from 'vitest';
import { readFileSync } from 'node:fs';
import { createPinia, setActivePinia } from 'pinia';
import type { ProjectFile } from '../../solver/index.ts';
import type { StaysetHost } from '../../main/common/host-contract.ts';

const calls = vi.hoisted(() => ({ validate: 0 }));
vi.mock('../../main/common/project/index.ts', async (importOriginal) => {
  const real = await importOriginal<typeof import('../../main/common/project/index.ts')>();
  return { ...real, validateProject: (p: unknown) => { calls.validate++; return real.validateProject(p); } };
});

const { useProjectStore } = await import('../../renderer/stores/project.ts');
const { createAppActions } = await import('../../renderer/app/app-actions.ts');

const demo = JSON.parse(readFileSync(new URL('../../assets/demo-mast.stayset', import.meta.url), 'utf8')) as ProjectFile;

describe('validation runs once per edit', () => {
  beforeEach(() => { setActivePinia(createPinia()); calls.validate = 0; });

  it('an accepted edit: one call; undo and redo: none; reading problems and warnings: none', () => {
    const s = useProjectStore();
    s.load({ path: '/p/d.stayset', name: 'd.stayset', project: demo });
    expect(calls.validate).toBe(1); // the opened document
    calls.validate = 0;
    const i = demo.members.findIndex((m) => m.pretension !== undefined);
    expect(s.updateRowsIn('members', [i], (m) => ({ ...m, pretension: m.pretension! * 1.01 }), 'Pretension')).toEqual({ ok: true });
    void s.problems; void s.warnings; void s.dirty;
    expect(calls.validate).toBe(1);
    s.undo();
    s.redo();
    s.undo();
    expect(calls.validate).toBe(1);
  });

  it('a refused edit: one call, and the document is unchanged', () => {
    const s = useProjectStore();
    s.load({ path: '/p/d.stayset', name: 'd.stayset', project: demo });
    calls.validate = 0;
    const before = s.project;
    const out = s.updateRowsIn('members', [0], (m) => ({ ...m, to: 'no such node' }), 'Bad end');
    expect(out.ok).toBe(false);
    expect(calls.validate).toBe(1);
    expect(s.project).toBe(before);
  });
});

describe('autosave posts only changed content', () => {
  beforeEach(() => setActivePinia(createPinia()));

  it('ticks without a change post nothing; an undo back to the written document posts nothing', async () => {
    const posted: ProjectFile[] = [];
    const app = createAppActions({ autosave: async (_p: string | null, doc: ProjectFile) => { posted.push(doc); return { ok: true }; } } as unknown as StaysetHost);
    const s = useProjectStore();
    s.load({ path: '/p/d.stayset', name: 'd.stayset', project: demo });
    for (let k = 0; k < 3; k++) await app.autosave();
    expect(posted).toHaveLength(0); // clean document
    s.edit('Rename', (p) => ({ ...p, meta: { ...p.meta, name: 'A' } }));
    for (let k = 0; k < 3; k++) await app.autosave();
    expect(posted).toHaveLength(1);
    s.edit('Rename', (p) => ({ ...p, meta: { ...p.meta, name: 'B' } }));
    s.undo(); // back to the document written as "A"
    for (let k = 0; k < 3; k++) await app.autosave();
    expect(posted.map((p) => p.meta?.name)).toEqual(['A']);
    s.redo();
    await app.autosave();
    expect(posted.map((p) => p.meta?.name)).toEqual(['A', 'B']);
  });
});
