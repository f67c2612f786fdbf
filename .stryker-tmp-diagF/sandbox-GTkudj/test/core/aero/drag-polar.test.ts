// @ts-nocheck
import { describe, expect, it } from 'vitest';
import { dragCoefficient, inducedDragFactor, minimumDragCoefficient, polarOf, type Polar } from '../../../core/aero/drag-polar';
import { aircraft } from '../helpers/design';
import { assertInDelta, assertRelative } from '../helpers/asserts';

describe('inducedDragFactor', () => {
  it('is 1/(pi e AR)', () => {
    // Anderson, Introduction to Flight, C_Di = C_L^2/(pi e AR): e 0.8, AR 8 -> K = 1/(6.4 pi) = 0.0497359.
    assertInDelta(inducedDragFactor(8, 0.8), 0.0497359, 1e-7);
  });
});

describe('dragCoefficient', () => {
  it('adds zero-lift, linear and induced drag', () => {
    // C_D = C_D0 + K1 C_L + K C_L^2 (core/methods.md section 3): 0.03 + (-0.01)(0.5) + 0.05(0.25) = 0.0375.
    const polar: Polar = { cd0: 0.03, k1: -0.01, k: 0.05, clMax: 1.5 };
    assertInDelta(dragCoefficient(polar, 0.5), 0.0375, 1e-15);
  });

  it('has its minimum C_D0 - K1^2/(4K) at C_L = -K1/(2K)', () => {
    // Vertex of the parabola; checked against a brute-force scan.
    const polar: Polar = { cd0: 0.025, k1: -0.02, k: 0.045, clMax: 1.5 };
    let lowest = Infinity;
    for (let cl = -1; cl <= 2; cl += 1e-5) lowest = Math.min(lowest, dragCoefficient(polar, cl));
    assertRelative(minimumDragCoefficient(polar), lowest, 1e-8);
  });
});

describe('polarOf', () => {
  it('takes the configuration values and the aircraft K1', () => {
    const ac = aircraft({ aspectRatio: 8, cdLinear: 0.01 });
    const polar = polarOf(ac, 'landing') as Polar;
    expect(polar.cd0).toBeCloseTo(0.09, 12);
    expect(polar.k1).toBe(0.01);
    assertInDelta(polar.k, 1 / (Math.PI * 0.72 * 8), 1e-15);
    expect(polar.clMax).toBe(2.1);
  });

  it('is undefined for a configuration the aircraft does not define', () => {
    expect(polarOf(aircraft(), 'engine-out')).toBeUndefined();
    expect(polarOf(aircraft(), 'toString')).toBeUndefined();
  });
});
