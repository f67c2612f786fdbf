/**
 * `loftpoint evaluate`, run in-process through main() for speed, plus a few
 * real runs of the bin. Reference relations come from core/methods.md section 7
 * (sizing S = W_TO / w, P = (P/W) W_TO; margins as relative loading) and
 * DESIGN.md ("The evaluation"); unit factors from NIST SP 811.
 */
// @ts-nocheck

import { spawnSync } from 'node:child_process';
import { chmodSync, existsSync, mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { csvParse } from 'd3';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { main } from '../../app/cli/main';
import { bufferIO } from '../../app/cli/io';
import { DEMO_CONCEPTS, evaluateDesign, parseConcept, type CurveBoundaryJson, type Evaluation, type LimitBoundaryJson } from '../../core';

const ROOT = resolve(__dirname, '../..');
const G0 = 9.80665; // standard gravity, m/s^2 (CGPM 1901, exact)
const PSF_PA = 47.880258980335843; // 1 lbf/ft^2 in Pa (NIST SP 811, Appendix B)
const HP_PER_LBF_PER_W_PER_N = 4.4482216152605 / 745.69987158227022; // hp/lbf per W/N (NIST SP 811; core/methods.md section 7: 0.0059652)
const CAUTION = /certification requirements come from the applicable authority.*licensed engineering review/s;

let dir: string;
const demoFile = (slug: string) => join(dir, `${slug}.json`);

async function run(...args: string[]) {
  const io = bufferIO();
  const code = await main(args, io);
  return { code, stdout: io.stdout(), stderr: io.stderr() };
}

function expectedEvaluation(slug: string): Evaluation {
  const demo = DEMO_CONCEPTS.find((candidate) => candidate.slug === slug)!;
  const parsed = parseConcept(demo.concept);
  if (!parsed.ok) throw new Error(`demo ${slug} does not parse`);
  return evaluateDesign(parsed.design);
}

/** A demo concept with one change, written to its own file. */
function variant(name: string, change: (concept: any) => void): string {
  const concept = structuredClone(DEMO_CONCEPTS[0].concept) as any;
  change(concept);
  const file = join(dir, name);
  writeFileSync(file, JSON.stringify(concept, null, 2));
  return file;
}

beforeAll(async () => {
  dir = mkdtempSync(join(tmpdir(), 'loftpoint-evaluate-'));
  for (const demo of DEMO_CONCEPTS) writeFileSync(demoFile(demo.slug), JSON.stringify(demo.concept, null, 2));
});

afterAll(() => {
  rmSync(dir, { recursive: true, force: true });
});

describe('the demos', () => {
  it('include a propeller and a turbofan concept, so both axes are exercised', () => {
    const kinds = DEMO_CONCEPTS.map((demo) => demo.concept.aircraft.propulsion.kind);
    expect(kinds).toContain('turbofan');
    expect(kinds.some((kind) => kind !== 'turbofan')).toBe(true);
  });
});

describe('loftpoint evaluate FILE (report)', () => {
  for (const demo of DEMO_CONCEPTS) {
    it(`reports ${demo.slug}: every requirement, optimum, design point, sizing, speeds and the caution`, async () => {
      const { code, stdout, stderr } = await run('evaluate', demoFile(demo.slug));
      expect(stderr).toBe('');
      expect(code).toBe(0);
      const evaluation = expectedEvaluation(demo.slug);
      expect(stdout).toContain(demo.concept.name!);
      for (const boundary of evaluation.boundaries) expect(stdout).toMatch(new RegExp(`^  ${boundary.id}\\s`, 'm'));
      for (const heading of ['REQUIREMENTS', 'OPTIMUM', 'DESIGN POINT', 'SIZING', 'CHARACTERISTIC SPEEDS', 'WARNINGS', 'CAUTION']) {
        expect(stdout).toContain(heading);
      }
      expect(stdout).toMatch(CAUTION);
      expect(stdout).not.toMatch(/NaN|undefined|Infinity|\[object/);
      const optimum = evaluation.optimum!;
      expect(stdout).toContain(`Bound by`);
      for (const id of optimum.active) expect(stdout).toMatch(new RegExp(`Bound by\\s+.*${id}`));
      const wingLoading = Math.round(optimum.wingLoading).toLocaleString('en-US');
      expect(stdout).toMatch(new RegExp(`Wing loading\\s+${wingLoading} N/m²`));
      expect(stdout).toMatch(evaluation.axis === 'thrustToWeight' ? /Installed thrust\s+[\d,.]+ kN/ : /Installed power\s+[\d,.]+ kW/);
    });
  }

  it('reports in US customary units with --units us (lb/ft², hp/lb, kt)', async () => {
    const { code, stdout } = await run('evaluate', demoFile('trainer'), '--units', 'us');
    expect(code).toBe(0);
    const optimum = expectedEvaluation('trainer').optimum!;
    const psf = (optimum.wingLoading / PSF_PA).toFixed(1);
    const hpPerLb = ((optimum.powerToWeight as number) * HP_PER_LBF_PER_W_PER_N).toFixed(4);
    expect(stdout).toMatch(new RegExp(`Wing loading\\s+${psf} lb/ft²`));
    expect(stdout).toMatch(new RegExp(`Power-to-weight\\s+${hpPerLb} hp/lb`));
    expect(stdout).toMatch(/Stall, clean\s+[\d.]+ kt/);
    expect(stdout).toMatch(/Installed power\s+[\d,]+ hp/);
    expect(stdout).toMatch(CAUTION);
  });

  it('says so when nothing on the diagram meets every requirement', async () => {
    const file = variant('impossible.json', (concept) => {
      concept.requirements.push({ id: 'fast', kind: 'cruise', speed: '400 kt', altitude: '30000 ft', powerSetting: 0.1 });
      concept.requirements.push({ id: 'slow', kind: 'stall', speed: '20 kt' });
    });
    const { code, stdout } = await run('evaluate', file);
    expect(code).toBe(0);
    expect(stdout).toContain('Nothing on the diagram meets every requirement.');
    expect(stdout).not.toMatch(/NaN|undefined/);
    expect(stdout).toMatch(CAUTION);
  });
});

describe('loftpoint evaluate FILE --json', () => {
  for (const demo of DEMO_CONCEPTS) {
    it(`prints the evaluation of ${demo.slug} exactly, field for field as DESIGN.md describes`, async () => {
      const { code, stdout, stderr } = await run('evaluate', demoFile(demo.slug), '--json');
      expect(stderr).toBe('');
      expect(code).toBe(0);
      const expected = expectedEvaluation(demo.slug);
      expect(stdout).toBe(`${JSON.stringify(expected, null, 2)}\n`);
      const json = JSON.parse(stdout) as Evaluation;

      const propellerKinds = ['piston', 'turbocharged-piston', 'turboprop', 'electric'];
      const kind = demo.concept.aircraft.propulsion.kind;
      const axis = kind === 'turbofan' ? 'thrustToWeight' : 'powerToWeight';
      expect(propellerKinds.includes(kind) || kind === 'turbofan').toBe(true);
      expect(json.format).toBe('loftpoint-evaluation/1');
      expect(json.axis).toBe(axis);

      // Boundaries: a limit or a curve sampled evenly over the range, ends included.
      const ids = demo.concept.requirements.filter((r: any) => r.enabled !== false).map((r: any) => r.id);
      expect(json.boundaries.map((b) => b.id)).toEqual(ids);
      const curves = json.boundaries.filter((b): b is CurveBoundaryJson => 'points' in b);
      const samples = demo.concept.diagram?.samples ?? 201;
      for (const boundary of json.boundaries) {
        expect(typeof boundary.kind).toBe('string');
        if ('wingLoadingMax' in boundary) {
          expect((boundary as LimitBoundaryJson).wingLoadingMax).toBeGreaterThan(0);
        } else {
          expect(boundary.points).toHaveLength(samples);
          for (const [w, y] of boundary.points) {
            expect(Number.isFinite(w)).toBe(true);
            expect(y === null || Number.isFinite(y)).toBe(true);
          }
        }
      }
      const xs = curves[0].points.map(([w]) => w);
      const step = (xs[xs.length - 1] - xs[0]) / (xs.length - 1);
      xs.forEach((w, i) => expect(w).toBeCloseTo(xs[0] + i * step, 6));

      // Optimum: least loading on the diagram, every enabled requirement has a margin, active ones ~0.
      const optimum = json.optimum!;
      const y = optimum[axis] as number;
      expect(Object.keys(optimum)).toEqual(expect.arrayContaining(['wingLoading', axis, 'active', 'margins']));
      expect(optimum.margins.map((m) => m.id)).toEqual(ids);
      for (const id of optimum.active) expect(Math.abs(optimum.margins.find((m) => m.id === id)!.margin)).toBeLessThan(2e-3);
      for (const margin of optimum.margins) expect(margin.margin).toBeGreaterThan(-1e-6);
      // No feasible sample needs less loading than the optimum (core/methods.md section 7: w* = argmin E).
      const cap = Math.min(...json.boundaries.filter((b): b is LimitBoundaryJson => 'wingLoadingMax' in b).map((b) => b.wingLoadingMax));
      xs.forEach((w, i) => {
        if (w > cap) return;
        const values = curves.map((curve) => curve.points[i][1]);
        if (values.some((v) => v === null)) return;
        expect(Math.max(...(values as number[]))).toBeGreaterThanOrEqual(y * (1 - 1e-6));
      });

      // Design point: feasible exactly when every margin is met; limit margins are 1 - w/w_lim (core/methods.md section 7).
      const point = json.designPoint!;
      expect(typeof point.feasible).toBe('boolean');
      expect(point.margins.map((m) => m.id)).toEqual(ids);
      expect(point.feasible).toBe(point.margins.every((m) => m.margin >= -1e-9));
      for (const boundary of json.boundaries) {
        if (!('wingLoadingMax' in boundary)) continue;
        const margin = point.margins.find((m) => m.id === boundary.id)!.margin;
        expect(margin).toBeCloseTo(1 - point.wingLoading / boundary.wingLoadingMax, 9);
      }

      // Speeds (m/s) and sizing at take-off mass (core/methods.md section 7: S = W_TO / w, P = (P/W) W_TO).
      for (const key of ['stall', 'minimumDrag', 'minimumPower'] as const) expect(json.speeds[key]).toBeGreaterThan(0);
      const weight = Number.parseFloat(demo.concept.aircraft.takeoffMass as string) * (/(^|\s)lb$/.test(demo.concept.aircraft.takeoffMass as string) ? 0.45359237 : 1) * G0;
      expect(json.sizing!.wingArea).toBeCloseTo(weight / point.wingLoading, 6);
      const installed = axis === 'thrustToWeight' ? json.sizing!.thrust : json.sizing!.power;
      expect(installed).toBeCloseTo((point[axis] as number) * weight, 3);
      expect(Array.isArray(json.warnings)).toBe(true);
    });
  }

  it('samples as finely as the concept asks, up to 40,000 wing loadings, with the same optimum', async () => {
    const fine = variant('fine.json', (c) => (c.diagram = { ...c.diagram, samples: 40000 }));
    const result = await run('evaluate', fine, '--json');
    expect(result.stderr).toBe('');
    expect(result.code).toBe(0);
    const json = JSON.parse(result.stdout) as Evaluation;
    const coarse = JSON.parse((await run('evaluate', demoFile('trainer'), '--json')).stdout) as Evaluation;
    for (const curve of json.boundaries.filter((b): b is CurveBoundaryJson => 'points' in b)) {
      expect(curve.points).toHaveLength(40000);
      const step = curve.points[1][0] - curve.points[0][0];
      expect(curve.points[39999][0] - curve.points[39998][0]).toBeCloseTo(step, 6); // evenly spaced (DESIGN.md, "The evaluation")
    }
    // The optimum is searched on a grid at least as fine as 4000 points whatever is plotted (core/methods.md section 7).
    expect(Math.abs(json.optimum!.wingLoading - coarse.optimum!.wingLoading) / coarse.optimum!.wingLoading).toBeLessThan(1e-5);
  });

  it('refuses more than 40,000 samples, naming the field', async () => {
    const tooFine = variant('too-fine.json', (c) => (c.diagram = { ...c.diagram, samples: 40001 }));
    const result = await run('evaluate', tooFine, '--json');
    expect(result.code).toBe(2);
    expect(result.stderr).toContain('diagram.samples');
    expect(result.stderr).toMatch(/at most 40000/);
  });

  it('stays SI whatever --units says', async () => {
    const si = await run('evaluate', demoFile('trainer'), '--json');
    const us = await run('evaluate', demoFile('trainer'), '--json', '--units', 'us');
    expect(us.code).toBe(0);
    expect(us.stdout).toBe(si.stdout);
  });
});

function csvTable(text: string) {
  const comments = text.split('\n').filter((line) => line.startsWith('#'));
  const body = text.split('\n').filter((line) => !line.startsWith('#')).join('\n');
  return { comments, rows: csvParse(body) };
}

describe('loftpoint evaluate FILE --csv', () => {
  for (const demo of DEMO_CONCEPTS) {
    it(`parses back to the sampled boundaries of ${demo.slug} (d3-dsv's CSV parser)`, async () => {
      const { code, stdout } = await run('evaluate', demoFile(demo.slug), '--csv');
      expect(code).toBe(0);
      const evaluation = expectedEvaluation(demo.slug);
      const { comments, rows } = csvTable(stdout);
      const curves = evaluation.boundaries.filter((b): b is CurveBoundaryJson => 'points' in b);
      const limits = evaluation.boundaries.filter((b): b is LimitBoundaryJson => 'wingLoadingMax' in b);
      const unit = evaluation.axis === 'thrustToWeight' ? 'T/W' : 'W/N';
      expect(rows.columns).toEqual(['wing loading [N/m^2]', ...curves.map((c) => `${c.id} [${unit}]`)]);
      expect(rows).toHaveLength(curves[0].points.length);
      rows.forEach((row, i) => {
        expect(Number(row['wing loading [N/m^2]'])).toBe(curves[0].points[i][0]);
        for (const curve of curves) {
          const cell = row[`${curve.id} [${unit}]`];
          const value = curve.points[i][1];
          if (value === null) expect(cell).toBe('');
          else expect(Number(cell)).toBe(value);
        }
      });
      for (const limit of limits) expect(comments.some((line) => line.includes(`Limit ${limit.id}`) && line.includes(String(limit.wingLoadingMax)))).toBe(true);
      expect(comments.join('\n')).toMatch(CAUTION);
    });
  }

  it('leaves a cell empty where no power meets the requirement', async () => {
    const slug = DEMO_CONCEPTS.find((demo) =>
      expectedEvaluation(demo.slug).boundaries.some((b) => 'points' in b && b.points.some(([, y]) => y === null)),
    )?.slug;
    expect(slug, 'a demo with a curve that has gaps').toBeDefined();
    const { stdout } = await run('evaluate', demoFile(slug!), '--csv');
    const { rows } = csvTable(stdout);
    expect(rows.some((row) => Object.values(row).some((cell) => cell === ''))).toBe(true);
  });

  it('converts to lb/ft² and hp/lb with --units us', async () => {
    const { code, stdout } = await run('evaluate', demoFile('trainer'), '--csv', '--units', 'us');
    expect(code).toBe(0);
    const evaluation = expectedEvaluation('trainer');
    const curve = evaluation.boundaries.find((b): b is CurveBoundaryJson => 'points' in b)!;
    const { rows } = csvTable(stdout);
    expect(rows.columns[0]).toBe('wing loading [lb/ft^2]');
    const [w, y] = curve.points[7];
    expect(Number(rows[7]['wing loading [lb/ft^2]'])).toBeCloseTo(w / PSF_PA, 9);
    expect(Number(rows[7][`${curve.id} [hp/lb]`])).toBeCloseTo((y as number) * HP_PER_LBF_PER_W_PER_N, 9);
  });
});

async function parseXml(text: string): Promise<Document> {
  // jsdom's XML parser (a general-purpose library); loaded by name so no type package is needed.
  const jsdom = 'jsdom';
  const { JSDOM } = (await import(jsdom)) as { JSDOM: new (html: string) => { window: { DOMParser: typeof DOMParser } } };
  const doc = new new JSDOM('').window.DOMParser().parseFromString(text, 'image/svg+xml');
  expect(doc.getElementsByTagName('parsererror')).toHaveLength(0);
  return doc;
}

describe('loftpoint evaluate FILE --svg OUT', () => {
  for (const demo of DEMO_CONCEPTS) {
    it(`writes a well-formed SVG of ${demo.slug} with every boundary labelled and the caution`, async () => {
      const out = join(dir, `${demo.slug}.svg`);
      const { code, stdout, stderr } = await run('evaluate', demoFile(demo.slug), '--svg', out);
      expect(stderr).toBe('');
      expect(code).toBe(0);
      expect(stdout.trimEnd().split('\n')).toHaveLength(1);
      expect(stdout).toContain(out);
      const svg = readFileSync(out, 'utf8');
      const doc = await parseXml(svg);
      expect(doc.documentElement.tagName).toBe('svg');
      const texts = [...doc.getElementsByTagName('text')].map((node) => node.textContent ?? '');
      expect(texts).toContain(demo.concept.name);
      const labelled = [...doc.getElementsByTagName('text')]
        .filter((node) => node.getAttribute('data-role') === 'label')
        .map((node) => node.getAttribute('data-id'));
      for (const boundary of expectedEvaluation(demo.slug).boundaries) expect(labelled).toContain(boundary.id);
      expect(texts.join('\n')).toMatch(CAUTION);
      expect(texts).toContain('Wing loading W/S [N/m²]');
      expect(svg).not.toMatch(/NaN|undefined|Infinity/);
    });
  }

  it('draws in US customary units with --units us', async () => {
    const out = join(dir, 'trainer-us.svg');
    const { code } = await run('evaluate', demoFile('trainer'), '--svg', out, '--units', 'us');
    expect(code).toBe(0);
    const texts = [...(await parseXml(readFileSync(out, 'utf8'))).getElementsByTagName('text')].map((n) => n.textContent);
    expect(texts).toEqual(expect.arrayContaining(['Wing loading W/S [lb/ft²]', 'Power-to-weight P/W [hp/lb]']));
  });

  it('replaces an earlier SVG, but never the concept or any other file', async () => {
    const out = join(dir, 'again.svg');
    expect((await run('evaluate', demoFile('trainer'), '--svg', out)).code).toBe(0);
    expect((await run('evaluate', demoFile('survey-drone'), '--svg', out)).code).toBe(0);
    expect(readFileSync(out, 'utf8')).toContain(DEMO_CONCEPTS.find((d) => d.slug === 'survey-drone')!.concept.name);

    const before = readFileSync(demoFile('trainer'), 'utf8');
    await expectInputError(['evaluate', demoFile('trainer'), '--svg', demoFile('trainer')], demoFile('trainer'), '--svg', /file being evaluated/);
    expect(readFileSync(demoFile('trainer'), 'utf8')).toBe(before);

    const notes = join(dir, 'notes.txt');
    writeFileSync(notes, 'design review notes');
    await expectInputError(['evaluate', demoFile('trainer'), '--svg', notes], demoFile('trainer'), '--svg', /not an SVG file written by Loftpoint; it was left as it was/);
    expect(readFileSync(notes, 'utf8')).toBe('design review notes');
  });

  it('never replaces a file Loftpoint did not write, even one holding <svg, nor a read-only earlier SVG; --force replaces only the former', async () => {
    const page = join(dir, 'page.html');
    const drawing = join(dir, 'drawing.svg');
    const html = '<!doctype html><html><body><svg width="10"></svg></body></html>';
    const svg = '<svg xmlns="http://www.w3.org/2000/svg"><rect width="5" height="5"/></svg>';
    writeFileSync(page, html);
    writeFileSync(drawing, svg);
    await expectInputError(['evaluate', demoFile('trainer'), '--svg', page], demoFile('trainer'), '--svg', /not an SVG file written by Loftpoint; it was left as it was \(choose another name, or add --force to replace it\)/);
    await expectInputError(['evaluate', demoFile('trainer'), '--svg', drawing], demoFile('trainer'), '--svg', /add --force to replace it/);
    expect(readFileSync(page, 'utf8')).toBe(html);
    expect(readFileSync(drawing, 'utf8')).toBe(svg);

    expect((await run('evaluate', demoFile('trainer'), '--svg', drawing, '--force')).code).toBe(0);
    expect(readFileSync(drawing, 'utf8')).toContain('Written by Loftpoint');

    const locked = join(dir, 'locked.svg');
    expect((await run('evaluate', demoFile('trainer'), '--svg', locked)).code).toBe(0);
    const before = readFileSync(locked, 'utf8');
    chmodSync(locked, 0o444);
    for (const extra of [[], ['--force']]) {
      await expectInputError(['evaluate', demoFile('survey-drone'), '--svg', locked, ...extra], demoFile('survey-drone'), '--svg', /read-only; it was left as it was \(even --force never replaces a read-only file\)/);
    }
    expect(readFileSync(locked, 'utf8')).toBe(before);
  });

  it('refuses a take-off mass of 1e308 lb as input (its weight overflows double precision), naming the field', async () => {
    const file = variant('huge-mass', (concept) => {
      concept.aircraft.takeoffMass = '1e308 lb';
    });
    await expectInputError(['evaluate', file, '--json'], file, 'aircraft.takeoffMass', /too large a number to compute with/);
  });

  it('refuses a folder that does not exist, writing nothing', async () => {
    const out = join(dir, 'no-such-folder', 'x.svg');
    const { code, stdout, stderr } = await run('evaluate', demoFile('trainer'), '--svg', out);
    expect(code).toBe(2);
    expect(stdout).toBe('');
    expect(stderr).toMatch(/^loftpoint: .*trainer\.json: --svg: the folder .*no-such-folder does not exist\n$/);
    expect(existsSync(out)).toBe(false);
  });
});

/** Exit 2, one stderr line naming the file and the field, nothing on stdout. */
async function expectInputError(args: string[], file: string, field: string, what: RegExp) {
  const { code, stdout, stderr } = await run(...args);
  expect(stdout).toBe('');
  expect(code).toBe(2);
  expect(stderr.endsWith('\n')).toBe(true);
  expect(stderr.trimEnd().split('\n')).toHaveLength(1);
  expect(stderr).toContain(file);
  if (field) expect(stderr).toContain(`: ${field}: `);
  expect(stderr).toMatch(what);
  expect(stderr).not.toMatch(/\n\s+at /);
}

describe('loftpoint evaluate: bad input', () => {
  it('malformed JSON', async () => {
    const file = join(dir, 'malformed.json');
    writeFileSync(file, '{ "format": "loftpoint-concept/1", "name": "x",, }');
    await expectInputError(['evaluate', file], file, '', /JSON.*line 1, column \d+/);
  });

  it('a dimensional value without its unit', async () => {
    const file = variant('bare.json', (c) => (c.requirements[0].speed = 45));
    await expectInputError(['evaluate', file], file, 'requirements[0].speed', /unit/);
  });

  it('a linear drag term that makes the least drag negative', async () => {
    // Trainer demo's clean polar: C_D0 0.029, e 0.79, AR 7.4: K1^2/(4K) = 0.01 x pi 0.79 7.4/4 = 0.0459 > 0.029.
    const file = variant('negative-drag.json', (c) => (c.aircraft.aero.cdLinear = -0.1));
    await expectInputError(['evaluate', file], file, 'aircraft.aero.cdLinear', /least drag .* not positive/);
  });

  it('a ground-run lift coefficient at or above C_Lmax', async () => {
    const file = variant('ground-run-cl.json', (c) => {
      const roll = c.requirements.find((r: { kind: string }) => r.kind === 'takeoff-ground-roll');
      roll.clGroundRun = 2.5;
    });
    await expectInputError(['evaluate', file], file, '', /clGroundRun: 2\.5 is at or above the takeoff C_Lmax/);
  });

  it('a misspelt field, named before the missing field it was meant to be', async () => {
    const file = variant('misspelt.json', (c) => {
      c.aircraft.aero.aspectRatoi = c.aircraft.aero.aspectRatio;
      delete c.aircraft.aero.aspectRatio;
    });
    await expectInputError(['evaluate', file], file, 'aircraft.aero.aspectRatoi', /did you mean "aspectRatio"\?/);
  });

  it('an unknown field', async () => {
    const file = variant('unknown-field.json', (c) => (c.aircraft.wingspan = '10 m'));
    await expectInputError(['evaluate', file], file, 'aircraft.wingspan', /unknown field/);
  });

  it('an unknown requirement kind', async () => {
    const file = variant('unknown-kind.json', (c) => (c.requirements[1].kind = 'hover'));
    await expectInputError(['evaluate', file], file, 'requirements[1].kind', /hover/);
  });

  it('a negative mass', async () => {
    const file = variant('negative-mass.json', (c) => (c.aircraft.takeoffMass = '-750 kg'));
    await expectInputError(['evaluate', file], file, 'aircraft.takeoffMass', /greater than 0/);
  });

  it('an Oswald efficiency above 1', async () => {
    const file = variant('oswald.json', (c) => (c.aircraft.aero.configurations.clean.oswaldEfficiency = 1.2));
    await expectInputError(['evaluate', file], file, 'aircraft.aero.configurations.clean.oswaldEfficiency', /at most 1/);
  });

  it('an aspect ratio of 0', async () => {
    const file = variant('aspect-ratio.json', (c) => (c.aircraft.aero.aspectRatio = 0));
    await expectInputError(['evaluate', file], file, 'aircraft.aero.aspectRatio', /greater than 0/);
  });

  it('no requirements', async () => {
    const file = variant('no-requirements.json', (c) => (c.requirements = []));
    await expectInputError(['evaluate', file], file, 'requirements', /at least one/);
  });

  it('a file that does not exist', async () => {
    const file = join(dir, 'missing.json');
    await expectInputError(['evaluate', file], file, '', /no such file/);
  });

  it('a folder', async () => {
    const folder = join(dir, 'a-folder');
    mkdirSync(folder, { recursive: true });
    await expectInputError(['evaluate', folder], folder, '', /is a folder/);
  });

  it('an unknown --units value', async () => {
    await expectInputError(['evaluate', demoFile('trainer'), '--units', 'metric'], demoFile('trainer'), '--units', /si, us or kt-ft.*metric/);
  });

  it('--version on a concept JSON file', async () => {
    await expectInputError(['evaluate', demoFile('trainer'), '--version', '2'], demoFile('trainer'), '--version', /project files/);
  });

  it('more than one of --json, --csv and --svg', async () => {
    await expectInputError(['evaluate', demoFile('trainer'), '--json', '--csv'], demoFile('trainer'), '--csv', /choose one output/);
    await expectInputError(['evaluate', demoFile('trainer'), '--csv', '--svg', join(dir, 'y.svg')], demoFile('trainer'), '--svg', /choose one output/);
    expect(existsSync(join(dir, 'y.svg'))).toBe(false);
  });

  it('a SQLite file that is not a project', async () => {
    const file = join(dir, 'other.db');
    writeFileSync(file, Buffer.concat([Buffer.from('SQLite format 3\0', 'latin1'), Buffer.alloc(20)]));
    const { code, stdout, stderr } = await run('evaluate', file, '--version', '1');
    expect(stdout).toBe('');
    expect(code).toBe(2);
    expect(stderr.trimEnd().split('\n')).toHaveLength(1);
    expect(stderr).toContain(file);
  });
});

describe('loftpoint evaluate PROJECT --version N', () => {
  let project: string;

  beforeAll(async () => {
    const { ProjectService } = await import('../../app/service');
    project = join(dir, 'fleet.loftpoint');
    const service = new ProjectService();
    service.createProject({ file: project, name: 'Evaluate tests', demo: true });
    service.closeProject({});
  });

  it('evaluates the stored version exactly like its concept JSON', async () => {
    const { ProjectService } = await import('../../app/service');
    const service = new ProjectService();
    service.openProject({ file: project, readonly: true });
    const versions = service.listVersions({});
    service.closeProject({});
    expect(versions.length).toBe(DEMO_CONCEPTS.length);
    for (const version of versions) {
      const demo = DEMO_CONCEPTS.find((candidate) => candidate.concept.name === version.conceptName)!;
      const fromProject = await run('evaluate', project, '--version', String(version.number), '--json');
      const fromFile = await run('evaluate', demoFile(demo.slug), '--json');
      expect(fromProject.code).toBe(0);
      expect(fromProject.stdout).toBe(fromFile.stdout);
    }
    const report = await run('evaluate', project, '--version', '1');
    expect(report.stdout).toContain(`${project}, version 1`);
    expect(report.stdout).toMatch(CAUTION);
  });

  it('asks for --version when none is given', async () => {
    await expectInputError(['evaluate', project], project, '--version', /--version N/);
  });

  it('names a version that does not exist', async () => {
    await expectInputError(['evaluate', project, '--version', '99'], project, '--version', /99/);
  });

  it('rejects a version that is not a number', async () => {
    await expectInputError(['evaluate', project, '--version', 'latest'], project, '--version', /version number/);
  });
});

describe('the loftpoint bin', () => {
  const bin = join(ROOT, 'app/cli/loftpoint.js');
  const spawn = (...args: string[]) => spawnSync(process.execPath, [bin, ...args], { cwd: dir, encoding: 'utf8', timeout: 60_000 });

  it('prints the report and exits 0', () => {
    const result = spawn('evaluate', demoFile('trainer'));
    expect(result.stderr).toBe('');
    expect(result.status).toBe(0);
    expect(result.stdout).toContain('OPTIMUM');
    expect(result.stdout).toMatch(CAUTION);
  });

  it('exits 2 with one line on stderr and nothing on stdout for a bad file', () => {
    const file = variant('spawn-bad.json', (c) => (c.aircraft.aero.configurations.clean.oswaldEfficiency = 1.2));
    const result = spawn('evaluate', file, '--json');
    expect(result.status).toBe(2);
    expect(result.stdout).toBe('');
    expect(result.stderr.trimEnd().split('\n')).toHaveLength(1);
    expect(result.stderr).toContain(`${file}: aircraft.aero.configurations.clean.oswaldEfficiency: `);
    expect(result.stderr).not.toMatch(/\bat .*\.ts:\d+/);
  });

  it('writes the SVG from a real process', () => {
    const result = spawn('evaluate', demoFile('business-jet'), '--svg', 'jet.svg', '--units', 'us');
    expect(result.status).toBe(0);
    expect(result.stdout.trim()).toBe(`Wrote the constraint diagram of ${DEMO_CONCEPTS.find((d) => d.slug === 'business-jet')!.concept.name} to ${join(dir, 'jet.svg')}`);
    expect(readFileSync(join(dir, 'jet.svg'), 'utf8')).toContain('lb/ft²');
  });
});
