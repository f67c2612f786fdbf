/**
 * Assumptions outside their typical ranges (core/assumptions/typical-ranges.ts
 * and each requirement kind's own; methods reference, section 9): hints for
 * the engineer, never errors.
 */
import { minimumDragCoefficient, polarOf, type Polar } from '../aero/drag-polar';
import { configurationRole } from '../assumptions/configuration-role';
import type { TypicalRange } from '../assumptions/typical-range';
import { ASPECT_RATIO, CD0_CLEAN, CLMAX, OSWALD } from '../assumptions/typical-ranges';
import type { WarningJson } from '../evaluation';
import type { Design } from '../model';
import { propulsionKind } from '../propulsion/kinds';
import { requirementKind } from '../requirements';
import { messageNumber } from '../units/message-number';

function check(out: WarningJson[], field: string, what: string, value: number, range: TypicalRange): void {
  if (value >= range.low && value <= range.high) return;
  out.push({
    code: 'assumption-outside-typical-range',
    field,
    message: `${what} ${messageNumber(value)} is outside the typical range: ${range.text}.`,
  });
}

function configurationWarnings(design: Design, out: WarningJson[]): void {
  const { aircraft } = design;
  const clean = aircraft.configurations.clean;
  const aero = 'aircraft.aero';
  check(out, `${aero}.aspectRatio`, 'Aspect ratio', aircraft.aspectRatio, ASPECT_RATIO);
  check(out, `${aero}.configurations.clean.cd0`, 'Clean C_D0', clean.cd0, CD0_CLEAN);
  for (const [name, configuration] of Object.entries(aircraft.configurations)) {
    const path = `${aero}.configurations.${name}`;
    const role = configurationRole(name);
    if (name === 'clean' || configuration.oswaldEfficiency !== clean.oswaldEfficiency) {
      check(out, `${path}.oswaldEfficiency`, `Oswald efficiency (${name})`, configuration.oswaldEfficiency, OSWALD[role]);
    }
    const clMaxRange = CLMAX[role];
    if (clMaxRange && (name === 'clean' || configuration.clMax !== clean.clMax)) {
      check(out, `${path}.clMax`, `C_Lmax (${name})`, configuration.clMax, clMaxRange);
    }
    if (configuration.cd0 < clean.cd0) {
      out.push({
        code: 'assumption-outside-typical-range',
        field: `${path}.cd0Increment`,
        message: `The ${name} configuration has less zero-lift drag than clean; flaps and gear add drag (Roskam, Airplane Design I, Table 3.6).`,
      });
    }
    const polar = polarOf(aircraft, name) as Polar;
    if (!(minimumDragCoefficient(polar) > 0)) {
      out.push({
        code: 'drag-polar-not-positive',
        field: `${aero}.cdLinear`,
        message: `With C_D linear term ${messageNumber(aircraft.cdLinear)} the ${name} polar reaches zero or negative drag; check cdLinear and the Oswald efficiency.`,
      });
    }
  }
}

function requirementAssumptionWarnings(design: Design, out: WarningJson[]): void {
  const propeller = propulsionKind(design.aircraft.propulsion.kind).propeller;
  design.requirements.forEach((requirement, index) => {
    if (!requirement.enabled) return;
    const path = `requirements[${index}]`;
    const descriptor = requirementKind(requirement.kind);
    if (propeller && descriptor.propeller) {
      check(out, `${path}.propellerEfficiency`, 'Propeller efficiency', requirement.propellerEfficiency, descriptor.propeller.typical);
    }
    for (const { field, key, title, range } of descriptor.typicalRanges) {
      check(out, `${path}.${key}`, title, (requirement as unknown as Record<string, number>)[field], range);
    }
    if (requirement.massFraction > 1) {
      out.push({ code: 'assumption-outside-typical-range', field: `${path}.massFraction`, message: `Mass fraction ${messageNumber(requirement.massFraction)} is above take-off mass.` });
    }
    if (requirement.powerSetting > 1) {
      out.push({ code: 'assumption-outside-typical-range', field: `${path}.powerSetting`, message: `Power setting ${messageNumber(requirement.powerSetting)} is above rated power or thrust.` });
    }
  });
}

/** Every assumption of the design outside its typical range. */
export function assumptionWarnings(design: Design): WarningJson[] {
  const out: WarningJson[] = [];
  configurationWarnings(design, out);
  const { propulsion } = design.aircraft;
  const exponent = propulsionKind(propulsion.kind).lapseExponent;
  if (exponent) check(out, 'aircraft.propulsion.lapseExponent', 'Lapse exponent', propulsion.lapseExponent, exponent.typical);
  requirementAssumptionWarnings(design, out);
  return out;
}
