/**
 * Fault suite, reading (issue 14): the CLI and the web host read only regular files within the
 * one size limit of main/common (MAX_PROJECT_FILE_BYTES) and say why they refuse anything else;
 * a FIFO does not hang them, /dev/zero does not fill memory.
 */
import { execFileSync } from 'node:child_process';
import { existsSync, mkdirSync, truncateSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { byteLimitText, MAX_PROJECT_FILE_BYTES } from '../../../main/common/limits/file-limits.ts';
import { serializeProject } from '../../../main/common/project/index.ts';
import { createWebHostClient } from '../../../main/common/web-host-client.ts';
import { readProjectFile } from '../../../main/store/project-files.ts';
import { readRegularFileSync } from '../../../main/store/read-regular-file.ts';
import { startWebHost, type WebHost } from '../../../main/web/web-server.ts';
import { runStayset } from '../cli/run-stayset.ts';
import { sampleMast } from '../store/sample-project.ts';
import { makeTempDir } from '../store/temp-dir.ts';

const LIMIT_TEXT = `larger than the ${byteLimitText(MAX_PROJECT_FILE_BYTES)} limit`;
let tmp: ReturnType<typeof makeTempDir>;
let root: string;
let web: WebHost;

beforeAll(async () => {
  tmp = makeTempDir('stayset-regular-');
  root = path.join(tmp.dir, 'projects');
  mkdirSync(path.join(root, 'folder.stayset'), { recursive: true });
  execFileSync('mkfifo', [path.join(root, 'pipe.stayset')]);
  // A sparse file one byte over the limit (no disk space used).
  writeFileSync(path.join(root, 'huge.stayset'), '');
  truncateSync(path.join(root, 'huge.stayset'), MAX_PROJECT_FILE_BYTES + 1);
  writeFileSync(path.join(root, 'good.stayset'), serializeProject(sampleMast()));
  mkdirSync(path.join(tmp.dir, 'renderer'));
  web = await startWebHost({ root, staticDir: path.join(tmp.dir, 'renderer'), assetsDir: null, userDataDir: path.join(tmp.dir, 'user') });
});

afterAll(async () => {
  await web.close();
  tmp.cleanup();
});

describe('CLI reads regular files only', () => {
  it.each([
    ['pipe.stayset', 'is a named pipe (FIFO), not a project file'],
    ['folder.stayset', 'is a folder, not a project file'],
    ['huge.stayset', LIMIT_TEXT],
  ])('validate %s → exit 2: %s', (name, message) => {
    const r = runStayset(['validate', name], root);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain(`${name}: `);
    expect(r.stderr).toContain(message);
  });

  it.runIf(existsSync('/dev/zero'))('refuses /dev/zero as a device', () => {
    const r = runStayset(['solve', '/dev/zero']);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('/dev/zero: is a device, not a project file');
  });

  it('still reads a regular project', () => {
    expect(runStayset(['validate', 'good.stayset'], root).code).toBe(0);
  });

  it('a smaller limit refuses a larger file before reading it', () => {
    const r = readRegularFileSync(path.join(root, 'good.stayset'), 'good.stayset', 100);
    expect(r).toMatchObject({ ok: false, reason: 'tooLarge' });
  });
});

describe('web host and desktop store read regular files only, with the same limit', () => {
  it('the store refuses a FIFO, a folder and an oversized file, with the CLI\'s words', async () => {
    const pipe = await readProjectFile(path.join(root, 'pipe.stayset'));
    expect(pipe).toMatchObject({ ok: false, reason: 'unreadable' });
    if (!pipe.ok) expect(pipe.error).toContain('named pipe (FIFO)');
    const huge = await readProjectFile(path.join(root, 'huge.stayset'));
    if (!huge.ok) expect(huge.error).toContain(LIMIT_TEXT);
    expect(huge.ok).toBe(false);
  });

  it('web open of a FIFO is refused and the host keeps answering', async () => {
    const host = createWebHostClient({ token: web.token, baseUrl: web.origin, createEventSource: () => ({ addEventListener: () => undefined, close: () => undefined }) });
    const pipe = await host.open('pipe.stayset');
    expect(pipe).toMatchObject({ ok: false });
    if (pipe && !pipe.ok) expect(pipe.error).toContain('named pipe');
    const folder = await host.open('folder.stayset');
    expect(folder).toMatchObject({ ok: false });
    const good = await host.open('good.stayset');
    expect(good).toMatchObject({ ok: true });
  });
});
