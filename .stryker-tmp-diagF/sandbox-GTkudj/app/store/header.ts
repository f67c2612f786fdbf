/**
 * Recognises a project file from its first bytes, before SQLite touches it,
 * so an empty or foreign file is reported and never written to.
 * Offsets from the SQLite file format description (sqlite.org/fileformat.html,
 * section 1.3 "The Database Header").
 */
// @ts-nocheck

import { closeSync, openSync, readSync } from 'node:fs';
import { APPLICATION_ID } from './schema';

const MAGIC = Buffer.from('SQLite format 3\0', 'latin1');
const HEADER_BYTES = 100;

export type HeaderVerdict =
  | { kind: 'project'; pageSize: number }
  | { kind: 'empty' }
  | { kind: 'not-sqlite' }
  | { kind: 'foreign'; applicationId: number }
  | { kind: 'truncated'; detail: string };

/** Reads the header of `file` (which must exist) and says what kind of file it is. */
export function inspectHeader(file: string, sizeBytes: number): HeaderVerdict {
  if (sizeBytes === 0) return { kind: 'empty' };
  const header = Buffer.alloc(HEADER_BYTES);
  const fd = openSync(file, 'r');
  let read: number;
  try {
    read = readSync(fd, header, 0, HEADER_BYTES, 0);
  } finally {
    closeSync(fd);
  }
  const magicBytes = Math.min(read, MAGIC.length);
  if (!header.subarray(0, magicBytes).equals(MAGIC.subarray(0, magicBytes))) return { kind: 'not-sqlite' };
  if (read < HEADER_BYTES) return { kind: 'truncated', detail: `only ${read} bytes, shorter than a SQLite header` };

  const applicationId = header.readUInt32BE(68);
  if (applicationId !== APPLICATION_ID) return { kind: 'foreign', applicationId };

  const rawPageSize = header.readUInt16BE(16);
  const pageSize = rawPageSize === 1 ? 65536 : rawPageSize;
  if (pageSize < 512 || (pageSize & (pageSize - 1)) !== 0) {
    return { kind: 'truncated', detail: `page size ${rawPageSize} in the header is not valid` };
  }
  // The file's length is not judged here: while a -wal file holds committed pages, a main file
  // shorter than its in-header page count is a normal state SQLite recovers from
  // (sqlite.org/wal.html, "Checkpointing"). SQLite's own checks judge damage after opening.
  return { kind: 'project', pageSize };
}
