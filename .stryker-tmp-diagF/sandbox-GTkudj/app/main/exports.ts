/**
 * Writing what the page exports (reports, the diagram, the boundaries, the
 * concept) to a file the person picks in a save dialog. The request is
 * checked from `unknown`: text kinds come as UTF-8 text, PDF and PNG as
 * base64 whose bytes must start with the format's own signature. The file is
 * written whole or not at all.
 */
// @ts-nocheck

import { rename, rm, writeFile } from 'node:fs/promises';
import { basename, dirname, join } from 'node:path';
import type { ServiceResult } from '../service/contract';
import { EXPORT_KINDS, type ExportFileRequest, type ExportFileResponse, type ExportKind } from '../shared/desktop-api';
import { failure } from '../shared/transport';

/** The largest export accepted: a report, diagram or concept is far smaller. */
export const MAX_EXPORT_BYTES = 20 * 1024 * 1024;

export type ExportCheck = { ok: true; request: ExportFileRequest; bytes: string | Buffer } | { ok: false; field: string; message: string };

/** The first bytes of each binary kind (PNG: ISO/IEC 15948 section 5.2; PDF: ISO 32000-1 section 7.5.2). */
const SIGNATURES: Partial<Record<ExportKind, Buffer>> = {
  png: Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
  pdf: Buffer.from('%PDF-', 'latin1'),
};

const BASE64 = /^(?:[A-Za-z0-9+/]{4})*(?:[A-Za-z0-9+/]{2}==|[A-Za-z0-9+/]{3}=)?$/;

export function checkExportRequest(payload: unknown): ExportCheck {
  if (typeof payload !== 'object' || payload === null || Array.isArray(payload)) return { ok: false, field: '(request)', message: 'must be an object' };
  const { kind, suggestedName, content, encoding, ...rest } = payload as Record<string, unknown>;
  const extra = Object.keys(rest);
  if (extra.length > 0) return { ok: false, field: extra[0], message: 'is not a field of an export request' };
  if (typeof kind !== 'string' || !Object.hasOwn(EXPORT_KINDS, kind)) {
    return { ok: false, field: 'kind', message: `must be one of ${Object.keys(EXPORT_KINDS).join(', ')}` };
  }
  if (typeof suggestedName !== 'string' || suggestedName.length === 0 || suggestedName.length > 200 || basename(suggestedName) !== suggestedName || /[\\/\0]/.test(suggestedName)) {
    return { ok: false, field: 'suggestedName', message: 'must be a plain file name of at most 200 characters, without folders' };
  }
  const exportKind = kind as ExportKind;
  const binary = EXPORT_KINDS[exportKind].binary;
  const wanted = binary ? 'base64' : 'utf8';
  if ((encoding ?? 'utf8') !== wanted) return { ok: false, field: 'encoding', message: `must be ${wanted} for ${kind}${binary ? '' : ' (or left out)'}` };
  if (typeof content !== 'string') return { ok: false, field: 'content', message: binary ? 'must be base64 text' : 'must be text' };
  const size = binary ? Math.floor((content.length * 3) / 4) : Buffer.byteLength(content);
  if (size > MAX_EXPORT_BYTES) return { ok: false, field: 'content', message: `is larger than ${MAX_EXPORT_BYTES} bytes` };
  const request: ExportFileRequest = { kind: exportKind, suggestedName, content, ...(encoding === undefined ? {} : { encoding: wanted }) };
  if (!binary) return { ok: true, request, bytes: content };
  if (!BASE64.test(content)) return { ok: false, field: 'content', message: 'is not base64 text' };
  const bytes = Buffer.from(content, 'base64');
  const signature = SIGNATURES[exportKind];
  if (signature && !bytes.subarray(0, signature.length).equals(signature)) return { ok: false, field: 'content', message: `is not a ${kind.toUpperCase()} file (its first bytes are not the ${kind.toUpperCase()} signature)` };
  return { ok: true, request, bytes };
}

/** Asks where to save; resolves to the chosen path or null when cancelled. */
export type AskSavePath = (options: { defaultPath: string; filters: Array<{ name: string; extensions: string[] }> }) => Promise<string | null>;

/** Writes beside the target, then renames, so a failed write never leaves half a file. */
export async function writeWhole(file: string, content: string | Buffer): Promise<void> {
  const temporary = join(dirname(file), `.${basename(file)}.${process.pid}.tmp`);
  try {
    await writeFile(temporary, content);
    await rename(temporary, file);
  } catch (error) {
    await rm(temporary, { force: true });
    throw error;
  }
}

export async function exportFile(payload: unknown, ask: AskSavePath, folder: string, write = writeWhole): Promise<ServiceResult<ExportFileResponse>> {
  const checked = checkExportRequest(payload);
  if (!checked.ok) return failure('bad-request', `exportFile: ${checked.field}: ${checked.message}`, checked.field);
  const { kind, suggestedName } = checked.request;
  const spec = EXPORT_KINDS[kind];
  const file = await ask({ defaultPath: join(folder, suggestedName), filters: [{ name: spec.name, extensions: [...spec.extensions] }] });
  if (file === null) return { ok: true, value: null };
  try {
    await write(file, checked.bytes);
    return { ok: true, value: { file } };
  } catch (error) {
    return failure('io', `${file}: could not be written (${error instanceof Error ? error.message : String(error)})`);
  }
}
