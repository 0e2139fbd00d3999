/**
 * Fault suite, writes (issue 14): a save keeps what it should — mode, owner, read-only, symlinks
 * (desktop store and web host agree) — two writers never break each other's saves, an edit saved
 * on disk meanwhile is never overwritten silently (save, autosave, tune --write), and the recent
 * list and recovery files tolerate failures and say so.
 * Method: POSIX rename(2) semantics and chmod/chown on real files in a temporary folder.
 */
import { spawn } from 'node:child_process';
import { chmodSync, chownSync, lstatSync, mkdirSync, readFileSync, readdirSync, realpathSync, statSync, symlinkSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { build } from 'esbuild';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { parseProjectText, serializeProject } from '../../../main/common/project/index.ts';
import { createWebHostClient } from '../../../main/common/web-host-client.ts';
import { writeTunedFile } from '../../../main/cli/tune-write.ts';
import { readRegularFileSync } from '../../../main/store/read-regular-file.ts';
import { ProjectService } from '../../../main/store/project-service.ts';
import { RecentProjects } from '../../../main/store/recent-projects.ts';
import { RecoveryStore } from '../../../main/store/recovery-store.ts';
import { startWebHost } from '../../../main/web/web-server.ts';
import { sampleMast } from '../store/sample-project.ts';
import { makeTempDir } from '../store/temp-dir.ts';

const POSIX = process.platform !== 'win32';
const isRoot = process.getuid?.() === 0;
let tmp: ReturnType<typeof makeTempDir>;
let service: ProjectService;
beforeEach(() => {
  tmp = makeTempDir('stayset-writes-');
  service = new ProjectService({ userDataDir: path.join(tmp.dir, 'user') });
});
afterEach(() => tmp.cleanup());

const named = (name: string) => { const p = sampleMast(); p.meta = { ...p.meta, name }; return p; };
const nameIn = (file: string) => parseProjectText(readFileSync(file, 'utf8')).ok && JSON.parse(readFileSync(file, 'utf8')).meta.name;

async function openedFile(name: string, mode?: number): Promise<string> {
  const file = path.join(tmp.dir, name);
  writeFileSync(file, serializeProject(named('on disk')));
  if (mode !== undefined) chmodSync(file, mode);
  expect((await service.open(file)).ok).toBe(true);
  return file;
}

describe.runIf(POSIX)('save keeps mode, owner and read-only', () => {
  it('a 0600 project stays 0600 (and so does its backup)', async () => {
    const file = await openedFile('private.stayset', 0o600);
    expect((await service.save(file, named('edited'))).ok).toBe(true);
    expect(statSync(file).mode & 0o777).toBe(0o600);
    expect(statSync(file + '.bak').mode & 0o777).toBe(0o600);
    expect(nameIn(file)).toBe('edited');
  });

  it('a read-only 0444 project is not replaced; the refusal says so', async () => {
    const file = await openedFile('locked.stayset', 0o444);
    const r = await service.saveAs(file, named('edited'));
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error).toMatch(/locked\.stayset is read-only \(permissions 444\)/);
    expect(nameIn(file)).toBe('on disk');
    expect(statSync(file).mode & 0o777).toBe(0o444);
  });

  it.runIf(isRoot)('a file of another owner keeps its owner where that is permitted', async () => {
    const file = await openedFile('theirs.stayset', 0o664);
    chownSync(file, 4321, 4322);
    expect((await service.saveAs(file, named('edited'))).ok).toBe(true);
    expect([statSync(file).uid, statSync(file).gid]).toEqual([4321, 4322]);
    expect(nameIn(file)).toBe('edited');
  });
});

describe.runIf(POSIX)('a symlinked project is written through to its target in both editions', () => {
  it('desktop store and web host each update the real file and keep the link', async () => {
    const real = path.join(tmp.dir, 'projects', 'real');
    mkdirSync(real, { recursive: true });
    const target = path.join(real, 'mast.stayset');
    writeFileSync(target, serializeProject(named('on disk')));
    const link = path.join(tmp.dir, 'projects', 'link.stayset');
    symlinkSync(target, link);
    // Desktop: the store is given the link path.
    expect((await service.open(link)).ok).toBe(true);
    expect((await service.save(link, named('desktop edit'))).ok).toBe(true);
    expect(lstatSync(link).isSymbolicLink()).toBe(true);
    expect(nameIn(target)).toBe('desktop edit');
    expect(readdirSync(real).sort()).toEqual(['mast.stayset', 'mast.stayset.bak']);
    // Web host: the same link, relative to its root.
    mkdirSync(path.join(tmp.dir, 'renderer'));
    const web = await startWebHost({ root: path.join(tmp.dir, 'projects'), staticDir: path.join(tmp.dir, 'renderer'), assetsDir: null, userDataDir: path.join(tmp.dir, 'user2') });
    try {
      const host = createWebHostClient({ token: web.token, baseUrl: web.origin, createEventSource: () => ({ addEventListener: () => undefined, close: () => undefined }) });
      const opened = await host.open('link.stayset');
      expect(opened).toMatchObject({ ok: true });
      const saved = await host.save(opened!.ok ? opened!.value.path! : '', named('web edit'));
      expect(saved).toMatchObject({ ok: true });
      expect(lstatSync(link).isSymbolicLink()).toBe(true);
      expect(nameIn(target)).toBe('web edit');
    } finally {
      await web.close();
    }
  });

  it('a dangling link gets its target created, the link kept', async () => {
    const target = path.join(tmp.dir, 'later.stayset');
    const link = path.join(tmp.dir, 'link.stayset');
    symlinkSync(target, link);
    expect((await service.saveAs(link, named('new'))).ok).toBe(true);
    expect(lstatSync(link).isSymbolicLink()).toBe(true);
    expect(nameIn(realpathSync(link))).toBe('new');
  });
});

describe('two writers on one file', () => {
  let writer: string;
  beforeEach(async () => {
    writer = path.join(tmp.dir, 'concurrent-writer.mjs');
    const source = fileURLToPath(new URL('./workers/concurrent-writer.ts', import.meta.url));
    await build({ entryPoints: [source], outfile: writer, bundle: true, platform: 'node', format: 'esm', logLevel: 'silent' });
  });

  const run = (args: string[]) => new Promise<{ failures: string[] }>((resolve, reject) => {
    const child = spawn(process.execPath, [writer, ...args], { stdio: ['ignore', 'pipe', 'pipe'] });
    let out = '', err = '';
    child.stdout.on('data', (d) => (out += String(d)));
    child.stderr.on('data', (d) => (err += String(d)));
    child.on('exit', (code) => (code === 0 ? resolve(JSON.parse(out)) : reject(new Error(`writer exited ${code}: ${err}`))));
  });

  it('never remove each other\'s temp file: every save of both processes succeeds', async () => {
    const target = path.join(tmp.dir, 'shared.stayset');
    const [a, b] = await Promise.all([run(['write', target, '40', 'A']), run(['write', target, '40', 'B'])]);
    expect([...a.failures, ...b.failures]).toEqual([]);
    expect(readFileSync(target, 'utf8')).toMatch(/^(A|B) 39\n/);
    expect(readdirSync(tmp.dir).filter((n) => n.endsWith('.stayset-tmp'))).toEqual([]);
  });

  it('recent-list updates from two processes lose no entry', async () => {
    const data = path.join(tmp.dir, 'data');
    mkdirSync(data);
    const [a, b] = await Promise.all([run(['recent', data, '6', 'a']), run(['recent', data, '6', 'b'])]);
    expect([...a.failures, ...b.failures]).toEqual([]);
    const names = (await new RecentProjects(data).list()).map((e) => e.name).sort();
    expect(names).toEqual([...['a', 'b'].flatMap((t) => [0, 1, 2, 3, 4, 5].map((i) => `${t}-${i}.stayset`))].sort());
  });
});

describe('lost-update guard', () => {
  it('save refuses when another program saved the file since it was opened; that version is kept', async () => {
    const file = await openedFile('mast.stayset');
    writeFileSync(file, serializeProject(named('saved elsewhere')));
    const r = await service.save(file, named('my edit'));
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error).toMatch(/changed on disk since it was opened/);
    expect(nameIn(file)).toBe('saved elsewhere');
    // Save As to the same file is the deliberate overwrite.
    expect((await service.saveAs(file, named('my edit'))).ok).toBe(true);
    expect(nameIn(file)).toBe('my edit');
  });

  it('tune --write keeps an edit saved while tuning ran', async () => {
    const file = path.join(tmp.dir, 'tuned.stayset');
    writeFileSync(file, serializeProject(named('before tune')));
    const read = readRegularFileSync(file, 'tuned.stayset');
    if (!read.ok) throw new Error(read.error);
    writeFileSync(file, serializeProject(named('edited during tune')));
    const message = await writeTunedFile(file, 'tuned.stayset', serializeProject(named('tuned')), read.stamp);
    expect(message).toMatch(/changed on disk while tune ran/);
    expect(nameIn(file)).toBe('edited during tune');
    // Unchanged since read → written.
    const again = readRegularFileSync(file, 'tuned.stayset');
    expect(again.ok && (await writeTunedFile(file, 'tuned.stayset', serializeProject(named('tuned')), again.stamp))).toBeNull();
    expect(nameIn(file)).toBe('tuned');
  });

  it('autosave never overwrites another session\'s recovery file; both stay recoverable', async () => {
    const dir = path.join(tmp.dir, 'recovery');
    const file = path.join(tmp.dir, 'm.stayset');
    await new RecoveryStore(dir).autosave(file, named('crashed session'));
    const now = new RecoveryStore(dir); // a new process
    await now.autosave(file, named('this session'));
    await now.discard(file); // this session saved: only its own file goes
    const left = await now.list();
    expect(left).toHaveLength(1);
    const recovered = await now.recover(left[0].id);
    expect(recovered.ok && recovered.value.project.meta?.name).toBe('crashed session');
  });

  it('save after recovering an autosave still refuses a file changed on disk since the edits began', async () => {
    const file = await openedFile('r.stayset');
    expect((await service.autosave(file, named('unsaved edit'))).ok).toBe(true);
    writeFileSync(file, serializeProject(named('saved elsewhere')));
    const later = new ProjectService({ userDataDir: path.join(tmp.dir, 'user') });
    const [entry] = await later.listRecovery();
    expect((await later.recover(entry.id)).ok).toBe(true);
    const r = await later.save(file, named('unsaved edit'));
    expect(r.ok).toBe(false);
    expect(nameIn(file)).toBe('saved elsewhere');
  });
});

describe('recent list and recovery failures are tolerated and visible', () => {
  it('open succeeds with a warning when the recent list cannot be written', async () => {
    const blocked = path.join(tmp.dir, 'not-a-folder');
    writeFileSync(blocked, 'a file where the user data folder should be');
    const s = new ProjectService({ userDataDir: blocked, recoveryDir: path.join(tmp.dir, 'rec') });
    const file = path.join(tmp.dir, 'p.stayset');
    writeFileSync(file, serializeProject(named('fine')));
    const r = await s.open(file);
    expect(r.ok).toBe(true);
    if (r.ok) expect(r.value.warnings?.join(' ')).toMatch(/recent-projects list could not be updated/);
  });

  it('autosave reports a failure instead of swallowing it', async () => {
    const blocked = path.join(tmp.dir, 'rec-file');
    writeFileSync(blocked, 'not a folder');
    const s = new ProjectService({ userDataDir: path.join(tmp.dir, 'u'), recoveryDir: blocked });
    const r = await s.autosave(null, named('x'));
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error).toMatch(/Autosave failed .*cannot be recovered/);
  });
});
