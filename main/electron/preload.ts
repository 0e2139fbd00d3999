/**
 * Preload of every Stayset window (sandboxed; bundled to one CommonJS file). Exposes exactly one
 * frozen object, `window.stayset`, implementing StaysetHost with domain methods only; the page
 * never sees ipcRenderer, channels or Electron objects.
 */
import { contextBridge, ipcRenderer, type IpcRendererEvent } from 'electron';
import type { StaysetHost } from '../common/host-contract.ts';
import type { HostMethodName, RpcReply, WebEventName } from '../common/web-protocol.ts';
import { eventChannel, methodChannel } from './ipc-channels.ts';

async function invoke<T>(method: HostMethodName, ...args: unknown[]): Promise<T> {
  const reply = (await ipcRenderer.invoke(methodChannel(method), ...args)) as RpcReply;
  if (!reply.ok) throw new Error(reply.error);
  return reply.value as T;
}

function subscribe<T>(event: WebEventName, listener: (data: T) => void): () => void {
  const channel = eventChannel(event);
  const handler = (_e: IpcRendererEvent, data: T): void => listener(data);
  ipcRenderer.on(channel, handler);
  return () => {
    ipcRenderer.removeListener(channel, handler);
  };
}

const host: StaysetHost = {
  kind: () => invoke('kind'),
  openInitial: () => invoke('openInitial'),
  open: (path) => invoke('open', path),
  save: (path, project) => invoke('save', path, project),
  saveAs: (project, path) => invoke('saveAs', project, path),
  recentProjects: () => invoke('recentProjects'),
  listRecovery: () => invoke('listRecovery'),
  recover: (id) => invoke('recover', id),
  autosave: (path, project) => invoke('autosave', path, project),
  discardRecovery: (path) => invoke('discardRecovery', path),
  runAnalysis: (project) => invoke('runAnalysis', project),
  cancelAnalysis: (runId) => invoke('cancelAnalysis', runId),
  caseFields: (runId, caseIndex) => invoke('caseFields', runId, caseIndex),
  printSchedule: (project, path) => invoke('printSchedule', project, path),
  setDirty: (dirty, title) => invoke('setDirty', dirty, title),
  printReady: () => invoke('printReady'),
  runSite: (project, request) => invoke('runSite', project, request),
  cancelSite: () => invoke('cancelSite'),
  printSiteDocument: (project, request, path) => invoke('printSiteDocument', project, request, path),
  onDidProgress: (l) => subscribe('progress', l),
  onDidFinishAnalysis: (l) => subscribe('analysisDone', l),
  onDidMenuCommand: (l) => subscribe('menuCommand', l),
  onDidRequestOpen: (l) => subscribe('requestOpen', l),
};

contextBridge.exposeInMainWorld('stayset', Object.freeze(host));
