/**
 * Reading older concept formats: each migration takes a document of one
 * format to the next, and a chain of them brings it to CONCEPT_FORMAT. A
 * format this build does not know, or one newer than it, is refused with a
 * message rather than misread.
 */
// @ts-nocheck

import type { WarningJson } from '../evaluation';
import { CONCEPT_FORMAT, type ConceptIssue } from './format';

export type ConceptDocument = Record<string, unknown>;

export interface ConceptMigration {
  from: string;
  to: string;
  /** Returns a new document; never changes the one it is given. */
  migrate(document: ConceptDocument): ConceptDocument;
}

/** The formats before CONCEPT_FORMAT, oldest first. Only /1 exists so far. */
export const CONCEPT_MIGRATIONS: readonly ConceptMigration[] = [];

export type MigrationResult =
  | { ok: true; concept: ConceptDocument; warnings: WarningJson[] }
  | { ok: false; issues: ConceptIssue[] };

const VERSIONED = /^loftpoint-concept\/(\d+)$/;

function refuse(path: string, message: string): MigrationResult {
  return { ok: false, issues: [{ path, message }] };
}

/** A migrator over a given chain; `migrateConcept` is the one this build uses. */
export function createConceptMigrator(migrations: readonly ConceptMigration[], current: string = CONCEPT_FORMAT) {
  const readable = [...migrations.map((m) => m.from), current].join(', ');
  const currentVersion = Number(VERSIONED.exec(current)?.[1] ?? NaN);

  return function migrate(input: unknown): MigrationResult {
    if (input === null || typeof input !== 'object' || Array.isArray(input)) {
      return refuse('', `a concept must be a JSON object { "format": "${current}", ... }`);
    }
    const start = (input as ConceptDocument).format;
    if (start === undefined) return refuse('format', `is missing; this build reads ${readable} (add "format": "${current}")`);
    if (typeof start !== 'string') return refuse('format', `must be a format name such as "${current}" (got ${JSON.stringify(start)})`);

    let document = input as ConceptDocument;
    let format = start;
    for (let step = 0; format !== current; step++) {
      const migration = migrations.find((m) => m.from === format);
      const version = Number(VERSIONED.exec(format)?.[1] ?? NaN);
      if (!migration) {
        const why =
          version > currentVersion
            ? 'is newer than this build; open it with a newer Loftpoint'
            : version < currentVersion
              ? 'is an older format this build cannot convert'
              : 'is not a concept format';
        return refuse('format', `"${format}" ${why}. This build reads ${readable}`);
      }
      if (step > migrations.length) return refuse('format', `migrations from "${start}" do not reach "${current}"`);
      document = migration.migrate(structuredClone(document));
      if (document.format !== migration.to) return refuse('format', `migration from "${format}" did not produce "${migration.to}"`);
      format = migration.to;
    }
    const warnings: WarningJson[] =
      start === current
        ? []
        : [{ code: 'format-migrated', field: 'format', message: `read as ${start} and converted to ${current}; saving writes ${current}` }];
    return { ok: true, concept: document, warnings };
  };
}

/** Bring a concept document to CONCEPT_FORMAT, or say why it cannot be read. */
export const migrateConcept = createConceptMigrator(CONCEPT_MIGRATIONS);
