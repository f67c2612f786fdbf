/**
 * Assumptions outside the typical ranges of METHODS.md section 9: hints for
 * the engineer, never errors.
 */
import { minimumDragCoefficient, polarOf, type Polar } from '../aero/drag-polar';
import type { WarningJson } from '../evaluation';
import type { Design, Requirement } from '../model';
import { isPropellerDriven } from '../propulsion/propeller';

interface Range {
  lo: number;
  hi: number;
  /** The typical range as the message states it, with its source. */
  typical: string;
}

// METHODS.md section 9 (and section 3 for the flap C_Lmax), widened slightly
// where the table gives a point value.
const ASPECT_RATIO: Range = { lo: 4, hi: 40, typical: '4-5 delta, 6-8 light aircraft, about 10 transports, 20+ sailplanes (common practice)' };
const OSWALD: Range = { lo: 0.7, hi: 0.95, typical: '0.7-0.95, about 0.8 (common practice)' };
const CD0_CLEAN: Range = { lo: 0.006, hi: 0.05, typical: '0.006 sailplane to 0.05 small UAV (common practice)' };
const CLMAX: Record<string, Range> = {
  clean: { lo: 0.8, hi: 1.7, typical: '0.8 thin wing to 1.2-1.5 typical (common practice)' },
  takeoff: { lo: 1.4, hi: 2.2, typical: '1.4-2.2 (Roskam, Airplane Design I, Table 3.1)' },
  landing: { lo: 1.6, hi: 2.8, typical: '1.6-2.8, about 5 with powered lift (Roskam, Airplane Design I, Table 3.1)' },
};
const LAPSE_EXPONENT: Partial<Record<string, Range>> = {
  turboprop: { lo: 0.7, hi: 0.9, typical: '0.7-0.9 (common practice)' },
  turbofan: { lo: 0.6, hi: 1, typical: '0.6-1 (common practice)' },
};
const ROLLING_FRICTION: Range = { lo: 0.02, hi: 0.3, typical: '0.02-0.05 paved, 0.05-0.1 grass, up to 0.3 soft ground (Brandt et al.; common practice)' };
const BRAKING_FRICTION: Range = { lo: 0.15, hi: 0.5, typical: '0.3-0.5 dry, 0.15-0.3 wet (Raymer, Table 17.1)' };
const CL_GROUND_RUN: Range = { lo: 0.3, hi: 0.8, typical: '0.3-0.8 (common practice)' };

function propellerEfficiencyRange(requirement: Requirement): Range {
  if (requirement.kind === 'takeoff-ground-roll') return { lo: 0.45, hi: 0.65, typical: '0.5-0.6 in the take-off run (common practice)' };
  if (requirement.kind === 'cruise' || requirement.kind === 'sustained-turn') return { lo: 0.7, hi: 0.9, typical: 'about 0.8 in cruise (common practice)' };
  return { lo: 0.65, hi: 0.85, typical: '0.7-0.8 in climb (common practice)' };
}

function check(out: WarningJson[], field: string, what: string, value: number, range: Range): void {
  if (value >= range.lo && value <= range.hi) return;
  out.push({
    code: 'assumption-outside-typical-range',
    field,
    message: `${what} ${round(value)} is outside the typical range: ${range.typical}.`,
  });
}

export function round(x: number): string {
  return Number.isFinite(x) ? String(Number(x.toPrecision(4))) : String(x);
}

function configurationWarnings(design: Design, out: WarningJson[]): void {
  const { aircraft } = design;
  const clean = aircraft.configurations.clean;
  const aero = 'aircraft.aero';
  check(out, `${aero}.aspectRatio`, 'Aspect ratio', aircraft.aspectRatio, ASPECT_RATIO);
  check(out, `${aero}.configurations.clean.cd0`, 'Clean C_D0', clean.cd0, CD0_CLEAN);
  for (const [name, configuration] of Object.entries(aircraft.configurations)) {
    const path = `${aero}.configurations.${name}`;
    if (name === 'clean' || configuration.oswaldEfficiency !== clean.oswaldEfficiency) {
      check(out, `${path}.oswaldEfficiency`, `Oswald efficiency (${name})`, configuration.oswaldEfficiency, OSWALD);
    }
    const clMaxRange = CLMAX[name];
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
        message: `With C_D linear term ${round(aircraft.cdLinear)} the ${name} polar reaches zero or negative drag; check cdLinear and the Oswald efficiency.`,
      });
    }
  }
}

function requirementAssumptionWarnings(design: Design, out: WarningJson[]): void {
  const propeller = isPropellerDriven(design.aircraft.propulsion.kind);
  design.requirements.forEach((requirement, index) => {
    if (!requirement.enabled) return;
    const path = `requirements[${index}]`;
    if (propeller && requirement.kind !== 'stall' && requirement.kind !== 'landing-ground-roll') {
      check(out, `${path}.propellerEfficiency`, 'Propeller efficiency', requirement.propellerEfficiency, propellerEfficiencyRange(requirement));
    }
    if (requirement.kind === 'takeoff-ground-roll') {
      check(out, `${path}.rollingFriction`, 'Rolling friction', requirement.rollingFriction, ROLLING_FRICTION);
      check(out, `${path}.clGroundRun`, 'Ground-run C_L', requirement.clGroundRun, CL_GROUND_RUN);
    }
    if (requirement.kind === 'landing-ground-roll') {
      check(out, `${path}.brakingFriction`, 'Braking friction', requirement.brakingFriction, BRAKING_FRICTION);
    }
    if (requirement.massFraction > 1) {
      out.push({ code: 'assumption-outside-typical-range', field: `${path}.massFraction`, message: `Mass fraction ${round(requirement.massFraction)} is above take-off mass.` });
    }
    if (requirement.powerSetting > 1) {
      out.push({ code: 'assumption-outside-typical-range', field: `${path}.powerSetting`, message: `Power setting ${round(requirement.powerSetting)} is above rated power or thrust.` });
    }
  });
}

/** Every assumption of the design outside its typical range. */
export function assumptionWarnings(design: Design): WarningJson[] {
  const out: WarningJson[] = [];
  configurationWarnings(design, out);
  const { propulsion } = design.aircraft;
  const exponentRange = LAPSE_EXPONENT[propulsion.kind];
  if (exponentRange) check(out, 'aircraft.propulsion.lapseExponent', 'Lapse exponent', propulsion.lapseExponent, exponentRange);
  requirementAssumptionWarnings(design, out);
  return out;
}
