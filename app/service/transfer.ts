/**
 * The export documents, `loftpoint-project-export/1` and
 * `loftpoint-version-export/1`: checked from `unknown` before an import
 * touches any file, with messages that name the field.
 */
import * as z from 'zod';
import type { EvaluationSummary, ExportedVersion, ProjectExport, VersionExport } from './contract';
import { ServiceFailure } from './failure';

export const PROJECT_EXPORT_FORMAT = 'loftpoint-project-export/1';
export const VERSION_EXPORT_FORMAT = 'loftpoint-version-export/1';

const isoTime = z.string().min(1).max(64);
const summary = z
  .looseObject({ format: z.literal('loftpoint-version-summary/1'), axis: z.enum(['powerToWeight', 'thrustToWeight']) })
  .transform((value) => value as unknown as EvaluationSummary);

const exportedVersion = z.strictObject({
  number: z.number().int().positive(),
  concept: z.string().min(1).max(200),
  parent: z.number().int().positive().nullable(),
  author: z.string().max(200),
  createdAt: isoTime,
  note: z.string(),
  tags: z.array(z.string().min(1).max(64)),
  conceptText: z.string(),
  summary,
});

const projectExport = z.strictObject({
  format: z.literal(PROJECT_EXPORT_FORMAT),
  exportedAt: isoTime,
  project: z.strictObject({
    name: z.string().min(1).max(200),
    description: z.string(),
    units: z.enum(['si', 'us', 'kt-ft']),
    createdAt: isoTime,
  }),
  concepts: z.array(z.strictObject({ name: z.string().min(1).max(200), createdAt: isoTime })),
  versions: z.array(exportedVersion),
});

const versionExport = z.strictObject({
  format: z.literal(VERSION_EXPORT_FORMAT),
  exportedAt: isoTime,
  project: z.strictObject({ name: z.string().min(1).max(200) }),
  version: exportedVersion,
});

function path(parts: readonly PropertyKey[]): string {
  return parts.reduce<string>(
    (text, key) => (typeof key === 'number' ? `${text}[${key}]` : text === '' ? String(key) : `${text}.${String(key)}`),
    '',
  );
}

function refuse(issues: readonly z.core.$ZodIssue[], source: string): ServiceFailure {
  const first = issues[0];
  const where = first && first.path.length > 0 ? path(first.path) : '(document)';
  return new ServiceFailure('bad-request', `${source}: ${where}: ${first?.message ?? 'is not valid'}`, { field: where });
}

/** Checks a project or version export; references between versions are checked too. */
export function readExport(document: unknown, source = 'import'): ProjectExport | VersionExport {
  const format = (document as { format?: unknown } | null)?.format;
  if (format === VERSION_EXPORT_FORMAT) {
    const parsed = versionExport.safeParse(document);
    if (!parsed.success) throw refuse(parsed.error.issues, source);
    return parsed.data as VersionExport;
  }
  if (format !== PROJECT_EXPORT_FORMAT) {
    throw new ServiceFailure(
      'bad-request',
      `${source}: format: expected "${PROJECT_EXPORT_FORMAT}" or "${VERSION_EXPORT_FORMAT}", got ${JSON.stringify(format ?? null)}`,
      { field: 'format' },
    );
  }
  const parsed = projectExport.safeParse(document);
  if (!parsed.success) throw refuse(parsed.error.issues, source);
  const data = parsed.data as ProjectExport;
  checkReferences(data, source);
  return data;
}

function checkReferences(data: ProjectExport, source: string): void {
  const concepts = new Set<string>();
  data.concepts.forEach((concept, index) => {
    if (concepts.has(concept.name)) throw fieldError(source, `concepts[${index}].name`, `"${concept.name}" appears twice`);
    concepts.add(concept.name);
  });
  const numbers = new Set<number>();
  data.versions.forEach((version: ExportedVersion, index) => {
    const at = `versions[${index}]`;
    if (numbers.has(version.number)) throw fieldError(source, `${at}.number`, `version ${version.number} appears twice`);
    if (!concepts.has(version.concept)) throw fieldError(source, `${at}.concept`, `"${version.concept}" is not in concepts`);
    if (version.parent !== null && !numbers.has(version.parent)) {
      throw fieldError(source, `${at}.parent`, `version ${version.parent} must come before version ${version.number}`);
    }
    numbers.add(version.number);
  });
}

function fieldError(source: string, field: string, message: string): ServiceFailure {
  return new ServiceFailure('bad-request', `${source}: ${field}: ${message}`, { field });
}
