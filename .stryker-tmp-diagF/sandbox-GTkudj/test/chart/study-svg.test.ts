// @ts-nocheck
// @vitest-environment jsdom
/**
 * The study diagram (app/chart/study-svg.ts): the constraint diagram with a
 * band per ranged boundary and the 50/90/95 % contours, as well-formed SVG
 * (parsed with jsdom's DOMParser, an XML parser from outside the project).
 */
import { describe, expect, it } from 'vitest';
import { boundaryBands, probabilityMap } from '../../core';
import { SIZING_CAUTION } from '../../app/chart/caution';
import { diagramGrid } from '../../app/chart/study-grid';
import { studyDiagramSvg } from '../../app/chart/study-svg';
import { constraintDiagramSvg } from '../../app/chart/svg';
import { stallAndCruise, studied, withTypicalRanges } from './study-fixture';

function parse(svg: string): Document {
  const doc = new DOMParser().parseFromString(svg, 'image/svg+xml');
  expect(doc.getElementsByTagName('parsererror')).toHaveLength(0);
  return doc;
}

function bandsAndMap(concept: unknown, samples: number) {
  const s = studied(concept);
  const wingLoadings = (s.evaluation.boundaries.find((b) => 'points' in b) as { points: Array<[number, number | null]> }).points.map(([w]) => w);
  const bands = boundaryBands(s.design, s.parameters, wingLoadings);
  const map = probabilityMap(s.design, s.parameters, { seed: s.seed, samples, grid: diagramGrid(s.evaluation) })!;
  return { s, bands, map };
}

describe('studyDiagramSvg', () => {
  const trainer = bandsAndMap(withTypicalRanges('trainer'), 2000);

  it('is a well-formed SVG with a band for every ranged boundary and contour paths for 50, 90 and 95 %', () => {
    const doc = parse(studyDiagramSvg(trainer.s.evaluation, { title: 'Trainer', bands: trainer.bands, map: trainer.map, runNote: 'Monte Carlo: 2,000 samples, seed 1' }));
    const banded = [...doc.querySelectorAll('[data-role="band"]')].map((g) => g.getAttribute('data-id'));
    const ranged = trainer.bands.filter((band) => band.fields.length > 0).map((band) => band.id);
    expect(ranged.length).toBeGreaterThan(3);
    expect(banded.sort()).toEqual([...ranged].sort());
    const levels = [...doc.querySelectorAll('[data-role="contour"]')].map((path) => path.getAttribute('data-level'));
    expect(levels).toEqual(['0.5', '0.9', '0.95']);
    for (const path of doc.querySelectorAll('[data-role="contour"]')) expect(path.getAttribute('d')).toMatch(/^M[\d.-]+,[\d.-]+(L[\d.-]+,[\d.-]+)+Z/);
    const labels = [...doc.querySelectorAll('[data-role="contour-label"]')].map((t) => t.textContent);
    expect(labels.length).toBeGreaterThan(0);
    for (const label of labels) expect(['50 %', '90 %', '95 %']).toContain(label);
    const legend = [...doc.querySelectorAll('g.legend text')].map((t) => t.textContent ?? '');
    expect(legend).toContain('95 % chance of meeting all');
    expect(legend).toContain('Monte Carlo: 2,000 samples, seed 1');
    const texts = [...doc.getElementsByTagName('text')].map((t) => t.textContent ?? '');
    expect(texts).toContain(SIZING_CAUTION);
    expect(doc.documentElement.outerHTML).not.toMatch(/NaN|undefined|Infinity/);
  });

  it('draws the bands behind the boundaries and the contours above them', () => {
    const svg = studyDiagramSvg(trainer.s.evaluation, { bands: trainer.bands, map: trainer.map });
    const band = svg.indexOf('class="band"');
    const boundary = svg.indexOf('data-role="curve" data-id="cruise"');
    const contour = svg.indexOf('data-role="contour"');
    expect(band).toBeGreaterThan(0);
    expect(band).toBeLessThan(boundary);
    expect(contour).toBeGreaterThan(boundary);
  });

  it('leaves out the band of a boundary that no range moves', () => {
    const only = bandsAndMap(stallAndCruise(1.8, 2.3, 500), 500);
    const doc = parse(studyDiagramSvg(only.s.evaluation, { bands: only.bands, map: only.map }));
    expect([...doc.querySelectorAll('[data-role="band"]')].map((g) => g.getAttribute('data-id'))).toEqual(['stall']);
  });

  it('escapes the title and draws no study layer when given none', () => {
    const doc = parse(studyDiagramSvg(trainer.s.evaluation, { title: '<script>x</script> & Co' }));
    expect(doc.getElementsByTagName('script')).toHaveLength(0);
    expect(doc.querySelector('title')?.textContent).toContain('<script>x</script> & Co');
    expect(doc.querySelectorAll('[data-role="band"], [data-role="contour"]')).toHaveLength(0);
  });

  it('leaves the plain diagram exactly as it was when no layers are given', () => {
    const plain = constraintDiagramSvg(trainer.s.evaluation, { title: 'T' });
    expect(constraintDiagramSvg(trainer.s.evaluation, { title: 'T', layers: {} })).toBe(plain);
    expect(plain).not.toMatch(/data-role="band"|data-role="contour"/);
  });
});
