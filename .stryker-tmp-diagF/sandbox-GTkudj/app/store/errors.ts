/**
 * Errors of the project file, carrying the service's error codes so every
 * front end can say what happened and what to do, naming the file.
 */
// @ts-nocheck

import type { ServiceErrorCode } from '../shared/contract';

export class StoreError extends Error {
  constructor(
    readonly code: ServiceErrorCode,
    message: string,
    readonly file?: string,
  ) {
    super(message);
    this.name = 'StoreError';
  }
}

interface SqliteLikeError {
  code: string;
  message: string;
}

function isSqliteError(error: unknown): error is SqliteLikeError {
  return (
    error instanceof Error &&
    typeof (error as { code?: unknown }).code === 'string' &&
    (error as unknown as { code: string }).code.startsWith('SQLITE_')
  );
}

/** Turns a SqliteError into a StoreError that names the file; anything else passes through unchanged. */
export function fromSqliteError(error: unknown, file: string): unknown {
  if (!isSqliteError(error)) return error;
  const code = error.code;
  if (code.startsWith('SQLITE_BUSY') || code.startsWith('SQLITE_LOCKED')) {
    return new StoreError(
      'busy',
      `${file}: the project file is busy (another program is writing to it); nothing was written, try again`,
      file,
    );
  }
  if (code.startsWith('SQLITE_READONLY')) {
    return new StoreError('read-only', `${file}: the project file is read-only; nothing was written`, file);
  }
  if (code.startsWith('SQLITE_CORRUPT') || code === 'SQLITE_NOTADB') {
    return new StoreError('corrupt', `${file}: the project file is damaged (${error.message}); it was not changed`, file);
  }
  if (code === 'SQLITE_FULL') {
    return new StoreError(
      'disk-full',
      `${file}: the disk is full; this change was not saved, and every version saved before is kept in the project file; free some space and try again`,
      file,
    );
  }
  if (code.startsWith('SQLITE_IOERR') || code.startsWith('SQLITE_CANTOPEN') || code === 'SQLITE_PERM') {
    return new StoreError('io', `${file}: cannot read or write the project file (${error.message})`, file);
  }
  return new StoreError('internal', `${file}: ${error.message} (${code})`, file);
}
