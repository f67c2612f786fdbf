import { describe, expect, it } from 'vitest';
import { pointReporter, tightestFirst } from '../../app/renderer/lib/state/point-report';
import { readoutAt } from '../../app/renderer/lib/diagram/readout';
import { DEMO_CONCEPTS, G0, evaluateDesign, marginsAt, parseConcept, type Design } from '../../core';

/** A demo's design; `withoutMission` sizes at the written take-off mass. */
function designOf(slug: string, withoutMission = false): Design {
  const concept = structuredClone(DEMO_CONCEPTS.find((demo) => demo.slug === slug)!.concept) as Record<string, unknown>;
  if (withoutMission) delete concept.mission;
  const parsed = parseConcept(concept);
  if (!parsed.ok) throw new Error('demo does not parse');
  return parsed.design;
}

describe('pointReporter', () => {
  const design = designOf('trainer', true);
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
    // Without its mission the trainer sizes at its written take-off mass (the mission's cases are below).
    const weight = design.aircraft.takeoffMassKg * G0;
    expect(evaluation.mass).toBeUndefined();
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

describe('pointReporter with a mission', () => {
  // The trainer with the window's starting mission: the mass closes from it (core/mission).
  async function withMission(): Promise<Design> {
    const { addMission } = await import('../../app/renderer/lib/concept/mission');
    const concept = structuredClone(DEMO_CONCEPTS.find((demo) => demo.slug === 'trainer')!.concept) as Record<string, unknown>;
    delete concept.mission;
    const parsed = parseConcept(addMission(concept as never));
    if (!parsed.ok) throw new Error(parsed.issues.map((issue) => `${issue.path} ${issue.message}`).join('; '));
    return parsed.design;
  }

  it('gives the evaluation’s closed mass at the concept’s design point, and sizes at it', async () => {
    const design = await withMission();
    const evaluation = evaluateDesign(design);
    const point = design.designPoint!;
    const at = pointReporter(design, evaluation)({ wingLoadingPa: point.wingLoadingPa, loading: point.loading })!;
    expect(evaluation.mass).toBeDefined();
    expect(at.mass).toEqual(evaluation.mass);
    expect(at.massProblem).toBeNull();
    expect(at.sizing!.wingArea).toBeCloseTo(evaluation.sizing!.wingArea, 9);
  });

  it('closes the mass again at a dragged point and sizes there as S = m g0 / (W/S), P = (P/W) m g0 (core/methods.md section 7)', async () => {
    const design = await withMission();
    const at = pointReporter(design, evaluateDesign(design))({ wingLoadingPa: 800, loading: 12 })!;
    const mass = at.mass!;
    // Take-off mass is the sum of its parts (the closure's balance, m0 = empty + fuel + battery + payload + crew).
    expect(mass.empty + mass.fuel + mass.battery + mass.payload + mass.crew).toBeCloseTo(mass.takeoff, 6);
    expect(mass.takeoff).not.toBeCloseTo(design.aircraft.takeoffMassKg, 0);
    expect(at.sizing!.wingArea).toBeCloseTo((mass.takeoff * G0) / 800, 9);
    expect(at.sizing!.power).toBeCloseTo(12 * mass.takeoff * G0, 6);
    // The same closure as a full evaluation at that wing loading, less the drivers (the sensitivity tab's).
    const moved = evaluateDesign({ ...design, designPoint: { wingLoadingPa: 800, loading: 12 } }).mass!;
    expect(mass).toEqual({ ...moved, drivers: [] });
  });

  it('says why when the mission cannot close, and sizes at no invented mass', async () => {
    const design = await withMission();
    // An empty-mass fraction of 0.95 leaves at most 5 % for fuel, payload and crew: too little for any cruise (hand check).
    const heavy = { ...design, mission: { ...design.mission!, emptyMassFraction: 0.95 } };
    const at = pointReporter(heavy, evaluateDesign(heavy))({ wingLoadingPa: 800, loading: 12 })!;
    expect(at.mass).toBeNull();
    expect(at.massProblem).toMatch(/^The mission does not close: empty-mass fraction 0\.95 plus fuel fraction \d\.\d\d/);
    // The concept gives a take-off mass, so the sizing stays at it.
    expect(at.sizing!.wingArea).toBeCloseTo((design.aircraft.takeoffMassKg * G0) / 800, 9);
  });
});
