/**
 * The optional `mission` block of a concept (`loftpoint-concept/1`, an
 * addition): payload and crew, the segments flown in order, the energy
 * source, and the empty-mass estimate. With a mission the take-off mass is
 * closed from it (core/mission) and `aircraft.takeoffMass` is only a
 * starting guess. Rules that join fields (speed and altitude or a named
 * requirement, one way of giving a reserve, the energy that suits the
 * propulsion) are in checks.ts.
 */
import * as z from 'zod';
import { AIRCRAFT_CLASSES } from '../mission/aircraft-class';
import { altitude, trueAirspeed } from '../requirements/fields';
import { quantityField } from './quantity-field';

/** A mass fraction of a segment, end over start: above 0, at most 1. */
const segmentFraction = z.number().gt(0).lte(1);
/** Efficiencies and usable fractions: above 0, at most 1. */
const efficiency = z.number().gt(0).lte(1);

/** Where a segment flies: its own speed and altitude, or the condition of a named cruise requirement. */
const flightShape = {
  speed: trueAirspeed.optional(),
  altitude: altitude.optional(),
  /** The id of a cruise requirement whose speed and altitude the segment flies at. */
  requirement: z.string().min(1).optional(),
};

export const missionSegmentSchema = z.discriminatedUnion('kind', [
  z.strictObject({ kind: z.literal('takeoff-climb'), fraction: segmentFraction.optional() }),
  z.strictObject({ kind: z.literal('climb'), fraction: segmentFraction.optional() }),
  z.strictObject({ kind: z.literal('cruise'), range: quantityField('length', { above: 0 }), ...flightShape }),
  z.strictObject({ kind: z.literal('loiter'), endurance: quantityField('time', { above: 0 }), ...flightShape }),
  z.strictObject({ kind: z.literal('descent-landing'), fraction: segmentFraction.optional() }),
  z.strictObject({
    kind: z.literal('reserve'),
    endurance: quantityField('time', { above: 0 }).optional(),
    range: quantityField('length', { above: 0 }).optional(),
    /** Reserve as a fraction of the mission's fuel or energy (0.05 = 5 %). */
    fraction: z.number().gt(0).lte(1).optional(),
    ...flightShape,
  }),
]);

export const MISSION_SEGMENT_KINDS = ['takeoff-climb', 'climb', 'cruise', 'loiter', 'descent-landing', 'reserve'] as const;
export type MissionSegmentKind = (typeof MISSION_SEGMENT_KINDS)[number];

export const missionEnergySchema = z.discriminatedUnion('kind', [
  z.strictObject({
    kind: z.literal('fuel'),
    /** Brake specific fuel consumption, for propeller aircraft (with propellerEfficiency). */
    bsfc: quantityField('brakeSpecificFuelConsumption', { above: 0 }).optional(),
    propellerEfficiency: efficiency.optional(),
    /** Thrust specific fuel consumption, for jets. */
    tsfc: quantityField('thrustSpecificFuelConsumption', { above: 0 }).optional(),
  }),
  z.strictObject({
    kind: z.literal('battery'),
    /** Pack specific energy, e.g. "200 Wh/kg". */
    specificEnergy: quantityField('specificEnergy', { above: 0 }),
    /** Share of the pack's energy that may be used, 0-1. */
    usableFraction: efficiency,
    /** Battery to thrust power: motor, controller and propeller together, 0-1. */
    driveEfficiency: efficiency,
  }),
]);

export const missionShape = {
  payload: quantityField('mass', { from: 0 }),
  crew: quantityField('mass', { from: 0 }).optional(),
  segments: z.array(missionSegmentSchema).min(1),
  energy: missionEnergySchema,
  /** Empty mass over take-off mass; overrides the regression. */
  emptyMassFraction: z.number().gt(0).lt(1).optional(),
  /** Picks the empty-mass regression's coefficients (core/mission/aircraft-class.ts). */
  aircraftClass: z.enum(AIRCRAFT_CLASSES).optional(),
  /** Multiplies the regression's empty-mass fraction (composites, new materials: below 1). */
  technologyFactor: z.number().gt(0).lte(2).optional(),
};

export const missionSchema = z.strictObject(missionShape);

export type MissionJson = z.input<typeof missionSchema>;
export type MissionSegmentJson = MissionJson['segments'][number];
