/**
 * The report printed by headless Chromium, read back with Poppler's
 * pdftotext and pdfinfo (tools from outside the project): the PDF holds the
 * optimum's wing loading and power-to-weight exactly as the HTML prints them,
 * and the caution. The PNG of the diagram is a real PNG at twice the SVG's
 * size (PNG signature and IHDR layout: ISO/IEC 15948, sections 5.2 and 11.2.2).
 */
// @ts-nocheck

import { execFileSync } from 'node:child_process';
import { existsSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { formatQuantity, PRELIMINARY_CAUTION } from '../../core';
import { findChromium, printPdf, svgToPng } from '../../app/report/chromium';
import { buildReport } from '../../app/report/report';
import { STUDY_DIAGRAM_SIZE } from '../../app/report/section-results';
import { reportDiagramSvg } from '../../app/report/section-studies';
import { runStudies } from '../../app/report/studies';
import { studied, withTypicalRanges } from '../chart/study-fixture';

function available(): { chromium: string | null; poppler: boolean } {
  let chromium: string | null = null;
  try {
    chromium = findChromium();
  } catch {
    chromium = null;
  }
  const poppler = ['/usr/bin/pdftotext', '/usr/bin/pdfinfo'].every(existsSync);
  return { chromium, poppler };
}

const { chromium, poppler } = available();
const missing = !chromium ? 'Chromium not found (install chromium or set CHROMIUM_PATH)' : !poppler ? 'Poppler not found (install poppler-utils)' : '';
if (missing) console.warn(`PDF and PNG tests skipped: ${missing}`);

const dir = mkdtempSync(join(tmpdir(), 'loftpoint-pdf-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe.skipIf(missing !== '')('the printed report', () => {
  const s = studied(withTypicalRanges('trainer', { samples: 2000 }));
  const uncertainty = { seed: s.seed, samples: s.samples, parameters: s.parameters };
  const studies = runStudies({ design: s.design, concept: s.concept, evaluation: s.evaluation, system: 'si', uncertainty });

  it('holds the optimum’s wing loading and power-to-weight as the HTML prints them, and the caution', async () => {
    const html = buildReport({ concept: s.concept, design: s.design, evaluation: s.evaluation, uncertainty, studyResults: studies, system: 'si', source: 'trainer.json' });
    const wingLoading = formatQuantity(s.evaluation.optimum!.wingLoading, 'wingLoading', 'si');
    const loading = formatQuantity(s.evaluation.optimum!.powerToWeight, 'powerToWeight', 'si');
    expect(html).toContain(wingLoading);
    expect(html).toContain(loading);
    const started = performance.now();
    const pdf = await printPdf(html, { binary: chromium! });
    const seconds = (performance.now() - started) / 1000;
    console.info(`PDF printed in ${seconds.toFixed(1)} s (${pdf.length} bytes)`);
    expect(pdf.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    const file = join(dir, 'trainer.pdf');
    writeFileSync(file, pdf);
    const text = execFileSync('/usr/bin/pdftotext', ['-enc', 'UTF-8', file, '-'], { encoding: 'utf8' });
    expect(text).toContain(wingLoading);
    expect(text).toContain(loading);
    expect(text).toContain('LP-2 two-seat trainer');
    expect(text.replace(/\s+/g, ' ')).toContain(PRELIMINARY_CAUTION);
    const pages = Number(/Pages:\s+(\d+)/.exec(execFileSync('/usr/bin/pdfinfo', [file], { encoding: 'utf8' }))![1]);
    expect(pages).toBeGreaterThanOrEqual(5);
    expect(text).toContain(`Page 1 of ${pages}`);
    expect(pdfPageSize(file)).toEqual([595, 842]); // A4 in PostScript points, ISO 216: 210 x 297 mm
  });

  it('draws the diagram as a PNG twice the size of its SVG', async () => {
    const svg = reportDiagramSvg({ design: s.design, evaluation: s.evaluation, system: 'si', studies });
    const png = await svgToPng(svg, STUDY_DIAGRAM_SIZE, { binary: chromium! });
    expect(png.subarray(0, 8)).toEqual(Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]));
    expect(png.subarray(12, 16).toString('latin1')).toBe('IHDR');
    expect([png.readUInt32BE(16), png.readUInt32BE(20)]).toEqual([2 * STUDY_DIAGRAM_SIZE.width, 2 * STUDY_DIAGRAM_SIZE.height]);
  });
});

function pdfPageSize(file: string): [number, number] {
  const info = execFileSync('/usr/bin/pdfinfo', [file], { encoding: 'utf8' });
  const [, w, h] = /Page size:\s+([\d.]+) x ([\d.]+) pts/.exec(info)!;
  return [Math.round(Number(w)), Math.round(Number(h))];
}
