/**
 * The probability map of a design with no ranged assumption is the diagram's
 * own feasible region: P = 1 at a grid point whose loading is at or above
 * what the requirement needs there, else 0 (a certain design either meets a
 * requirement or does not; common practice). The required loading comes from
 * the requirement's boundary (core/constraints, tested on its own against
 * published worked examples), so this checks the map's counting and row
 * search, not the physics.
 */
import { describe, expect, it } from 'vitest';
import { boundaryOf } from '../../../core/constraints';
import { probabilityMap, type ProbabilityMap } from '../../../core/studies';
import { KNOT_MPS } from '../../../core/units/factors';
import { cruise, design } from '../helpers/design';

const CRUISE = design({ requirements: [cruise(100 * KNOT_MPS, { id: 'cruise' })] });
const boundary = boundaryOf(CRUISE.requirements[0], CRUISE.aircraft);
const required = (w: number) => (boundary.type === 'curve' ? boundary.required(w) : NaN);

function map(loading: [number, number], ny: number): ProbabilityMap {
  return probabilityMap(CRUISE, [], { seed: 1, samples: 1, grid: { wingLoading: [300, 1500], loading, nx: 13, ny } }) as ProbabilityMap;
}

function expectRegion(m: ProbabilityMap) {
  const nx = m.wingLoadings.length;
  let ones = 0;
  for (let i = 0; i < nx; i++) {
    const need = required(m.wingLoadings[i]);
    expect(Number.isFinite(need)).toBe(true);
    for (let j = 0; j < m.loadings.length; j++) {
      const p = m.probability[j * nx + i];
      expect(p, `w ${m.wingLoadings[i]}, y ${m.loadings[j]}, needs ${need}`).toBe(m.loadings[j] >= need ? 1 : 0);
      ones += p;
    }
  }
  return ones;
}

describe('probability map of a certain design', () => {
  it('is 1 exactly at and above the required loading, column by column (fine, coarse and uneven grids)', () => {
    const fine = map([0, 20], 41);
    expect(fine.wingLoadings).toHaveLength(13);
    expect(fine.loadings).toHaveLength(41);
    const ones = expectRegion(fine);
    // Some of each: the region's edge crosses the grid.
    expect(ones).toBeGreaterThan(0);
    expect(ones).toBeLessThan(13 * 41);
    expectRegion(map([0, 20], 2));
    expectRegion(map([0, 20], 3));
    expectRegion(map([1.3, 17.9], 37));
    expectRegion(map([-5, 40], 1000));
  });

  it('is all 1 on a grid wholly above the requirement and all 0 on one wholly below it', () => {
    const above = map([100, 200], 5);
    expect(Array.from(above.probability).every((p) => p === 1)).toBe(true);
    const below = map([-10, -5], 5);
    expect(Array.from(below.probability).every((p) => p === 0)).toBe(true);
  });

  it('counts a loading exactly on a grid row as met', () => {
    // A grid whose second row is the need at the first column, to the last bit.
    const need = required(300);
    const m = map([need - 1, need + 1], 3);
    expect(m.loadings[1]).toBe(need);
    expect(m.probability[1 * 13 + 0]).toBe(1);
    expect(m.probability[0 * 13 + 0]).toBe(0);
  });
});

describe('the default grid', () => {
  it('spans the diagram\'s wing loadings and loadings from 0 to twice the larger of the optimum\'s and the design point\'s', async () => {
    const { defaultProbabilityGrid, plotRangeOf, studyOptimum } = await import('../../../core/studies');
    const optimum = studyOptimum(CRUISE);
    expect(optimum).not.toBeNull();
    const low = { ...CRUISE, designPoint: { wingLoadingPa: 600, loading: optimum!.loading / 2 } };
    const high = { ...CRUISE, designPoint: { wingLoadingPa: 600, loading: optimum!.loading * 3 } };
    expect(defaultProbabilityGrid(CRUISE)).toEqual({ wingLoading: plotRangeOf(CRUISE), loading: [0, 2 * optimum!.loading], nx: 200, ny: 200 });
    expect(defaultProbabilityGrid(low, 20, 30)).toEqual({ wingLoading: plotRangeOf(low), loading: [0, 2 * optimum!.loading], nx: 20, ny: 30 });
    expect(defaultProbabilityGrid(high).loading).toEqual([0, 6 * optimum!.loading]);
  });
});
