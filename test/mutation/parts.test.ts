import { readdirSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
// @ts-expect-error plain JavaScript module of the mutation runner, without types
import { mutationParts } from './parts.js';
// @ts-expect-error plain JavaScript module of the mutation runner, without types
import { mergedReport, score, scoreTable, statusCounts } from './report-counts.js';

const root = new URL('../..', import.meta.url).pathname;
type Part = { name: string; mutate: string[]; tests: string[]; skip?: string[] };
const parts = mutationParts as Part[];

describe('the parts of `npm run test:mutation`', () => {
  it('name every folder of core/ (so a new folder cannot be left out of the score) and the files at its top', () => {
    const folders = readdirSync(join(root, 'core')).filter((entry) => statSync(join(root, 'core', entry)).isDirectory());
    const mutated = parts.flatMap((part) => part.mutate);
    for (const folder of folders) expect(mutated, `core/${folder}`).toContain(`core/${folder}/**/*.ts`);
    expect(mutated).toContain('core/*.ts');
  });

  it('each run the tests of a folder or file that exists in test/core', () => {
    for (const part of parts) {
      for (const tests of part.tests) {
        if (tests.includes('*')) continue;
        const found = statSync(join(root, 'test/core', tests));
        expect(tests.endsWith('.test.ts') ? found.isFile() : found.isDirectory(), `${part.name}: test/core/${tests}`).toBe(true);
      }
      for (const skipped of part.skip ?? []) expect(statSync(join(root, 'test/core', skipped)).isFile(), `${part.name}: test/core/${skipped}`).toBe(true);
    }
  });

  it('each leave out the index files and nothing is named twice', () => {
    for (const part of parts) expect(part.mutate, part.name).toContain('!core/**/index.ts');
    expect(new Set(parts.map((part) => part.name)).size).toBe(parts.length);
  });
});

// A report of the mutation-testing-report schema, by hand: two files, ten counted mutants and two not counted.
const mutant = (status: string) => ({ id: status, mutatorName: 'ConditionalExpression', status, location: { start: { line: 1, column: 1 }, end: { line: 1, column: 2 } }, coveredBy: ['t1'] });
const report = {
  schemaVersion: '2',
  thresholds: { high: 90, low: 80 },
  files: {
    'core/a.ts': { language: 'typescript', source: 'a', mutants: [...Array(6).fill('Killed'), 'Timeout', 'Ignored'].map(mutant) },
    'core/b.ts': { language: 'typescript', source: 'b', mutants: ['Killed', 'Survived', 'NoCoverage', 'CompileError'].map(mutant) },
  },
};

describe('the score over core/', () => {
  it('counts killed and timed out as detected, survived and uncovered as not, and leaves ignored and compile errors out', () => {
    const counts = statusCounts(report);
    expect(counts).toEqual({ Killed: 7, Timeout: 1, Survived: 1, NoCoverage: 1 });
    expect(score(counts)).toBeCloseTo(80, 12); // 8 of 10, by hand
    expect(score({ Killed: 0, Timeout: 0, Survived: 0, NoCoverage: 0 })).toBeNull();
  });

  it('sums the parts run and says which parts are not in the score', () => {
    const table: string = scoreTable([
      { part: 'units', Killed: 7, Timeout: 1, Survived: 1, NoCoverage: 1 },
      { part: 'mission', Killed: 9, Timeout: 0, Survived: 1, NoCoverage: 0 },
      { part: 'studies', missing: true },
    ]);
    const lines = table.split('\n');
    expect(lines[2]).toMatch(/^units\s+10\s+7\s+1\s+1\s+1\s+80\.0 %$/);
    expect(lines[3]).toMatch(/^mission\s+10\s+9\s+0\s+1\s+0\s+90\.0 %$/);
    expect(lines[4]).toMatch(/^studies\s+not run/);
    expect(lines[5]).toMatch(/^core\/ \(parts run\)\s+20\s+16\s+1\s+2\s+1\s+85\.0 %$/); // 17 of 20, by hand
    expect(lines[6]).toBe('Not run yet, so not in the score: studies.');
  });

  it('merges the parts into one report with every file once and no test details', () => {
    const merged = mergedReport([report, { files: { 'core/c.ts': { language: 'typescript', source: 'c', mutants: [mutant('Survived')] } } }]);
    expect(Object.keys(merged.files)).toEqual(['core/a.ts', 'core/b.ts', 'core/c.ts']);
    expect(merged.files['core/c.ts'].mutants[0]).not.toHaveProperty('coveredBy');
    expect(statusCounts(merged)).toEqual({ Killed: 7, Timeout: 1, Survived: 2, NoCoverage: 1 });
  });
});
