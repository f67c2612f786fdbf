/**
 * Demo: a battery-electric survey drone. An invented scenario; the numbers
 * sit in the methods reference's (core/methods.md) typical ranges for small unmanned aircraft.
 */
import { DEMO_CAUTION, type DemoConcept } from './demo';

export const surveyDrone: DemoConcept = {
  slug: 'survey-drone',
  title: 'LP-S4 survey drone',
  summary:
    'A 14 kg battery-electric fixed-wing drone for mapping flights: a slow stall for belly landings in a field, a short ' +
    '40 m take-off run from mown grass, a 45-degree turn at the end of each survey line, and an economical 20 m/s cruise.' +
    ` ${DEMO_CAUTION}`,
  concept: {
    format: 'loftpoint-concept/1',
    name: 'LP-S4 survey drone',
    aircraft: {
      class: 'small-uav',
      // A starting guess: the mission below closes the take-off mass.
      takeoffMass: '14 kg',
      aero: {
        aspectRatio: 12,
        cdLinear: 0,
        configurations: {
          clean: { cd0: 0.035, oswaldEfficiency: 0.82, clMax: 1.3 },
          takeoff: { cd0Increment: 0.01, oswaldEfficiency: 0.8, clMax: 1.45 },
          landing: { cd0Increment: 0.03, oswaldEfficiency: 0.76, clMax: 1.6 },
        },
      },
      propulsion: { kind: 'electric', engines: 1 },
    },
    requirements: [
      {
        id: 'stall',
        kind: 'stall',
        label: 'Stall at most 12 m/s with landing flaps, for a belly landing in a field (programme target)',
        speed: '12 m/s',
      },
      {
        id: 'launch',
        kind: 'takeoff-ground-roll',
        label: '40 m take-off run on mown grass from a site at 500 m elevation on an ISA+15 K day (programme target)',
        distance: '40 m',
        altitude: '500 m',
        temperatureOffset: '15 K',
        rollingFriction: 0.08,
        runwaySurface: 'grass',
        propellerEfficiency: 0.5,
      },
      {
        id: 'line-turn',
        kind: 'sustained-turn',
        label: 'Sustained 45-degree banked turn at 16 m/s to reverse between survey lines (programme target)',
        speed: '16 m/s',
        bankAngle: '45 deg',
        altitude: '620 m',
        temperatureOffset: '15 K',
        powerSetting: 0.9,
        propellerEfficiency: 0.7,
      },
      {
        id: 'survey-cruise',
        kind: 'cruise',
        label: '20 m/s at 120 m above the site (620 m altitude) on 50 % power, for long endurance (battery mass stays constant)',
        speed: '20 m/s',
        altitude: '620 m',
        temperatureOffset: '15 K',
        powerSetting: 0.5,
        propellerEfficiency: 0.75,
      },
      {
        id: 'climb',
        kind: 'climb-rate',
        label: '3 m/s climb from the site to survey height (programme target)',
        rate: '3 m/s',
        altitude: '500 m',
        temperatureOffset: '15 K',
        propellerEfficiency: 0.7,
      },
    ],
    diagram: { wingLoading: ['40 N/m^2', '250 N/m^2'], samples: 211 },
    designPoint: { wingLoading: '95 N/m^2', powerToWeight: '5.9 W/N' },
    // An invented mapping flight: a 2 kg camera, 6 km out and back at the survey cruise, 77 minutes of survey
    // lines, 20 % of the pack kept in reserve. The airframe without its battery is half the take-off mass
    // (the programme's own estimate: the regression classes describe fuel-burning aircraft).
    mission: {
      payload: '2 kg',
      segments: [
        { kind: 'takeoff-climb' },
        { kind: 'cruise', range: '6 km', requirement: 'survey-cruise' },
        { kind: 'loiter', endurance: '77 min', requirement: 'survey-cruise' },
        { kind: 'cruise', range: '6 km', requirement: 'survey-cruise' },
        { kind: 'descent-landing' },
        { kind: 'reserve', fraction: 0.2 },
      ],
      energy: { kind: 'battery', specificEnergy: '200 Wh/kg', usableFraction: 0.8, driveEfficiency: 0.6 },
      emptyMassFraction: 0.5,
    },
  },
};
