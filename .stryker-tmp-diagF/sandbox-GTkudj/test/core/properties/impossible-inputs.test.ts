// @ts-nocheck
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { evaluateDesign, impossibleInputs, minimumDragCoefficient, polarOf, type Polar } from '../../../core/diagram';
import type { CurveBoundaryJson } from '../../../core/evaluation';
import type { Design } from '../../../core/model';
import { anyDesignArb } from './arbitraries';

/**
 * Why a design is impossible, by hand: least drag C_D0 - K1^2/(4K) <= 0 (the polar's minimum at
 * C_L = -K1/(2K)), or a ground run with C_L,g >= C_Lmax, or lift above weight at 0.7 V_LOF,
 * (0.7 k_LOF)^2 C_L,g / C_Lmax >= 1 with some rolling friction.
 */
function impossibleByHand(d: Design): RegExp | null {
  for (const name of Object.keys(d.aircraft.configurations)) {
    const p = polarOf(d.aircraft, name) as Polar;
    if (p.cd0 - (p.k1 * p.k1) / (4 * p.k) <= 0) return /least drag/;
  }
  const groundRun = d.requirements.some((r) => {
    if (!r.enabled || r.kind !== 'takeoff-ground-roll') return false;
    const clMax = (polarOf(d.aircraft, r.configuration) as Polar).clMax;
    const k = 0.7 * r.liftoffSpeedFactor;
    return r.clGroundRun >= clMax || (r.rollingFriction > 0 && (k * k * r.clGroundRun) / clMax >= 1);
  });
  return groundRun ? /C_Lmax|negative rolling friction/ : null;
}

describe('impossible inputs over the full accepted ranges', () => {
  it('are reported exactly when the polar, the ground run or a required loading is impossible', () => {
    fc.assert(
      fc.property(anyDesignArb, (design) => {
        const issues = impossibleInputs(design);
        const why = impossibleByHand(design);
        if (why) {
          expect(issues.length).toBeGreaterThan(0);
          for (const issue of issues) expect(issue.field).toMatch(/^(aircraft\.aero\.cdLinear|requirements\[\d+\]\.clGroundRun)$/);
          expect(issues.map((i) => i.message).join(' | ')).toMatch(why);
          return;
        }
        // Accepted: every plotted required loading is positive, and so is the optimum's power or thrust.
        const evaluation = evaluateDesign(design);
        const nonPositive = evaluation.boundaries
          .filter((b): b is CurveBoundaryJson => 'points' in b)
          .flatMap((b) => b.points.filter(([, y]) => y !== null && !(y > 0)).map(([w, y]) => `${b.id} at ${w}: ${y}`));
        expect(nonPositive).toEqual([]);
        expect(issues).toEqual([]);
        // (With limits only there is no curve to size against, and the loading is 0.)
        const hasCurve = evaluation.boundaries.some((b) => 'points' in b);
        const optimum = evaluation.optimum;
        if (hasCurve && optimum) expect((optimum.powerToWeight ?? optimum.thrustToWeight) as number).toBeGreaterThan(0);
      }),
      { numRuns: 200 },
    );
  });

  it('never gives a margin of +1 for a curve, whatever the point (no constant stands in for a margin)', () => {
    fc.assert(
      fc.property(anyDesignArb, fc.double({ min: 1, max: 5, noNaN: true }), (design, scale) => {
        fc.pre(impossibleInputs(design).length === 0);
        const evaluation = evaluateDesign(design);
        const point = evaluation.optimum;
        if (!point) return;
        const loading = (point.powerToWeight ?? point.thrustToWeight) as number;
        const moved = evaluateDesign({ ...design, designPoint: { wingLoadingPa: point.wingLoading, loading: loading * scale } });
        // Curves bind the loading: margin = y/y_i - 1 grows in proportion with y (hand algebra).
        const at = new Map(point.margins.map((m) => [m.id, m.margin]));
        for (const m of moved.designPoint!.margins) {
          const b = evaluation.boundaries.find((x) => x.id === m.id)!;
          if (!('points' in b)) continue;
          const before = at.get(m.id)!;
          if (before === -1) continue;
          expect(Math.abs(m.margin + 1 - scale * (before + 1))).toBeLessThanOrEqual(1e-9 * scale * (before + 1));
        }
      }),
      { numRuns: 100 },
    );
  });
});
