/** The service contract lives in app/shared (the page and the store read it there); the service's own files keep this short path. */
// @ts-nocheck

export * from '../shared/contract';
