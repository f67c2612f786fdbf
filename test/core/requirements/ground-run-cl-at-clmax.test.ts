/**
 * A take-off ground-run lift coefficient at or above the configuration's
 * C_Lmax is refused, naming the field (the kind's `refused`, core/requirements/takeoff-ground-roll.ts,
 * through core/diagram/impossible-inputs.ts):
 * at C_L,g = C_Lmax the wing carries the weight at the stall speed, below
 * lift-off speed (V_LOF = k_LOF V_s, k_LOF > 1; lift equation, common practice).
 * The take-off configuration's C_Lmax is 1.8 here.
 */
import { describe, expect, it } from 'vitest';
import { impossibleInputs } from '../../../core/diagram';
import { design, stall, takeoffRoll } from '../helpers/design';

describe('a ground-run lift coefficient at C_Lmax', () => {
  it('is refused on its own field, with the value, the configuration and the remedy', () => {
    expect(impossibleInputs(design({ requirements: [stall(30), takeoffRoll(300, { clGroundRun: 1.8 })], rangePa: [100, 2000] }))).toEqual([
      {
        field: 'requirements[1].clGroundRun',
        message: '1.8 is at or above the takeoff C_Lmax 1.8 (requirement "takeoff"): the wing would lift the aircraft before lift-off speed; use a value below C_Lmax',
      },
    ]);
  });

  it('is not looked at in a disabled requirement', () => {
    expect(impossibleInputs(design({ requirements: [stall(30), takeoffRoll(300, { clGroundRun: 1.8, enabled: false })], rangePa: [100, 2000] }))).toEqual([]);
  });
});
