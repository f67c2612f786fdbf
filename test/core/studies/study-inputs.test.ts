/**
 * A Monte Carlo run refuses inputs it cannot honour, naming the value and
 * what to give: a whole number of samples, a 32-bit seed (MT19937 is seeded
 * by one 32-bit word: Matsumoto and Nishimura, 1998), a part inside the run,
 * and a grid with 0 < low < high wing loadings, low < high loadings and 2 to
 * 2000 points a side. The limits are the product's own, stated in its messages.
 */
import { describe, expect, it } from 'vitest';
import { probabilityMap } from '../../../core/studies';
import { KNOT_MPS } from '../../../core/units/factors';
import { design, stall } from '../helpers/design';

const STALL_ONLY = design({ requirements: [stall(45 * KNOT_MPS, { id: 'stall' })] });
const GRID = { wingLoading: [400, 1000] as [number, number], loading: [0, 10] as [number, number], nx: 5, ny: 3 };
const run = (options: Record<string, unknown>) => () => probabilityMap(STALL_ONLY, [], { seed: 1, samples: 10, grid: GRID, ...options } as never);

describe('probabilityMap: refused inputs', () => {
  it.each<[string, Record<string, unknown>, string]>([
    ['0 samples', { samples: 0 }, 'samples is 0; give a whole number of 1 or more'],
    ['2.5 samples', { samples: 2.5 }, 'samples is 2.5; give a whole number of 1 or more'],
    ['a negative seed', { seed: -1 }, 'seed is -1; give a whole number from 0 to 4294967295'],
    ['a seed of 2^32', { seed: 4294967296 }, 'seed is 4294967296; give a whole number from 0 to 4294967295'],
    ['a fractional seed', { seed: 1.5 }, 'seed is 1.5; give a whole number from 0 to 4294967295'],
    ['a part past the end', { part: { first: 0, end: 11 } }, 'part is [0, 11); give whole numbers 0 <= first <= end <= 10'],
    ['a part that starts before 0', { part: { first: -1, end: 5 } }, 'part is [-1, 5); give whole numbers 0 <= first <= end <= 10'],
    ['a part that ends before it starts', { part: { first: 6, end: 5 } }, 'part is [6, 5); give whole numbers 0 <= first <= end <= 10'],
    ['a part with a fractional end', { part: { first: 0, end: 4.5 } }, 'part is [0, 4.5); give whole numbers 0 <= first <= end <= 10'],
    ['a part with a fractional start', { part: { first: 0.5, end: 4 } }, 'part is [0.5, 4); give whole numbers 0 <= first <= end <= 10'],
    ['a wing loading from 0', { grid: { ...GRID, wingLoading: [0, 1000] } }, 'grid.wingLoading is [0, 1000]; give 0 < low < high'],
    ['a wing loading range the wrong way round', { grid: { ...GRID, wingLoading: [1000, 400] } }, 'grid.wingLoading is [1000, 400]; give 0 < low < high'],
    ['an equal wing loading range', { grid: { ...GRID, wingLoading: [400, 400] } }, 'grid.wingLoading is [400, 400]; give 0 < low < high'],
    ['an endless wing loading range', { grid: { ...GRID, wingLoading: [400, Infinity] } }, 'grid.wingLoading is [400, Infinity]; give 0 < low < high'],
    ['an equal loading range', { grid: { ...GRID, loading: [5, 5] } }, 'grid.loading is [5, 5]; give low < high'],
    ['a loading range from minus infinity', { grid: { ...GRID, loading: [-Infinity, 5] } }, 'grid.loading is [-Infinity, 5]; give low < high'],
    ['a loading range to infinity', { grid: { ...GRID, loading: [0, Infinity] } }, 'grid.loading is [0, Infinity]; give low < high'],
    ['one column', { grid: { ...GRID, nx: 1 } }, 'grid.nx is 1; give a whole number from 2 to 2000'],
    ['2001 rows', { grid: { ...GRID, ny: 2001 } }, 'grid.ny is 2001; give a whole number from 2 to 2000'],
    ['2.5 rows', { grid: { ...GRID, ny: 2.5 } }, 'grid.ny is 2.5; give a whole number from 2 to 2000'],
  ])('%s', (_what, options, message) => {
    expect(run(options)).toThrow(new RangeError(message));
  });

  it('accepts the ends of each range: one sample, seed 0 and 2^32 - 1, an empty part, 2 and 2000 points, a negative loading', () => {
    expect(run({ samples: 1 })).not.toThrow();
    expect(run({ seed: 0 })).not.toThrow();
    expect(run({ seed: 4294967295 })).not.toThrow();
    expect(run({ part: { first: 10, end: 10 } })).not.toThrow();
    expect(run({ grid: { ...GRID, nx: 2, ny: 2000, loading: [-1, 1] } })).not.toThrow();
  });
});
