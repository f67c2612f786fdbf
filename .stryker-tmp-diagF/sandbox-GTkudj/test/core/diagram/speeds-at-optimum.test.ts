// @ts-nocheck
import { describe, expect, it } from 'vitest';
import { parseConcept } from '../../../core/concept';
import { DEMO_CONCEPTS } from '../../../core/concept/demos';
import { evaluateDesign } from '../../../core/diagram';
import { RHO0 } from '../../../core/atmosphere';
import { assertRelative } from '../helpers/asserts';
import { aircraft, approachSpeed, design, stall, takeoffDistance } from '../helpers/design';

function evaluated(slug: string) {
  const demo = DEMO_CONCEPTS.find((d) => d.slug === slug);
  const parsed = parseConcept(demo?.concept);
  if (!parsed.ok) throw new Error(`demo ${slug} does not parse`);
  return evaluateDesign(parsed.design);
}

describe('speeds behind each boundary', () => {
  it('gives every boundary of every demo a finite positive speed at the optimum', () => {
    for (const demo of DEMO_CONCEPTS) {
      const e = evaluated(demo.slug);
      if (!e.optimum) continue;
      for (const b of e.boundaries) {
        expect(b.speedAtOptimum, `${demo.slug} ${b.id}`).toBeGreaterThan(0);
        expect(Number.isFinite(b.speedAtOptimum)).toBe(true);
      }
    }
  });

  it('reports the take-off segments at the optimum, summing to the distance when the requirement binds', () => {
    // A take-off distance alone, beside a stall limit that leaves it binding at the optimum.
    const d = design({
      aircraft: aircraft({ kind: 'turbofan', engines: 2, increments: { takeoff: { cd0Increment: 0.02, oswaldEfficiency: 0.76, clMax: 1.9 } } }),
      requirements: [takeoffDistance(1500, { id: 'to' }), stall(55, { id: 'stall' })],
    });
    const e = evaluateDesign(d);
    const to = e.boundaries.find((b) => b.id === 'to');
    expect(e.optimum?.active).toContain('to');
    const s = to?.segmentsAtOptimum ?? {};
    expect(Object.keys(s)).toEqual(['groundRoll', 'rotation', 'transition', 'climb']);
    assertRelative(Object.values(s).reduce((a, b) => a + b, 0), 1500, 1e-4);
  });

  it('takes the approach speed from an approach-speed requirement and says so; else 1.3 V_S0 at take-off mass', () => {
    const ac = aircraft({ kind: 'turbofan', engines: 2, increments: { landing: { cd0Increment: 0.07, oswaldEfficiency: 0.7, clMax: 2.25 } } });
    const w = 3400;
    const point = { wingLoadingPa: w, loading: 0.3 };
    const own = evaluateDesign(design({ aircraft: ac, requirements: [approachSpeed(60, { id: 'vref', speedFactor: 1.23, massFraction: 0.85 })], designPoint: point }));
    // V = k sqrt(2 beta w / (rho0 C_Lmax)) (Anderson, stalling speed), 1.23 at 85 % (14 CFR 25.125, from memory).
    assertRelative(own.speeds.approach ?? NaN, 1.23 * Math.sqrt((2 * 0.85 * w) / (RHO0 * 2.25)), 1e-12);
    expect(own.speeds.approachBasis).toMatch(/^1\.23 × landing stall speed at 85 % of take-off mass \(requirement "vref"\)$/);
    const rule = evaluateDesign(design({ aircraft: ac, requirements: [stall(55)], designPoint: point }));
    assertRelative(rule.speeds.approach ?? NaN, 1.3 * Math.sqrt((2 * w) / (RHO0 * 2.25)), 1e-12);
    expect(rule.speeds.approachBasis).toMatch(/small-aircraft rule/);
  });
});
