/**
 * The `loftpoint` command as installed runs JavaScript built ahead into
 * out/cli (app/build-cli.js). These tests run that built command and the
 * TypeScript sources through tsx (LOFTPOINT_FROM_SOURCE=1) side by side and
 * require the same bytes and exit status; they check that the build never
 * carries the page build tools, and that an edited source is rebuilt before
 * it runs, in a copy of the project.
 */
import { spawnSync } from 'node:child_process';
import { cpSync, existsSync, mkdtempSync, readFileSync, readdirSync, rmSync, symlinkSync, utimesSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_CONCEPTS } from '../../core';

const ROOT = resolve(__dirname, '../..');
const BIN = join(ROOT, 'app/cli/loftpoint.cjs');
const CAUTION = /certification requirements come from the applicable authority.*licensed engineering review/s;

let dir: string;

function run(args: string[], fromSource: boolean, bin = BIN, extra: Record<string, string> = {}) {
  const env = { ...process.env, LOFTPOINT_FROM_SOURCE: fromSource ? '1' : '0', ...extra };
  const result = spawnSync(process.execPath, [bin, ...args], { cwd: dir, encoding: 'utf8', env, timeout: 120_000 });
  return { status: result.status, stdout: result.stdout, stderr: result.stderr };
}

beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'loftpoint-built-'));
  for (const demo of DEMO_CONCEPTS) writeFileSync(join(dir, `${demo.slug}.json`), `${JSON.stringify(demo.concept, null, 2)}\n`);
  const bad = structuredClone(DEMO_CONCEPTS[0].concept) as any;
  bad.aircraft.aero.configurations.clean.oswaldEfficiency = 1.2;
  writeFileSync(join(dir, 'bad.json'), JSON.stringify(bad));
  // The first run builds out/cli when it is missing or stale, as `npm install` would have.
  expect(run(['demo'], false).status).toBe(0);
}, 120_000);

afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe('the built command line', () => {
  it('is built, with a manifest naming its entries and sources', () => {
    const manifest = JSON.parse(readFileSync(join(ROOT, 'out/cli/manifest.json'), 'utf8'));
    expect(Object.keys(manifest.entries).sort()).toEqual(['cli', 'loftpoint', 'serve']);
    expect(manifest.entries.cli).toMatch(/\.cjs$/);
    for (const entry of Object.values(manifest.entries) as string[]) expect(existsSync(join(ROOT, 'out/cli', entry))).toBe(true);
    expect(manifest.inputs).toContain('app/cli/main.ts');
    expect(manifest.inputs).toContain('core/diagram/evaluate.ts');
  });

  it('never loads the page build tools or the Svelte compiler', () => {
    const files = readdirSync(join(ROOT, 'out/cli')).filter((name) => name.endsWith('.js') || name.endsWith('.cjs'));
    expect(files.length).toBeGreaterThan(1); // split into chunks
    for (const name of files) {
      const text = readFileSync(join(ROOT, 'out/cli', name), 'utf8');
      expect(text, name).not.toMatch(/from\s*["'](vite|svelte|@sveltejs\/[^"']*|tsx[^"']*|esbuild)["']/);
      expect(text, name).not.toMatch(/import\(\s*["'](vite|svelte|@sveltejs\/[^"']*|tsx[^"']*|esbuild)["']\)/);
      expect(text, name).not.toMatch(/require\(\s*["'](vite|svelte|@sveltejs\/[^"']*|tsx[^"']*|esbuild)["']\)/);
    }
  });

  for (const demo of DEMO_CONCEPTS) {
    it(`prints the same evaluation of the ${demo.slug} demo as the sources (JSON, report, CSV)`, () => {
      for (const extra of [['--json'], [], ['--csv', '--units', 'us']]) {
        const args = ['evaluate', join(dir, `${demo.slug}.json`), ...extra];
        const built = run(args, false);
        const source = run(args, true);
        expect(built.status).toBe(0);
        expect(built.stderr).toBe('');
        expect(built.stdout.length).toBeGreaterThan(100);
        expect(built).toEqual(source);
      }
    }, 120_000);
  }

  it('answers bad input, help and the demo list as the sources do', () => {
    for (const args of [['evaluate', join(dir, 'bad.json'), '--json'], ['evaluate', join(dir, 'missing.json')], ['--help'], ['demo'], ['evaluate', join(dir, 'trainer.json'), '--units', 'imperial']]) {
      const built = run(args, false);
      expect(built).toEqual(run(args, true));
    }
    const bad = run(['evaluate', join(dir, 'bad.json'), '--json'], false);
    expect(bad.status).toBe(2);
    expect(bad.stderr).toContain('aircraft.aero.configurations.clean.oswaldEfficiency');
    expect(bad.stderr.trimEnd().split('\n')).toHaveLength(1);
  }, 120_000);
});

describe('the launcher', () => {
  it('runs the same command line when started as app/cli/loftpoint.js, the ES module that loads the bin', () => {
    const older = join(ROOT, 'app/cli/loftpoint.js');
    for (const args of [['evaluate', join(dir, 'trainer.json'), '--json'], ['evaluate', join(dir, 'bad.json')], ['--version']]) {
      expect(run(args, false, older)).toEqual(run(args, false));
    }
    expect(run(['evaluate', join(dir, 'bad.json')], false, older).status).toBe(2);
  }, 120_000);
});

describe('the Monte Carlo on several threads', () => {
  it('draws the very same probability map with 1, 2 and 3 worker threads, and as the sources on one', () => {
    // 3,000 samples are six random blocks: 1, 2 and 3 threads split them differently.
    const svg = (workers: string, fromSource = false) => {
      const out = join(dir, `chance-${workers}-${fromSource ? 'source' : 'built'}.svg`);
      const result = run(['report', join(dir, 'business-jet.json'), '--out', out, '--samples', '3000', '--seed', '11'], fromSource, BIN, { LOFTPOINT_WORKERS: workers });
      expect(result.stderr).toBe('');
      expect(result.status).toBe(0);
      return readFileSync(out, 'utf8');
    };
    const one = svg('1');
    expect(one).toMatch(/<svg[\s>]/);
    expect(svg('2')).toBe(one);
    expect(svg('3')).toBe(one);
    expect(svg('2', true)).toBe(one);
    // Another seed draws other samples: the comparison above can fail.
    const other = join(dir, 'chance-other-seed.svg');
    expect(run(['report', join(dir, 'business-jet.json'), '--out', other, '--samples', '3000', '--seed', '12'], false).status).toBe(0);
    expect(readFileSync(other, 'utf8')).not.toBe(one);
  }, 180_000);
});

describe('browser mode from the build (app/cli/browser-mode.cjs, as `npm start` runs it)', () => {
  const MODE = join(ROOT, 'app/cli/browser-mode.cjs');

  it('prints its address first, serves the page on 127.0.0.1 with a new demo project, and stops cleanly', async () => {
    const { spawn } = await import('node:child_process');
    const project = join(dir, 'browser-mode.loftpoint');
    const child = spawn(process.execPath, [MODE, '--port', '0', '--project', project], { env: { ...process.env, LOFTPOINT_DATA_DIR: join(dir, 'data') } });
    let stdout = '';
    let stderr = '';
    child.stderr.on('data', (chunk) => (stderr += chunk));
    const exited = new Promise<number | null>((resolveExit) => child.once('exit', (code) => resolveExit(code)));
    await new Promise<void>((resolveLines, reject) => {
      child.stdout.on('data', (chunk) => {
        stdout += chunk;
        if (CAUTION.test(stdout)) resolveLines();
      });
      child.once('exit', (code) => reject(new Error(`browser mode exited (${code}): ${stderr}`)));
    });
    const lines = stdout.split('\n');
    expect(lines[0]).toMatch(/^http:\/\/127\.0\.0\.1:\d+\/#token=\S+$/);
    expect(lines[1]).toBe(`Project: ${project} (new, with the demo concepts)`);
    const page = await fetch(lines[0].replace(/#.*$/, ''));
    expect(page.status).toBe(200);
    expect(await page.text()).toContain('<title>Loftpoint</title>');
    expect(existsSync(project)).toBe(true);
    child.kill('SIGTERM');
    expect(await exited).toBe(0);
    expect(stderr).toBe('');
  }, 120_000);

  it('refuses a bad port with one line naming --port and exit status 2 (also when started as browser-mode.js)', () => {
    for (const start of [MODE, join(ROOT, 'app/cli/browser-mode.js')]) {
      const result = spawnSync(process.execPath, [start, '--port', 'eighty'], { encoding: 'utf8', env: { ...process.env, LOFTPOINT_DATA_DIR: join(dir, 'data') }, timeout: 120_000 });
      expect(result.status).toBe(2);
      expect(result.stdout).toBe('');
      expect(result.stderr.trimEnd().split('\n')).toEqual([expect.stringMatching(/^loftpoint: .*--port.*whole number/)]);
    }
  }, 120_000);
});

describe('a copy of the project', () => {
  let copy: string;

  beforeAll(() => {
    copy = mkdtempSync(join(tmpdir(), 'loftpoint-copy-'));
    for (const part of ['app', 'core', 'package.json', 'package-lock.json']) cpSync(join(ROOT, part), join(copy, part), { recursive: true });
    symlinkSync(join(ROOT, 'node_modules'), join(copy, 'node_modules'), 'dir');
  });

  afterAll(() => rmSync(copy, { recursive: true, force: true }));

  it('builds on first use, then rebuilds when a source is edited', () => {
    const bin = join(copy, 'app/cli/loftpoint.cjs');
    const first = run(['evaluate', join(dir, 'trainer.json')], false, bin);
    expect(first.status).toBe(0);
    expect(first.stdout).toMatch(CAUTION);
    const manifest = join(copy, 'out/cli/manifest.json');
    expect(existsSync(manifest)).toBe(true);
    const builtAt = JSON.parse(readFileSync(manifest, 'utf8')).builtAt;

    // Unchanged sources: the build is used as it is.
    expect(run(['demo'], false, bin).status).toBe(0);
    expect(JSON.parse(readFileSync(manifest, 'utf8')).builtAt).toBe(builtAt);

    // An edited source, dated after the build: the next run carries the edit.
    const caution = join(copy, 'core/caution.ts');
    writeFileSync(caution, readFileSync(caution, 'utf8').replace('Preliminary sizing only', 'Preliminary sizing only (edited copy)'));
    const later = new Date(builtAt + 5_000);
    utimesSync(caution, later, later);
    const edited = run(['evaluate', join(dir, 'trainer.json')], false, bin);
    expect(edited.status).toBe(0);
    expect(edited.stdout).toContain('Preliminary sizing only (edited copy)');
    expect(JSON.parse(readFileSync(manifest, 'utf8')).builtAt).toBeGreaterThan(builtAt);
    // The edited source was dated ahead of the clock: date it back, or every later run of this copy
    // would find it newer than the build and build again (making a new code cache as it does).
    const earlier = new Date(builtAt - 60_000);
    utimesSync(caution, earlier, earlier);
    expect(run(['demo'], false, bin).status).toBe(0);
    const rebuiltAt = JSON.parse(readFileSync(manifest, 'utf8')).builtAt;
    expect(run(['demo'], false, bin).status).toBe(0);
    expect(JSON.parse(readFileSync(manifest, 'utf8')).builtAt).toBe(rebuiltAt);
  }, 120_000);

  it('runs from its code cache, prints the same without it, and writes the cache again when it is gone', () => {
    const bin = join(copy, 'app/cli/loftpoint.cjs');
    const args = ['evaluate', join(dir, 'utility-twin.json'), '--json'];
    expect(run(['demo'], false, bin).status).toBe(0); // built (with its cache) when stale
    const out = join(copy, 'out/cli');
    const caches = () => readdirSync(out).filter((name) => name.endsWith('.cache'));
    const entry = JSON.parse(readFileSync(join(out, 'manifest.json'), 'utf8')).entries.cli;
    expect(caches().filter((name) => name.startsWith(`${entry}.`))).toHaveLength(1);
    const cached = run(args, false, bin);
    expect(cached.status).toBe(0);
    expect(cached).toEqual(run(args, false, bin, { LOFTPOINT_CODE_CACHE: 'off' }));
    expect(cached).toEqual(run(args, true));
    for (const name of caches()) rmSync(join(out, name));
    expect(run(args, false, bin, { LOFTPOINT_CODE_CACHE: 'off' })).toEqual(cached);
    expect(caches()).toHaveLength(0);
    expect(run(args, false, bin)).toEqual(cached);
    expect(caches()).toHaveLength(1);
    // A damaged cache is refused by V8: the command still prints the same, and the cache is made again.
    const [cache] = caches();
    writeFileSync(join(out, cache), Buffer.alloc(4096, 7));
    expect(run(args, false, bin)).toEqual(cached);
    expect(readFileSync(join(out, cache)).equals(Buffer.alloc(4096, 7))).toBe(false);
  }, 120_000);

  it('finds its project through a link, as npm links the bin', () => {
    const links = mkdtempSync(join(tmpdir(), 'loftpoint-bin-'));
    try {
      symlinkSync(join(copy, 'app/cli/loftpoint.cjs'), join(links, 'loftpoint'));
      const result = run(['evaluate', join(dir, 'survey-drone.json'), '--json'], false, join(links, 'loftpoint'));
      expect(result.status).toBe(0);
      expect(result).toEqual(run(['evaluate', join(dir, 'survey-drone.json'), '--json'], true));
    } finally {
      rmSync(links, { recursive: true, force: true });
    }
  }, 120_000);
});
