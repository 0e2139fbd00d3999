/**
 * The loopback web host: serves the built renderer and the StaysetHost contract over HTTP
 * (protocol in main/common/web-protocol.ts) on 127.0.0.1 only.
 */
import { randomBytes } from 'node:crypto';
import { createReadStream } from 'node:fs';
import http, { type IncomingMessage, type ServerResponse } from 'node:http';
import type { AddressInfo } from 'node:net';
import { validateHostArgs, type HostHandlers } from '../common/host-validation.ts';
import {
  API_PREFIX, EVENTS_PATH, isHostMethodName, type HostMethodName, MAX_BODY_BYTES, STAYSET_CSP, TOKEN_HEADER, TOKEN_QUERY, type RpcReply,
} from '../common/web-protocol.ts';
import { AnalysisRunner, type AnalysisRunnerOptions } from '../analysis/analysis-runner.ts';
import { ProjectService } from '../store/project-service.ts';
import { EventHub } from './event-hub.ts';
import { PathPolicy } from './path-policy.ts';
import { checkApiRequest, checkOrigin, type GuardInput } from './request-guard.ts';
import { contentTypeFor, resolveStaticFile } from './static-files.ts';
import { createWebHostHandlers } from './web-host-service.ts';
import { SiteRunner } from '../analysis/site-runner.ts';
import { CASE_FIELDS_MIME, encodeCaseFields } from '../common/case-fields-wire.ts';
import type { CaseFields } from '../../solver/index.ts';

export interface WebHostOptions {
  /** Project root folder: the only place projects are opened from and saved to. */
  root: string;
  /** Built renderer (index.html inside). */
  staticDir: string;
  /** Bundled demo projects, opened read-only; null for none. */
  assetsDir: string | null;
  /** Folder for recent list and recovery files. */
  userDataDir: string;
  recoveryDir?: string;
  /** 0 = a free port chosen by the OS. */
  port?: number;
  /** Fixed token (tests); default 32 random bytes, hex. */
  token?: string;
  initialPath?: string | null;
  runner?: Partial<Pick<AnalysisRunnerOptions, 'workerUrl' | 'execArgv' | 'cancelGraceMs' | 'progressIntervalMs' | 'resourceLimits' | 'budget'>>;
}

export interface WebHost {
  port: number;
  token: string;
  /** Start URL for a browser: `http://127.0.0.1:PORT/#token=TOKEN`. */
  url: string;
  origin: string;
  close(): Promise<void>;
}

const SECURITY_HEADERS = {
  'Content-Security-Policy': STAYSET_CSP,
  'X-Content-Type-Options': 'nosniff',
  'Referrer-Policy': 'no-referrer',
  'Cross-Origin-Opener-Policy': 'same-origin',
  'Cross-Origin-Resource-Policy': 'same-origin',
};

function header(req: IncomingMessage, name: string): string | undefined {
  const v = req.headers[name];
  return Array.isArray(v) ? v[0] : v;
}

function sendJson(res: ServerResponse, status: number, body: RpcReply): void {
  const text = JSON.stringify(body);
  res.writeHead(status, { ...SECURITY_HEADERS, 'Content-Type': 'application/json; charset=utf-8', 'Cache-Control': 'no-store' });
  res.end(text);
}

/** Raw case fields go out binary (see main/common/case-fields-wire.ts), not as JSON. */
function sendCaseFields(res: ServerResponse, fields: CaseFields): void {
  const body = Buffer.from(encodeCaseFields(fields));
  res.writeHead(200, { ...SECURITY_HEADERS, 'Content-Type': CASE_FIELDS_MIME, 'Content-Length': body.length, 'Cache-Control': 'no-store' });
  res.end(body);
}

/**
 * validateHostArgs, with a body nested too deeply for the validator's recursion (JSON.parse
 * itself is iterative; the checks are not) answered as a bad request (400), not a host failure.
 */
function checkArgsOrDepth(method: HostMethodName, args: unknown): ReturnType<typeof validateHostArgs> {
  try {
    return validateHostArgs(method, args);
  } catch (e) {
    if (e instanceof RangeError) return { ok: false, error: `${method}: the request is nested too deeply to be a project` };
    throw e;
  }
}

async function readBody(req: IncomingMessage): Promise<string | null> {
  const chunks: Buffer[] = [];
  let size = 0;
  for await (const chunk of req) {
    size += (chunk as Buffer).length;
    if (size > MAX_BODY_BYTES) return null;
    chunks.push(chunk as Buffer);
  }
  return Buffer.concat(chunks).toString('utf8');
}

export async function startWebHost(options: WebHostOptions): Promise<WebHost> {
  const token = options.token ?? randomBytes(32).toString('hex');
  const hub = new EventHub();
  const runner = new AnalysisRunner({
    ...options.runner,
    onProgress: (p) => hub.broadcast('progress', p),
    onDone: (d) => hub.broadcast('analysisDone', d),
  });
  const site = new SiteRunner({ workerUrl: options.runner?.workerUrl, execArgv: options.runner?.execArgv, resourceLimits: options.runner?.resourceLimits, budget: options.runner?.budget });
  const projects = new ProjectService({ userDataDir: options.userDataDir, recoveryDir: options.recoveryDir });
  const paths = await PathPolicy.create(options.root, options.assetsDir);
  const handlers: HostHandlers = createWebHostHandlers({ projects, runner, site, paths, initialPath: options.initialPath ?? null });
  let port = 0;

  const guardInput = (req: IncomingMessage, url: URL): GuardInput => ({
    host: header(req, 'host'),
    origin: header(req, 'origin'),
    secFetchSite: header(req, 'sec-fetch-site'),
    // The query form is for EventSource only (it cannot send headers); calls use the header.
    token: header(req, TOKEN_HEADER) ?? (url.pathname === EVENTS_PATH ? url.searchParams.get(TOKEN_QUERY) ?? undefined : undefined),
  });

  async function handleApi(req: IncomingMessage, res: ServerResponse, url: URL): Promise<void> {
    const verdict = checkApiRequest(port, token, guardInput(req, url));
    if (!verdict.ok) return sendJson(res, verdict.status, { ok: false, error: verdict.error });
    if (url.pathname === EVENTS_PATH) {
      if (req.method !== 'GET') return sendJson(res, 405, { ok: false, error: 'Use GET for /api/events' });
      return hub.add(res, STAYSET_CSP);
    }
    const method = url.pathname.slice(API_PREFIX.length);
    if (!isHostMethodName(method)) return sendJson(res, 404, { ok: false, error: `Unknown method "${method}"` });
    if (req.method !== 'POST') return sendJson(res, 405, { ok: false, error: `Use POST for ${url.pathname}` });
    const text = await readBody(req);
    if (text === null) return sendJson(res, 413, { ok: false, error: `Request body larger than ${MAX_BODY_BYTES} bytes` });
    let body: unknown;
    try {
      body = text === '' ? { args: [] } : JSON.parse(text);
    } catch {
      return sendJson(res, 400, { ok: false, error: `${method}: request body is not valid JSON` });
    }
    const args = (body as { args?: unknown } | null)?.args ?? [];
    const checked = checkArgsOrDepth(method, args);
    if (!checked.ok) return sendJson(res, 400, { ok: false, error: checked.error });
    const handler = handlers[method] as (...a: unknown[]) => Promise<unknown>;
    const value = await handler(...(checked.value as unknown[]));
    if (method === 'caseFields' && value) return sendCaseFields(res, value as CaseFields);
    sendJson(res, 200, { ok: true, value: value ?? null });
  }

  async function handleStatic(req: IncomingMessage, res: ServerResponse, url: URL): Promise<void> {
    if (req.method !== 'GET' && req.method !== 'HEAD') {
      res.writeHead(405, SECURITY_HEADERS).end();
      return;
    }
    const file = await resolveStaticFile(options.staticDir, url.pathname);
    if (!file && url.pathname === '/favicon.ico') {
      res.writeHead(204, SECURITY_HEADERS).end(); // browsers ask for it; the app has none
      return;
    }
    if (!file) {
      res.writeHead(404, { ...SECURITY_HEADERS, 'Content-Type': 'text/plain; charset=utf-8' });
      res.end(url.pathname === '/' ? 'The renderer is not built: run `npm run build:renderer` first.\n' : 'Not found\n');
      return;
    }
    res.writeHead(200, { ...SECURITY_HEADERS, 'Content-Type': contentTypeFor(file), 'Cache-Control': 'no-cache' });
    if (req.method === 'HEAD') return void res.end();
    createReadStream(file).on('error', () => res.destroy()).pipe(res);
  }

  const server = http.createServer((req, res) => {
    const url = new URL(req.url ?? '/', 'http://127.0.0.1');
    const origin = checkOrigin(port, guardInput(req, url));
    const route = url.pathname.startsWith(API_PREFIX) ? handleApi : handleStatic;
    const work = origin.ok ? route(req, res, url) : Promise.resolve(sendJson(res, origin.status, { ok: false, error: origin.error }));
    work.catch((e: unknown) => {
      if (!res.headersSent) sendJson(res, 500, { ok: false, error: `Host failure: ${e instanceof Error ? e.message : String(e)}` });
      else res.end();
    });
  });

  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(options.port ?? 0, '127.0.0.1', () => resolve());
  });
  port = (server.address() as AddressInfo).port;
  const origin = `http://127.0.0.1:${port}`;

  return {
    port,
    token,
    origin,
    url: `${origin}/#token=${token}`,
    async close() {
      hub.close();
      await runner.dispose();
      await site.dispose();
      server.closeAllConnections();
      await new Promise<void>((resolve) => server.close(() => resolve()));
    },
  };
}
