/**
 * The renderer's only way to its host. Desktop: the preload's frozen `window.stayset`. Browser
 * edition: the loopback web host over HTTP, with the session token from `location.hash`.
 */
import type { StaysetHost } from '../../main/common/host-contract.ts';
import { createWebHostClient, readTokenFromHash } from '../../main/common/web-host-client.ts';

declare global {
  interface Window {
    stayset?: StaysetHost;
  }
}

let host: StaysetHost | null = null;

export function getHost(): StaysetHost {
  if (host) return host;
  if (window.stayset) {
    host = window.stayset;
  } else {
    const token = readTokenFromHash(window.location.hash);
    if (!token) throw new Error('No host: this page must be opened by the Stayset desktop app or the Stayset web host (the address needs #token=…).');
    host = createWebHostClient({ token });
  }
  return host;
}

/** For tests: use a given host (a fake) instead of discovering one. */
export function setHost(h: StaysetHost | null): void {
  host = h;
}
