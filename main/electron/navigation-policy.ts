/**
 * What the window may navigate to or open. The app is one page; in-page hash changes do not
 * trigger will-navigate, so every real navigation except a reload of our own page is refused,
 * and no new windows are ever opened (links to the web are not followed).
 */
import { isAppUrl } from './app-url.ts';

export type NavigationDecision = 'allow' | 'deny';

export function decideNavigation(targetUrl: string): NavigationDecision {
  return isAppUrl(targetUrl) ? 'allow' : 'deny';
}

/** Answer for setWindowOpenHandler: always deny (the app needs no popups). */
export function decideWindowOpen(_targetUrl: string): { action: 'deny' } {
  return { action: 'deny' };
}

/** Answer for setPermissionRequestHandler / setPermissionCheckHandler: no permission is granted. */
export function decidePermission(_permission: string): boolean {
  return false;
}

/**
 * Requests a page of ours may make (session.webRequest filter): our own scheme, data: and blob:
 * URLs it made itself, and the developer tools. Everything else, notably http(s), is cancelled:
 * the desktop app loads no remote content.
 */
export function isAllowedRequest(url: string): boolean {
  if (isAppUrl(url)) return true;
  return /^(data|blob|devtools|chrome-extension):/i.test(url);
}
