/**
 * "-" for standard input: a concept piped from one command into the next,
 * through the real bin. The configuration verbs then work on a project's
 * versions too: show a version, edit it, save it back as a new version.
 * Reference relations: the engine's own evaluation of the same demo (the
 * pipe must change nothing), and a project's version list.
 */
import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_CONCEPTS, evaluateDesign, parseConcept } from '../../core';

const ROOT = resolve(__dirname, '../..');
const bin = join(ROOT, 'app/cli/loftpoint.cjs');
let dir: string;
const loftpoint = (args: string[], input?: string) => spawnSync(process.execPath, [bin, ...args], { cwd: dir, encoding: 'utf8', input: input ?? '', timeout: 60_000 });
const trainer = DEMO_CONCEPTS.find((d) => d.slug === 'trainer')!;

beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'loftpoint-stdin-'));
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe('a concept from standard input', () => {
  it('evaluates as the same concept from a file would, naming standard input as the source', () => {
    const result = loftpoint(['evaluate', '-', '--json'], JSON.stringify(trainer.concept));
    expect(result.stderr).toBe('');
    expect(result.status).toBe(0);
    const parsed = parseConcept(trainer.concept);
    if (!parsed.ok) throw new Error('the trainer demo does not parse');
    const expected = evaluateDesign(parsed.design);
    const got = JSON.parse(result.stdout);
    expect(got.optimum.wingLoading).toBeCloseTo(expected.optimum!.wingLoading, 9);
    expect(got.optimum.powerToWeight).toBeCloseTo(expected.optimum!.powerToWeight!, 12);
    expect(loftpoint(['evaluate', '-'], JSON.stringify(trainer.concept)).stdout).toContain('Source: standard input');
  });

  it('names standard input in the one-line error, exit 2, nothing on stdout', () => {
    const result = loftpoint(['evaluate', '-'], '{ "name": ');
    expect(result.status).toBe(2);
    expect(result.stdout).toBe('');
    expect(result.stderr).toMatch(/^loftpoint: standard input: .*JSON/);
    expect(result.stderr.trimEnd().split('\n')).toHaveLength(1);
    const empty = loftpoint(['concept', 'add-configuration', '-', 'engine-out'], '');
    expect(empty.status).toBe(2);
    expect(empty.stderr).toMatch(/^loftpoint: standard input: is not valid JSON/);
  });

  it('edits a stored version through a pipe: show, add a configuration, save as a new version', () => {
    const project = join(dir, 'piped.loftpoint');
    expect(loftpoint(['project', 'create', project]).status).toBe(0);
    const first = loftpoint(['project', 'save', project, '-', '--note', 'from a pipe'], JSON.stringify(trainer.concept));
    expect(first.stderr).toBe('');
    expect(first.stdout.trim()).toBe('1');
    const shown = loftpoint(['project', 'show', project, '1']);
    const edited = loftpoint(['concept', 'add-configuration', '-', 'engine-out', '--cd0-increment', '0.015'], shown.stdout);
    expect(edited.status).toBe(0);
    expect(JSON.parse(edited.stdout).aircraft.aero.configurations['engine-out']).toEqual({ cd0Increment: 0.015 });
    const saved = loftpoint(['project', 'save', project, '-', '--note', 'engine-out added'], edited.stdout);
    expect(saved.stdout.trim()).toBe('2');
    const stored = JSON.parse(loftpoint(['project', 'show', project, '2']).stdout);
    expect(stored.aircraft.aero.configurations['engine-out']).toEqual({ cd0Increment: 0.015 });
    expect(loftpoint(['project', 'versions', project]).stdout).toMatch(/^2 .* 1 .*engine-out added/m);
  });
});
