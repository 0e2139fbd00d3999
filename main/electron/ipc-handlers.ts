/**
 * Serves StaysetHost over IPC: one ipcMain.handle per method. Every call is checked (sender is
 * one of our windows, main frame, our own page) and its arguments validated before the handler
 * runs. Replies are envelopes `{ ok: true, value } | { ok: false, error }` unwrapped by the preload.
 */
import { ipcMain, type IpcMainInvokeEvent } from 'electron';
import { validateHostArgs, type HostHandlers } from '../common/host-validation.ts';
import { HOST_METHODS, type HostMethodName, type RpcReply } from '../common/web-protocol.ts';
import { methodChannel } from './ipc-channels.ts';
import { checkIpcCaller } from './ipc-guard.ts';
import type { PrintJobs } from './print-jobs.ts';

export interface IpcContext {
  allowedSenders: Set<number>;
  printJobs: PrintJobs;
}

async function dispatch(handlers: HostHandlers, ctx: IpcContext, method: HostMethodName, event: IpcMainInvokeEvent, args: unknown[]): Promise<RpcReply> {
  const frame = event.senderFrame;
  const verdict = checkIpcCaller(
    { senderId: event.sender.id, isMainFrame: frame !== null && frame === event.sender.mainFrame, frameUrl: frame?.url },
    ctx.allowedSenders,
  );
  if (!verdict.ok) return { ok: false, error: verdict.error };
  const checked = validateHostArgs(method, args);
  if (!checked.ok) return { ok: false, error: checked.error };
  const senderId = event.sender.id;
  if (ctx.printJobs.has(senderId)) {
    if (method === 'openInitial') {
      const opened = ctx.printJobs.projectFor(senderId);
      return { ok: true, value: opened ? { ok: true, value: opened } : null };
    }
    if (method === 'printReady') {
      ctx.printJobs.markReady(senderId);
      return { ok: true, value: null };
    }
  }
  try {
    const handler = handlers[method] as (...a: unknown[]) => Promise<unknown>;
    const value = await handler(...(checked.value as unknown[]));
    return { ok: true, value: value ?? null };
  } catch (e) {
    return { ok: false, error: `${method} failed: ${e instanceof Error ? e.message : String(e)}` };
  }
}

export function registerIpcHandlers(handlers: HostHandlers, ctx: IpcContext): void {
  for (const method of HOST_METHODS) {
    ipcMain.handle(methodChannel(method), (event, ...args: unknown[]) => dispatch(handlers, ctx, method, event, args));
  }
}
