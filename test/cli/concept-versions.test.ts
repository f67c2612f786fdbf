/**
 * Version numbers per concept (v1, v2, ... within each concept, as users see
 * them) beside the project-wide numbers scripts rely on, and CONCEPT@N
 * wherever a version is named. The expected numbers follow from the saves the
 * test makes (four demos, then two saves), counted by hand.
 */
import { mkdtempSync, rmSync, writeFileSync, readdirSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { runInProcess } from './run-in-process';
import { DEMO_CONCEPTS } from '../../core';

let dir: string;
let project: string;

const run = runInProcess;

beforeAll(async () => {
  dir = mkdtempSync(join(tmpdir(), 'loftpoint-concept-versions-'));
  project = join(dir, 'p.loftpoint');
  const trainer = join(dir, 'trainer.json');
  writeFileSync(trainer, JSON.stringify(DEMO_CONCEPTS[0]!.concept));
  expect((await run('project', 'create', project, '--demo')).code).toBe(0); // versions 1-4, one per demo concept
  expect((await run('project', 'save', project, trainer, '--note', 'second trainer')).stdout).toBe('5\n'); // the trainer's v2
  expect((await run('project', 'branch', project, '1', '--name', 'High wing')).stdout).toBe('6\n'); // High wing v1
  expect((await run('project', 'save', project, trainer, '--concept', 'High wing', '--note', 'hw 2')).stdout).toBe('7\n'); // High wing v2
});

afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe('per-concept version numbers', () => {
  it('are listed beside the project-wide numbers, in text and JSON', async () => {
    const listed = JSON.parse((await run('project', 'versions', project, '--json')).stdout) as { number: number; conceptName: string; conceptVersion: number }[];
    expect(listed.map((v) => [v.number, v.conceptVersion])).toEqual([[1, 1], [2, 1], [3, 1], [4, 1], [5, 2], [6, 1], [7, 2]]);
    const text = (await run('project', 'versions', project)).stdout;
    expect(text).toMatch(/^7\s+High wing\s+v2\s+6\s/m);
    expect(text).toMatch(/^5\s+LP-2 two-seat trainer\s+v2\s+1\s/m);
    expect(text).toMatch(/Preliminary sizing only/);
  });

  it('name a version as CONCEPT@N (or CONCEPT@vN) wherever a version is taken; N stays project-wide', async () => {
    const byNumber = await run('project', 'show', project, '7');
    expect((await run('project', 'show', project, 'High wing@2')).stdout).toBe(byNumber.stdout);
    expect((await run('project', 'show', project, 'High wing@v2')).stdout).toBe(byNumber.stdout);
    const evaluated = await run('evaluate', project, '--version', 'High wing@1', '--json');
    expect(evaluated.stdout).toBe((await run('evaluate', project, '--version', '6', '--json')).stdout);
    const text = await run('evaluate', project, '--version', 'High wing@1');
    expect(text.stdout).toContain('High wing v1 (version 6)');
    const compared = await run('project', 'compare', project, 'LP-2 two-seat trainer@1', 'High wing@2');
    expect(compared.stdout).toMatch(/^Version 1 \("LP-2 two-seat trainer" v1, .*-> version 7 \("High wing" v2,/);
  });

  it('refuses a concept version that does not exist, naming the argument, with exit 2', async () => {
    expect(await run('project', 'show', project, 'High wing@3')).toMatchObject({ code: 2, stderr: 'loftpoint: VERSION: "High wing" has versions v1 to v2, not v3\n' });
    const none = await run('evaluate', project, '--version', 'Low wing@1');
    expect(none.code).toBe(2);
    expect(none.stderr).toBe(`loftpoint: ${project}: --version: the project has no concept named "Low wing"\n`);
    expect((await run('evaluate', project, '--version', 'x')).stderr).toMatch(/--version: must be a version number/);
    expect(readdirSync(dir).filter((f) => f.startsWith('p.loftpoint-'))).toEqual([]);
  });
});
