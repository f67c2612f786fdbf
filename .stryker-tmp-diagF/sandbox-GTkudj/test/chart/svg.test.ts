// @ts-nocheck
// @vitest-environment jsdom
import { describe, expect, it } from 'vitest';
import { SIZING_CAUTION } from '../../app/chart/caution';
import { constraintDiagramSvg } from '../../app/chart/svg';
import { jetEvaluation, trainerEvaluation } from './fixture';

// jsdom's DOMParser: an XML parser from outside the project; a parse error yields a <parsererror> element.
function parse(svg: string): Document {
  const doc = new DOMParser().parseFromString(svg, 'image/svg+xml');
  expect(doc.getElementsByTagName('parsererror')).toHaveLength(0);
  return doc;
}

const texts = (doc: Document) => [...doc.getElementsByTagName('text')].map((node) => node.textContent ?? '');

describe('constraintDiagramSvg', () => {
  it('is a well-formed SVG document with the concept name as title', () => {
    const doc = parse(constraintDiagramSvg(trainerEvaluation(), { title: 'Club trainer' }));
    expect(doc.documentElement.tagName).toBe('svg');
    expect(doc.documentElement.getAttribute('xmlns')).toBe('http://www.w3.org/2000/svg');
    expect(doc.getElementsByTagName('title')[0].textContent).toContain('Club trainer');
    expect(texts(doc)).toContain('Club trainer');
  });

  it('labels every boundary on the plot and names it in the legend', () => {
    const evaluation = trainerEvaluation();
    const doc = parse(constraintDiagramSvg(evaluation, { title: 'T' }));
    const labelled = [...doc.querySelectorAll('text[data-role="label"]')].map((node) => node.getAttribute('data-id'));
    expect(labelled.sort()).toEqual(evaluation.boundaries.map((b) => b.id).sort());
    const all = texts(doc).join('\n');
    for (const boundary of evaluation.boundaries) expect(all).toContain(boundary.label ?? boundary.id);
  });

  it('draws each curve as a path and each limit as a line', () => {
    const evaluation = trainerEvaluation();
    const doc = parse(constraintDiagramSvg(evaluation));
    expect(doc.querySelectorAll('path[data-role="curve"]')).toHaveLength(3);
    expect(doc.querySelectorAll('line[data-role="limit"]')).toHaveLength(1);
    for (const path of doc.querySelectorAll('path[data-role="curve"]')) expect(path.getAttribute('d')).toMatch(/^M-?[\d.]+,-?[\d.]+(L-?[\d.]+,-?[\d.]+)+$/);
  });

  it('shades the feasible region and marks the optimum and the design point with their values', () => {
    const doc = parse(constraintDiagramSvg(trainerEvaluation()));
    expect(doc.querySelectorAll('[data-role="region"]').length).toBeGreaterThan(0);
    expect(doc.querySelectorAll('[data-role="optimum"]')).toHaveLength(1);
    expect(doc.querySelectorAll('[data-role="design-point"]')).toHaveLength(1);
    const notes = [...doc.querySelectorAll('text[data-role="note"]')].map((node) => node.textContent);
    expect(notes.some((text) => text?.startsWith('Optimum'))).toBe(true);
    expect(notes.some((text) => text?.includes('1,000 N/m² · 12.00 W/N'))).toBe(true);
  });

  it('carries the preliminary-sizing caution', () => {
    const doc = parse(constraintDiagramSvg(jetEvaluation()));
    expect(texts(doc)).toContain(SIZING_CAUTION);
    expect(SIZING_CAUTION).toMatch(/applicable authority/);
    expect(SIZING_CAUTION).toMatch(/licensed engineering review/);
  });

  it('escapes user text in names and labels', () => {
    const evaluation = trainerEvaluation();
    evaluation.boundaries[1] = { ...evaluation.boundaries[1], label: '<b>T/O</b> & "grass"' };
    const svg = constraintDiagramSvg(evaluation, { title: `A&B <script>alert('x')</script>\u0007` });
    expect(svg).not.toContain('<script>');
    expect(svg).not.toContain('<b>');
    const doc = parse(svg);
    expect(texts(doc)).toContain(`A&B <script>alert('x')</script>`);
    expect(texts(doc).join('\n')).toContain('<b>T/O</b> & "grass"');
  });

  it('titles the axes in the chosen units and never writes NaN', () => {
    const us = constraintDiagramSvg(trainerEvaluation(), { system: 'us' });
    expect(texts(parse(us))).toEqual(expect.arrayContaining(['Wing loading W/S [lb/ft²]', 'Power-to-weight P/W [hp/lb]']));
    const jet = constraintDiagramSvg(jetEvaluation());
    expect(texts(parse(jet))).toContain('Thrust-to-weight T/W [–]');
    for (const svg of [us, jet]) expect(svg).not.toMatch(/NaN|undefined|Infinity/);
  });

  it('says so when nothing on the diagram meets every requirement', () => {
    const evaluation = trainerEvaluation();
    evaluation.optimum = null;
    evaluation.boundaries[0] = { id: 'stall', kind: 'stall', wingLoadingMax: 150 };
    const doc = parse(constraintDiagramSvg(evaluation));
    expect(texts(doc)).toContain('Nothing on the diagram meets every requirement');
    expect(doc.querySelectorAll('[data-role="region"]')).toHaveLength(0);
  });

  it('draws an earlier version behind, named in the legend', () => {
    const doc = parse(constraintDiagramSvg(trainerEvaluation(), { overlays: [{ name: 'Version 1', evaluation: jetEvaluation() }, { name: 'Version 2', evaluation: trainerEvaluation() }] }));
    expect(texts(doc)).toContain('Version 2');
    // An older version's optimum is the window's open diamond: one for version 2 (version 1, a jet, has no P/W to draw).
    const older = [...doc.querySelectorAll('[data-role="overlay-optimum"]')];
    expect(older).toHaveLength(1);
    for (const mark of older) expect(mark.getAttribute('d')).toMatch(/^M[^Z]+L[^Z]+L[^Z]+L[^Z]+Z$/);
    expect(doc.querySelectorAll('[data-role="overlay"]').length).toBeGreaterThan(0);
  });

  it('shows power loading W/P for a propeller aircraft when asked, feasible below the curves', () => {
    const svg = constraintDiagramSvg(trainerEvaluation(), { powerLoading: true });
    const doc = parse(svg);
    expect(texts(doc)).toContain('Power loading W/P [N/kW]');
    // 12.00 W/N at the design point is 1000/12 = 83.3 N/kW (W/P = 1/(P/W), common practice).
    const notes = [...doc.querySelectorAll('text[data-role="note"]')].map((node) => node.textContent ?? '');
    expect(notes.some((text) => text.includes('W/P 83.3 N/kW'))).toBe(true);
    expect(doc.querySelectorAll('[data-role="region"]').length).toBeGreaterThan(0);
    // A jet has no power loading: the thrust-to-weight view stays.
    expect(texts(parse(constraintDiagramSvg(jetEvaluation(), { powerLoading: true })))).toContain('Thrust-to-weight T/W [–]');
    expect(svg).not.toMatch(/NaN|undefined|Infinity/);
  });
});

describe('SVG numbers', () => {
  it('refuses a coordinate that is not finite rather than writing Infinity or NaN (not valid SVG lengths, SVG 1.1 §4.2 "number")', async () => {
    const { n } = await import('../../app/chart/svg-number');
    expect(n(12.345)).toBe('12.35');
    expect(() => n(Infinity)).toThrow(/not a finite number/);
    expect(() => n(Number.NaN)).toThrow(/not a finite number/);
  });
});
