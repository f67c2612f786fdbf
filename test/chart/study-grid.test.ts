/**
 * The grid the window's chance study runs on (app/chart/study-grid.ts). In
 * power loading (W/P = 1000 / (P/W) N/kW from W/N, the inverse of
 * power-to-weight, common practice) the plot's low W/P are high P/W, so the
 * window asks for the same rows continued upward. Reference for the contour:
 * a stall limit with CLmax ~ U(a, b) is met at wing loading w with chance
 * (b - c(w)) / (b - a), c(w) = 2 w / (rho0 V^2) (the uniform distribution's
 * CDF and the stall identity, Anderson, Introduction to Flight), so the
 * level-L contour stands at w_L = 1/2 rho0 V^2 (b - L (b - a)) at every W/P.
 */
import { describe, expect, it } from 'vitest';
import { scaleLinear } from 'd3';
import { probabilityMap } from '../../core';
import type { ChartScales } from '../../app/chart';
import { chartData } from '../../app/chart/data';
import { probabilityContours } from '../../app/chart/contours';
import { defaultDomains } from '../../app/chart/power-loading';
import { contourShapes } from '../../app/chart/study-geometry';
import { diagramGrid } from '../../app/chart/study-grid';
import { demoConcept, stallAndCruise, studied } from './study-fixture';

const RHO0 = 1.225; // kg/m^3, U.S. Standard Atmosphere 1976
const KT = 1852 / 3600; // m/s per knot, NIST SP 811

describe('the chance study grid for the power-loading view', () => {
  const trainer = studied(demoConcept('trainer'));

  it('continues the diagram rows upward at the same spacing, to 1/40 of the W/P view above 0', () => {
    const plain = diagramGrid(trainer.evaluation);
    const both = diagramGrid(trainer.evaluation, { powerLoading: true });
    const step = (plain.loading[1] - plain.loading[0]) / (plain.ny - 1);
    expect(both.loading[0]).toBe(plain.loading[0]);
    expect(both.wingLoading).toEqual(plain.wingLoading);
    expect(both.nx).toBe(plain.nx);
    expect(both.ny).toBeGreaterThan(plain.ny);
    expect((both.loading[1] - both.loading[0]) / (both.ny - 1)).toBeCloseTo(step, 9);
    // The map's last row, as W/P, is within one row of 1/40 of the view's top.
    const viewTop = defaultDomains(chartData(trainer.evaluation), true).y[1];
    const lowestWp = 1000 / both.loading[1];
    expect(lowestWp).toBeLessThanOrEqual(viewTop / 40);
    expect(1000 / (both.loading[1] - step)).toBeGreaterThan(viewTop / 40);
  });

  it('keeps to 2000 rows, the most a map may have, at the same spacing', () => {
    const dense = diagramGrid(trainer.evaluation, { powerLoading: true, ny: 1500 });
    const plain = diagramGrid(trainer.evaluation, { ny: 1500 });
    expect(dense.ny).toBe(2000);
    expect((dense.loading[1] - dense.loading[0]) / 1999).toBeCloseTo((plain.loading[1] - plain.loading[0]) / 1499, 9);
  });

  it('leaves a thrust-to-weight diagram as it is (it has no power-loading view)', () => {
    const jet = studied(demoConcept('business-jet'));
    expect(diagramGrid(jet.evaluation, { powerLoading: true })).toEqual(diagramGrid(jet.evaluation));
  });

  it('draws a stall-limited contour in W/P as a vertical edge at w_L all the way down to W/P = 0', () => {
    const [a, b] = [1.8, 2.3];
    const s = studied(stallAndCruise(a, b, 20000));
    const grid = diagramGrid(s.evaluation, { powerLoading: true });
    const map = probabilityMap(s.design, s.parameters, { seed: s.seed, samples: s.samples, grid });
    expect(map).not.toBeNull();
    const viewTop = defaultDomains(chartData(s.evaluation), true).y[1];
    const plot = { left: 100, right: 700, top: 20, bottom: 420, width: 600, height: 400 };
    const scales: ChartScales = {
      x: scaleLinear().domain(grid.wingLoading).range([plot.left, plot.right]),
      y: scaleLinear().domain([0, viewTop]).range([plot.bottom, plot.top]),
      plot,
      xTicks: [],
      yTicks: [],
      formatX: String,
      formatY: String,
      xTitle: '',
      yTitle: '',
    };
    const q = 0.5 * RHO0 * (45 * KT) ** 2; // trainer stall requirement: 45 kt CAS in landing flaps
    const cell = (grid.wingLoading[1] - grid.wingLoading[0]) / (grid.nx - 1);
    const contours = probabilityContours(map!, 'powerToWeight', 'si');
    const shapes = contourShapes(contours, scales, { powerLoading: true, factor: 1000 });
    expect(shapes).toHaveLength(3);
    for (const shape of shapes) {
      const expected = q * (b - shape.level * (b - a));
      const drawn = [...shape.d.matchAll(/(-?[\d.]+),(-?[\d.]+)/g)].map((m) => [scales.x.invert(Number(m[1])), scales.y.invert(Number(m[2]))]);
      // Points on the plot's bottom edge (W/P = 0) stand at the stall contour's wing loading.
      const bottom = drawn.filter(([, wp]) => Math.abs(wp) < 1e-6).map(([w]) => w);
      expect(bottom.length).toBeGreaterThan(0);
      const tolerance = cell + 3 * Math.sqrt((shape.level * (1 - shape.level)) / s.samples) * q * (b - a);
      expect(Math.min(...bottom.map((w) => Math.abs(w - expected)))).toBeLessThan(tolerance);
    }
  });
});
