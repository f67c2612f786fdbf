/**
 * Demo: a twin-turboprop utility aircraft for a hot-and-high mountain
 * strip. An invented scenario; the numbers sit in the methods reference's (core/methods.md) typical
 * ranges and follow the rules named on each requirement.
 */
// @ts-nocheck

import { DEMO_CAUTION, type DemoConcept } from './demo';

export const utilityTwin: DemoConcept = {
  slug: 'utility-twin',
  title: 'LP-19 utility twin',
  summary:
    'A 5,700 kg twin turboprop for people and freight into a 2,200 m gravel strip on ISA+25 K days: a 900 m take-off over 50 ft, a short landing roll, ' +
    'the one-engine-out climb gradient from the strip, and a 230 kt cruise at 12,000 ft.' +
    ` ${DEMO_CAUTION}`,
  concept: {
    format: 'loftpoint-concept/1',
    name: 'LP-19 utility twin',
    aircraft: {
      takeoffMass: '5700 kg',
      aero: {
        aspectRatio: 9.6,
        cdLinear: 0,
        configurations: {
          clean: { cd0: 0.027, oswaldEfficiency: 0.8, clMax: 1.55 },
          takeoff: { cd0Increment: 0.018, oswaldEfficiency: 0.77, clMax: 2.1 },
          landing: { cd0Increment: 0.065, oswaldEfficiency: 0.72, clMax: 2.6 },
          'engine-out': { cd0Increment: 0.021, oswaldEfficiency: 0.76, clMax: 2.1 },
        },
      },
      propulsion: { kind: 'turboprop', engines: 2, lapseExponent: 0.75 },
    },
    requirements: [
      {
        id: 'stall',
        kind: 'stall',
        label: 'VS0 at most 70 kt CAS in landing flaps (operator target for short strips)',
        speed: '70 kt',
      },
      {
        id: 'takeoff-strip',
        kind: 'takeoff-distance',
        label: '900 m take-off distance over 50 ft from gravel at 2,200 m elevation, ISA+25 K, both engines (operator requirement)',
        distance: '900 m',
        obstacleHeight: '50 ft',
        altitude: '2200 m',
        temperatureOffset: '25 K',
        rollingFriction: 0.05,
      },
      {
        id: 'landing-strip',
        kind: 'landing-ground-roll',
        label: '450 m ground roll on gravel, same strip, 95 % of take-off mass (operator requirement)',
        distance: '450 m',
        altitude: '2200 m',
        temperatureOffset: '25 K',
        massFraction: 0.95,
        brakingFriction: 0.3,
        freeRollTime: '1 s',
      },
      {
        id: 'oei-climb',
        kind: 'climb-gradient',
        label: 'One engine out: 2 % at 400 ft above the strip, take-off flaps, windmilling drag (14 CFR 23.2120(b)(3))',
        gradient: '2 %',
        altitude: '2320 m',
        temperatureOffset: '25 K',
        enginesInoperative: 1,
        configuration: 'engine-out',
      },
      {
        id: 'climb-rate',
        kind: 'climb-rate',
        label: '1,500 ft/min at sea level, both engines (operator target)',
        rate: '1500 ft/min',
      },
      {
        id: 'cruise',
        kind: 'cruise',
        label: '230 kt TAS at 12,000 ft on 85 % power, mid-fuel (operator target)',
        speed: '230 kt',
        altitude: '12000 ft',
        massFraction: 0.92,
        powerSetting: 0.85,
      },
      {
        id: 'ceiling',
        kind: 'ceiling',
        label: 'Service ceiling 25,000 ft at 100 ft/min (textbook definition)',
        altitude: '25000 ft',
        massFraction: 0.95,
      },
    ],
    designPoint: { wingLoading: '1850 N/m^2', powerToWeight: '23 W/N' },
  },
};
