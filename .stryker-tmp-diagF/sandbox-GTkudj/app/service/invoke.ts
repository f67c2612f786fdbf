/**
 * Calling the service by method name, for transports (IPC, HTTP): whatever
 * happens comes back as a ServiceResult, never as an exception.
 */
// @ts-nocheck

import type { ServiceMethod, ServiceRequest, ServiceResponse, ServiceResult } from './contract';
import { toServiceError } from './failure';
import type { ServiceHandlers } from './service';

export async function invokeService<M extends ServiceMethod>(
  service: ServiceHandlers,
  method: M,
  request: ServiceRequest<M>,
): Promise<ServiceResult<ServiceResponse<M>>> {
  try {
    const handler = service[method] as (request: ServiceRequest<M>) => ServiceResponse<M> | Promise<ServiceResponse<M>>;
    const value = await handler.call(service, request);
    return { ok: true, value };
  } catch (error) {
    return { ok: false, error: toServiceError(error) };
  }
}
