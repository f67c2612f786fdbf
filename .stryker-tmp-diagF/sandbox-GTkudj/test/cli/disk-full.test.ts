/**
 * A disk that fills while an output file is written: the command says the
 * disk is full (ENOSPC, "No space left on device", errno(3)), exits 2, and
 * leaves neither a partial file nor a temporary one, so a retry after freeing
 * space works. The full disk is simulated by letting the write put half the
 * bytes on disk and then fail with ENOSPC, as write(2) does.
 */
// @ts-nocheck

import { existsSync, mkdtempSync, readdirSync, rmSync } from 'node:fs';
import * as fs from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';

const full = { on: false };

vi.mock('node:fs', async (importOriginal) => {
  const real = await importOriginal<typeof import('node:fs')>();
  const writeFileSync = ((path: fs.PathOrFileDescriptor, data: string | NodeJS.ArrayBufferView, options?: fs.WriteFileOptions) => {
    if (full.on && typeof path === 'string' && path.endsWith('.tmp')) {
      const bytes = typeof data === 'string' ? Buffer.from(data) : Buffer.from(data.buffer, data.byteOffset, data.byteLength);
      real.writeFileSync(path, bytes.subarray(0, Math.floor(bytes.length / 2)), options);
      throw Object.assign(new Error(`ENOSPC: no space left on device, write`), { code: 'ENOSPC', errno: -28, syscall: 'write' });
    }
    return real.writeFileSync(path, data, options);
  }) as typeof real.writeFileSync;
  return { ...real, default: { ...real, writeFileSync }, writeFileSync };
});

const { main } = await import('../../app/cli/main');
const { bufferIO } = await import('../../app/cli/io');
const { ProjectService } = await import('../../app/service');
const { DEMO_CONCEPTS } = await import('../../core');

let dir: string;
beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'loftpoint-full-'));
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

async function run(...args: string[]) {
  const io = bufferIO();
  const code = await main(args, io);
  return { code, stdout: io.stdout(), stderr: io.stderr() };
}

async function expectDiskFull(args: string[], out: string) {
  full.on = true;
  try {
    const { code, stdout, stderr } = await run(...args);
    expect(code).toBe(2);
    expect(stdout).toBe('');
    expect(stderr).toMatch(/the disk is full; nothing was written and no partial file was left\n$/);
    expect(stderr.split('\n').filter(Boolean)).toHaveLength(1);
  } finally {
    full.on = false;
  }
  expect(existsSync(out)).toBe(false);
  expect(readdirSync(dir).filter((name) => name.endsWith('.tmp'))).toEqual([]);
  // Space freed: the same command now works.
  expect((await run(...args)).code).toBe(0);
  expect(existsSync(out)).toBe(true);
}

describe('a full disk while writing an output', () => {
  const slug = DEMO_CONCEPTS[0].slug;

  it('demo --out: says so, leaves no file behind, and a retry works', async () => {
    const out = join(dir, 'start.json');
    await expectDiskFull(['demo', slug, '--out', out], out);
  });

  it('evaluate --svg: says so, leaves no file behind, and a retry works', async () => {
    const concept = join(dir, 'concept.json');
    expect((await run('demo', slug, '--out', concept)).code).toBe(0);
    const out = join(dir, 'diagram.svg');
    await expectDiskFull(['evaluate', concept, '--svg', out], out);
  });

  it('project export --out: says so, leaves no file behind, and a retry works', async () => {
    const project = join(dir, 'project.loftpoint');
    const service = new ProjectService({ author: 'tester' });
    service.createProject({ file: project, name: 'Full disk', demo: true });
    service.closeProject({});
    const out = join(dir, 'export.json');
    await expectDiskFull(['project', 'export', project, '--out', out], out);
  });
});
