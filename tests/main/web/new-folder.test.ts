/** Save As on the web host may name a folder that does not exist yet, inside the project folder only. */
import { afterAll, describe, expect, it } from 'vitest';
import { mkdtemp, rm, stat } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { PathPolicy } from '../../../main/web/path-policy.ts';

const root = await mkdtemp(path.join(os.tmpdir(), 'stayset-new-folder-'));
afterAll(() => rm(root, { recursive: true, force: true }));

describe('PathPolicy.forNewFile', () => {
  it('makes missing folders inside the root', async () => {
    const policy = await PathPolicy.create(root, null);
    const v = await policy.forNewFile('jobs/2026/kestrel.stayset');
    expect(v.ok).toBe(true);
    expect((await stat(path.join(root, 'jobs', '2026'))).isDirectory()).toBe(true);
  });
  it('refuses a path that leaves the root and makes nothing', async () => {
    const policy = await PathPolicy.create(root, null);
    const v = await policy.forNewFile('../escape-stayset-test/x.stayset');
    expect(v.ok).toBe(false);
    await expect(stat(path.join(root, '..', 'escape-stayset-test'))).rejects.toThrow();
  });
});
