/**
 * Electron main process of Stayset: one window, the app scheme, the security hardening, the OS
 * menu, IPC to the StaysetHost handlers, the quit prompt and the analysis worker.
 * All decisions live in plain modules beside this file (tested without Electron); this file
 * only connects them to Electron.
 */
import path from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { app, BrowserWindow, dialog, Menu, session } from 'electron';
import type { MenuCommand } from '../common/host-contract.ts';
import type { WebEventName } from '../common/web-protocol.ts';
import { AnalysisRunner } from '../analysis/analysis-runner.ts';
import { SiteRunner } from '../analysis/site-runner.ts';
import { ProjectService } from '../store/project-service.ts';
import { defaultUserDataDir } from '../store/user-dirs.ts';
import { registerAppScheme, serveAppScheme } from './app-protocol.ts';
import { appPageUrl } from './app-url.ts';
import { createDesktopHandlers, type DesktopDialogs } from './desktop-host.ts';
import { GrantedPaths } from './granted-paths.ts';
import { hardenSession, hardenWebContents } from './harden.ts';
import { eventChannel } from './ipc-channels.ts';
import { registerIpcHandlers } from './ipc-handlers.ts';
import { projectFileFromArgv } from './launch-args.ts';
import { toElectronTemplate } from './menu-build.ts';
import { menuTemplate } from './menu-template.ts';
import { PrintJobs } from './print-jobs.ts';
import { printScheduleToPdf } from './print-window.ts';
import { printHtmlToPdf } from './print-site-document.ts';
import { CLOSE_PROMPT, QuitGuard } from './quit-guard.ts';
import { mainWindowOptions } from './window-options.ts';
import { windowTitle } from './window-title.ts';

const here = path.dirname(fileURLToPath(import.meta.url));
const appRoot = app.getAppPath();
const rendererDir = path.join(appRoot, 'dist', 'renderer');
const assetsDir = path.join(appRoot, 'assets');
const preloadPath = path.join(here, 'preload.cjs');
// Workers cannot load from inside an asar archive; electron-builder unpacks the worker. It is .mjs
// because the unpacked folder has no package.json saying "type": "module".
const workerUrl = pathToFileURL(path.join(here, 'analysis-worker.mjs').replace(`app.asar${path.sep}`, `app.asar.unpacked${path.sep}`));
const PROJECT_FILTERS = [{ name: 'Stayset project', extensions: ['stayset'] }];

app.setName('Stayset');
app.setPath('userData', defaultUserDataDir());
registerAppScheme();

let win: BrowserWindow | null = null;
let startFile = projectFileFromArgv(process.argv, app.isPackaged);
const pendingOpens: string[] = [];
const allowedSenders = new Set<number>();
const printJobs = new PrintJobs();
const granted = new GrantedPaths();
const quit = new QuitGuard();
const projects = new ProjectService({ userDataDir: app.getPath('userData') });

function send(event: WebEventName, data: unknown): void {
  if (win && !win.isDestroyed()) win.webContents.send(eventChannel(event), data);
}

const runner = new AnalysisRunner({
  workerUrl,
  onProgress: (p) => send('progress', p),
  onDone: (d) => send('analysisDone', d),
});

const siteRunner = new SiteRunner({ workerUrl });

function requestOpen(file: string): void {
  granted.offer(file);
  if (win) send('requestOpen', path.resolve(file));
  else pendingOpens.push(file);
}

async function clearRecent(): Promise<void> {
  for (const r of await projects.recentProjects()) await projects.recent.remove(r.path);
  await refreshMenu();
}

async function refreshMenu(): Promise<void> {
  const spec = menuTemplate({ platform: process.platform, recent: await projects.recentProjects(), developer: !app.isPackaged });
  const template = toElectronTemplate(spec, {
    command: (c: MenuCommand) => send('menuCommand', c),
    openPath: requestOpen,
    clearRecent: () => void clearRecent(),
  });
  Menu.setApplicationMenu(Menu.buildFromTemplate(template));
}

const dialogs: DesktopDialogs = {
  async chooseProjectToOpen() {
    const r = await dialog.showOpenDialog(win!, { title: 'Open project', properties: ['openFile'], filters: PROJECT_FILTERS });
    return r.canceled || r.filePaths.length === 0 ? null : r.filePaths[0];
  },
  async chooseProjectSavePath(suggestedName) {
    const r = await dialog.showSaveDialog(win!, { title: 'Save project as', defaultPath: suggestedName, filters: PROJECT_FILTERS, properties: ['showOverwriteConfirmation'] });
    return r.canceled || !r.filePath ? null : r.filePath;
  },
  async choosePdfPath(suggestedName) {
    const r = await dialog.showSaveDialog(win!, { title: 'Save tension schedule', defaultPath: suggestedName, filters: [{ name: 'PDF', extensions: ['pdf'] }] });
    return r.canceled || !r.filePath ? null : r.filePath;
  },
};

const handlers = createDesktopHandlers({
  projects,
  analysis: runner,
  dialogs,
  granted,
  quit,
  assetsDir,
  initialPath: () => startFile ?? path.join(assetsDir, 'demo-mast.stayset'),
  printPdf: (project, pdfPath) => printScheduleToPdf(project, pdfPath, { preloadPath, printJobs, allowedSenders }),
  site: siteRunner,
  printHtml: printHtmlToPdf,
  onDirtyChanged: (dirty, title) => {
    win?.setTitle(windowTitle(title, dirty));
    if (process.platform === 'darwin') win?.setDocumentEdited(dirty);
    if (quit.setDirty(dirty, title).kind === 'close') win?.close();
    void refreshMenu();
  },
});

function createWindow(): void {
  win = new BrowserWindow(mainWindowOptions(preloadPath, !app.isPackaged));
  const id = win.webContents.id;
  allowedSenders.add(id);
  hardenWebContents(win.webContents);
  win.once('ready-to-show', () => win?.show());
  win.on('close', (event) => {
    const step = quit.onCloseRequested();
    if (step.kind === 'close') return;
    event.preventDefault();
    const answer = dialog.showMessageBoxSync(win!, {
      type: 'warning',
      buttons: CLOSE_PROMPT.buttons,
      defaultId: CLOSE_PROMPT.defaultId,
      cancelId: CLOSE_PROMPT.cancelId,
      message: CLOSE_PROMPT.message(quit.title),
      detail: CLOSE_PROMPT.detail,
    });
    const next = quit.onPromptAnswer(answer);
    if (next.kind === 'requestSave') send('menuCommand', 'save');
    if (next.kind === 'discardAndClose') {
      const forget = quit.lastAutosavePath;
      void (forget === undefined ? Promise.resolve() : projects.discardRecovery(forget)).finally(() => win?.close());
    }
  });
  win.on('closed', () => {
    allowedSenders.delete(id);
    win = null;
  });
  win.webContents.once('did-finish-load', () => pendingOpens.splice(0).forEach(requestOpen));
  void win.loadURL(appPageUrl());
}

if (!app.requestSingleInstanceLock()) {
  app.quit();
} else {
  app.on('second-instance', (_e, argv) => {
    const file = projectFileFromArgv(argv, app.isPackaged);
    if (file) requestOpen(file);
    if (win) {
      if (win.isMinimized()) win.restore();
      win.focus();
    }
  });
  app.on('open-file', (event, file) => {
    event.preventDefault();
    if (app.isReady()) requestOpen(file);
    else startFile = file;
  });
  app.on('web-contents-created', (_e, wc) => hardenWebContents(wc));
  app.on('window-all-closed', () => {
    void runner.dispose().finally(() => app.quit());
  });
  void app.whenReady().then(async () => {
    hardenSession(session.defaultSession);
    serveAppScheme(rendererDir);
    registerIpcHandlers(handlers, { allowedSenders, printJobs });
    await refreshMenu();
    createWindow();
    app.on('activate', () => {
      if (BrowserWindow.getAllWindows().length === 0) createWindow();
    });
  });
}
