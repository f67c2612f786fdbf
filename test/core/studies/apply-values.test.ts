/**
 * Setting ranged assumptions to values: each named field takes its value in
 * order, the design given is left alone, and the one-at-a-time path (apply)
 * and the many-at-once path (assign) give the same design. Values are the
 * demo trainer's own fields (its concept file: aspect ratio 7.4, clean e 0.79).
 */
import { describe, expect, it } from 'vitest';
import { applyValues } from '../../../core/studies';
import { demo, ranged } from './fixtures';

const trainer = demo('trainer');
const AR = 'aircraft.aero.aspectRatio';
const E = 'aircraft.aero.configurations.clean.oswaldEfficiency';
const params = () =>
  ranged({ parameters: [{ field: AR, low: 6, high: 9 }, { field: E, low: 0.7, high: 0.9 }] }, trainer.design, trainer.concept);

describe('applyValues', () => {
  it('sets each field to its value and leaves the design given alone', () => {
    const before = JSON.stringify(trainer.design);
    const varied = applyValues(trainer.design, params(), [9, 0.7]);
    expect(varied.aircraft.aspectRatio).toBe(9);
    expect(varied.aircraft.configurations.clean.oswaldEfficiency).toBe(0.7);
    expect(trainer.design.aircraft.aspectRatio).toBe(7.4);
    expect(JSON.stringify(trainer.design)).toBe(before);
  });

  it('gives the same design by apply alone (no fast path), in order', () => {
    const slow = params().map(({ assign: _assign, ...rest }) => rest);
    const fast = applyValues(trainer.design, params(), Float64Array.from([6.5, 0.85]));
    const byApply = applyValues(trainer.design, slow, [6.5, 0.85]);
    expect(byApply.aircraft.aspectRatio).toBe(6.5);
    expect(byApply.aircraft.configurations.clean.oswaldEfficiency).toBe(0.85);
    expect(JSON.stringify(byApply)).toBe(JSON.stringify(fast));
    // One parameter without the fast path sends the whole set by apply.
    const mixed = [params()[0], slow[1]];
    expect(JSON.stringify(applyValues(trainer.design, mixed, [6.5, 0.85]))).toBe(JSON.stringify(fast));
  });

  it('with no parameters gives a design equal to the one given', () => {
    expect(JSON.stringify(applyValues(trainer.design, [], []))).toBe(JSON.stringify(trainer.design));
  });
});
