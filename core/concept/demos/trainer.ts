/**
 * Demo: a two-seat piston trainer for a flying club that operates from a
 * grass field. An invented scenario; the numbers sit in the methods reference's (core/methods.md)
 * typical ranges and follow the rules named on each requirement.
 */
import { DEMO_CAUTION, type DemoConcept } from './demo';

export const trainer: DemoConcept = {
  slug: 'trainer',
  title: 'LP-2 two-seat trainer',
  summary:
    'A 750 kg two-seat piston trainer for a club on a grass field: stall at 45 kt in landing flaps, a short grass take-off roll and a 420 m landing over 50 ft ' +
    'on a warm day, a 110 kt cruise, a 700 ft/min climb and a 13,000 ft ceiling.' +
    ` ${DEMO_CAUTION}`,
  concept: {
    format: 'loftpoint-concept/1',
    name: 'LP-2 two-seat trainer',
    aircraft: {
      class: 'light-aircraft',
      // A starting guess: the mission below closes the take-off mass.
      takeoffMass: '750 kg',
      aero: {
        aspectRatio: 7.4,
        cdLinear: 0,
        configurations: {
          clean: { cd0: 0.029, oswaldEfficiency: 0.79, clMax: 1.45 },
          takeoff: { cd0Increment: 0.014, oswaldEfficiency: 0.76, clMax: 1.75 },
          landing: { cd0Increment: 0.06, oswaldEfficiency: 0.72, clMax: 2.05 },
        },
      },
      propulsion: { kind: 'piston', engines: 1 },
    },
    requirements: [
      {
        id: 'stall',
        kind: 'stall',
        label: 'VS0 at most 45 kt CAS in landing flaps (CS-VLA 49)',
        speed: '45 kt',
        configuration: 'landing',
      },
      {
        id: 'takeoff-grass',
        kind: 'takeoff-ground-roll',
        label: '250 m take-off ground roll on short grass, field at 800 ft elevation on an ISA+15 K summer day (club requirement)',
        distance: '250 m',
        altitude: '800 ft',
        temperatureOffset: '15 K',
        rollingFriction: 0.05,
        runwaySurface: 'grass',
      },
      {
        id: 'landing-grass',
        kind: 'landing-distance',
        label: '420 m landing distance over 50 ft onto short grass on a 5° approach, same field and day (club requirement)',
        distance: '420 m',
        obstacleHeight: '50 ft',
        altitude: '800 ft',
        temperatureOffset: '15 K',
        approachAngle: '5 deg',
        brakingFriction: 0.25,
        freeRollTime: '1 s',
      },
      {
        id: 'climb-83',
        kind: 'climb-gradient',
        label: 'AEO climb gradient 8.3 % at sea level, take-off flaps (14 CFR 23.65(a))',
        gradient: '8.3 %',
      },
      {
        id: 'climb-rate',
        kind: 'climb-rate',
        label: '700 ft/min at sea level, full power (club target for circuit training)',
        rate: '700 ft/min',
      },
      {
        id: 'cruise',
        kind: 'cruise',
        label: '110 kt TAS at 6000 ft on 75 % power, mid-fuel (cross-country target)',
        speed: '110 kt',
        altitude: '6000 ft',
        massFraction: 0.95,
        powerSetting: 0.75,
        propellerEfficiency: 0.8,
      },
      {
        id: 'ceiling',
        kind: 'ceiling',
        label: 'Service ceiling 13,000 ft pressure altitude at 100 ft/min (textbook definition)',
        altitude: '13000 ft',
      },
    ],
    diagram: { wingLoading: ['200 N/m^2', '1200 N/m^2'], samples: 201 },
    designPoint: { wingLoading: '650 N/m^2', powerToWeight: '11 W/N' },
    // An invented club cross-country: two people and bags, 420 km at the cruise requirement's 110 kt and 6000 ft,
    // half an hour of circuits, 45 minutes in reserve. BSFC of a light piston engine, about 0.28 kg/kWh (common practice).
    mission: {
      payload: '40 kg',
      crew: '170 kg',
      segments: [
        { kind: 'takeoff-climb' },
        { kind: 'cruise', range: '420 km', speed: '110 kt', altitude: '6000 ft' },
        { kind: 'loiter', endurance: '30 min', speed: '90 kt', altitude: '3000 ft' },
        { kind: 'descent-landing' },
        { kind: 'reserve', endurance: '45 min', speed: '90 kt', altitude: '3000 ft' },
      ],
      energy: { kind: 'fuel', bsfc: '0.28 kg/kWh', propellerEfficiency: 0.8 },
    },
  },
};
