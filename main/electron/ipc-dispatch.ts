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

/**
 * A hidden print window runs the same renderer but must not act on the user's project: it gets
 * its print project from openInitial, may report printReady, gets neutral answers for the
 * start-up calls (kind, recent, recovery, dirty flag, autosave) and is refused everything else.
 */
function printWindowReply(jobs: PrintJobs, senderId: number, method: HostMethodName): RpcReply {
  switch (method) {
    case 'openInitial': {
      const opened = jobs.projectFor(senderId);
      return { ok: true, value: opened ? { ok: true, value: opened } : null };
    }
    case 'printReady':
      jobs.markReady(senderId);
      return { ok: true, value: null };
    case 'kind':
      return { ok: true, value: 'desktop' };
    case 'recentProjects':
    case 'listRecovery':
      return { ok: true, value: [] };
    case 'setDirty':
    case 'autosave':
    case 'discardRecovery':
      return { ok: true, value: null };
    default:
      return { ok: false, error: `${method} is not available in the print window` };
  }
}

export async function dispatchIpcCall(
  handlers: HostHandlers, ctx: IpcContext, method: HostMethodName, caller: IpcCaller, args: unknown[],
): Promise<RpcReply> {
  const verdict = checkIpcCaller(caller, ctx.allowedSenders);
  if (!verdict.ok) return { ok: false, error: verdict.error };
  const checked = validateHostArgs(method, args);
  if (!checked.ok) return { ok: false, error: checked.error };
  const senderId = caller.senderId;
  if (ctx.printJobs.has(senderId)) return printWindowReply(ctx.printJobs, senderId, method);
  try {
    const handler = handlers[method] as (...a: unknown[]) => Promise<unknown>;
    const value = await handler(...(checked.value as unknown[]));
    return { ok: true, value: value ?? null };
  } catch (e) {
    return { ok: false, error: `${method} failed: ${e instanceof Error ? e.message : String(e)}` };
  }
}
