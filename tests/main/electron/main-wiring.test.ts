/**
 * Runs the real main process (main/electron/main.ts, bundled with esbuild) against the recording
 * stand-in of tests/main/electron/fake-electron.ts: checks the order of set-up, the secure
 * window, the session rules, the app scheme with its CSP, IPC for every method with the sender
 * check, the close prompt, and an analysis run through the bundled worker.
 */
import { build } from 'esbuild';
import { copyFileSync, mkdirSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { HOST_METHODS, STAYSET_CSP } from '../../../main/common/web-protocol.ts';
import { buildMain } from '../../../main/electron/build-main.ts';
import { sampleMast } from '../store/sample-project.ts';
import { makeTempDir } from '../store/temp-dir.ts';
import type { BrowserWindow, record as Record_ } from './fake-electron.ts';

const here = path.dirname(fileURLToPath(import.meta.url));
const repo = path.resolve(here, '..', '..', '..');
let tmp: ReturnType<typeof makeTempDir>;
let rec: typeof Record_;
let win: BrowserWindow;

beforeAll(async () => {
  tmp = makeTempDir('stayset-main-');
  const out = path.join(tmp.dir, 'bundle');
  await buildMain(out, 'silent'); // the real worker and preload next to the test's main bundle
  await build({
    entryPoints: [path.join(repo, 'main/electron/main.ts')], outfile: path.join(out, 'main-under-test.mjs'),
    bundle: true, platform: 'node', format: 'esm', logLevel: 'silent',
    banner: { js: "import { createRequire as __cr } from 'node:module'; const require = __cr(import.meta.url);" },
    plugins: [{ name: 'fake-electron', setup: (b) => b.onResolve({ filter: /^electron$/ }, () => ({ path: path.join(here, 'fake-electron.ts') })) }],
  });
  const appPath = path.join(tmp.dir, 'app');
  mkdirSync(path.join(appPath, 'dist', 'renderer'), { recursive: true });
  mkdirSync(path.join(appPath, 'assets'));
  writeFileSync(path.join(appPath, 'dist', 'renderer', 'index.html'), '<!doctype html><title>Stayset</title>');
  writeFileSync(path.join(appPath, 'assets', 'demo-mast.stayset'), JSON.stringify(sampleMast()));
  copyFileSync(path.join(repo, 'package.json'), path.join(appPath, 'package.json'));
  process.env.STAYSET_FAKE_APP_PATH = appPath;
  process.env.STAYSET_FAKE_USER_DATA = path.join(tmp.dir, 'user');
  await import(pathToFileURL(path.join(out, 'main-under-test.mjs')).href);
  rec = (globalThis as unknown as { __staysetFakeElectron: { record: typeof Record_ } }).__staysetFakeElectron.record;
  for (let i = 0; i < 50 && rec.windows.length === 0; i++) await new Promise((r) => setTimeout(r, 20));
  win = rec.windows[0];
});
afterAll(() => tmp.cleanup());

const invoke = (method: string, args: unknown[], from?: { id: number; url: string; sub?: boolean }) => {
  const sender = from ? { id: from.id, mainFrame: { url: from.url } } : win.webContents;
  const frame = from?.sub ? { url: from.url } : sender.mainFrame;
  return rec.ipc.get(`stayset:${method}`)!({ sender, senderFrame: frame }, ...args);
};

describe('main process wiring', () => {
  it('registers the app scheme as privileged before the app is ready', () => {
    const reg = rec.log.find((e) => e[0] === 'registerSchemesAsPrivileged')!;
    expect(reg[1]).toEqual([expect.objectContaining({ scheme: 'stayset', privileges: expect.objectContaining({ standard: true, secure: true }) })]);
    expect(reg[2]).toEqual({ ready: false });
  });

  it('opens one secure window on the app page with the bundled preload', () => {
    expect(rec.windows).toHaveLength(1);
    const prefs = win.options.webPreferences as Record<string, unknown>;
    expect(prefs).toMatchObject({ contextIsolation: true, sandbox: true, nodeIntegration: false, webSecurity: true });
    expect(String(prefs.preload)).toMatch(/preload\.cjs$/);
    expect(win.webContents.mainFrame.url).toBe('stayset://app/index.html');
    expect(win.webContents.windowOpenHandler!({ url: 'https://example.com' })).toEqual({ action: 'deny' });
  });

  it('denies permissions and cancels remote requests', () => {
    let granted: boolean | undefined;
    rec.session.permissionRequest(null, 'media', (g: boolean) => (granted = g));
    expect(granted).toBe(false);
    let verdict: { cancel: boolean } | undefined;
    rec.session.beforeRequest({ url: 'https://example.com/x.js' }, (v: { cancel: boolean }) => (verdict = v));
    expect(verdict).toEqual({ cancel: true });
    rec.session.beforeRequest({ url: 'stayset://app/assets/app.js' }, (v: { cancel: boolean }) => (verdict = v));
    expect(verdict).toEqual({ cancel: false });
  });

  it('serves the renderer on the app scheme with the CSP, and nothing outside it', async () => {
    const handler = rec.protocolHandlers.get('stayset')!;
    const page: Response = await handler(new Request('stayset://app/index.html'));
    expect(page.status).toBe(200);
    expect(page.headers.get('content-security-policy')).toBe(STAYSET_CSP);
    expect(await page.text()).toContain('<title>Stayset</title>');
    expect((await handler(new Request('stayset://app/../package.json'))).status).toBe(404);
    expect((await handler(new Request('stayset://app/%2e%2e/package.json'))).status).toBe(404);
  });

  it('handles every host method over IPC, only from our window', async () => {
    for (const m of HOST_METHODS) expect(rec.ipc.has(`stayset:${m}`), m).toBe(true);
    expect(await invoke('kind', [])).toEqual({ ok: true, value: 'desktop' });
    expect(await invoke('kind', [], { id: 999, url: 'stayset://app/index.html' })).toMatchObject({ ok: false, error: /unknown window/ });
    expect(await invoke('kind', [], { id: win.webContents.id, url: 'stayset://app/index.html', sub: true })).toMatchObject({ ok: false, error: /sub-frame/ });
    const initial = await invoke('openInitial', []);
    expect(initial).toMatchObject({ ok: true, value: { ok: true, value: { name: 'demo-mast.stayset' } } });
  });

  it('builds the menu; its Save item sends the menu command to the page', () => {
    const flat = (xs: { id?: string; click?: () => void; submenu?: unknown }[]): typeof xs => xs.flatMap((x) => [x, ...flat((x.submenu as typeof xs) ?? [])]);
    const save = flat(rec.menu as never).find((x) => x.id === 'save')!;
    save.click!();
    expect(rec.sent.at(-1)).toEqual({ channel: 'stayset:event:menuCommand', data: 'save' });
  });

  it('asks before closing with unsaved changes and stays on Cancel', async () => {
    await invoke('setDirty', [true, 'north.stayset']);
    expect(win.title).toBe('north.stayset • — Stayset');
    rec.messageBoxAnswer = 2;
    expect(win.close()).toBe(false);
    const box = rec.log.filter((e) => e[0] === 'messageBox').at(-1)![1] as { buttons: string[]; message: string };
    expect(box.buttons).toEqual(['Save', "Don't Save", 'Cancel']);
    expect(box.message).toBe('Save changes to north.stayset before closing?');
  });

  it('runs an analysis in the bundled worker and sends progress and the result to the page', async () => {
    const { value } = await invoke('runAnalysis', [sampleMast()]);
    const doneOf = () => rec.sent.find((s) => s.channel === 'stayset:event:analysisDone' && (s.data as { runId: string }).runId === value.runId);
    for (let i = 0; i < 300 && !doneOf(); i++) await new Promise((r) => setTimeout(r, 20));
    expect(doneOf()?.data).toMatchObject({ status: 'done', report: { cases: [{ id: 'SW' }, { id: 'HX' }] } });
    expect(rec.sent.some((s) => s.channel === 'stayset:event:progress')).toBe(true);
  });

  it("Save on close waits for the page's save, then closes", async () => {
    rec.messageBoxAnswer = 0;
    expect(win.close()).toBe(false);
    expect(rec.sent.at(-1)).toEqual({ channel: 'stayset:event:menuCommand', data: 'save' });
    await invoke('setDirty', [false, 'north.stayset']);
    expect(win.destroyed).toBe(true);
  });
});
