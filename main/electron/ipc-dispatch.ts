/**
 * One IPC call, from raw event data to reply envelope (no Electron runtime): caller check,
 * argument validation, print-window routing, handler, errors as `{ ok: false, error }`.
 */
import { validateHostArgs, type HostHandlers } from '../common/host-validation.ts';
import type { HostMethodName, RpcReply } from '../common/web-protocol.ts';
import { checkIpcCaller, type IpcCaller } from './ipc-guard.ts';
import type { PrintJobs } from './print-jobs.ts';

export interface IpcContext {
  allowedSenders: Set<number>;
  printJobs: PrintJobs;
}

export async function dispatchIpcCall(
  handlers: HostHandlers, ctx: IpcContext, method: HostMethodName, caller: IpcCaller, args: unknown[],
): Promise<RpcReply> {
  const verdict = checkIpcCaller(caller, ctx.allowedSenders);
  if (!verdict.ok) return { ok: false, error: verdict.error };
  const checked = validateHostArgs(method, args);
  if (!checked.ok) return { ok: false, error: checked.error };
  const senderId = caller.senderId;
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
