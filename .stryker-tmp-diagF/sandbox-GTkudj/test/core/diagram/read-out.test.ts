// @ts-nocheck
import { describe, expect, it } from 'vitest';
import { evaluateDesign, marginsAt, readAt } from '../../../core/diagram';
import { TRAINER } from '../helpers/demo-designs';
import { cruise, design } from '../helpers/design';

describe('readAt', () => {
  it('names the stall limit as binding beyond it', () => {
    // The trainer's 45 kt stall limit is at 689 Pa.
    const read = readAt(TRAINER, 800);
    expect(read.binding).toBe('stall');
    expect(read.entries.find((e) => e.id === 'stall')).toMatchObject({ type: 'limit', exceeded: true });
  });

  it('names the curve needing the most power inside the limits, and gives the envelope', () => {
    const read = readAt(TRAINER, 400);
    const curves = read.entries.filter((e) => e.type === 'curve');
    const top = curves.reduce((a, b) => ((a.type === 'curve' && b.type === 'curve' && (b.required ?? 0) > (a.required ?? 0)) ? b : a));
    expect(read.binding).toBe(top.id);
    expect(read.envelope).toBe(top.type === 'curve' ? top.required : NaN);
  });

  it('agrees with the evaluation at a sampled wing loading', () => {
    const e = evaluateDesign(TRAINER);
    const read = readAt(TRAINER, 400);
    for (const b of e.boundaries) {
      if (!('points' in b)) continue;
      const point = b.points.find(([w]) => w === 400)!;
      expect(read.entries.find((r) => r.id === b.id)).toMatchObject({ required: point[1] });
    }
  });

  it('gives null and binds the curve that cannot be met', () => {
    const read = readAt(design({ requirements: [cruise(50)], rangePa: [200, 4000] }), 3000);
    expect(read.envelope).toBeNull();
    expect(read.binding).toBe('cruise');
    expect(read.entries[0]).toMatchObject({ type: 'curve', required: null, speed: 50 });
  });
});

describe('marginsAt', () => {
  it('gives the evaluation margins at the optimum', () => {
    const optimum = evaluateDesign(TRAINER).optimum!;
    const margins = marginsAt(TRAINER, { wingLoadingPa: optimum.wingLoading, loading: optimum.powerToWeight as number });
    expect(margins).toEqual(optimum.margins);
  });

  it('gives 1 - w/limit for a limit and y/required - 1 for a curve', () => {
    // core/methods.md section 7 margin definitions.
    const read = readAt(TRAINER, 500);
    const margins = marginsAt(TRAINER, { wingLoadingPa: 500, loading: 20 });
    for (const entry of read.entries) {
      const margin = margins.find((m) => m.id === entry.id)!.margin;
      if (entry.type === 'limit') expect(margin).toBeCloseTo(1 - 500 / entry.wingLoadingMax, 12);
      else expect(margin).toBeCloseTo(20 / (entry.required as number) - 1, 12);
    }
  });
});
