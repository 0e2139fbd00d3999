/**
 * The desktop host's methods on real files, with the OS dialogs replaced by scripted answers,
 * reached through the same IPC dispatch the Electron main process uses.
 */
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
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
let answers: { open: (string | null)[]; save: (string | null)[] };
let handlers: HostHandlers;
let quit: QuitGuard;
let assets: string;
const ctx = { allowedSenders: new Set([1]), printJobs: new PrintJobs() };
const caller = { senderId: 1, isMainFrame: true, frameUrl: appPageUrl() };
const call = (method: Parameters<typeof dispatchIpcCall>[2], ...args: unknown[]) => dispatchIpcCall(handlers, ctx, method, caller, args);

beforeEach(() => {
  tmp = makeTempDir('stayset-desktop-');
  assets = path.join(tmp.dir, 'assets');
  mkdirSync(assets);
  writeFileSync(path.join(assets, 'demo-mast.stayset'), serializeProject(sampleMast()));
  answers = { open: [], save: [] };
  quit = new QuitGuard();
  handlers = createDesktopHandlers({
    projects: new ProjectService({ userDataDir: path.join(tmp.dir, 'user') }),
    analysis: { start: () => ({ runId: '0123456789abcdef' }), cancel: () => undefined, caseFields: () => null },
    dialogs: {
      chooseProjectToOpen: async () => answers.open.shift() ?? null,
      chooseProjectSavePath: async () => answers.save.shift() ?? null,
      choosePdfPath: async () => null,
    },
    granted: new GrantedPaths(),
    quit,
    assetsDir: assets,
    initialPath: () => path.join(assets, 'demo-mast.stayset'),
    printPdf: async (_p, pdf) => ({ ok: true, value: { path: pdf } }),
    onDirtyChanged: (d, t) => void quit.setDirty(d, t),
  });
});
afterEach(() => tmp.cleanup());

describe('desktop host', () => {
  it('opens the demo read-only; saving it needs Save As', async () => {
    const initial = await call('openInitial');
    expect(initial).toMatchObject({ ok: true, value: { ok: true, value: { name: 'demo-mast.stayset' } } });
    const demo = path.join(assets, 'demo-mast.stayset');
    const saved = await call('save', demo, sampleMast());
    expect(saved).toMatchObject({ ok: true, value: { ok: false, error: expect.stringMatching(/bundled demo and read-only/) } });
    const target = path.join(tmp.dir, 'north');
    answers.save.push(target);
    const savedAs = await call('saveAs', sampleMast(17_000));
    expect(savedAs).toMatchObject({ ok: true, value: { ok: true, value: { path: target + '.stayset', name: 'north.stayset' } } });
    const again = await call('save', target + '.stayset', sampleMast(18_000));
    expect(again).toMatchObject({ ok: true, value: { ok: true } });
    expect(JSON.parse(readFileSync(target + '.stayset', 'utf8')).members[1].pretension).toBe(18_000);
  });

  it('refuses save to a path it never handed out', async () => {
    const r = await call('save', path.join(tmp.dir, 'sneaky.stayset'), sampleMast());
    expect(r).toMatchObject({ ok: true, value: { ok: false, error: expect.stringMatching(/not opened or chosen in this session/) } });
  });

  it('a cancelled dialog answers null; an opened file becomes saveable', async () => {
    expect(await call('open')).toEqual({ ok: true, value: null });
    const file = path.join(tmp.dir, 'south.stayset');
    writeFileSync(file, serializeProject(sampleMast()));
    answers.open.push(file);
    expect(await call('open')).toMatchObject({ ok: true, value: { ok: true } });
    expect(await call('save', file, sampleMast(12_345))).toMatchObject({ ok: true, value: { ok: true } });
    expect(await call('recentProjects')).toMatchObject({ ok: true, value: [{ path: file }] });
  });

  it('rejects bad arguments and foreign callers before any handler runs', async () => {
    expect(await call('save', 42, sampleMast())).toEqual({ ok: false, error: 'save: argument 1 (path) must be a non-empty string' });
    expect(await call('open', 'relative.stayset')).toMatchObject({ ok: true, value: { ok: false, error: expect.stringMatching(/not an absolute path/) } });
    const foreign = await dispatchIpcCall(handlers, ctx, 'kind', { ...caller, senderId: 99 }, []);
    expect(foreign).toMatchObject({ ok: false, error: expect.stringMatching(/unknown window/) });
    expect(await call('kind')).toEqual({ ok: true, value: 'desktop' });
  });

  it('a close prompt answered Save closes after the renderer saves and reports clean', async () => {
    await call('setDirty', true, 'north.stayset');
    expect(quit.onCloseRequested().kind).toBe('prompt');
    expect(quit.onPromptAnswer(0).kind).toBe('requestSave');
    answers.save.push(null); // the renderer's Save As is cancelled in the dialog
    expect(await call('saveAs', sampleMast())).toEqual({ ok: true, value: null });
    expect(quit.setDirty(false, 'north.stayset').kind).toBe('stay'); // no surprise close later
  });

  it('print windows get their own project and report ready', async () => {
    const jobs = ctx.printJobs;
    ctx.allowedSenders.add(5);
    const ready = jobs.add(5, sampleMast(), 5000);
    const printCaller = { senderId: 5, isMainFrame: true, frameUrl: appPageUrl('/schedule?print=1') };
    const initial = await dispatchIpcCall(handlers, ctx, 'openInitial', printCaller, []);
    expect(initial).toMatchObject({ ok: true, value: { ok: true, value: { path: null, name: 'Test mast Ridgeback Hill' } } });
    // The print window cannot touch the user's project or window state.
    await dispatchIpcCall(handlers, ctx, 'setDirty', printCaller, [true, 'print']);
    expect(quit.dirty).toBe(false);
    expect(await dispatchIpcCall(handlers, ctx, 'listRecovery', printCaller, [])).toEqual({ ok: true, value: [] });
    expect(await dispatchIpcCall(handlers, ctx, 'save', printCaller, [path.join(tmp.dir, 'x.stayset'), sampleMast()]))
      .toEqual({ ok: false, error: 'save is not available in the print window' });
    await dispatchIpcCall(handlers, ctx, 'printReady', printCaller, []);
    await expect(ready).resolves.toBeUndefined();
    jobs.remove(5);
  });
});
