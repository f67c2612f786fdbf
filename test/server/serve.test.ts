import { mkdirSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { bufferIO } from '../../app/cli/io';
import { InputError } from '../../app/cli/errors';
import { parsePort, runServe } from '../../app/cli/serve';
import { firstProjectFile, userDataFolder } from '../../app/service/first-start';
import { BUILD_PAGE_COMMAND, findPage, LaunchError } from '../../app/server/launch';
import { DEMO_CONCEPTS } from '../../core';
import { PRELIMINARY_CAUTION } from '../../app/service/contract';

const folder = mkdtempSync(join(tmpdir(), 'loftpoint-serve-'));
const page = join(folder, 'page');
mkdirSync(page, { recursive: true });
writeFileSync(join(page, 'index.html'), '<!doctype html>');

/** Starts serve, runs `body` against it, then stops it. */
async function withServe(project: string, body: (address: string, io: ReturnType<typeof bufferIO>) => Promise<void>): Promise<void> {
  const io = bufferIO();
  let stop!: () => void;
  const until = new Promise<void>((resolve) => (stop = resolve));
  const running = runServe({ port: '0', project, rendererDir: page }, io, until);
  // The address comes first; the project line and the caution once the project is open.
  for (let i = 0; i < 400 && !io.stdout().includes(PRELIMINARY_CAUTION); i += 1) await new Promise((resolve) => setTimeout(resolve, 25));
  try {
    await body(io.stdout().split('\n')[0], io);
  } finally {
    stop();
    await running;
  }
}

async function api(address: string, method: string, payload: unknown = {}) {
  const url = new URL(address);
  const token = url.hash.replace('#token=', '');
  const response = await fetch(`${url.origin}/api/${method}`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json', 'X-Loftpoint-Token': token },
    body: JSON.stringify(payload),
  });
  return response.json();
}

describe('loftpoint serve', () => {
  it('prints its address with the token as the first line, and serves the project', async () => {
    const project = join(folder, 'Plans.loftpoint');
    await withServe(project, async (address, io) => {
      expect(address).toMatch(/^http:\/\/127\.0\.0\.1:\d+\/#token=[A-Za-z0-9_-]{32}$/);
      expect(io.stdout()).toContain(project);
      expect(io.stdout()).toContain('Preliminary sizing only');
      const info = await api(address, 'getProject');
      expect(info.ok).toBe(true);
      expect(info.value.file).toBe(project);
      // A new project holds the demo concepts, so the window shows a full diagram at once.
      const concepts = await api(address, 'listConcepts');
      expect(concepts.value.map((concept: { name: string }) => concept.name)).toEqual(DEMO_CONCEPTS.map((demo) => demo.title));
      const refused = await api(address, 'openProject', { file: '/etc/passwd' });
      expect(refused.ok).toBe(false);
      expect(refused.error.code).toBe('bad-request');
    });
    // Started again on the same file, it opens what is there rather than creating anything.
    await withServe(project, async (_address, io) => {
      expect(io.stdout()).not.toContain('(new');
    });
  });

  it('prints the address before the project is made, and API calls sent at once wait for the whole project', async () => {
    const project = join(folder, 'Early.loftpoint');
    const io = bufferIO();
    let stop!: () => void;
    const until = new Promise<void>((resolve) => (stop = resolve));
    const running = runServe({ port: '0', project, rendererDir: page }, io, until);
    for (let i = 0; i < 400 && !io.stdout().includes('\n'); i += 1) await new Promise((resolve) => setImmediate(resolve));
    try {
      const address = io.stdout().split('\n')[0];
      expect(address).toMatch(/^http:\/\/127\.0\.0\.1:\d+\/#token=/);
      // The page is there whether or not the project is open yet.
      expect((await fetch(new URL(address).origin + '/')).status).toBe(200);
      // Never a half-made project: the first answer already holds every demo concept and version.
      const [info, concepts] = await Promise.all([api(address, 'getProject'), api(address, 'listConcepts')]);
      expect(info.ok).toBe(true);
      expect(info.value.conceptCount).toBe(DEMO_CONCEPTS.length);
      expect(info.value.versionCount).toBe(DEMO_CONCEPTS.length);
      expect(concepts.value.map((concept: { name: string }) => concept.name)).toEqual(DEMO_CONCEPTS.map((demo) => demo.title));
      expect(io.stdout().split('\n')[1]).toBe(`Project: ${project} (new, with the demo concepts)`);
    } finally {
      stop();
      await running;
    }
  });

  it('serves the page built ahead, and names the command that builds it when there is none', () => {
    const empty = join(folder, 'no-page');
    mkdirSync(empty, { recursive: true });
    expect(findPage(undefined, [empty, page])).toBe(page);
    expect(() => findPage(undefined, [empty])).toThrow(LaunchError);
    expect(() => findPage(undefined, [empty])).toThrow(BUILD_PAGE_COMMAND);
    // The command named is one of package.json's scripts, and `npm install` runs it (prepare).
    const scripts = JSON.parse(readFileSync(new URL('../../package.json', import.meta.url), 'utf8')).scripts as Record<string, string>;
    const script = BUILD_PAGE_COMMAND.replace(/^npm run /, '');
    expect(scripts[script]).toMatch(/vite build/);
    // `npm install` builds the page, then the command line (app/build-cli.js).
    expect(scripts.prepare.split(' && ')).toEqual([BUILD_PAGE_COMMAND, 'npm run build:cli']);
    expect(scripts['build:cli']).toBe('node app/build-cli.js');
    expect(() => findPage(empty)).toThrow(/no built page in .*no-page/);
  });

  it('refuses a bad port with a message naming the option', () => {
    for (const text of ['-1', '65536', 'abc', '80.5', '']) {
      expect(() => parsePort(text)).toThrow(InputError);
      try {
        parsePort(text);
      } catch (error) {
        expect((error as InputError).line()).toMatch(/^--port: must be a whole number/);
      }
    }
    expect(parsePort('0')).toBe(0);
    expect(parsePort('8080')).toBe(8080);
  });

  it('refuses a project that is not a project file, naming --project', async () => {
    const notProject = join(folder, 'notes.loftpoint');
    writeFileSync(notProject, 'just some text, not SQLite');
    await expect(runServe({ project: notProject, rendererDir: page }, bufferIO(), Promise.resolve())).rejects.toThrow(InputError);
  });

  it('after printing its address, still refuses a project it cannot open: one error naming --project, the server closed, the file untouched', async () => {
    const notProject = join(folder, 'letter.loftpoint');
    const text = 'a letter, not a project file';
    writeFileSync(notProject, text);
    const io = bufferIO();
    const running = runServe({ project: notProject, rendererDir: page }, io, new Promise(() => {}));
    const refusal = await running.then(
      () => null,
      (error: unknown) => error,
    );
    expect(refusal).toBeInstanceOf(InputError);
    expect((refusal as InputError).line()).toMatch(/^--project: /);
    const address = io.stdout().split('\n')[0];
    expect(io.stdout().trimEnd().split('\n')).toEqual([address]);
    // Nothing listens there any more.
    await expect(fetch(new URL(address).origin + '/')).rejects.toThrow();
    expect(readFileSync(notProject, 'utf8')).toBe(text);
  });
});

describe('userDataFolder', () => {
  it('follows each platform and honours LOFTPOINT_DATA_DIR', () => {
    expect(userDataFolder({}, 'linux', '/home/ada')).toBe('/home/ada/.config/Loftpoint');
    expect(userDataFolder({ XDG_CONFIG_HOME: '/xdg' }, 'linux', '/home/ada')).toBe('/xdg/Loftpoint');
    expect(userDataFolder({}, 'darwin', '/Users/ada')).toBe('/Users/ada/Library/Application Support/Loftpoint');
    expect(userDataFolder({ APPDATA: 'C:/Users/ada/AppData/Roaming' }, 'win32', 'C:/Users/ada')).toContain('Roaming');
    expect(userDataFolder({ LOFTPOINT_DATA_DIR: '/tmp/lp' }, 'linux', '/home/ada')).toBe('/tmp/lp');
    expect(firstProjectFile('/d')).toBe('/d/Demo project.loftpoint');
  });
});
