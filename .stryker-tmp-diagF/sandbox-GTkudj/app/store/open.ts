/**
 * Opening and creating project files. A file that is not ours (empty, not
 * SQLite, another program's, truncated or damaged) is reported with its name
 * and left exactly as it was; a new project is built beside its destination
 * and linked into place, so an existing file is never overwritten.
 */
// @ts-nocheck

import { accessSync, constants, existsSync, linkSync, copyFileSync, readFileSync, statSync, unlinkSync } from 'node:fs';
import { basename, dirname, join, resolve } from 'node:path';
import { connect, type Connection } from './native';
import { StoreError, fromSqliteError } from './errors';
import { inspectHeader } from './header';
import { APPLICATION_ID, MIGRATIONS, SCHEMA_VERSION } from './schema';

/** How long a write waits for another process's write to finish before reporting 'busy'. */
export const BUSY_TIMEOUT_MS = 3000;

export interface OpenedFile {
  db: Connection;
  file: string;
  readonly: boolean;
  /** Why the file is read-only, for messages ("the file is marked read-only"). */
  readonlyReason?: string;
  /** Schema version after migration (in memory only, for a read-only file of an older schema). */
  schemaVersion: number;
}

/** Why `file` cannot be written, or undefined when it can. Mode bits count even for a superuser. */
function readOnlyReason(file: string): string | undefined {
  if ((statSync(file).mode & 0o222) === 0) return 'the file is marked read-only';
  if (!canWrite(file)) return 'you may not write to the file';
  const folder = dirname(file);
  if ((statSync(folder).mode & 0o222) === 0 || !canWrite(folder)) return 'its folder is read-only';
  return undefined;
}

function canWrite(path: string): boolean {
  try {
    accessSync(path, constants.W_OK);
    return true;
  } catch {
    return false;
  }
}

function describeForeign(file: string, kind: string, detail = ''): StoreError {
  const what: Record<string, string> = {
    empty: 'is empty',
    'not-sqlite': 'is not a Loftpoint project file (not a SQLite database)',
    foreign: 'is a SQLite database of another program, not a Loftpoint project',
  };
  return new StoreError('not-a-project', `${file}: ${what[kind] ?? kind}${detail}; it was not changed`, file);
}

/** Opens an existing project file, migrating an older schema (in memory only when read-only). */
export function openProjectFile(path: string, options: { readonly?: boolean } = {}): OpenedFile {
  const file = resolve(path);
  let size: number;
  try {
    const stat = statSync(file);
    if (stat.isDirectory()) throw new StoreError('not-a-project', `${file}: is a folder, not a project file`, file);
    size = stat.size;
  } catch (error) {
    if (error instanceof StoreError) throw error;
    const code = (error as NodeJS.ErrnoException).code;
    if (code === 'ENOENT') throw new StoreError('file-missing', `${file}: no such project file`, file);
    throw new StoreError('io', `${file}: cannot read the project file (${code ?? String(error)})`, file);
  }

  // Only what the first bytes say for certain (empty, not SQLite, another program's) is judged
  // before SQLite opens the file: a main file shorter than its header promises is normal while
  // the -wal file beside it holds the pages, and SQLite's own checks judge damage after opening.
  const verdict = inspectHeader(file, size);
  if (verdict.kind === 'empty' || verdict.kind === 'not-sqlite' || verdict.kind === 'foreign') {
    throw describeForeign(file, verdict.kind);
  }
  if (verdict.kind === 'truncated' && !hasJournal(file)) {
    throw new StoreError('corrupt', `${file}: the project file is truncated or damaged (${verdict.detail}); it was not changed`, file);
  }

  const reason = options.readonly ? 'it was opened for reading only' : readOnlyReason(file);
  const readonly = reason !== undefined;
  let db: Connection | undefined;
  try {
    db = readonly ? connectReadOnly(file) : connect(file, { fileMustExist: true, timeout: BUSY_TIMEOUT_MS });
    // Accepted first, written to after: every check below only reads.
    verify(db, file);
    let schemaVersion = db.pragma('user_version', { simple: true }) as number;
    if (schemaVersion > SCHEMA_VERSION) {
      throw new StoreError(
        'newer-schema',
        `${file}: written by a newer Loftpoint (project schema ${schemaVersion}; this one reads up to ${SCHEMA_VERSION}); update Loftpoint to open it`,
        file,
      );
    }
    if (schemaVersion < 1 || !hasTable(db, 'project')) {
      throw new StoreError('corrupt', `${file}: carries the Loftpoint mark but holds no project tables (damaged or unfinished); it was not changed`, file);
    }
    if (!readonly) {
      if (String(db.pragma('journal_mode', { simple: true })).toLowerCase() !== 'wal') db.pragma('journal_mode = WAL');
      db.pragma('synchronous = FULL');
    }
    db.pragma('foreign_keys = ON');
    if (schemaVersion < SCHEMA_VERSION) {
      if (readonly) db = inMemoryCopy(db);
      schemaVersion = migrate(db);
    }
    return { db, file, readonly, readonlyReason: reason, schemaVersion };
  } catch (error) {
    db?.close();
    throw fromSqliteError(error, file);
  }
}

/** Whether a -wal or -journal file with content lies beside `file` (SQLite reads it on opening). */
function hasJournal(file: string): boolean {
  return [`${file}-wal`, `${file}-journal`].some((path) => existsSync(path) && statSync(path).size > 0);
}

function hasTable(db: Connection, name: string): boolean {
  return db.prepare("SELECT 1 FROM sqlite_master WHERE type = 'table' AND name = ?").get(name) !== undefined;
}

/**
 * A read-only connection. In a read-only folder SQLite cannot create the WAL
 * index; when no unsaved journal exists, the file's bytes are read into memory
 * instead (the header's WAL flag reset to rollback, offsets 18-19).
 */
function connectReadOnly(file: string): Connection {
  const db = connect(file, { readonly: true, fileMustExist: true, timeout: BUSY_TIMEOUT_MS });
  try {
    db.pragma('user_version', { simple: true });
    return db;
  } catch (error) {
    db.close();
    const code = (error as { code?: string }).code ?? '';
    if (!code.startsWith('SQLITE_READONLY') && !code.startsWith('SQLITE_CANTOPEN')) throw error;
    const wal = `${file}-wal`;
    if (existsSync(wal) && statSync(wal).size > 0) {
      throw new StoreError(
        'read-only',
        `${file}: cannot open: its folder is read-only and it has unsaved changes in ${basename(wal)}; copy the project to a writable folder`,
        file,
      );
    }
    const bytes = readFileSync(file);
    bytes[18] = 1;
    bytes[19] = 1;
    return connect(bytes);
  }
}

/** A writable in-memory copy of a connection's database (used to read older schemas read-only). */
function inMemoryCopy(db: Connection): Connection {
  const bytes = db.serialize();
  db.close();
  bytes[18] = 1;
  bytes[19] = 1;
  const copy = connect(bytes);
  copy.pragma('foreign_keys = ON');
  return copy;
}

function verify(db: Connection, file: string): void {
  const applicationId = db.pragma('application_id', { simple: true }) as number;
  if (applicationId >>> 0 !== APPLICATION_ID) throw describeForeign(file, 'foreign');
  const check = db.pragma('quick_check', { simple: true });
  if (check !== 'ok') {
    throw new StoreError('corrupt', `${file}: the project file is damaged (${String(check)}); it was not changed`, file);
  }
}

/** Runs every migration newer than the file's user_version, each in one transaction. Returns the new version. */
export function migrate(db: Connection): number {
  for (const migration of MIGRATIONS) {
    db.transaction(() => {
      const current = db.pragma('user_version', { simple: true }) as number;
      if (current >= migration.version) return;
      db.exec(migration.sql);
      db.pragma(`user_version = ${migration.version}`);
    }).immediate();
  }
  return db.pragma('user_version', { simple: true }) as number;
}

/**
 * Creates a new project file at `path`: schema, application id and whatever
 * `fill` writes, in one transaction on a temporary file beside it, then links
 * it into place. Fails with 'file-exists' rather than overwrite anything.
 */
export function createProjectFile(path: string, fill: (db: Connection) => void): string {
  const file = resolve(path);
  if (existsSync(file)) {
    throw new StoreError('file-exists', `${file}: already exists; choose a new file name (an existing file is never overwritten)`, file);
  }
  const folder = dirname(file);
  if (!existsSync(folder) || !statSync(folder).isDirectory()) {
    throw new StoreError('file-missing', `${file}: the folder ${folder} does not exist`, file);
  }
  if ((statSync(folder).mode & 0o222) === 0 || !canWrite(folder)) {
    throw new StoreError('read-only', `${file}: the folder ${folder} is read-only`, file);
  }
  const temp = join(folder, `.${basename(file)}.${process.pid}.${Date.now().toString(36)}.creating`);
  let db: Connection | undefined;
  try {
    db = connect(temp, { timeout: BUSY_TIMEOUT_MS });
    db.pragma('journal_mode = DELETE');
    db.pragma('synchronous = FULL');
    db.pragma('foreign_keys = ON');
    const connection = db;
    connection.transaction(() => {
      connection.pragma(`application_id = ${APPLICATION_ID}`);
      for (const migration of MIGRATIONS) connection.exec(migration.sql);
      connection.pragma(`user_version = ${SCHEMA_VERSION}`);
      fill(connection);
    })();
    db.pragma('journal_mode = WAL');
    db.close();
    db = undefined;
    placeNewFile(temp, file);
    return file;
  } catch (error) {
    throw fromSqliteError(error, file);
  } finally {
    db?.close();
    for (const leftover of [temp, `${temp}-journal`, `${temp}-wal`, `${temp}-shm`]) {
      if (existsSync(leftover)) unlinkSync(leftover);
    }
  }
}

/** Moves a finished file into place without ever replacing an existing one. */
export function placeNewFile(temp: string, file: string): void {
  try {
    linkSync(temp, file);
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code;
    if (code === 'EEXIST') {
      throw new StoreError('file-exists', `${file}: already exists; choose a new file name (an existing file is never overwritten)`, file);
    }
    // File systems without hard links: an exclusive copy still never overwrites.
    try {
      copyFileSync(temp, file, constants.COPYFILE_EXCL);
    } catch (copyError) {
      const copyCode = (copyError as NodeJS.ErrnoException).code;
      if (copyCode === 'EEXIST') {
        throw new StoreError('file-exists', `${file}: already exists; choose a new file name (an existing file is never overwritten)`, file);
      }
      throw new StoreError('io', `${file}: cannot create the project file (${copyCode ?? String(copyError)})`, file);
    }
  }
}
