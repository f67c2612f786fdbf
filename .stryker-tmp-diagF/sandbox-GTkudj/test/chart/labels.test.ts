// @ts-nocheck
import { describe, expect, it } from 'vitest';
import { chartData } from '../../app/chart/data';
import { boxesOverlap, boxInside, placeLabels, segmentHitsBox } from '../../app/chart/labels';
import { chartScales } from '../../app/chart/scales';
import type { Evaluation } from '../../core/evaluation';
import { jetEvaluation, trainerEvaluation } from './fixture';

const FRAME = { width: 980, height: 660, margin: { top: 74, right: 264, bottom: 96, left: 82 } };

function layout(evaluation: Evaluation, system: 'si' | 'us' = 'si') {
  const data = chartData(evaluation, { system });
  const scales = chartScales(data, FRAME);
  const notes = [data.optimum, data.designPoint]
    .filter((p) => p !== null)
    .map((at, i) => ({ id: `note-${i}`, lines: ['Optimum', '1,108 N/m² · 9.87 W/N'], colour: '#000', at: at! }));
  return { data, scales, labels: placeLabels(data, scales, { notes }) };
}

describe('placeLabels', () => {
  for (const [name, evaluation, system] of [
    ['trainer, SI', trainerEvaluation(), 'si'],
    ['trainer, US', trainerEvaluation(), 'us'],
    ['jet', jetEvaluation(), 'si'],
  ] as const) {
    it(`labels every boundary inside the plot, without overlaps: ${name}`, () => {
      const { data, scales, labels } = layout(evaluation, system);
      expect(labels.boundaries.map((l) => l.id).sort()).toEqual(data.boundaries.map((b) => b.id).sort());
      const boxes = [...labels.boundaries, ...labels.notes];
      for (const label of boxes) {
        expect(label.onPlot).toBe(true);
        expect(boxInside(label.box, scales.plot, 0)).toBe(true);
        expect([label.x, label.y].every(Number.isFinite)).toBe(true);
      }
      for (let i = 0; i < boxes.length; i += 1) {
        for (let j = i + 1; j < boxes.length; j += 1) expect(boxesOverlap(boxes[i].box, boxes[j].box)).toBe(false);
      }
    });
  }

  it('puts a limit label along its line, reading upwards', () => {
    const { data, scales, labels } = layout(trainerEvaluation());
    const stall = labels.boundaries.find((l) => l.id === 'stall')!;
    const px = scales.x(data.limits[0].wingLoading);
    expect(stall.rotate).toBe(-90);
    expect(Math.abs(stall.x - px)).toBeLessThan(16);
    expect(stall.box.y1 - stall.box.y0).toBeGreaterThan(stall.box.x1 - stall.box.x0);
  });

  it('puts a curve label next to its own curve', () => {
    const { data, scales, labels } = layout(trainerEvaluation());
    for (const curve of data.curves) {
      const label = labels.boundaries.find((l) => l.id === curve.id)!;
      const centre = { x: (label.box.x0 + label.box.x1) / 2, y: (label.box.y0 + label.box.y1) / 2 };
      const nearest = Math.min(
        ...curve.points
          .filter((p): p is [number, number] => p[1] !== null)
          .map(([w, y]) => Math.hypot(scales.x(w) - centre.x, scales.y(y) - centre.y)),
      );
      expect(nearest).toBeLessThan(20);
    }
  });

  it('flags a boundary with nothing on the plot instead of inventing a position on it', () => {
    const evaluation = trainerEvaluation();
    evaluation.boundaries.push({ id: 'never', kind: 'ceiling', points: [[200, null], [1500, null]] });
    const { labels } = layout(evaluation);
    expect(labels.boundaries.find((l) => l.id === 'never')!.onPlot).toBe(false);
  });
});

describe('segmentHitsBox', () => {
  const box = { x0: 0, y0: 0, x1: 10, y1: 10 };
  it.each([
    [[-5, 5], [15, 5], true],
    [[-5, -5], [15, 15], true],
    [[2, 2], [3, 3], true],
    [[-5, 12], [15, 12], false],
    [[11, -5], [20, 20], false],
  ] as const)('segment %j to %j crosses the box: %s', (a, b, expected) => {
    expect(segmentHitsBox([a[0], a[1]], [b[0], b[1]], box)).toBe(expected);
  });
});
