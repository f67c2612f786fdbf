/**
 * Finding and running the browser that prints (app/report/chromium.ts):
 * clear messages naming what to install or set, never a stack trace.
 */
// @ts-nocheck

import { chmodSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { ChromiumFailed, ChromiumUnavailable, findChromium, printPdf } from '../../app/report/chromium';

const dir = mkdtempSync(join(tmpdir(), 'loftpoint-chromium-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe('findChromium', () => {
  it('names CHROMIUM_PATH and how to install when it points nowhere', () => {
    expect(() => findChromium({ CHROMIUM_PATH: join(dir, 'no-such-browser') })).toThrow(ChromiumUnavailable);
    try {
      findChromium({ CHROMIUM_PATH: join(dir, 'no-such-browser') });
    } catch (error) {
      expect((error as Error).message).toMatch(/^CHROMIUM_PATH is .*no-such-browser, which is not an executable file\./);
      expect((error as Error).message).toContain('apt-get install chromium');
    }
  });

  it('says no Chromium was found when none of the usual places has one', () => {
    expect(() => findChromium({}, [join(dir, 'a'), join(dir, 'b')])).toThrow(/^no Chromium found\. PDF and PNG output need Chromium: install it/);
  });

  it('refuses a file that is there but cannot run', () => {
    const file = join(dir, 'not-executable');
    writeFileSync(file, 'text');
    chmodSync(file, 0o644);
    expect(() => findChromium({ CHROMIUM_PATH: file })).toThrow(ChromiumUnavailable);
  });

  it('takes CHROMIUM_PATH first, then the usual places in order', () => {
    const first = join(dir, 'first');
    const second = join(dir, 'second');
    for (const file of [first, second]) {
      writeFileSync(file, '#!/bin/sh\nexit 0\n');
      chmodSync(file, 0o755);
    }
    expect(findChromium({ CHROMIUM_PATH: second }, [first])).toBe(second);
    expect(findChromium({}, [join(dir, 'missing'), first, second])).toBe(first);
  });
});

describe('printPdf', () => {
  it('reports a browser that writes nothing as ChromiumFailed, with its exit status', async () => {
    const quiet = join(dir, 'quiet-browser');
    writeFileSync(quiet, '#!/bin/sh\necho "crashed for a reason" >&2\nexit 3\n');
    chmodSync(quiet, 0o755);
    await expect(printPdf('<p>x</p>', { binary: quiet })).rejects.toThrow(ChromiumFailed);
    await expect(printPdf('<p>x</p>', { binary: quiet })).rejects.toThrow(/wrote no PDF \(exit 3\): crashed for a reason/);
  });

  it('ends a browser that hangs, with its helpers, after the time limit', async () => {
    const hang = join(dir, 'hanging-browser');
    writeFileSync(hang, '#!/bin/sh\nsleep 30 &\nsleep 30\n');
    chmodSync(hang, 0o755);
    const start = Date.now();
    await expect(printPdf('<p>x</p>', { binary: hang, timeoutMs: 500 })).rejects.toThrow(/did not finish within 1 s/);
    expect(Date.now() - start).toBeLessThan(5000);
  });
});
