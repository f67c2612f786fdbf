/**
 * Writing what the page exports (the diagram as SVG, the concept as JSON)
 * to a file the person picks in a save dialog. The request is checked from
 * `unknown`; the file is written whole or not at all.
 */
import { rename, writeFile } from 'node:fs/promises';
import { basename, dirname, join } from 'node:path';
import type { ServiceResult } from '../service/contract';
import { EXPORT_KINDS, type ExportFileRequest, type ExportFileResponse, type ExportKind } from '../shared/desktop-api';
import { failure } from '../shared/transport';

/** The largest export accepted: a diagram or concept is far smaller. */
export const MAX_EXPORT_BYTES = 20 * 1024 * 1024;

export type ExportCheck = { ok: true; request: ExportFileRequest } | { ok: false; field: string; message: string };

export function checkExportRequest(payload: unknown): ExportCheck {
  if (typeof payload !== 'object' || payload === null || Array.isArray(payload)) return { ok: false, field: '(request)', message: 'must be an object' };
  const { kind, suggestedName, content, ...rest } = payload as Record<string, unknown>;
  const extra = Object.keys(rest);
  if (extra.length > 0) return { ok: false, field: extra[0], message: 'is not a field of an export request' };
  if (typeof kind !== 'string' || !Object.hasOwn(EXPORT_KINDS, kind)) {
    return { ok: false, field: 'kind', message: `must be one of ${Object.keys(EXPORT_KINDS).join(', ')}` };
  }
  if (typeof suggestedName !== 'string' || suggestedName.length === 0 || suggestedName.length > 200 || basename(suggestedName) !== suggestedName || /[\\/\0]/.test(suggestedName)) {
    return { ok: false, field: 'suggestedName', message: 'must be a plain file name of at most 200 characters, without folders' };
  }
  if (typeof content !== 'string') return { ok: false, field: 'content', message: 'must be text' };
  if (Buffer.byteLength(content) > MAX_EXPORT_BYTES) return { ok: false, field: 'content', message: `is larger than ${MAX_EXPORT_BYTES} bytes` };
  return { ok: true, request: { kind: kind as ExportKind, suggestedName, content } };
}

/** Asks where to save; resolves to the chosen path or null when cancelled. */
export type AskSavePath = (options: { defaultPath: string; filters: Array<{ name: string; extensions: string[] }> }) => Promise<string | null>;

/** Writes beside the target, then renames, so a failed write never leaves half a file. */
export async function writeWhole(file: string, content: string): Promise<void> {
  const temporary = join(dirname(file), `.${basename(file)}.${process.pid}.tmp`);
  await writeFile(temporary, content, 'utf8');
  await rename(temporary, file);
}

export async function exportFile(payload: unknown, ask: AskSavePath, folder: string, write = writeWhole): Promise<ServiceResult<ExportFileResponse>> {
  const checked = checkExportRequest(payload);
  if (!checked.ok) return failure('bad-request', `exportFile: ${checked.field}: ${checked.message}`, checked.field);
  const { kind, suggestedName, content } = checked.request;
  const spec = EXPORT_KINDS[kind];
  const file = await ask({ defaultPath: join(folder, suggestedName), filters: [{ name: spec.name, extensions: [...spec.extensions] }] });
  if (file === null) return { ok: true, value: null };
  try {
    await write(file, content);
    return { ok: true, value: { file } };
  } catch (error) {
    return failure('io', `${file}: could not be written (${error instanceof Error ? error.message : String(error)})`);
  }
}
