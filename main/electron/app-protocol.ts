/**
 * The `stayset://app/` scheme that serves the built renderer to our windows, with the CSP and
 * nosniff headers on every response. Paths are confined to the renderer folder
 * (main/web/static-files.ts, the same mapping as the web host).
 */
import { promises as fs } from 'node:fs';
import { protocol } from 'electron';
import { STAYSET_CSP } from '../common/web-protocol.ts';
import { contentTypeFor, resolveStaticFile } from '../web/static-files.ts';
import { APP_HOST, APP_SCHEME } from './app-url.ts';

/** Must run before the app is ready. */
export function registerAppScheme(): void {
  protocol.registerSchemesAsPrivileged([
    { scheme: APP_SCHEME, privileges: { standard: true, secure: true, supportFetchAPI: true, codeCache: true } },
  ]);
}

export function serveAppScheme(rendererDir: string): void {
  protocol.handle(APP_SCHEME, async (request) => {
    const url = new URL(request.url);
    const headers = { 'Content-Security-Policy': STAYSET_CSP, 'X-Content-Type-Options': 'nosniff' };
    const file = url.host === APP_HOST ? await resolveStaticFile(rendererDir, url.pathname) : null;
    if (!file) return new Response('Not found', { status: 404, headers: { ...headers, 'Content-Type': 'text/plain' } });
    const body = new Uint8Array(await fs.readFile(file));
    return new Response(body, { status: 200, headers: { ...headers, 'Content-Type': contentTypeFor(file) } });
  });
}
