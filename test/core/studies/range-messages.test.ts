/**
 * The `uncertainty` block's exact messages for real mistakes, and the range
 * rules: inside the value's physical range (aspect ratio and e above 0, e at
 * most 1: Oswald's span efficiency cannot exceed an elliptic wing's, common
 * practice), containing the concept's own value (the demo trainer's aspect
 * ratio is 7.4 and clean e 0.79, as its concept file states), low below high.
 */
import { describe, expect, it } from 'vitest';
import { resolveUncertainty } from '../../../core/studies';
import { demo } from './fixtures';

const trainer = demo('trainer');
const resolve = (block: unknown) => resolveUncertainty(block, trainer.design, trainer.concept);
const AR = 'aircraft.aero.aspectRatio';
const E = 'aircraft.aero.configurations.clean.oswaldEfficiency';
const one = (entry: Record<string, unknown>) => ({ parameters: [entry] });

describe('uncertainty block: exact messages', () => {
  it.each<[string, unknown, string, string]>([
    ['a negative seed', { seed: -1 }, 'uncertainty.seed', 'must be 0 or more'],
    ['a seed of 2^32', { seed: 4294967296 }, 'uncertainty.seed', 'must be at most 4294967295'],
    ['a fractional seed', { seed: 1.5 }, 'uncertainty.seed', 'must be a whole number from 0 to 4294967295'],
    ['99 samples', { samples: 99 }, 'uncertainty.samples', 'must be at least 100 for a usable probability'],
    ['1000001 samples', { samples: 1000001 }, 'uncertainty.samples', 'must be at most 1000000'],
    ['10.5 samples', { samples: 10.5 }, 'uncertainty.samples', 'must be a whole number of samples, e.g. 10000'],
    ['a field that is a number', one({ field: 5, low: 1, high: 2 }), 'uncertainty.parameters[0].field', 'must be a concept-file path such as "aircraft.aero.aspectRatio"'],
    ['an empty field', one({ field: '', low: 1, high: 2 }), 'uncertainty.parameters[0].field', 'must be a concept-file path such as "aircraft.aero.aspectRatio"'],
    ['a low that is text', one({ field: AR, low: 'a', high: 9 }), 'uncertainty.parameters[0].low', 'must be a number'],
    ['a high that is null', one({ field: AR, low: 6, high: null }), 'uncertainty.parameters[0].high', 'must be a number'],
    ['an unknown distribution', one({ field: AR, low: 6, high: 9, distribution: 'normal' }), 'uncertainty.parameters[0].distribution', 'must be "uniform" or "triangular"'],
    ['an aspect ratio from 0', one({ field: AR, low: 0, high: 9 }), 'uncertainty.parameters[0].low', `${AR}: low 0 is outside the physical range (must be above 0)`],
    ['e above 1', one({ field: E, low: 0.7, high: 1.01 }), 'uncertainty.parameters[0].high', `${E}: high 1.01 is outside the physical range (must be at most 1)`],
    ['e from 0', one({ field: E, low: 0, high: 0.9 }), 'uncertainty.parameters[0].low', `${E}: low 0 is outside the physical range (must be above 0)`],
    ['a range above the concept value', one({ field: AR, low: 8, high: 9 }), 'uncertainty.parameters[0].low', `${AR}: low 8 is above the concept's value 7.4; the range must contain it`],
    ['a range below the concept value', one({ field: AR, low: 6, high: 7 }), 'uncertainty.parameters[0].high', `${AR}: high 7 is below the concept's value 7.4; the range must contain it`],
    ['a range of one value', one({ field: AR, low: 7.4, high: 7.4 }), 'uncertainty.parameters[0].high', `${AR}: high 7.4 must be greater than low 7.4`],
    [
      'a field ranged twice',
      { parameters: [{ field: AR, low: 6, high: 9 }, { field: AR, low: 6, high: 9 }] },
      'uncertainty.parameters[1].field',
      `${AR} is ranged twice; keep one entry`,
    ],
  ])('%s', (_what, block, path, message) => {
    expect(resolve(block)).toEqual({ ok: false, issues: [{ path, message }] });
  });

  it('reports every bad entry, each at its own index', () => {
    const result = resolve({ parameters: [{ field: AR, low: 8, high: 9 }, { field: E, low: 0.7, high: 0.9 }, { field: E, low: 0.7, high: 0.9 }] });
    expect(result).toEqual({
      ok: false,
      issues: [
        { path: 'uncertainty.parameters[0].low', message: `${AR}: low 8 is above the concept's value 7.4; the range must contain it` },
        { path: 'uncertainty.parameters[2].field', message: `${E} is ranged twice; keep one entry` },
      ],
    });
  });
});

describe('uncertainty block: what is accepted', () => {
  it('the defaults: seed 1, 10000 samples, no parameters, for an empty or absent block', () => {
    for (const block of [{}, null, undefined]) expect(resolve(block)).toEqual({ ok: true, seed: 1, samples: 10000, parameters: [] });
  });

  it('the ends of the physical range that are included (e = 1), seed 0 and 2^32 - 1, 100 and 1000000 samples', () => {
    const e = resolve({ seed: 4294967295, samples: 1000000, parameters: [{ field: E, low: 0.7, high: 1 }] });
    if (!e.ok) throw new Error(JSON.stringify(e.issues));
    expect([e.seed, e.samples]).toEqual([4294967295, 1000000]);
    expect(e.parameters.map((p) => [p.field, p.low, p.nominal, p.high, p.distribution])).toEqual([[E, 0.7, 0.79, 1, 'uniform']]);
    const small = resolve({ seed: 0, samples: 100 });
    expect(small.ok && [small.seed, small.samples]).toEqual([0, 100]);
  });

  it('a range whose end touches the concept value to rounding holds it, with the nominal kept inside the range', () => {
    const low = 7.4 + 1e-12;
    const result = resolve(one({ field: AR, low, high: 9, distribution: 'triangular' }));
    if (!result.ok) throw new Error(JSON.stringify(result.issues));
    expect(result.parameters[0].nominal).toBe(low);
    expect(result.parameters[0].distribution).toBe('triangular');
    const high = 7.4 - 1e-12;
    const below = resolve(one({ field: AR, low: 6, high }));
    expect(below.ok && below.parameters[0].nominal).toBe(high);
    // 1e-7 off is not rounding: refused.
    expect(resolve(one({ field: AR, low: 7.4 + 1e-7, high: 9 })).ok).toBe(false);
  });
});
