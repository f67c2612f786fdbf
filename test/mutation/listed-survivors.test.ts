import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
// @ts-expect-error plain JavaScript module of the mutation runner, without types
import { listedPlaces, survivors, unlistedLines } from './listed-survivors.js';

// The three ways equivalent.md names a place, as its sections use them.
const markdown = `# Equivalent mutants in core/

## core/constraints/best-rate-speed.ts (a file heading)

| place | mutation | why equivalent |
| --- | --- | --- |
| 25:19 | \`i < 50\` to \`i <= 50\` | one more step |

## core/studies: bands, tornado (a folder heading)

| place | mutation | why no test can tell |
| --- | --- | --- |
| bands.ts 86:15, 87:15, column-counts.ts 27:26 | \`>=\` to \`>\` | equal value |

## core/numeric/bracket-root.ts, checked again (with test/core/numeric)

| place | mutation | why equivalent |
| --- | --- | --- |
| 25:30 | \`>\` to \`>=\` | tolerance |

## core/diagram/optimum.ts (rows that wait for a test are not listings)

| place | mutation | why |
| --- | --- | --- |
| 40:9 | \`<=\` to \`<\` | equal values only |
| 47:25 | band to 100x | not killed: only widens the search |

| place | mutation | why not killed |
| --- | --- | --- |
| 58:10 | no slice | a test would need several sharp minima |

## Places moved (a heading without a folder: whole paths in the rows)

| place | mutation | why equivalent |
| --- | --- | --- |
| core/units/display.ts 119:7 | guard | same |

## core/requirements and core/assumptions (two folders)

| place | mutation | why equivalent |
| --- | --- | --- |
| stall.ts 31:7 | guard | unreachable |
`;

const mutant = (line: number, column: number, status: string) => ({
  id: `${line}:${column}`,
  mutatorName: 'EqualityOperator',
  replacement: 'a  >=\n b',
  status,
  location: { start: { line, column }, end: { line, column: column + 1 } },
});

describe('the survivors equivalent.md lists', () => {
  it('reads places under file headings, folder headings and headings naming two folders', () => {
    expect([...listedPlaces(markdown)].sort()).toEqual([
      'core/assumptions/stall.ts 31:7',
      'core/constraints/best-rate-speed.ts 25:19',
      'core/diagram/optimum.ts 40:9',
      'core/numeric/bracket-root.ts 25:30',
      'core/requirements/stall.ts 31:7',
      'core/studies/bands.ts 86:15',
      'core/studies/bands.ts 87:15',
      'core/studies/column-counts.ts 27:26',
      'core/units/display.ts 119:7',
    ]);
  });

  it('counts survived and uncovered mutants only, and a listed place only in its own file', () => {
    const report = {
      files: {
        '/repo/core/studies/bands.ts': { mutants: [mutant(86, 15, 'Survived'), mutant(86, 16, 'Survived'), mutant(87, 15, 'Killed'), mutant(1, 1, 'Ignored')] },
        // The same place in another folder's file of the same name is not listed.
        '/repo/core/constraints/stall.ts': { mutants: [mutant(31, 7, 'NoCoverage')] },
        '/repo/core/requirements/stall.ts': { mutants: [mutant(31, 7, 'Survived'), mutant(40, 2, 'Timeout')] },
      },
    };
    const found = survivors(report, markdown);
    expect(found.map((s: { file: string; line: number; column: number; listed: boolean }) => `${s.file} ${s.line}:${s.column} ${s.listed}`)).toEqual([
      'core/constraints/stall.ts 31:7 false',
      'core/requirements/stall.ts 31:7 true',
      'core/studies/bands.ts 86:15 true',
      'core/studies/bands.ts 86:16 false',
    ]);
    expect(unlistedLines(found)).toEqual([
      'core/constraints/stall.ts 31:7 NoCoverage EqualityOperator -> a >= b',
      'core/studies/bands.ts 86:16 Survived EqualityOperator -> a >= b',
    ]);
  });

  it('finds the places of the project\'s own equivalent.md (a sample of its sections)', () => {
    const places = listedPlaces(readFileSync(new URL('./equivalent.md', import.meta.url), 'utf8'));
    expect(places).toContain('core/constraints/best-rate-speed.ts 25:19');
    expect(places).toContain('core/diagram/default-range.ts 53:19');
    expect(places).toContain('core/studies/random.ts 31:19');
    expect(places).toContain('core/units/display.ts 105:25');
  });
});
