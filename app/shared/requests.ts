/**
 * Every service request checked from `unknown` before it reaches the
 * service: one strict schema per method, typed against the contract so a
 * change there that is not made here fails the type check.
 */
import * as z from 'zod';
import type { ServiceMethod, ServiceRequest } from './contract';

const units = z.enum(['si', 'us', 'kt-ft']);
const file = z.string().min(1).max(4096);
const version = z.number().int().positive();
const text = (max: number) => z.string().max(max);
const name = z.string().trim().min(1).max(200);
const empty = z.strictObject({});

type Schemas = { [M in ServiceMethod]: z.ZodType<ServiceRequest<M>> };

export const REQUEST_SCHEMAS: Schemas = {
  createProject: z.strictObject({
    file,
    name,
    description: text(10_000).optional(),
    units: units.optional(),
    demo: z.boolean().optional(),
  }),
  openProject: z.strictObject({ file, readonly: z.boolean().optional() }),
  closeProject: empty,
  getProject: empty,
  updateProject: z.strictObject({ name: name.optional(), description: text(10_000).optional(), units: units.optional() }),
  listConcepts: empty,
  renameConcept: z.strictObject({ from: name, to: name }),
  newConcept: z.strictObject({
    name,
    aircraftKind: z.enum(['single-piston', 'twin-turboprop', 'business-jet', 'small-uav']),
    note: text(100_000).optional(),
    author: text(200).optional(),
  }),
  importConcept: z.strictObject({ conceptText: text(1_000_000), name: name.optional(), note: text(100_000).optional(), author: text(200).optional() }),
  deleteConcept: z.strictObject({ name }),
  listVersions: z.strictObject({ concept: name.optional() }),
  getVersion: z.strictObject({ version }),
  saveVersion: z.strictObject({
    concept: z.unknown().optional(),
    conceptText: text(1_000_000).optional(),
    note: text(100_000).optional(),
    author: text(200).optional(),
    conceptName: name.optional(),
    parent: version.nullable().optional(),
  }),
  compareVersions: z.strictObject({ a: version, b: version }),
  startConcept: z.strictObject({ fromVersion: version, name, title: name.optional(), note: text(100_000).optional(), author: text(200).optional() }),
  tagVersion: z.strictObject({ version, tag: name }),
  untagVersion: z.strictObject({ version, tag: name }),
  exportProject: empty,
  exportVersion: z.strictObject({ version }),
  importProject: z.strictObject({ file, document: z.unknown() }),
  importVersion: z.strictObject({ document: z.unknown(), conceptName: name.optional() }),
  backupProject: z.strictObject({ file }),
};

/** Methods whose request names a file on disk: the page may not choose those paths freely. */
export const FILE_METHODS = ['createProject', 'openProject', 'importProject', 'backupProject'] as const satisfies readonly ServiceMethod[];

export type RequestCheck<M extends ServiceMethod> =
  | { ok: true; request: ServiceRequest<M> }
  | { ok: false; field: string; message: string };

/** Checks one request; a missing payload counts as `{}`. The message names the first bad field. */
export function checkRequest<M extends ServiceMethod>(method: M, payload: unknown): RequestCheck<M> {
  const schema = REQUEST_SCHEMAS[method] as z.ZodType<ServiceRequest<M>>;
  const parsed = schema.safeParse(payload === undefined ? {} : payload);
  if (parsed.success) return { ok: true, request: parsed.data };
  const issue = parsed.error.issues[0];
  const field = issue && issue.path.length > 0 ? issue.path.map(String).join('.') : '(request)';
  return { ok: false, field, message: `${method}: ${field}: ${issue?.message ?? 'is not valid'}` };
}
