/**
 * `loftpoint project ...` through the real command-line entry: exact verbs,
 * output scripts can rely on, one-line errors with exit status 2.
 */
// @ts-nocheck

import { chmodSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { main } from '../../app/cli/main';
import { bufferIO } from '../../app/cli/io';
import { PRELIMINARY_CAUTION } from '../../app/service';
import { DEMO_CONCEPTS } from '../../core';
import { freshFolder } from '../store/helpers';

async function cli(...args: string[]) {
  const io = bufferIO();
  const code = await main(args, io);
  return { code, out: io.stdout(), err: io.stderr() };
}

const restore: Array<() => void> = [];
afterEach(() => {
  for (const undo of restore.splice(0)) undo();
});

/** One line, no stack trace. */
function expectOneLineError(err: string) {
  expect(err.trim().split('\n')).toHaveLength(1);
  expect(err).not.toMatch(/\n\s+at /);
}

async function demoProject() {
  const folder = freshFolder();
  const file = join(folder, 'fleet.loftpoint');
  const created = await cli('project', 'create', file, '--demo');
  expect(created.code).toBe(0);
  return { folder, file, created };
}

describe('loftpoint project create', () => {
  it('creates a project with the demo concepts as first versions, says so, and ends with the caution', async () => {
    const { created } = await demoProject();
    expect(created.out).toContain(`${DEMO_CONCEPTS.length} concepts, versions 1 to ${DEMO_CONCEPTS.length}`);
    expect(created.out.trimEnd().endsWith(PRELIMINARY_CAUTION)).toBe(true);
  });

  it('refuses to create over an existing file: exit 2, one line naming the file', async () => {
    const { file } = await demoProject();
    const before = readFileSync(file);
    const again = await cli('project', 'create', file);
    expect(again.code).toBe(2);
    expect(again.err).toContain(file);
    expect(again.err).toContain('already exists');
    expectOneLineError(again.err);
    expect(readFileSync(file).equals(before)).toBe(true);
  });
});

describe('loftpoint project branch', () => {
  it('starts a new concept from a version, prints only its version number, and leaves the source as it was', async () => {
    const { file } = await demoProject();
    const before = (await cli('project', 'show', file, '1')).out;
    const branched = await cli('project', 'branch', file, '1', '--name', 'High-wing trainer', '--title', 'LP-2H high-wing trainer', '--note', 'grass clearance');
    expect(branched.code).toBe(0);
    expect(branched.out).toBe(`${DEMO_CONCEPTS.length + 1}\n`);
    const shown = JSON.parse((await cli('project', 'show', file, branched.out.trim())).out) as { name: string };
    expect(shown.name).toBe('LP-2H high-wing trainer');
    expect((await cli('project', 'show', file, '1')).out).toBe(before);
    const versions = JSON.parse((await cli('project', 'versions', file, '--json')).out) as Array<{ number: number; parent: number | null; conceptName: string; note: string }>;
    expect(versions.find((v) => v.number === DEMO_CONCEPTS.length + 1)).toMatchObject({ parent: 1, conceptName: 'High-wing trainer', note: 'grass clearance' });
  });

  it('refuses a name in use or a missing version: exit 2, one line, nothing written', async () => {
    const { file } = await demoProject();
    const taken = await cli('project', 'branch', file, '1', '--name', DEMO_CONCEPTS[1].concept.name as string);
    expect(taken.code).toBe(2);
    expect(taken.err).toContain('already exists');
    expectOneLineError(taken.err);
    const missing = await cli('project', 'branch', file, '99', '--name', 'Other');
    expect(missing.code).toBe(2);
    expect(missing.err).toContain('version 99 does not exist');
    expectOneLineError(missing.err);
    const versions = JSON.parse((await cli('project', 'versions', file, '--json')).out) as unknown[];
    expect(versions).toHaveLength(DEMO_CONCEPTS.length);
  });
});

describe('loftpoint project save', () => {
  it('prints only the new version number', async () => {
    const { folder, file } = await demoProject();
    const shown = await cli('project', 'show', file, '1');
    const conceptFile = join(folder, 'edited.json');
    writeFileSync(conceptFile, shown.out.replace('"45 kt"', '"47 kt"'));
    const saved = await cli('project', 'save', file, conceptFile, '--note', 'Stall 47 kt');
    expect(saved.code).toBe(0);
    expect(saved.out).toBe(`${DEMO_CONCEPTS.length + 1}\n`);
    const listed = JSON.parse((await cli('project', 'versions', file, '--json')).out);
    const latest = listed[listed.length - 1];
    expect(latest).toMatchObject({ number: DEMO_CONCEPTS.length + 1, parent: 1, note: 'Stall 47 kt' });
  });

  it('saves into the concept named by --concept, creating it', async () => {
    const { folder, file } = await demoProject();
    const conceptFile = join(folder, 'c.json');
    writeFileSync(conceptFile, (await cli('project', 'show', file, '2')).out);
    const saved = await cli('project', 'save', file, conceptFile, '--note', 'alternative', '--concept', 'Option B');
    expect(saved.code).toBe(0);
    const versions = JSON.parse((await cli('project', 'versions', file, '--json', '--concept', 'Option B')).out);
    expect(versions.map((v: { number: number; parent: number | null }) => [v.number, v.parent])).toEqual([[Number(saved.out), null]]);
  });

  it('takes the author from $LOFTPOINT_AUTHOR', async () => {
    const { folder, file } = await demoProject();
    const conceptFile = join(folder, 'c.json');
    writeFileSync(conceptFile, (await cli('project', 'show', file, '1')).out);
    const previous = process.env.LOFTPOINT_AUTHOR;
    process.env.LOFTPOINT_AUTHOR = 'k.chief-engineer';
    restore.push(() => (previous === undefined ? delete process.env.LOFTPOINT_AUTHOR : (process.env.LOFTPOINT_AUTHOR = previous)));
    const number = (await cli('project', 'save', file, conceptFile, '--note', 'x')).out.trim();
    const versions = JSON.parse((await cli('project', 'versions', file, '--json')).out);
    expect(versions.find((v: { number: number }) => v.number === Number(number)).author).toBe('k.chief-engineer');
  });

  it('rejects an invalid concept: exit 2, one line naming the concept file and the field, nothing saved', async () => {
    const { folder, file } = await demoProject();
    const concept = structuredClone(DEMO_CONCEPTS[0].concept) as Record<string, any>;
    concept.aircraft.takeoffMass = 750;
    const conceptFile = join(folder, 'bad.json');
    writeFileSync(conceptFile, JSON.stringify(concept));
    const saved = await cli('project', 'save', file, conceptFile, '--note', 'bad');
    expect(saved.code).toBe(2);
    expect(saved.out).toBe('');
    expect(saved.err).toContain(`${conceptFile}: aircraft.takeoffMass:`);
    expectOneLineError(saved.err);
    expect(JSON.parse((await cli('project', 'versions', file, '--json')).out)).toHaveLength(DEMO_CONCEPTS.length);
  });

  it('needs --note', async () => {
    const { folder, file } = await demoProject();
    const conceptFile = join(folder, 'c.json');
    writeFileSync(conceptFile, (await cli('project', 'show', file, '1')).out);
    const saved = await cli('project', 'save', file, conceptFile);
    expect(saved.code).toBe(2);
    expect(saved.err).toContain('--note');
  });

  it('says "read-only", naming the file, when saving into a read-only project', async () => {
    const { folder, file } = await demoProject();
    const conceptFile = join(folder, 'c.json');
    writeFileSync(conceptFile, (await cli('project', 'show', file, '1')).out);
    chmodSync(file, 0o444);
    restore.push(() => chmodSync(file, 0o644));
    const saved = await cli('project', 'save', file, conceptFile, '--note', 'x');
    expect(saved.code).toBe(2);
    expect(saved.err).toContain(file);
    expect(saved.err).toContain('read-only');
    expectOneLineError(saved.err);
  });

  it('names a missing concept file', async () => {
    const { folder, file } = await demoProject();
    const saved = await cli('project', 'save', file, join(folder, 'nope.json'), '--note', 'x');
    expect(saved.code).toBe(2);
    expect(saved.err).toContain('nope.json: no such file');
  });
});

describe('loftpoint project versions, show, compare', () => {
  it('versions: a readable table with the caution, or JSON only', async () => {
    const { file } = await demoProject();
    const table = await cli('project', 'versions', file);
    expect(table.code).toBe(0);
    expect(table.out).toMatch(/#\s+concept\s+parent\s+saved \(UTC\)\s+author\s+optimum\s+note/);
    for (const demo of DEMO_CONCEPTS) expect(table.out).toContain(demo.title.slice(0, 20));
    expect(table.out.trimEnd().endsWith(PRELIMINARY_CAUTION)).toBe(true);
    expect(table.out).not.toMatch(/NaN|undefined/);
    const json = await cli('project', 'versions', file, '--json');
    expect(JSON.parse(json.out)).toHaveLength(DEMO_CONCEPTS.length);
  });

  it('show: prints the concept JSON exactly as saved', async () => {
    const { folder, file } = await demoProject();
    const text = `{\n"format":"loftpoint-concept/1",\n${JSON.stringify(DEMO_CONCEPTS[0].concept).slice(1).replace('"format":"loftpoint-concept/1",', '')}`;
    const conceptFile = join(folder, 'odd-spacing.json');
    writeFileSync(conceptFile, text);
    const number = (await cli('project', 'save', file, conceptFile, '--note', 'odd spacing')).out.trim();
    const shown = await cli('project', 'show', file, number);
    expect(shown.code).toBe(0);
    expect(shown.out).toBe(text);
  });

  it('show: a version that does not exist or is not a number is exit 2 with one line', async () => {
    const { file } = await demoProject();
    const missing = await cli('project', 'show', file, '99');
    expect(missing.code).toBe(2);
    expect(missing.err).toContain('version 99 does not exist');
    expectOneLineError(missing.err);
    const word = await cli('project', 'show', file, 'latest');
    expect(word.code).toBe(2);
    expect(word.err).toContain('"latest" is not a version number');
  });

  it('compare: readable with the caution, or JSON', async () => {
    const { file } = await demoProject();
    const text = await cli('project', 'compare', file, '1', '2');
    expect(text.code).toBe(0);
    expect(text.out).toContain('Requirements:');
    expect(text.out).toContain('Margins at the design point:');
    expect(text.out.trimEnd().endsWith(PRELIMINARY_CAUTION)).toBe(true);
    const json = JSON.parse((await cli('project', 'compare', file, '1', '2', '--json')).out);
    expect(json.format).toBe('loftpoint-comparison/1');
    expect(json.a.number).toBe(1);
    expect(json.b.number).toBe(2);
  });

  it('a file that is not a project: exit 2, one line naming it, the file unchanged', async () => {
    const folder = freshFolder();
    const file = join(folder, 'notes.txt');
    writeFileSync(file, 'just some notes');
    const listed = await cli('project', 'versions', file);
    expect(listed.code).toBe(2);
    expect(listed.err).toContain(file);
    expect(listed.err).toContain('not a Loftpoint project');
    expectOneLineError(listed.err);
    expect(readFileSync(file, 'utf8')).toBe('just some notes');
  });
});

describe('loftpoint project export, import, backup', () => {
  it('round trip through an export file gives identical concepts and notes', async () => {
    const { folder, file } = await demoProject();
    const exportFile = join(folder, 'export.json');
    expect((await cli('project', 'export', file, '--out', exportFile)).code).toBe(0);
    const copy = join(folder, 'copy.loftpoint');
    expect((await cli('project', 'import', exportFile, copy)).code).toBe(0);
    for (let n = 1; n <= DEMO_CONCEPTS.length; n++) {
      expect((await cli('project', 'show', copy, String(n))).out).toBe((await cli('project', 'show', file, String(n))).out);
    }
    const notes = (f: string) => cli('project', 'versions', f, '--json').then((r) => JSON.parse(r.out).map((v: { note: string }) => v.note));
    expect(await notes(copy)).toEqual(await notes(file));
  });

  it('backup writes a new file that opens as the same project', async () => {
    const { folder, file } = await demoProject();
    const target = join(folder, 'backup.loftpoint');
    const result = await cli('project', 'backup', file, target);
    expect(result.code).toBe(0);
    expect((await cli('project', 'show', target, '3')).out).toBe((await cli('project', 'show', file, '3')).out);
  });
});
