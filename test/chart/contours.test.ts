/**
 * Probability contours (app/chart/contours.ts) traced with d3's marching
 * squares. Reference values: for a stall limit with CLmax ~ U(a, b), the
 * chance that wing loading w meets it is P = (b - c(w)) / (b - a) with
 * c(w) = 2 w / (rho0 V^2) (the uniform distribution's CDF; the stall
 * identity from Anderson, Introduction to Flight), so the level-L contour
 * stands at w_L = 1/2 rho0 V^2 (b - L (b - a)).
 */
import { describe, expect, it } from 'vitest';
import { probabilityMap } from '../../core';
import { probabilityContours, levelText } from '../../app/chart/contours';
import { diagramGrid } from '../../app/chart/study-grid';
import { stallAndCruise, studied } from './study-fixture';

const RHO0 = 1.225; // kg/m^3, U.S. Standard Atmosphere 1976
const KT = 1852 / 3600; // m/s per knot, NIST SP 811

describe('probabilityContours', () => {
  it('places a contour where a linear ramp of probability crosses the level', () => {
    // p rises from 0 to 1 across 11 wing loadings 100..200 and is the same at every loading row.
    const nx = 11;
    const ny = 5;
    const wingLoadings = Array.from({ length: nx }, (_, i) => 100 + 10 * i);
    const loadings = Array.from({ length: ny }, (_, j) => j);
    const probability = Array.from({ length: nx * ny }, (_, k) => (k % nx) / (nx - 1));
    const [half, ninety] = probabilityContours({ wingLoadings, loadings, probability }, 'powerToWeight', 'si', [0.5, 0.9]);
    // Linear interpolation of the ramp: p = 0.5 at w = 150, p = 0.9 at w = 190.
    // Points inside the grid (the runs along its border lie outside it).
    const inner = (rings: Array<Array<[number, number]>>) => rings.flat().filter(([x, y]) => x > 100 && x < 200 && y > 0 && y < 4).map(([x]) => x);
    const halfXs = inner(half.rings);
    const ninetyXs = inner(ninety.rings);
    expect(halfXs.length).toBeGreaterThan(0);
    for (const x of halfXs) expect(x).toBeCloseTo(150, 6);
    for (const x of ninetyXs) expect(x).toBeCloseTo(190, 6);
    // The frontier reads the least loading at the level: the bottom row wherever p >= level.
    expect(half.frontier.filter(([, y]) => y !== null).map(([w]) => w)).toEqual([150, 160, 170, 180, 190, 200]);
  });

  it('puts the border runs of each ring outside the grid, so the plot clip hides them', () => {
    const wingLoadings = [10, 20, 30];
    const loadings = [0, 1, 2];
    const probability = new Array(9).fill(1);
    const [all] = probabilityContours({ wingLoadings, loadings, probability }, 'powerToWeight', 'si', [0.5]);
    const xs = all.rings.flat().map(([x]) => x);
    const ys = all.rings.flat().map(([, y]) => y);
    expect(Math.min(...xs)).toBeLessThan(10);
    expect(Math.max(...xs)).toBeGreaterThan(30);
    expect(Math.min(...ys)).toBeLessThan(0);
    expect(Math.max(...ys)).toBeGreaterThan(2);
    // The run above the last row lies beyond half a row over it (2.5), where power loading draws it at W/P = 0.
    expect(all.beyondTop).toBe(2.5);
    expect(Math.max(...ys)).toBeGreaterThan(all.beyondTop!);
    expect(ys.filter((y) => y > 2 && y <= 2.5)).toEqual([]);
  });

  it('has no rings for a level the map never reaches', () => {
    const [none] = probabilityContours({ wingLoadings: [1, 2], loadings: [1, 2], probability: [0.1, 0.2, 0.3, 0.4] }, 'powerToWeight', 'si', [0.95]);
    expect(none.rings).toEqual([]);
    expect(none.frontier.every(([, y]) => y === null)).toBe(true);
  });

  it('stands the 50, 90 and 95 % contours of a stall-limited concept at 1/2 rho0 V^2 (b - L (b - a))', () => {
    const [a, b] = [1.8, 2.3];
    const s = studied(stallAndCruise(a, b, 20000));
    const grid = diagramGrid(s.evaluation);
    const map = probabilityMap(s.design, s.parameters, { seed: s.seed, samples: s.samples, grid });
    expect(map).not.toBeNull();
    const q = 0.5 * RHO0 * (45 * KT) ** 2; // trainer stall requirement: 45 kt CAS in landing flaps
    const cell = (grid.wingLoading[1] - grid.wingLoading[0]) / (grid.nx - 1);
    const top = grid.loading[1];
    for (const contour of probabilityContours(map!, 'powerToWeight', 'si')) {
      const expected = q * (b - contour.level * (b - a));
      // High on the plot the region is bounded on the right by the stall band alone: the contour's right edge there.
      const xs = contour.rings.flat().filter(([x, y]) => y > 0.6 * top && y < 0.95 * top && x < grid.wingLoading[1]).map(([x]) => x);
      const right = Math.max(...xs);
      // Tolerance: one grid column plus the Monte Carlo error (3 standard errors of P, times dw/dP = q (b - a)).
      const tolerance = cell + 3 * Math.sqrt((contour.level * (1 - contour.level)) / s.samples) * q * (b - a);
      expect(Math.abs(right - expected), `contour ${levelText(contour.level)}`).toBeLessThan(tolerance);
      // ...and it is a vertical edge: many points of the ring stand at that wing loading.
      expect(xs.filter((x) => Math.abs(x - right) < cell).length).toBeGreaterThan(10);
    }
  });
});
