/**
 * Requirements that no point of the diagram can meet, each with the field to
 * look at and the reason.
 */
import { polarOf } from '../aero/drag-polar';
import type { WarningJson } from '../evaluation';
import type { Aircraft, Requirement } from '../model';
import { availableFraction } from '../propulsion/available-fraction';
import { messageNumber } from '../units/message-number';
import { requirementKind } from '../requirements';
import type { RequirementBoundary } from './boundaries';

/** Why a requirement's curve cannot be met anywhere, when the inputs alone say so. */
function knownCause(requirement: Requirement, aircraft: Aircraft, path: string): WarningJson | undefined {
  const descriptor = requirementKind(requirement.kind);
  const own = descriptor.impossible?.(requirement, aircraft);
  if (own) return { code: own.code, field: own.field ? `${path}.${own.field}` : path, message: own.message };
  const alpha = availableFraction(aircraft.propulsion, requirement.altitudeM, requirement.temperatureOffsetK, requirement.powerSetting);
  if (descriptor.drawnAs === 'curve' && !(alpha > 0)) {
    const field = requirement.powerSetting > 0 ? `${path}.altitude` : `${path}.powerSetting`;
    return {
      code: 'no-power-available',
      field,
      message: `No ${aircraft.propulsion.kind} power or thrust is left at this altitude and power setting (lapse x setting = ${messageNumber(alpha)}).`,
    };
  }
  return undefined;
}

/** Warnings about the requirements themselves, before anything is sampled. */
export function requirementInputWarnings(entries: readonly RequirementBoundary[], aircraft: Aircraft): WarningJson[] {
  const out: WarningJson[] = [];
  for (const { index, requirement } of entries) {
    const path = `requirements[${index}]`;
    if (polarOf(aircraft, requirement.configuration) === undefined) {
      out.push({
        code: 'configuration-missing',
        field: `${path}.configuration`,
        message: `Configuration "${requirement.configuration}" is not defined under aircraft.aero.configurations; the clean configuration is used.`,
      });
    }
    const cause = knownCause(requirement, aircraft, path);
    if (cause) out.push(cause);
  }
  return out;
}

/**
 * Requirements that no plotted wing loading can meet: a curve that is
 * unattainable at every sample, or a limit left of the plotted range.
 */
export function unattainableWarnings(
  entries: readonly RequirementBoundary[],
  aircraft: Aircraft,
  curveMet: ReadonlyMap<string, boolean>,
  rangeLoPa: number,
): WarningJson[] {
  const out: WarningJson[] = [];
  for (const { index, requirement, boundary } of entries) {
    const path = `requirements[${index}]`;
    if (boundary.type === 'limit') {
      if (boundary.wingLoadingMaxPa < rangeLoPa) {
        out.push({
          code: 'limit-below-range',
          field: path,
          message: `Requirement "${requirement.id}" allows at most ${messageNumber(boundary.wingLoadingMaxPa)} N/m^2 of wing loading, left of the plotted range (from ${messageNumber(rangeLoPa)} N/m^2).`,
        });
      }
      continue;
    }
    if (curveMet.get(boundary.id) !== false || knownCause(requirement, aircraft, path)) continue;
    const speedField = requirementKind(requirement.kind).unattainableField?.(requirement);
    const bySpeed = speedField !== undefined;
    out.push({
      code: 'requirement-unattainable',
      field: bySpeed ? `${path}.${speedField}` : path,
      message: bySpeed
        ? `Requirement "${requirement.id}": the speed is below the stall speed of the ${requirement.configuration} configuration at every plotted wing loading (C_L needed above C_Lmax).`
        : `Requirement "${requirement.id}" cannot be met at any plotted wing loading.`,
    });
  }
  return out;
}
