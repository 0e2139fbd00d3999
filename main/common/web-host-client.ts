/**
 * StaysetHost over HTTP + Server-Sent Events, for the browser edition (protocol in
 * web-protocol.ts). The renderer wraps it in renderer/host/client.ts:
 *
 *   const token = readTokenFromHash(location.hash);
 *   const host = createWebHostClient({ token });
 *
 * A transport failure (network, 4xx/5xx from the host) rejects the promise with an Error whose
 * message is the host's message; a refused operation (e.g. save over a corrupt file) resolves
 * with `{ ok: false, error }` as the contract says.
 *
 * The event stream is opened on the first onDidX subscription and closed when the last one
 * unsubscribes. `fetch` and `EventSource` can be injected (tests in Node).
 */
import type { AnalysisDone, AnalysisProgress, MenuCommand, StaysetHost } from './host-contract.ts';
import { EVENTS_PATH, methodPath, TOKEN_HEADER, TOKEN_QUERY, type HostMethodName, type RpcReply, type WebEventName } from './web-protocol.ts';
import { CASE_FIELDS_MIME, decodeCaseFields } from './case-fields-wire.ts';

/** The subset of EventSource this client uses. */
export interface EventSourceLike {
  addEventListener(type: string, listener: (e: MessageEvent) => void): void;
  close(): void;
}

export interface WebHostClientOptions {
  token: string;
  /** Origin of the host, default '' (same origin as the page). */
  baseUrl?: string;
  fetch?: typeof fetch;
  createEventSource?: (url: string) => EventSourceLike;
}

/** The token from a start URL's hash `#token=...` (other hash parameters are ignored). */
export function readTokenFromHash(hash: string): string | null {
  const params = new URLSearchParams(hash.replace(/^#/, ''));
  const token = params.get('token');
  return token && /^[0-9a-f]{16,128}$/i.test(token) ? token : null;
}

type Listener = (data: unknown) => void;

export function createWebHostClient(options: WebHostClientOptions): StaysetHost {
  const base = options.baseUrl ?? '';
  const doFetch = options.fetch ?? ((...a: Parameters<typeof fetch>) => fetch(...a));
  const makeSource = options.createEventSource ?? ((url: string) => new EventSource(url));
  const listeners = new Map<WebEventName, Set<Listener>>();
  let source: EventSourceLike | null = null;

  async function call<T>(method: HostMethodName, ...args: unknown[]): Promise<T> {
    while (args.length > 0 && args[args.length - 1] === undefined) args.pop();
    const res = await doFetch(base + methodPath(method), {
      method: 'POST',
      headers: { 'Content-Type': 'application/json', [TOKEN_HEADER]: options.token },
      body: JSON.stringify({ args }),
    });
    if (res.ok && (res.headers.get('content-type') ?? '').startsWith(CASE_FIELDS_MIME)) {
      return decodeCaseFields(await res.arrayBuffer()) as T;
    }
    let reply: RpcReply;
    try {
      reply = (await res.json()) as RpcReply;
    } catch {
      throw new Error(`${method}: the web host answered ${res.status} without a readable reply`);
    }
    if (!reply.ok) throw new Error(reply.error);
    return reply.value as T;
  }

  function openSource(): void {
    if (source) return;
    const url = `${base}${EVENTS_PATH}?${TOKEN_QUERY}=${encodeURIComponent(options.token)}`;
    const s = makeSource(url);
    for (const name of ['progress', 'analysisDone', 'menuCommand', 'requestOpen'] as const) {
      s.addEventListener(name, (e) => {
        let data: unknown;
        try {
          data = JSON.parse(e.data as string);
        } catch {
          return;
        }
        for (const l of listeners.get(name) ?? []) l(data);
      });
    }
    source = s;
  }

  function subscribe<T>(name: WebEventName, listener: (data: T) => void): () => void {
    let set = listeners.get(name);
    if (!set) listeners.set(name, (set = new Set()));
    const l = listener as Listener;
    set.add(l);
    openSource();
    return () => {
      set.delete(l);
      const total = [...listeners.values()].reduce((n, s) => n + s.size, 0);
      if (total === 0 && source) {
        source.close();
        source = null;
      }
    };
  }

  const host: StaysetHost = {
    kind: () => call('kind'),
    openInitial: () => call('openInitial'),
    open: (path) => call('open', path),
    save: (path, project) => call('save', path, project),
    saveAs: (project, path) => call('saveAs', project, path),
    recentProjects: () => call('recentProjects'),
    listRecovery: () => call('listRecovery'),
    recover: (id) => call('recover', id),
    autosave: (path, project) => call('autosave', path, project),
    discardRecovery: (path) => call('discardRecovery', path),
    runAnalysis: (project) => call('runAnalysis', project),
    cancelAnalysis: (runId) => call('cancelAnalysis', runId),
    caseFields: (runId, caseIndex) => call('caseFields', runId, caseIndex),
    printSchedule: (project, path) => call('printSchedule', project, path),
    setDirty: (dirty, title) => call('setDirty', dirty, title),
    printReady: () => call('printReady'),
    runSite: (project, request) => call('runSite', project, request),
    cancelSite: () => call('cancelSite'),
    printSiteDocument: (project, request, path) => call('printSiteDocument', project, request, path),
    onDidProgress: (l: (p: AnalysisProgress) => void) => subscribe('progress', l),
    onDidFinishAnalysis: (l: (d: AnalysisDone) => void) => subscribe('analysisDone', l),
    onDidMenuCommand: (l: (c: MenuCommand) => void) => subscribe('menuCommand', l),
    onDidRequestOpen: (l: (path: string) => void) => subscribe('requestOpen', l),
  };
  return host;
}
