/**
 * What a requirement kind says about its own fields read together, and why a
 * resolved requirement cannot be met: the exact one-line messages, which name
 * the field and what is wrong.
 */
import { describe, expect, it } from 'vitest';
import { formatIssue, parseConcept } from '../../../core/concept';
import { requirementKind } from '../../../core/requirements';
import type { Requirement } from '../../../core/model';
import { conceptWith, type Editable } from '../concept/fixture';
import * as make from '../helpers/design';

function messages(requirement: Editable, aircraft: Editable = {}): string[] {
  const parsed = parseConcept(conceptWith([{ id: 'r', configuration: 'clean', ...requirement }], aircraft));
  return parsed.ok ? [] : parsed.issues.map(formatIssue);
}

const twin = { propulsion: { kind: 'piston', engines: 2 } };

describe('climb gradient', () => {
  it('catches a bare per-cent number as the fraction it would be', () => {
    // 2.4 % is the two-engine second segment of 14 CFR 25.121(b); 2.4 written bare would be 240 %.
    expect(messages({ kind: 'climb-gradient', gradient: 2.4 })).toEqual(['requirements[0].gradient: is 2.4, which would mean 240 %; write 0.024 or "2.4 %" (requirement "r")']);
    // 1 exactly is 100 % (a vertical climb): the same slip.
    expect(messages({ kind: 'climb-gradient', gradient: 1 })).toEqual(['requirements[0].gradient: is 1, which would mean 100 %; write 0.01 or "1 %" (requirement "r")']);
    expect(messages({ kind: 'climb-gradient', gradient: 0.99 })).toEqual([]);
    expect(messages({ kind: 'climb-gradient', gradient: '120 %' })).toEqual(['requirements[0].gradient: must be less than 1 (got "120 %" = 1.2) (requirement "r")']);
  });

  it('needs an engine left running', () => {
    expect(messages({ kind: 'climb-gradient', gradient: 0.024, enginesInoperative: 1 })).toEqual([
      'requirements[0].enginesInoperative: must be below the number of engines (aircraft.propulsion.engines is 1; got 1) (requirement "r")',
    ]);
    expect(messages({ kind: 'climb-gradient', gradient: 0.024, enginesInoperative: 3 }, twin)).toEqual([
      'requirements[0].enginesInoperative: must be below the number of engines (aircraft.propulsion.engines is 2; got 3) (requirement "r")',
    ]);
    expect(messages({ kind: 'climb-gradient', gradient: 0.024, enginesInoperative: 1 }, twin)).toEqual([]);
    expect(messages({ kind: 'climb-gradient', gradient: 0.024 })).toEqual([]);
  });

  it('refuses a resolved climb with every engine out, and lets one with an engine left through', () => {
    const kind = requirementKind('climb-gradient');
    const single = make.aircraft({ engines: 1 });
    expect(kind.impossible!(make.climbGradient(0.024, { enginesInoperative: 1 }), single)).toEqual({
      code: 'no-engine-left',
      field: 'enginesInoperative',
      message: '1 of 1 engines inoperative leaves none running; the climb gradient cannot be met.',
    });
    expect(kind.impossible!(make.climbGradient(0.024, { enginesInoperative: 1 }), make.aircraft({ engines: 2 }))).toBeUndefined();
    expect(kind.impossible!(make.climbGradient(0.024), single)).toBeUndefined();
  });
});

describe('balanced field length', () => {
  it('needs a multi-engine aircraft, in the file and in a resolved design', () => {
    expect(messages({ kind: 'balanced-field-length', distance: '1200 m' })).toEqual([
      'requirements[0]: needs a multi-engine aircraft: a balanced field length assumes one engine fails and the others carry on (aircraft.propulsion.engines is 1) (requirement "r")',
    ]);
    expect(messages({ kind: 'balanced-field-length', distance: '1200 m' }, twin)).toEqual([]);
    const kind = requirementKind('balanced-field-length');
    expect(kind.impossible!(make.balancedField(1200), make.aircraft({ engines: 1 }))).toEqual({
      code: 'single-engine-balanced-field',
      field: '',
      message: 'A balanced field length needs a multi-engine aircraft (aircraft.propulsion.engines is 1).',
    });
    expect(kind.impossible!(make.balancedField(1200), make.aircraft({ engines: 2 }))).toBeUndefined();
  });
});

describe('sustained turn', () => {
  it('takes exactly one of load factor and bank angle', () => {
    expect(messages({ kind: 'sustained-turn', speed: '100 kt' })).toEqual(['requirements[0]: needs loadFactor (e.g. 1.5) or bankAngle (e.g. "45 deg") (requirement "r")']);
    expect(messages({ kind: 'sustained-turn', speed: '100 kt', loadFactor: 2, bankAngle: '60 deg' })).toEqual([
      'requirements[0]: has both; give only one of loadFactor (e.g. 1.5) or bankAngle (e.g. "45 deg") (requirement "r")',
    ]);
    expect(messages({ kind: 'sustained-turn', speed: '100 kt', loadFactor: 2 })).toEqual([]);
    expect(messages({ kind: 'sustained-turn', speed: '100 kt', bankAngle: '60 deg' })).toEqual([]);
  });
});

describe('landing distance', () => {
  it('touches down no faster than it approaches', () => {
    // Raymer ch. 17 (from memory): approach 1.3 V_s, touchdown 1.15 V_s; the flare slows the aircraft.
    expect(messages({ kind: 'landing-distance', distance: '600 m', approachSpeedFactor: 1.2, touchdownSpeedFactor: 1.25 })).toEqual([
      'requirements[0].touchdownSpeedFactor: must not exceed approachSpeedFactor (1.2); got 1.25 (requirement "r")',
    ]);
    expect(messages({ kind: 'landing-distance', distance: '600 m', approachSpeedFactor: 1.2, touchdownSpeedFactor: 1.2 })).toEqual([]);
  });

  it('holds a written factor against the default of the other', () => {
    // The defaults are 1.3 V_s approach and 1.15 V_s touchdown (Raymer ch. 17, from memory).
    expect(messages({ kind: 'landing-distance', distance: '600 m', touchdownSpeedFactor: 1.35 })).toEqual([
      'requirements[0].touchdownSpeedFactor: must not exceed approachSpeedFactor (1.3 by default); got 1.35 (requirement "r")',
    ]);
    expect(messages({ kind: 'landing-distance', distance: '600 m', approachSpeedFactor: 1.1 })).toEqual([
      'requirements[0].approachSpeedFactor: must not be below touchdownSpeedFactor (1.15 by default); got 1.1 (requirement "r")',
    ]);
    expect(messages({ kind: 'landing-distance', distance: '600 m', touchdownSpeedFactor: 1.3 })).toEqual([]);
    expect(messages({ kind: 'landing-distance', distance: '600 m', approachSpeedFactor: 1.15 })).toEqual([]);
    expect(messages({ kind: 'landing-distance', distance: '600 m' })).toEqual([]);
  });
});

describe('what the studies and the read-out ask of a kind', () => {
  const kind = (k: Requirement['kind']) => requirementKind(k);

  it('names the speed field when a curve cannot be met at its written speed', () => {
    expect(kind('cruise').unattainableField!(make.cruise(60))).toBe('speed');
    expect(kind('maximum-speed').unattainableField!(make.maximumSpeed(60))).toBe('speed');
    expect(kind('sustained-turn').unattainableField!(make.sustainedTurn(60, 2))).toBe('speed');
    // A climb at the best-rate speed has no speed of its own to point at.
    expect(kind('climb-rate').unattainableField!(make.climbRate(3, { speedMps: 40 }))).toBe('speed');
    expect(kind('climb-rate').unattainableField!(make.climbRate(3))).toBeUndefined();
  });

  it('takes the drag polar in a landing limit only where the roll has aerodynamic terms', () => {
    // core/methods.md: without clGround or liftDumping the landing ground roll leaves lift and drag out.
    const roll = kind('landing-ground-roll');
    expect(roll.usesDrag!(make.landingRoll(400))).toBe(false);
    expect(roll.usesDrag!(make.landingRoll(400, { clGround: 0.5 }))).toBe(true);
    expect(roll.usesDrag!(make.landingRoll(400, { clGround: 0 }))).toBe(true);
    expect(roll.usesDrag!(make.landingRoll(400, { liftDumping: true }))).toBe(true);
    // The landing distance always flies an approach and a flare, and brakes with the configuration's drag.
    expect(kind('landing-distance').usesDrag!(make.landingDistance(900))).toBe(true);
  });
});
