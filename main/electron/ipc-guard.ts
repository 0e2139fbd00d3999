/**
 * Who may call the host over IPC: only our own windows (by webContents id), only from the main
 * frame, and only while that frame shows our own page.
 */
import { isAppUrl } from './app-url.ts';

export interface IpcCaller {
  senderId: number;
  /** Whether the sending frame is the top frame of its webContents. */
  isMainFrame: boolean;
  /** URL of the sending frame, if known. */
  frameUrl: string | undefined;
}

export type IpcVerdict = { ok: true } | { ok: false; error: string };

export function checkIpcCaller(caller: IpcCaller, allowedSenders: ReadonlySet<number>): IpcVerdict {
  if (!allowedSenders.has(caller.senderId)) return { ok: false, error: `IPC from an unknown window (${caller.senderId}) refused` };
  if (!caller.isMainFrame) return { ok: false, error: 'IPC from a sub-frame refused' };
  if (!caller.frameUrl || !isAppUrl(caller.frameUrl)) return { ok: false, error: `IPC from a page that is not Stayset's own (${caller.frameUrl ?? 'unknown'}) refused` };
  return { ok: true };
}
