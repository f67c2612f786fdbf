/**
 * The page comes to the window through a protocol of our own,
 * `loftpoint://app/…`, answered from the built page's folder and nothing
 * else: a path that would leave the folder is refused, as is any other host.
 * The scheme is registered as standard and secure before the app is ready,
 * so the page gets an origin of its own, fetch and workers, and none of
 * file://'s reach over the disk.
 */
// @ts-nocheck

import { readFile } from 'node:fs/promises';
import { extname, isAbsolute, join, relative, resolve, sep } from 'node:path';
import { CONTENT_SECURITY_POLICY, HEADER_ONLY_POLICY } from '../shared/csp';

export const PAGE_SCHEME = 'loftpoint';
export const PAGE_HOST = 'app';
export const PAGE_URL = `${PAGE_SCHEME}://${PAGE_HOST}/index.html`;

/** For `protocol.registerSchemesAsPrivileged`, before the app is ready. */
export const PAGE_SCHEME_PRIVILEGES = {
  scheme: PAGE_SCHEME,
  privileges: { standard: true, secure: true, supportFetchAPI: true, corsEnabled: true },
} as const;

const TYPES: Record<string, string> = {
  '.html': 'text/html; charset=utf-8',
  '.js': 'text/javascript; charset=utf-8',
  '.mjs': 'text/javascript; charset=utf-8',
  '.css': 'text/css; charset=utf-8',
  '.json': 'application/json',
  '.svg': 'image/svg+xml',
  '.png': 'image/png',
  '.ico': 'image/x-icon',
  '.woff2': 'font/woff2',
  '.wasm': 'application/wasm',
  '.map': 'application/json',
  '.txt': 'text/plain; charset=utf-8',
};

/** The file under `root` that `url` names, or null when it names anything else. */
export function pageFile(url: string, root: string): string | null {
  let target: URL;
  try {
    target = new URL(url);
  } catch {
    return null;
  }
  if (target.protocol !== `${PAGE_SCHEME}:` || target.host !== PAGE_HOST) return null;
  let path: string;
  try {
    path = decodeURIComponent(target.pathname);
  } catch {
    return null;
  }
  if (path.includes('\0') || path.includes('\\')) return null;
  const base = resolve(root);
  const file = resolve(base, `.${path === '/' ? '/index.html' : path}`);
  const inside = relative(base, file);
  if (!inside || inside.startsWith('..') || isAbsolute(inside) || inside.split(sep).includes('..')) return null;
  return join(base, inside);
}

/** The answer to one request for the page: its file with its type, or 404. */
export async function pageResponse(url: string, root: string, read: (file: string) => Promise<Uint8Array> = readFile): Promise<Response> {
  const file = pageFile(url, root);
  const headers = { 'content-type': 'text/plain; charset=utf-8', 'x-content-type-options': 'nosniff' };
  if (!file) return new Response('Not part of the Loftpoint page.', { status: 404, headers });
  try {
    const bytes = await read(file);
    const type = TYPES[extname(file).toLowerCase()] ?? 'application/octet-stream';
    return new Response(bytes as unknown as BodyInit, {
      status: 200,
      headers: { ...headers, 'content-type': type, 'content-security-policy': `${CONTENT_SECURITY_POLICY}; ${HEADER_ONLY_POLICY}` },
    });
  } catch {
    return new Response('Not found.', { status: 404, headers });
  }
}
