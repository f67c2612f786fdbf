/**
 * The editor's view of the concept file: which fields each requirement kind
 * and each assumption has, how they are shown in SI and US customary units,
 * and the typical range printed beside each assumption (METHODS.md section 9).
 */
import type { Dimension, RequirementKind } from '../../../../core';

export type FieldValue =
  /** Written with a unit in the file; shown in the unit of the chosen system. */
  | { type: 'quantity'; dimension: Dimension; units: { si: string; us: string } }
  | { type: 'number'; integer?: boolean }
  /** A fraction shown as a percentage (the file takes 0.024 or "2.4 %"). */
  | { type: 'percent' }
  | { type: 'configuration' };

export interface FieldSpec {
  key: string;
  title: string;
  value: FieldValue;
  required?: boolean;
  /** What the engine uses when the field is left empty, as words. */
  defaultText?: string;
  /** Shown under "More" unless set. */
  advanced?: boolean;
  /** Only for propeller aircraft (power-to-weight diagrams). */
  propellerOnly?: boolean;
  /** Typical range [low, high] in SI for assumptions, with a note. */
  typical?: { low: number; high: number; note: string };
}

const speed = (): FieldValue => ({ type: 'quantity', dimension: 'speed', units: { si: 'm/s', us: 'kt' } });
const rate = (): FieldValue => ({ type: 'quantity', dimension: 'speed', units: { si: 'm/s', us: 'ft/min' } });
const length = (): FieldValue => ({ type: 'quantity', dimension: 'length', units: { si: 'm', us: 'ft' } });
const number = (integer = false): FieldValue => ({ type: 'number', integer });

/** Fields every requirement kind shares, after its own. */
const ALTITUDE: FieldSpec = { key: 'altitude', title: 'Pressure altitude', value: length(), defaultText: 'sea level' };
const TEMPERATURE: FieldSpec = {
  key: 'temperatureOffset',
  title: 'Temperature offset from ISA',
  value: { type: 'quantity', dimension: 'temperatureDifference', units: { si: 'K', us: 'degF' } },
  defaultText: 'ISA',
};
const MASS_FRACTION: FieldSpec = { key: 'massFraction', title: 'Mass fraction of take-off mass', value: number(), defaultText: '1', advanced: true };
const POWER_SETTING: FieldSpec = { key: 'powerSetting', title: 'Power or thrust setting', value: number(), defaultText: '1', advanced: true };
const PROPELLER: FieldSpec = {
  key: 'propellerEfficiency',
  title: 'Propeller efficiency',
  value: number(),
  defaultText: 'by kind',
  advanced: true,
  propellerOnly: true,
};
const CONFIGURATION: FieldSpec = { key: 'configuration', title: 'Configuration', value: { type: 'configuration' }, defaultText: 'by kind', advanced: true };

const OWN_FIELDS: Record<RequirementKind, FieldSpec[]> = {
  stall: [{ key: 'speed', title: 'Stall speed (CAS)', value: speed(), required: true }],
  'landing-ground-roll': [
    { key: 'distance', title: 'Ground roll', value: length(), required: true },
    { key: 'brakingFriction', title: 'Braking friction', value: number(), defaultText: '0.3', advanced: true },
    { key: 'touchdownSpeedFactor', title: 'Touchdown speed / stall speed', value: number(), defaultText: '1.15', advanced: true },
    {
      key: 'freeRollTime',
      title: 'Free-roll time',
      value: { type: 'quantity', dimension: 'time', units: { si: 's', us: 's' } },
      defaultText: '0 s',
      advanced: true,
    },
  ],
  'takeoff-ground-roll': [
    { key: 'distance', title: 'Ground roll', value: length(), required: true },
    { key: 'rollingFriction', title: 'Rolling friction', value: number(), defaultText: '0.04', advanced: true },
    { key: 'clGroundRun', title: 'Lift coefficient in the ground run', value: number(), defaultText: '0.5', advanced: true },
    { key: 'liftoffSpeedFactor', title: 'Lift-off speed / stall speed', value: number(), defaultText: '1.1', advanced: true },
  ],
  cruise: [{ key: 'speed', title: 'Cruise speed (TAS)', value: speed(), required: true }],
  'climb-rate': [
    { key: 'rate', title: 'Rate of climb', value: rate(), required: true },
    { key: 'speed', title: 'Climb speed (TAS)', value: speed(), defaultText: 'best-rate speed', advanced: true },
    { key: 'minimumSpeedFactor', title: 'Least speed / stall speed', value: number(), defaultText: '1.2', advanced: true },
  ],
  'climb-gradient': [
    { key: 'gradient', title: 'Climb gradient', value: { type: 'percent' }, required: true },
    { key: 'enginesInoperative', title: 'Engines inoperative', value: number(true), defaultText: '0' },
    { key: 'speedFactor', title: 'Climb speed / stall speed', value: number(), defaultText: '1.2', advanced: true },
  ],
  ceiling: [
    { key: 'altitude', title: 'Ceiling (pressure altitude)', value: length(), required: true },
    { key: 'rate', title: 'Rate of climb there', value: rate(), defaultText: '100 ft/min', advanced: true },
    { key: 'minimumSpeedFactor', title: 'Least speed / stall speed', value: number(), defaultText: '1.2', advanced: true },
  ],
  'sustained-turn': [
    { key: 'speed', title: 'Turn speed (TAS)', value: speed(), required: true },
    { key: 'loadFactor', title: 'Load factor', value: number(), defaultText: 'from bank angle' },
    {
      key: 'bankAngle',
      title: 'Bank angle',
      value: { type: 'quantity', dimension: 'angle', units: { si: 'deg', us: 'deg' } },
      defaultText: 'from load factor',
      advanced: true,
    },
  ],
};

/** The fields the editor shows for a kind: its own first, then the shared ones that matter to it. */
export function requirementFieldSpecs(kind: RequirementKind): FieldSpec[] {
  const own = OWN_FIELDS[kind];
  const atmosphere = kind === 'ceiling' ? [TEMPERATURE] : kind === 'stall' ? [] : [ALTITUDE, TEMPERATURE];
  const powered = kind === 'stall' || kind === 'landing-ground-roll' ? [] : [POWER_SETTING, PROPELLER];
  return [...own, ...atmosphere, MASS_FRACTION, ...powered, CONFIGURATION];
}

/** The field a new requirement of each kind starts with, in the file's own words. */
export const NEW_REQUIREMENT: Record<RequirementKind, Record<string, string | number>> = {
  stall: { speed: '50 kt' },
  'landing-ground-roll': { distance: '400 m' },
  'takeoff-ground-roll': { distance: '400 m' },
  cruise: { speed: '150 kt', altitude: '8000 ft' },
  'climb-rate': { rate: '800 ft/min' },
  'climb-gradient': { gradient: '2.4 %' },
  ceiling: { altitude: '18000 ft' },
  'sustained-turn': { speed: '120 kt', loadFactor: 2 },
};

/** Aerodynamic assumptions of one configuration, at `aircraft.aero.configurations.NAME`. */
export function configurationFieldSpecs(name: string): FieldSpec[] {
  const clean = name === 'clean';
  const clMaxRange =
    name === 'clean'
      ? { low: 0.8, high: 1.6, note: '0.8 thin wing; 1.2–1.5 typical' }
      : name === 'takeoff'
        ? { low: 1.4, high: 2.2, note: 'take-off flaps 1.4–2.2' }
        : name === 'landing'
          ? { low: 1.6, high: 2.8, note: 'landing flaps 1.6–2.8' }
          : undefined;
  const oswaldRange = clean
    ? { low: 0.7, high: 0.95, note: '≈ 0.8 typical' }
    : name === 'landing'
      ? { low: 0.65, high: 0.8, note: 'landing flaps 0.70–0.75' }
      : { low: 0.7, high: 0.85, note: 'take-off flaps 0.75–0.80' };
  const first: FieldSpec = clean
    ? { key: 'cd0', title: 'Zero-lift drag CD0', value: number(), required: true, typical: { low: 0.006, high: 0.05, note: 'light aircraft 0.025–0.035; jets 0.015–0.025' } }
    : {
        key: 'cd0Increment',
        title: 'CD0 increment',
        value: number(),
        defaultText: '0',
        typical:
          name === 'landing'
            ? { low: 0.04, high: 0.1, note: 'landing flaps 0.055–0.075, plus gear' }
            : { low: 0, high: 0.045, note: 'take-off flaps 0.010–0.020, plus gear' },
      };
  return [
    first,
    { key: 'oswaldEfficiency', title: 'Oswald efficiency e', value: number(), required: clean, defaultText: "clean's", typical: oswaldRange },
    { key: 'clMax', title: 'Maximum lift coefficient', value: number(), required: clean, defaultText: "clean's", typical: clMaxRange },
  ];
}

export const AIRCRAFT_FIELDS: FieldSpec[] = [
  { key: 'takeoffMass', title: 'Take-off mass', value: { type: 'quantity', dimension: 'mass', units: { si: 'kg', us: 'lb' } }, required: true },
];

export const AERO_FIELDS: FieldSpec[] = [
  {
    key: 'aspectRatio',
    title: 'Aspect ratio',
    value: number(),
    required: true,
    typical: { low: 4, high: 12, note: 'light aircraft 6–8; transports ≈ 10; sailplanes 20+' },
  },
  { key: 'cdLinear', title: 'Linear drag term K1', value: number(), defaultText: '0', advanced: true },
];

export const PROPULSION_FIELDS: FieldSpec[] = [
  { key: 'engines', title: 'Engines', value: number(true), defaultText: '1' },
  {
    key: 'lapseExponent',
    title: 'Lapse exponent m (σ^m)',
    value: number(),
    defaultText: 'turboprop 0.75, turbofan 1.0',
    typical: { low: 0.6, high: 1, note: '0.6–1' },
  },
  { key: 'criticalAltitude', title: 'Critical altitude', value: length(), defaultText: 'needed for turbocharged piston' },
];

/** Typical propeller efficiency by requirement kind (METHODS.md section 9). */
export const PROPELLER_TYPICAL = { low: 0.5, high: 0.9, note: 'cruise ≈ 0.8; climb 0.7–0.8; take-off run 0.5–0.6' };
