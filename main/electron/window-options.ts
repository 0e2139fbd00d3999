/**
 * Options of the app's windows: the renderer is a sandboxed page with no Node access; the
 * preload is the only bridge (one frozen object, see preload.ts).
 */
import type { BrowserWindowConstructorOptions, WebPreferences } from 'electron';

/**
 * `devTools` is true only for an unpackaged (development) run: a packaged build gives the page no
 * DevTools (Electron security checklist; main.ts passes `!app.isPackaged`).
 */
export function secureWebPreferences(preloadPath: string, devTools = false): WebPreferences {
  return {
    preload: preloadPath,
    contextIsolation: true,
    sandbox: true,
    nodeIntegration: false,
    nodeIntegrationInWorker: false,
    nodeIntegrationInSubFrames: false,
    webSecurity: true,
    allowRunningInsecureContent: false,
    webviewTag: false,
    experimentalFeatures: false,
    navigateOnDragDrop: false,
    spellcheck: false,
    devTools,
  };
}

export function mainWindowOptions(preloadPath: string, devTools = false): BrowserWindowConstructorOptions {
  return {
    width: 1400,
    height: 900,
    minWidth: 900,
    minHeight: 600,
    title: 'Stayset',
    show: false,
    backgroundColor: '#1e1f22',
    webPreferences: secureWebPreferences(preloadPath, devTools),
  };
}

/** Hidden window that lays out the schedule for printToPDF. */
export function printWindowOptions(preloadPath: string): BrowserWindowConstructorOptions {
  return { width: 1000, height: 1400, show: false, webPreferences: secureWebPreferences(preloadPath) };
}
