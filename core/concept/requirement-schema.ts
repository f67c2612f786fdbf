/**
 * Requirements: one strict object per kind, told apart by `kind`
 * (DESIGN.md, "The concept file"). The kinds' own fields come from their
 * descriptors (core/requirements); the common ones are here.
 */
import * as z from 'zod';
import { REQUIREMENT_DESCRIPTORS, requirementKind, type RequirementKind } from '../requirements';
import { altitude, percentFraction } from '../requirements/fields';
import { quantityField } from './quantity-field';

const commonRequirementShape = {
  id: z.string().min(1),
  label: z.string().optional(),
  /** Where the requirement comes from (a rule, a specification paragraph) and any note on it; shown, not computed. */
  source: z.string().optional(),
  note: z.string().optional(),
  enabled: z.boolean().optional(),
  altitude: altitude.optional(),
  temperatureOffset: quantityField('temperatureDifference', { from: -60, to: 60 }).optional(),
  massFraction: percentFraction.optional(),
  powerSetting: percentFraction.optional(),
  propellerEfficiency: percentFraction.optional(),
  configuration: z.string().min(1).optional(),
};

type Descriptor = (typeof REQUIREMENT_DESCRIPTORS)[number];

/** The strict object of one kind: the common fields, its literal kind, then its own fields. */
type KindSchema<D> = D extends { kind: infer Kind extends string; shape: infer Shape extends z.ZodRawShape }
  ? z.ZodObject<Omit<typeof commonRequirementShape, keyof Shape> & { kind: z.ZodLiteral<Kind> } & Shape, z.core.$strict>
  : never;

const kindSchemas = REQUIREMENT_DESCRIPTORS.map((d) =>
  z.strictObject({ ...commonRequirementShape, kind: z.literal(d.kind), ...d.shape }),
) as unknown as [KindSchema<Descriptor>, ...KindSchema<Descriptor>[]];

export const requirementSchema = z.discriminatedUnion('kind', kindSchemas);

/** Every field a requirement of this kind may have. */
export function requirementFields(kind: RequirementKind): string[] {
  return ['kind', ...Object.keys(commonRequirementShape), ...Object.keys(requirementKind(kind).shape)];
}
