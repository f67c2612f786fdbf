// @vitest-environment jsdom
/**
 * The design-review report (app/report): a self-contained HTML document with
 * every section in order, parsed back with jsdom's DOMParser (an HTML parser
 * from outside the project). Reference values: the trainer's optimum sits on
 * its stall limit, w = 1/2 rho0 V^2 CLmax (Anderson, Introduction to Flight,
 * stalling speed) with rho0 = 1.225 kg/m^3 (U.S. Standard Atmosphere 1976),
 * V = 45 kt = 45 x 1852/3600 m/s (NIST SP 811), CLmax 2.05 (the demo's
 * landing configuration); the core/methods.md typical range of CD0 for light
 * aircraft is 0.025-0.035 (common practice).
 */
import { describe, expect, it } from 'vitest';
import { formatQuantity, PRELIMINARY_CAUTION } from '../../core';
import { buildReport, type ReportInput } from '../../app/report/report';
import { demoConcept, studied, withTypicalRanges } from '../chart/study-fixture';

const RHO0 = 1.225; // kg/m^3, U.S. Standard Atmosphere 1976
const KT = 1852 / 3600; // m/s per knot, NIST SP 811
const SECTIONS = ['job', 'requirements', 'assumptions', 'diagram', 'margins', 'mass', 'sizing', 'speeds', 'studies', 'sensitivity', 'costs', 'version', 'warnings'];

function input(concept: unknown, extra: Partial<ReportInput> = {}): ReportInput {
  const s = studied(concept);
  const parsed = { concept: s.concept, design: s.design, evaluation: s.evaluation };
  const uncertainty = s.parameters.length > 0 ? { uncertainty: { seed: s.seed, samples: s.samples, parameters: s.parameters } } : {};
  return { ...parsed, ...uncertainty, system: 'si', studies: { samples: 1000 }, generatedAt: new Date('2026-01-15T10:30:00Z'), ...extra };
}

function parse(html: string): Document {
  return new DOMParser().parseFromString(html, 'text/html');
}

/** Every opening tag in the text became an element: nothing was dropped or re-nested by the parser's error recovery. */
function expectWellFormed(html: string, doc: Document): void {
  expect(html.startsWith('<!DOCTYPE html>')).toBe(true);
  for (const tag of ['section', 'table', 'tr', 'td', 'th', 'svg', 'figure', 'pre', 'p', 'h2', 'h3']) {
    const opened = (html.match(new RegExp(`<${tag}[\\s>]`, 'g')) ?? []).length;
    const closed = (html.match(new RegExp(`</${tag}>`, 'g')) ?? []).length;
    expect(closed, `</${tag}>`).toBe(opened);
    expect(doc.getElementsByTagName(tag).length, `<${tag}> elements`).toBe(opened);
  }
}

const trainerHtml = buildReport(
  input(withTypicalRanges('trainer'), {
    source: 'trainer.json',
    version: { number: 4, conceptName: 'Club trainer', note: 'Flaps <script>alert("x")</script> & "slots"\nsecond line', author: 'R. <b>Lind</b>', createdAt: '2026-01-14T08:00:00.000Z', parent: null },
  }),
);
const trainer = parse(trainerHtml);
const trainerEvaluation = studied(demoConcept('trainer')).evaluation;

describe('buildReport', () => {
  it('is a well-formed HTML document with every section, in order', () => {
    expectWellFormed(trainerHtml, trainer);
    const ids = [...trainer.querySelectorAll('section')].map((s) => s.id);
    expect(ids).toEqual(SECTIONS);
    expect(trainer.querySelector('h1')?.textContent).toBe('LP-2 two-seat trainer');
    expect(trainer.title).toContain('LP-2 two-seat trainer · version 4');
  });

  it('opens and closes with the preliminary-sizing caution', () => {
    const body = trainer.body;
    const first = body.firstElementChild?.nextElementSibling;
    expect(first?.matches('aside.caution')).toBe(true);
    expect(first?.textContent).toContain(PRELIMINARY_CAUTION);
    expect(body.lastElementChild?.matches('footer.end')).toBe(true);
    expect(body.lastElementChild?.textContent).toContain(PRELIMINARY_CAUTION);
    expect(PRELIMINARY_CAUTION).toMatch(/applicable authority.*licensed engineering review/);
  });

  it('prints the optimum as core formats it, on the stall limit 1/2 rho0 V^2 CLmax', () => {
    const optimum = trainerEvaluation.optimum!;
    expect(optimum.wingLoading).toBeCloseTo(0.5 * RHO0 * (45 * KT) ** 2 * 2.05, 0);
    const wingLoading = formatQuantity(optimum.wingLoading, 'wingLoading', 'si');
    const loading = formatQuantity(optimum.powerToWeight, 'powerToWeight', 'si');
    expect(wingLoading).toBe('673 N/m²');
    const points = trainer.querySelector('#diagram table.points')!.textContent!;
    expect(points).toContain(wingLoading);
    expect(points).toContain(loading);
    expect(points).toContain('stall, cruise');
  });

  it('lists every requirement id with its label, values and margins', () => {
    const rows = [...trainer.querySelectorAll('#requirements tbody tr')];
    const concept = demoConcept('trainer');
    expect(rows.map((row) => row.querySelector('span.id')?.textContent)).toEqual(concept.requirements.map((r) => r.id));
    for (const r of concept.requirements) expect(trainer.querySelector('#requirements')!.textContent).toContain(r.label!);
    // 45 kt is 23.15 m/s (NIST SP 811), shown with the SI speed's one decimal.
    expect(rows[0].textContent).toContain(`${formatQuantity(45 * KT, 'speed', 'si')} CAS`);
    expect(formatQuantity(45 * KT, 'speed', 'si')).toMatch(/^23\.[12] m\/s$/);
    const margins = [...trainer.querySelectorAll('#margins tbody tr')].map((row) => row.querySelector('td.id')!.textContent);
    expect(margins.sort()).toEqual(concept.requirements.map((r) => r.id).sort());
  });

  it('keeps user text as text: the note is preformatted and no markup from it survives', () => {
    expect(trainer.getElementsByTagName('script')).toHaveLength(0);
    expect(trainer.getElementsByTagName('b')).toHaveLength(0);
    const note = trainer.querySelector('#version pre.note')!;
    expect(note.textContent).toBe('Flaps <script>alert("x")</script> & "slots"\nsecond line');
    expect(trainer.querySelector('header')!.textContent).toContain('R. <b>Lind</b>');
  });

  it('is self-contained: no scripts, no links, nothing fetched', () => {
    expect(trainer.querySelectorAll('script, link, img, iframe, object, embed')).toHaveLength(0);
    expect(trainerHtml).not.toMatch(/\b(src|href)\s*=/i);
    expect(trainerHtml).not.toMatch(/@import|url\(\s*['"]?(https?:|\/\/)/i);
    expect(trainer.querySelector('meta[http-equiv="Content-Security-Policy"]')?.getAttribute('content')).toContain("default-src 'none'");
    // The diagram, the mass bar, and the two study charts.
    expect(trainer.querySelectorAll('figure.chart svg')).toHaveLength(4);
  });

  it('shows the take-off mass closed from the demo mission, its parts adding up to it, and sizes at it', () => {
    const mass = trainerEvaluation.mass!;
    const section = trainer.querySelector('#mass')!.textContent!;
    expect(section).toContain(formatQuantity(mass.takeoff, 'mass', 'si'));
    // The bar's parts fill its whole width: empty + fuel + payload + crew = take-off (the closure's balance).
    const widths = [...trainer.querySelectorAll('#mass rect')].map((r) => Number(r.getAttribute('width')));
    expect(widths.reduce((a, b) => a + b, 0)).toBeCloseTo(720, 0);
    // Sizing at the closed mass: S = m g / (W/S) (methods reference, section 7).
    const sizing = trainer.querySelector('#sizing')!.textContent!;
    expect(sizing).toContain(formatQuantity(mass.takeoff, 'mass', 'si'));
  });

  it('puts the optimum column before the design-point column in every table that has both', () => {
    let tables = 0;
    for (const table of trainer.querySelectorAll('table')) {
      const heads = [...table.querySelectorAll('th')].map((th) => (th.textContent ?? '').toLowerCase());
      const optimum = heads.findIndex((h) => h.includes('optimum') && !h.includes('design point'));
      const point = heads.findIndex((h) => h.includes('design point'));
      if (optimum < 0 || point < 0) continue;
      tables++;
      expect(optimum, heads.join(' | ')).toBeLessThan(point);
    }
    // The points, requirements, margins and sizing tables all have both.
    expect(tables).toBeGreaterThanOrEqual(4);
  });

  it('sizes span and mean chord from wing area and aspect ratio', () => {
    // The trainer's design point sized at the mass its mission closes to (m, from the evaluation):
    // S = m g0 / 650 (g0 = 9.80665 m/s^2, CGPM 1901), AR 7.4, b = sqrt(AR S), c = S/b
    // (AR = b^2/S, Anderson, Introduction to Flight). At the written 750 kg: b = 9.1506 m, c = 1.2366 m.
    const m = trainerEvaluation.mass!.takeoff;
    const area = (m * 9.80665) / 650;
    const b = Math.sqrt(7.4 * area);
    const rows = [...trainer.querySelectorAll('#sizing tr')].map((tr) => [...tr.children].map((c) => c.textContent ?? ''));
    const span = rows.find((r) => r[0]?.startsWith('Span b'));
    const chord = rows.find((r) => r[0]?.startsWith('Mean chord'));
    expect(span?.[0]).toContain('aspect ratio 7.4');
    expect(m).toBeGreaterThan(700);
    expect(span?.[2]).toBe(`${b.toFixed(2)} m`);
    expect(chord?.[2]).toBe(`${(area / b).toFixed(2)} m`);
  });

  it('never prints NaN, undefined or Infinity', () => {
    expect(trainer.body.textContent).not.toMatch(/NaN|undefined|Infinity|\[object/);
  });

  it('gives each inline diagram its own clip path', () => {
    const ids = [...trainer.querySelectorAll('[id]')].map((node) => node.id);
    expect(new Set(ids).size).toBe(ids.length);
    for (const node of trainer.querySelectorAll('[clip-path]')) {
      const ref = /url\(#([^)]+)\)/.exec(node.getAttribute('clip-path')!)![1];
      expect(trainer.getElementById(ref)).not.toBeNull();
    }
  });

  it('states the concept’s own ranges, seed and sample count in the studies', () => {
    const studies = trainer.querySelector('#studies')!.textContent!;
    expect(studies).toContain('Studies over the concept’s ranges');
    expect(studies).toMatch(/1,000 samples, seed 1\b/);
    expect(trainer.querySelector('#studies [data-role="contour"]')).not.toBeNull();
    expect(trainer.querySelector('#studies')!.textContent).toMatch(/Meets every requirement\s*[\d.]+ % ± [\d.]+ %/);
    const rows = [...trainer.querySelectorAll('#assumptions table')].pop()!.querySelectorAll('tbody tr');
    expect(rows.length).toBe(18);
    expect(trainer.querySelector('#sensitivity g.tornado-row')).not.toBeNull();
    expect(trainer.querySelectorAll('#costs tbody tr').length).toBe(2 * demoConcept('trainer').requirements.length);
  });

  it('studies a concept without ranges on the typical ranges of core/methods.md, and says so', () => {
    const doc = parse(buildReport(input(demoConcept('trainer'))));
    expect(doc.querySelector('#studies h2')?.textContent).toBe('Studies on typical ranges');
    expect(doc.querySelector('#studies .notice')?.textContent).toMatch(/gives no ranges.*typical ranges of the methods reference/);
    const assumptions = doc.querySelector('#assumptions')!.textContent!;
    expect(assumptions).toContain('Typical ranges used by the studies');
    // Light-aircraft CD0 0.025-0.035 (core/methods.md section 9, common practice).
    const cd0 = [...doc.querySelectorAll('#assumptions tbody tr')].find((row) => row.textContent?.includes('aircraft.aero.configurations.clean.cd0'))!;
    expect(cd0.textContent).toContain('0.025');
    expect(cd0.textContent).toContain('0.035');
    expect(cd0.textContent).toContain('methods reference, section 9');
  });

  it('reports in US customary units', () => {
    const doc = parse(buildReport(input(demoConcept('business-jet'), { system: 'us' })));
    const evaluation = studied(demoConcept('business-jet')).evaluation;
    const points = doc.querySelector('#diagram table.points')!.textContent!;
    expect(points).toContain(formatQuantity(evaluation.optimum!.wingLoading, 'wingLoading', 'us'));
    expect(points).toContain(formatQuantity(evaluation.optimum!.thrustToWeight, 'thrustToWeight', 'us'));
    expect(doc.querySelector('#sizing')!.textContent).toMatch(/ft²/);
    expect(doc.querySelector('#sizing')!.textContent).toMatch(/lbf/);
    expect(doc.body.textContent).not.toMatch(/NaN|undefined|Infinity/);
  });

  it('sizes at the optimum and studies the chance there when the concept gives no design point', () => {
    const concept = demoConcept('trainer');
    delete concept.designPoint;
    const doc = parse(buildReport(input(concept)));
    expect(doc.querySelector('#diagram')!.textContent).toContain('The concept gives no design point; sizing and speeds are at the optimum.');
    expect([...doc.querySelectorAll('#sizing thead th')].map((th) => th.textContent)).toEqual(['', 'Optimum']);
    expect(doc.querySelector('#studies')!.textContent).toContain('At the nominal optimum (the concept gives no design point)');
    expect(doc.querySelector('#margins')!.textContent).toContain('by the margin at the optimum');
    expect(doc.body.textContent).not.toMatch(/NaN|undefined|Infinity/);
  });

  it('says so when nothing meets every requirement, with dashes for the missing numbers', () => {
    const concept = demoConcept('trainer');
    concept.requirements.push({ id: 'dash', kind: 'cruise', speed: '400 kt', altitude: '30000 ft', powerSetting: 0.1 });
    concept.requirements.push({ id: 'crawl', kind: 'stall', speed: '20 kt' });
    const html = buildReport(input(concept));
    const doc = parse(html);
    expect(doc.querySelector('#diagram')!.textContent).toContain('Nothing on the diagram meets every requirement');
    expect(doc.body.textContent).not.toMatch(/NaN|undefined|Infinity/);
    expectWellFormed(html, doc);
  });

  it('shows what changed since the parent version', () => {
    const doc = parse(
      buildReport(
        input(demoConcept('trainer'), {
          version: {
            number: 5,
            note: 'Faster cruise',
            author: 'M. Okafor',
            createdAt: '2026-01-15T09:00:00.000Z',
            parent: 1,
            changesSinceParent: {
              format: 'loftpoint-comparison/1',
              a: { number: 1, conceptVersion: 1, conceptName: 'T', createdAt: '2026-01-01T00:00:00Z', author: 'a' },
              b: { number: 5, conceptVersion: 2, conceptName: 'T', createdAt: '2026-01-15T09:00:00Z', author: 'b' },
              axis: { before: 'powerToWeight', after: 'powerToWeight' },
              requirements: { added: [], removed: [], changed: [{ id: 'cruise', kind: 'cruise', fields: [{ path: 'speed', before: '110 kt', after: '115 kt' }] }] },
              assumptions: [{ path: 'aircraft.aero.configurations.landing.clMax', before: 2.05, after: 2.2 }],
              other: [],
              optimum: { before: { wingLoading: 673, loading: 10.52 }, after: { wingLoading: 722, loading: 11.11 }, delta: { wingLoading: 49, loading: 0.59 }, activeBefore: ['stall', 'cruise'], activeAfter: ['stall', 'cruise'] },
              designPoint: { before: null, after: null, delta: null },
              margins: { optimum: [{ id: 'stall', before: 0, after: 0, delta: 0 }], designPoint: [{ id: 'cruise', before: 0.025, after: -0.071, delta: -0.096 }] },
              sizing: { wingArea: { id: 'wingArea', before: 11.3, after: 10.2, delta: -1.1 }, installed: { id: 'power', before: 80900, after: 85400, delta: 4500 } },
            },
          },
        }),
      ),
    );
    const version = doc.querySelector('#version')!.textContent!;
    expect(version).toContain('What changed since version 1');
    expect(version).toContain('speed: 110 kt → 115 kt');
    expect(version).toContain('aircraft.aero.configurations.landing.clMax');
    expect(version).toContain('673 N/m² → 722 N/m² (+49)');
    expect(version).toMatch(/cruise\s*\+2\.5 %\s*−7\.1 %\s*−9\.6 pts/);
    expect(doc.querySelector('header')!.textContent).toContain('edited from version 1');
  });
});
