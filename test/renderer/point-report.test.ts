import { describe, expect, it } from 'vitest';
import { pointReporter, tightestFirst } from '../../app/renderer/lib/state/point-report';
import { readoutAt } from '../../app/renderer/lib/diagram/readout';
import { DEMO_CONCEPTS, G0, evaluateDesign, marginsAt, parseConcept, type Design } from '../../core';

function designOf(slug: string): Design {
  const parsed = parseConcept(DEMO_CONCEPTS.find((demo) => demo.slug === slug)!.concept);
  if (!parsed.ok) throw new Error('demo does not parse');
  return parsed.design;
}

describe('pointReporter', () => {
  const design = designOf('trainer');
  const evaluation = evaluateDesign(design);
  const report = pointReporter(design, evaluation);

  it('agrees with a full evaluation at the concept design point', () => {
    const point = design.designPoint!;
    const fast = report({ wingLoadingPa: point.wingLoadingPa, loading: point.loading })!;
    expect(fast.feasible).toBe(evaluation.designPoint!.feasible);
    expect(fast.margins).toEqual(tightestFirst(evaluation.designPoint!.margins));
    expect(fast.sizing!.wingArea).toBeCloseTo(evaluation.sizing!.wingArea, 9);
    expect(fast.speeds.stall).toBeCloseTo(evaluation.speeds.stall, 9);
  });

  it('sizes a dragged point as S = m g0 / (W/S) and P = (P/W) m g0 (core/methods.md section 7)', () => {
    const at = report({ wingLoadingPa: 700, loading: 12 })!;
    // At the take-off mass the evaluation closed from the demo's mission (the written mass only a starting guess).
    const weight = (evaluation.mass?.takeoff ?? design.aircraft.takeoffMassKg) * G0;
    expect(evaluation.mass).toBeDefined();
    expect(at.sizing!.wingArea).toBeCloseTo(weight / 700, 9);
    expect(at.sizing!.power).toBeCloseTo(12 * weight, 6);
    expect(at.margins).toEqual(tightestFirst(marginsAt(design, { wingLoadingPa: 700, loading: 12 })));
    // Tightest first.
    const values = at.margins.map((entry) => entry.margin);
    expect([...values].sort((a, b) => a - b)).toEqual(values);
  });

  it('reports the optimum when there is no point, with its tightest margin zero', () => {
    const optimum = report(null)!;
    expect(optimum.source).toBe('optimum');
    expect(optimum.margins[0].margin).toBeCloseTo(0, 6);
  });
});

describe('readoutAt', () => {
  it('reads every boundary at the wing loading and names the one needing the most power', () => {
    const design = designOf('trainer');
    const readout = readoutAt(design, 500, 'powerToWeight', 'si', false);
    expect(readout.rows.length).toBe(design.requirements.filter((r) => r.enabled).length);
    const curves = readout.rows.filter((row) => row.type === 'curve' && row.value !== null);
    const top = curves.reduce((best, row) => (row.value! > best.value! ? row : best));
    expect(readout.binding).toBe(top.id);
    expect(top.binds).toBe(true);
  });

  it('names an exceeded wing-loading limit as binding', () => {
    const design = designOf('trainer');
    const readout = readoutAt(design, 5000, 'powerToWeight', 'si', false);
    const binding = readout.rows.find((row) => row.binds)!;
    expect(binding.type).toBe('limit');
    expect(binding.exceeded).toBe(true);
  });
});
