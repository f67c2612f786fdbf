/**
 * What `loftpoint evaluate` reads: a concept JSON file, or one stored
 * version of a project file. Every way the input can be wrong becomes an
 * InputError that names the file, the field and what to change.
 */
import { closeSync, openSync, readSync, statSync } from 'node:fs';
import { parseConceptText } from '../../core/concept/parse';
import type { ConceptIssue, ConceptJson, Design, WarningJson } from '../../core';
import { InputError } from './errors';
import { STANDARD_INPUT, inputFileError, inputName, readInputText } from './input-text';
import { oneLine } from './output-file';
import { parseVersionRef, type VersionName } from '../service/version-ref';

/** A project file that could not be read for a reason other than the user's input (busy, I/O): exit status 1. */
export class ProjectReadFailure extends Error {
  constructor(readonly line: string) {
    super(line);
    this.name = 'ProjectReadFailure';
  }
}

/** Service error codes that are not the user's input. */
const NOT_INPUT = new Set(['busy', 'io', 'disk-full', 'internal']);

export interface EvaluateInput {
  /** The file as the user named it. */
  file: string;
  /** "trainer.json", or "project.loftpoint, version 3". */
  source: string;
  concept: ConceptJson;
  design: Design;
  /** Concept warnings from reading (defaults that fell back, and the like). */
  warnings: WarningJson[];
  /** The project-wide number of the stored version read; absent for a concept JSON file. */
  versionNumber?: number;
}

const SQLITE_HEADER = 'SQLite format 3\0';

/** Read FILE (and `--version`) into a resolved design, or throw InputError. */
export async function readEvaluateInput(file: string, version: string | undefined): Promise<EvaluateInput> {
  const kind = file === STANDARD_INPUT ? 'concept' : fileKind(file);
  if (kind === 'project') return readProjectVersion(file, version);
  if (version !== undefined) {
    throw new InputError('applies only to project files; this is a concept JSON file (drop --version, or name a project file)', inputName(file), '--version');
  }
  return conceptFrom(inputName(file), inputName(file), readInputText(file));
}

function fileKind(file: string): 'concept' | 'project' {
  let stats;
  try {
    stats = statSync(file);
  } catch (error) {
    throw inputFileError(error, file);
  }
  if (stats.isDirectory()) throw new InputError('is a folder; name a concept JSON file or a project file', file);
  if (!stats.isFile()) throw new InputError('is not a regular file; name a concept JSON file or a project file', file);
  const header = Buffer.alloc(16);
  let fd: number | undefined;
  try {
    fd = openSync(file, 'r');
    const read = readSync(fd, header, 0, 16, 0);
    return read === 16 && header.toString('latin1') === SQLITE_HEADER ? 'project' : 'concept';
  } catch (error) {
    throw inputFileError(error, file);
  } finally {
    if (fd !== undefined) closeSync(fd);
  }
}

function conceptFrom(file: string, source: string, text: string): EvaluateInput {
  const parsed = parseConceptText(text);
  if (!parsed.ok) throw issueError(file, parsed.issues);
  return { file, source, concept: parsed.concept, design: parsed.design, warnings: parsed.warnings };
}

/** The first problem on one line, with a count of the rest. */
function issueError(file: string, issues: readonly ConceptIssue[]): InputError {
  const [first] = issues;
  if (!first) return new InputError('is not a valid concept', file);
  const more = issues.length > 1 ? ` (and ${issues.length - 1} more problem${issues.length > 2 ? 's' : ''})` : '';
  return new InputError(`${oneLine(first.message)}${more}`, file, first.path);
}

function versionRef(file: string, version: string | undefined): VersionName {
  if (version === undefined) {
    throw new InputError(`is a project file; say which version to evaluate with --version N or --version CONCEPT@N (list them with: loftpoint project versions ${file})`, file, '--version');
  }
  if (!/^\s*\d+\s*$/.test(version) && !version.includes('@')) {
    throw new InputError(`must be a version number (1, 2, 3, ...), not "${oneLine(version)}"`, file, '--version');
  }
  const ref = parseVersionRef(version);
  if ('error' in ref) throw new InputError(oneLine(ref.error), file, '--version');
  return ref;
}

/** "version 3", or "Trainer v2" for a concept's own number. */
function refText(ref: VersionName): string {
  return ref.kind === 'project' ? `version ${ref.number}` : `${ref.concept} v${ref.version}`;
}

async function readProjectVersion(file: string, version: string | undefined): Promise<EvaluateInput> {
  const ref = versionRef(file, version);
  // Loaded only here: reading a concept JSON file never touches the native SQLite module.
  const service = await import('../service');
  let detail;
  try {
    detail = service.getStoredVersion(file, ref);
  } catch (error) {
    const failure = service.toServiceError(error);
    const message = oneLine(failure.message).replace(new RegExp(`^${escapeRegExp(file)}:\\s*`), '');
    if (NOT_INPUT.has(failure.code)) throw new ProjectReadFailure(`${file}: ${message}`);
    throw new InputError(message, file, failure.code === 'not-found' ? '--version' : failure.field);
  }
  const source = ref.kind === 'project' ? `version ${detail.number}` : `${refText(ref)} (version ${detail.number})`;
  return { ...conceptFrom(file, `${file}, ${source}`, detail.conceptText), versionNumber: detail.number };
}

function escapeRegExp(text: string): string {
  return text.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
}
