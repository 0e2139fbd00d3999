/**
 * Serves StaysetHost over IPC: one ipcMain.handle per method, each call going through
 * dispatchIpcCall (sender check, argument validation). Replies are envelopes
 * `{ ok: true, value } | { ok: false, error }` unwrapped by the preload.
 */
import { ipcMain } from 'electron';
import type { HostHandlers } from '../common/host-validation.ts';
import { HOST_METHODS } from '../common/web-protocol.ts';
import { methodChannel } from './ipc-channels.ts';
import { dispatchIpcCall, type IpcContext } from './ipc-dispatch.ts';

export function registerIpcHandlers(handlers: HostHandlers, ctx: IpcContext): void {
  for (const method of HOST_METHODS) {
    ipcMain.handle(methodChannel(method), (event, ...args: unknown[]) => {
      const frame = event.senderFrame;
      const caller = { senderId: event.sender.id, isMainFrame: frame !== null && frame === event.sender.mainFrame, frameUrl: frame?.url };
      return dispatchIpcCall(handlers, ctx, method, caller, args);
    });
  }
}
