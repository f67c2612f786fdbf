/**
 * Reading older or foreign formats: the exact refusal for each case, and the
 * older field names moved to their new names in place. The formats and names
 * are the concept format's own (loftpoint-concept/N); the chains below are
 * made up to exercise the mechanism.
 */
import { describe, expect, it } from 'vitest';
import { CONCEPT_FORMAT, createConceptMigrator, migrateConcept, renameOlderFields, type ConceptDocument } from '../../../core/concept';
import { exampleConcept } from './fixture';

const refused = (path: string, message: string) => ({ ok: false, issues: [{ path, message }] });

describe('refusals, word for word', () => {
  it.each<[string, unknown, string, string]>([
    ['an older format', { format: 'loftpoint-concept/0' }, 'format', '"loftpoint-concept/0" is an older format this build cannot convert. This build reads loftpoint-concept/1'],
    ['a foreign format', { format: 'sizing-sheet/3' }, 'format', '"sizing-sheet/3" is not a concept format. This build reads loftpoint-concept/1'],
    ['a newer format', { format: 'loftpoint-concept/12' }, 'format', '"loftpoint-concept/12" is newer than this build; open it with a newer Loftpoint. This build reads loftpoint-concept/1'],
    ['a format that is a number', { format: 1 }, 'format', 'must be a format name such as "loftpoint-concept/1" (got 1)'],
    ['a format that is null', { format: null }, 'format', 'must be a format name such as "loftpoint-concept/1" (got null)'],
    ['no format', {}, 'format', 'is missing; this build reads loftpoint-concept/1 (add "format": "loftpoint-concept/1")'],
    ['a list', [], '', 'a concept must be a JSON object { "format": "loftpoint-concept/1", ... }'],
    ['null', null, '', 'a concept must be a JSON object { "format": "loftpoint-concept/1", ... }'],
    ['a number', 3, '', 'a concept must be a JSON object { "format": "loftpoint-concept/1", ... }'],
  ])('%s', (_what, input, path, message) => {
    expect(migrateConcept(input)).toEqual(refused(path, message));
  });

  it('a migration that gives the wrong format, and a chain that never arrives', () => {
    const wrong = createConceptMigrator([{ from: 'old', to: CONCEPT_FORMAT, migrate: (d) => ({ ...d, format: 'other' }) }]);
    expect(wrong({ format: 'old' })).toEqual(refused('format', 'migration from "old" did not produce "loftpoint-concept/1"'));
    const circle = createConceptMigrator([
      { from: 'a', to: 'b', migrate: (d) => ({ ...d, format: 'b' }) },
      { from: 'b', to: 'a', migrate: (d) => ({ ...d, format: 'a' }) },
    ]);
    expect(circle({ format: 'a' })).toEqual(refused('format', 'migrations from "a" do not reach "loftpoint-concept/1"'));
  });

  it('a two-step chain runs both steps and only those, and reports the format it started from', () => {
    let steps = 0;
    const chain = createConceptMigrator([
      { from: 'v0', to: 'v1', migrate: (d) => (steps++, { ...d, format: 'v1', a: 1 }) },
      { from: 'v1', to: CONCEPT_FORMAT, migrate: (d) => (steps++, { ...d, format: CONCEPT_FORMAT, b: 2 }) },
    ]);
    const result = chain({ format: 'v0' });
    expect(steps).toBe(2);
    expect(result).toEqual({
      ok: true,
      concept: { format: CONCEPT_FORMAT, a: 1, b: 2 },
      warnings: [{ code: 'format-migrated', field: 'format', message: 'read as v0 and converted to loftpoint-concept/1; saving writes loftpoint-concept/1' }],
    });
    // The newest format's own number decides newer against older: /0 with a build at /1.
    const numbered = createConceptMigrator([], 'loftpoint-concept/5');
    expect(numbered({ format: 'loftpoint-concept/4' })).toEqual(refused('format', '"loftpoint-concept/4" is an older format this build cannot convert. This build reads loftpoint-concept/5'));
    expect(numbered({ format: 'loftpoint-concept/6' })).toEqual(refused('format', '"loftpoint-concept/6" is newer than this build; open it with a newer Loftpoint. This build reads loftpoint-concept/5'));
  });
});

describe('older field names', () => {
  it('moves speedFactor to approachSpeedFactor in the same place, leaving the input and other requirements alone', () => {
    const document: ConceptDocument = {
      format: CONCEPT_FORMAT,
      requirements: [
        { id: 'app', kind: 'approach-speed', speedFactor: 1.25, speed: '90 kt' },
        { id: 'c', kind: 'cruise', speed: '100 kt' },
        'not an object',
        null,
        ['a list'],
      ],
    };
    const before = structuredClone(document);
    const result = renameOlderFields(document);
    if (!result.ok) throw new Error('refused');
    const [approach, ...rest] = result.concept.requirements as unknown[];
    expect(Object.entries(approach as object)).toEqual([
      ['id', 'app'],
      ['kind', 'approach-speed'],
      ['approachSpeedFactor', 1.25],
      ['speed', '90 kt'],
    ]);
    expect(rest).toEqual([{ id: 'c', kind: 'cruise', speed: '100 kt' }, 'not an object', null, ['a list']]);
    expect(document).toEqual(before);
  });

  it('gives back the very document when nothing is renamed, or when requirements is not a list', () => {
    const plain = exampleConcept();
    expect(renameOlderFields(plain)).toEqual({ ok: true, concept: plain });
    expect((renameOlderFields(plain) as { concept: unknown }).concept).toBe(plain);
    const odd = { format: CONCEPT_FORMAT, requirements: { speedFactor: 1 } };
    expect((renameOlderFields(odd) as { concept: unknown }).concept).toBe(odd);
  });

  it('renames climbSpeedFactor only on a climb gradient, and refuses both names on one requirement', () => {
    const result = renameOlderFields({ requirements: [{ kind: 'climb-gradient', speedFactor: 1.2 }, { kind: 'stall', speedFactor: 1.1 }] });
    expect(result).toEqual({ ok: true, concept: { requirements: [{ kind: 'climb-gradient', climbSpeedFactor: 1.2 }, { kind: 'stall', speedFactor: 1.1 }] } });
    expect(renameOlderFields({ requirements: [{ kind: 'stall' }, { kind: 'climb-gradient', speedFactor: 1.2, climbSpeedFactor: 1.2 }] })).toEqual(
      refused('requirements[1].speedFactor', 'is the older name of climbSpeedFactor, which is also given; keep only climbSpeedFactor'),
    );
  });
});
