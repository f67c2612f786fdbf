/**
 * Which assumptions may carry a range, under which physical bounds, by
 * which label, and the exact one-line message for each field that may not.
 *
 * Facts used (demo concepts are the product's invented scenarios; their
 * values are read from their concept files in core/concept/demos):
 * - the trainer is a piston single with configurations clean, takeoff and
 *   landing (takeoff CD0 increment 0.014, landing 0.06); the business jet is a
 *   turbofan with the high-bypass lapse model;
 * - a piston engine's power is not modelled by a density-lapse exponent, and a
 *   turbofan has no propeller (core/methods.md section 5, common practice);
 * - physical bounds, common practice: aspect ratio, CD0 and CLmax above 0;
 *   Oswald efficiency and propeller efficiency above 0 and at most 1 (an
 *   elliptic wing and a loss-free propeller are the ideals); a CD0 increment
 *   0 or more; a rolling friction coefficient from 0 to below 1; braking
 *   friction above 0 and at most 1; the ground-run CL 0 or more; the linear
 *   drag term of either sign.
 */
import { describe, expect, it } from 'vitest';
import { resolveUncertainty } from '../../../core/studies';
import { rangeableFields } from '../../../core/studies/uncertain-fields';
import { demo, type Demo } from './fixtures';

const trainer = demo('trainer');
const jet = demo('business-jet');
const twin = demo('utility-twin');

function issue(d: Demo, field: string, low = 0.1, high = 0.2): { path: string; message: string } | undefined {
  const result = resolveUncertainty({ parameters: [{ field, low, high }] }, d.design, d.concept);
  return result.ok ? undefined : result.issues[0];
}

function resolved(d: Demo, field: string, low: number, high: number) {
  const result = resolveUncertainty({ parameters: [{ field, low, high }] }, d.design, d.concept);
  if (!result.ok) throw new Error(JSON.stringify(result.issues));
  return result.parameters[0];
}

const HINT =
  'use aircraft.aero.aspectRatio, aircraft.aero.cdLinear, aircraft.propulsion.lapseExponent, ' +
  'aircraft.aero.configurations.NAME.(cd0|cd0Increment|oswaldEfficiency|clMax) or ' +
  'requirements.ID.(propellerEfficiency|brakingFriction|rollingFriction|clGroundRun)';

describe('fields that may not carry a range: one line naming the field and why', () => {
  it.each<[string, Demo, string, string]>([
    ['a field that is no assumption', trainer, 'aircraft.takeoffMass', `"aircraft.takeoffMass" is not an assumption that can carry a range; ${HINT}`],
    ['a lapse exponent on a piston engine', trainer, 'aircraft.propulsion.lapseExponent', 'a piston concept has no lapse exponent (only turboprop and turbofan use one)'],
    [
      'a lapse exponent under the high-bypass model',
      jet,
      'aircraft.propulsion.lapseExponent',
      'this concept\'s high-bypass lapse model reads flight Mach and the air, not an exponent; give lapseModel "density" to range the exponent',
    ],
    ['a configuration value that is not a polar value', trainer, 'aircraft.aero.configurations.clean.cdLinear', "a configuration's ranged value must be cd0, cd0Increment, oswaldEfficiency or clMax"],
    ['a configuration with no value named', trainer, 'aircraft.aero.configurations.clean', "a configuration's ranged value must be cd0, cd0Increment, oswaldEfficiency or clMax"],
    ['a configuration the concept lacks', trainer, 'aircraft.aero.configurations.flaps20.clMax', 'the concept has no configuration "flaps20" (it has clean, takeoff, landing)'],
    ['cd0 of a configuration other than clean', trainer, 'aircraft.aero.configurations.takeoff.cd0', 'only clean has cd0; range "takeoff".cd0Increment instead'],
    ["clean's cd0Increment", trainer, 'aircraft.aero.configurations.clean.cd0Increment', 'clean has no cd0Increment; range clean.cd0 instead'],
    ['a requirement value that takes no range', trainer, 'requirements.cruise.speedMps', "a requirement's ranged value must be propellerEfficiency, brakingFriction, rollingFriction or clGroundRun"],
    ['a requirement with no value named', trainer, 'requirements.cruise', "a requirement's ranged value must be propellerEfficiency, brakingFriction, rollingFriction or clGroundRun"],
    ['an id no requirement has', trainer, 'requirements.nope.propellerEfficiency', 'no requirement has the id "nope" (requirements are addressed by id)'],
    ['a configuration with an empty name (a doubled dot)', trainer, 'aircraft.aero.configurations..clMax', 'the concept has no configuration "" (it has clean, takeoff, landing)'],
    ['a requirement with an empty id (a doubled dot)', trainer, 'requirements..propellerEfficiency', 'no requirement has the id "" (requirements are addressed by id)'],
    ['a configuration key with no configuration name', trainer, 'aircraft.aero.configurations.clMax', "a configuration's ranged value must be cd0, cd0Increment, oswaldEfficiency or clMax"],
    ['a requirement key with no id', trainer, 'requirements.propellerEfficiency', "a requirement's ranged value must be propellerEfficiency, brakingFriction, rollingFriction or clGroundRun"],
    ['propeller efficiency on a turbofan', jet, 'requirements.cruise.propellerEfficiency', 'a turbofan concept uses no propeller efficiency'],
    ['propeller efficiency on a stall requirement', trainer, 'requirements.stall.propellerEfficiency', 'a stall requirement does not use propeller efficiency'],
    ['rolling friction on a cruise', trainer, 'requirements.cruise.rollingFriction', 'rollingFriction belongs to a takeoff-ground-roll or takeoff-distance requirement; "cruise" is cruise'],
    ['braking friction on a cruise', trainer, 'requirements.cruise.brakingFriction', 'brakingFriction belongs to a landing-ground-roll or landing-distance requirement; "cruise" is cruise'],
  ])('%s', (_what, d, field, why) => {
    expect(issue(d, field)).toEqual({ path: 'uncertainty.parameters[0].field', message: `${field}: ${why}` });
  });
});

describe('physical bounds of each rangeable value', () => {
  it.each<[string, Demo, string, number, number, string]>([
    ['aspect ratio from 0', trainer, 'aircraft.aero.aspectRatio', 0, 8, 'low 0 is outside the physical range (must be above 0)'],
    ["clean's CD0 from 0", trainer, 'aircraft.aero.configurations.clean.cd0', 0, 0.03, 'low 0 is outside the physical range (must be above 0)'],
    ['CLmax from 0', trainer, 'aircraft.aero.configurations.landing.clMax', 0, 2.2, 'low 0 is outside the physical range (must be above 0)'],
    ['a negative CD0 increment', trainer, 'aircraft.aero.configurations.takeoff.cd0Increment', -0.001, 0.02, 'low -0.001 is outside the physical range (must be at least 0)'],
    ['Oswald efficiency from 0', trainer, 'aircraft.aero.configurations.landing.oswaldEfficiency', 0, 0.8, 'low 0 is outside the physical range (must be above 0)'],
    ['propeller efficiency above 1', trainer, 'requirements.cruise.propellerEfficiency', 0.7, 1.01, 'high 1.01 is outside the physical range (must be at most 1)'],
    ['propeller efficiency from 0', trainer, 'requirements.cruise.propellerEfficiency', 0, 0.9, 'low 0 is outside the physical range (must be above 0)'],
    ['rolling friction of 1', trainer, 'requirements.takeoff-grass.rollingFriction', 0.02, 1, 'high 1 is outside the physical range (must be below 1)'],
    ['negative rolling friction', trainer, 'requirements.takeoff-grass.rollingFriction', -0.01, 0.08, 'low -0.01 is outside the physical range (must be at least 0)'],
    ['braking friction from 0', trainer, 'requirements.landing-grass.brakingFriction', 0, 0.4, 'low 0 is outside the physical range (must be above 0)'],
    ['braking friction above 1', trainer, 'requirements.landing-grass.brakingFriction', 0.2, 1.2, 'high 1.2 is outside the physical range (must be at most 1)'],
    ['a negative ground-run CL', trainer, 'requirements.takeoff-grass.clGroundRun', -0.1, 0.8, 'low -0.1 is outside the physical range (must be at least 0)'],
    ['a lapse exponent from 0', twin, 'aircraft.propulsion.lapseExponent', 0, 0.9, 'low 0 is outside the physical range (must be above 0)'],
  ])('refuses %s', (_what, d, field, low, high, why) => {
    const end = why.startsWith('low') ? 'low' : 'high';
    expect(issue(d, field, low, high)).toEqual({ path: `uncertainty.parameters[0].${end}`, message: `${field}: ${why}` });
  });

  it.each<[string, Demo, string, number, number]>([
    ['a CD0 increment from 0', trainer, 'aircraft.aero.configurations.takeoff.cd0Increment', 0, 0.02],
    ['propeller efficiency up to 1', trainer, 'requirements.cruise.propellerEfficiency', 0.7, 1],
    ['braking friction up to 1', trainer, 'requirements.landing-grass.brakingFriction', 0.2, 1],
    ['rolling friction from 0', trainer, 'requirements.takeoff-grass.rollingFriction', 0, 0.08],
    ['a ground-run CL from 0', trainer, 'requirements.takeoff-grass.clGroundRun', 0, 0.8],
    ['a linear drag term of either sign, however far', trainer, 'aircraft.aero.cdLinear', -1e6, 1e6],
    ['an aspect ratio with no upper bound', trainer, 'aircraft.aero.aspectRatio', 7, 1e9],
  ])('accepts %s', (_what, d, field, low, high) => {
    expect(issue(d, field, low, high)).toBeUndefined();
  });
});

describe('labels and nominal values', () => {
  it.each<[Demo, string, number, number, string, number]>([
    // [concept, field, low, high, label, nominal from the concept file]
    [trainer, 'aircraft.aero.aspectRatio', 7, 8, 'Aspect ratio', 7.4],
    [trainer, 'aircraft.aero.cdLinear', -0.01, 0.01, 'Linear drag term K1', 0],
    [twin, 'aircraft.propulsion.lapseExponent', 0.6, 0.9, 'Lapse exponent', 0.75],
    [trainer, 'aircraft.aero.configurations.clean.cd0', 0.025, 0.035, 'CD0 (clean)', 0.029],
    [trainer, 'aircraft.aero.configurations.takeoff.cd0Increment', 0.01, 0.02, 'CD0 increment (takeoff)', 0.014],
    [trainer, 'aircraft.aero.configurations.landing.oswaldEfficiency', 0.6, 0.8, 'Oswald efficiency (landing)', 0.72],
    [trainer, 'aircraft.aero.configurations.landing.clMax', 1.9, 2.2, 'CLmax (landing)', 2.05],
    [trainer, 'requirements.cruise.propellerEfficiency', 0.75, 0.85, 'Propeller efficiency (cruise)', 0.8],
    [trainer, 'requirements.takeoff-grass.rollingFriction', 0.03, 0.08, 'Rolling friction (takeoff-grass)', 0.05],
    [trainer, 'requirements.takeoff-grass.clGroundRun', 0.3, 0.8, 'Ground-run CL (takeoff-grass)', 0.5],
    [trainer, 'requirements.landing-grass.brakingFriction', 0.2, 0.4, 'Braking friction (landing-grass)', 0.25],
  ])('%#: %s is "%s"', (d, field, low, high, label, nominal) => {
    const p = resolved(d, field, low, high);
    expect(p.label).toBe(label);
    expect(p.nominal).toBeCloseTo(nominal, 12); // an increment is a difference of resolved values: rounding only
  });
});

describe('rangeableFields', () => {
  it("lists the trainer's fields in concept-file order: no lapse exponent on a piston, no propeller on the stall", () => {
    const own = (id: string, ...keys: string[]) => keys.map((k) => `requirements.${id}.${k}`);
    const configuration = (name: string, first: string) => ['', 'oswaldEfficiency', 'clMax'].map((k) => `aircraft.aero.configurations.${name}.${k || first}`);
    expect(rangeableFields(trainer.design)).toEqual([
      'aircraft.aero.aspectRatio',
      'aircraft.aero.cdLinear',
      ...configuration('clean', 'cd0'),
      ...configuration('takeoff', 'cd0Increment'),
      ...configuration('landing', 'cd0Increment'),
      // trainer requirements in file order: stall, takeoff-grass (ground roll), landing-grass (landing distance), climb-83, climb-rate, cruise, ceiling
      ...own('takeoff-grass', 'propellerEfficiency', 'rollingFriction', 'clGroundRun'),
      ...own('landing-grass', 'brakingFriction'),
      ...own('climb-83', 'propellerEfficiency'),
      ...own('climb-rate', 'propellerEfficiency'),
      ...own('cruise', 'propellerEfficiency'),
      ...own('ceiling', 'propellerEfficiency'),
    ]);
  });

  it('lists the lapse exponent of a turboprop after the configurations, and nothing of a propeller on a turbofan', () => {
    const fields = rangeableFields(twin.design);
    const configurationsEnd = fields.lastIndexOf('aircraft.aero.configurations.engine-out.clMax');
    expect(fields[configurationsEnd + 1]).toBe('aircraft.propulsion.lapseExponent');
    expect(rangeableFields(jet.design).filter((f) => f.endsWith('propellerEfficiency') || f.endsWith('lapseExponent'))).toEqual([]);
  });
});
