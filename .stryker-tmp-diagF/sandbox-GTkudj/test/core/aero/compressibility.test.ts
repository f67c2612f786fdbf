/**
 * Korn's drag-divergence Mach number with simple sweep theory and Lock's
 * fourth-power wave drag, against hand-worked values of the published
 * formulas (Korn; Mason's configuration-aerodynamics notes; Lock; all from memory),
 * and the warnings for flight Mach numbers the methods do not cover.
 */
// @ts-nocheck

import { describe, expect, it } from 'vitest';
import { criticalMach, dragDivergenceMach, waveDragIncrement } from '../../../core/aero/compressibility';
import { parseConcept, type ConceptJson } from '../../../core/concept';
import { evaluateDesign } from '../../../core/diagram';

const wing = { thicknessRatio: 0.1, quarterChordSweepRad: (25 * Math.PI) / 180, kornFactor: 0.95 };

describe('Korn and Lock', () => {
  it('gives M_dd and M_crit of a 25-degree supercritical wing at C_L 0.5', () => {
    // cos 25 deg = 0.906308; M_dd = 0.95/0.906308 - 0.1/0.821394 - 0.5/(10 x 0.744435) = 1.048215 - 0.121744 - 0.067166 = 0.859300.
    expect(dragDivergenceMach(wing, 0.5)).toBeCloseTo(0.8593, 4);
    // M_crit = M_dd - (0.1/80)^(1/3) = 0.859300 - 0.107722 = 0.751578.
    expect(criticalMach(wing, 0.5)).toBeCloseTo(0.751578, 5);
  });

  it('adds 20 (M - M_crit)^4 above M_crit and nothing below', () => {
    // At M0.80: 20 x 0.048422^4 = 1.0995e-4.
    expect(waveDragIncrement(wing, 0.5, 0.8)).toBeCloseTo(1.0995e-4, 7);
    expect(waveDragIncrement(wing, 0.5, 0.7)).toBe(0);
    // At M_dd the slope dC_D/dM = 80 (0.1/80)^(3/4) is 0.1, the definition of drag divergence used with Lock's law.
    const mdd = dragDivergenceMach(wing, 0.5);
    const slope = (waveDragIncrement(wing, 0.5, mdd + 1e-6) - waveDragIncrement(wing, 0.5, mdd - 1e-6)) / 2e-6;
    expect(slope).toBeCloseTo(0.1, 6);
  });
});

function concept(kind: 'turbofan' | 'turboprop', speed: string, altitude: string, aero: Record<string, unknown> = {}): ConceptJson {
  return {
    format: 'loftpoint-concept/1',
    aircraft: {
      takeoffMass: '9000 kg',
      aero: { aspectRatio: 9, ...aero, configurations: { clean: { cd0: 0.022, oswaldEfficiency: 0.8, clMax: 1.5 } } },
      propulsion: { kind, engines: 2 },
    },
    requirements: [
      { id: 'stall', kind: 'stall', speed: '95 kt' },
      { id: 'fast-cruise', kind: 'cruise', speed, altitude },
    ],
  } as ConceptJson;
}

function warnings(c: ConceptJson) {
  const parsed = parseConcept(c);
  if (!parsed.ok) throw new Error(JSON.stringify(parsed.issues));
  return evaluateDesign(parsed.design).warnings;
}

describe('flight Mach numbers the methods do not cover', () => {
  it('a 700 kt cruise at FL370 (about Mach 1.22) is an error naming the requirement', () => {
    // 700 kt = 360.1 m/s; a = 295.07 m/s at FL370 (USSA 1976): M = 1.22.
    const found = warnings(concept('turbofan', '700 kt', 'FL370')).filter((w) => w.field === 'requirements[1]');
    expect(found).toEqual([expect.objectContaining({ code: 'supersonic', severity: 'error', message: expect.stringContaining('"fast-cruise" flies at Mach 1.22') })]);
  });

  it('a 600 kt turboprop at sea level (Mach 0.91) warns that compressibility is not modelled', () => {
    // 600 kt = 308.7 m/s; a = 340.29 m/s at sea level ISA: M = 0.91.
    const found = warnings(concept('turboprop', '600 kt', '0 ft')).filter((w) => w.code === 'compressibility-not-modelled');
    expect(found).toHaveLength(1);
    expect(found[0].message).toContain('"fast-cruise" flies at Mach 0.91');
  });

  it('no such warning below Mach 0.6, nor with the wing data given', () => {
    expect(warnings(concept('turbofan', 'M0.55', 'FL250')).some((w) => w.code === 'compressibility-not-modelled')).toBe(false);
    const withWing = warnings(concept('turbofan', 'M0.8', 'FL370', { thicknessRatio: 0.1, quarterChordSweep: '25 deg', kornFactor: 0.95 }));
    expect(withWing.some((w) => w.code === 'compressibility-not-modelled')).toBe(false);
  });

  it('wave drag raises the cruise thrust above M_crit', () => {
    const evaluate = (aero: Record<string, unknown>) => {
      const parsed = parseConcept(concept('turbofan', 'M0.85', 'FL370', aero));
      if (!parsed.ok) throw new Error('bad');
      return evaluateDesign(parsed.design).boundaries.find((b) => b.id === 'fast-cruise') as { points: Array<[number, number | null]> };
    };
    const plain = evaluate({});
    const waved = evaluate({ thicknessRatio: 0.12, quarterChordSweep: '20 deg', kornFactor: 0.87 });
    const i = Math.floor(plain.points.length / 2);
    expect(waved.points[i][1] as number).toBeGreaterThan(plain.points[i][1] as number);
  });
});
