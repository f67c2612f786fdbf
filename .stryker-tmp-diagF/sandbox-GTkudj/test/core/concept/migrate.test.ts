// @ts-nocheck
import { describe, expect, it } from 'vitest';
import {
  CONCEPT_FORMAT,
  CONCEPT_MIGRATIONS,
  createConceptMigrator,
  migrateConcept,
  parseConcept,
  type ConceptDocument,
  type ConceptMigration,
} from '../../../core/concept';
import { exampleConcept } from './fixture';

// A made-up history for testing the mechanism: /0 wrote the take-off mass as
// `mtow` under the top level, and called the format by a shorter name.
const renameMass: ConceptMigration = {
  from: 'loftpoint-concept/0',
  to: CONCEPT_FORMAT,
  migrate: (doc: ConceptDocument) => {
    const { mtow, ...rest } = doc;
    const aircraft = { ...(rest.aircraft as ConceptDocument), takeoffMass: mtow };
    return { ...rest, format: CONCEPT_FORMAT, aircraft };
  },
};
const fromDraft: ConceptMigration = {
  from: 'loftpoint-draft',
  to: 'loftpoint-concept/0',
  migrate: (doc) => ({ ...doc, format: 'loftpoint-concept/0' }),
};

function olderConcept(format: string): ConceptDocument {
  const c = exampleConcept();
  const mtow = c.aircraft.takeoffMass;
  delete c.aircraft.takeoffMass;
  return { ...c, format, mtow };
}

describe('migrateConcept', () => {
  it('reads the current format as it is, with nothing to report', () => {
    const input = exampleConcept();
    const result = migrateConcept(input);
    expect(result).toEqual({ ok: true, concept: input, warnings: [] });
  });

  it('has no older formats yet', () => {
    expect(CONCEPT_MIGRATIONS).toEqual([]);
    expect(CONCEPT_FORMAT).toBe('loftpoint-concept/1');
  });

  it('refuses a newer format, saying which formats this build reads', () => {
    const result = migrateConcept({ ...exampleConcept(), format: 'loftpoint-concept/7' });
    expect(result).toEqual({
      ok: false,
      issues: [{ path: 'format', message: '"loftpoint-concept/7" is newer than this build; open it with a newer Loftpoint. This build reads loftpoint-concept/1' }],
    });
  });

  it('refuses an older format it has no migration for', () => {
    const result = migrateConcept({ ...exampleConcept(), format: 'loftpoint-concept/0' });
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.issues[0].message).toMatch(/older format this build cannot convert/);
  });

  it('refuses a document with no format, a format that is not text, or that is not an object', () => {
    const { format: _dropped, ...unnamed } = exampleConcept();
    for (const [input, pattern] of [
      [unnamed, /^is missing; this build reads loftpoint-concept\/1/],
      [{ ...unnamed, format: 1 }, /must be a format name/],
      [null, /must be a JSON object/],
      ['loftpoint-concept/1', /must be a JSON object/],
      [[], /must be a JSON object/],
    ] as const) {
      const result = migrateConcept(input);
      expect(result.ok).toBe(false);
      if (!result.ok) expect(result.issues[0].message).toMatch(pattern);
    }
  });
});

describe('createConceptMigrator: the migration chain', () => {
  const migrate = createConceptMigrator([fromDraft, renameMass]);

  it('brings an older document to the current format and says so', () => {
    const input = olderConcept('loftpoint-concept/0');
    const before = JSON.stringify(input);
    const result = migrate(input);
    if (!result.ok) throw new Error(JSON.stringify(result.issues));
    expect(result.concept.format).toBe(CONCEPT_FORMAT);
    expect(result.concept).toEqual(exampleConcept());
    expect(result.warnings).toEqual([
      { code: 'format-migrated', field: 'format', message: 'read as loftpoint-concept/0 and converted to loftpoint-concept/1; saving writes loftpoint-concept/1' },
    ]);
    // The document given is left as it was.
    expect(JSON.stringify(input)).toBe(before);
    // The migrated document is a valid concept.
    expect(parseConcept(result.concept).ok).toBe(true);
  });

  it('follows a chain of several steps', () => {
    const result = migrate(olderConcept('loftpoint-draft'));
    expect(result.ok && result.concept).toEqual(exampleConcept());
  });

  it('lists every format it reads when refusing one', () => {
    const result = migrate({ format: 'loftpoint-concept/9' });
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.issues[0].message).toMatch(/This build reads loftpoint-draft, loftpoint-concept\/0, loftpoint-concept\/1$/);
  });

  it('refuses a migration that does not produce the format it promised', () => {
    const broken = createConceptMigrator([{ from: 'loftpoint-concept/0', to: CONCEPT_FORMAT, migrate: (doc) => ({ ...doc }) }]);
    const result = broken({ format: 'loftpoint-concept/0' });
    expect(result).toEqual({ ok: false, issues: [{ path: 'format', message: expect.stringMatching(/did not produce "loftpoint-concept\/1"/) }] });
  });

  it('stops on a chain that goes round in circles', () => {
    const circular = createConceptMigrator([
      { from: 'a', to: 'b', migrate: (doc) => ({ ...doc, format: 'b' }) },
      { from: 'b', to: 'a', migrate: (doc) => ({ ...doc, format: 'a' }) },
    ]);
    const result = circular({ format: 'a' });
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.issues[0].message).toMatch(/do not reach/);
  });
});
