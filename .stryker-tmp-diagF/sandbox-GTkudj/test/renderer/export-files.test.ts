// @ts-nocheck
import { csvParse } from 'd3';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it, vi } from 'vitest';
import { evaluationCsv } from '../../app/chart/boundaries-csv';
import { constraintDiagramSvg } from '../../app/chart/svg';
import { bufferIO } from '../../app/cli/io';
import { main } from '../../app/cli/main';
import { exportBytes, httpPrinter, TOKEN_HEADER } from '../../app/renderer/lib/api/client';
import { base64ToBytes, bytesToBase64 } from '../../app/renderer/lib/export/base64';
import { exportFileName, fileStem } from '../../app/renderer/lib/export/file-names';
import { svgPixelSize } from '../../app/renderer/lib/export/png';
import { DEMO_CONCEPTS, evaluateDesign, parseConcept } from '../../core';

const folder = mkdtempSync(join(tmpdir(), 'loftpoint-export-files-'));
afterAll(() => rmSync(folder, { recursive: true, force: true }));

describe('base64', () => {
  // The test vectors of RFC 4648, section 10.
  it.each([
    ['', ''],
    ['f', 'Zg=='],
    ['fo', 'Zm8='],
    ['foo', 'Zm9v'],
    ['foob', 'Zm9vYg=='],
    ['fooba', 'Zm9vYmE='],
    ['foobar', 'Zm9vYmFy'],
  ])('encodes "%s" as "%s" and back', (text, encoded) => {
    const bytes = new TextEncoder().encode(text);
    expect(bytesToBase64(bytes)).toBe(encoded);
    expect(new TextDecoder().decode(base64ToBytes(encoded))).toBe(text);
  });

  it('agrees with Node’s encoder on every byte value, across chunk boundaries', () => {
    const bytes = Uint8Array.from({ length: 100_003 }, (_, i) => (i * 7919) % 256);
    const encoded = bytesToBase64(bytes);
    expect(encoded).toBe(Buffer.from(bytes).toString('base64'));
    expect(Buffer.from(base64ToBytes(encoded)).equals(Buffer.from(bytes))).toBe(true);
  });
});

describe('exportBytes', () => {
  it('keeps text as text and decodes base64 to bytes', async () => {
    expect(exportBytes({ kind: 'csv', suggestedName: 'a.csv', content: 'a,b' })).toBe('a,b');
    const png = exportBytes({ kind: 'png', suggestedName: 'a.png', content: 'iVBORw0KGgo=', encoding: 'base64' }) as Uint8Array;
    // The PNG signature (W3C PNG specification, section 5.2).
    expect([...png]).toEqual([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
  });
});

describe('file names', () => {
  it.each([
    ['LP-2 two-seat trainer', 'report-pdf', undefined, 'LP-2-two-seat-trainer-review.pdf'],
    ['LP-2 two-seat trainer', 'diagram-png', 4, 'LP-2-two-seat-trainer-v4-diagram.png'],
    ['../../etc/passwd', 'boundaries-csv', undefined, 'etc-passwd-boundaries.csv'],
    ['Ω', 'concept-json', undefined, 'concept.json'],
    [undefined, 'diagram-svg', undefined, 'concept-diagram.svg'],
  ] as const)('%s as %s (version %s) -> %s', (name, what, version, expected) => {
    expect(exportFileName(name, what, version)).toBe(expected);
  });

  it('keeps names short', () => {
    expect(fileStem('x'.repeat(500)).length).toBe(80);
  });
});

describe('svgPixelSize', () => {
  it('reads the diagram’s own width and height', () => {
    const parsed = parseConcept(DEMO_CONCEPTS[0].concept);
    if (!parsed.ok) throw new Error('demo does not parse');
    expect(svgPixelSize(constraintDiagramSvg(evaluateDesign(parsed.design)))).toEqual({ width: 1040, height: 700 });
  });

  it('falls back to the viewBox, and refuses what has no size', () => {
    expect(svgPixelSize('<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 320 200"></svg>')).toEqual({ width: 320, height: 200 });
    expect(() => svgPixelSize('<svg width="100%" height="100%"></svg>')).toThrow('no size');
    expect(() => svgPixelSize('<p>not svg</p>')).toThrow('not an SVG');
  });
});

describe('the boundaries CSV from the window', () => {
  const trainer = DEMO_CONCEPTS.find((demo) => demo.slug === 'trainer')!;
  const parsed = parseConcept(trainer.concept);
  if (!parsed.ok) throw new Error('demo does not parse');
  const evaluation = evaluateDesign(parsed.design);

  it.each(['si', 'us'] as const)('is byte for byte what `loftpoint evaluate --csv --units %s` prints', async (units) => {
    const concept = join(folder, `trainer-${units}.json`);
    writeFileSync(concept, JSON.stringify(trainer.concept));
    const io = bufferIO();
    expect(await main(['evaluate', concept, '--csv', '--units', units], io)).toBe(0);
    expect(evaluationCsv({ name: parsed.design.name, evaluation, system: units })).toBe(io.stdout());
  });

  it('states the stall limit the lift equation gives, and parses as a table with a column per curve', () => {
    const csv = evaluationCsv({ name: parsed.design.name, evaluation, system: 'si' });
    // W/S = ½ ρ0 V² CLmax at stall (lift equation), ρ0 = 1.225 kg/m^3 (ICAO standard atmosphere),
    // 45 kt = 45 × 0.514444 m/s (NIST SP 811), CLmax 2.05 in landing flaps as the demo states.
    const expected = 0.5 * 1.225 * (45 * 0.514444) ** 2 * 2.05;
    const line = csv.split('\n').find((row) => row.startsWith('# Limit stall'))!;
    const stated = Number(/at most ([\d.]+) N\/m\^2/.exec(line)![1]);
    expect(Math.abs(stated - expected) / expected).toBeLessThan(1e-4);
    const rows = csvParse(csv.split('\n').filter((row) => !row.startsWith('#')).join('\n'));
    expect(rows.columns[0]).toBe('wing loading [N/m^2]');
    expect(rows.columns).toContain('cruise [W/N]');
    expect(rows.length).toBeGreaterThan(100);
    expect(rows.every((row) => Number.isFinite(Number(row['wing loading [N/m^2]'])))).toBe(true);
  });
});

describe('httpPrinter', () => {
  const pdf = new TextEncoder().encode('%PDF-1.7\n%%EOF');

  it('posts the report with the token and hands back the PDF', async () => {
    const fetcher = vi.fn(async () => new Response(pdf, { status: 200, headers: { 'Content-Type': 'application/pdf' } }));
    const bytes = await httpPrinter('tok', fetcher as unknown as typeof fetch)('<!DOCTYPE html>');
    expect([...bytes]).toEqual([...pdf]);
    const [url, init] = fetcher.mock.calls[0] as unknown as [string, RequestInit];
    expect(url).toBe('./api/print/pdf');
    expect((init.headers as Record<string, string>)[TOKEN_HEADER]).toBe('tok');
    expect(JSON.parse(String(init.body))).toEqual({ html: '<!DOCTYPE html>' });
  });

  it('passes on the server’s message, and says when the server is gone', async () => {
    const refusal = async () => new Response(JSON.stringify({ ok: false, error: { code: 'io', message: 'no Chromium found; set CHROMIUM_PATH' } }), { status: 503, headers: { 'Content-Type': 'application/json' } });
    await expect(httpPrinter('tok', refusal as unknown as typeof fetch)('<!DOCTYPE html>')).rejects.toThrow('no Chromium found; set CHROMIUM_PATH');
    const gone = async () => {
      throw new TypeError('Failed to fetch');
    };
    await expect(httpPrinter('tok', gone as unknown as typeof fetch)('<!DOCTYPE html>')).rejects.toThrow('not answering');
    const damaged = async () => new Response('<html>', { status: 200, headers: { 'Content-Type': 'application/pdf' } });
    await expect(httpPrinter('tok', damaged as unknown as typeof fetch)('<!DOCTYPE html>')).rejects.toThrow('damaged PDF');
  });
});
