/** Atomic replacement with backup (write-temp, fsync, rename: POSIX rename(2) semantics). */
import { existsSync, linkSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { isTempFileOf, removeStaleTemps, tempPathFor, writeFileAtomic } from '../../../main/store/atomic-write.ts';
import { makeTempDir } from './temp-dir.ts';

let tmp: ReturnType<typeof makeTempDir>;
beforeEach(() => (tmp = makeTempDir()));
afterEach(() => tmp.cleanup());

describe('writeFileAtomic', () => {
  it('creates a new file without a backup and leaves no temp file', async () => {
    const target = path.join(tmp.dir, 'p.stayset');
    await writeFileAtomic(target, 'one', { backup: true });
    expect(readFileSync(target, 'utf8')).toBe('one');
    expect(readdirSync(tmp.dir)).toEqual(['p.stayset']);
  });

  it('keeps the replaced content as .bak, only the latest previous version', async () => {
    const target = path.join(tmp.dir, 'p.stayset');
    await writeFileAtomic(target, 'one', { backup: true });
    await writeFileAtomic(target, 'two', { backup: true });
    await writeFileAtomic(target, 'three', { backup: true });
    expect(readFileSync(target, 'utf8')).toBe('three');
    expect(readFileSync(target + '.bak', 'utf8')).toBe('two');
    expect(readdirSync(tmp.dir).sort()).toEqual(['p.stayset', 'p.stayset.bak']);
  });

  it('leaves no staging link when a killed save left the backup hard-linked to the target', async () => {
    // State after a kill between "link the backup" and "rename the new file": .bak and the target
    // are one inode, and POSIX rename(2) between two links of one file does nothing.
    const target = path.join(tmp.dir, 'p.stayset');
    writeFileSync(target, 'one');
    linkSync(target, target + '.bak');
    await writeFileAtomic(target, 'two', { backup: true });
    expect(readFileSync(target, 'utf8')).toBe('two');
    expect(readFileSync(target + '.bak', 'utf8')).toBe('one');
    expect(readdirSync(tmp.dir).sort()).toEqual(['p.stayset', 'p.stayset.bak']);
  });

  it('without backup replaces in place and writes no .bak', async () => {
    const target = path.join(tmp.dir, 'r.json');
    await writeFileAtomic(target, 'a');
    await writeFileAtomic(target, 'b');
    expect(readdirSync(tmp.dir)).toEqual(['r.json']);
  });

  it('fails cleanly into a missing folder and leaves nothing behind', async () => {
    const target = path.join(tmp.dir, 'missing', 'p.stayset');
    await expect(writeFileAtomic(target, 'x')).rejects.toThrow(/ENOENT/);
    expect(readdirSync(tmp.dir)).toEqual([]);
  });

  it('leaves the target untouched when the rename fails (target is a folder)', async () => {
    const target = path.join(tmp.dir, 'dir.stayset');
    writeFileSync(path.join(tmp.dir, 'keep.txt'), 'k');
    await import('node:fs').then((fs) => fs.mkdirSync(target));
    await expect(writeFileAtomic(target, 'x')).rejects.toThrow();
    expect(readdirSync(tmp.dir).sort()).toEqual(['dir.stayset', 'keep.txt']);
  });

  it('removes stale temp files of the same target only', async () => {
    const target = path.join(tmp.dir, 'p.stayset');
    const stale = tempPathFor(target);
    writeFileSync(stale, 'half');
    writeFileSync(path.join(tmp.dir, '.other.stayset.0123456789ab.stayset-tmp'), 'not ours');
    expect(isTempFileOf(target, path.basename(stale))).toBe(true);
    expect(await removeStaleTemps(target)).toBe(1);
    expect(existsSync(stale)).toBe(false);
    expect(readdirSync(tmp.dir)).toEqual(['.other.stayset.0123456789ab.stayset-tmp']);
  });
});

describe('concurrent writes in one process', () => {
  it('are queued: all succeed and the last one wins', async () => {
    const target = path.join(tmp.dir, 'q.stayset');
    const big = (c: string) => c.repeat(2_000_000);
    await Promise.all(['a', 'b', 'c', 'd'].map((c) => writeFileAtomic(target, big(c), { backup: true })));
    expect(readFileSync(target, 'utf8')).toBe(big('d'));
    expect(readFileSync(target + '.bak', 'utf8')).toBe(big('c'));
    expect(readdirSync(tmp.dir).sort()).toEqual(['q.stayset', 'q.stayset.bak']);
  });
});
