/**
 * The words of the diagram's warnings, whole: each names its field and says
 * what is wrong (they are part of the product), and the edges where a warning
 * starts: least drag exactly zero, Mach exactly 1, a limit exactly on the
 * range's left end, a power setting of zero.
 */
import { describe, expect, it } from 'vitest';
import { assumptionWarnings } from '../../../core/diagram/assumption-warnings';
import { compressibilityWarnings } from '../../../core/diagram/compressibility-warnings';
import { designPointWarnings, optimumWarnings, speedWarnings } from '../../../core/diagram/diagram-warnings';
import { requirementBoundaries } from '../../../core/diagram/boundaries';
import { evaluateDesign, impossibleInputs } from '../../../core/diagram';
import { minimumDragLiftCoefficient } from '../../../core/aero/lift-coefficients';
import { polarOf, type Polar } from '../../../core/aero/drag-polar';
import { atmosphere } from '../../../core/atmosphere';
import type { WarningJson } from '../../../core/evaluation';
import type { Aircraft } from '../../../core/model';
import { aircraft, cruise, design, stall } from '../helpers/design';

const RANGE: [number, number] = [100, 2000];
const onCruise = (a: Aircraft) => assumptionWarnings(design({ aircraft: a, requirements: [cruise(60)], rangePa: RANGE }));
const find = (ws: WarningJson[], code: string) => ws.filter((w) => w.code === code);

describe('assumption warnings, word for word', () => {
  it('clean C_D0 outside 0.006-0.05', () => {
    expect(onCruise(aircraft({ clean: { cd0: 0.06, oswaldEfficiency: 0.8, clMax: 1.5 }, increments: {} }))).toEqual([
      {
        code: 'assumption-outside-typical-range',
        field: 'aircraft.aero.configurations.clean.cd0',
        message: 'Clean C_D0 0.06 is outside the typical range: 0.006 sailplane to 0.05 small UAV (common practice).',
      },
    ]);
  });

  it('Oswald efficiency outside 0.7-0.95, named with its configuration', () => {
    expect(onCruise(aircraft({ clean: { cd0: 0.03, oswaldEfficiency: 0.6, clMax: 1.5 }, increments: {} }))).toEqual([
      {
        code: 'assumption-outside-typical-range',
        field: 'aircraft.aero.configurations.clean.oswaldEfficiency',
        message: 'Oswald efficiency (clean) 0.6 is outside the typical range: 0.7-0.95, about 0.8 (common practice).',
      },
    ]);
  });

  it('clean C_Lmax outside 0.8-1.7, and a landing C_Lmax of its own outside 1.6-2.8 (Roskam, Airplane Design I, Table 3.1)', () => {
    expect(onCruise(aircraft({ clean: { cd0: 0.03, oswaldEfficiency: 0.8, clMax: 2 }, increments: {} }))).toEqual([
      {
        code: 'assumption-outside-typical-range',
        field: 'aircraft.aero.configurations.clean.clMax',
        message: 'C_Lmax (clean) 2 is outside the typical range: 0.8 thin wing to 1.2-1.5 typical (common practice).',
      },
    ]);
    expect(onCruise(aircraft({ increments: { landing: { cd0Increment: 0.06, oswaldEfficiency: 0.72, clMax: 3.2 } } }))).toEqual([
      {
        code: 'assumption-outside-typical-range',
        field: 'aircraft.aero.configurations.landing.clMax',
        message: 'C_Lmax (landing) 3.2 is outside the typical range: 1.6-2.8, about 5 with powered lift (Roskam, Airplane Design I, Table 3.1).',
      },
    ]);
  });

  it('a configuration with less zero-lift drag than clean', () => {
    expect(onCruise(aircraft({ increments: { landing: { cd0Increment: -0.005, oswaldEfficiency: 0.72, clMax: 2.1 } } }))).toEqual([
      {
        code: 'assumption-outside-typical-range',
        field: 'aircraft.aero.configurations.landing.cd0Increment',
        message: 'The landing configuration has less zero-lift drag than clean; flaps and gear add drag (Roskam, Airplane Design I, Table 3.6).',
      },
    ]);
  });

  it('a polar whose least drag is exactly zero is not positive: warned here, refused as an input', () => {
    // C_D,min = C_D0 - K1^2/(4K) (minimum of C_D0 + K1 C_L + K C_L^2 at C_L = -K1/(2K), hand derivation).
    // With C_D0 set to K1^2/(4K) for K1 = -0.1 it is 0: no aircraft flies with zero drag.
    const k1 = -0.1;
    const k = (polarOf(aircraft(), 'clean') as Polar).k;
    const a: Aircraft = { ...aircraft({ clean: { cd0: (k1 * k1) / (4 * k), oswaldEfficiency: 0.8, clMax: 1.5 }, increments: {} }), cdLinear: k1 };
    expect(find(assumptionWarnings(design({ aircraft: a, requirements: [cruise(60)], rangePa: RANGE })), 'drag-polar-not-positive')).toEqual([
      {
        code: 'drag-polar-not-positive',
        field: 'aircraft.aero.cdLinear',
        message: 'With C_D linear term -0.1 the clean polar reaches zero or negative drag; check cdLinear and the Oswald efficiency.',
      },
    ]);
    expect(impossibleInputs(design({ aircraft: a, requirements: [cruise(60)], rangePa: RANGE })).map((i) => i.field)).toEqual(['aircraft.aero.cdLinear']);
  });

  it('mass fraction and power setting above 1', () => {
    const warnings = assumptionWarnings(design({ requirements: [cruise(60, { massFraction: 1.05, powerSetting: 1.1 })], rangePa: RANGE }));
    expect(warnings).toEqual([
      { code: 'assumption-outside-typical-range', field: 'requirements[0].massFraction', message: 'Mass fraction 1.05 is above take-off mass.' },
      { code: 'assumption-outside-typical-range', field: 'requirements[0].powerSetting', message: 'Power setting 1.1 is above rated power or thrust.' },
    ]);
  });

  it('a turbofan lapse exponent outside 0.6-1', () => {
    expect(onCruise(aircraft({ kind: 'turbofan', lapseExponent: 1.2 }))).toEqual([
      { code: 'assumption-outside-typical-range', field: 'aircraft.propulsion.lapseExponent', message: 'Lapse exponent 1.2 is outside the typical range: 0.6-1 (common practice).' },
    ]);
  });
});

describe('requirement warnings, word for word', () => {
  it('a configuration the aircraft does not define', () => {
    const e = evaluateDesign(design({ requirements: [cruise(60, { configuration: 'approach' })], rangePa: RANGE }));
    expect(find(e.warnings, 'configuration-missing')).toEqual([
      {
        code: 'configuration-missing',
        field: 'requirements[0].configuration',
        message: 'Configuration "approach" is not defined under aircraft.aero.configurations; the clean configuration is used.',
      },
    ]);
  });

  it('a power setting of zero leaves no power: the field is the setting, not the altitude', () => {
    // Available fraction = lapse x setting = 1 x 0 = 0 at sea level.
    const e = evaluateDesign(design({ requirements: [cruise(60, { powerSetting: 0 })], rangePa: RANGE }));
    expect(find(e.warnings, 'no-power-available')).toEqual([
      {
        code: 'no-power-available',
        field: 'requirements[0].powerSetting',
        message: 'No piston power or thrust is left at this altitude and power setting (lapse x setting = 0).',
      },
    ]);
  });

  it('a stall limit needs no power, so a power setting of zero says nothing there', () => {
    const e = evaluateDesign(design({ requirements: [stall(25, { powerSetting: 0 }), cruise(60)], rangePa: RANGE }));
    expect(find(e.warnings, 'no-power-available')).toEqual([]);
  });

  it('a limit left of the plotted range, and none for a limit exactly on its left end', () => {
    // Stall limit 1/2 x 1.225 x 20^2 x 2.1 = 514.5 Pa (rho0 U.S. Standard Atmosphere 1976).
    const at = (lo: number) => evaluateDesign(design({ requirements: [stall(20), cruise(60)], rangePa: [lo, 2000] }));
    expect(find(at(600).warnings, 'limit-below-range')).toEqual([
      {
        code: 'limit-below-range',
        field: 'requirements[0]',
        message: 'Requirement "stall" allows at most 514.5 N/m^2 of wing loading, left of the plotted range (from 600 N/m^2).',
      },
    ]);
    const limit = (at(600).boundaries[0] as { wingLoadingMax: number }).wingLoadingMax;
    expect(find(at(limit).warnings, 'limit-below-range')).toEqual([]);
  });

  it('a cruise below the stall speed at every plotted wing loading', () => {
    const e = evaluateDesign(design({ requirements: [cruise(20)], rangePa: [500, 1500] }));
    expect(find(e.warnings, 'requirement-unattainable')).toEqual([
      {
        code: 'requirement-unattainable',
        field: 'requirements[0].speed',
        message: 'Requirement "cruise": the speed is below the stall speed of the clean configuration at every plotted wing loading (C_L needed above C_Lmax).',
      },
    ]);
  });
});

describe('diagram warnings, word for word', () => {
  const found = (wingLoadingPa: number) => ({ wingLoadingPa, loading: 0.1, unbounded: false });

  it('no requirement, no feasible point, no power requirement', () => {
    expect(optimumWarnings(null, [100, 1000], 0, 0)).toEqual([
      { code: 'no-requirements', field: 'requirements', message: 'No requirement is enabled, so there is no optimum; enable or add a requirement.' },
    ]);
    expect(optimumWarnings(null, [100, 1000], 1, 1)).toEqual([
      { code: 'no-feasible-point', field: 'requirements', message: 'No plotted wing loading meets every enabled requirement; see the requirements flagged above, or widen the range.' },
    ]);
    expect(optimumWarnings(found(500), [100, 1000], 0, 1)).toEqual([
      { code: 'no-power-requirement', field: 'requirements', message: 'No enabled requirement sets power or thrust; installed power is reported as zero.' },
    ]);
  });

  it('the left edge counts up to and including a relative 1e-6 of the range start', () => {
    expect(optimumWarnings(found(100 * (1 + 1e-6)), [100, 1000], 1, 1)).toEqual([
      { code: 'optimum-at-edge', field: 'diagram.wingLoading', message: 'The least power sits on the left edge of the plotted range; widen the range to lower wing loadings.' },
    ]);
  });

  it('a design point outside 1-150 psf (1 psf = 47.880259 Pa, NIST SP 811)', () => {
    expect(designPointWarnings(40, [1, 1e5])).toEqual([
      {
        code: 'assumption-outside-typical-range',
        field: 'designPoint.wingLoading',
        message: 'Wing loading 40 N/m^2 is outside the typical 1-150 psf (48-7200 N/m^2) (common practice).',
      },
    ]);
  });

  it('a speed needing exactly C_Lmax is flown at stall, not below it', () => {
    // C_L,md = sqrt(C_D0/K) (Anderson, Introduction to Flight); C_Lmax set to it: only the minimum-power speed,
    // at sqrt(3) C_L,md, is below stall.
    const clMax = minimumDragLiftCoefficient(polarOf(aircraft(), 'clean') as Polar);
    const a = aircraft({ clean: { cd0: 0.03, oswaldEfficiency: 0.8, clMax }, increments: {} });
    expect(speedWarnings(design({ aircraft: a, requirements: [cruise(60)], rangePa: RANGE })).map((w) => w.message.split(' speed')[0])).toEqual(['The minimum-power']);
  });
});

describe('compressibility at exactly Mach 1', () => {
  it('is "not modelled", not supersonic', () => {
    // V = a at sea level: M = V/a = 1 exactly, not above Mach 1.
    const a0 = atmosphere(0).speedOfSoundMps;
    const d = design({ aircraft: aircraft({ kind: 'turbofan' }), requirements: [cruise(a0)], rangePa: RANGE });
    expect(compressibilityWarnings(requirementBoundaries(d), d, 1000).map((w) => w.code)).toEqual(['compressibility-not-modelled']);
  });
});
