/**
 * The Mission panel's fields: what each part of the `mission` block holds,
 * and the units each is shown in, in SI, US customary and the knots-and-feet
 * working mix (see values.ts: lengths in nmi and ft, speeds in kt there).
 */
import { DEFAULT_MISSION_PROPELLER_EFFICIENCY } from '../../../../core/concept/resolve-mission';
import type { FieldSpec } from './fields';
import type { EnergyChoice, ReserveBasis, SegmentKind } from './mission';

const mass = (): FieldSpec['value'] => ({ type: 'quantity', dimension: 'mass', units: { si: 'kg', us: 'lb' } });
const distance = (): FieldSpec['value'] => ({ type: 'quantity', dimension: 'length', units: { si: 'km', us: 'nmi' } });
const time = (): FieldSpec['value'] => ({ type: 'quantity', dimension: 'time', units: { si: 'min', us: 'min' } });
/** A true airspeed; a Mach number ("M0.72") is read at the segment's altitude. */
const speed = (): FieldSpec['value'] => ({ type: 'quantity', dimension: 'speed', units: { si: 'm/s', us: 'kt' }, mach: true });
const altitude = (): FieldSpec['value'] => ({ type: 'quantity', dimension: 'length', units: { si: 'm', us: 'ft' } });
const number = (): FieldSpec['value'] => ({ type: 'number' });

export const LOAD_FIELDS: FieldSpec[] = [
  { key: 'payload', title: 'Payload', value: mass(), required: true },
  { key: 'crew', title: 'Crew', value: mass(), defaultText: 'none' },
];

export const EMPTY_MASS_FIELDS: FieldSpec[] = [
  { key: 'emptyMassFraction', title: 'Empty-mass fraction', value: number(), defaultText: 'from the class' },
  { key: 'technologyFactor', title: 'Technology factor', value: number(), defaultText: '1' },
];

export function energyFieldSpecs(choice: EnergyChoice): FieldSpec[] {
  switch (choice) {
    case 'fuel-tsfc':
      return [
        {
          key: 'tsfc',
          title: 'Thrust specific fuel consumption',
          value: { type: 'quantity', dimension: 'thrustSpecificFuelConsumption', units: { si: '1/h', us: 'lb/(lbf h)' } },
          required: true,
        },
      ];
    case 'fuel-bsfc':
      return [
        {
          key: 'bsfc',
          title: 'Brake specific fuel consumption',
          value: { type: 'quantity', dimension: 'brakeSpecificFuelConsumption', units: { si: 'kg/kWh', us: 'lb/(hp h)' } },
          required: true,
        },
        { key: 'propellerEfficiency', title: 'Propeller efficiency', value: number(), defaultText: String(DEFAULT_MISSION_PROPELLER_EFFICIENCY) },
      ];
    case 'battery':
      return [
        {
          key: 'specificEnergy',
          title: 'Pack specific energy',
          value: { type: 'quantity', dimension: 'specificEnergy', units: { si: 'Wh/kg', us: 'Wh/kg' } },
          required: true,
        },
        { key: 'usableFraction', title: 'Usable fraction', value: number(), required: true },
        { key: 'driveEfficiency', title: 'Drive efficiency', value: number(), required: true },
      ];
  }
}

const SPEED: FieldSpec = { key: 'speed', title: 'Speed (TAS)', value: speed(), required: true };
const ALTITUDE: FieldSpec = { key: 'altitude', title: 'Altitude', value: altitude(), required: true };

/**
 * A segment's fields. A cruise, loiter or reserve flown at a requirement's
 * condition has no speed or altitude of its own; a reserve has the fields of its basis.
 */
export function segmentFieldSpecs(kind: SegmentKind, options: { atRequirement?: boolean; basis?: ReserveBasis } = {}): FieldSpec[] {
  const flown = options.atRequirement ? [] : [SPEED, ALTITUDE];
  switch (kind) {
    case 'takeoff-climb':
    case 'climb':
    case 'descent-landing':
      return [{ key: 'fraction', title: 'Mass fraction (end/start)', value: number(), defaultText: 'published' }];
    case 'cruise':
      return [{ key: 'range', title: 'Range', value: distance(), required: true }, ...flown];
    case 'loiter':
      return [{ key: 'endurance', title: 'Endurance', value: time(), required: true }, ...flown];
    case 'reserve':
      if (options.basis === 'fraction') return [{ key: 'fraction', title: 'Share of the mission’s fuel or energy', value: number(), required: true }];
      return [
        options.basis === 'range'
          ? { key: 'range', title: 'Distance', value: distance(), required: true }
          : { key: 'endurance', title: 'Endurance', value: time(), required: true },
        ...flown,
      ];
  }
}
