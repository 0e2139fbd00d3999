/**
 * A recording stand-in for the `electron` module, bundled in place of it by main-wiring.test.ts
 * so the real main.ts runs in Node (the Electron binary is not available to tests). It records
 * calls and lets the test drive windows, IPC and dialogs. Only the API main.ts uses is present.
 */
type Fn = (...a: any[]) => any; // eslint-disable-line @typescript-eslint/no-explicit-any

class Emitter {
  listeners = new Map<string, Fn[]>();
  on(ev: string, fn: Fn): this {
    this.listeners.set(ev, [...(this.listeners.get(ev) ?? []), fn]);
    return this;
  }
  once(ev: string, fn: Fn): this {
    const wrap: Fn = (...a) => {
      this.listeners.set(ev, (this.listeners.get(ev) ?? []).filter((f) => f !== wrap));
      fn(...a);
    };
    return this.on(ev, wrap);
  }
  emit(ev: string, ...a: unknown[]): void {
    for (const fn of this.listeners.get(ev) ?? []) fn(...a);
  }
}

let nextId = 1;
export const record = {
  log: [] as unknown[][],
  sent: [] as { channel: string; data: unknown }[],
  ipc: new Map<string, Fn>(),
  protocolHandlers: new Map<string, Fn>(),
  windows: [] as BrowserWindow[],
  menu: null as unknown,
  messageBoxAnswer: 2,
  saveDialogPath: null as string | null,
  session: {} as Record<string, Fn>,
  readyResolved: false,
};

class WebContents extends Emitter {
  id = nextId++;
  mainFrame = { url: '' };
  windowOpenHandler: Fn | null = null;
  setWindowOpenHandler(fn: Fn): void {
    this.windowOpenHandler = fn;
  }
  send(channel: string, data: unknown): void {
    record.sent.push({ channel, data });
  }
}

export class BrowserWindow extends Emitter {
  webContents = new WebContents();
  title = '';
  destroyed = false;
  constructor(public options: Record<string, unknown>) {
    super();
    record.windows.push(this);
    record.log.push(['BrowserWindow', options]);
  }
  static getAllWindows(): BrowserWindow[] {
    return record.windows.filter((w) => !w.destroyed);
  }
  async loadURL(url: string): Promise<void> {
    this.webContents.mainFrame.url = url;
    this.webContents.emit('did-finish-load');
    this.emit('ready-to-show');
  }
  show(): void {}
  focus(): void {}
  restore(): void {}
  isMinimized(): boolean { return false; }
  isDestroyed(): boolean { return this.destroyed; }
  setTitle(t: string): void { this.title = t; }
  setDocumentEdited(): void {}
  destroy(): void { this.destroyed = true; }
  /** Emits 'close'; returns whether the close went ahead. */
  close(): boolean {
    let prevented = false;
    this.emit('close', { preventDefault: () => (prevented = true) });
    if (!prevented) {
      this.destroyed = true;
      this.emit('closed');
    }
    return !prevented;
  }
}

const appEvents = new Emitter();
export const app = {
  getAppPath: () => process.env.STAYSET_FAKE_APP_PATH ?? '',
  setName: (n: string) => record.log.push(['setName', n]),
  setPath: (n: string, p: string) => record.log.push(['setPath', n, p]),
  getPath: (n: string) => (n === 'userData' ? process.env.STAYSET_FAKE_USER_DATA ?? '' : ''),
  isPackaged: false,
  requestSingleInstanceLock: () => true,
  on: (ev: string, fn: Fn) => appEvents.on(ev, fn),
  emit: (ev: string, ...a: unknown[]) => appEvents.emit(ev, ...a),
  whenReady: () => {
    record.log.push(['whenReady']);
    record.readyResolved = true;
    return Promise.resolve();
  },
  isReady: () => record.readyResolved,
  quit: () => record.log.push(['quit']),
};

export const protocol = {
  registerSchemesAsPrivileged: (s: unknown) => record.log.push(['registerSchemesAsPrivileged', s, { ready: record.readyResolved }]),
  handle: (scheme: string, fn: Fn) => record.protocolHandlers.set(scheme, fn),
};

export const session = {
  defaultSession: {
    setPermissionRequestHandler: (fn: Fn) => (record.session.permissionRequest = fn),
    setPermissionCheckHandler: (fn: Fn) => (record.session.permissionCheck = fn),
    webRequest: {
      onBeforeRequest: (fn: Fn) => (record.session.beforeRequest = fn),
      onHeadersReceived: (fn: Fn) => (record.session.headersReceived = fn),
    },
  },
};

export const ipcMain = { handle: (channel: string, fn: Fn) => record.ipc.set(channel, fn) };

export const Menu = {
  buildFromTemplate: (t: unknown) => t,
  setApplicationMenu: (m: unknown) => (record.menu = m),
};

export const dialog = {
  showMessageBoxSync: (_w: unknown, o: unknown) => {
    record.log.push(['messageBox', o]);
    return record.messageBoxAnswer;
  },
  showOpenDialog: async () => ({ canceled: true, filePaths: [] }),
  showSaveDialog: async () => (record.saveDialogPath ? { canceled: false, filePath: record.saveDialogPath } : { canceled: true }),
};

export default { app, BrowserWindow, dialog, ipcMain, Menu, protocol, session };

(globalThis as Record<string, unknown>).__staysetFakeElectron = { record, app };
