/**
 * The project service: the one API the command line, the Electron window and
 * browser mode call. One project is current at a time. Methods take one
 * JSON-serialisable object and return JSON-serialisable values; failures are
 * ServiceFailure exceptions here and ServiceResult errors across a transport.
 */
import { ProjectStore, createProjectFile, insertProjectRow, openProjectFile, type FullVersionRow, type VersionRow } from '../store';
import type {
  BackupProjectRequest,
  BackupProjectResponse,
  CompareVersionsRequest,
  ConceptSummary,
  CreateProjectRequest,
  DeleteConceptRequest,
  Empty,
  EvaluationSummary,
  ImportConceptRequest,
  ImportProjectRequest,
  ImportVersionRequest,
  ListVersionsRequest,
  NewConceptRequest,
  OpenProjectRequest,
  ProjectExport,
  ProjectInfo,
  RenameConceptRequest,
  SaveVersionRequest,
  SaveVersionResponse,
  ServiceMethod,
  ServiceRequest,
  ServiceResponse,
  StartConceptRequest,
  TagRequest,
  UpdateProjectRequest,
  VersionComparison,
  VersionDetail,
  VersionExport,
  VersionRequest,
  VersionSummary,
} from './contract';
import { compareVersions } from './compare';
import { checkAndEvaluateText, checkedDemo, demoConcepts, type CheckedConcept } from './engine';
import { AIRCRAFT_KINDS, conceptStarter } from '../../core';
import { checkVersionNumber, cleanName, cleanTag, conceptInput, defaultAuthor } from './request-checks';
import { ServiceFailure, badRequest } from './failure';
import { VERSION_EXPORT_FORMAT, readExport } from './transfer';
import { asProjectExport, projectExport, versionExport, writeImportedProject } from './project-transfer';
import { backupTo } from './backup';

export interface ServiceOptions {
  /** Author of saved versions when a request names none. Default $LOFTPOINT_AUTHOR or the OS user name. */
  author?: string;
  /** The clock (tests). */
  now?: () => Date;
}

/** Every method of the contract, as this process implements it. */
export type ServiceHandlers = {
  [M in ServiceMethod]: (request: ServiceRequest<M>) => ServiceResponse<M> | Promise<ServiceResponse<M>>;
};

const FALLBACK_CONCEPT_NAME = 'Untitled concept';

/** A stored concept JSON with its `name` replaced, the rest unchanged (written with two-space indents, as demos are). */
function retitled(conceptJson: string, title: string): string {
  const concept: unknown = JSON.parse(conceptJson);
  if (typeof concept !== 'object' || concept === null || Array.isArray(concept)) return conceptJson;
  return `${JSON.stringify({ ...concept, name: title }, null, 2)}\n`;
}

export class ProjectService implements ServiceHandlers {
  #store: ProjectStore | null = null;
  readonly #author: string;
  readonly #now: () => Date;

  constructor(options: ServiceOptions = {}) {
    this.#author = options.author?.trim() || defaultAuthor();
    this.#now = options.now ?? (() => new Date());
  }

  #time(): string {
    return this.#now().toISOString();
  }

  #current(): ProjectStore {
    if (!this.#store) throw new ServiceFailure('no-project', 'no project is open: create or open a project first');
    return this.#store;
  }

  #writable(): ProjectStore {
    const store = this.#current();
    if (store.readonly) {
      throw new ServiceFailure(
        'read-only',
        `${store.file}: the project is open read-only (${store.readonlyReason ?? 'read-only'}); nothing was saved`,
        { file: store.file },
      );
    }
    return store;
  }

  #replace(store: ProjectStore): void {
    this.#store?.close();
    this.#store = store;
  }

  #info(store: ProjectStore): ProjectInfo {
    const project = store.project();
    const counts = store.counts();
    return {
      file: store.file,
      name: project.name,
      description: project.description,
      units: project.units,
      createdAt: project.createdAt,
      readonly: store.readonly,
      schemaVersion: store.schemaVersion,
      conceptCount: counts.concepts,
      versionCount: counts.versions,
    };
  }

  #summary(row: VersionRow): VersionSummary {
    return {
      number: row.number,
      conceptVersion: row.conceptVersion,
      conceptId: row.conceptId,
      conceptName: row.conceptName,
      parent: row.parent,
      author: row.author,
      createdAt: row.createdAt,
      note: row.note,
      tags: [...row.tags],
      summary: JSON.parse(row.evaluationJson) as EvaluationSummary,
    };
  }

  #detail(row: FullVersionRow): VersionDetail {
    let concept: unknown;
    try {
      concept = JSON.parse(row.conceptJson);
    } catch {
      concept = null;
    }
    return { ...this.#summary(row), conceptText: row.conceptJson, concept };
  }

  #version(store: ProjectStore, number: number, field = 'version'): FullVersionRow {
    const row = store.version(checkVersionNumber(number, field));
    if (!row) {
      const { versions } = store.counts();
      const range = versions === 0 ? 'it has no versions yet' : `it has versions 1 to ${versions}`;
      throw new ServiceFailure('not-found', `${store.file}: version ${number} does not exist (${range})`, { file: store.file, field });
    }
    return row;
  }

  // ------------------------------------------------------------ project

  createProject(request: CreateProjectRequest): ProjectInfo {
    const name = cleanName(request.name, 'name');
    const units = request.units ?? 'si';
    if (units !== 'si' && units !== 'us') throw badRequest('units', 'must be "si" or "us"');
    if (typeof request.file !== 'string' || request.file === '') throw badRequest('file', 'must be a file path');
    const createdAt = this.#time();
    const author = this.#author;
    const demos = request.demo
      ? demoConcepts().map((demo) => ({
          ...demo,
          text: `${JSON.stringify(demo.concept, null, 2)}\n`,
          checked: checkedDemo(demo),
        }))
      : [];
    const file = createProjectFile(request.file, (db) => {
      insertProjectRow(db, { name, description: request.description ?? '', units, createdAt });
      const store = new ProjectStore({ db, file: request.file, readonly: false, schemaVersion: 0 });
      for (const demo of demos) {
        const conceptId = store.insertConcept(demo.title, createdAt);
        store.insertVersion({
          conceptId,
          parent: null,
          conceptJson: demo.text,
          evaluationJson: JSON.stringify(demo.checked.summary),
          note: demo.summary,
          author,
          createdAt,
        });
      }
    });
    this.#replace(new ProjectStore(openProjectFile(file)));
    return this.#info(this.#current());
  }

  openProject(request: OpenProjectRequest): ProjectInfo {
    if (typeof request.file !== 'string' || request.file === '') throw badRequest('file', 'must be a file path');
    const store = new ProjectStore(openProjectFile(request.file, { readonly: request.readonly === true }));
    this.#replace(store);
    return this.#info(store);
  }

  closeProject(_request: Empty = {}): { closed: boolean } {
    const had = this.#store !== null;
    this.#store?.close();
    this.#store = null;
    return { closed: had };
  }

  getProject(_request: Empty = {}): ProjectInfo {
    return this.#info(this.#current());
  }

  updateProject(request: UpdateProjectRequest): ProjectInfo {
    const store = this.#writable();
    if (request.units !== undefined && request.units !== 'si' && request.units !== 'us') throw badRequest('units', 'must be "si" or "us"');
    store.updateProject({
      ...(request.name !== undefined ? { name: cleanName(request.name, 'name') } : {}),
      ...(request.description !== undefined ? { description: request.description } : {}),
      ...(request.units !== undefined ? { units: request.units } : {}),
    });
    return this.#info(store);
  }

  // ------------------------------------------------------------ concepts and versions

  listConcepts(_request: Empty = {}): ConceptSummary[] {
    return this.#current()
      .concepts()
      .map((concept) => ({ ...concept }));
  }

  renameConcept(request: RenameConceptRequest): ConceptSummary {
    const store = this.#writable();
    const from = cleanName(request.from, 'from');
    const to = cleanName(request.to, 'to');
    const concept = store.conceptByName(from);
    if (!concept) throw new ServiceFailure('not-found', `${store.file}: there is no concept "${from}"`, { file: store.file, field: 'from' });
    if (from !== to && store.conceptByName(to)) {
      throw new ServiceFailure('name-taken', `${store.file}: a concept "${to}" already exists`, { file: store.file, field: 'to' });
    }
    store.renameConcept(concept.id, to);
    return { ...store.conceptById(concept.id)! };
  }

  /** A new concept from a kind of aircraft's starting values; its first version has no parent. */
  newConcept(request: NewConceptRequest): SaveVersionResponse {
    this.#writable();
    const name = cleanName(request.name, 'name');
    const starter = conceptStarter(String(request.aircraftKind));
    if (!starter) throw badRequest('aircraftKind', `must be one of ${AIRCRAFT_KINDS.join(', ')}, got ${JSON.stringify(request.aircraftKind)}`);
    const text = `${JSON.stringify(starter.concept(name), null, 2)}\n`;
    const note = request.note?.trim() || `New ${starter.title.toLowerCase()} concept from starting values: replace them with the programme's own.`;
    return this.#firstVersion(name, text, checkAndEvaluateText(text, `new ${starter.kind} concept`), note, request.author);
  }

  /** A concept file's text as a new concept; checked first, nothing saved when it fails (every issue by field). */
  importConcept(request: ImportConceptRequest): SaveVersionResponse {
    this.#writable();
    if (typeof request.conceptText !== 'string') throw badRequest('conceptText', 'must be the text of a concept file');
    const checked = checkAndEvaluateText(request.conceptText, 'imported concept');
    const name = request.name === undefined ? (checked.name ?? FALLBACK_CONCEPT_NAME) : cleanName(request.name, 'name');
    const note = request.note?.trim() || 'Imported from a concept file.';
    return this.#firstVersion(name, request.conceptText, checked, note, request.author);
  }

  #firstVersion(name: string, conceptJson: string, checked: CheckedConcept, note: string, author: string | undefined): SaveVersionResponse {
    const store = this.#writable();
    const createdAt = this.#time();
    const number = store.write(() => {
      if (store.conceptByName(name)) {
        throw new ServiceFailure('name-taken', `${store.file}: a concept "${name}" already exists; choose another name`, { file: store.file, field: 'name' });
      }
      return store.insertVersion({
        conceptId: store.insertConcept(name, createdAt),
        parent: null,
        conceptJson,
        evaluationJson: JSON.stringify(checked.summary),
        note,
        author: author?.trim() || this.#author,
        createdAt,
      });
    });
    return { version: this.#summary(store.version(number)!), warnings: checked.warnings };
  }

  /** Deletes a concept without versions; one with versions is refused (versions are kept forever: export them to take them elsewhere). */
  deleteConcept(request: DeleteConceptRequest): { deleted: string } {
    const store = this.#writable();
    const name = cleanName(request.name, 'name');
    const concept = store.conceptByName(name);
    if (!concept) throw new ServiceFailure('not-found', `${store.file}: there is no concept "${name}"`, { file: store.file, field: 'name' });
    if (concept.versionCount > 0 || !store.deleteEmptyConcept(concept.id)) {
      const count = store.conceptById(concept.id)?.versionCount ?? concept.versionCount;
      throw new ServiceFailure(
        'has-versions',
        `${store.file}: concept "${name}" has ${count} saved version${count === 1 ? '' : 's'}, and saved versions are never deleted; ` +
          'rename it to set it aside, or export its versions to keep them elsewhere',
        { file: store.file, field: 'name' },
      );
    }
    return { deleted: name };
  }

  listVersions(request: ListVersionsRequest = {}): VersionSummary[] {
    const store = this.#current();
    let conceptId: number | undefined;
    if (request.concept !== undefined) {
      const concept = store.conceptByName(cleanName(request.concept, 'concept'));
      if (!concept) {
        throw new ServiceFailure('not-found', `${store.file}: there is no concept "${request.concept}"`, { file: store.file, field: 'concept' });
      }
      conceptId = concept.id;
    }
    return store.versions(conceptId).map((row) => this.#summary(row));
  }

  getVersion(request: VersionRequest): VersionDetail {
    const store = this.#current();
    return this.#detail(this.#version(store, request.version));
  }

  saveVersion(request: SaveVersionRequest): SaveVersionResponse {
    const store = this.#writable();
    const { text, checked } = conceptInput(request);
    const note = request.note ?? '';
    if (typeof note !== 'string') throw badRequest('note', 'must be text');
    const author = request.author?.trim() || this.#author;
    const conceptName = request.conceptName === undefined ? undefined : cleanName(request.conceptName, 'conceptName');
    if (request.parent !== undefined && request.parent !== null) checkVersionNumber(request.parent, 'parent');
    const createdAt = this.#time();
    const number = store.write(() => {
      const parentRow = request.parent ? this.#version(store, request.parent, 'parent') : undefined;
      let conceptId: number;
      if (conceptName !== undefined) {
        conceptId = store.conceptIdByName(conceptName) ?? store.insertConcept(conceptName, createdAt);
      } else if (parentRow) {
        conceptId = parentRow.conceptId;
      } else {
        const only = checked.name === undefined ? store.concepts() : [];
        const name = checked.name ?? (only.length === 1 ? only[0].name : FALLBACK_CONCEPT_NAME);
        conceptId = store.conceptIdByName(name) ?? store.insertConcept(name, createdAt);
      }
      const parent = request.parent === undefined ? store.latestVersionOf(conceptId) : (parentRow?.number ?? null);
      return store.insertVersion({
        conceptId,
        parent,
        conceptJson: text,
        evaluationJson: JSON.stringify(checked.summary),
        note,
        author,
        createdAt,
      });
    });
    return { version: this.#summary(store.version(number)!), warnings: checked.warnings };
  }

  compareVersions(request: CompareVersionsRequest): VersionComparison {
    const store = this.#current();
    const a = this.#detail(this.#version(store, request.a, 'a'));
    const b = this.#detail(this.#version(store, request.b, 'b'));
    return compareVersions(a, b);
  }

  startConcept(request: StartConceptRequest): SaveVersionResponse {
    const store = this.#writable();
    const name = cleanName(request.name, 'name');
    const source = this.#version(store, request.fromVersion, 'fromVersion');
    if (store.conceptByName(name)) {
      throw new ServiceFailure('name-taken', `${store.file}: a concept "${name}" already exists`, { file: store.file, field: 'name' });
    }
    const conceptJson = request.title === undefined ? source.conceptJson : retitled(source.conceptJson, cleanName(request.title, 'title'));
    const checked = checkAndEvaluateText(conceptJson, `version ${source.number}`);
    const createdAt = this.#time();
    const number = store.write(() => {
      if (store.conceptByName(name)) {
        throw new ServiceFailure('name-taken', `${store.file}: a concept "${name}" already exists`, { file: store.file, field: 'name' });
      }
      return store.insertVersion({
        conceptId: store.insertConcept(name, createdAt),
        parent: source.number,
        conceptJson,
        evaluationJson: JSON.stringify(checked.summary),
        note: request.note ?? `Started from version ${source.number} of "${source.conceptName}".`,
        author: request.author?.trim() || this.#author,
        createdAt,
      });
    });
    return { version: this.#summary(store.version(number)!), warnings: checked.warnings };
  }

  tagVersion(request: TagRequest): VersionSummary {
    const store = this.#writable();
    const tag = cleanTag(request.tag);
    const number = this.#version(store, request.version).number;
    const createdAt = this.#time();
    store.write(() => store.addTag(number, tag, createdAt));
    return this.#summary(store.version(number)!);
  }

  untagVersion(request: TagRequest): VersionSummary {
    const store = this.#writable();
    const tag = cleanTag(request.tag);
    const number = this.#version(store, request.version).number;
    const removed = store.write(() => store.removeTag(number, tag));
    if (!removed) {
      throw new ServiceFailure('not-found', `${store.file}: version ${number} has no tag "${tag}"`, { file: store.file, field: 'tag' });
    }
    return this.#summary(store.version(number)!);
  }

  // ------------------------------------------------------------ export, import, backup

  exportProject(_request: Empty = {}): ProjectExport {
    return projectExport(this.#current(), this.#time());
  }

  exportVersion(request: VersionRequest): VersionExport {
    const store = this.#current();
    return versionExport(store, this.#version(store, request.version), this.#time());
  }

  importProject(request: ImportProjectRequest): ProjectInfo {
    if (typeof request.file !== 'string' || request.file === '') throw badRequest('file', 'must be a file path');
    const file = writeImportedProject(request.file, asProjectExport(readExport(request.document)));
    this.#replace(new ProjectStore(openProjectFile(file)));
    return this.#info(this.#current());
  }

  importVersion(request: ImportVersionRequest): SaveVersionResponse {
    const store = this.#writable();
    const document = readExport(request.document);
    if (document.format !== VERSION_EXPORT_FORMAT) {
      throw badRequest('document.format', `importVersion takes a "${VERSION_EXPORT_FORMAT}" document; import a project with importProject`);
    }
    const version = document.version;
    const checked = checkAndEvaluateText(version.conceptText, 'document.version.conceptText');
    const conceptName = request.conceptName === undefined ? version.concept : cleanName(request.conceptName, 'conceptName');
    const now = this.#time();
    const number = store.write(() => {
      const conceptId = store.conceptIdByName(conceptName) ?? store.insertConcept(conceptName, now);
      const inserted = store.insertVersion({
        conceptId,
        parent: null,
        conceptJson: version.conceptText,
        evaluationJson: JSON.stringify(version.summary),
        note: version.note,
        author: version.author,
        createdAt: version.createdAt,
      });
      for (const tag of version.tags) store.addTag(inserted, tag, now);
      return inserted;
    });
    return { version: this.#summary(store.version(number)!), warnings: checked.warnings };
  }

  async backupProject(request: BackupProjectRequest): Promise<BackupProjectResponse> {
    const store = this.#current();
    if (typeof request.file !== 'string' || request.file === '') throw badRequest('file', 'must be a file path');
    return backupTo(store, request.file);
  }

  /** The current project's file, or null. */
  get file(): string | null {
    return this.#store?.file ?? null;
  }
}

export function createService(options: ServiceOptions = {}): ProjectService {
  return new ProjectService(options);
}
