/**
 * Export from the window: the design-review report (HTML, or PDF printed by
 * the shell), the diagram (SVG, or PNG drawn in the page), the boundaries
 * CSV and the concept JSON. One export at a time; while a report is being
 * prepared the status line says so and the window keeps answering. The
 * writers (SVG, CSV, the report) are chunks of their own, fetched on the first
 * export, so the window's first page does not carry them.
 */
import { STALE_CONTOUR_INK } from '../../../chart/study-style';
import type { ExportFileRequest, WindowCommand } from '../../../shared/desktop-api';
import type { Connection } from '../api/client';
import type { DiagramView } from '../diagram/view.svelte';
import type { WindowStudies } from '../studies/window-studies.svelte';
import type { Preferences } from '../state/preferences.svelte';
import type { ProjectState } from '../state/project.svelte';
import type { Workspace } from '../state/workspace.svelte';
import { bytesToBase64 } from './base64';
import { exportFileName, type ExportWhat } from './file-names';
import { svgToPngBytes } from './png';
import { reportOrigin } from './report-origin';
import type { WindowReportRequest } from './report-request';

export type { ExportWhat } from './file-names';

/** The Export menu, in its order. */
export const EXPORT_MENU: ReadonlyArray<{ what: ExportWhat; label: string; testId: string }> = [
  { what: 'report-pdf', label: 'Design-review report (PDF)', testId: 'export-report-pdf' },
  { what: 'report-html', label: 'Design-review report (HTML)', testId: 'export-report-html' },
  { what: 'diagram-svg', label: 'Diagram (SVG)', testId: 'export-svg' },
  { what: 'diagram-png', label: 'Diagram (PNG)', testId: 'export-png' },
  { what: 'boundaries-csv', label: 'Boundaries (CSV)', testId: 'export-csv' },
  { what: 'concept-json', label: 'Concept (JSON)', testId: 'export-json' },
];

const WRITTEN: Record<ExportWhat, string> = {
  'report-pdf': 'Design-review report (PDF)',
  'report-html': 'Design-review report (HTML)',
  'diagram-svg': 'Diagram',
  'diagram-png': 'Diagram (PNG)',
  'boundaries-csv': 'Boundaries',
  'concept-json': 'Concept',
};

type ExportCommand = Extract<WindowCommand, `export-${string}`>;

const COMMANDS: Record<ExportCommand, ExportWhat> = {
  'export-report-pdf': 'report-pdf',
  'export-report-html': 'report-html',
  'export-diagram': 'diagram-svg',
  'export-diagram-png': 'diagram-png',
  'export-boundaries': 'boundaries-csv',
  'export-concept': 'concept-json',
};

/** The export a menu command asks for. */
export function exportForCommand(command: ExportCommand): ExportWhat {
  return COMMANDS[command];
}

export interface ExporterParts {
  connection: Connection;
  workspace: Workspace;
  project: ProjectState;
  preferences: Preferences;
  /** The diagram's zoom and pan, so the exported diagram shows what the window shows. */
  view?: DiagramView;
  /** The study layers the diagram shows (bands, contours), so the export shows them too. */
  studies?: WindowStudies;
}

export class Exporter {
  readonly #parts: ExporterParts;
  /** The export under way, or null. */
  busy = $state<ExportWhat | null>(null);

  constructor(parts: ExporterParts) {
    this.#parts = parts;
  }

  async run(what: ExportWhat): Promise<void> {
    if (this.busy !== null) return;
    const { project } = this.#parts;
    this.busy = what;
    try {
      const request = await this.#request(what);
      const file = await this.#parts.connection.exportFile(request);
      project.status = file ? { kind: 'info', text: `${WRITTEN[what]} written to ${file}.` } : null;
    } catch (error) {
      project.status = { kind: 'error', text: `Export failed: ${error instanceof Error ? error.message : String(error)}` };
    } finally {
      this.busy = null;
    }
  }

  /** The design and evaluation in the window; refuses while the concept has problems (the diagram then shows an older state). */
  #resolved() {
    const { workspace } = this.#parts;
    const issue = workspace.issues[0];
    if (issue) throw new Error(`the concept has problems to fix first (${issue.path || 'concept'}: ${issue.message})`);
    if (!workspace.current) throw new Error('the concept has problems to fix first');
    return workspace.current;
  }

  #version(): number | undefined {
    const { project } = this.#parts;
    if (project.viewing) return project.viewing.number;
    return !project.dirty && project.parent !== null && project.online ? project.parent : undefined;
  }

  async #diagramSvg(): Promise<string> {
    const { workspace, project, preferences } = this.#parts;
    const { evaluation } = this.#resolved();
    const { studyDiagramSvg } = await import('../../../chart/study-svg');
    const older = project.comparison;
    const overlays = older?.olderEvaluation ? [{ name: `Version ${older.older.number}`, evaluation: older.olderEvaluation }] : [];
    // The window's view of the diagram: units, the loading axis (P/W or W/P), zoom and pan, the older version drawn behind and the study layers shown.
    const studies = this.#parts.studies;
    const bands = studies?.showBands && studies.bands?.ok ? studies.bands.bands : [];
    const result = studies?.showContours ? studies.result : null;
    return studyDiagramSvg(evaluation, {
      system: preferences.units,
      title: String(workspace.document.name ?? ''),
      overlays,
      alternatives: project.alternatives.map(({ name, evaluation: other }) => ({ name, evaluation: other })),
      powerLoading: preferences.powerLoading,
      view: this.#parts.view?.current ?? null,
      bands,
      bandIds: studies?.bandedIds ?? null,
      ...(result ? { map: result.map, ...(studies?.stale ? { contourInk: STALE_CONTOUR_INK } : {}) } : {}),
    });
  }

  async #request(what: ExportWhat): Promise<ExportFileRequest> {
    const { workspace, preferences } = this.#parts;
    const suggestedName = exportFileName(workspace.document.name, what, this.#version());
    switch (what) {
      case 'concept-json':
        return { kind: 'json', suggestedName, content: `${JSON.stringify(workspace.document, null, 2)}\n` };
      case 'diagram-svg':
        return { kind: 'svg', suggestedName, content: await this.#diagramSvg() };
      case 'diagram-png':
        return { kind: 'png', suggestedName, encoding: 'base64', content: bytesToBase64(await svgToPngBytes(await this.#diagramSvg())) };
      case 'boundaries-csv': {
        const { design, evaluation } = this.#resolved();
        const { evaluationCsv } = await import('../../../chart/boundaries-csv');
        return { kind: 'csv', suggestedName, content: evaluationCsv({ name: design.name, evaluation, system: preferences.units }) };
      }
      case 'report-html':
        return { kind: 'html', suggestedName, content: await this.#report() };
      case 'report-pdf': {
        const html = await this.#report();
        this.#parts.project.status = { kind: 'info', text: 'Printing the report to PDF…' };
        const pdf = await this.#parts.connection.printPdf(html);
        return { kind: 'pdf', suggestedName, encoding: 'base64', content: bytesToBase64(pdf) };
      }
    }
  }

  async #report(): Promise<string> {
    const { workspace, project, preferences, connection } = this.#parts;
    this.#resolved();
    // Taken now, so edits made while the report is prepared do not slip into it. Plain data: a worker takes copies only.
    const concept = JSON.parse(JSON.stringify(workspace.document)) as unknown;
    const system = preferences.units;
    const origin = reportOrigin({ project: project.project, service: connection.service, viewing: project.viewing, parent: project.parent, dirty: project.dirty });
    project.status = { kind: 'info', text: 'Preparing the report… (running the studies)' };
    const alternatives = project.alternatives.map(({ name, concept: other }) => ({ name, concept: JSON.parse(JSON.stringify(other)) as unknown }));
    const request: WindowReportRequest = { concept, system, ...(await origin), generatedAt: new Date().toISOString(), ...(alternatives.length > 0 ? { alternatives } : {}) };
    const { buildReportOffThread } = await import('./run-report');
    return buildReportOffThread(request);
  }
}
