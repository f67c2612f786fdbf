/**
 * A range must contain the concept's own value, allowing for rounding to a
 * part in 10^9 of the value (and 10^-9 absolute for values under 1): a CD0
 * increment is read back as the difference of two resolved CD0 values, so
 * 0.043 - 0.029 is 0.014000000000000002 in binary floating point (IEEE 754
 * double, common practice). Messages show the value to six significant
 * figures, as the concept file wrote it.
 */
import { describe, expect, it } from 'vitest';
import { resolveUncertainty } from '../../../core/studies';
import { aircraft, cruise, design } from '../helpers/design';
import { demo } from './fixtures';

const trainer = demo('trainer'); // aspect ratio 7.4, takeoff CD0 increment 0.014 (its concept file)
const AR = 'aircraft.aero.aspectRatio';
const resolve = (field: string, low: number, high: number, d = trainer.design, concept: unknown = trainer.concept) =>
  resolveUncertainty({ parameters: [{ field, low, high }] }, d, concept);

describe('a range end at the concept value, to rounding', () => {
  it('7.4 + 5e-9 is within a part in 10^9 of 7.4 (6.8e-10 of it) and holds the value; 7.4 + 8e-9 (1.08e-9 of it) does not', () => {
    expect(resolve(AR, 7.4 + 5e-9, 9).ok).toBe(true);
    expect(resolve(AR, 7.4 + 8e-9, 9).ok).toBe(false);
    expect(resolve(AR, 6, 7.4 - 5e-9).ok).toBe(true);
    expect(resolve(AR, 6, 7.4 - 8e-9).ok).toBe(false);
  });

  it('exactly a part in 10^9 off still holds the value', () => {
    expect(resolve(AR, 7.4 + 1e-9 * 7.4, 9).ok).toBe(true);
    expect(resolve(AR, 6, 7.4 - 1e-9 * 7.4).ok).toBe(true);
  });

  it('under 1 the allowance is 1e-9 absolute: 0.014 + 0.9e-9 holds, 0.014 + 1.1e-9 does not', () => {
    const field = 'aircraft.aero.configurations.takeoff.cd0Increment';
    expect(resolve(field, 0.014 + 0.9e-9, 0.02).ok).toBe(true);
    expect(resolve(field, 0.014 + 1.1e-9, 0.02).ok).toBe(false);
  });

  it('the allowance is a part in 10^9 of the size of a negative value too: a linear drag term of -2', () => {
    const d = design({ aircraft: aircraft({ cdLinear: -2 }), requirements: [cruise(55)] });
    expect(resolve('aircraft.aero.cdLinear', -2 + 1.5e-9, -1, d, undefined).ok).toBe(true);
    expect(resolve('aircraft.aero.cdLinear', -3, -2 - 1.5e-9, d, undefined).ok).toBe(true);
    expect(resolve('aircraft.aero.cdLinear', -2 + 2.5e-9, -1, d, undefined).ok).toBe(false);
  });
});

describe('the concept value in a message', () => {
  it('an increment read back as 0.014000000000000002 is shown as 0.014', () => {
    const field = 'aircraft.aero.configurations.takeoff.cd0Increment';
    expect(resolve(field, 0.02, 0.03)).toEqual({
      ok: false,
      issues: [{ path: 'uncertainty.parameters[0].low', message: `${field}: low 0.02 is above the concept's value 0.014; the range must contain it` }],
    });
    expect(resolve(field, 0.005, 0.01)).toEqual({
      ok: false,
      issues: [{ path: 'uncertainty.parameters[0].high', message: `${field}: high 0.01 is below the concept's value 0.014; the range must contain it` }],
    });
  });
});
