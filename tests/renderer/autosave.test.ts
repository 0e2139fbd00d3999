/**
 * Autosave writes a recovery copy only when the unsaved content changed since the last one, and
 * never sends a document that does not validate (a new project before its first member).
 */
import { beforeEach, describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { createPinia, setActivePinia } from 'pinia';
import type { ProjectFile } from '../../solver/index.ts';
import type { StaysetHost } from '../../main/common/host-contract.ts';
import { createAppActions } from '../../renderer/app/app-actions.ts';
import { useProjectStore } from '../../renderer/stores/project.ts';
import { blankProject } from '../../renderer/model/new-project.ts';

const demo = JSON.parse(readFileSync(new URL('../../assets/demo-mast.stayset', import.meta.url), 'utf8')) as ProjectFile;

describe('autosave', () => {
  beforeEach(() => setActivePinia(createPinia()));
  it('writes only when the unsaved content changed since the last autosave', async () => {
    const written: ProjectFile[] = [];
    const host = { autosave: async (_path: string | null, p: ProjectFile) => { written.push(p); } } as unknown as StaysetHost;
    const app = createAppActions(host);
    const store = useProjectStore();
    store.load({ path: '/p/demo.stayset', name: 'demo.stayset', project: demo });
    expect(await app.autosave()).toBe(false); // not dirty
    store.edit('Rename', (p) => ({ ...p, meta: { ...p.meta, name: 'changed' } }));
    expect(await app.autosave()).toBe(true);
    expect(await app.autosave()).toBe(false); // same content as the last autosave
    store.edit('Rename again', (p) => ({ ...p, meta: { ...p.meta, name: 'changed twice' } }));
    expect(await app.autosave()).toBe(true);
    expect(written.map((p) => p.meta?.name)).toEqual(['changed', 'changed twice']);
  });
  it('does not send a new project that does not validate yet', async () => {
    let calls = 0;
    const app = createAppActions({ autosave: async () => { calls++; } } as unknown as StaysetHost);
    const store = useProjectStore();
    store.load({ path: null, name: 'new.stayset', project: blankProject('new') });
    store.markUnsaved();
    expect(store.dirty).toBe(true);
    expect(await app.autosave()).toBe(false);
    expect(calls).toBe(0);
  });
});
