/**
 * The built page, served read-only from one folder. A path that would leave
 * the folder, or a file that is not there, is a 404; the address "/" is the
 * page itself.
 */
// @ts-nocheck

import { readFile, stat } from 'node:fs/promises';
import { extname, join, normalize, resolve, sep } from 'node:path';

const CONTENT_TYPES: Record<string, string> = {
  '.html': 'text/html; charset=utf-8',
  '.js': 'text/javascript; charset=utf-8',
  '.mjs': 'text/javascript; charset=utf-8',
  '.css': 'text/css; charset=utf-8',
  '.svg': 'image/svg+xml',
  '.png': 'image/png',
  '.ico': 'image/x-icon',
  '.json': 'application/json; charset=utf-8',
  '.woff2': 'font/woff2',
  '.map': 'application/json; charset=utf-8',
};

export interface StaticFile {
  body: Buffer;
  contentType: string;
  /** Hashed assets may be cached; the page itself never is. */
  immutable: boolean;
}

/** The file inside `root` that a URL path names, or null when it would leave `root`. */
export function resolveInside(root: string, urlPath: string): string | null {
  let decoded: string;
  try {
    decoded = decodeURIComponent(urlPath);
  } catch {
    return null;
  }
  if (decoded.includes('\0')) return null;
  const relative = decoded === '/' || decoded === '' ? 'index.html' : decoded.replace(/^\/+/, '');
  const base = resolve(root);
  const full = resolve(base, normalize(relative));
  return full === base || full.startsWith(base + sep) ? full : null;
}

export async function readStaticFile(root: string, urlPath: string): Promise<StaticFile | null> {
  const file = resolveInside(root, urlPath);
  if (file === null) return null;
  try {
    const info = await stat(file);
    if (!info.isFile()) return null;
    const body = await readFile(file);
    const type = CONTENT_TYPES[extname(file).toLowerCase()] ?? 'application/octet-stream';
    return { body, contentType: type, immutable: file.includes(`${sep}assets${sep}`) };
  } catch {
    return null;
  }
}

/** Where a built page lives: out/renderer (electron-vite, vite) or dist/renderer. */
export function rendererFolders(projectRoot: string): string[] {
  return [join(projectRoot, 'out', 'renderer'), join(projectRoot, 'dist', 'renderer')];
}
