/**
 * Rules of the evaluation beyond the numbers of each boundary: the plotted
 * range and sample count when the concept's are unusable, the turn's stall
 * line (w = q C_Lmax/(n beta), core/methods.md), which requirements are active
 * at the optimum, and where the sizing is taken.
 */
import { describe, expect, it } from 'vitest';
import { evaluateDesign } from '../../../core/diagram';
import { ACTIVE_TOLERANCE, DEFAULT_SAMPLES } from '../../../core/diagram/evaluate';
import type { CurveBoundaryJson, Evaluation } from '../../../core/evaluation';
import type { Design } from '../../../core/model';
import { G0 } from '../../../core/units/factors';
import { cruise, design, stall, sustainedTurn } from '../helpers/design';
import { assertRelative } from '../helpers/asserts';

const curves = (e: Evaluation) => e.boundaries.filter((b): b is CurveBoundaryJson => 'points' in b);
const codes = (e: Evaluation) => e.warnings.map((w) => w.code);

describe('evaluateDesign: range and samples', () => {
  it('uses a given range exactly, with no warning', () => {
    const e = evaluateDesign(design({ requirements: [stall(25), cruise(60)], rangePa: [300, 900], samples: 7 }));
    expect(curves(e)[0].points.map(([w]) => w)).toEqual([300, 400, 500, 600, 700, 800, 900]);
    expect(codes(e)).not.toContain('range-invalid');
  });

  for (const bad of [[900, 300], [0, 900], [-100, 900], [300, Infinity], [NaN, 900], [500, 500]] as Array<[number, number]>) {
    it(`refuses the range [${bad}] with a warning and plots the default range`, () => {
      const d = design({ requirements: [stall(25), cruise(60)], rangePa: bad, samples: 11 });
      const e = evaluateDesign(d);
      const warning = e.warnings.find((w) => w.code === 'range-invalid');
      expect(warning?.field).toBe('diagram.wingLoading');
      // The stall limit 1/2 x 1.225 x 25^2 x 2.1 = 803.9 Pa gives the default range [100, 1100]:
      // 1.3 x 803.9 = 1045 -> 1100 (core/diagram/default-range.ts), lo a tenth of that -> 100 or raised.
      const points = curves(e)[0].points;
      expect(points[points.length - 1][0]).toBe(1100);
      const { diagram, ...rest } = d;
      const plain = evaluateDesign({ ...rest, diagram: { samples: diagram.samples } } as Design);
      expect(curves(plain)[0].points).toEqual(points);
    });
  }

  for (const samples of [1, 0, 2.5, NaN]) {
    it(`takes ${DEFAULT_SAMPLES} samples with a warning for ${samples}`, () => {
      const e = evaluateDesign(design({ requirements: [cruise(60)], rangePa: [300, 900], samples }));
      expect(e.warnings.find((w) => w.code === 'samples-invalid')?.field).toBe('diagram.samples');
      expect(curves(e)[0].points.length).toBe(201);
    });
  }

  it('takes two samples when asked for two', () => {
    const e = evaluateDesign(design({ requirements: [cruise(60)], rangePa: [300, 900], samples: 2 }));
    expect(curves(e)[0].points.map(([w]) => w)).toEqual([300, 900]);
    expect(codes(e)).not.toContain('samples-invalid');
  });
});

describe('evaluateDesign: a turn that stalls inside the plotted range', () => {
  // w_stall = q C_Lmax / (n beta) = 1/2 x 1.225 x 50^2 x 1.5 / 1.5 = 1531.25 Pa at sea level, n = 1.5, beta = 1
  // (rho0 = 1.2250 kg/m^3, U.S. Standard Atmosphere 1976).
  const turn = (hi: number) => evaluateDesign(design({ requirements: [stall(40, { configuration: 'clean' }), sustainedTurn(50, 1.5)], rangePa: [200, hi], samples: 11 }));

  it('draws the stall line and says so when it is left of the right edge', () => {
    const e = turn(2000);
    const b = e.boundaries[1] as CurveBoundaryJson & { stallLimit?: number };
    assertRelative(b.stallLimit!, 1531.25, 1e-6);
    const w = e.warnings.find((x) => x.code === 'turn-stalls')!;
    expect(w.field).toBe('requirements[1]');
    expect(w.message).toContain('1531 N/m^2');
  });

  it('neither draws nor warns when the stall line is right of the range', () => {
    const e = turn(1500);
    expect(e.boundaries[1]).not.toHaveProperty('stallLimit');
    expect(codes(e)).not.toContain('turn-stalls');
  });
});

describe('evaluateDesign: active requirements and sizing', () => {
  it('a limit that sets the optimum is active, a distant one is not (relative 1e-3)', () => {
    expect(ACTIVE_TOLERANCE).toBe(1e-3);
    // Cruise at 60 m/s falls with w over [200, 2000] (C_L below C_L,md there), so the tighter stall limit,
    // 1/2 x 1.225 x 20^2 x 2.1 = 514.5 Pa, sets the optimum; 30 m/s is 1157.6 Pa, far right of it.
    const e = evaluateDesign(design({ requirements: [stall(20, { id: 'tight' }), stall(30, { id: 'loose' }), cruise(60)], rangePa: [200, 2000] }));
    assertRelative(e.optimum!.wingLoading, 514.5, 1e-4);
    expect(e.optimum!.active).toEqual(['tight', 'cruise']);
    const loose = e.optimum!.margins.find((m) => m.id === 'loose')!;
    assertRelative(loose.margin, 1 - 514.5 / 1157.625, 1e-4);
  });

  it('sizes at the design point when there is one, whatever the optimum', () => {
    const d = design({ requirements: [stall(20), cruise(60)], rangePa: [200, 2000], designPoint: { wingLoadingPa: 400, loading: 12 } });
    const e = evaluateDesign(d);
    // S = 750 x 9.80665 / 400 = 18.3875 m^2; P = 12 x 7354.9875 = 88259.85 W (hand derivation).
    assertRelative(e.sizing!.wingArea, (750 * G0) / 400, 1e-12);
    assertRelative(e.sizing!.power!, 12 * 750 * G0, 1e-12);
    expect(e.designPoint).toMatchObject({ wingLoading: 400, powerToWeight: 12 });
  });

  it('has no sizing and mid-range speeds when there is neither an optimum nor a design point', () => {
    // Every requirement disabled: no optimum; speeds at (200 + 2000)/2 = 1100 Pa.
    const e = evaluateDesign(design({ requirements: [cruise(60, { enabled: false })], rangePa: [200, 2000] }));
    expect(e.optimum).toBeNull();
    expect(e.sizing).toBeNull();
    assertRelative(e.speeds.stall, Math.sqrt((2 * 1100) / (1.225 * 1.5)), 1e-7);
    expect(codes(e)).toContain('no-requirements');
  });
});
