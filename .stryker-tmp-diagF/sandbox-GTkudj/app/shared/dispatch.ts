/**
 * One router for both transports: a method name and a payload from outside
 * (an HTTP body, an IPC message) become a checked request to the service, and
 * whatever happens comes back as a ServiceResult, never as an exception.
 */
// @ts-nocheck

import { isServiceMethod, type ServiceError, type ServiceMethod, type ServiceRequest, type ServiceResponse, type ServiceResult } from './contract';
import { checkRequest } from './requests';
import { failure, type Dispatch } from './transport';

/** Calls the service; may return a result, or throw. */
export type Invoke = <M extends ServiceMethod>(method: M, request: ServiceRequest<M>) => Promise<ServiceResult<ServiceResponse<M>>>;

/** A transport's own rule on top of the schema (e.g. which files the page may name); null allows the call. */
export type CallPolicy = (method: ServiceMethod, request: unknown) => ServiceError | null;

export function createDispatch(invoke: Invoke, policy: CallPolicy = () => null): Dispatch {
  return async (method, payload) => {
    if (!isServiceMethod(method)) return failure('bad-request', `"${String(method).slice(0, 60)}" is not a service method`, 'method');
    const checked = checkRequest(method, payload);
    if (!checked.ok) return failure('bad-request', checked.message, checked.field);
    const refusal = policy(method, checked.request);
    if (refusal) return { ok: false, error: refusal };
    try {
      return await invoke(method, checked.request);
    } catch (error) {
      const message = error instanceof Error ? error.message.split('\n')[0] : String(error);
      return failure('internal', `${method} failed: ${message}`);
    }
  };
}
