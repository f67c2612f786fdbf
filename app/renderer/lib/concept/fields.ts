/**
 * The editor's view of the concept file: which fields each requirement kind
 * and each assumption has, how they are shown in SI and US customary units,
 * and the typical range marked beside each assumption. The kinds' own fields
 * come from their descriptors (core/requirements), the typical ranges from
 * core's one table (core/assumptions/typical-ranges.ts).
 */
import type { RequirementKind } from '../../../../core';
import { configurationRole } from '../../../../core/assumptions/configuration-role';
import { AIRCRAFT_CLASSES, AIRCRAFT_CLASS_WORDS } from '../../../../core/assumptions/study-case';
import { ASPECT_RATIO, CD0_CLEAN, CD0_INCREMENT, CLMAX, OSWALD } from '../../../../core/assumptions/typical-ranges';
import { PROPULSION_DESCRIPTORS } from '../../../../core/propulsion/kinds';
import { findRequirementKind, REQUIREMENT_DESCRIPTORS, type EditorField, type EditorValue } from '../../../../core/requirements';

export type FieldValue = EditorValue;
export type FieldSpec = EditorField;

const length = (): FieldValue => ({ type: 'quantity', dimension: 'length', units: { si: 'm', us: 'ft' } });
const number = (integer = false): FieldValue => ({ type: 'number', integer });
const mark = (range: { low: number; high: number; note: string }) => ({ low: range.low, high: range.high, note: range.note });

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

const CONFIGURATION: FieldSpec = { key: 'configuration', title: 'Configuration', value: { type: 'configuration' }, defaultText: 'by kind', advanced: true };

/** The fields the editor shows for a kind: its own first, then the shared ones that matter to it. */
export function requirementFieldSpecs(kind: RequirementKind): FieldSpec[] {
  // A kind this version does not know (a newer file) shows only the fields every requirement has.
  const d = findRequirementKind(kind);
  if (!d) return [MASS_FRACTION, CONFIGURATION];
  const atmosphere = [...(d.atmosphere.altitude ? [ALTITUDE] : []), ...(d.atmosphere.temperature ? [TEMPERATURE] : [])];
  const propeller: FieldSpec[] = d.propeller
    ? [
        {
          key: 'propellerEfficiency',
          title: 'Propeller efficiency',
          value: number(),
          defaultText: String(d.propeller.default),
          advanced: true,
          propellerOnly: true,
          typical: mark(d.propeller.typical),
        },
      ]
    : [];
  const powered = d.drawnAs === 'curve' ? [POWER_SETTING, ...propeller] : [];
  return [...d.editorFields, ...atmosphere, MASS_FRACTION, ...powered, CONFIGURATION];
}

/** The field a new requirement of each kind starts with, in the file's own words. */
export const NEW_REQUIREMENT: Readonly<Record<RequirementKind, Record<string, string | number>>> = Object.fromEntries(
  REQUIREMENT_DESCRIPTORS.map((d) => [d.kind, d.newRequirement]),
) as Record<RequirementKind, Record<string, string | number>>;

/** Aerodynamic assumptions of one configuration, at `aircraft.aero.configurations.NAME`. */
export function configurationFieldSpecs(name: string): FieldSpec[] {
  const clean = name === 'clean';
  const role = configurationRole(name);
  const clMaxRange = CLMAX[role];
  const first: FieldSpec = clean
    ? { key: 'cd0', title: 'Zero-lift drag CD0', value: number(), required: true, typical: mark(CD0_CLEAN) }
    : { key: 'cd0Increment', title: 'CD0 increment', value: number(), defaultText: '0', typical: mark(CD0_INCREMENT[role]) };
  return [
    first,
    { key: 'oswaldEfficiency', title: 'Oswald efficiency e', value: number(), required: clean, defaultText: "clean's", typical: mark(OSWALD[role]) },
    { key: 'clMax', title: 'Maximum lift coefficient', value: number(), required: clean, defaultText: "clean's", ...(clMaxRange ? { typical: mark(clMaxRange) } : {}) },
  ];
}

export const AIRCRAFT_FIELDS: FieldSpec[] = [
  { key: 'takeoffMass', title: 'Take-off mass', value: { type: 'quantity', dimension: 'mass', units: { si: 'kg', us: 'lb' } }, required: true },
  {
    key: 'class',
    title: 'Class for typical ranges',
    value: { type: 'choice', choices: AIRCRAFT_CLASSES.map((value) => ({ value, title: AIRCRAFT_CLASS_WORDS[value] })) },
    defaultText: 'not stated',
    help: "Only the studies read it: it picks the typical bands of clean CD0 and aspect ratio. The mission's aircraft class (the empty-mass regression) is set apart, under Mission.",
  },
];

export const AERO_FIELDS: FieldSpec[] = [
  {
    key: 'aspectRatio',
    title: 'Aspect ratio',
    value: number(),
    required: true,
    typical: mark(ASPECT_RATIO),
  },
  { key: 'cdLinear', title: 'Linear drag term K1', value: number(), defaultText: '0', advanced: true },
];

/** The propulsion fields of a kind: engines, and the lapse exponent or critical altitude where the kind uses one. */
export function propulsionFieldSpecs(kind: string): FieldSpec[] {
  const d = PROPULSION_DESCRIPTORS.find((entry) => entry.kind === kind);
  const withExponent = PROPULSION_DESCRIPTORS.filter((entry) => entry.lapseExponent !== null);
  const fields: FieldSpec[] = [{ key: 'engines', title: 'Engines', value: number(true), defaultText: '1' }];
  if (d?.lapseExponent) {
    fields.push({
      key: 'lapseExponent',
      title: 'Lapse exponent m (σ^m)',
      value: number(),
      defaultText: withExponent.map((entry) => `${entry.kind} ${entry.lapseExponent?.default.toFixed(2).replace(/0$/, '')}`).join(', '),
      typical: mark(d.lapseExponent.typical),
    });
  }
  if (d?.needsCriticalAltitude) {
    fields.push({ key: 'criticalAltitude', title: 'Critical altitude', value: length(), defaultText: `needed for ${d.title.toLowerCase()}` });
  }
  return fields;
}
