/**
 * Fault suite, desktop grants (issue 14): through the same IPC dispatch the Electron main process
 * uses, the page can open and save only files the user opened in a dialog, from the recent list,
 * or the system handed over (command line, file association, Open Recent); opening or autosaving
 * an arbitrary absolute path is refused and grants nothing; recovery writes stay in the recovery
 * folder.
 */
import { existsSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { serializeProject } from '../../../main/common/project/index.ts';
import type { HostHandlers } from '../../../main/common/host-validation.ts';
import { appPageUrl } from '../../../main/electron/app-url.ts';
import { createDesktopHandlers } from '../../../main/electron/desktop-host.ts';
import { GrantedPaths } from '../../../main/electron/granted-paths.ts';
import { dispatchIpcCall } from '../../../main/electron/ipc-dispatch.ts';
import { PrintJobs } from '../../../main/electron/print-jobs.ts';
import { QuitGuard } from '../../../main/electron/quit-guard.ts';
import { ProjectService } from '../../../main/store/project-service.ts';
import { sampleMast } from '../store/sample-project.ts';
import { makeTempDir } from '../store/temp-dir.ts';

let tmp: ReturnType<typeof makeTempDir>;
let handlers: HostHandlers;
let granted: GrantedPaths;
let projects: ProjectService;
let dialogAnswer: string | null;
const ctx = { allowedSenders: new Set([1]), printJobs: new PrintJobs() };
const caller = { senderId: 1, isMainFrame: true, frameUrl: appPageUrl() };
const call = (method: Parameters<typeof dispatchIpcCall>[2], ...args: unknown[]) => dispatchIpcCall(handlers, ctx, method, caller, args);

beforeEach(() => {
  tmp = makeTempDir('stayset-grants-');
  granted = new GrantedPaths();
  dialogAnswer = null;
  projects = new ProjectService({ userDataDir: path.join(tmp.dir, 'user') });
  const quit = new QuitGuard();
  handlers = createDesktopHandlers({
    projects,
    analysis: { start: () => ({ runId: '0123456789abcdef' }), cancel: () => undefined, caseFields: () => null },
    dialogs: { chooseProjectToOpen: async () => dialogAnswer, chooseProjectSavePath: async () => null, choosePdfPath: async () => null },
    granted, quit, assetsDir: null, initialPath: () => null,
    printPdf: async (_p, pdf) => ({ ok: true, value: { path: pdf } }),
    onDirtyChanged: (d, t) => void quit.setDirty(d, t),
  });
});
afterEach(() => tmp.cleanup());

function project(name: string): string {
  const file = path.join(tmp.dir, name);
  writeFileSync(file, serializeProject(sampleMast()));
  return file;
}

describe('desktop grants', () => {
  it('open of an arbitrary absolute path is refused and grants no save', async () => {
    const file = project('elsewhere.stayset');
    const before = serializeProject(sampleMast());
    const opened = await call('open', file);
    expect(opened).toMatchObject({ ok: true, value: { ok: false, error: expect.stringMatching(/Open ".*elsewhere.stayset" refused/) } });
    const saved = await call('save', file, sampleMast(99_000));
    expect(saved).toMatchObject({ ok: true, value: { ok: false } });
    expect(readFileSync(file, 'utf8')).toBe(before);
    expect(existsSync(file + '.bak')).toBe(false);
  });

  it('a file chosen in the dialog, a recent entry and a system request may be opened by path', async () => {
    const chosen = project('chosen.stayset');
    dialogAnswer = chosen;
    expect(await call('open')).toMatchObject({ ok: true, value: { ok: true } });
    expect(await call('open', chosen)).toMatchObject({ ok: true, value: { ok: true } });
    // Recent (from an earlier session: a fresh grant set, the same user data).
    const recent = project('recent.stayset');
    await projects.recent.add(recent);
    expect(await call('open', recent)).toMatchObject({ ok: true, value: { ok: true } });
    expect(await call('save', recent, sampleMast(21_000))).toMatchObject({ ok: true, value: { ok: true } });
    // A file the system asked to open (main.ts offers it before telling the page).
    const offered = project('offered.stayset');
    granted.offer(offered);
    expect(await call('open', offered)).toMatchObject({ ok: true, value: { ok: true } });
  });

  it('autosave for a path never handed out is refused; recover cannot create a file anywhere', async () => {
    const outside = path.join(tmp.dir, 'planted', 'x.stayset');
    const r = await call('autosave', outside, sampleMast());
    expect(r).toMatchObject({ ok: true, value: { ok: false, error: expect.stringMatching(/Autosave for .* refused/) } });
    expect(await call('listRecovery')).toEqual({ ok: true, value: [] });
    expect(existsSync(path.dirname(outside))).toBe(false);
  });

  it('recovery files are written only inside the recovery folder', async () => {
    const file = project('mine.stayset');
    dialogAnswer = file;
    await call('open');
    expect(await call('autosave', file, sampleMast(11_000))).toMatchObject({ ok: true, value: { ok: true } });
    expect(await call('autosave', null, sampleMast(12_000))).toMatchObject({ ok: true, value: { ok: true } });
    const rec = path.join(tmp.dir, 'user', 'recovery');
    expect(readdirSync(rec).every((n) => /^[0-9a-f]{24,}\.json$/.test(n))).toBe(true);
    expect(readdirSync(tmp.dir).sort()).toEqual(['mine.stayset', 'user']);
    // A recovery id is hex only: no path can be smuggled through it.
    expect(await call('recover', '../../x')).toMatchObject({ ok: false, error: expect.stringMatching(/id of 8–64 hex digits/) });
  });
});
