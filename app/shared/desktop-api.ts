/**
 * What the desktop window's preload puts on `window.api`: the service
 * methods (typed from the contract), plus the two things only the shell can
 * do for the page: tell it about menu commands, and write a file the person
 * picks in a save dialog.
 */
import type { RemoteService, ServiceResult } from '../service/contract';

/** Menu items the page acts on (the shell handles New, Open and Quit itself). */
export const WINDOW_COMMANDS = [
  'save-version',
  'undo',
  'redo',
  'export-diagram',
  'export-concept',
  'units-si',
  'units-us',
  'reset-view',
  'show-history',
  /** The shell opened or created another project: reload everything. */
  'project-changed',
] as const;

export type WindowCommand = (typeof WINDOW_COMMANDS)[number];

export function isWindowCommand(value: unknown): value is WindowCommand {
  return typeof value === 'string' && (WINDOW_COMMANDS as readonly string[]).includes(value);
}

/** Export formats the page can hand to the shell, with the file filter each gets. */
export const EXPORT_KINDS = {
  svg: { name: 'SVG diagram', extensions: ['svg'], mime: 'image/svg+xml' },
  json: { name: 'Concept JSON', extensions: ['json'], mime: 'application/json' },
  csv: { name: 'CSV table', extensions: ['csv'], mime: 'text/csv' },
} as const;

export type ExportKind = keyof typeof EXPORT_KINDS;

export interface ExportFileRequest {
  kind: ExportKind;
  /** File name offered in the dialog, without folders. */
  suggestedName: string;
  content: string;
}

/** The file written, or null when the person cancelled the dialog. */
export type ExportFileResponse = { file: string } | null;

export interface DesktopApi extends RemoteService {
  onCommand(listener: (command: WindowCommand) => void): () => void;
  exportFile(request: ExportFileRequest): Promise<ServiceResult<ExportFileResponse>>;
}
