/**
 * The window's walls: the page may only be our own built files, may not
 * navigate away, open windows, reach the network or ask for permissions.
 */
// @ts-nocheck

import type { Session, WebContents } from 'electron';

/** Our own scheme (loftpoint://app/): a URL origin that Node leaves "null", so compared by scheme and host. */
const ownScheme = (url: URL) => url.protocol !== 'file:' && url.protocol !== 'http:' && url.protocol !== 'https:';

/** Pages the window may show: the built page itself (loftpoint://app/, or a file), or the dev server during development. */
export function isOwnPage(url: string, pageUrl: string): boolean {
  try {
    const target = new URL(url);
    const own = new URL(pageUrl);
    if (own.protocol === 'file:') return target.protocol === 'file:' && target.pathname === own.pathname;
    if (ownScheme(own)) return target.protocol === own.protocol && target.host === own.host && target.pathname === own.pathname;
    return target.origin === own.origin;
  } catch {
    return false;
  }
}

/** Requests the page may make: its own files (and dev server), devtools, and in-page data. */
export function isAllowedRequest(url: string, pageUrl: string): boolean {
  try {
    const target = new URL(url);
    if (target.protocol === 'devtools:' || target.protocol === 'data:' || target.protocol === 'blob:') return true;
    const own = new URL(pageUrl);
    if (own.protocol === 'file:') {
      const folder = own.pathname.slice(0, own.pathname.lastIndexOf('/') + 1);
      return target.protocol === 'file:' && target.pathname.startsWith(folder);
    }
    if (ownScheme(own)) return target.protocol === own.protocol && target.host === own.host;
    return target.origin === own.origin;
  } catch {
    return false;
  }
}

/** No navigation, no new windows, no webviews. */
export function lockWebContents(contents: WebContents, pageUrl: string): void {
  contents.on('will-navigate', (event, url) => {
    if (!isOwnPage(url, pageUrl)) event.preventDefault();
  });
  contents.on('will-redirect', (event, url) => {
    if (!isOwnPage(url, pageUrl)) event.preventDefault();
  });
  contents.on('will-attach-webview', (event) => event.preventDefault());
  contents.setWindowOpenHandler(() => ({ action: 'deny' }));
}

/** Denies every permission and blocks every request that is not the page's own. */
export function lockSession(session: Session, pageUrl: string): void {
  session.setPermissionRequestHandler((_contents, _permission, callback) => callback(false));
  session.setPermissionCheckHandler(() => false);
  session.webRequest.onBeforeRequest((details, callback) => callback({ cancel: !isAllowedRequest(details.url, pageUrl) }));
}
