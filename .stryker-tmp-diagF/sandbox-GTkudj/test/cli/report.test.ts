/**
 * `loftpoint report`, run in-process through main() for speed, plus one real
 * run of the bin. Outputs are read back with outside parsers: jsdom's
 * DOMParser for HTML and SVG, d3's csvParse for CSV, Poppler's pdftotext for
 * PDF. Reference relation: the trainer's optimum is on its stall limit,
 * w = 1/2 rho0 V^2 CLmax (Anderson, Introduction to Flight), so its wing
 * loading is 673 N/m² for 45 kt and CLmax 2.05 (rho0 = 1.225 kg/m^3, U.S.
 * Standard Atmosphere 1976; 1 kt = 1852/3600 m/s, NIST SP 811).
 */
// @ts-nocheck

import { execFileSync, spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { csvParse } from 'd3';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { main } from '../../app/cli/main';
import { bufferIO } from '../../app/cli/io';
import { findChromium } from '../../app/report/chromium';
import { DEMO_CONCEPTS, evaluateDesign, formatQuantity, parseConcept, PRELIMINARY_CAUTION, typicalUncertainty } from '../../core';

const ROOT = resolve(__dirname, '../..');
const RHO0 = 1.225; // kg/m^3, U.S. Standard Atmosphere 1976
const KT = 1852 / 3600; // m/s per knot, NIST SP 811

let dir: string;
let trainer: string;
let parser: DOMParser;

/** jsdom's DOMParser, loaded by name: this file runs in Node (the server modules main() loads need Node's URL). */
async function jsdomParser(): Promise<DOMParser> {
  const name = 'jsdom';
  const { JSDOM } = (await import(/* @vite-ignore */ name)) as { JSDOM: new () => { window: { DOMParser: new () => DOMParser } } };
  return new new JSDOM().window.DOMParser();
}

const html = (text: string) => parser.parseFromString(text, 'text/html');
const xml = (text: string) => parser.parseFromString(text, 'image/svg+xml');
const at = (name: string) => join(dir, name);

async function run(...args: string[]) {
  const io = bufferIO();
  const code = await main(args, io);
  return { code, stdout: io.stdout(), stderr: io.stderr() };
}

/** Exit 2, nothing on stdout, one line on stderr naming the file and the field. */
async function expectRefused(args: string[], file: string, field: string, message: RegExp) {
  const before = readdirSync(dir).sort();
  const { code, stdout, stderr } = await run('report', ...args);
  expect(code).toBe(2);
  expect(stdout).toBe('');
  expect(stderr.endsWith('\n')).toBe(true);
  expect(stderr.trimEnd().split('\n')).toHaveLength(1);
  expect(stderr.startsWith(`loftpoint: ${file}: ${field}: `)).toBe(true);
  expect(stderr).toMatch(message);
  expect(stderr).not.toMatch(/\n\s+at /);
  expect(readdirSync(dir).sort()).toEqual(before);
}

function trainerConcept() {
  return structuredClone(DEMO_CONCEPTS.find((demo) => demo.slug === 'trainer')!.concept) as any;
}

const trainerOptimum = () => {
  const parsed = parseConcept(trainerConcept());
  if (!parsed.ok) throw new Error('trainer demo does not parse');
  return evaluateDesign(parsed.design).optimum!;
};

beforeAll(async () => {
  parser = await jsdomParser();
  dir = mkdtempSync(join(tmpdir(), 'loftpoint-report-'));
  trainer = at('trainer.json');
  writeFileSync(trainer, JSON.stringify(trainerConcept(), null, 2));
});

afterAll(() => {
  rmSync(dir, { recursive: true, force: true });
});

describe('loftpoint report FILE --out PATH', () => {
  it('writes a self-contained HTML report and says where, with the caution', async () => {
    const out = at('review.html');
    const { code, stdout, stderr } = await run('report', trainer, '--out', out, '--samples', '500');
    expect(stderr).toBe('');
    expect(code).toBe(0);
    expect(stdout).toBe(`Wrote the design-review report (HTML) of LP-2 two-seat trainer to ${out}\n${PRELIMINARY_CAUTION}\n`);
    const doc = html(readFileSync(out, 'utf8'));
    const optimum = trainerOptimum();
    expect(optimum.wingLoading).toBeCloseTo(0.5 * RHO0 * (45 * KT) ** 2 * 2.05, 0);
    const points = doc.querySelector('#diagram table.points')!.textContent!;
    expect(points).toContain(formatQuantity(optimum.wingLoading, 'wingLoading', 'si'));
    expect(points).toContain(formatQuantity(optimum.powerToWeight, 'powerToWeight', 'si'));
    expect(doc.querySelector('#studies')!.textContent).toContain('500 samples, seed 1');
    expect(doc.querySelector('header')!.textContent).toContain(`Source: ${trainer}`);
  });

  it('uses US units, the step, the seed and the sample count it is given', async () => {
    const out = at('review-us.html');
    const { code } = await run('report', trainer, '--out', out, '--units', 'us', '--step', '5%', '--samples', '300', '--seed', '42');
    expect(code).toBe(0);
    const doc = html(readFileSync(out, 'utf8'));
    expect(doc.querySelector('#costs h2')!.textContent).toBe('What each requirement costs (step 5 %)');
    expect(doc.querySelector('#studies')!.textContent).toContain('300 samples, seed 42');
    expect(doc.querySelector('#diagram table.points')!.textContent).toContain(formatQuantity(trainerOptimum().wingLoading, 'wingLoading', 'us'));
    // A 5 % step of a 45 kt stall speed relaxes it to 47.25 kt (shown to one decimal).
    expect(doc.querySelector('#costs')!.textContent).toMatch(/47\.[23] kt/);
  });

  it('writes the diagram with bands and contours as SVG', async () => {
    const concept = { ...trainerConcept(), uncertainty: { seed: 5, samples: 400, parameters: [{ field: 'aircraft.aero.configurations.landing.clMax', low: 1.9, high: 2.2 }] } };
    const file = at('ranged.json');
    writeFileSync(file, JSON.stringify(concept));
    const out = at('diagram.svg');
    const { code, stdout } = await run('report', file, '--out', out);
    expect(code).toBe(0);
    expect(stdout).toContain('constraint diagram with bands and probability contours (SVG)');
    const doc = xml(readFileSync(out, 'utf8'));
    expect(doc.getElementsByTagName('parsererror')).toHaveLength(0);
    // Landing CLmax moves the stall limit and the landing-roll limit (core/methods.md section 6), nothing else.
    expect([...doc.querySelectorAll('[data-role="band"]')].map((g) => g.getAttribute('data-id'))).toEqual(['stall', 'landing-grass']);
    expect(doc.querySelectorAll('[data-role="contour"]').length).toBeGreaterThan(0);
    expect(doc.documentElement.textContent).toContain('Monte Carlo: 400 samples, seed 5');
  });

  it('writes the boundaries as CSV, as evaluate --csv does', async () => {
    const out = at('boundaries.csv');
    const { code } = await run('report', trainer, '--out', out);
    expect(code).toBe(0);
    const text = readFileSync(out, 'utf8');
    expect(text).toContain(`# ${PRELIMINARY_CAUTION}`);
    const rows = csvParse(text.split('\n').filter((line) => !line.startsWith('#')).join('\n'));
    expect(rows.columns[0]).toBe('wing loading [N/m^2]');
    expect(rows.columns).toContain('cruise [W/N]');
    const { stdout: evaluated } = await run('evaluate', trainer, '--csv');
    // The file carries Loftpoint's mark on its first line, then exactly what evaluate --csv prints.
    expect(text).toBe(`# Written by Loftpoint\n${evaluated}`);
  });

  it('replaces its own earlier output, but nothing else', async () => {
    const out = at('again.html');
    expect((await run('report', trainer, '--out', out, '--samples', '200')).code).toBe(0);
    expect((await run('report', trainer, '--out', out, '--samples', '200')).code).toBe(0);
    const notes = at('notes.csv');
    writeFileSync(notes, 'a,b\n1,2\n');
    await expectRefused([trainer, '--out', notes], trainer, '--out', /notes\.csv exists and is not a CSV file written by Loftpoint; it was left as it was/);
    expect(readFileSync(notes, 'utf8')).toBe('a,b\n1,2\n');
  });

  it('never overwrites the file it reports on', async () => {
    const sneaky = at('concept.html');
    const text = JSON.stringify(trainerConcept());
    writeFileSync(sneaky, text);
    await expectRefused([sneaky, '--out', sneaky], sneaky, '--out', /names the file being reported on/);
    expect(readFileSync(sneaky, 'utf8')).toBe(text);
  });
});

describe('loftpoint report with bad input', () => {
  it('refuses an output kind it does not write, naming the extension', async () => {
    await expectRefused([trainer, '--out', at('review.docx')], trainer, '--out', /has the extension "\.docx", which Loftpoint does not write; use \.html, \.pdf, \.svg, \.png or \.csv/);
    await expectRefused([trainer, '--out', at('review')], trainer, '--out', /has no extension/);
  });

  it('needs --out', async () => {
    await expectRefused([trainer], trainer, '--out', /needs the file to write, e\.g\. --out review\.pdf/);
  });

  it('refuses bad units, steps, sample counts and seeds', async () => {
    const out = at('x.html');
    await expectRefused([trainer, '--out', out, '--units', 'imperial'], trainer, '--units', /must be si, us or kt-ft, not "imperial"/);
    await expectRefused([trainer, '--out', out, '--step', '0%'], trainer, '--step', /percentage between 0 and 100/);
    await expectRefused([trainer, '--out', out, '--step', 'lots'], trainer, '--step', /not "lots"/);
    await expectRefused([trainer, '--out', out, '--step', '10'], trainer, '--step', /"10" is ambiguous/);
    await expectRefused([trainer, '--out', out, '--samples', '5'], trainer, '--samples', /whole number from 100 to 1,000,000/);
    await expectRefused([trainer, '--out', out, '--seed', '-1'], trainer, '--seed', /whole number from 0 to 4,294,967,295/);
  });

  it('names the file and the field of a bad concept', async () => {
    const broken = at('broken.json');
    const concept = trainerConcept();
    concept.requirements[0].speed = 45;
    writeFileSync(broken, JSON.stringify(concept));
    await expectRefused([broken, '--out', at('b.html')], broken, 'requirements[0].speed', /unit/);
    const ranged = at('bad-range.json');
    writeFileSync(ranged, JSON.stringify({ ...trainerConcept(), uncertainty: { parameters: [{ field: 'aircraft.aero.aspectRatio', low: 9, high: 12 }] } }));
    await expectRefused([ranged, '--out', at('r.html')], ranged, 'uncertainty.parameters[0].low', /above the concept's value/);
    const malformed = at('malformed.json');
    writeFileSync(malformed, '{ "format": ');
    const { code, stderr } = await run('report', malformed, '--out', at('m.html'));
    expect(code).toBe(2);
    expect(stderr).toMatch(new RegExp(`^loftpoint: ${malformed.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}: .*line 1`));
  });

  it('names a missing input, a missing folder and --version on a JSON file', async () => {
    const missing = at('missing.json');
    const { code, stderr } = await run('report', missing, '--out', at('m.html'));
    expect(code).toBe(2);
    expect(stderr).toBe(`loftpoint: ${missing}: no such file\n`);
    await expectRefused([trainer, '--out', at('nowhere/m.html')], trainer, '--out', /the folder .*nowhere does not exist/);
    await expectRefused([trainer, '--out', at('v.html'), '--version', '2'], trainer, '--version', /applies only to project files/);
    mkdirSync(at('folder.html'));
    await expectRefused([trainer, '--out', at('folder.html')], trainer, '--out', /is a folder/);
  });

  it('says what to install when PDF output has no Chromium', async () => {
    const saved = process.env.CHROMIUM_PATH;
    process.env.CHROMIUM_PATH = at('no-browser-here');
    try {
      await expectRefused([trainer, '--out', at('r.pdf')], trainer, '--out', /CHROMIUM_PATH is .*no-browser-here, which is not an executable file\. PDF and PNG output need Chromium: install it/);
    } finally {
      if (saved === undefined) delete process.env.CHROMIUM_PATH;
      else process.env.CHROMIUM_PATH = saved;
    }
  });

  it('exits 2 with one line from the real bin', () => {
    const result = spawnSync(process.execPath, [join(ROOT, 'app/cli/loftpoint.js'), 'report', trainer, '--out', at('r.xlsx')], { encoding: 'utf8' });
    expect(result.status).toBe(2);
    expect(result.stdout).toBe('');
    expect(result.stderr.trimEnd().split('\n')).toHaveLength(1);
    expect(result.stderr).toMatch(/^loftpoint: .*trainer\.json: --out: .*"\.xlsx"/);
  });
});

describe('loftpoint report PROJECT --version N', () => {
  let project: string;

  beforeAll(async () => {
    project = at('club.loftpoint');
    expect((await run('project', 'create', project, '--demo')).code).toBe(0);
    const next = trainerConcept();
    next.requirements.find((r: { id: string }) => r.id === 'cruise').speed = '115 kt';
    const file = at('trainer-v5.json');
    writeFileSync(file, JSON.stringify(next));
    const saved = await run('project', 'save', project, file, '--note', 'Cruise target 115 kt <script>alert(1)</script>\nafter the club survey', '--author', 'M. Okafor', '--concept', 'LP-2 two-seat trainer');
    expect(saved.stderr).toBe('');
    expect(saved.stdout.trim()).toBe('5');
  });

  it('reports the version with its note as text and what changed since its parent', async () => {
    const out = at('v5.html');
    const { code, stderr } = await run('report', project, '--version', '5', '--out', out, '--samples', '200');
    expect(stderr).toBe('');
    expect(code).toBe(0);
    const doc = html(readFileSync(out, 'utf8'));
    expect(doc.getElementsByTagName('script')).toHaveLength(0);
    expect(doc.querySelector('#version pre.note')!.textContent).toBe('Cruise target 115 kt <script>alert(1)</script>\nafter the club survey');
    const header = doc.querySelector('header')!.textContent!;
    expect(header).toContain('Version 5 of concept “LP-2 two-seat trainer”');
    expect(header).toContain('by M. Okafor');
    expect(header).toContain('edited from version 1');
    const version = doc.querySelector('#version')!.textContent!;
    expect(version).toContain('What changed since version 1');
    expect(version).toContain('speed: 110 kt → 115 kt');
  });

  it('refuses a version that does not exist, naming --version', async () => {
    await expectRefused([project, '--version', '99', '--out', at('v99.html')], project, '--version', /99/);
  });
});

const chromium = (() => {
  try {
    return findChromium();
  } catch {
    return null;
  }
})();
const pdftotext = existsSync('/usr/bin/pdftotext');
if (!chromium || !pdftotext) console.warn('loftpoint report --out .pdf/.png test skipped: Chromium or pdftotext not found (install chromium and poppler-utils)');

describe.skipIf(!chromium || !pdftotext)('loftpoint report --out review.pdf / diagram.png', () => {
  it('prints a PDF whose text holds the optimum as the HTML prints it, and a PNG', async () => {
    const concept = trainerConcept();
    const parsed = parseConcept(concept);
    if (!parsed.ok) throw new Error('trainer demo does not parse');
    const file = at('trainer-ranged.json');
    writeFileSync(file, JSON.stringify({ ...concept, uncertainty: typicalUncertainty(parsed.design, { samples: 1000 }) }));
    const out = at('review.pdf');
    const { code, stdout } = await run('report', file, '--out', out);
    expect(code).toBe(0);
    expect(stdout).toContain('design-review report (PDF)');
    const text = execFileSync('/usr/bin/pdftotext', ['-enc', 'UTF-8', out, '-'], { encoding: 'utf8' });
    const optimum = trainerOptimum();
    expect(text).toContain(formatQuantity(optimum.wingLoading, 'wingLoading', 'si'));
    expect(text).toContain(formatQuantity(optimum.powerToWeight, 'powerToWeight', 'si'));
    expect(text).toContain('Studies over the concept’s ranges');
    const png = at('diagram.png');
    expect((await run('report', file, '--out', png)).code).toBe(0);
    expect(readFileSync(png).subarray(1, 4).toString('latin1')).toBe('PNG');
  });
});
