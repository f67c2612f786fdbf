// @ts-nocheck
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { boundariesOf, envelopeAt, evaluateDesign, marginsAt, wingLoadingCap } from '../../../core/diagram';
import type { CurveBoundaryJson } from '../../../core/evaluation';
import { designArb } from './arbitraries';

/** Paths at which null is allowed: a curve point's loading, the optimum and sizing. */
const NULL_ALLOWED = [/^\$\.boundaries\[\d+\]\.points\[\d+\]\[1\]$/, /^\$\.optimum$/, /^\$\.sizing$/];

function walk(value: unknown, path: string, visit: (path: string, v: unknown) => void): void {
  visit(path, value);
  if (Array.isArray(value)) value.forEach((v, i) => walk(v, `${path}[${i}]`, visit));
  else if (value !== null && typeof value === 'object') for (const [k, v] of Object.entries(value)) walk(v, `${path}.${k}`, visit);
}

describe('evaluateDesign on random valid designs', () => {
  it('never writes NaN or Infinity, and null only where the format allows it', () => {
    fc.assert(
      fc.property(designArb, (design) => {
        const evaluation = evaluateDesign(design);
        const wrong: string[] = [];
        walk(evaluation, '$', (path, v) => {
          if (typeof v === 'number' && !Number.isFinite(v)) wrong.push(`${path} = ${v}`);
          if (v === null && !NULL_ALLOWED.some((p) => p.test(path))) wrong.push(`null at ${path}`);
          if (v === undefined) wrong.push(`undefined at ${path}`);
        });
        expect(wrong).toEqual([]);
      }),
      { numRuns: 300 },
    );
  });

  it('puts the optimum in the feasible region, on its lower edge', () => {
    fc.assert(
      fc.property(designArb, (design) => {
        const evaluation = evaluateDesign(design);
        const optimum = evaluation.optimum;
        if (!optimum) return;
        const y = (optimum.powerToWeight ?? optimum.thrustToWeight) as number;
        // Feasible: every margin met (within the 1e-9 tie tolerance of core/methods.md section 7).
        for (const m of marginsAt(design, { wingLoadingPa: optimum.wingLoading, loading: y })) {
          expect(m.margin, m.id).toBeGreaterThanOrEqual(-1e-6);
        }
        // Lower edge: no feasible wing loading in the plotted range needs less, on a grid of 3000 points.
        const boundaries = boundariesOf(design);
        const curves = boundaries.flatMap((b) => (b.type === 'curve' ? [b.required] : []));
        const cap = wingLoadingCap(boundaries.flatMap((b) => (b.type === 'limit' ? [b] : [])));
        const curve = evaluation.boundaries.find((b): b is CurveBoundaryJson => 'points' in b);
        if (!curve) return;
        const lo = curve.points[0][0];
        const right = Math.min(cap, curve.points[curve.points.length - 1][0]);
        const lower: string[] = [];
        for (let i = 0; i < 3000; i++) {
          const w = lo + ((right - lo) * i) / 2999;
          const e = envelopeAt(curves, w);
          if (Number.isFinite(e) && e < y * (1 - 1e-6)) lower.push(`E(${w}) = ${e} < ${y}`);
        }
        expect(lower).toEqual([]);
      }),
      { numRuns: 200 },
    );
  });
});
