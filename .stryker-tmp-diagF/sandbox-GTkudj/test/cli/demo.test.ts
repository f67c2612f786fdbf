/**
 * `loftpoint demo [NAME] [--out FILE]`: the demo concepts a user starts from.
 * Each printed concept must read back through the concept parser and
 * evaluate, and a written file must never replace an existing one.
 */
// @ts-nocheck

import { chmodSync, existsSync, mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { Command } from 'commander';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { registerDemo, runDemo } from '../../app/cli/demo';
import { InputError } from '../../app/cli/errors';
import { bufferIO } from '../../app/cli/io';
import { DEMO_CONCEPTS, evaluateDesign, parseConceptText } from '../../core';

const CAUTION = /certification requirements come from the applicable authority.*licensed engineering review/;
let dir: string;

beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'loftpoint-demo-'));
});

afterAll(() => {
  rmSync(dir, { recursive: true, force: true });
});

function inputError(action: () => unknown): InputError {
  try {
    action();
  } catch (error) {
    expect(error).toBeInstanceOf(InputError);
    return error as InputError;
  }
  throw new Error('expected an InputError');
}

describe('runDemo', () => {
  it('lists every demo by name and title, with how to start from one and the caution', () => {
    const text = runDemo(undefined);
    for (const demo of DEMO_CONCEPTS) {
      expect(text).toMatch(new RegExp(`^  ${demo.slug}\\s+${demo.title.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}$`, 'm'));
    }
    expect(text).toContain('--out');
    expect(text).toMatch(CAUTION);
  });

  for (const demo of DEMO_CONCEPTS) {
    it(`prints ${demo.slug} as a concept that reads back and evaluates`, () => {
      const text = runDemo(demo.slug);
      expect(JSON.parse(text)).toEqual(demo.concept);
      const parsed = parseConceptText(text);
      expect(parsed.ok).toBe(true);
      if (!parsed.ok) return;
      const evaluation = evaluateDesign(parsed.design);
      expect(evaluation.format).toBe('loftpoint-evaluation/1');
      expect(evaluation.optimum).not.toBeNull();
    });
  }

  it('accepts the name in any letter case', () => {
    expect(runDemo(DEMO_CONCEPTS[0].slug.toUpperCase())).toBe(runDemo(DEMO_CONCEPTS[0].slug));
  });

  it('names the demos when the name is unknown', () => {
    const error = inputError(() => runDemo('airliner'));
    expect(error.line()).toMatch(/^demo: unknown demo "airliner"; the demos are /);
    for (const demo of DEMO_CONCEPTS) expect(error.line()).toContain(demo.slug);
  });

  it('writes --out once and never over an existing file', () => {
    const out = join(dir, 'start.json');
    const message = runDemo(DEMO_CONCEPTS[1].slug, { out });
    expect(message).toContain(out);
    expect(message).toMatch(CAUTION);
    expect(JSON.parse(readFileSync(out, 'utf8'))).toEqual(DEMO_CONCEPTS[1].concept);
    const error = inputError(() => runDemo(DEMO_CONCEPTS[0].slug, { out }));
    expect(error.line()).toBe(`--out: ${out} exists; it was left as it was (choose another name, or add --force to replace it)`);
    expect(JSON.parse(readFileSync(out, 'utf8'))).toEqual(DEMO_CONCEPTS[1].concept);
    // --force replaces it; the folder holds no temporary file afterwards.
    runDemo(DEMO_CONCEPTS[0].slug, { out, force: true });
    expect(JSON.parse(readFileSync(out, 'utf8'))).toEqual(DEMO_CONCEPTS[0].concept);
    expect(readdirSync(dir).filter((name) => name.endsWith('.tmp'))).toEqual([]);
  });

  it('never replaces a read-only file, even with --force, and says so', () => {
    const out = join(dir, 'locked.json');
    writeFileSync(out, '{"mine": true}\n');
    chmodSync(out, 0o444);
    const error = inputError(() => runDemo(DEMO_CONCEPTS[0].slug, { out, force: true }));
    expect(error.line()).toMatch(/read-only; it was left as it was \(even --force never replaces a read-only file\)/);
    expect(readFileSync(out, 'utf8')).toBe('{"mine": true}\n');
  });

  it('refuses --out into a folder that does not exist, and --out without a name', () => {
    const out = join(dir, 'missing', 'x.json');
    expect(inputError(() => runDemo(DEMO_CONCEPTS[0].slug, { out })).line()).toMatch(/--out: the folder .*missing does not exist$/);
    expect(existsSync(out)).toBe(false);
    expect(inputError(() => runDemo(undefined, { out: join(dir, 'y.json') })).line()).toMatch(/--out: needs a demo name/);
  });

  it('refuses --out naming a folder', () => {
    expect(inputError(() => runDemo(DEMO_CONCEPTS[0].slug, { out: dir })).line()).toMatch(/--out: .* is a folder/);
  });
});

describe('registerDemo', () => {
  async function parse(...args: string[]) {
    const io = bufferIO();
    let code = -1;
    const program = new Command('loftpoint').exitOverride();
    registerDemo(program, io, (value) => (code = value));
    await program.parseAsync(args, { from: 'user' });
    return { code, stdout: io.stdout(), stderr: io.stderr() };
  }

  it('wires `demo` and `demo NAME --out FILE` to the command line', async () => {
    const listed = await parse('demo');
    expect(listed.code).toBe(0);
    expect(listed.stdout).toBe(runDemo(undefined));
    const printed = await parse('demo', DEMO_CONCEPTS[2].slug);
    expect(JSON.parse(printed.stdout)).toEqual(DEMO_CONCEPTS[2].concept);
    const out = join(dir, 'wired.json');
    const written = await parse('demo', DEMO_CONCEPTS[2].slug, '--out', out);
    expect(written.stdout).toContain(out);
    expect(existsSync(out)).toBe(true);
  });

  it('lets a bad name reach the command line as an InputError, printing nothing', async () => {
    const io = bufferIO();
    const program = new Command('loftpoint').exitOverride();
    registerDemo(program, io, () => undefined);
    await expect(program.parseAsync(['demo', 'nope'], { from: 'user' })).rejects.toBeInstanceOf(InputError);
    expect(io.stdout()).toBe('');
  });
});

describe('a demo written to a file', () => {
  it('is what `loftpoint evaluate` reads', async () => {
    const { main } = await import('../../app/cli/main');
    const file = join(dir, 'evaluate-me.json');
    writeFileSync(file, runDemo(DEMO_CONCEPTS[0].slug));
    const io = bufferIO();
    expect(await main(['evaluate', file, '--json'], io)).toBe(0);
    expect(JSON.parse(io.stdout()).format).toBe('loftpoint-evaluation/1');
  });
});
