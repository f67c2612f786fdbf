/**
 * Demo: a small twin-turbofan business jet. An invented scenario; the
 * numbers sit in the methods reference's (core/methods.md) typical ranges and follow the rules named on
 * each requirement.
 */
import { DEMO_CAUTION, type DemoConcept } from './demo';

export const businessJet: DemoConcept = {
  slug: 'business-jet',
  title: 'LP-60 light business jet',
  summary:
    'A 7,400 kg twin-turbofan jet for six passengers: the 2.4 % second-segment climb with one engine out, ' +
    'a 1,800 m balanced field on a hot day, a 1,400 m factored landing field, a M0.72 cruise at FL370 and a FL430 ceiling, with the Mach-dependent turbofan thrust lapse.' +
    ` ${DEMO_CAUTION}`,
  concept: {
    format: 'loftpoint-concept/1',
    name: 'LP-60 light business jet',
    aircraft: {
      class: 'business-jet',
      // A starting guess: the mission below closes the take-off mass.
      takeoffMass: '7400 kg',
      aero: {
        aspectRatio: 8.6,
        cdLinear: 0,
        // Supercritical sections, 12 % thick, 15 degrees of sweep: wave drag by Korn and Lock.
        thicknessRatio: 0.12,
        quarterChordSweep: '15 deg',
        kornFactor: 0.95,
        configurations: {
          clean: { cd0: 0.021, oswaldEfficiency: 0.8, clMax: 1.45 },
          takeoff: { cd0Increment: 0.035, oswaldEfficiency: 0.76, clMax: 1.85 },
          'second-segment': { cd0Increment: 0.015, oswaldEfficiency: 0.76, clMax: 1.85 },
          landing: { cd0Increment: 0.07, oswaldEfficiency: 0.7, clMax: 2.25 },
        },
      },
      propulsion: { kind: 'turbofan', engines: 2, lapseModel: 'high-bypass', throttleRatio: 1 },
    },
    requirements: [
      {
        id: 'approach-stall',
        kind: 'stall',
        label: 'VS0 at most 90 kt CAS at landing mass, keeping VREF (1.23 VSR0, 14 CFR 25.125) near 111 kt (programme target)',
        speed: '90 kt',
        massFraction: 0.85,
      },
      {
        id: 'takeoff-field',
        kind: 'balanced-field-length',
        label: 'Balanced field length 1,800 m over 35 ft at sea level on an ISA+20 K day (programme target; screen height of 14 CFR 25.113)',
        distance: '1800 m',
        temperatureOffset: '20 K',
      },
      {
        id: 'second-segment',
        kind: 'climb-gradient',
        label: '2nd segment, one engine out: 2.4 % at V2 (1.2 VS here), gear up, take-off flaps (14 CFR 25.121(b))',
        gradient: '2.4 %',
        temperatureOffset: '20 K',
        enginesInoperative: 1,
        configuration: 'second-segment',
      },
      {
        id: 'landing-field',
        kind: 'landing-distance',
        label: 'Factored landing field length 1,400 m at landing mass, dry runway: landing distance over 50 ft at most 60 % of it (programme target)',
        distance: '1400 m',
        fieldLengthFactor: 0.6,
        massFraction: 0.85,
        brakingFriction: 0.4,
        liftDumping: true,
      },
      {
        id: 'approach',
        kind: 'approach-speed',
        label: 'VREF at most 115 kt CAS at landing mass, flown at 1.23 VSR0 (14 CFR 25.125)',
        speed: '115 kt',
        approachSpeedFactor: 1.23,
        massFraction: 0.85,
      },
      {
        id: 'cruise',
        kind: 'cruise',
        label: 'High-speed cruise at FL370, maximum cruise thrust, mid-fuel (programme target)',
        speed: 'M0.72',
        altitude: 'FL370',
        massFraction: 0.88,
        powerSetting: 0.9,
      },
      {
        id: 'ceiling',
        kind: 'ceiling',
        label: 'Cruise ceiling at 300 ft/min (common practice for jets)',
        altitude: 'FL430',
        rate: '300 ft/min',
        massFraction: 0.9,
      },
    ],
    designPoint: { wingLoading: '3400 N/m^2', thrustToWeight: 0.5 },
    // An invented 2,000 nmi leg with six passengers and bags at the M0.72 FL370 cruise, a 200 nmi diversion and
    // 30 minutes' hold in reserve. Cruise TSFC of a small turbofan, about 0.75 1/h (common practice).
    mission: {
      payload: '600 kg',
      crew: '180 kg',
      segments: [
        { kind: 'takeoff-climb' },
        { kind: 'cruise', range: '3750 km', requirement: 'cruise' },
        { kind: 'descent-landing' },
        { kind: 'reserve', range: '370 km', speed: '300 kt', altitude: 'FL200' },
        { kind: 'reserve', endurance: '30 min', speed: '200 kt', altitude: '5000 ft' },
      ],
      energy: { kind: 'fuel', tsfc: '0.75 1/h' },
    },
  },
};
