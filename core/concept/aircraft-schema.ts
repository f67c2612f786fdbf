/**
 * The `aircraft` block of a concept: take-off mass, drag polar by
 * configuration, and propulsion (DESIGN.md, "The concept file").
 */
import * as z from 'zod';
import { PROPULSION_KINDS, type PropulsionKind } from '../model';
import { AIRCRAFT_CLASSES } from '../assumptions/study-case';
import { LAPSE_MODELS } from '../propulsion/turbine-lapse';
import { quantityField } from './quantity-field';

/** e is a span efficiency: above 0, at most 1 (Oswald). */
const oswaldEfficiency = z.number().gt(0).lte(1);
const clMax = z.number().gt(0);

export const cleanConfigurationShape = {
  cd0: z.number().gt(0),
  oswaldEfficiency,
  clMax,
};

/** Any configuration but clean: an increment on clean's cd0, and optional overrides. */
export const configurationShape = {
  cd0Increment: z.number().gte(0).optional(),
  oswaldEfficiency: oswaldEfficiency.optional(),
  clMax: clMax.optional(),
};

const cleanConfiguration = z.strictObject(cleanConfigurationShape);
const configuration = z.strictObject(configurationShape);

/** `clean` plus any other named configurations, as a file writes them. */
type ConfigurationsJson = { clean: z.input<typeof cleanConfiguration> } & {
  [name: string]: z.input<typeof cleanConfiguration> | z.input<typeof configuration>;
};

// Zod's own type for a catch-all beside a fixed key cannot be written in
// TypeScript (clean would have to fit the catch-all), so it is stated here.
const configurations = z
  .object({ clean: cleanConfiguration })
  .catchall(configuration) as unknown as z.ZodType<ConfigurationsJson, ConfigurationsJson>;

export const aeroShape = {
  aspectRatio: z.number().gt(0),
  cdLinear: z.number().optional(),
  /** Wing section t/c, for compressibility drag (with quarterChordSweep and kornFactor). */
  thicknessRatio: z.number().gt(0).lt(0.3).optional(),
  quarterChordSweep: quantityField('angle', { from: 0, below: Math.PI / 3 }).optional(),
  /** Korn's technology factor: about 0.87 conventional, 0.95 supercritical sections. */
  kornFactor: z.number().gte(0.7).lte(1).optional(),
  configurations,
};

export const propulsionShape = {
  kind: z.enum(PROPULSION_KINDS as [PropulsionKind, ...PropulsionKind[]]),
  engines: z.number().int().gte(1).optional(),
  lapseExponent: z.number().gt(0).optional(),
  /** Mach-aware turbine lapse model, or "density" for sigma^m (the kind's descriptor lists what it takes). */
  lapseModel: z.enum(LAPSE_MODELS).optional(),
  /** Throttle ratio TR of a Mach-aware turbine lapse: theta0 at the break, 1 to about 1.1. */
  throttleRatio: z.number().gte(0.8).lte(1.5).optional(),
  criticalAltitude: quantityField('length', { from: 0 }).optional(),
};

export const aircraftShape = {
  /** Required without a mission; with one, a starting guess the closed mass replaces (checks.ts). */
  takeoffMass: quantityField('mass', { above: 0 }).optional(),
  aero: z.strictObject(aeroShape),
  propulsion: z.strictObject(propulsionShape),
  /** Optional: which kind of aircraft, so the studies start from that kind's typical ranges. */
  class: z.enum(AIRCRAFT_CLASSES).optional(),
};

export const aircraftSchema = z.strictObject(aircraftShape);
