// @ts-nocheck
import { describe, expect, it } from 'vitest';
import { chartData } from '../../app/chart/data';
import { chartScales, chartDomains, LOADING_HEADROOM, loadingTop } from '../../app/chart/scales';
import { jetEvaluation, trainerEvaluation } from './fixture';

const FRAME = { width: 900, height: 600, margin: { top: 50, right: 200, bottom: 80, left: 70 } };

describe('chartDomains', () => {
  it('spans the evaluated wing-loading range and starts the loading axis at zero', () => {
    const domains = chartDomains(chartData(trainerEvaluation()));
    expect(domains.x).toEqual([200, 1500]);
    expect(domains.y[0]).toBe(0);
  });

  it('reaches about 2.5 times the optimum loading, not the steep low-wing-loading ends', () => {
    const data = chartData(trainerEvaluation());
    const top = chartDomains(data).y[1];
    const steepest = Math.max(...data.curves.flatMap((c) => c.points.map(([, y]) => y ?? 0)));
    expect(top).toBeGreaterThanOrEqual(LOADING_HEADROOM * data.optimum!.loading);
    expect(top).toBeLessThan(LOADING_HEADROOM * data.optimum!.loading * 1.25);
    expect(steepest).toBeGreaterThan(top * 1.2);
  });

  it('always shows the design point', () => {
    const evaluation = trainerEvaluation();
    evaluation.designPoint = { wingLoading: 800, powerToWeight: 40, feasible: true, margins: [] };
    const data = chartData(evaluation);
    expect(chartDomains(data).y[1]).toBeGreaterThan(40);
  });

  it('finds a top when nothing is feasible', () => {
    const evaluation = trainerEvaluation();
    evaluation.optimum = null;
    const data = chartData(evaluation);
    const top = loadingTop(data);
    expect(Number.isFinite(top)).toBe(true);
    expect(top).toBeGreaterThan(0);
  });

  it('works for thrust-to-weight', () => {
    const domains = chartDomains(chartData(jetEvaluation()));
    expect(domains.y[0]).toBe(0);
    expect(domains.y[1]).toBeGreaterThan(0.2);
    expect(domains.y[1]).toBeLessThan(1.5);
  });
});

describe('chartScales', () => {
  it('maps the domains onto the plot area, loading upwards', () => {
    const scales = chartScales(chartData(trainerEvaluation()), FRAME);
    expect(scales.x(200)).toBe(70);
    expect(scales.x(1500)).toBe(700);
    expect(scales.y(0)).toBe(520);
    expect(scales.y(scales.y.domain()[1])).toBe(50);
  });

  it('puts every tick inside its domain', () => {
    const scales = chartScales(chartData(trainerEvaluation(), { system: 'us' }), FRAME);
    const [x0, x1] = scales.x.domain();
    const [y0, y1] = scales.y.domain();
    expect(scales.xTicks.length).toBeGreaterThan(3);
    expect(scales.xTicks.every((t) => t >= x0 && t <= x1)).toBe(true);
    expect(scales.yTicks.every((t) => t >= y0 && t <= y1)).toBe(true);
    expect(scales.yTicks.map(scales.formatY).every((s) => !s.includes('NaN'))).toBe(true);
  });

  it('titles the axes with their units', () => {
    expect(chartScales(chartData(trainerEvaluation()), FRAME)).toMatchObject({
      xTitle: 'Wing loading W/S [N/m²]',
      yTitle: 'Power-to-weight P/W [W/N]',
    });
    expect(chartScales(chartData(trainerEvaluation(), { system: 'us' }), FRAME)).toMatchObject({
      xTitle: 'Wing loading W/S [lb/ft²]',
      yTitle: 'Power-to-weight P/W [hp/lb]',
    });
    expect(chartScales(chartData(jetEvaluation()), FRAME).yTitle).toBe('Thrust-to-weight T/W [–]');
  });
});
