/**
 * The project file's schema: an ordered list of migrations keyed on
 * `PRAGMA user_version` (common practice for SQLite files). A migration, once
 * released, is never edited: files written by it exist on people's disks.
 * Each one runs in its own transaction.
 */
// @ts-nocheck


/** `PRAGMA application_id` of a Loftpoint project: ASCII "Lfpt". */
export const APPLICATION_ID = 0x4c667074;

export interface Migration {
  /** The user_version the file has after this migration. */
  version: number;
  description: string;
  sql: string;
}

/** Version 1: project, concepts, append-only versions. */
const V1 = `
CREATE TABLE project (
  id          INTEGER PRIMARY KEY CHECK (id = 1),
  name        TEXT NOT NULL,
  description TEXT NOT NULL DEFAULT '',
  units       TEXT NOT NULL CHECK (units IN ('si', 'us')),
  created_at  TEXT NOT NULL
);
CREATE TABLE concept (
  id         INTEGER PRIMARY KEY,
  name       TEXT NOT NULL UNIQUE,
  created_at TEXT NOT NULL
);
CREATE TABLE version (
  number          INTEGER PRIMARY KEY,
  concept_id      INTEGER NOT NULL REFERENCES concept (id),
  parent          INTEGER REFERENCES version (number),
  concept_json    TEXT NOT NULL,
  evaluation_json TEXT NOT NULL,
  note            TEXT NOT NULL DEFAULT '',
  author          TEXT NOT NULL,
  created_at      TEXT NOT NULL
);
CREATE TRIGGER version_immutable_update BEFORE UPDATE ON version
BEGIN SELECT RAISE(ABORT, 'versions are immutable: save a new version instead'); END;
CREATE TRIGGER version_immutable_delete BEFORE DELETE ON version
BEGIN SELECT RAISE(ABORT, 'versions are immutable: they are never deleted'); END;
`;

/** Version 2: tags on versions ("sent to customer", "baseline") and a per-concept index. */
const V2 = `
CREATE TABLE version_tag (
  version    INTEGER NOT NULL REFERENCES version (number),
  tag        TEXT NOT NULL CHECK (length(tag) BETWEEN 1 AND 64),
  created_at TEXT NOT NULL,
  PRIMARY KEY (version, tag)
) WITHOUT ROWID;
CREATE INDEX version_by_concept ON version (concept_id, number);
`;

export const MIGRATIONS: readonly Migration[] = [
  { version: 1, description: 'project, concepts and immutable versions', sql: V1 },
  { version: 2, description: 'version tags and a per-concept index', sql: V2 },
];

/** The schema version this build writes. */
export const SCHEMA_VERSION = MIGRATIONS[MIGRATIONS.length - 1].version;
