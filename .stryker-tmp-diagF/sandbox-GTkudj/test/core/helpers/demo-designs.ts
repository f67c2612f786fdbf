/**
 * Four invented demonstration designs in SI, one per propulsion family, for
 * engine tests and the engine benchmark. Invented scenarios: no real
 * aircraft's data.
 */
// @ts-nocheck

import type { Design } from '../../../core/model';
import { FOOT_M, FOOT_PER_MINUTE_MPS, KNOT_MPS } from '../../../core/units/factors';
import { aircraft, ceiling, climbGradient, climbRate, cruise, design, landingRoll, stall, sustainedTurn, takeoffRoll } from './design';

const kt = (v: number): number => v * KNOT_MPS;
const ft = (h: number): number => h * FOOT_M;
const fpm = (r: number): number => r * FOOT_PER_MINUTE_MPS;

/** Two-seat piston trainer from a 300 m hot strip. */
export const TRAINER: Design = design({
  name: 'Two-seat trainer (demo)',
  aircraft: aircraft({ takeoffMassKg: 750, aspectRatio: 7.5, kind: 'piston' }),
  requirements: [
    stall(kt(45), { id: 'stall' }),
    takeoffRoll(300, { id: 'takeoff', altitudeM: ft(1500), temperatureOffsetK: 15 }),
    landingRoll(250, { id: 'landing', altitudeM: ft(1500), temperatureOffsetK: 15 }),
    cruise(kt(110), { id: 'cruise', altitudeM: ft(6000), massFraction: 0.95, powerSetting: 0.75, propellerEfficiency: 0.82 }),
    climbRate(fpm(700), { id: 'climb' }),
    ceiling(ft(12000), { id: 'ceiling' }),
  ],
  rangePa: [200, 1500],
  samples: 131,
  designPoint: { wingLoadingPa: 600, loading: 9 },
});

/** Nineteen-seat twin turboprop commuter with an engine-out climb. */
export const COMMUTER: Design = design({
  name: 'Twin turboprop commuter (demo)',
  aircraft: aircraft({
    takeoffMassKg: 7000,
    aspectRatio: 9.5,
    clean: { cd0: 0.026, oswaldEfficiency: 0.8, clMax: 1.5 },
    increments: {
      takeoff: { cd0Increment: 0.02, oswaldEfficiency: 0.77, clMax: 2.0 },
      landing: { cd0Increment: 0.065, oswaldEfficiency: 0.72, clMax: 2.5 },
      'engine-out': { cd0Increment: 0.018, oswaldEfficiency: 0.77, clMax: 2.0 },
    },
    kind: 'turboprop',
    engines: 2,
  }),
  requirements: [
    stall(kt(80), { id: 'stall' }),
    takeoffRoll(800, { id: 'takeoff', altitudeM: ft(4000), temperatureOffsetK: 20 }),
    landingRoll(600, { id: 'landing', massFraction: 0.92 }),
    cruise(kt(260), { id: 'cruise', altitudeM: ft(18000), massFraction: 0.95, powerSetting: 0.85 }),
    climbRate(fpm(1500), { id: 'climb' }),
    climbGradient(0.024, { id: 'oei-climb', enginesInoperative: 1, configuration: 'engine-out', altitudeM: ft(4000), temperatureOffsetK: 20 }),
    ceiling(ft(25000), { id: 'ceiling', massFraction: 0.95 }),
  ],
});

/** Six-seat twin business jet; the largest demo, with every curve kind. */
export const BUSINESS_JET: Design = design({
  name: 'Light business jet (demo)',
  aircraft: aircraft({
    takeoffMassKg: 9000,
    aspectRatio: 8.5,
    clean: { cd0: 0.021, oswaldEfficiency: 0.8, clMax: 1.5 },
    increments: {
      takeoff: { cd0Increment: 0.018, oswaldEfficiency: 0.76, clMax: 1.9 },
      landing: { cd0Increment: 0.07, oswaldEfficiency: 0.72, clMax: 2.3 },
      'second-segment': { cd0Increment: 0.015, oswaldEfficiency: 0.76, clMax: 1.9 },
    },
    kind: 'turbofan',
    engines: 2,
  }),
  requirements: [
    stall(kt(95), { id: 'stall' }),
    takeoffRoll(900, { id: 'takeoff', altitudeM: ft(5000), temperatureOffsetK: 20 }),
    landingRoll(750, { id: 'landing', massFraction: 0.85 }),
    cruise(kt(420), { id: 'cruise', altitudeM: ft(37000), massFraction: 0.85 }),
    climbRate(fpm(3500), { id: 'climb', massFraction: 0.98 }),
    climbGradient(0.024, { id: 'second-segment', enginesInoperative: 1, configuration: 'second-segment' }),
    ceiling(ft(43000), { id: 'ceiling', massFraction: 0.9, rateMps: fpm(300) }),
    sustainedTurn(kt(250), 1 / Math.cos(Math.PI / 6), { id: 'turn', altitudeM: ft(15000), massFraction: 0.9 }),
  ],
  samples: 400,
});

/** Small electric survey drone, clean wing only. */
export const SURVEY_DRONE: Design = design({
  name: 'Electric survey drone (demo)',
  aircraft: aircraft({
    takeoffMassKg: 25,
    aspectRatio: 12,
    clean: { cd0: 0.035, oswaldEfficiency: 0.8, clMax: 1.3 },
    increments: {},
    kind: 'electric',
  }),
  requirements: [
    stall(14, { id: 'stall', configuration: 'clean' }),
    takeoffRoll(40, { id: 'takeoff', configuration: 'clean', rollingFriction: 0.08 }),
    cruise(24, { id: 'cruise', altitudeM: 1000, powerSetting: 0.6 }),
    climbRate(3, { id: 'climb', altitudeM: 1000 }),
    sustainedTurn(20, 1.5, { id: 'turn', altitudeM: 1000 }),
  ],
});

export const DEMO_DESIGNS: readonly Design[] = [TRAINER, COMMUTER, BUSINESS_JET, SURVEY_DRONE];
