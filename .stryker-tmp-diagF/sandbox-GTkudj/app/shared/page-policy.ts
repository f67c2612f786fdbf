/**
 * What the page may ask of the service beyond the schema: it never names
 * files (the shell's dialogs and the command line do that), and it cannot
 * close the project it is showing.
 */
// @ts-nocheck

import type { ServiceError } from './contract';
import type { CallPolicy } from './dispatch';
import { FILE_METHODS } from './requests';

const PAGE_REFUSED: readonly string[] = [...FILE_METHODS, 'closeProject'];

function pageRefusal(method: string, how: string): ServiceError {
  return { code: 'bad-request', message: `${method} is not available from the window; ${how}`, field: 'method' };
}

/** The rule both transports apply to calls from the page. */
export function pagePolicy(how: string): CallPolicy {
  return (method) => (PAGE_REFUSED.includes(method) ? pageRefusal(method, how) : null);
}
