/**
 * The diagram at the schema's sizes: no recursion or argument spread over
 * every point (V8 limits the arguments of one call by its stack, so
 * Math.min(...points) fails somewhere past 100,000 values), and a render
 * budget: what is drawn is thinned to a few hundred samples per boundary,
 * while the optimum and margins still come from every sample computed.
 */
import { describe, expect, it } from 'vitest';
import { chartData } from '../../app/chart/data';
import { DRAWN_SAMPLES } from '../../app/chart/drawn-samples';
import { constraintDiagramSvg } from '../../app/chart/svg';
import { DEMO_CONCEPTS, evaluateDesign, parseConcept } from '../../core';

function manyRequirements(count: number, samples?: number) {
  const concept = structuredClone(DEMO_CONCEPTS[0].concept) as any;
  const base = concept.requirements as any[];
  // The copies are renamed, so the mission (whose cruise names a requirement) is left out.
  delete concept.mission;
  concept.requirements = Array.from({ length: count }, (_, i) => ({ ...structuredClone(base[i % base.length]), id: `r${i}` }));
  if (samples !== undefined) concept.diagram = { ...(concept.diagram ?? {}), samples };
  const parsed = parseConcept(concept);
  if (!parsed.ok) throw new Error(JSON.stringify(parsed.issues));
  return evaluateDesign(parsed.design);
}

describe('the diagram at large sizes', () => {
  it('builds the chart data for 60 boundaries of 5,000 samples (300,000 points) without exceeding the call stack', () => {
    const evaluation = manyRequirements(25, 5000);
    const boundaries = Array.from({ length: 60 }, (_, i) => ({ ...evaluation.boundaries[i % evaluation.boundaries.length], id: `b${i}` }));
    const data = chartData({ ...evaluation, boundaries }, { system: 'si' });
    expect(data.wingLoadingRange[1]).toBeGreaterThan(data.wingLoadingRange[0]);
    expect(data.envelope.length).toBeLessThanOrEqual(DRAWN_SAMPLES + 20);
  }, 60_000);

  it('draws at most the render budget per curve at 5,000 samples, with the optimum of every sample', () => {
    const evaluation = manyRequirements(25, 5000);
    const data = chartData(evaluation, { system: 'si' });
    expect(data.curves.length).toBeGreaterThan(0);
    for (const curve of data.curves) expect(curve.points.length).toBeLessThanOrEqual(DRAWN_SAMPLES + 20);
    // The optimum marked is the evaluation's (computed from all 5,000 samples), in display units (SI: N/m^2).
    expect(data.optimum?.wingLoading).toBeCloseTo(evaluation.optimum!.wingLoading, 9);
    const svg = constraintDiagramSvg(evaluation, { title: 'Fine', system: 'si' });
    expect(svg).not.toMatch(/NaN|Infinity|undefined/);
  }, 60_000);
});
