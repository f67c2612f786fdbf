/**
 * Inputs no aircraft can have are errors naming the field, not warnings:
 * a polar whose least drag is not positive, a ground-run lift coefficient at
 * or above C_Lmax or one that takes the weight off the wheels, and a
 * requirement met with no power or thrust.
 */
// @ts-nocheck

import { describe, expect, it } from 'vitest';
import { parseConcept } from '../../../core';
import { exampleConcept as example } from './fixture';
import { impossibleInputs } from '../../../core/diagram';
import { aircraft, cruise, design } from '../helpers/design';

function issuesOf(concept: unknown) {
  const parsed = parseConcept(concept);
  expect(parsed.ok).toBe(false);
  return parsed.ok ? [] : parsed.issues;
}

const withTakeoff = (extra: Record<string, unknown>) => {
  const c = example();
  c.requirements.push({ id: 'roll', kind: 'takeoff-ground-roll', distance: '300 m', ...extra });
  return c;
};

describe('impossible inputs', () => {
  it('rejects a linear drag term that makes the least drag negative: C_D0 - K1^2/(4K) = 0.03 - 0.01/0.2122 < 0', () => {
    // By hand for the clean polar: K = 1/(pi 0.8 7.5) = 0.053052, 4K = 0.21221, K1^2/(4K) = 0.047124 > C_D0 0.03.
    const c = example();
    c.aircraft.aero.cdLinear = -0.1;
    const [issue, ...rest] = issuesOf(c);
    expect(rest).toEqual([]);
    expect(issue.path).toBe('aircraft.aero.cdLinear');
    expect(issue.message).toMatch(/least drag .* = -0\.01712, not positive/);
  });

  it('accepts the largest linear term the clean polar allows, and rejects just beyond it', () => {
    // |K1| < sqrt(4 K C_D0) = sqrt(0.21221 x 0.03) = 0.079788 keeps the clean polar's least drag positive
    // (hand derivation); the take-off and landing polars have more C_D0 and a larger K, and allow more.
    const at = (k1: number) => {
      const c = example();
      c.aircraft.aero.cdLinear = k1;
      return parseConcept(c);
    };
    expect(at(0.0797).ok).toBe(true);
    expect(at(-0.0797).ok).toBe(true);
    expect(at(0.0799).ok).toBe(false);
    expect(at(-0.0799).ok).toBe(false);
  });

  it('names the linear term once, however many polars and requirements it spoils', () => {
    const d = design({ aircraft: aircraft({ kind: 'turbofan', cdLinear: -0.2 }), requirements: [cruise(100)], rangePa: [500, 3000] });
    const issues = impossibleInputs(d);
    expect(issues.map((i) => i.field)).toEqual(['aircraft.aero.cdLinear']);
  });

  it('rejects a ground-run lift coefficient at or above C_Lmax of its configuration', () => {
    // Take-off configuration C_Lmax 1.8 in the example.
    const [issue] = issuesOf(withTakeoff({ clGroundRun: 1.8 }));
    expect(issue.path).toBe('requirements[2].clGroundRun');
    expect(issue.message).toMatch(/at or above the takeoff C_Lmax 1\.8/);
    expect(parseConcept(withTakeoff({ clGroundRun: 1.2 })).ok).toBe(true);
  });

  it('rejects a ground-run lift coefficient that lifts more than the weight at 0.7 V_LOF (negative friction)', () => {
    // Lift/weight at 0.7 V_LOF = (0.7 k_LOF)^2 C_L,g / C_Lmax (hand derivation, V_s at C_Lmax):
    // k_LOF 1.6, C_L,g 1.5, C_Lmax 1.8: 1.2544 x 1.5/1.8 = 1.045 > 1; with k_LOF 1.5: 1.1025 x 0.8333 = 0.919 < 1.
    const [issue] = issuesOf(withTakeoff({ clGroundRun: 1.5, liftoffSpeedFactor: 1.6 }));
    expect(issue.path).toBe('requirements[2].clGroundRun');
    expect(issue.message).toMatch(/negative rolling friction/);
    expect(parseConcept(withTakeoff({ clGroundRun: 1.5, liftoffSpeedFactor: 1.5 })).ok).toBe(true);
  });
});
