/**
 * The two mission cases of an evaluation that the demos never reach: nothing
 * to size at (no design point and no optimum), and a mission that does not
 * close while the concept writes a take-off mass. The sizing is at the written
 * mass then: S = m g0 / (W/S) (core/methods.md section 7), g0 = 9.80665 m/s^2
 * exactly (CGPM 1901).
 */
import { describe, expect, it } from 'vitest';
import { DEMO_CONCEPTS, parseConcept } from '../../../core/concept';
import { evaluateDesign } from '../../../core/diagram';
import { assertRelative } from '../helpers/asserts';

const G0 = 9.80665;

// eslint-disable-next-line @typescript-eslint/no-explicit-any
function trainer(change: (c: any) => void) {
  const concept = structuredClone(DEMO_CONCEPTS.find((d) => d.slug === 'trainer')!.concept) as any;
  change(concept);
  const parsed = parseConcept(concept);
  if (!parsed.ok) throw new Error(JSON.stringify(parsed.issues));
  return evaluateDesign(parsed.design);
}

/** Every requirement switched off, and no design point: nothing to size at. */
function nothingToSize(c: any): void {
  delete c.designPoint;
  for (const r of c.requirements) r.enabled = false;
}

/** The cruise flown 9000 km on an empty-mass fraction of 0.62: the fractions leave nothing for payload and crew. */
function tooFar(c: any): void {
  c.mission.segments[1].range = '9000 km';
  c.mission.emptyMassFraction = 0.62;
}

describe('an evaluation with a mission', () => {
  it('with nothing to size at, flies the mission at mid-range, says so, and has no sizing', () => {
    const evaluation = trainer(nothingToSize);
    expect(evaluation.optimum).toBeNull();
    expect(evaluation.sizing).toBeNull();
    expect(evaluation.warnings.filter((w) => w.code === 'mission-mid-range')).toEqual([
      {
        code: 'mission-mid-range',
        field: 'mission',
        message: 'No design point and no optimum: the mission is flown at the middle of the plotted wing-loading range.',
      },
    ]);
    // The mission still closes there: a take-off mass above the payload it carries.
    expect(evaluation.mass).toBeDefined();
    expect(evaluation.mass!.takeoff).toBeGreaterThan(evaluation.mass!.payload);
  });

  it('says nothing of mid-range when there is a design point to size at', () => {
    const evaluation = trainer(() => {});
    expect(evaluation.warnings.map((w) => w.code)).not.toContain('mission-mid-range');
  });

  it('that does not close, keeps the sizing at the written take-off mass at the design point', () => {
    const evaluation = trainer(tooFar);
    expect(evaluation.mass).toBeUndefined();
    expect(evaluation.warnings.find((w) => w.code === 'mission-not-closed')?.severity).toBe('error');
    // Written: 750 kg, design point 650 N/m^2: S = 750 x 9.80665 / 650 = 11.3154 m^2; P = 11 W/N x 7354.99 N = 80904.9 W.
    assertRelative(evaluation.sizing!.wingArea, (750 * G0) / 650, 1e-12);
    assertRelative(evaluation.sizing!.power!, 11 * 750 * G0, 1e-12);
  });

  it('that does not close and has nothing to size at, has no sizing', () => {
    const evaluation = trainer((c) => {
      tooFar(c);
      nothingToSize(c);
    });
    expect(evaluation.mass).toBeUndefined();
    expect(evaluation.sizing).toBeNull();
    expect(evaluation.warnings.map((w) => w.code)).toEqual(expect.arrayContaining(['mission-mid-range', 'mission-not-closed']));
  });

  it('that does not close without a written take-off mass, has no sizing even with a design point', () => {
    const evaluation = trainer((c) => {
      tooFar(c);
      delete c.aircraft.takeoffMass;
    });
    expect(evaluation.designPoint).toBeDefined();
    expect(evaluation.sizing).toBeNull();
  });
});
