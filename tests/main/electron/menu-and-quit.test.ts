/** The OS menu as data, its conversion for Electron, and the unsaved-changes close decision. */
import { describe, expect, it } from 'vitest';
import type { MenuCommand } from '../../../main/common/host-contract.ts';
import { projectFileFromArgv } from '../../../main/electron/launch-args.ts';
import { toElectronTemplate } from '../../../main/electron/menu-build.ts';
import { flattenMenu, menuTemplate } from '../../../main/electron/menu-template.ts';
import { CLOSE_PROMPT, QuitGuard } from '../../../main/electron/quit-guard.ts';
import { windowTitle } from '../../../main/electron/window-title.ts';

const recent = [{ path: '/p/north.stayset', name: 'north.stayset', openedAt: '2030-01-01T00:00:00Z' }];

describe('menu template', () => {
  it.each(['linux', 'win32', 'darwin'] as const)('%s: every app command with its shortcut', (platform) => {
    const items = flattenMenu(menuTemplate({ platform, recent, developer: false }));
    const byId = new Map(items.map((i) => [i.id, i]));
    expect(new Set(items.map((i) => i.id)).size).toBe(items.length); // ids are unique
    const expected: [MenuCommand, string][] = [['new', 'CmdOrCtrl+N'], ['open', 'CmdOrCtrl+O'], ['save', 'CmdOrCtrl+S'], ['saveAs', 'CmdOrCtrl+Shift+S'], ['undo', 'CmdOrCtrl+Z'], ['print', 'CmdOrCtrl+P'], ['run', 'F5']];
    for (const [command, accelerator] of expected) {
      expect(byId.get(command)).toMatchObject({ accelerator, action: { command } });
    }
    expect(byId.get('redo')?.action).toEqual({ command: 'redo' });
    expect(byId.get('quit')?.action).toEqual({ role: 'quit' });
    expect(byId.get('recent-0')?.action).toEqual({ openPath: '/p/north.stayset' });
    expect(byId.has('devtools')).toBe(false);
    expect(flattenMenu(menuTemplate({ platform, recent: [], developer: true })).find((i) => i.id === 'recent-none')?.enabled).toBe(false);
  });

  it('converts to Electron items whose clicks send the command or the path', () => {
    const sent: string[] = [];
    const tpl = toElectronTemplate(menuTemplate({ platform: 'linux', recent, developer: false }), {
      command: (c) => sent.push(`cmd:${c}`), openPath: (p) => sent.push(`open:${p}`), clearRecent: () => sent.push('clear'),
    });
    const flat = (xs: typeof tpl): typeof tpl => xs.flatMap((x) => [x, ...flat((x.submenu as typeof tpl) ?? [])]);
    const find = (id: string) => flat(tpl).find((x) => x.id === id)!;
    (find('save').click as () => void)();
    (find('recent-0').click as () => void)();
    (find('recent-clear').click as () => void)();
    expect(sent).toEqual(['cmd:save', 'open:/p/north.stayset', 'clear']);
    expect(find('copy').role).toBe('copy');
    expect(find('file-sep1').type).toBe('separator');
  });
});

describe('quit guard', () => {
  it('closes a clean window at once', () => {
    expect(new QuitGuard().onCloseRequested()).toEqual({ kind: 'close' });
  });
  it('prompts when dirty; Cancel stays', () => {
    const q = new QuitGuard();
    q.setDirty(true, 'north.stayset');
    expect(q.onCloseRequested()).toEqual({ kind: 'prompt' });
    expect(q.onPromptAnswer(CLOSE_PROMPT.cancelId)).toEqual({ kind: 'stay' });
    expect(q.onCloseRequested()).toEqual({ kind: 'prompt' });
  });
  it("Don't Save closes without saving", () => {
    const q = new QuitGuard();
    q.setDirty(true, 'x');
    expect(q.onPromptAnswer(CLOSE_PROMPT.buttons.indexOf("Don't Save"))).toEqual({ kind: 'discardAndClose' });
    expect(q.onCloseRequested()).toEqual({ kind: 'close' });
  });
  it('Save asks the renderer to save and closes once it reports clean', () => {
    const q = new QuitGuard();
    q.setDirty(true, 'x');
    expect(q.onPromptAnswer(CLOSE_PROMPT.defaultId)).toEqual({ kind: 'requestSave' });
    expect(q.setDirty(false, 'x')).toEqual({ kind: 'close' });
    expect(q.onCloseRequested()).toEqual({ kind: 'close' });
  });
  it('a cancelled save drops the pending close', () => {
    const q = new QuitGuard();
    q.setDirty(true, 'x');
    q.onPromptAnswer(0);
    q.onSaveAbandoned();
    expect(q.setDirty(false, 'x')).toEqual({ kind: 'stay' });
  });
  it('window title marks unsaved changes once, whatever mark the page sent', () => {
    expect(windowTitle('north.stayset', true)).toBe('north.stayset • — Stayset');
    expect(windowTitle('north.stayset •', true)).toBe('north.stayset • — Stayset');
    expect(windowTitle('north.stayset *', false)).toBe('north.stayset — Stayset');
    expect(windowTitle('', false)).toBe('Untitled — Stayset');
    const q = new QuitGuard();
    q.setDirty(true, 'north.stayset •');
    expect(CLOSE_PROMPT.message(q.title)).toBe('Save changes to north.stayset before closing?');
  });

  it('prompt text names the project', () => {
    expect(CLOSE_PROMPT.message('north.stayset')).toBe('Save changes to north.stayset before closing?');
    expect(CLOSE_PROMPT.buttons).toEqual(['Save', "Don't Save", 'Cancel']);
  });
});

describe('launch arguments', () => {
  it('finds the project file after the executable (and app folder when unpackaged)', () => {
    expect(projectFileFromArgv(['/opt/Stayset/stayset', '/home/e/north.stayset'], true)).toBe('/home/e/north.stayset');
    expect(projectFileFromArgv(['electron', '.', '--no-sandbox', 'a.STAYSET'], false)).toBe('a.STAYSET');
    expect(projectFileFromArgv(['electron', '.'], false)).toBeNull();
  });
});
