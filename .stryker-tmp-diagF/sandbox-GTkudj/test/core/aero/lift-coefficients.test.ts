// @ts-nocheck
import { describe, expect, it } from 'vitest';
import { dragCoefficient, type Polar } from '../../../core/aero/drag-polar';
import {
  bestRangeLiftCoefficient,
  liftToDrag,
  maximumLiftToDrag,
  minimumDragLiftCoefficient,
  minimumPowerLiftCoefficient,
} from '../../../core/aero/lift-coefficients';
import { speedForLiftCoefficient } from '../../../core/aero/speeds';
import { assertInDelta, assertRelative } from '../helpers/asserts';

const clean: Polar = { cd0: 0.025, k1: 0, k: 1 / (Math.PI * 0.8 * 8), clMax: 1.5 };

/** The C_L that maximises g(C_L) on a fine scan: an independent numerical check. */
function argmax(g: (cl: number) => number): number {
  let best = 0;
  let at = 0;
  for (let cl = 0.01; cl < 4; cl += 1e-5) {
    const v = g(cl);
    if (v > best) [best, at] = [v, cl];
  }
  return at;
}

describe('characteristic lift coefficients with K1 = 0', () => {
  it('has induced drag equal to zero-lift drag at (L/D)max', () => {
    // Anderson, Introduction to Flight, section 6.x: at (L/D)max, C_D0 = C_Di (from memory).
    const cl = minimumDragLiftCoefficient(clean);
    assertRelative(clean.k * cl * cl, clean.cd0, 1e-12);
  });

  it('has induced drag three times zero-lift drag at minimum power', () => {
    // Anderson, Introduction to Flight: for minimum power required, C_D0 = C_Di/3 (from memory).
    const cl = minimumPowerLiftCoefficient(clean);
    assertRelative(clean.k * cl * cl, 3 * clean.cd0, 1e-12);
  });

  it('gives V_md / V_mp = 3^(1/4) = 1.316', () => {
    // Anderson, Introduction to Flight, textbook identity; core/methods.md section 4.
    const ratio = speedForLiftCoefficient(1000, 1.225, minimumDragLiftCoefficient(clean)) / speedForLiftCoefficient(1000, 1.225, minimumPowerLiftCoefficient(clean));
    assertInDelta(ratio, Math.pow(3, 0.25), 1e-12);
    assertInDelta(ratio, 1.316, 5e-4);
  });

  it('gives (L/D) at minimum power = (sqrt 3 / 2)(L/D)max', () => {
    // Anderson, Introduction to Flight, textbook identity; core/methods.md section 4.
    assertRelative(liftToDrag(clean, minimumPowerLiftCoefficient(clean)), (Math.sqrt(3) / 2) * maximumLiftToDrag(clean), 1e-12);
  });

  it('gives (L/D)max = 1/(2 sqrt(K C_D0)) equal to a scan of C_L/C_D', () => {
    // Anderson, Introduction to Flight: (L/D)max = 1/(2 sqrt(K C_D0)); the scan is independent.
    const cl = argmax((c) => c / dragCoefficient(clean, c));
    assertRelative(maximumLiftToDrag(clean), liftToDrag(clean, cl), 1e-8);
    assertRelative(maximumLiftToDrag(clean), 1 / (2 * Math.sqrt(clean.k * clean.cd0)), 1e-12);
  });

  it('puts the jet best-range speed at 3^(1/4) V_md', () => {
    // Anderson, Introduction to Flight: jet maximum range at C_Di = C_D0/3, V_mr = 3^(1/4) V_md (core/methods.md section 4).
    const ratio = speedForLiftCoefficient(1000, 1.225, bestRangeLiftCoefficient(clean)) / speedForLiftCoefficient(1000, 1.225, minimumDragLiftCoefficient(clean));
    assertInDelta(ratio, Math.pow(3, 0.25), 1e-12);
  });
});

describe('characteristic lift coefficients with a linear term', () => {
  for (const k1 of [-0.03, -0.01, 0.01, 0.03]) {
    const polar: Polar = { ...clean, k1 };

    it(`keeps C_L,md = sqrt(C_D0/K) with K1 = ${k1}, as a scan of C_L/C_D confirms`, () => {
      // d(C_D/C_L)/dC_L = -C_D0/C_L^2 + K has no K1 (core/methods.md section 4); the scan is independent.
      const scanned = argmax((c) => c / dragCoefficient(polar, c));
      assertInDelta(minimumDragLiftCoefficient(polar), scanned, 2e-5);
      expect(minimumDragLiftCoefficient(polar)).toBe(minimumDragLiftCoefficient(clean));
    });

    it(`puts C_L,mp at the maximum of C_L^1.5/C_D with K1 = ${k1}`, () => {
      // Minimum power required = maximum C_L^(3/2)/C_D (Anderson, Introduction to Flight); the scan is independent.
      const scanned = argmax((c) => Math.pow(c, 1.5) / dragCoefficient(polar, c));
      assertInDelta(minimumPowerLiftCoefficient(polar), scanned, 2e-5);
    });

    it(`gives (L/D)max = 1/(2 sqrt(K C_D0) + K1) with K1 = ${k1}`, () => {
      // core/methods.md section 4; the scan of C_L/C_D is independent.
      const scanned = argmax((c) => c / dragCoefficient(polar, c));
      assertRelative(maximumLiftToDrag(polar), liftToDrag(polar, scanned), 1e-8);
    });
  }
});

describe('bestRangeLiftCoefficient with a linear term', () => {
  it('maximises sqrt(C_L)/C_D with K1 = +/-0.03 (jet best range, Anderson; checked against neighbours)', () => {
    for (const k1 of [-0.03, 0.03]) {
      const polar = { cd0: 0.025, k1, k: 0.045, clMax: 1.5 };
      const merit = (cl: number) => Math.sqrt(cl) / (polar.cd0 + k1 * cl + polar.k * cl * cl);
      const best = bestRangeLiftCoefficient(polar);
      expect(merit(best)).toBeGreaterThan(merit(best * 1.01));
      expect(merit(best)).toBeGreaterThan(merit(best * 0.99));
    }
  });
});
