/**
 * The service's one exception type in process, and the conversion of any
 * thrown value into the ServiceError a transport sends.
 */
// @ts-nocheck

import { StoreError } from '../store/errors';
import type { ConceptIssue, ServiceError, ServiceErrorCode } from './contract';

export class ServiceFailure extends Error {
  readonly error: ServiceError;

  constructor(code: ServiceErrorCode, message: string, extra: { file?: string; field?: string; issues?: ConceptIssue[] } = {}) {
    super(message);
    this.name = 'ServiceFailure';
    this.error = { code, message, ...extra };
  }
}

/** Any thrown value as a ServiceError: one line, never a stack trace. */
export function toServiceError(error: unknown): ServiceError {
  if (error instanceof ServiceFailure) return error.error;
  if (error instanceof StoreError) {
    return error.file === undefined ? { code: error.code, message: error.message } : { code: error.code, message: error.message, file: error.file };
  }
  const message = error instanceof Error ? error.message : String(error);
  return { code: 'internal', message: `internal error: ${message.split('\n')[0]}` };
}

export function badRequest(field: string, message: string): ServiceFailure {
  return new ServiceFailure('bad-request', `${field}: ${message}`, { field });
}
