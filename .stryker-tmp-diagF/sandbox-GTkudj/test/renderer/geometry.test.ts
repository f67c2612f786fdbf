// @ts-nocheck
import { describe, expect, it } from 'vitest';
import { chartData } from '../../app/chart';
import { defaultDomains, inverted, powerLoadingFactor, powerLoadingUnit } from '../../app/chart/power-loading';
import { diagramGeometry } from '../../app/renderer/lib/diagram/geometry';
import { DEMO_CONCEPTS, evaluateDesign, parseConcept, type Evaluation } from '../../core';

function evaluationOf(slug: string): Evaluation {
  const demo = DEMO_CONCEPTS.find((entry) => entry.slug === slug)!;
  const parsed = parseConcept(demo.concept);
  if (!parsed.ok) throw new Error('demo does not parse');
  return evaluateDesign(parsed.design);
}

const trainer = chartData(evaluationOf('trainer'), { system: 'si' });

describe('power loading view', () => {
  it('is the inverse of power-to-weight: 10 W/N is 100 N/kW, 0.08 hp/lb is 12.5 lb/hp', () => {
    // W/P = 1/(P/W): 1/(10 W/N) = 0.1 N/W = 100 N/kW (definition of power loading, common practice).
    expect(powerLoadingFactor('si') / 10).toBeCloseTo(100, 12);
    expect(powerLoadingFactor('us') / 0.08).toBeCloseTo(12.5, 12);
    expect(powerLoadingUnit('si')).toBe('N/kW');
    expect(powerLoadingUnit('us')).toBe('lb/hp');
  });

  it('inverts every loading and leaves wing loadings alone', () => {
    const flipped = inverted(trainer);
    const curve = trainer.curves[0];
    const flippedCurve = flipped.curves[0];
    curve.points.forEach(([x, y], i) => {
      expect(flippedCurve.points[i][0]).toBe(x);
      if (y !== null && y > 0) expect(flippedCurve.points[i][1]! * y).toBeCloseTo(1000, 9);
    });
    expect(flipped.optimum!.loading * trainer.optimum!.loading).toBeCloseTo(1000, 9);
    expect(flipped.optimum!.wingLoading).toBe(trainer.optimum!.wingLoading);
    expect(flipped.units.loading).toBe('N/kW');
  });
});

describe('diagramGeometry', () => {
  const size = { width: 800, height: 560 };

  it('draws one path per curve, the feasible region and a label for every boundary', () => {
    const geometry = diagramGeometry(trainer, size, null, false);
    expect(geometry.curvePaths.map((path) => path.id)).toEqual(trainer.curves.map((curve) => curve.id));
    for (const path of geometry.curvePaths) expect(path.d).toMatch(/^M/);
    expect(geometry.regionPaths.length).toBeGreaterThan(0);
    expect(geometry.labels.boundaries.map((label) => label.id).sort()).toEqual([...trainer.curves, ...trainer.limits].map((b) => b.id).sort());
    expect(JSON.stringify(geometry.curvePaths)).not.toContain('NaN');
  });

  it('shows a zoomed view when given one, and its own axis title for power loading', () => {
    const view = { x: [400, 700] as [number, number], y: [5, 15] as [number, number] };
    const zoomed = diagramGeometry(trainer, size, view, false);
    expect(zoomed.scales.x.domain()).toEqual([400, 700]);
    expect(zoomed.scales.y.domain()).toEqual([5, 15]);
    const flipped = diagramGeometry(trainer, size, null, true);
    expect(flipped.powerLoading).toBe(true);
    expect(flipped.scales.yTitle).toBe('Power loading W/P [N/kW]');
    expect(flipped.regionPaths.length).toBeGreaterThan(0);
    // The optimum sits inside the automatic power-loading view.
    const domains = defaultDomains(trainer, true);
    const optimum = inverted(trainer).optimum!;
    expect(optimum.loading).toBeGreaterThan(domains.y[0]);
    expect(optimum.loading).toBeLessThan(domains.y[1]);
  });

  it('never inverts a jet, whose axis is thrust-to-weight', () => {
    const jet = chartData(evaluationOf('business-jet'), { system: 'si' });
    const geometry = diagramGeometry(jet, size, null, true);
    expect(geometry.powerLoading).toBe(false);
    expect(geometry.scales.yTitle).toContain('Thrust-to-weight');
  });
});
