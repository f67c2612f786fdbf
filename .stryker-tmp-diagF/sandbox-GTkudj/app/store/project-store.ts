/**
 * Reading and appending rows of an open project file. Versions are only ever
 * inserted (triggers in the schema refuse UPDATE and DELETE); every
 * multi-statement write runs in one immediate transaction so a killed or
 * failed save leaves the file as it was.
 */
// @ts-nocheck

import type Database from 'better-sqlite3';
import type { Connection } from './native';
import { StoreError, fromSqliteError } from './errors';
import type { OpenedFile } from './open';

export interface ProjectRow {
  name: string;
  description: string;
  units: 'si' | 'us' | 'kt-ft';
  createdAt: string;
}

export interface ConceptRow {
  id: number;
  name: string;
  createdAt: string;
  versionCount: number;
  firstVersion: number | null;
  latestVersion: number | null;
}

export interface VersionRow {
  number: number;
  conceptId: number;
  conceptName: string;
  parent: number | null;
  evaluationJson: string;
  note: string;
  author: string;
  createdAt: string;
  tags: string[];
}

export interface FullVersionRow extends VersionRow {
  conceptJson: string;
}

export interface NewVersion {
  /** Explicit number (import keeps numbers); default the next one. */
  number?: number;
  conceptId: number;
  parent: number | null;
  conceptJson: string;
  evaluationJson: string;
  note: string;
  author: string;
  createdAt: string;
}

const VERSION_COLUMNS = `v.number, v.concept_id AS conceptId, c.name AS conceptName, v.parent, v.evaluation_json AS evaluationJson,
  v.note, v.author, v.created_at AS createdAt,
  (SELECT json_group_array(tag) FROM (SELECT tag FROM version_tag t WHERE t.version = v.number ORDER BY tag)) AS tagsJson`;

type RawVersion = Omit<VersionRow, 'tags'> & { tagsJson: string; conceptJson?: string };

function toVersion<T extends VersionRow>(raw: RawVersion): T {
  const { tagsJson, ...rest } = raw;
  return { ...rest, tags: JSON.parse(tagsJson) as string[] } as unknown as T;
}

/** Inserts the project row of a new file (used inside createProjectFile's transaction). */
export function insertProjectRow(db: Connection, project: ProjectRow): void {
  db.prepare('INSERT INTO project (id, name, description, units, created_at) VALUES (1, ?, ?, ?, ?)').run(
    project.name,
    project.description,
    project.units,
    project.createdAt,
  );
}

export class ProjectStore {
  readonly db: Connection;
  readonly file: string;
  readonly readonly: boolean;
  readonly readonlyReason?: string;
  readonly schemaVersion: number;
  readonly #statements = new Map<string, Database.Statement>();

  constructor(opened: OpenedFile | { db: Connection; file: string; readonly: boolean; schemaVersion: number; readonlyReason?: string }) {
    this.db = opened.db;
    this.file = opened.file;
    this.readonly = opened.readonly;
    this.readonlyReason = opened.readonlyReason;
    this.schemaVersion = opened.schemaVersion;
  }

  /** A prepared statement, compiled once per connection. */
  #prepare(sql: string): Database.Statement {
    let statement = this.#statements.get(sql);
    if (!statement) {
      statement = this.db.prepare(sql);
      this.#statements.set(sql, statement);
    }
    return statement;
  }

  /** Runs `fn` in one immediate transaction; SQLite errors become StoreErrors naming the file. */
  write<T>(fn: () => T): T {
    if (this.readonly) {
      throw new StoreError(
        'read-only',
        `${this.file}: the project is open read-only (${this.readonlyReason ?? 'read-only'}); nothing was written`,
        this.file,
      );
    }
    try {
      return this.db.transaction(fn).immediate();
    } catch (error) {
      throw fromSqliteError(error, this.file);
    }
  }

  /** Runs a read; SQLite errors become StoreErrors naming the file. */
  read<T>(fn: () => T): T {
    try {
      return fn();
    } catch (error) {
      throw fromSqliteError(error, this.file);
    }
  }

  project(): ProjectRow {
    return this.read(() => {
      const row = this.#prepare('SELECT name, description, units, created_at AS createdAt FROM project WHERE id = 1').get() as
        | ProjectRow
        | undefined;
      if (!row) throw new StoreError('corrupt', `${this.file}: the project record is missing`, this.file);
      return row;
    });
  }

  counts(): { concepts: number; versions: number } {
    const sql = 'SELECT (SELECT count(*) FROM concept) AS concepts, (SELECT count(*) FROM version) AS versions';
    return this.read(() => this.#prepare(sql).get() as { concepts: number; versions: number });
  }

  updateProject(fields: Partial<Omit<ProjectRow, 'createdAt'>>): void {
    this.write(() => {
      const current = this.project();
      this.#prepare('UPDATE project SET name = ?, description = ?, units = ? WHERE id = 1').run(
        fields.name ?? current.name,
        fields.description ?? current.description,
        fields.units ?? current.units,
      );
    });
  }

  concepts(): ConceptRow[] {
    const sql = `SELECT c.id, c.name, c.created_at AS createdAt, count(v.number) AS versionCount,
                        min(v.number) AS firstVersion, max(v.number) AS latestVersion
                 FROM concept c LEFT JOIN version v ON v.concept_id = c.id
                 GROUP BY c.id ORDER BY c.id`;
    return this.read(() => this.#prepare(sql).all() as ConceptRow[]);
  }

  conceptByName(name: string): ConceptRow | undefined {
    return this.concepts().find((concept) => concept.name === name);
  }

  conceptIdByName(name: string): number | undefined {
    const row = this.read(() => this.#prepare('SELECT id FROM concept WHERE name = ?').get(name) as { id: number } | undefined);
    return row?.id;
  }

  conceptById(id: number): ConceptRow | undefined {
    return this.concepts().find((concept) => concept.id === id);
  }

  /** Inside a write: a new concept's id. */
  insertConcept(name: string, createdAt: string): number {
    return Number(this.#prepare('INSERT INTO concept (name, created_at) VALUES (?, ?)').run(name, createdAt).lastInsertRowid);
  }

  renameConcept(id: number, name: string): void {
    this.write(() => {
      this.#prepare('UPDATE concept SET name = ? WHERE id = ?').run(name, id);
    });
  }

  /** Inside a write: appends a version and returns its number. */
  insertVersion(version: NewVersion): number {
    const sql = `INSERT INTO version (number, concept_id, parent, concept_json, evaluation_json, note, author, created_at)
                 VALUES (?, ?, ?, ?, ?, ?, ?, ?)`;
    const result = this.#prepare(sql).run(
      version.number ?? null,
      version.conceptId,
      version.parent,
      version.conceptJson,
      version.evaluationJson,
      version.note,
      version.author,
      version.createdAt,
    );
    return Number(result.lastInsertRowid);
  }

  versions(conceptId?: number): VersionRow[] {
    const where = conceptId === undefined ? '' : 'WHERE v.concept_id = ?';
    const sql = `SELECT ${VERSION_COLUMNS} FROM version v JOIN concept c ON c.id = v.concept_id ${where} ORDER BY v.number`;
    return this.read(() => {
      const statement = this.#prepare(sql);
      const rows = (conceptId === undefined ? statement.all() : statement.all(conceptId)) as RawVersion[];
      return rows.map((row) => toVersion<VersionRow>(row));
    });
  }

  version(number: number): FullVersionRow | undefined {
    const sql = `SELECT ${VERSION_COLUMNS}, v.concept_json AS conceptJson
                 FROM version v JOIN concept c ON c.id = v.concept_id WHERE v.number = ?`;
    return this.read(() => {
      const row = this.#prepare(sql).get(number) as RawVersion | undefined;
      return row ? toVersion<FullVersionRow>(row) : undefined;
    });
  }

  /** Every version with its concept JSON, in number order (export). */
  allVersions(): FullVersionRow[] {
    const sql = `SELECT ${VERSION_COLUMNS}, v.concept_json AS conceptJson
                 FROM version v JOIN concept c ON c.id = v.concept_id ORDER BY v.number`;
    return this.read(() => (this.#prepare(sql).all() as RawVersion[]).map((row) => toVersion<FullVersionRow>(row)));
  }

  latestVersionOf(conceptId: number): number | null {
    const row = this.#prepare('SELECT max(number) AS latest FROM version WHERE concept_id = ?').get(conceptId) as {
      latest: number | null;
    };
    return row.latest;
  }

  /** Inside a write. */
  addTag(version: number, tag: string, createdAt: string): void {
    this.#prepare('INSERT OR IGNORE INTO version_tag (version, tag, created_at) VALUES (?, ?, ?)').run(version, tag, createdAt);
  }

  /** Inside a write. */
  removeTag(version: number, tag: string): boolean {
    return this.#prepare('DELETE FROM version_tag WHERE version = ? AND tag = ?').run(version, tag).changes > 0;
  }

  /** Copies the whole project to `destination` with SQLite's online backup. */
  async backup(destination: string): Promise<void> {
    try {
      await this.db.backup(destination);
    } catch (error) {
      throw fromSqliteError(error, destination);
    }
  }

  close(): void {
    if (this.db.open) this.db.close();
  }
}
