/**
 * The file names the window offers for its exports: the concept's name made
 * safe for any file system, the version when a saved one is shown, and what
 * the file holds.
 */
// @ts-nocheck

export type ExportWhat = 'report-pdf' | 'report-html' | 'diagram-svg' | 'diagram-png' | 'boundaries-csv' | 'concept-json';

/** "LP-2 two-seat trainer" -> "LP-2-two-seat-trainer"; "concept" when nothing is left. */
export function fileStem(name: unknown): string {
  const text = typeof name === 'string' ? name : '';
  return text.replace(/[^A-Za-z0-9_-]+/g, '-').replace(/^-+|-+$/g, '').slice(0, 80) || 'concept';
}

const ENDINGS: Record<ExportWhat, string> = {
  'report-pdf': '-review.pdf',
  'report-html': '-review.html',
  'diagram-svg': '-diagram.svg',
  'diagram-png': '-diagram.png',
  'boundaries-csv': '-boundaries.csv',
  'concept-json': '.json',
};

export function exportFileName(name: unknown, what: ExportWhat, version?: number): string {
  return `${fileStem(name)}${version === undefined ? '' : `-v${version}`}${ENDINGS[what]}`;
}
