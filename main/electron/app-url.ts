/**
 * The desktop app's own pages are served from the privileged scheme `stayset://app/…`
 * (registered as standard + secure, so 'self' in the CSP means exactly these pages).
 * Files come from the built renderer folder (dist/renderer).
 */
export const APP_SCHEME = 'stayset';
export const APP_HOST = 'app';
export const APP_ORIGIN = `${APP_SCHEME}://${APP_HOST}`;

/** URL of the main page; `hash` without the leading '#' (e.g. '/schedule?print=1'). */
export function appPageUrl(hash?: string): string {
  return `${APP_ORIGIN}/index.html${hash ? `#${hash}` : ''}`;
}

/** True only for our own origin (scheme, host, no credentials, no port). */
export function isAppUrl(url: string): boolean {
  let u: URL;
  try {
    u = new URL(url);
  } catch {
    return false;
  }
  return u.protocol === `${APP_SCHEME}:` && u.host === APP_HOST && u.username === '' && u.password === '';
}
