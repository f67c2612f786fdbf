/**
 * Requirements: one strict object per kind, told apart by `kind`
 * (DESIGN.md, "The concept file"; symbols in METHODS.md section 12).
 */
import { z } from 'zod';
import type { RequirementKind } from '../model';
import { quantityField, quantityProblem } from './quantity-field';

const fraction = z.number().gt(0).lte(1);
const speedFactor = z.number().gte(1);
const positiveSpeed = quantityField('speed', { above: 0 });
/** Pressure altitudes the standard atmosphere covers for sizing. */
const altitude = quantityField('length', { from: -1000, to: 30000 });

/** sin(gamma) as 0.024 or "2.4 %"; 2.4 bare is caught as 240 %. */
function gradientProblem(input: unknown): string | undefined {
  if (typeof input === 'number' && input >= 1) {
    return `is ${input}, which would mean ${input * 100} %; write ${input / 100} or "${input} %"`;
  }
  return quantityProblem(input, 'fraction', { from: 0, below: 1 });
}
const gradient = z.custom<number | string>((input) => gradientProblem(input) === undefined, {
  error: (issue) => gradientProblem(issue.input) ?? 'is not valid',
});

export const commonRequirementShape = {
  id: z.string().min(1),
  label: z.string().optional(),
  /** Where the requirement comes from (a rule, a specification paragraph) and any note on it; shown, not computed. */
  source: z.string().optional(),
  note: z.string().optional(),
  enabled: z.boolean().optional(),
  altitude: altitude.optional(),
  temperatureOffset: quantityField('temperatureDifference', { from: -60, to: 60 }).optional(),
  massFraction: fraction.optional(),
  powerSetting: fraction.optional(),
  propellerEfficiency: fraction.optional(),
  configuration: z.string().min(1).optional(),
};

/** Fields particular to each kind, beside the common ones. */
export const requirementKindShapes = {
  stall: { speed: positiveSpeed },
  'landing-ground-roll': {
    distance: quantityField('length', { above: 0 }),
    brakingFriction: z.number().gt(0).lte(1).optional(),
    touchdownSpeedFactor: speedFactor.optional(),
    freeRollTime: quantityField('time', { from: 0 }).optional(),
  },
  'takeoff-ground-roll': {
    distance: quantityField('length', { above: 0 }),
    rollingFriction: z.number().gte(0).lt(1).optional(),
    clGroundRun: z.number().gte(0).optional(),
    liftoffSpeedFactor: speedFactor.optional(),
  },
  cruise: { speed: positiveSpeed },
  'climb-rate': {
    rate: positiveSpeed,
    speed: positiveSpeed.optional(),
    minimumSpeedFactor: speedFactor.optional(),
  },
  'climb-gradient': {
    gradient,
    enginesInoperative: z.number().int().gte(0).optional(),
    speedFactor: speedFactor.optional(),
  },
  ceiling: {
    altitude,
    rate: quantityField('speed', { from: 0 }).optional(),
    minimumSpeedFactor: speedFactor.optional(),
  },
  'sustained-turn': {
    speed: positiveSpeed,
    loadFactor: z.number().gte(1).optional(),
    bankAngle: quantityField('angle', { from: 0, below: Math.PI / 2 }).optional(),
  },
} satisfies Record<RequirementKind, z.ZodRawShape>;

const common = commonRequirementShape;
const shapes = requirementKindShapes;

export const requirementSchema = z.discriminatedUnion('kind', [
  z.strictObject({ ...common, kind: z.literal('stall'), ...shapes.stall }),
  z.strictObject({ ...common, kind: z.literal('landing-ground-roll'), ...shapes['landing-ground-roll'] }),
  z.strictObject({ ...common, kind: z.literal('takeoff-ground-roll'), ...shapes['takeoff-ground-roll'] }),
  z.strictObject({ ...common, kind: z.literal('cruise'), ...shapes.cruise }),
  z.strictObject({ ...common, kind: z.literal('climb-rate'), ...shapes['climb-rate'] }),
  z.strictObject({ ...common, kind: z.literal('climb-gradient'), ...shapes['climb-gradient'] }),
  z.strictObject({ ...common, kind: z.literal('ceiling'), ...shapes.ceiling }),
  z.strictObject({ ...common, kind: z.literal('sustained-turn'), ...shapes['sustained-turn'] }),
]);

/** Every field a requirement of this kind may have. */
export function requirementFields(kind: RequirementKind): string[] {
  return ['kind', ...Object.keys(commonRequirementShape), ...Object.keys(requirementKindShapes[kind])];
}
