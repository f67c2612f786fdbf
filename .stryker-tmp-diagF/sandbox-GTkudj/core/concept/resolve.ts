/**
 * A valid concept turned into the SI design model the engine computes with:
 * every default applied, every unit converted, configurations made absolute.
 */
// @ts-nocheck

import type { WarningJson } from '../evaluation';
import { loadingAxis, type Aircraft, type ConfigurationPolar, type Design, type DesignPoint } from '../model';
import { PROPULSION_DESCRIPTORS, propulsionKind } from '../propulsion/kinds';
import { DEFAULT_THROTTLE_RATIO } from '../propulsion/turbine-lapse';
import { quantity } from '../units/quantity';
import { DEFAULT_CD0_INCREMENT, DEFAULT_CD_LINEAR, DEFAULT_CONCEPT_NAME, DEFAULT_ENGINES, DEFAULT_SAMPLES } from './defaults';
import { resolveRequirement } from './resolve-requirement';
import type { ConceptJson } from './schema';

type AircraftJson = ConceptJson['aircraft'];

/** Korn's technology factor for conventional sections (from memory). */
const DEFAULT_KORN_FACTOR = 0.87;

/** Each configuration's cd0 = clean cd0 + increment; e and clMax default to clean's. */
function resolveConfigurations(aero: AircraftJson['aero']): Record<string, ConfigurationPolar> {
  const { clean, ...others } = aero.configurations;
  // Keyed by the names the engineer writes: no prototype, so "toString" or "__proto__" is just a name.
  const result: Record<string, ConfigurationPolar> = Object.create(null);
  result.clean = { ...clean };
  for (const [name, c] of Object.entries(others)) {
    // The schema lets only clean give an absolute cd0; every other configuration gives an increment.
    const increment = 'cd0Increment' in c ? c.cd0Increment : undefined;
    result[name] = {
      cd0: clean.cd0 + (increment ?? DEFAULT_CD0_INCREMENT),
      oswaldEfficiency: c.oswaldEfficiency ?? clean.oswaldEfficiency,
      clMax: c.clMax ?? clean.clMax,
    };
  }
  return result;
}

/** The propulsion kinds that pass a test, as a sentence names them. */
function kindsWith(test: (d: (typeof PROPULSION_DESCRIPTORS)[number]) => boolean, joiner: string): string {
  return PROPULSION_DESCRIPTORS.filter(test)
    .map((d) => d.kind)
    .join(joiner);
}

function resolveAircraft(aircraft: AircraftJson, warnings: WarningJson[]): Aircraft {
  const { kind, engines, lapseExponent, criticalAltitude, throttleRatio } = aircraft.propulsion;
  const descriptor = propulsionKind(kind);
  // A file that states an exponent keeps the density model it was written for.
  const lapseModel = aircraft.propulsion.lapseModel ?? (lapseExponent !== undefined ? 'density' : descriptor.lapseModels[0]);
  if (lapseExponent !== undefined && lapseModel !== 'density') {
    warnings.push({
      code: 'field-ignored',
      field: 'aircraft.propulsion.lapseExponent',
      message: `ignored: the ${lapseModel} lapse model reads flight Mach and the air, not an exponent; write lapseModel "density" to use it`,
    });
  }
  if (throttleRatio !== undefined && lapseModel === 'density') {
    warnings.push({
      code: 'field-ignored',
      field: 'aircraft.propulsion.throttleRatio',
      message: 'ignored: the throttle ratio belongs to a Mach-aware turbine lapse model, not the density model',
    });
  }
  if (criticalAltitude !== undefined && !descriptor.needsCriticalAltitude) {
    warnings.push({
      code: 'field-ignored',
      field: 'aircraft.propulsion.criticalAltitude',
      message: `ignored: criticalAltitude applies to a ${kindsWith((d) => d.needsCriticalAltitude, ' or ')} engine, not ${kind}`,
    });
  }
  if (lapseExponent !== undefined && descriptor.lapseExponent === null) {
    warnings.push({
      code: 'field-ignored',
      field: 'aircraft.propulsion.lapseExponent',
      message: `ignored: lapseExponent applies to ${kindsWith((d) => d.lapseExponent !== null, ' and ')}; a ${kind} engine uses its own lapse model (Loftpoint methods reference, section 5)`,
    });
  }
  return {
    takeoffMassKg: quantity(aircraft.takeoffMass, 'mass'),
    aspectRatio: aircraft.aero.aspectRatio,
    cdLinear: aircraft.aero.cdLinear ?? DEFAULT_CD_LINEAR,
    ...(aircraft.aero.thicknessRatio !== undefined
      ? {
          compressibility: {
            thicknessRatio: aircraft.aero.thicknessRatio,
            quarterChordSweepRad: quantity(aircraft.aero.quarterChordSweep ?? '0 deg', 'angle'),
            kornFactor: aircraft.aero.kornFactor ?? DEFAULT_KORN_FACTOR,
          },
        }
      : {}),
    configurations: resolveConfigurations(aircraft.aero),
    propulsion: {
      kind,
      engines: engines ?? DEFAULT_ENGINES,
      // A kind without an exponent never reads it; 1 keeps the model whole.
      lapseExponent: lapseExponent ?? descriptor.lapseExponent?.default ?? 1,
      // The density model is the model's absence, so a design resolved from an older file is the same object as before.
      ...(lapseModel !== 'density' ? { lapseModel, throttleRatio: throttleRatio ?? DEFAULT_THROTTLE_RATIO } : {}),
      ...(descriptor.needsCriticalAltitude && criticalAltitude !== undefined
        ? { criticalAltitudeM: quantity(criticalAltitude, 'length') }
        : {}),
    },
  };
}

function resolveDesignPoint(concept: ConceptJson): DesignPoint | undefined {
  const point = concept.designPoint;
  if (!point) return undefined;
  const axis = loadingAxis(concept.aircraft.propulsion.kind);
  const written = point[axis];
  const loading = typeof written === 'number' ? written : quantity(written ?? '', axis);
  return { wingLoadingPa: quantity(point.wingLoading, 'wingLoading'), loading };
}

function propellerEfficiencyWarnings(concept: ConceptJson): WarningJson[] {
  const kind = concept.aircraft.propulsion.kind;
  if (propulsionKind(kind).propeller) return [];
  return concept.requirements.flatMap((r, i) =>
    r.propellerEfficiency === undefined
      ? []
      : [{ code: 'field-ignored', field: `requirements[${i}].propellerEfficiency`, message: `ignored: a ${kind} has no propeller (requirement "${r.id}")` }],
  );
}

/** The design and the notes made while resolving it. The concept must have passed the schema and checkConcept. */
export function resolveConcept(concept: ConceptJson): { design: Design; warnings: WarningJson[] } {
  const warnings: WarningJson[] = [];
  const aircraft = resolveAircraft(concept.aircraft, warnings);
  const names = Object.keys(aircraft.configurations);
  const requirements = concept.requirements.map((r, i) => resolveRequirement(r, i, names, warnings));
  warnings.push(...propellerEfficiencyWarnings(concept));
  const range = concept.diagram?.wingLoading;
  const designPoint = resolveDesignPoint(concept);
  const design: Design = {
    name: concept.name?.trim() || DEFAULT_CONCEPT_NAME,
    aircraft,
    requirements,
    diagram: {
      ...(range ? { wingLoadingRangePa: [quantity(range[0], 'wingLoading'), quantity(range[1], 'wingLoading')] as [number, number] } : {}),
      samples: concept.diagram?.samples ?? DEFAULT_SAMPLES,
    },
    ...(designPoint ? { designPoint } : {}),
    warnings: [...warnings],
  };
  return { design, warnings };
}
