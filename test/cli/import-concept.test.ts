/**
 * `loftpoint project import-concept` and `project rename-concept`: a concept
 * file becomes a new concept of the project (its first version has no parent),
 * a file that fails its checks is refused with one line and nothing saved, and
 * a name already taken is refused naming --name. The expected numbers follow
 * from the saves the test makes (four demo versions, then the imports),
 * counted by hand.
 */
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { runInProcess } from './run-in-process';
import { DEMO_CONCEPTS } from '../../core';

let dir: string;
let project: string;
let trainer: string;

const run = runInProcess;

interface Listed {
  number: number;
  conceptName: string;
  conceptVersion: number;
  parent: number | null;
  note: string;
}
async function versions(): Promise<Listed[]> {
  return JSON.parse((await run('project', 'versions', project, '--json')).stdout) as Listed[];
}

beforeAll(async () => {
  dir = mkdtempSync(join(tmpdir(), 'loftpoint-import-concept-'));
  project = join(dir, 'p.loftpoint');
  trainer = join(dir, 'trainer.json');
  writeFileSync(trainer, JSON.stringify(DEMO_CONCEPTS[0]!.concept, null, 2));
  expect((await run('project', 'create', project, '--demo')).code).toBe(0); // versions 1-4
});

afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe('project import-concept', () => {
  it('adds the file as a new concept whose first version has no parent, with the default note', async () => {
    const imported = await run('project', 'import-concept', project, trainer, '--name', 'Trainer, long wing');
    expect(imported).toMatchObject({ code: 0, stdout: '5\n' });
    const fifth = (await versions()).find((v) => v.number === 5)!;
    expect(fifth).toMatchObject({ conceptName: 'Trainer, long wing', conceptVersion: 1, parent: null, note: 'Imported from trainer.json.' });
  });

  it('refuses a name already taken, naming --name, and saves nothing', async () => {
    const before = (await versions()).length;
    const taken = await run('project', 'import-concept', project, trainer, '--name', 'Trainer, long wing');
    expect(taken.code).toBe(2);
    expect(taken.stderr).toBe(
      `loftpoint: --name: a concept "Trainer, long wing" already exists in ${project}; choose another with --name (or add a version to it with: loftpoint project save)\n`,
    );
    expect((await versions()).length).toBe(before);
  });

  it('refuses a concept that fails its checks with one line naming the file and field, and saves nothing', async () => {
    const broken = join(dir, 'broken.json');
    const concept = structuredClone(DEMO_CONCEPTS[0]!.concept) as { aircraft: { aero: Record<string, unknown> } };
    delete concept.aircraft.aero.aspectRatio;
    concept.aircraft.aero.aspectRatoi = 7.4;
    writeFileSync(broken, JSON.stringify(concept));
    const before = (await versions()).length;
    const refused = await run('project', 'import-concept', project, broken, '--name', 'Broken');
    expect(refused.code).toBe(2);
    // One line: the file, the unknown field reported first with the nearest known name, then "nothing was imported".
    expect(refused.stderr).toMatch(new RegExp(`^loftpoint: ${broken.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}: aircraft\\.aero\\.aspectRatoi: .*aspectRatio.*nothing was imported\\n$`));
    expect((await versions()).length).toBe(before);
  });

  it('a project save of the same broken file says "nothing was saved"', async () => {
    const broken = join(dir, 'broken.json');
    const refused = await run('project', 'save', project, broken, '--note', 'try');
    expect(refused.code).toBe(2);
    expect(refused.stderr).toMatch(/aircraft\.aero\.aspectRatoi: .*nothing was saved\n$/);
  });
});

describe('project rename-concept', () => {
  it('renames a concept; its versions and their numbers stay', async () => {
    const renamed = await run('project', 'rename-concept', project, 'Trainer, long wing', 'Trainer, high aspect ratio');
    expect(renamed.code).toBe(0);
    expect(renamed.stdout).toMatch(/^Renamed concept "Trainer, long wing" to "Trainer, high aspect ratio" \(1 version\)\.\n/);
    expect(renamed.stdout).toMatch(/Preliminary sizing/);
    expect((await versions()).find((v) => v.number === 5)).toMatchObject({ conceptName: 'Trainer, high aspect ratio', conceptVersion: 1 });
  });
});
