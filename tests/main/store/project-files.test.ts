/**
 * Reading and saving project files on real files: round trip, damaged files refused and left
 * untouched, the overwrite policy of save vs. save as, backups.
 */
import { readdirSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { serializeProject } from '../../../main/common/project/index.ts';
import { readProjectFile, withProjectExtension, writeProjectFile } from '../../../main/store/project-files.ts';
import { makeTempDir } from './temp-dir.ts';
import { sampleMast } from './sample-project.ts';

let tmp: ReturnType<typeof makeTempDir>;
beforeEach(() => (tmp = makeTempDir()));
afterEach(() => tmp.cleanup());

describe('project files', () => {
  it('round-trips a project exactly', async () => {
    const file = path.join(tmp.dir, 'mast.stayset');
    const saved = await writeProjectFile(file, sampleMast(), 'save');
    expect(saved).toEqual({ ok: true, value: { path: file } });
    const read = await readProjectFile(file);
    expect(read.ok && read.opened.project).toEqual(sampleMast());
    expect(read.ok && read.opened.name).toBe('mast.stayset');
    expect(read.ok && read.opened.migratedFrom).toBeUndefined();
  });

  it('names a missing file', async () => {
    const read = await readProjectFile(path.join(tmp.dir, 'nope.stayset'));
    expect(read).toMatchObject({ ok: false, reason: 'missing' });
    expect(!read.ok && read.error).toMatch(/nope\.stayset: file not found/);
  });

  it.each([
    ['truncated', (t: string) => t.slice(0, Math.floor(t.length / 2))],
    ['not JSON', () => 'this is not json'],
    ['another format', () => JSON.stringify({ format: 'something-else', version: 1 })],
    ['a newer version', (t: string) => t.replace('"version": 1', '"version": 99')],
    ['a broken reference', (t: string) => t.replace('"to": "A1"', '"to": "NOWHERE"')],
  ])('refuses a %s file with a message and never overwrites it on save', async (_label, damage) => {
    const file = path.join(tmp.dir, 'bad.stayset');
    const damaged = damage(serializeProject(sampleMast()));
    writeFileSync(file, damaged);
    const read = await readProjectFile(file);
    expect(read.ok).toBe(false);
    expect(!read.ok && read.error).toMatch(/bad\.stayset is not a usable Stayset project; the file was not changed/);
    const saved = await writeProjectFile(file, sampleMast(), 'save');
    expect(saved.ok).toBe(false);
    expect(!saved.ok && saved.error).toMatch(/Save will not replace it\. Use Save As/);
    expect(readFileSync(file, 'utf8')).toBe(damaged);
    expect(readdirSync(tmp.dir)).toEqual(['bad.stayset']);
  });

  it('save as over a damaged file replaces it and keeps the damaged one as .bak', async () => {
    const file = path.join(tmp.dir, 'bad.stayset');
    writeFileSync(file, '{"format": "stayset-project", "version": 1, "nod');
    const saved = await writeProjectFile(file, sampleMast(), 'saveAs');
    expect(saved.ok).toBe(true);
    expect(readFileSync(file + '.bak', 'utf8')).toBe('{"format": "stayset-project", "version": 1, "nod');
    expect((await readProjectFile(file)).ok).toBe(true);
  });

  it('save keeps the previous version as .bak', async () => {
    const file = path.join(tmp.dir, 'mast.stayset');
    await writeProjectFile(file, sampleMast(10_000), 'save');
    await writeProjectFile(file, sampleMast(30_000), 'save');
    const bak = await readProjectFile(file + '.bak');
    // The backup is a complete, readable project: the version before the last save.
    expect(bak.ok && bak.opened.project.members[1].pretension).toBe(10_000);
    expect(JSON.parse(readFileSync(file, 'utf8')).members[1].pretension).toBe(30_000);
  });

  it('refuses other extensions and adds .stayset to bare names', async () => {
    const saved = await writeProjectFile(path.join(tmp.dir, 'notes.txt'), sampleMast(), 'saveAs');
    expect(!saved.ok && saved.error).toMatch(/must end in \.stayset/);
    expect(withProjectExtension('/x/site')).toBe('/x/site.stayset');
    expect(withProjectExtension('/x/site.stayset')).toBe('/x/site.stayset');
  });
});

describe('save after an outside change', () => {
  it('refuses to save over a file that changed on disk since it was last read or written', async () => {
    const file = path.join(tmp.dir, 'mast.stayset');
    expect((await writeProjectFile(file, sampleMast(), 'save')).ok).toBe(true);
    writeFileSync(file, '{ "damaged by another program"'); // size and time change
    const saved = await writeProjectFile(file, sampleMast(), 'save');
    expect(!saved.ok && saved.error).toMatch(/changed on disk since it was opened or last saved here/);
    expect(readFileSync(file, 'utf8')).toBe('{ "damaged by another program"');
  });
});
