/** Recent list (capped, deduplicated) and autosave recovery on real files. */
import { writeFileSync } from 'node:fs';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { addRecent, RECENT_LIMIT, RecentProjects } from '../../../main/store/recent-projects.ts';
import { ProjectService } from '../../../main/store/project-service.ts';
import { recoveryIdFor, RecoveryStore } from '../../../main/store/recovery-store.ts';
import { makeTempDir } from './temp-dir.ts';
import { sampleMast } from './sample-project.ts';

let tmp: ReturnType<typeof makeTempDir>;
beforeEach(() => (tmp = makeTempDir()));
afterEach(() => tmp.cleanup());

describe('recent projects', () => {
  it('puts the newest first, removes duplicates and caps the list', async () => {
    const recent = new RecentProjects(tmp.dir);
    for (let i = 0; i < RECENT_LIMIT + 5; i++) await recent.add(path.join(tmp.dir, `p${i}.stayset`));
    await recent.add(path.join(tmp.dir, 'p3.stayset'));
    const list = await recent.list();
    expect(list).toHaveLength(RECENT_LIMIT);
    expect(list[0].name).toBe('p3.stayset');
    expect(list.filter((e) => e.name === 'p3.stayset')).toHaveLength(1);
    expect(list[1].name).toBe(`p${RECENT_LIMIT + 4}.stayset`);
  });

  it('reads a damaged list as empty', async () => {
    writeFileSync(path.join(tmp.dir, 'recent-projects.json'), '[{"path": 3');
    expect(await new RecentProjects(tmp.dir).list()).toEqual([]);
  });

  it('addRecent is pure', () => {
    const list = [{ path: '/a', name: 'a', openedAt: 't0' }];
    expect(addRecent(list, { path: '/b', name: 'b', openedAt: 't1' }, 1)).toEqual([{ path: '/b', name: 'b', openedAt: 't1' }]);
    expect(list).toHaveLength(1);
  });
});

describe('recovery', () => {
  it('autosaves, lists, recovers and discards', async () => {
    const store = new RecoveryStore(path.join(tmp.dir, 'recovery'));
    const file = path.join(tmp.dir, 'mast.stayset');
    await store.autosave(file, sampleMast(11_000), new Date('2030-01-01T10:00:00Z'));
    await store.autosave(null, sampleMast(12_000), new Date('2030-01-01T11:00:00Z'));
    await store.autosave(file, sampleMast(13_000), new Date('2030-01-01T12:00:00Z'));
    const list = await store.list();
    expect(list.map((e) => [e.path, e.name, e.savedAt])).toEqual([
      [file, 'mast.stayset', '2030-01-01T12:00:00.000Z'],
      [null, 'Test mast Ridgeback Hill', '2030-01-01T11:00:00.000Z'],
    ]);
    expect(list[0].id).toBe(recoveryIdFor(file));
    const rec = await store.recover(list[0].id);
    expect(rec.ok && rec.value.project.members[1].pretension).toBe(13_000);
    expect(rec.ok && rec.value.path).toBe(file);
    await store.discard(file);
    expect((await store.list()).map((e) => e.path)).toEqual([null]);
    expect(await store.recover(recoveryIdFor(file))).toMatchObject({ ok: false });
  });

  it('skips damaged entries and reports a damaged project inside an entry', async () => {
    const dir = path.join(tmp.dir, 'recovery');
    const store = new RecoveryStore(dir);
    await store.autosave(null, sampleMast());
    writeFileSync(path.join(dir, 'abcdefabcdefabcdefabcdef.json'), '{"path": null, "na');
    writeFileSync(path.join(dir, '0123456789abcdef01234567.json'), JSON.stringify({ path: null, name: 'x', savedAt: 't', projectText: '{}' }));
    const list = await store.list();
    expect(list.map((e) => e.id).sort()).toEqual(['0123456789abcdef01234567', recoveryIdFor(null)].sort());
    const bad = await store.recover('0123456789abcdef01234567');
    expect(!bad.ok && bad.error).toMatch(/Recovery entry for x is damaged/);
  });

  it('a successful save through the service discards that project\'s recovery entry', async () => {
    const svc = new ProjectService({ userDataDir: tmp.dir });
    const file = path.join(tmp.dir, 'mast.stayset');
    await svc.autosave(file, sampleMast());
    expect(await svc.listRecovery()).toHaveLength(1);
    expect((await svc.save(file, sampleMast())).ok).toBe(true);
    expect(await svc.listRecovery()).toHaveLength(0);
    const opened = await svc.open(file);
    expect(opened.ok && opened.value.name).toBe('mast.stayset');
    expect((await svc.recentProjects()).map((e) => e.path)).toEqual([file]);
  });
});

describe('recent projects under concurrent opens', () => {
  it('keeps every entry when adds overlap', async () => {
    const recent = new RecentProjects(tmp.dir);
    await Promise.all([0, 1, 2, 3, 4].map((i) => recent.add(path.join(tmp.dir, `c${i}.stayset`))));
    expect((await recent.list()).map((e) => e.name).sort()).toEqual(['c0.stayset', 'c1.stayset', 'c2.stayset', 'c3.stayset', 'c4.stayset']);
  });
});
