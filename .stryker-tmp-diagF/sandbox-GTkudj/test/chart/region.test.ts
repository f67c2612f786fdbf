// @ts-nocheck
import { polygonContains } from 'd3';
import { describe, expect, it } from 'vitest';
import { chartData } from '../../app/chart/data';
import { valueAt } from '../../app/chart/clip';
import { feasibleRegion } from '../../app/chart/region';
import { chartDomains } from '../../app/chart/scales';
import type { Evaluation } from '../../core/evaluation';
import { jetEvaluation, trainerEvaluation } from './fixture';

// Point-in-polygon from d3-polygon (a general-purpose geometry library), not from our own code.
const inside = (polygons: Array<Array<[number, number]>>, point: [number, number]) =>
  polygons.some((polygon) => polygonContains(polygon, point));

describe('feasibleRegion', () => {
  const cases: Array<[string, Evaluation]> = [
    ['trainer (power-to-weight)', trainerEvaluation()],
    ['jet (thrust-to-weight)', jetEvaluation()],
  ];

  for (const [name, evaluation] of cases) {
    it(`lies above the envelope, left of the tightest limit and inside the plot: ${name}`, () => {
      const data = chartData(evaluation);
      const [, top] = chartDomains(data).y;
      const polygons = feasibleRegion(data, top);
      expect(polygons.length).toBeGreaterThan(0);
      for (const polygon of polygons) {
        for (const [x, y] of polygon) {
          expect(x).toBeGreaterThanOrEqual(data.wingLoadingRange[0]);
          expect(x).toBeLessThanOrEqual(data.wingLoadingLimit + 1e-9);
          expect(y).toBeLessThanOrEqual(top);
          const floor = valueAt(data.envelope, x);
          expect(floor).not.toBeNull();
          expect(y).toBeGreaterThanOrEqual(Math.min(floor as number, top) - 1e-9);
        }
      }
      // Probe a grid: inside the region exactly where a point meets every requirement.
      const [lo] = data.wingLoadingRange;
      for (let i = 1; i < 40; i += 1) {
        const x = lo + ((data.wingLoadingLimit - lo) * i) / 40;
        const floor = valueAt(data.envelope, x) as number;
        if (floor * 1.05 < top * 0.98) expect(inside(polygons, [x, (floor * 1.05 + top * 0.98) / 2])).toBe(true);
        if (floor * 0.95 > 0) expect(inside(polygons, [x, floor * 0.95])).toBe(false);
      }
      // Right of the tightest limit is never feasible.
      expect(inside(polygons, [data.wingLoadingLimit * 1.01, top * 0.9])).toBe(false);
    });
  }

  it('splits around a stretch where a curve cannot be met', () => {
    const evaluation = trainerEvaluation();
    const cruise = evaluation.boundaries.find((b) => b.id === 'cruise') as { points: Array<[number, number | null]> };
    cruise.points = cruise.points.map(([w, y]) => [w, w > 600 && w < 700 ? null : y]);
    const data = chartData(evaluation);
    const polygons = feasibleRegion(data, chartDomains(data).y[1]);
    expect(polygons).toHaveLength(2);
    expect(inside(polygons, [650, 20])).toBe(false);
  });

  it('is empty when the tightest limit is left of the plotted range', () => {
    const evaluation = trainerEvaluation();
    evaluation.boundaries[0] = { id: 'stall', kind: 'stall', wingLoadingMax: 150 };
    const data = chartData(evaluation);
    expect(feasibleRegion(data, 30)).toEqual([]);
  });

  it('is empty when the whole envelope lies above the plotted loadings', () => {
    const data = chartData(trainerEvaluation());
    expect(feasibleRegion(data, 1)).toEqual([]);
  });

  it('ends exactly on the limit, not on the sample before it', () => {
    const data = chartData(trainerEvaluation());
    const polygons = feasibleRegion(data, 30);
    const right = Math.max(...polygons.flat().map(([x]) => x));
    expect(right).toBe(1108);
  });
});
