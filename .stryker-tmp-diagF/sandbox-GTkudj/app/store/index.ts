/** The project file: one SQLite file per project (better-sqlite3). */
// @ts-nocheck

export { APPLICATION_ID, MIGRATIONS, SCHEMA_VERSION, type Migration } from './schema';
export { StoreError, fromSqliteError } from './errors';
export { connect, setNativeBinding, type Connection } from './native';
export { inspectHeader, type HeaderVerdict } from './header';
export { BUSY_TIMEOUT_MS, openProjectFile, createProjectFile, migrate, placeNewFile, type OpenedFile } from './open';
export {
  ProjectStore,
  insertProjectRow,
  type ProjectRow,
  type ConceptRow,
  type VersionRow,
  type FullVersionRow,
  type NewVersion,
} from './project-store';
