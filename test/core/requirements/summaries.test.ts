/**
 * The one-line summary of each requirement kind, as lists and reports print
 * it: the main values in the chosen unit system, each converted by hand here
 * (international foot 0.3048 m and knot 1852/3600 m/s, NIST SP 811, exact).
 */
import { describe, expect, it } from 'vitest';
import { requirementKind } from '../../../core/requirements';
import type { Requirement } from '../../../core/model';
import type { UnitSystem } from '../../../core/units/display';
import * as make from '../helpers/design';

const KNOT = 1852 / 3600;
const FOOT = 0.3048;

function summary(r: Requirement, system: UnitSystem): string[] {
  // eslint-disable-next-line @typescript-eslint/no-explicit-any
  return (requirementKind(r.kind) as any).summary(r, system);
}

describe('requirement summaries', () => {
  it('stall and approach speed read as CAS, the approach with its factor over stall speed', () => {
    expect(summary(make.stall(50 * KNOT), 'kt-ft')).toEqual(['50 kt CAS']);
    expect(summary(make.stall(50 * KNOT), 'us')).toEqual(['50.0 kt CAS']);
    // 60 m/s = 116.63 kt.
    expect(summary(make.approachSpeed(60), 'us')).toEqual(['116.6 kt CAS', 'at 1.3 × stall speed']);
    expect(summary(make.approachSpeed(60, { speedFactor: 1.23 }), 'si')).toEqual(['60.0 m/s CAS', 'at 1.23 × stall speed']);
  });

  it('ground rolls read their distance and friction (and the take-off run its C_L)', () => {
    // 400 m = 1312.3 ft.
    expect(summary(make.landingRoll(400), 'us')).toEqual(['1,312 ft ground roll', 'μ braking 0.3']);
    expect(summary(make.landingRoll(400, { brakingFriction: 0.45 }), 'si')).toEqual(['400 m ground roll', 'μ braking 0.45']);
    expect(summary(make.takeoffRoll(400), 'kt-ft')).toEqual(['1,312 ft ground roll', 'μ rolling 0.04', 'CL ground run 0.5']);
    // Friction to three decimals: 0.025 on a paved runway (Brandt et al.: 0.02-0.05).
    expect(summary(make.takeoffRoll(400, { rollingFriction: 0.025, clGroundRun: 0.75 }), 'si')).toEqual(['400 m ground roll', 'μ rolling 0.025', 'CL ground run 0.75']);
  });

  it('distances over an obstacle name the screen height', () => {
    // 600 m = 1968.5 ft; 50 ft = 15.24 m.
    expect(summary(make.takeoffDistance(600), 'us')).toEqual(['1,969 ft over 50 ft', 'μ rolling 0.04']);
    expect(summary(make.takeoffDistance(600, { rollingFriction: 0.035 }), 'si')).toEqual(['600 m over 15 m', 'μ rolling 0.035']);
    // 1500 m = 4921.3 ft; 35 ft = 10.67 m.
    expect(summary(make.balancedField(1500), 'us')).toEqual(['4,921 ft balanced field over 35 ft', 'V2 1.2 × stall speed']);
    expect(summary(make.balancedField(1500, { v2SpeedFactor: 1.13 }), 'si')).toEqual(['1,500 m balanced field over 11 m', 'V2 1.13 × stall speed']);
    // 900 m = 2952.8 ft.
    expect(summary(make.landingDistance(900), 'us')).toEqual(['2,953 ft over 50 ft', 'μ braking 0.3']);
  });

  it('a factored landing field length reads as the field length times its factor', () => {
    expect(summary(make.landingDistance(1500, { fieldLengthFactor: 0.6 }), 'us')).toEqual(['4,921 ft field length × 0.6', 'μ braking 0.3']);
    expect(summary(make.landingDistance(1500, { fieldLengthFactor: 0.6, brakingFriction: 0.4 }), 'si')).toEqual(['1,500 m field length × 0.6', 'μ braking 0.4']);
  });

  it('climbs read their rate or gradient, the speed, and engines out', () => {
    // 4 m/s = 787.4 ft/min.
    expect(summary(make.climbRate(4), 'us')).toEqual(['787 ft/min', 'at the best-rate speed']);
    // 50 m/s = 97.19 kt.
    expect(summary(make.climbRate(4, { speedMps: 50 }), 'kt-ft')).toEqual(['787 ft/min', 'at 97 kt TAS']);
    expect(summary(make.climbGradient(0.024), 'si')).toEqual(['gradient 2.4 %', 'at 1.2 × stall speed']);
    expect(summary(make.climbGradient(0.027, { enginesInoperative: 1, speedFactor: 1.13 }), 'si')).toEqual(['gradient 2.7 %', '1 engine out', 'at 1.13 × stall speed']);
    expect(summary(make.climbGradient(0.03, { enginesInoperative: 2 }), 'us')).toEqual(['gradient 3 %', '2 engines out', 'at 1.2 × stall speed']);
  });

  it('a ceiling reads its residual rate at the altitude, a flight level in the working units', () => {
    const r = make.ceiling(30000 * FOOT);
    expect(summary(r, 'us')).toEqual(['100 ft/min at 30,000 ft']);
    expect(summary(r, 'kt-ft')).toEqual(['100 ft/min at FL300']);
    expect(summary(r, 'si')).toEqual(['0.51 m/s at 9,144 m']);
  });

  it('a turn reads its load factor at its speed', () => {
    expect(summary(make.sustainedTurn(60, 2), 'kt-ft')).toEqual(['n 2 at 117 kt TAS']);
    expect(summary(make.sustainedTurn(60, 1 / Math.cos(Math.PI / 4)), 'si')).toEqual(['n 1.41 at 60.0 m/s TAS']);
  });

  it('cruise reads as a Mach number first from M 0.4 (M = V/a at its own ISA air), else as TAS', () => {
    // ISA at 30,000 ft (ISO 2533): T = 228.714 K, a = sqrt(1.4 * 287.05287 * T) = 303.17 m/s; 240 m/s is M 0.7916.
    expect(summary(make.cruise(240, { altitudeM: 30000 * FOOT }), 'si')).toEqual(['M0.79 (240.0 m/s TAS)']);
    // 110 kt at 30,000 ft is M 0.19: TAS only.
    expect(summary(make.cruise(110 * KNOT, { altitudeM: 30000 * FOOT }), 'kt-ft')).toEqual(['110 kt TAS']);
    // 150 m/s at sea level (a0 = 340.29 m/s) is M 0.44; 20 K warmer air (a = 351.9 m/s) makes it M 0.43.
    expect(summary(make.cruise(150), 'si')).toEqual(['M0.44 (150.0 m/s TAS)']);
    expect(summary(make.cruise(150, { temperatureOffsetK: 20 }), 'si')).toEqual(['M0.43 (150.0 m/s TAS)']);
    // 130 m/s at sea level is M 0.38, but M 0.41 at 30,000 ft.
    expect(summary(make.cruise(130), 'si')).toEqual(['130.0 m/s TAS']);
    expect(summary(make.cruise(130, { altitudeM: 30000 * FOOT }), 'si')).toEqual(['M0.43 (130.0 m/s TAS)']);
  });

  it('a top speed reads as TAS, as EAS, or as its Mach number with the TAS', () => {
    // 100 m/s = 194.38 kt.
    expect(summary(make.maximumSpeed(100), 'kt-ft')).toEqual(['194 kt TAS']);
    expect(summary(make.maximumSpeed(100, { equivalent: true, altitudeM: 10000 * FOOT }), 'kt-ft')).toEqual(['194 kt EAS']);
    // M 0.8 at 30,000 ft: 0.8 * 303.17 = 242.54 m/s = 471.5 kt (the TAS the Mach number stands for).
    const a = Math.sqrt(1.4 * 287.05287 * (288.15 - 0.0065 * 30000 * FOOT));
    expect(summary(make.maximumSpeed(0.8 * a, { mach: 0.8, altitudeM: 30000 * FOOT }), 'kt-ft')).toEqual(['M0.8 (471 kt TAS)']);
  });
});
