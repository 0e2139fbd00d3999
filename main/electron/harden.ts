/**
 * Electron wiring of the security rules in navigation-policy.ts: session-wide permission and
 * request filters, CSP on every response, and per-window navigation / popup / webview blocks.
 */
import type { Session, WebContents } from 'electron';
import { STAYSET_CSP } from '../common/web-protocol.ts';
import { isAppUrl } from './app-url.ts';
import { decideNavigation, decidePermission, decideWindowOpen, isAllowedRequest } from './navigation-policy.ts';

export function hardenSession(session: Session): void {
  session.setPermissionRequestHandler((_wc, permission, callback) => callback(decidePermission(permission)));
  session.setPermissionCheckHandler((_wc, permission) => decidePermission(permission));
  session.webRequest.onBeforeRequest((details, callback) => callback({ cancel: !isAllowedRequest(details.url) }));
  // Our pages get the CSP (the app scheme also sets it); other pages (developer tools) keep theirs.
  session.webRequest.onHeadersReceived((details, callback) => {
    if (!isAppUrl(details.url)) return callback({});
    callback({ responseHeaders: { ...details.responseHeaders, 'Content-Security-Policy': [STAYSET_CSP] } });
  });
}

export function hardenWebContents(wc: WebContents): void {
  wc.on('will-navigate', (event, url) => {
    if (decideNavigation(url) === 'deny') event.preventDefault();
  });
  wc.on('will-redirect', (event, url) => {
    if (decideNavigation(url) === 'deny') event.preventDefault();
  });
  wc.on('will-attach-webview', (event) => event.preventDefault());
  wc.setWindowOpenHandler(({ url }) => decideWindowOpen(url));
}
