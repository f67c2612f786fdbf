// @ts-nocheck
import { describe, expect, it, vi } from 'vitest';
import { evaluationCsv } from '../../app/chart/boundaries-csv';
import type { Connection } from '../../app/renderer/lib/api/client';
import { setIn } from '../../app/renderer/lib/concept/edit';
import { base64ToBytes } from '../../app/renderer/lib/export/base64';
import { DiagramView } from '../../app/renderer/lib/diagram/view.svelte';
import { EXPORT_MENU, Exporter, exportForCommand } from '../../app/renderer/lib/export/exporter.svelte';
import { Preferences } from '../../app/renderer/lib/state/preferences.svelte';
import { ProjectState } from '../../app/renderer/lib/state/project.svelte';
import { Workspace } from '../../app/renderer/lib/state/workspace.svelte';
import type { ExportFileRequest } from '../../app/shared/desktop-api';
import { checkPrintRequest } from '../../app/shared/print-request';
import { PRELIMINARY_CAUTION } from '../../core';

// A PDF file starts with "%PDF-" (ISO 32000-1 section 7.5.2).
const PDF = new TextEncoder().encode('%PDF-1.7\n%%EOF\n');

async function windowParts(options: { printPdf?: Connection['printPdf']; chosen?: string | null } = {}) {
  const written: ExportFileRequest[] = [];
  const connection: Connection = {
    mode: 'offline',
    service: null,
    onCommand: () => () => {},
    exportFile: vi.fn(async (request: ExportFileRequest) => {
      written.push(request);
      return options.chosen === undefined ? `/home/ada/${request.suggestedName}` : options.chosen;
    }),
    printPdf: options.printPdf ?? vi.fn(async () => PDF),
  };
  const workspace = new Workspace({});
  const project = new ProjectState(connection, workspace);
  await project.start();
  const preferences = new Preferences(undefined);
  const exporter = new Exporter({ connection, workspace, project, preferences });
  return { connection, workspace, project, preferences, exporter, written };
}

describe('Exporter', () => {
  it('offers every export in the menu, and each menu command maps to one', () => {
    expect(EXPORT_MENU.map((item) => item.what)).toEqual(['report-pdf', 'report-html', 'diagram-svg', 'diagram-png', 'boundaries-csv', 'concept-json']);
    expect(exportForCommand('export-report-pdf')).toBe('report-pdf');
    expect(exportForCommand('export-diagram')).toBe('diagram-svg');
    expect(exportForCommand('export-boundaries')).toBe('boundaries-csv');
  });

  it('writes the boundaries CSV of the concept in the window, in the window’s units', async () => {
    const { exporter, written, workspace, preferences, project } = await windowParts();
    preferences.units = 'us';
    await exporter.run('boundaries-csv');
    const { design, evaluation } = workspace.current!;
    expect(written).toEqual([{ kind: 'csv', suggestedName: 'LP-2-two-seat-trainer-boundaries.csv', content: evaluationCsv({ name: design.name, evaluation, system: 'us' }) }]);
    expect(written[0].content).toContain('lb/ft^2');
    expect(project.status).toEqual({ kind: 'info', text: 'Boundaries written to /home/ada/LP-2-two-seat-trainer-boundaries.csv.' });
  });

  it('writes the diagram as the window shows it: power loading W/P and the zoomed view', async () => {
    const parts = await windowParts();
    const view = new DiagramView();
    const exporter = new Exporter({ ...parts, view });
    const ticks = (svg: string) => [...svg.matchAll(/<g data-role="ticks" data-axis="x"[^>]*>(.*?)<\/g>/g)].flatMap((m) => [...m[1].matchAll(/>([^<]+)<\/text>/g)].map((t) => t[1]));
    await exporter.run('diagram-svg');
    expect(ticks(parts.written[0].content)).toContain('1,200');
    parts.preferences.powerLoading = true;
    view.pan({ x: [300, 900], y: [0, 200] }, 0, 0);
    await exporter.run('diagram-svg');
    const zoomed = parts.written[1].content;
    // W/P = 1/(P/W), in N/kW (definition of power loading, common practice).
    expect(zoomed).toContain('Power loading W/P [N/kW]');
    expect(ticks(zoomed)[0]).toBe('300');
    expect(ticks(zoomed).at(-1)).toBe('900');
  });

  it('refuses while the concept has a problem, naming the field, and writes nothing', async () => {
    const { exporter, written, workspace, project } = await windowParts();
    workspace.edit(setIn(workspace.document, ['aircraft', 'takeoffMass'], '-5 kg'));
    await exporter.run('report-html');
    expect(written).toEqual([]);
    expect(project.status?.kind).toBe('error');
    expect(project.status?.text).toMatch(/^Export failed: the concept has problems to fix first \(aircraft\.takeoffMass: /);
    // The concept itself can still be saved out, to be fixed elsewhere.
    await exporter.run('concept-json');
    expect(JSON.parse(written[0].content).aircraft.takeoffMass).toBe('-5 kg');
  });

  it('prints the report through the shell and writes the PDF as base64 bytes', async () => {
    const printPdf = vi.fn(async (_html: string) => PDF);
    const { exporter, written, project } = await windowParts({ printPdf });
    const running = exporter.run('report-pdf');
    expect(exporter.busy).toBe('report-pdf');
    await exporter.run('diagram-svg'); // one export at a time: ignored while the report is prepared
    await running;
    expect(exporter.busy).toBeNull();
    const html = printPdf.mock.calls[0][0];
    expect(checkPrintRequest({ html }).ok).toBe(true);
    expect(html).toContain(PRELIMINARY_CAUTION);
    expect(html).toContain('Unsaved draft · no project file');
    expect(written).toHaveLength(1);
    expect(written[0]).toMatchObject({ kind: 'pdf', suggestedName: 'LP-2-two-seat-trainer-review.pdf', encoding: 'base64' });
    expect([...base64ToBytes(written[0].content)]).toEqual([...PDF]);
    expect(project.status?.text).toBe('Design-review report (PDF) written to /home/ada/LP-2-two-seat-trainer-review.pdf.');
  });

  it('shows why a PDF could not be printed, and writes nothing', async () => {
    const { exporter, written, project } = await windowParts({
      printPdf: async () => {
        throw new Error('no Chromium found; set CHROMIUM_PATH');
      },
    });
    await exporter.run('report-pdf');
    expect(written).toEqual([]);
    expect(project.status).toEqual({ kind: 'error', text: 'Export failed: no Chromium found; set CHROMIUM_PATH' });
    expect(exporter.busy).toBeNull();
  });

  it('says nothing when the save dialog is cancelled', async () => {
    const { exporter, project } = await windowParts({ chosen: null });
    await exporter.run('concept-json');
    expect(project.status).toBeNull();
  });
});
