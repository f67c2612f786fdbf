/**
 * The page's own protocol answers from the built page's folder only; every
 * way out of it is refused (path traversal, encoded or not, other hosts,
 * other schemes).
 */
// @ts-nocheck

import { mkdirSync, mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { PAGE_SCHEME_PRIVILEGES, PAGE_URL, pageFile, pageResponse } from '../../app/main/page-protocol';

const top = mkdtempSync(join(tmpdir(), 'loftpoint-protocol-'));
const root = join(top, 'renderer');
mkdirSync(join(root, 'assets'), { recursive: true });
writeFileSync(join(root, 'index.html'), '<!doctype html><title>page</title>');
writeFileSync(join(root, 'assets', 'index-1.js'), 'console.log(1)');
writeFileSync(join(top, 'secret.txt'), 'not for the page');

describe('the page protocol', () => {
  it('is registered as standard and secure (Electron protocol docs: privileged schemes)', () => {
    expect(PAGE_URL).toBe('loftpoint://app/index.html');
    expect(PAGE_SCHEME_PRIVILEGES.privileges).toMatchObject({ standard: true, secure: true });
  });

  it('serves the page and its assets with their types', async () => {
    const page = await pageResponse(PAGE_URL, root);
    expect(page.status).toBe(200);
    expect(page.headers.get('content-type')).toMatch(/^text\/html/);
    expect(await page.text()).toContain('<title>page</title>');
    const script = await pageResponse('loftpoint://app/assets/index-1.js', root);
    expect(script.headers.get('content-type')).toMatch(/^text\/javascript/);
    expect(script.headers.get('content-security-policy')).toContain("default-src 'none'");
    expect((await pageResponse('loftpoint://app/', root)).status).toBe(200);
  });

  it.each(['loftpoint://app/../secret.txt', 'loftpoint://app/%2e%2e/secret.txt', 'loftpoint://app/assets/../../../secret.txt'])(
    'keeps %s inside the folder (the URL parser removes the dot segments) and finds nothing there',
    async (url) => {
      expect(pageFile(url, root)).toBe(join(root, 'secret.txt'));
      const answer = await pageResponse(url, root);
      expect(answer.status).toBe(404);
      expect(await answer.text()).not.toContain('not for the page');
    },
  );

  it.each([
    'loftpoint://app/assets/..%2f..%2fsecret.txt',
    'loftpoint://app/..%2fsecret.txt',
    'loftpoint://app/..%5csecret.txt',
    'loftpoint://app/%2e%2e%2f%2e%2e%2fetc/passwd',
    'loftpoint://other/index.html',
    'file:///etc/passwd',
    'loftpoint://app/index.html%00.js',
    'loftpoint://app/%E0%A4%A',
  ])('refuses %s', async (url) => {
    expect(pageFile(url, root)).toBeNull();
    const answer = await pageResponse(url, root);
    expect(answer.status).toBe(404);
    expect(await answer.text()).not.toContain('not for the page');
  });

  it('answers 404 for a missing file inside the folder', async () => {
    expect((await pageResponse('loftpoint://app/assets/none.js', root)).status).toBe(404);
  });
});
