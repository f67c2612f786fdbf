import { copyFileSync, existsSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { beforeAll, describe, expect, it } from 'vitest';
// @ts-expect-error plain JavaScript module without types
import { builtEntry, defaultRoot } from '../../app/build-cli.js';
import { createService, invokeService } from '../../app/service';
import { demoChecksFile, matchingDemoChecks } from '../../app/service/demo-checks';
import { demoConcepts } from '../../app/service/engine';
import { launchBrowserMode, LaunchError } from '../../app/server/launch';
import { makeProjectOnWorker, singleFileBuild, type SingleFileBuild } from '../../app/server/new-project-worker';
import { DEMO_CONCEPTS } from '../../core';

const folder = mkdtempSync(join(tmpdir(), 'loftpoint-new-project-worker-'));
const page = join(folder, 'page');
mkdirSync(page, { recursive: true });
writeFileSync(join(page, 'index.html'), '<!doctype html>');

/** The single-file command line built ahead (built here when missing or older than its sources, as `npm start` does). */
let build: SingleFileBuild;
beforeAll(async () => {
  const entry = await builtEntry(defaultRoot, 'cli');
  if (!entry.ok || !entry.url) throw new Error(`the command line did not build: ${entry.reason}`);
  const found = singleFileBuild(entry.url as string);
  if (!found) throw new Error(`no single-file build at ${entry.url}`);
  build = found;
}, 120_000);

/** Every version of a project as the window lists it (summaries, notes), read through the service. */
async function versionsOf(file: string) {
  const service = createService();
  const opened = await invokeService(service, 'openProject', { file, readonly: true });
  if (!opened.ok) throw new Error(opened.error.message);
  const concepts = await invokeService(service, 'listConcepts', {});
  const versions = await invokeService(service, 'listVersions', {});
  await invokeService(service, 'closeProject', {});
  if (!concepts.ok || !versions.ok) throw new Error('the project could not be read');
  return { info: opened.value, concepts: concepts.value, versions: versions.value };
}

describe('a new project made on a worker thread', () => {
  it('is found only in the single-file build', () => {
    expect(singleFileBuild('file:///somewhere/app/server/launch.ts')).toBeNull();
    expect(singleFileBuild('file:///somewhere/out/cli/chunk-ABC.js')).toBeNull();
    expect(singleFileBuild(pathToFileURL(join(folder, 'missing-cli.cjs')).href)).toBeNull();
    expect(build.loader).toBe(join(defaultRoot as string, 'app', 'cli', 'built-cli.cjs'));
  });

  it('holds the same demo concepts, versions and evaluations as one made on the server thread', { timeout: 60_000 }, async () => {
    const onWorker = join(folder, 'Worker.loftpoint');
    const here = join(folder, 'Here.loftpoint');
    expect(await makeProjectOnWorker(build, onWorker, 'Worker')).toBe(true);
    const service = createService();
    const created = await invokeService(service, 'createProject', { file: here, name: 'Here', demo: true });
    expect(created.ok).toBe(true);
    await invokeService(service, 'closeProject', {});
    const made = await versionsOf(onWorker);
    const reference = await versionsOf(here);
    expect(made.info.name).toBe('Worker');
    expect(made.concepts.map((concept) => concept.name)).toEqual(DEMO_CONCEPTS.map((demo) => demo.title));
    expect(made.versions.length).toBe(DEMO_CONCEPTS.length);
    const comparable = (versions: typeof made.versions) => versions.map(({ createdAt: _at, author: _by, ...rest }) => rest);
    expect(comparable(made.versions)).toEqual(comparable(reference.versions));
    // Each demo was evaluated: a wing area sized on every one.
    for (const version of made.versions) expect(version.summary.sizing?.wingArea).toBeGreaterThan(0);
  });

  it('answers false and leaves things as they were when it cannot make the file', { timeout: 60_000 }, async () => {
    const existing = join(folder, 'Existing.loftpoint');
    writeFileSync(existing, 'someone else\'s file');
    expect(await makeProjectOnWorker(build, existing, 'Existing')).toBe(false);
    expect(readFileSync(existing, 'utf8')).toBe('someone else\'s file');
    const nowhere = join(folder, 'no-such-folder', 'New.loftpoint');
    expect(await makeProjectOnWorker(build, nowhere, 'New')).toBe(false);
    expect(existsSync(join(folder, 'no-such-folder'))).toBe(false);
    // A worker that cannot load the command line at all.
    expect(await makeProjectOnWorker({ ...build, bundle: join(folder, 'missing-cli.cjs') }, join(folder, 'Lost.loftpoint'), 'Lost')).toBe(false);
    expect(existsSync(join(folder, 'Lost.loftpoint'))).toBe(false);
    // No temporary file is left behind by any of them.
    expect(readdirSync(folder).filter((name) => name.endsWith('.creating'))).toEqual([]);
  });

  /** Browser mode on a new project `name` run from `from`: where it was made, and the concepts its API lists first. */
  async function serveNew(name: string, from: SingleFileBuild) {
    const project = join(folder, `${name}.loftpoint`);
    let address = '';
    const mode = await launchBrowserMode({ port: 0, project, rendererDir: page, workerBuild: from }, (url) => (address = url));
    try {
      const url = new URL(address);
      const answer = await fetch(`${url.origin}/api/listConcepts`, {
        method: 'POST',
        headers: { 'Content-Type': 'application/json', 'X-Loftpoint-Token': url.hash.replace('#token=', '') },
        body: '{}',
      }).then((response) => response.json());
      return { created: mode.created, madeOnWorker: mode.madeOnWorker, conceptCount: mode.project.conceptCount, listed: answer.value.map((concept: { name: string }) => concept.name) };
    } finally {
      await mode.close();
    }
  }

  /** A copy of the single file beside it, for which the build recorded no demo checks (there the worker makes a new project). */
  function withoutRecordedChecks<T>(run: (from: SingleFileBuild) => Promise<T>): Promise<T> {
    const copy = join(dirname(build.bundle), `worker-test-${process.pid}.cjs`);
    copyFileSync(build.bundle, copy);
    expect(existsSync(demoChecksFile(copy))).toBe(false);
    return run({ ...build, bundle: copy }).finally(() => rmSync(copy, { force: true }));
  }

  it('serves the project it made as new, with every demo concept from the first answer', { timeout: 60_000 }, async () => {
    const served = await withoutRecordedChecks((from) => serveNew('Served', from));
    expect(served).toEqual({ created: true, madeOnWorker: true, conceptCount: DEMO_CONCEPTS.length, listed: DEMO_CONCEPTS.map((demo) => demo.title) });
  });

  it('makes a new project on its own thread at once where the build recorded the demo checks', { timeout: 60_000 }, async () => {
    // The build recorded every demo's check, for the demos as they are now.
    expect(matchingDemoChecks(readFileSync(demoChecksFile(build.bundle), 'utf8'), demoConcepts()).size).toBe(DEMO_CONCEPTS.length);
    const served = await serveNew('Quick', build);
    expect(served).toEqual({ created: true, madeOnWorker: false, conceptCount: DEMO_CONCEPTS.length, listed: DEMO_CONCEPTS.map((demo) => demo.title) });
    // The same versions and evaluations as a project whose demos were evaluated as it was made.
    const here = join(folder, 'Evaluated.loftpoint');
    const service = createService();
    expect((await invokeService(service, 'createProject', { file: here, name: 'Evaluated', demo: true })).ok).toBe(true);
    await invokeService(service, 'closeProject', {});
    const comparable = (versions: Awaited<ReturnType<typeof versionsOf>>['versions']) => versions.map(({ createdAt: _at, author: _by, ...rest }) => rest);
    expect(comparable((await versionsOf(join(folder, 'Quick.loftpoint'))).versions)).toEqual(comparable((await versionsOf(here)).versions));
  });

  it('still names --project when the project cannot be made, the worker having failed first or not started', { timeout: 60_000 }, async () => {
    const project = join(folder, 'missing-folder', 'New.loftpoint');
    const refusal = (from: SingleFileBuild) =>
      launchBrowserMode({ port: 0, project, rendererDir: page, workerBuild: from }).then(
        () => null,
        (error: unknown) => error,
      );
    for (const refused of [await withoutRecordedChecks(refusal), await refusal(build)]) {
      expect(refused).toBeInstanceOf(LaunchError);
      expect((refused as LaunchError).field).toBe('--project');
      expect((refused as LaunchError).message).toContain('does not exist');
    }
    expect(existsSync(project)).toBe(false);
  });
});
