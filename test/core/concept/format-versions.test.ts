/**
 * The format's version number decides newer against older: loftpoint-concept/N
 * (the concept format's name, README.md and the format constant). A name that
 * only looks like a version of the current one is not read as it, and a
 * refusal lists every format the chain reads, in the order they are converted.
 * The chains below are made up to exercise the mechanism; each migrator is
 * built inside its test.
 */
import { describe, expect, it } from 'vitest';
import { CONCEPT_FORMAT, createConceptMigrator, migrateConcept } from '../../../core/concept';

const refused = (message: string) => ({ ok: false, issues: [{ path: 'format', message }] });

describe('format versions', () => {
  it('refuses "loftpoint-concept/01": number 1, but not the name of this build\'s format', () => {
    expect(CONCEPT_FORMAT).toBe('loftpoint-concept/1');
    expect(migrateConcept({ format: 'loftpoint-concept/01' })).toEqual(
      refused('"loftpoint-concept/01" is not a concept format. This build reads loftpoint-concept/1'),
    );
  });

  it('names every format of the chain, oldest first, when it refuses one', () => {
    const chain = createConceptMigrator([
      { from: 'loftpoint-draft', to: 'loftpoint-concept/0', migrate: (d) => ({ ...d, format: 'loftpoint-concept/0' }) },
      { from: 'loftpoint-concept/0', to: CONCEPT_FORMAT, migrate: (d) => ({ ...d, format: CONCEPT_FORMAT }) },
    ]);
    expect(chain({ format: 'loftpoint-concept/7' })).toEqual(
      refused('"loftpoint-concept/7" is newer than this build; open it with a newer Loftpoint. This build reads loftpoint-draft, loftpoint-concept/0, loftpoint-concept/1'),
    );
  });

  it('builds a reader for a current format without a version number, which calls no other name newer or older', () => {
    const unnumbered = createConceptMigrator([], 'loftpoint-concept/draft');
    expect(unnumbered({ format: 'loftpoint-concept/draft' })).toEqual({ ok: true, concept: { format: 'loftpoint-concept/draft' }, warnings: [] });
    expect(unnumbered({ format: 'loftpoint-concept/1' })).toEqual(
      refused('"loftpoint-concept/1" is not a concept format. This build reads loftpoint-concept/draft'),
    );
  });
});
