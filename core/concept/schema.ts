/**
 * The concept file, format `loftpoint-concept/1`, as a zod schema. Every
 * object is strict (an unknown field is an error). The schema checks each
 * field on its own; rules that join fields live in checks.ts, defaults in
 * defaults.ts, and nothing here changes a value.
 */
import * as z from 'zod';
import { aircraftSchema } from './aircraft-schema';
import { missionSchema } from './mission-schema';
import { CONCEPT_FORMAT } from './format';
import { quantityField, ratioField } from './quantity-field';
import { requirementSchema } from './requirement-schema';
import { uncertaintySchema } from '../studies/uncertainty-schema';

const wingLoading = quantityField('wingLoading', { above: 0 });

export const diagramShape = {
  wingLoading: z.tuple([wingLoading, wingLoading]).optional(),
  samples: z.number().int().gte(2).lte(40000).optional(),
};

export const designPointShape = {
  wingLoading,
  powerToWeight: quantityField('powerToWeight', { above: 0 }).optional(),
  thrustToWeight: ratioField('thrustToWeight', { above: 0 }).optional(),
};

export const conceptShape = {
  format: z.literal(CONCEPT_FORMAT),
  name: z.string().optional(),
  aircraft: aircraftSchema,
  requirements: z.array(requirementSchema).min(1),
  diagram: z.strictObject(diagramShape).optional(),
  designPoint: z.strictObject(designPointShape).optional(),
  /** The mission the take-off mass is closed from (mission-schema.ts). */
  mission: missionSchema.optional(),
  /** Ranges on assumptions for trade studies (core/studies/uncertainty-schema.ts). */
  uncertainty: uncertaintySchema.optional(),
};

export const conceptSchema = z.strictObject(conceptShape);

/** A concept file as written: dimensional values are strings with units. */
export type ConceptJson = z.input<typeof conceptSchema>;
export type RequirementJson = ConceptJson['requirements'][number];
