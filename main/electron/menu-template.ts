/**
 * The application menu as data: every item has a stable id; app items carry a MenuCommand that
 * is sent to the renderer (onDidMenuCommand) or a path to open (onDidRequestOpen); standard
 * text-editing and window items use Electron roles. menu-build.ts turns this into Electron's
 * template. Undo/Redo are the project's history (the renderer lets text fields keep their own).
 */
import type { MenuCommand, RecentEntry } from '../common/host-contract.ts';

export type MenuRole =
  | 'quit' | 'about' | 'hide' | 'hideOthers' | 'unhide' | 'services'
  | 'cut' | 'copy' | 'paste' | 'selectAll' | 'delete'
  | 'togglefullscreen' | 'resetZoom' | 'zoomIn' | 'zoomOut' | 'toggleDevTools' | 'reload'
  | 'minimize' | 'close' | 'front' | 'windowMenu' | 'appMenu';

export type MenuAction = { command: MenuCommand } | { openPath: string } | { role: MenuRole } | { clearRecent: true };

export interface MenuItemSpec {
  id: string;
  label?: string;
  accelerator?: string;
  action?: MenuAction;
  submenu?: MenuItemSpec[];
  separator?: true;
  enabled?: boolean;
}

export interface MenuContext {
  platform: NodeJS.Platform;
  recent: RecentEntry[];
  /** Show developer items (reload, devtools): unpackaged builds only. */
  developer: boolean;
}

const sep = (id: string): MenuItemSpec => ({ id, separator: true });
const cmd = (id: MenuCommand, label: string, accelerator?: string): MenuItemSpec =>
  accelerator ? { id, label, accelerator, action: { command: id } } : { id, label, action: { command: id } };

function recentSubmenu(recent: RecentEntry[]): MenuItemSpec[] {
  if (recent.length === 0) return [{ id: 'recent-none', label: 'No recent projects', enabled: false }];
  return [
    ...recent.map((r, i) => ({ id: `recent-${i}`, label: `${r.name} — ${r.path}`, action: { openPath: r.path } })),
    sep('recent-sep'),
    { id: 'recent-clear', label: 'Clear Recent', action: { clearRecent: true } },
  ];
}

export function menuTemplate(ctx: MenuContext): MenuItemSpec[] {
  const mac = ctx.platform === 'darwin';
  const file: MenuItemSpec = {
    id: 'file',
    label: '&File',
    submenu: [
      cmd('new', 'New Project', 'CmdOrCtrl+N'),
      cmd('open', 'Open…', 'CmdOrCtrl+O'),
      { id: 'openRecent', label: 'Open Recent', submenu: recentSubmenu(ctx.recent) },
      sep('file-sep1'),
      cmd('save', 'Save', 'CmdOrCtrl+S'),
      cmd('saveAs', 'Save As…', 'CmdOrCtrl+Shift+S'),
      sep('file-sep2'),
      cmd('print', 'Print Tension Schedule…', 'CmdOrCtrl+P'),
      ...(mac ? [] : [sep('file-sep3'), { id: 'quit', label: 'E&xit', accelerator: 'Ctrl+Q', action: { role: 'quit' as const } }]),
    ],
  };
  const edit: MenuItemSpec = {
    id: 'edit',
    label: '&Edit',
    submenu: [
      cmd('undo', 'Undo', 'CmdOrCtrl+Z'),
      cmd('redo', 'Redo', mac ? 'Cmd+Shift+Z' : 'Ctrl+Y'),
      sep('edit-sep1'),
      { id: 'cut', label: 'Cut', action: { role: 'cut' } },
      { id: 'copy', label: 'Copy', action: { role: 'copy' } },
      { id: 'paste', label: 'Paste', action: { role: 'paste' } },
      { id: 'selectAll', label: 'Select All', action: { role: 'selectAll' } },
    ],
  };
  const analysis: MenuItemSpec = { id: 'analysis', label: '&Analysis', submenu: [cmd('run', 'Run Analysis', 'F5')] };
  const view: MenuItemSpec = {
    id: 'view',
    label: '&View',
    submenu: [
      cmd('fit', 'Fit Model in View', 'CmdOrCtrl+0'),
      sep('view-sep1'),
      { id: 'zoomIn', label: 'Larger Text', action: { role: 'zoomIn' } },
      { id: 'zoomOut', label: 'Smaller Text', action: { role: 'zoomOut' } },
      { id: 'resetZoom', label: 'Actual Size', action: { role: 'resetZoom' } },
      { id: 'fullscreen', label: 'Full Screen', action: { role: 'togglefullscreen' } },
      ...(ctx.developer ? [sep('view-sep2'), { id: 'reload', label: 'Reload', action: { role: 'reload' as const } }, { id: 'devtools', label: 'Developer Tools', action: { role: 'toggleDevTools' as const } }] : []),
    ],
  };
  const appMenu: MenuItemSpec[] = mac
    ? [{
        id: 'app',
        label: 'Stayset',
        submenu: [
          { id: 'about', label: 'About Stayset', action: { role: 'about' } },
          sep('app-sep1'),
          { id: 'hide', label: 'Hide Stayset', action: { role: 'hide' } },
          { id: 'hideOthers', label: 'Hide Others', action: { role: 'hideOthers' } },
          sep('app-sep2'),
          { id: 'quit', label: 'Quit Stayset', accelerator: 'Cmd+Q', action: { role: 'quit' } },
        ],
      }]
    : [];
  const windowMenu: MenuItemSpec[] = mac ? [{ id: 'window', label: 'Window', action: { role: 'windowMenu' } }] : [];
  return [...appMenu, file, edit, analysis, view, ...windowMenu];
}

/** Every item of a template, depth first (for lookups and tests). */
export function flattenMenu(items: MenuItemSpec[]): MenuItemSpec[] {
  return items.flatMap((i) => [i, ...flattenMenu(i.submenu ?? [])]);
}
