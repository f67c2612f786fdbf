/**
 * A take-off ground run whose lift reaches the weight at the speed of its
 * mean forces is refused (the kind's `refused`, core/requirements/takeoff-ground-roll.ts,
 * through core/diagram/impossible-inputs.ts): the wheels then
 * carry nothing, so the aircraft would leave the ground before lift-off speed.
 *
 * Hand derivation: the mean forces act at 0.7 V_LOF (Raymer, Aircraft Design:
 * A Conceptual Approach, ch. 17, as in core/constraints/takeoff-ground-roll.ts), V_LOF = k_LOF V_s and
 * the weight is carried at V_s by C_Lmax, so there
 * L/W = (0.7 k_LOF)^2 C_L,g / C_Lmax.
 * With k_LOF = 2, C_L,g = 1 and C_Lmax = (0.7 x 2)^2 = 1.96 (computed the
 * same way in floating point, so the ratio is exactly 1), L/W = 1: not below 1.
 */
import { describe, expect, it } from 'vitest';
import { impossibleInputs } from '../../../core/diagram';
import { aircraft, design, takeoffRoll } from '../helpers/design';

describe('a ground run whose lift equals the weight at the mean-force speed', () => {
  const k = 0.7 * 2;
  const clMax = k * k; // 1.96
  const plane = aircraft({ increments: { takeoff: { cd0Increment: 0.015, clMax } } });

  it('is refused on the ground-run lift coefficient when there is rolling friction to lose', () => {
    const found = impossibleInputs(design({ aircraft: plane, requirements: [takeoffRoll(300, { clGroundRun: 1, liftoffSpeedFactor: 2, rollingFriction: 0.04 })], rangePa: [100, 2000] }));
    expect(found.map((i) => i.field)).toEqual(['requirements[0].clGroundRun']);
    expect(found[0].message).toContain('requirement "takeoff"');
    // L/W exactly 1: the wheels carry nothing, so the friction is zero; the line does not claim it is negative.
    expect(found[0].message).toContain('lift at or above the weight during the roll, so no wheel load: zero or negative rolling friction');
  });

  it('is accepted with no rolling friction: the friction term mu (1 - L/W) is 0 whatever the lift', () => {
    const found = impossibleInputs(design({ aircraft: plane, requirements: [takeoffRoll(300, { clGroundRun: 1, liftoffSpeedFactor: 2, rollingFriction: 0 })], rangePa: [100, 2000] }));
    expect(found.filter((i) => i.field === 'requirements[0].clGroundRun')).toEqual([]);
  });

  it('is accepted just below: C_L,g 0.99 gives L/W = 0.99', () => {
    const found = impossibleInputs(design({ aircraft: plane, requirements: [takeoffRoll(300, { clGroundRun: 0.99, liftoffSpeedFactor: 2, rollingFriction: 0.04 })], rangePa: [100, 2000] }));
    expect(found.filter((i) => i.field === 'requirements[0].clGroundRun')).toEqual([]);
  });
});
