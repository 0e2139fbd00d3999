/**
 * Security decisions of the desktop shell, checked as data (Electron's own security checklist,
 * electronjs.org/docs/latest/tutorial/security: context isolation, sandbox, no Node in the page,
 * webSecurity, CSP, navigation and window-open limits, permission requests denied).
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { STAYSET_CSP } from '../../../main/common/web-protocol.ts';
import { appPageUrl, isAppUrl } from '../../../main/electron/app-url.ts';
import { checkIpcCaller } from '../../../main/electron/ipc-guard.ts';
import { decideNavigation, decidePermission, decideWindowOpen, isAllowedRequest } from '../../../main/electron/navigation-policy.ts';
import { mainWindowOptions, printWindowOptions } from '../../../main/electron/window-options.ts';

describe('window options', () => {
  it.each([['main', mainWindowOptions], ['print', printWindowOptions]])('%s window: isolated, sandboxed, no Node, web security on', (_n, make) => {
    const w = make('/app/preload.cjs').webPreferences!;
    expect(w).toMatchObject({
      preload: '/app/preload.cjs', contextIsolation: true, sandbox: true, nodeIntegration: false,
      nodeIntegrationInWorker: false, nodeIntegrationInSubFrames: false, webSecurity: true,
      allowRunningInsecureContent: false, webviewTag: false,
    });
  });
});

describe('DevTools', () => {
  it('are off unless main.ts asks for them (it passes !app.isPackaged): never in a packaged build or a print window', () => {
    expect(mainWindowOptions('/p.cjs').webPreferences!.devTools).toBe(false);
    expect(mainWindowOptions('/p.cjs', false).webPreferences!.devTools).toBe(false);
    expect(mainWindowOptions('/p.cjs', true).webPreferences!.devTools).toBe(true);
    expect(printWindowOptions('/p.cjs').webPreferences!.devTools).toBe(false);
  });

  it('main.ts opens its window with DevTools tied to app.isPackaged', () => {
    const main = readFileSync(new URL('../../../main/electron/main.ts', import.meta.url), 'utf8');
    expect(main).toContain('mainWindowOptions(preloadPath, !app.isPackaged)');
  });
});

describe('content security policy', () => {
  const directives = new Map(STAYSET_CSP.split(';').map((d) => d.trim().split(/\s+/)).map(([k, ...v]) => [k, v.join(' ')]));
  it('has the required directives', () => {
    expect(directives.get('default-src')).toBe("'self'");
    expect(directives.get('script-src')).toBe("'self'");
    expect(directives.get('style-src')).toBe("'self' 'unsafe-inline'");
    expect(directives.get('img-src')).toBe("'self' data: blob:");
    expect(directives.get('connect-src')).toBe("'self'");
    expect(directives.get('object-src')).toBe("'none'");
    expect(directives.get('base-uri')).toBe("'none'");
    expect(directives.get('frame-ancestors')).toBe("'none'");
  });
  it('never allows eval or inline scripts or remote hosts', () => {
    expect(STAYSET_CSP).not.toMatch(/unsafe-eval|script-src[^;]*unsafe-inline|https?:|\*/);
  });
});

describe('navigation and requests', () => {
  it('allows only our own pages', () => {
    expect(isAppUrl(appPageUrl('/schedule?print=1'))).toBe(true);
    expect(decideNavigation(appPageUrl())).toBe('allow');
    for (const u of ['https://example.com/', 'file:///etc/passwd', 'stayset://other/index.html', 'stayset://user:pw@app/x', 'javascript:alert(1)', 'not a url']) {
      expect(decideNavigation(u), u).toBe('deny');
      expect(isAllowedRequest(u), u).toBe(false);
    }
    expect(decideWindowOpen(appPageUrl())).toEqual({ action: 'deny' });
    expect(decideWindowOpen('https://example.com')).toEqual({ action: 'deny' });
    expect(isAllowedRequest('data:image/png;base64,AA==')).toBe(true);
    expect(isAllowedRequest('blob:stayset://app/1234')).toBe(true);
  });
  it('denies every permission', () => {
    for (const p of ['media', 'geolocation', 'notifications', 'clipboard-read', 'openExternal']) expect(decidePermission(p)).toBe(false);
  });
});

describe('IPC caller check', () => {
  const allowed = new Set([7]);
  const good = { senderId: 7, isMainFrame: true, frameUrl: appPageUrl() };
  it('accepts our window main frame on our page only', () => {
    expect(checkIpcCaller(good, allowed)).toEqual({ ok: true });
    expect(checkIpcCaller({ ...good, senderId: 8 }, allowed)).toMatchObject({ ok: false, error: /unknown window/ });
    expect(checkIpcCaller({ ...good, isMainFrame: false }, allowed)).toMatchObject({ ok: false, error: /sub-frame/ });
    expect(checkIpcCaller({ ...good, frameUrl: 'https://evil.example/' }, allowed)).toMatchObject({ ok: false, error: /not Stayset's own/ });
    expect(checkIpcCaller({ ...good, frameUrl: undefined }, allowed)).toMatchObject({ ok: false });
  });
});
