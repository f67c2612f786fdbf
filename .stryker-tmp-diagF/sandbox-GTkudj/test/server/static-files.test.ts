// @ts-nocheck
import { mkdtempSync, mkdirSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { readStaticFile, resolveInside } from '../../app/server/static-files';

const root = mkdtempSync(join(tmpdir(), 'loftpoint-static-'));
mkdirSync(join(root, 'assets'));
writeFileSync(join(root, 'index.html'), '<!doctype html><title>t</title>');
writeFileSync(join(root, 'assets', 'app-1.js'), 'console.log(1)');
writeFileSync(join(tmpdir(), 'loftpoint-static-secret.txt'), 'secret');

describe('resolveInside', () => {
  it('maps "/" to the page and plain paths into the folder', () => {
    expect(resolveInside(root, '/')).toBe(join(root, 'index.html'));
    expect(resolveInside(root, '/assets/app-1.js')).toBe(join(root, 'assets', 'app-1.js'));
  });

  // Path traversal attempts (OWASP path traversal cheat sheet patterns, from memory).
  it.each(['/../loftpoint-static-secret.txt', '/assets/../../x', '/%2e%2e/x', '/%2e%2e%2fx', '/..%2f..%2fetc/passwd', '/a%00b', '/%E0%A4%A'])('refuses %s', (path) => {
    const resolved = resolveInside(root, path);
    if (resolved !== null) expect(resolved.startsWith(root)).toBe(true);
  });
});

describe('readStaticFile', () => {
  it('reads files with their content type; hashed assets may be cached', async () => {
    const page = await readStaticFile(root, '/');
    expect(page?.contentType).toBe('text/html; charset=utf-8');
    expect(page?.immutable).toBe(false);
    const script = await readStaticFile(root, '/assets/app-1.js');
    expect(script?.contentType).toBe('text/javascript; charset=utf-8');
    expect(script?.immutable).toBe(true);
  });

  it('returns null for missing files, folders and anything outside', async () => {
    expect(await readStaticFile(root, '/nope.js')).toBeNull();
    expect(await readStaticFile(root, '/assets')).toBeNull();
    expect(await readStaticFile(root, '/../loftpoint-static-secret.txt')).toBeNull();
  });
});
