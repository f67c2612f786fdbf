/**
 * Building export documents from an open project, and a new project file
 * from a checked export: numbers, parents, notes, authors, times and tags as
 * they were, every concept re-checked against today's schema first.
 */
// @ts-nocheck

import { ProjectStore, createProjectFile, insertProjectRow, type FullVersionRow } from '../store';
import type { EvaluationSummary, ExportedVersion, ProjectExport, VersionExport } from './contract';
import { checkAndEvaluateText } from './engine';
import { PROJECT_EXPORT_FORMAT, VERSION_EXPORT_FORMAT } from './transfer';

export function exportedVersion(row: FullVersionRow): ExportedVersion {
  return {
    number: row.number,
    concept: row.conceptName,
    parent: row.parent,
    author: row.author,
    createdAt: row.createdAt,
    note: row.note,
    tags: [...row.tags],
    conceptText: row.conceptJson,
    summary: JSON.parse(row.evaluationJson) as EvaluationSummary,
  };
}

export function projectExport(store: ProjectStore, exportedAt: string): ProjectExport {
  const project = store.project();
  return {
    format: PROJECT_EXPORT_FORMAT,
    exportedAt,
    project: { name: project.name, description: project.description, units: project.units, createdAt: project.createdAt },
    concepts: store.concepts().map((concept) => ({ name: concept.name, createdAt: concept.createdAt })),
    versions: store.allVersions().map(exportedVersion),
  };
}

export function versionExport(store: ProjectStore, row: FullVersionRow, exportedAt: string): VersionExport {
  return { format: VERSION_EXPORT_FORMAT, exportedAt, project: { name: store.project().name }, version: exportedVersion(row) };
}

/** A version export seen as a one-version project (numbered 1, no parent). */
export function asProjectExport(document: ProjectExport | VersionExport): ProjectExport {
  if (document.format === PROJECT_EXPORT_FORMAT) return document;
  const { version } = document;
  return {
    format: PROJECT_EXPORT_FORMAT,
    exportedAt: document.exportedAt,
    project: { name: document.project.name, description: '', units: 'si', createdAt: version.createdAt },
    concepts: [{ name: version.concept, createdAt: version.createdAt }],
    versions: [{ ...version, number: 1, parent: null }],
  };
}

/** Creates `file` holding exactly the export's project; returns its absolute path. Never overwrites. */
export function writeImportedProject(file: string, data: ProjectExport): string {
  // Every concept must pass today's schema before anything is written.
  data.versions.forEach((version, index) => checkAndEvaluateText(version.conceptText, `versions[${index}].conceptText`));
  return createProjectFile(file, (db) => {
    insertProjectRow(db, data.project);
    const store = new ProjectStore({ db, file, readonly: false, schemaVersion: 0 });
    const ids = new Map(data.concepts.map((concept) => [concept.name, store.insertConcept(concept.name, concept.createdAt)]));
    for (const version of data.versions) {
      store.insertVersion({
        number: version.number,
        conceptId: ids.get(version.concept)!,
        parent: version.parent,
        conceptJson: version.conceptText,
        evaluationJson: JSON.stringify(version.summary),
        note: version.note,
        author: version.author,
        createdAt: version.createdAt,
      });
      for (const tag of version.tags) store.addTag(version.number, tag, version.createdAt);
    }
  });
}
