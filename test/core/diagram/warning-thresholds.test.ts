/**
 * Where each diagram warning starts, checked on both sides of its threshold:
 * the plotted range, the 1-150 psf typical wing loading (common practice),
 * the optimum on an edge, Mach 0.6 and Mach 1 (common practice), the
 * characteristic speeds below stall (Anderson, Introduction to Flight) and
 * the typical ranges' inclusive bounds.
 */
import { describe, expect, it } from 'vitest';
import { assumptionWarnings } from '../../../core/diagram/assumption-warnings';
import { compressibilityWarnings, COMPRESSIBILITY_MACH } from '../../../core/diagram/compressibility-warnings';
import { designPointWarnings, optimumWarnings, speedWarnings } from '../../../core/diagram/diagram-warnings';
import { requirementBoundaries } from '../../../core/diagram/boundaries';
import { ASPECT_RATIO } from '../../../core/assumptions/typical-ranges';
import type { Design } from '../../../core/model';
import { PSF_PA } from '../../../core/units/factors';
import { aircraft, cruise, design } from '../helpers/design';

const codes = (ws: { code: string }[]) => ws.map((w) => w.code);

describe('designPointWarnings', () => {
  it('warns outside the plotted range and not on its ends', () => {
    expect(designPointWarnings(500, [500, 1000])).toEqual([]);
    expect(designPointWarnings(1000, [500, 1000])).toEqual([]);
    expect(codes(designPointWarnings(499, [500, 1000]))).toEqual(['design-point-outside-range']);
    expect(codes(designPointWarnings(1001, [500, 1000]))).toEqual(['design-point-outside-range']);
    expect(designPointWarnings(1001, [500, 1000])[0]).toMatchObject({ field: 'designPoint.wingLoading' });
    expect(designPointWarnings(1001, [500, 1000])[0].message).toContain('1001 N/m^2');
  });

  it('warns outside 1-150 psf, the ends included as typical (1 psf = 47.880259 Pa, NIST SP 811)', () => {
    expect(PSF_PA).toBeCloseTo(47.880259, 6);
    const wide: [number, number] = [1, 1e5];
    expect(designPointWarnings(PSF_PA, wide)).toEqual([]);
    expect(designPointWarnings(150 * PSF_PA, wide)).toEqual([]);
    expect(codes(designPointWarnings(47, wide))).toEqual(['assumption-outside-typical-range']);
    expect(codes(designPointWarnings(7200, wide))).toEqual(['assumption-outside-typical-range']);
  });
});

describe('optimumWarnings', () => {
  const found = (wingLoadingPa: number, unbounded = false) => ({ wingLoadingPa, loading: 0.1, unbounded });

  it('no requirement, no feasible point', () => {
    expect(codes(optimumWarnings(null, [100, 1000], 0, 0))).toEqual(['no-requirements']);
    expect(codes(optimumWarnings(found(500), [100, 1000], 1, 0))).toEqual(['no-requirements']);
    expect(codes(optimumWarnings(null, [100, 1000], 1, 1))).toEqual(['no-feasible-point']);
  });

  it('an unbounded optimum is on the right edge', () => {
    const w = optimumWarnings(found(1000, true), [100, 1000], 1, 1);
    expect(codes(w)).toEqual(['optimum-at-edge']);
    expect(w[0].message).toContain('right edge');
  });

  it('the left edge counts within a relative 1e-6 of the range start, with a curve', () => {
    expect(codes(optimumWarnings(found(100 * (1 + 5e-7)), [100, 1000], 1, 1))).toEqual(['optimum-at-edge']);
    expect(optimumWarnings(found(100 * (1 + 5e-7)), [100, 1000], 1, 1)[0].message).toContain('left edge');
    expect(optimumWarnings(found(100 * (1 + 2e-6)), [100, 1000], 1, 1)).toEqual([]);
    expect(optimumWarnings(found(500), [100, 1000], 2, 2)).toEqual([]);
  });

  it('with limits only: no power requirement, and no left-edge warning', () => {
    expect(codes(optimumWarnings(found(100), [100, 1000], 0, 1))).toEqual(['no-power-requirement']);
  });
});

describe('compressibilityWarnings', () => {
  function at(speedMps: number, withData = false) {
    const d: Design = design({
      aircraft: { ...aircraft(), ...(withData ? { compressibility: { thicknessRatio: 0.12, quarterChordSweepRad: 0, kornFactor: 0.87 } } : {}) },
      requirements: [cruise(speedMps)],
      rangePa: [100, 5000],
    });
    return compressibilityWarnings(requirementBoundaries(d), d, 3000);
  }
  // Sea level ISA: a = 340.294 m/s (U.S. Standard Atmosphere 1976), so Mach 0.6 is 204.18 m/s and Mach 1 is 340.29 m/s.
  it('is quiet up to Mach 0.6 and says "not modelled" above it without wing data', () => {
    expect(COMPRESSIBILITY_MACH).toBe(0.6);
    expect(at(200)).toEqual([]);
    const w = at(210);
    expect(codes(w)).toEqual(['compressibility-not-modelled']);
    expect(w[0].field).toBe('requirements[0]');
    expect(w[0].message).toContain('Mach 0.62');
  });

  it('is quiet above Mach 0.6 with the wing data given', () => {
    expect(at(300, true)).toEqual([]);
  });

  it('is an error above Mach 1, with or without wing data', () => {
    for (const withData of [false, true]) {
      const w = at(350, withData);
      expect(codes(w)).toEqual(['supersonic']);
      expect(w[0].severity).toBe('error');
      expect(w[0].message).toContain('Mach 1.03');
    }
    expect(codes(at(340))).toEqual(['compressibility-not-modelled']);
  });
});

describe('speedWarnings', () => {
  // K = 1/(pi e AR) = 1/(pi x 0.8 x 7.5) = 0.053052; C_L,md = sqrt(0.03/K) = 0.75199;
  // C_L,mp = sqrt(3) C_L,md = 1.30249 with K1 = 0 (Anderson, Introduction to Flight).
  const withClMax = (clMax: number) => design({ aircraft: aircraft({ clean: { cd0: 0.03, oswaldEfficiency: 0.8, clMax } }), requirements: [cruise(60)], rangePa: [100, 2000] });

  it('is quiet when both speeds are above stall', () => {
    expect(speedWarnings(withClMax(1.5))).toEqual([]);
  });

  it('flags the minimum-power speed alone for C_Lmax between 0.752 and 1.302', () => {
    const w = speedWarnings(withClMax(1.0));
    expect(codes(w)).toEqual(['speed-below-stall']);
    expect(w[0].message).toContain('minimum-power speed needs C_L 1.302');
    expect(w[0].field).toBe('aircraft.aero.configurations.clean.clMax');
  });

  it('flags both below C_Lmax 0.752', () => {
    const w = speedWarnings(withClMax(0.7));
    expect(w.map((x) => x.message.split(' speed')[0])).toEqual(['The minimum-drag', 'The minimum-power']);
  });
});

describe('assumptionWarnings: typical ranges with inclusive bounds', () => {
  const withAspectRatio = (aspectRatio: number) => design({ aircraft: { ...aircraft(), aspectRatio }, requirements: [cruise(60)], rangePa: [100, 2000] });

  it('aspect ratio at its bounds is typical; just outside warns with the rounded value and the range text', () => {
    expect(assumptionWarnings(withAspectRatio(ASPECT_RATIO.low))).toEqual([]);
    expect(assumptionWarnings(withAspectRatio(ASPECT_RATIO.high))).toEqual([]);
    const low = assumptionWarnings(withAspectRatio(3.9));
    expect(low).toEqual([
      { code: 'assumption-outside-typical-range', field: 'aircraft.aero.aspectRatio', message: `Aspect ratio 3.9 is outside the typical range: ${ASPECT_RATIO.text}.` },
    ]);
    expect(codes(assumptionWarnings(withAspectRatio(41)))).toEqual(['assumption-outside-typical-range']);
  });

  it('mass fraction and power setting above 1 warn; exactly 1 does not', () => {
    const d = (extra: object) => design({ requirements: [cruise(60, extra)], rangePa: [100, 2000] });
    expect(assumptionWarnings(d({ massFraction: 1, powerSetting: 1 }))).toEqual([]);
    expect(assumptionWarnings(d({ massFraction: 1.05 })).map((w) => w.field)).toEqual(['requirements[0].massFraction']);
    expect(assumptionWarnings(d({ powerSetting: 1.1 })).map((w) => w.field)).toEqual(['requirements[0].powerSetting']);
    expect(assumptionWarnings(d({ massFraction: 1.05, enabled: false }))).toEqual([]);
  });

  it('a configuration with less zero-lift drag than clean warns at its increment field', () => {
    const a = aircraft({ increments: { landing: { cd0Increment: -0.005, oswaldEfficiency: 0.72, clMax: 2.1 } } });
    const w = assumptionWarnings(design({ aircraft: a, requirements: [cruise(60)], rangePa: [100, 2000] }));
    expect(w.map((x) => x.field)).toEqual(['aircraft.aero.configurations.landing.cd0Increment']);
  });

  it('a polar whose least drag is not positive warns at cdLinear', () => {
    // C_D0 - K1^2/(4K) = 0.03 - 0.04/(4 x 0.053052) = -0.158 < 0 (hand derivation).
    const w = assumptionWarnings(design({ aircraft: { ...aircraft({ increments: {} }), cdLinear: -0.2 }, requirements: [cruise(60)], rangePa: [100, 2000] }));
    expect(w.filter((x) => x.code === 'drag-polar-not-positive').map((x) => x.field)).toEqual(['aircraft.aero.cdLinear']);
  });

  it('checks a flap configuration only where it differs from clean', () => {
    // Same e and C_Lmax as clean: not checked again; an e of 0.6 in landing alone warns once.
    const same = aircraft({ clean: { cd0: 0.03, oswaldEfficiency: 0.6, clMax: 1.5 }, increments: { landing: { cd0Increment: 0.06 } } });
    const fields = assumptionWarnings(design({ aircraft: same, requirements: [cruise(60)], rangePa: [100, 2000] })).map((x) => x.field);
    expect(fields).toEqual(['aircraft.aero.configurations.clean.oswaldEfficiency']);
    const own = aircraft({ increments: { landing: { cd0Increment: 0.06, oswaldEfficiency: 0.6 } } });
    expect(assumptionWarnings(design({ aircraft: own, requirements: [cruise(60)], rangePa: [100, 2000] })).map((x) => x.field)).toEqual([
      'aircraft.aero.configurations.landing.oswaldEfficiency',
    ]);
  });
});
