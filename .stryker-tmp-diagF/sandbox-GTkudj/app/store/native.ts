/**
 * The one place that constructs a better-sqlite3 connection. Under Electron the
 * native module is built for Electron's ABI and shipped beside the app; it is
 * loaded through `nativeBinding` so the Node build the tests use is never
 * replaced (TOOLCHAIN.md).
 */
// @ts-nocheck

import Database from 'better-sqlite3';
import { join } from 'node:path';

export type Connection = Database.Database;

let bindingOverride: string | undefined;

/** Use this compiled `better_sqlite3.node` for every later connection (Electron main sets it at start-up). */
export function setNativeBinding(path: string | undefined): void {
  bindingOverride = path;
}

function nativeBinding(): string | undefined {
  if (bindingOverride) return bindingOverride;
  if (!process.versions.electron) return undefined;
  if (process.env.LOFTPOINT_SQLITE_BINDING) return process.env.LOFTPOINT_SQLITE_BINDING;
  const resources = (process as { resourcesPath?: string }).resourcesPath;
  return resources ? join(resources, 'native', 'better_sqlite3.node') : undefined;
}

/** A connection to a file, or to an in-memory copy of one when given its bytes. */
export function connect(source: string | Buffer, options: Database.Options = {}): Connection {
  const binding = nativeBinding();
  return new Database(source, binding ? { ...options, nativeBinding: binding } : options);
}
