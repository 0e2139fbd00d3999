/**
 * Turns the menu data of menu-template.ts into Electron's MenuItemConstructorOptions,
 * wiring each action to a callback. No Electron runtime needed (types only).
 */
import type { MenuItemConstructorOptions } from 'electron';
import type { MenuCommand } from '../common/host-contract.ts';
import type { MenuItemSpec } from './menu-template.ts';

export interface MenuCallbacks {
  command: (c: MenuCommand) => void;
  openPath: (path: string) => void;
  clearRecent: () => void;
}

export function toElectronTemplate(items: MenuItemSpec[], cb: MenuCallbacks): MenuItemConstructorOptions[] {
  return items.map((item): MenuItemConstructorOptions => {
    if (item.separator) return { id: item.id, type: 'separator' };
    const out: MenuItemConstructorOptions = { id: item.id, label: item.label };
    if (item.accelerator) out.accelerator = item.accelerator;
    if (item.enabled === false) out.enabled = false;
    if (item.submenu) out.submenu = toElectronTemplate(item.submenu, cb);
    const a = item.action;
    if (a && 'role' in a) out.role = a.role;
    else if (a && 'command' in a) out.click = () => cb.command(a.command);
    else if (a && 'openPath' in a) out.click = () => cb.openPath(a.openPath);
    else if (a && 'clearRecent' in a) out.click = () => cb.clearRecent();
    return out;
  });
}
