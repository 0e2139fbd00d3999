/**
 * The StaysetHost contract over HTTP, defined once for the web host (main/web/) and its client
 * (main/common/web-host-client.ts).
 *
 * - Call:   `POST /api/<method>` with header `X-Stayset-Token: <token>` and JSON body
 *           `{ "args": [...] }` (the method's arguments in order).
 *           Reply `{ "ok": true, "value": <return value> }` (status 200) or
 *           `{ "ok": false, "error": "<message>" }` (400 bad arguments, 401 token, 403 origin/host,
 *           404 unknown method, 413 body too large, 500 host failure).
 *           Methods that return a HostResult themselves nest it: `{ ok: true, value: { ok: false, error } }`
 *           is a refused save, not a transport failure.
 * - Events: `GET /api/events?token=<token>` (EventSource cannot send headers) as Server-Sent
 *           Events; each event has a name from `WebEventName` and JSON data.
 * - Everything else is a static file of the built renderer (`dist/renderer/`).
 *
 * The same Content-Security-Policy is sent by both hosts (`STAYSET_CSP`).
 */
import { MAX_PROJECT_FILE_BYTES, REQUEST_MARGIN_BYTES } from './limits/file-limits.ts';
import type { StaysetHost } from './host-contract.ts';

/** Methods of StaysetHost callable over RPC (everything that is not an onDidX subscription). */
export type HostMethodName = {
  [K in keyof StaysetHost]: K extends `onDid${string}` ? never : K;
}[keyof StaysetHost];

/** Every RPC method, in contract order. Used for routing and for the preload's method list. */
export const HOST_METHODS = [
  'kind',
  'openInitial',
  'open',
  'save',
  'saveAs',
  'recentProjects',
  'listRecovery',
  'recover',
  'autosave',
  'discardRecovery',
  'runAnalysis',
  'cancelAnalysis',
  'caseFields',
  'printSchedule',
  'setDirty',
  'printReady',
  'runSite',
  'cancelSite',
  'printSiteDocument',
] as const satisfies readonly HostMethodName[];

// Compile-time check that HOST_METHODS lists every method (fails to type-check if one is missing).
type MissingMethods = Exclude<HostMethodName, (typeof HOST_METHODS)[number]>;
const _allMethodsListed: MissingMethods extends never ? true : never = true;
void _allMethodsListed;

export function isHostMethodName(name: string): name is HostMethodName {
  return (HOST_METHODS as readonly string[]).includes(name);
}

/** Host events, by the subscription that receives them. */
export const WEB_EVENTS = {
  progress: 'onDidProgress',
  analysisDone: 'onDidFinishAnalysis',
  menuCommand: 'onDidMenuCommand',
  requestOpen: 'onDidRequestOpen',
} as const;
export type WebEventName = keyof typeof WEB_EVENTS;

export const API_PREFIX = '/api/';
export const EVENTS_PATH = '/api/events';
export const TOKEN_HEADER = 'x-stayset-token';
export const TOKEN_QUERY = 'token';
/** Largest accepted request body, bytes: one project of the shared file limit plus a margin. */
export const MAX_BODY_BYTES = MAX_PROJECT_FILE_BYTES + REQUEST_MARGIN_BYTES;

export interface RpcRequestBody {
  args: unknown[];
}

export type RpcReply = { ok: true; value: unknown } | { ok: false; error: string };

export function methodPath(method: HostMethodName): string {
  return `${API_PREFIX}${method}`;
}

/**
 * Content-Security-Policy of our pages (desktop and web).
 * style-src allows 'unsafe-inline' because Vue sets `style` attributes for bound styles
 * (`:style`) and the dev build injects <style> elements; scripts stay 'self' only, which is what
 * protects against injected code. Everything else is same-origin or blocked.
 */
export const STAYSET_CSP = [
  "default-src 'self'",
  "script-src 'self'",
  "style-src 'self' 'unsafe-inline'",
  "img-src 'self' data: blob:",
  "font-src 'self' data:",
  "connect-src 'self'",
  "worker-src 'self' blob:",
  "object-src 'none'",
  "base-uri 'none'",
  "form-action 'none'",
  "frame-ancestors 'none'",
].join('; ');
