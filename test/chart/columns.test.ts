/**
 * The chart and the boundaries CSV read the engine's columns when the
 * evaluation was made in this process, and the points of one read back from
 * JSON otherwise: both must draw and write the same thing, gaps included.
 */
import { describe, expect, it } from 'vitest';
import { chartData } from '../../app/chart/data';
import { evaluationCsv } from '../../app/chart/boundaries-csv';
import { DRAWN_SAMPLES } from '../../app/chart/drawn-samples';
import { DEMO_CONCEPTS, columnsOf, evaluateDesign, parseConcept, type Evaluation } from '../../core';

function demoAt(index: number, samples: number): Evaluation {
  const concept = structuredClone(DEMO_CONCEPTS[index].concept) as { diagram?: object };
  concept.diagram = { ...(concept.diagram ?? {}), samples };
  const parsed = parseConcept(concept);
  if (!parsed.ok) throw new Error(JSON.stringify(parsed.issues));
  return evaluateDesign(parsed.design);
}

describe('the chart from the engine\'s columns', () => {
  it('draws the same series from the columns as from the JSON points, within and beyond the render budget', () => {
    for (const samples of [201, 3 * DRAWN_SAMPLES + 7]) {
      DEMO_CONCEPTS.forEach((_, index) => {
        const evaluation = demoAt(index, samples);
        expect(columnsOf(evaluation)).toBeDefined();
        const back = JSON.parse(JSON.stringify(evaluation)) as Evaluation;
        for (const system of ['si', 'us'] as const) {
          expect(chartData(evaluation, { system })).toEqual(chartData(back, { system }));
        }
      });
    }
  });

  it('keeps the samples on both sides of a gap when it thins a curve', () => {
    // The survey drone's line turn cannot be flown past its stall line (C_L above C_Lmax): one gap, which the
    // thinned curve must still start where the evaluation's does.
    const index = DEMO_CONCEPTS.findIndex((demo) => demo.slug === 'survey-drone');
    const evaluation = demoAt(index, 4 * DRAWN_SAMPLES + 3);
    const columns = columnsOf(evaluation)!;
    const data = chartData(evaluation);
    let gaps = 0;
    data.curves.forEach((curve, j) => {
      expect(curve.points.length).toBeLessThanOrEqual(2 * DRAWN_SAMPLES);
      const column = columns.curves[j];
      const definedAll = Array.from(column, (y) => !Number.isNaN(y));
      const changes = definedAll.filter((d, i) => i > 0 && d !== definedAll[i - 1]).length;
      const drawnChanges = curve.points.filter((p, i) => i > 0 && (p[1] === null) !== (curve.points[i - 1][1] === null)).length;
      expect(drawnChanges).toBe(changes);
      gaps += changes;
      // The first drawn point of a gap is the first sample of the gap.
      const firstGap = definedAll.findIndex((d, i) => i > 0 && !d && definedAll[i - 1]);
      if (firstGap > 0) expect(curve.points.find((p) => p[1] === null)![0]).toBe(columns.wingLoadingsPa[firstGap]);
    });
    expect(gaps).toBeGreaterThan(0);
  });

  it('writes the same boundaries CSV from the columns as from the JSON points, empty cells in the gaps', () => {
    DEMO_CONCEPTS.forEach((demo, index) => {
      const evaluation = demoAt(index, 301);
      const back = JSON.parse(JSON.stringify(evaluation)) as Evaluation;
      for (const system of ['si', 'us'] as const) {
        expect(evaluationCsv({ name: demo.slug, evaluation, system })).toBe(evaluationCsv({ name: demo.slug, evaluation: back, system }));
      }
    });
  });
});
