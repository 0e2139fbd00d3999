/**
 * Who may talk to the loopback web host. Pure functions over header values.
 *
 * - Host must be our own `127.0.0.1:<port>` or `localhost:<port>` (defeats DNS rebinding).
 * - Origin, when sent, must be our own origin; `Sec-Fetch-Site: cross-site` is refused (403).
 * - API calls carry the per-run token (header X-Stayset-Token, or `?token=` for EventSource);
 *   missing or wrong → 401. Compared in constant time.
 */
import { timingSafeEqual } from 'node:crypto';

export interface GuardInput {
  host: string | undefined;
  origin: string | undefined;
  secFetchSite: string | undefined;
  /** Token presented by the request (header or query), if any. */
  token: string | undefined;
}

export type GuardVerdict = { ok: true } | { ok: false; status: 401 | 403; error: string };

export function allowedHosts(port: number): string[] {
  return [`127.0.0.1:${port}`, `localhost:${port}`];
}

export function allowedOrigins(port: number): string[] {
  return allowedHosts(port).map((h) => `http://${h}`);
}

export function tokensEqual(expected: string, given: string | undefined): boolean {
  if (given === undefined) return false;
  const a = Buffer.from(expected, 'utf8');
  const b = Buffer.from(given, 'utf8');
  return a.length === b.length && timingSafeEqual(a, b);
}

/** Checks for every request (static files included): Host, Origin, fetch site. */
export function checkOrigin(port: number, input: GuardInput): GuardVerdict {
  if (!input.host || !allowedHosts(port).includes(input.host.toLowerCase())) {
    return { ok: false, status: 403, error: `Host "${input.host ?? ''}" is not this Stayset web host` };
  }
  if (input.origin !== undefined && !allowedOrigins(port).includes(input.origin.toLowerCase())) {
    return { ok: false, status: 403, error: `Origin "${input.origin}" may not use this Stayset web host` };
  }
  if (input.secFetchSite === 'cross-site') return { ok: false, status: 403, error: 'Cross-site requests are refused' };
  return { ok: true };
}

/** Checks for API calls: origin checks plus the token. */
export function checkApiRequest(port: number, expectedToken: string, input: GuardInput): GuardVerdict {
  const origin = checkOrigin(port, input);
  if (!origin.ok) return origin;
  if (!tokensEqual(expectedToken, input.token)) {
    return { ok: false, status: 401, error: input.token ? 'Wrong access token' : 'Missing access token (X-Stayset-Token)' };
  }
  return { ok: true };
}
