/**
 * The chance study's grid: the row search every sample uses, against its
 * definition (the first row at or above the value, found by reading the rows
 * one by one), and the default grid when nothing needs any loading.
 */
import { describe, expect, it } from 'vitest';
import { defaultProbabilityGrid, plotRangeOf } from '../../../core/studies';
import { firstRowAtOrAbove } from '../../../core/studies/probability-grid';
import { aircraft, design, stall } from '../helpers/design';

/** The definition: the first index whose row is at or above v; the row count when none is (NaN: none). */
function byReading(ys: Float64Array, v: number): number {
  for (let k = 0; k < ys.length; k++) if (ys[k] >= v) return k;
  return ys.length;
}

const next = (x: number, up: boolean): number => {
  const b = new Float64Array([x]);
  const i = new BigInt64Array(b.buffer);
  i[0] += (x >= 0) === up ? 1n : -1n;
  return b[0];
};

describe('firstRowAtOrAbove', () => {
  // Rows written as j x 0.1 are not evenly spaced to the last bit (3 x 0.1 = 0.30000000000000004, IEEE 754), so
  // the first guess from the spacing can land one row off either way; the answer must still be the definition's.
  const grids: Float64Array[] = [
    Float64Array.from({ length: 11 }, (_, j) => j * 0.1),
    Float64Array.from({ length: 201 }, (_, j) => (j * 7) / 3),
    Float64Array.from({ length: 37 }, (_, j) => 0.3 + j * 0.07),
    // A grid may start below zero (checkedGrid asks only low < high): rows -1 to 1, symmetric about 0.
    Float64Array.from({ length: 21 }, (_, j) => -1 + j * 0.1),
  ];

  it('finds the first row at or above each row value, and the values one ulp either side of it', () => {
    for (const ys of grids) {
      for (const y of ys) {
        for (const v of [y, next(y, true), next(y, false)]) expect(firstRowAtOrAbove(ys, v), `${v}`).toBe(byReading(ys, v));
      }
    }
  });

  it('finds it for values between the rows, below the first and above the last, and for NaN', () => {
    for (const ys of grids) {
      const lo = ys[0];
      const hi = ys[ys.length - 1];
      for (let i = 0; i <= 1000; i++) {
        const v = lo - 0.1 * (hi - lo) + (1.2 * (hi - lo) * i) / 1000;
        expect(firstRowAtOrAbove(ys, v), `${v}`).toBe(byReading(ys, v));
      }
      expect(firstRowAtOrAbove(ys, Number.NaN)).toBe(ys.length);
    }
  });

  it('meets the case where the spacing guess lands a row too high: 3 x 0.1 on rows j x 0.1', () => {
    // (0.30000000000000004 - 0) / 1 x 10 = 3.0000000000000004, whose ceiling is 4; the row is 3.
    const ys = grids[0];
    expect(Math.ceil(((ys[3] - ys[0]) / (ys[10] - ys[0])) * 10)).toBe(4);
    expect(firstRowAtOrAbove(ys, ys[3])).toBe(3);
  });
});

describe('defaultProbabilityGrid when nothing needs any loading', () => {
  const jet = aircraft({ kind: 'turbofan', engines: 2 });
  const piston = aircraft({ kind: 'piston', engines: 1 });

  it('only limits: 0 to 1 in thrust-to-weight, 0 to 30 W/N in power-to-weight', () => {
    const jetStall = design({ aircraft: jet, requirements: [stall(40)] });
    const pistonStall = design({ aircraft: piston, requirements: [stall(30)] });
    expect(defaultProbabilityGrid(jetStall)).toEqual({ wingLoading: plotRangeOf(jetStall), loading: [0, 1], nx: 200, ny: 200 });
    expect(defaultProbabilityGrid(pistonStall).loading).toEqual([0, 30]);
  });

  it('no wing loading of the plot can be met: from the design point when there is one, else as above', () => {
    // A 20 m/s stall allows at most 1/2 x 1.225 x 20^2 x C_Lmax, 515 Pa even with the builder's largest C_Lmax,
    // 2.1 (lift equation; rho from U.S. Standard Atmosphere 1976): left of a plot from 1000 Pa, so no optimum.
    const unmeetable = design({ aircraft: jet, requirements: [stall(20)], rangePa: [1000, 2000] });
    expect(defaultProbabilityGrid(unmeetable).loading).toEqual([0, 1]);
    const withPoint = { ...unmeetable, designPoint: { wingLoadingPa: 1200, loading: 0.4 } };
    expect(defaultProbabilityGrid(withPoint).loading).toEqual([0, 0.8]);
  });
});
