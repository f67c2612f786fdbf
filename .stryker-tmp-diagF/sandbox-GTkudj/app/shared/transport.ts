/**
 * What travels between the page and the service, whichever the transport
 * (IPC in the desktop window, HTTP in browser mode): a method name, one JSON
 * payload, and a ServiceResult that is either the answer or a typed error the
 * page can show. Nothing throws across the boundary.
 */
// @ts-nocheck

import type { ServiceError, ServiceErrorCode, ServiceResult } from './contract';

export type { ServiceError, ServiceResult };

/** Routes one call by method name to the service. */
export type Dispatch = (method: string, payload: unknown) => Promise<ServiceResult<unknown>>;

export function failure(code: ServiceErrorCode, message: string, field?: string): { ok: false; error: ServiceError } {
  return { ok: false, error: field === undefined ? { code, message } : { code, message, field } };
}

/** IPC channel of a service method; one per method, so main can listen on exactly these. */
export function serviceChannel<M extends string>(method: M): `loftpoint:service:${M}` {
  return `loftpoint:service:${method}`;
}

/** Channel on which main tells the page about a menu command. */
export const COMMAND_CHANNEL = 'loftpoint:command';
/** Channel on which the page asks main to write a file through a save dialog. */
export const EXPORT_CHANNEL = 'loftpoint:export';
/** Channel on which the page asks main to print a report's HTML to PDF. */
export const PRINT_CHANNEL = 'loftpoint:print-pdf';
/** Channel on which the page tells main what the menu and title show: its units and unsaved changes. */
export const WINDOW_STATE_CHANNEL = 'loftpoint:window-state';
