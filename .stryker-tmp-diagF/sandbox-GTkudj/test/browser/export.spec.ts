/**
 * Export from the window in browser mode: each kind arrives as a download
 * and is read back with tools from outside the project: the SVG with the
 * browser's XML parser, the PNG by its signature and IHDR header (W3C PNG
 * specification sections 5.2 and 11.2.2), the CSV with d3's CSV parser, the
 * PDF with Poppler's pdftotext. The report's numbers are the ones the
 * Design point panel shows.
 */
// @ts-nocheck

import { execFileSync } from 'node:child_process';
import { existsSync, mkdirSync, mkdtempSync, readFileSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { csvParse } from 'd3';
import { PRELIMINARY_CAUTION } from '../../core/caution';
import { expectSameDrawing, exportOne, fileCensus, windowCensus } from './diagram-census';
import { expect, test, type DesignerWindow } from './window';

const SCREENSHOTS = fileURLToPath(new URL('./screenshots', import.meta.url));
const PNG_SIGNATURE = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
const words = (text: string) => text.replace(/\s+/g, ' ').trim();

/** The optimum as the Design point panel shows it. */
async function optimumShown(window: DesignerWindow): Promise<{ wingLoading: string; loading: string }> {
  await window.byTest('tab-point').click();
  const optimum = window.byTest('design-point-panel').locator('h3:text-is("Optimum") + dl');
  const wingLoading = words((await window.byTest('optimum-wing-loading').textContent()) ?? '');
  const loading = words((await optimum.locator('dd').nth(1).textContent()) ?? '');
  expect(wingLoading).toMatch(/^\d/);
  expect(loading).toMatch(/^\d/);
  return { wingLoading, loading };
}

test('exports the report as PDF and HTML, the diagram as SVG and PNG, the boundaries and the concept', async ({ window, page }) => {
  await window.selectConcept('LP-2 two-seat trainer');
  const shown = await optimumShown(window);
  await window.byTest('tab-history').click();
  const newest = Number((await window.byTest('version-list').locator('li').first().getAttribute('data-testid'))!.replace('version-', ''));
  await window.byTest('tab-point').click();
  await expect(window.byTest('unsaved')).toHaveCount(0);

  await window.byTest('export').click();
  await expect(window.page.getByRole('menuitem')).toHaveText([
    'Design-review report (PDF)',
    'Design-review report (HTML)',
    'Diagram (SVG)',
    'Diagram (PNG)',
    'Boundaries (CSV)',
    'Concept (JSON)',
  ]);
  await window.shot('export-menu');
  await window.byTest('export').click();

  // The diagram as SVG: well-formed XML holding every boundary label the window shows.
  const svg = await exportOne(window, 'export-svg');
  expect(svg.name).toBe(`LP-2-two-seat-trainer-v${newest}-diagram.svg`);
  const parsed = await page.evaluate((text) => {
    const xml = new DOMParser().parseFromString(text, 'image/svg+xml');
    return { error: xml.querySelector('parsererror')?.textContent ?? null, root: xml.documentElement.nodeName, text: xml.documentElement.textContent ?? '' };
  }, svg.bytes.toString('utf8'));
  expect(parsed.error).toBeNull();
  expect(parsed.root).toBe('svg');
  const labels = await page.locator('[data-testid^="label-"]').allTextContents();
  expect(labels.length).toBeGreaterThan(2);
  for (const label of labels) expect(words(parsed.text)).toContain(words(label));

  // The diagram as PNG: a real PNG at twice the SVG's 1040 x 700 pixels.
  const png = await exportOne(window, 'export-png');
  expect(png.name).toBe(`LP-2-two-seat-trainer-v${newest}-diagram.png`);
  expect(png.bytes.subarray(0, 8).equals(PNG_SIGNATURE)).toBe(true);
  expect(png.bytes.subarray(12, 16).toString('latin1')).toBe('IHDR');
  expect([png.bytes.readUInt32BE(16), png.bytes.readUInt32BE(20)]).toEqual([2080, 1400]);
  expect(png.bytes.length).toBeGreaterThan(30_000);
  mkdirSync(SCREENSHOTS, { recursive: true });
  writeFileSync(join(SCREENSHOTS, 'export-diagram.png'), png.bytes);

  // The boundaries: the caution and the limits as comments, then a table with a row per sampled wing loading.
  const csv = await exportOne(window, 'export-csv');
  expect(csv.name).toBe(`LP-2-two-seat-trainer-v${newest}-boundaries.csv`);
  const csvText = csv.bytes.toString('utf8');
  expect(csvText).toContain(`# ${PRELIMINARY_CAUTION}`);
  expect(csvText).toMatch(/^# Limit stall \(Stall speed\): wing loading at most [\d.]+ N\/m\^2$/m);
  const table = csvParse(csvText.split('\n').filter((line) => !line.startsWith('#')).join('\n'));
  expect(table.columns[0]).toBe('wing loading [N/m^2]');
  expect(table.columns).toContain('cruise [W/N]');
  expect(table.length).toBeGreaterThan(100);
  expect(table.every((row) => Number(row['wing loading [N/m^2]']) > 0)).toBe(true);

  // The concept as JSON, as the window holds it.
  const json = await exportOne(window, 'export-json');
  expect(JSON.parse(json.bytes.toString('utf8')).name).toBe('LP-2 two-seat trainer');

  // The report as HTML: the version the draft equals, the caution, and the optimum as the panel shows it.
  await window.byTest('export').click();
  const arriving = page.waitForEvent('download', { timeout: 90_000 });
  await window.byTest('export-report-html').click();
  await expect(window.byTest('status-message')).toContainText('Preparing the report');
  await expect(window.byTest('export')).toHaveText('Exporting…');
  await window.shot('preparing-the-report');
  // The studies run in a worker: the window keeps answering meanwhile.
  await window.byTest('units-us').click();
  await expect(window.byTest('units-us')).toHaveAttribute('aria-pressed', 'true');
  await window.byTest('units-si').click();
  const htmlDownload = await arriving;
  const html = readFileSync((await htmlDownload.path())!, 'utf8');
  expect(htmlDownload.suggestedFilename()).toBe(`LP-2-two-seat-trainer-v${newest}-review.html`);
  expect(html).toContain(PRELIMINARY_CAUTION);
  expect(html).toContain(shown.wingLoading);
  expect(html).toContain(shown.loading);
  expect(html).toContain(`Version ${newest} of concept`);
  await expect(window.byTest('status-message')).toContainText(`Design-review report (HTML) written to LP-2-two-seat-trainer-v${newest}-review.html`);

  // The report as PDF, printed by the server's Chromium: its text holds the same numbers and the caution.
  const pdf = await exportOne(window, 'export-report-pdf');
  expect(pdf.name).toBe(`LP-2-two-seat-trainer-v${newest}-review.pdf`);
  expect(pdf.bytes.subarray(0, 5).toString('latin1')).toBe('%PDF-');
  expect(existsSync('/usr/bin/pdftotext'), 'reading the PDF needs pdftotext: apt-get install -y poppler-utils').toBe(true);
  const folder = mkdtempSync(join(tmpdir(), 'loftpoint-export-pdf-'));
  try {
    const file = join(folder, 'review.pdf');
    writeFileSync(file, pdf.bytes);
    const text = words(execFileSync('/usr/bin/pdftotext', [file, '-'], { encoding: 'utf8' }));
    expect(text).toContain(shown.wingLoading);
    expect(text).toContain(shown.loading);
    expect(text).toContain(words(PRELIMINARY_CAUTION));
    if (existsSync('/usr/bin/pdftoppm')) {
      // The first pages as pictures, to look at beside the screenshots.
      execFileSync('/usr/bin/pdftoppm', ['-png', '-r', '50', '-f', '1', '-l', '3', file, join(folder, 'page')]);
      for (const page of readdirSync(folder).filter((name) => name.endsWith('.png'))) writeFileSync(join(SCREENSHOTS, `export-report-${page}`), readFileSync(join(folder, page)));
    }
  } finally {
    rmSync(folder, { recursive: true, force: true });
  }
  await window.shot('after-exports');
  await window.expectNoNaN();
});

test('an edited draft is reported as an unsaved draft, in the window’s units', async ({ window, page }) => {
  await window.selectConcept('LP-2 two-seat trainer');
  const card = await window.openRequirement('cruise');
  await card.getByLabel('Cruise speed (TAS)').fill('121 kt');
  await expect(window.byTest('unsaved')).toBeVisible();
  await window.byTest('units-us').click();
  const shown = await optimumShown(window);
  expect(shown.wingLoading).toContain('lb/ft²');

  const report = await exportOne(window, 'export-report-html');
  expect(report.name).toBe('LP-2-two-seat-trainer-review.html');
  const html = report.bytes.toString('utf8');
  expect(html).toContain('Source: Unsaved draft, edited from version');
  expect(html).toContain('This report was made from an unsaved draft in the designer window');
  expect(html).toContain('speed 121.0 kt');
  expect(html).toContain(shown.wingLoading);
  expect(html).toContain(shown.loading);
  expect(html).toContain('US customary units');

  await window.shot('draft-report-exported');
  await window.expectNoNaN();
});

test('the exported diagram draws what the window draws: markers, boundaries, labels, bands, the W/P view', async ({ window, page }) => {
  await window.selectConcept('LP-2 two-seat trainer');
  await window.byTest('toggle-bands').click();
  await expect(window.byTest('bands').locator('path.band')).not.toHaveCount(0);
  for (const view of ['pw', 'wp'] as const) {
    await window.byTest(`axis-${view}`).click();
    await expect(window.byTest('y-title')).toContainText(view === 'wp' ? 'Power loading W/P' : 'Power-to-weight P/W');
    const shown = await windowCensus(window);
    const exported = await exportOne(window, 'export-svg');
    const written = await fileCensus(window, exported.bytes.toString('utf8'));
    expectSameDrawing(written, shown);
    expect(shown.counts.optimum).toBe(1);
    expect(shown.counts['design-point']).toBe(1);
    expect(shown.counts.band).toBeGreaterThan(3);
    mkdirSync(SCREENSHOTS, { recursive: true });
    writeFileSync(join(SCREENSHOTS, `export-diagram-${view}.svg`), exported.bytes);
    await window.shot(`diagram-${view}`);
  }
  await window.byTest('axis-pw').click();
  await window.byTest('toggle-bands').click();
});
