/**
 * The service contract: every request and response the CLI, the Electron
 * window (IPC) and browser mode (HTTP) exchange with the project service.
 *
 * Types and plain constants only: no runtime imports, so the page can import
 * this file. Every request is one JSON-serialisable object and every response
 * a JSON-serialisable value: times are ISO 8601 strings, never Dates.
 *
 * The service is project-scoped: createProject or openProject makes a project
 * current; the other methods act on it. Version numbers are project-wide
 * integers 1, 2, 3... Each version belongs to one concept and has a parent
 * version or none. Versions are immutable: editing an old version saves a new
 * version whose parent is that one.
 */
// @ts-nocheck


// ---------------------------------------------------------------- errors

export type ServiceErrorCode =
  /** The concept failed the schema; `issues` lists each field path and message. Nothing was written. */
  | 'invalid-concept'
  /** A version, concept or tag that does not exist. */
  | 'not-found'
  /** Another process held the project file longer than the busy timeout. Nothing was written; try again. */
  | 'busy'
  /** The project file (or its folder) is read-only; it was opened for reading only. */
  | 'read-only'
  /** The file is empty, not SQLite, or a SQLite file of another program. It was not changed. */
  | 'not-a-project'
  /** The file looks like a project but is truncated or damaged. It was not changed. */
  | 'corrupt'
  /** The file does not exist. */
  | 'file-missing'
  /** createProject or importProject would overwrite an existing file; they never do. */
  | 'file-exists'
  /** The file was written by a newer Loftpoint with a schema this one does not know. */
  | 'newer-schema'
  /** A method that needs a current project was called before createProject or openProject. */
  | 'no-project'
  /** The request itself is malformed: a missing or mistyped field (see `field`). */
  | 'bad-request'
  /** A concept name that is already taken (startConcept, renameConcept). */
  | 'name-taken'
  /** The file could not be read or written for a reason of the operating system (see message). */
  | 'io'
  /** The disk (or the user's quota) is full: the save was not made; versions saved before are kept. */
  | 'disk-full'
  /** A program fault; the message says what failed. Nothing already saved is lost. */
  | 'internal';

/** A concept schema problem: `path` like `requirements[1].speed`. */
export interface ConceptIssue {
  path: string;
  message: string;
}

export interface ServiceError {
  code: ServiceErrorCode;
  /** One line a person can act on; names the file when a file is involved. */
  message: string;
  /** The file the error is about, when there is one. */
  file?: string;
  /** Request field (or concept field path) that is wrong. */
  field?: string;
  /** For 'invalid-concept': every schema issue. */
  issues?: ConceptIssue[];
}

/** What a transport (IPC, HTTP) returns: a value or a typed error, never an exception. */
export type ServiceResult<T> = { ok: true; value: T } | { ok: false; error: ServiceError };

// ---------------------------------------------------------------- shared shapes

export type UnitSystem = 'si' | 'us' | 'kt-ft';

export interface ProjectInfo {
  /** Absolute path of the project file. */
  file: string;
  name: string;
  description: string;
  /** Preferred display units. */
  units: UnitSystem;
  createdAt: string;
  /** True when the file or its folder is read-only: every write is refused with 'read-only'. */
  readonly: boolean;
  /** Schema version of the file (PRAGMA user_version) after any migration. */
  schemaVersion: number;
  conceptCount: number;
  versionCount: number;
}

export interface ConceptSummary {
  id: number;
  name: string;
  createdAt: string;
  versionCount: number;
  /** Number of the first and the newest version of this concept; null when it has none. */
  firstVersion: number | null;
  latestVersion: number | null;
}

/** A point on the diagram: SI (N/m^2; W/N or dimensionless T/W per `axis`). */
export interface LoadingPoint {
  wingLoading: number;
  loading: number;
}

export interface MarginValue {
  id: string;
  /** Relative; negative means violated. Null where the engine gave no finite value. */
  margin: number | null;
}

/**
 * The compact evaluation stored beside each version (format
 * `loftpoint-version-summary/1`), so listing and comparing never re-evaluate.
 */
export interface EvaluationSummary {
  format: 'loftpoint-version-summary/1';
  axis: 'powerToWeight' | 'thrustToWeight';
  /** Null when no point on the diagram meets every requirement. */
  optimum: (LoadingPoint & { active: string[]; margins: MarginValue[]; unbounded?: boolean }) | null;
  /** Present when the concept gives a design point. */
  designPoint: (LoadingPoint & { feasible: boolean; margins: MarginValue[] }) | null;
  /** At the design point (the optimum when none): wing area m^2, power W or thrust N. */
  sizing: { wingArea: number; power?: number; thrust?: number } | null;
  /** Characteristic speeds (m/s EAS) at that wing loading. */
  speeds: { stall: number; minimumDrag: number; minimumPower: number } | null;
  warningCount: number;
  /** Warning lines as evaluated, so a version shows them without re-evaluating. */
  warnings: string[];
  /** Set when the engine failed on a valid concept; the version is still kept. */
  error?: string;
}

export interface VersionSummary {
  number: number;
  conceptId: number;
  conceptName: string;
  /** The version this one was edited from, or null. */
  parent: number | null;
  author: string;
  createdAt: string;
  /** Plain text or Markdown, exactly as saved (the window escapes it). */
  note: string;
  tags: string[];
  summary: EvaluationSummary;
}

export interface VersionDetail extends VersionSummary {
  /** The concept JSON text exactly as saved, byte for byte. */
  conceptText: string;
  /** The same, parsed (JSON.parse of conceptText). */
  concept: unknown;
}

// ---------------------------------------------------------------- compare

/** One field that differs; `before`/`after` absent means the field was absent on that side. */
export interface FieldChange {
  /** Concept path, e.g. `aircraft.aero.configurations.clean.cd0` or `speed`. */
  path: string;
  before?: unknown;
  after?: unknown;
}

export interface RequirementRef {
  id: string;
  kind: string;
  label?: string;
  /** The requirement as written in the concept. */
  requirement: unknown;
}

export interface RequirementChange {
  id: string;
  kind: string;
  label?: string;
  fields: FieldChange[];
}

export interface PointMove {
  before: LoadingPoint | null;
  after: LoadingPoint | null;
  /** after - before, when both exist. */
  delta: LoadingPoint | null;
}

export interface MarginChange {
  id: string;
  before: number | null;
  after: number | null;
  delta: number | null;
}

export interface VersionRef {
  number: number;
  conceptName: string;
  createdAt: string;
  author: string;
}

export interface VersionComparison {
  format: 'loftpoint-comparison/1';
  a: VersionRef;
  b: VersionRef;
  /** Axis of each side; a change from power to thrust makes loading deltas meaningless (null). */
  axis: { before: EvaluationSummary['axis']; after: EvaluationSummary['axis'] };
  requirements: { added: RequirementRef[]; removed: RequirementRef[]; changed: RequirementChange[] };
  /** Changes under `aircraft` (assumptions), field by field. */
  assumptions: FieldChange[];
  /** Everything else: name, diagram, designPoint, format. */
  other: FieldChange[];
  optimum: PointMove & { activeBefore: string[]; activeAfter: string[] };
  designPoint: PointMove;
  margins: { optimum: MarginChange[]; designPoint: MarginChange[] };
  sizing: {
    wingArea: MarginChange;
    /** Installed power (W) or thrust (N). */
    installed: MarginChange;
  };
}

// ---------------------------------------------------------------- export / import

export interface ExportedVersion {
  number: number;
  concept: string;
  parent: number | null;
  author: string;
  createdAt: string;
  note: string;
  tags: string[];
  /** The concept JSON text exactly as saved. */
  conceptText: string;
  summary: EvaluationSummary;
}

export interface ProjectExport {
  format: 'loftpoint-project-export/1';
  exportedAt: string;
  project: { name: string; description: string; units: UnitSystem; createdAt: string };
  concepts: Array<{ name: string; createdAt: string }>;
  versions: ExportedVersion[];
}

export interface VersionExport {
  format: 'loftpoint-version-export/1';
  exportedAt: string;
  project: { name: string };
  version: ExportedVersion;
}

// ---------------------------------------------------------------- requests and responses

export interface CreateProjectRequest {
  file: string;
  name: string;
  description?: string;
  units?: UnitSystem;
  /** Add the demo concepts as first versions. */
  demo?: boolean;
}

export interface OpenProjectRequest {
  file: string;
  /** Open for reading only even when the file is writable. */
  readonly?: boolean;
}

export interface UpdateProjectRequest {
  name?: string;
  description?: string;
  units?: UnitSystem;
}

export interface ListVersionsRequest {
  /** Only this concept's versions (by name). */
  concept?: string;
}

export interface VersionRequest {
  version: number;
}

export interface SaveVersionRequest {
  /** The concept as an object (stored as 2-space JSON)... */
  concept?: unknown;
  /** ...or as text, stored exactly as given. Exactly one of the two. */
  conceptText?: string;
  note?: string;
  /** Defaults to the service's author ($LOFTPOINT_AUTHOR or the OS user name). */
  author?: string;
  /**
   * The concept (design alternative) to save into, by name; created when new.
   * Default: the parent's concept, else the concept JSON's `name`.
   */
  conceptName?: string;
  /** The version this one was edited from. Default: the newest version of the concept, or none. */
  parent?: number | null;
}

export interface SaveVersionResponse {
  version: VersionSummary;
  /** Concept warnings from parsing (defaults that fell back, and the like). */
  warnings: string[];
}

export interface CompareVersionsRequest {
  a: number;
  b: number;
}

export interface StartConceptRequest {
  /** The version to start from; the new concept's first version has it as parent. */
  fromVersion: number;
  name: string;
  /**
   * The `name` written into the copied concept JSON of the first version (the
   * title on the diagram and in reports); absent: the concept JSON is copied
   * byte for byte.
   */
  title?: string;
  note?: string;
  author?: string;
}

export interface RenameConceptRequest {
  from: string;
  to: string;
}

export interface ImportProjectRequest {
  /** New project file to create; never overwrites. */
  file: string;
  /** A `loftpoint-project-export/1` or `loftpoint-version-export/1` document. */
  document: unknown;
}

export interface ImportVersionRequest {
  /** A `loftpoint-version-export/1` document, added to the current project as a new version (no parent). */
  document: unknown;
  /** Concept to add it to; default the exported version's concept name. */
  conceptName?: string;
}

export interface BackupProjectRequest {
  /** Destination file; never overwrites. */
  file: string;
}

export interface BackupProjectResponse {
  file: string;
  bytes: number;
}

export interface TagRequest {
  version: number;
  tag: string;
}

export type Empty = Record<string, never>;

/** Request and response type of every method, by name. */
export interface ServiceMap {
  createProject: { request: CreateProjectRequest; response: ProjectInfo };
  openProject: { request: OpenProjectRequest; response: ProjectInfo };
  closeProject: { request: Empty; response: { closed: boolean } };
  getProject: { request: Empty; response: ProjectInfo };
  updateProject: { request: UpdateProjectRequest; response: ProjectInfo };
  listConcepts: { request: Empty; response: ConceptSummary[] };
  renameConcept: { request: RenameConceptRequest; response: ConceptSummary };
  listVersions: { request: ListVersionsRequest; response: VersionSummary[] };
  getVersion: { request: VersionRequest; response: VersionDetail };
  saveVersion: { request: SaveVersionRequest; response: SaveVersionResponse };
  compareVersions: { request: CompareVersionsRequest; response: VersionComparison };
  startConcept: { request: StartConceptRequest; response: SaveVersionResponse };
  tagVersion: { request: TagRequest; response: VersionSummary };
  untagVersion: { request: TagRequest; response: VersionSummary };
  exportProject: { request: Empty; response: ProjectExport };
  exportVersion: { request: VersionRequest; response: VersionExport };
  importProject: { request: ImportProjectRequest; response: ProjectInfo };
  importVersion: { request: ImportVersionRequest; response: SaveVersionResponse };
  backupProject: { request: BackupProjectRequest; response: BackupProjectResponse };
}

export type ServiceMethod = keyof ServiceMap;
export type ServiceRequest<M extends ServiceMethod> = ServiceMap[M]['request'];
export type ServiceResponse<M extends ServiceMethod> = ServiceMap[M]['response'];

/** Every method name, so transports can route by name. */
export const SERVICE_METHODS = [
  'createProject',
  'openProject',
  'closeProject',
  'getProject',
  'updateProject',
  'listConcepts',
  'renameConcept',
  'listVersions',
  'getVersion',
  'saveVersion',
  'compareVersions',
  'startConcept',
  'tagVersion',
  'untagVersion',
  'exportProject',
  'exportVersion',
  'importProject',
  'importVersion',
  'backupProject',
] as const satisfies readonly ServiceMethod[];

type AssertNever<T extends never> = T;
/** Compile-time check that SERVICE_METHODS lists every method of ServiceMap. */
export type AllMethodsListed = AssertNever<Exclude<ServiceMethod, (typeof SERVICE_METHODS)[number]>>;

/** True when `name` is a method of the service (for routing untrusted input). */
export function isServiceMethod(name: unknown): name is ServiceMethod {
  return typeof name === 'string' && (SERVICE_METHODS as readonly string[]).includes(name);
}

/** The API as a remote front end sees it: one call per method, errors as values. */
export type RemoteService = {
  [M in ServiceMethod]: (request: ServiceRequest<M>) => Promise<ServiceResult<ServiceResponse<M>>>;
};

/** The preliminary-sizing caution every human-readable output carries. */
export { PRELIMINARY_CAUTION } from '../../core/caution';
