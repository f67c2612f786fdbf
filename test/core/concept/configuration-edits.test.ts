/**
 * Adding, renaming and removing a configuration of a concept document
 * (core/concept/configurations.ts), with the exact messages the CLI prints.
 * References: a configuration other than clean states an increment on clean's
 * CD0 and inherits what it leaves out (core/methods.md section 3); a stall is
 * flown in the landing configuration and a take-off roll in the take-off one by
 * default (each kind's descriptor in core/requirements, the concept format).
 * Expected documents below are written out by hand from the input document.
 */
import { describe, expect, it } from 'vitest';
import { addConfiguration, removeConfiguration, renameConfiguration } from '../../../core/concept/configurations';
import { parseConcept } from '../../../core';

type Doc = Record<string, any>;

/** A small concept: clean and landing; a stall flown in landing by default, a cruise named clean, one range on landing. */
function concept(): Doc {
  return {
    format: 'loftpoint-concept/1',
    aircraft: {
      takeoffMass: '1000 kg',
      aero: {
        aspectRatio: 8,
        configurations: {
          clean: { cd0: 0.025, oswaldEfficiency: 0.8, clMax: 1.4 },
          landing: { cd0Increment: 0.05, clMax: 2 },
        },
      },
      propulsion: { kind: 'piston' },
    },
    requirements: [
      { id: 'stall', kind: 'stall', speed: '50 kt' },
      { id: 'cruise', kind: 'cruise', speed: '120 kt', altitude: '6000 ft', configuration: 'clean' },
    ],
    uncertainty: {
      parameters: [
        { field: 'aircraft.aero.configurations.landing.clMax', low: 1.8, high: 2.2 },
        { field: 'aircraft.aero.aspectRatio', low: 7, high: 9 },
      ],
    },
  };
}

const names = (d: Doc) => Object.keys(d.aircraft.aero.configurations);

describe('adding a configuration', () => {
  it('adds an increment of 0 on clean when no values are given, at the end, and leaves the input alone', () => {
    const before = concept();
    const result = addConfiguration(before, 'ferry');
    if (!result.ok) throw new Error(result.message);
    expect((result.concept as Doc).aircraft.aero.configurations.ferry).toEqual({ cd0Increment: 0 });
    expect(names(result.concept)).toEqual(['clean', 'landing', 'ferry']);
    expect(before).toEqual(concept());
    // Everything else is the same document.
    const { aircraft, ...rest } = result.concept as Doc;
    const { aircraft: _a, ...restBefore } = concept();
    expect(rest).toEqual(restBefore);
    expect(aircraft.takeoffMass).toBe('1000 kg');
    expect(aircraft.aero.aspectRatio).toBe(8);
    // cd0 = clean 0.025 + 0, e and CLmax clean's (methods section 3).
    const parsed = parseConcept(result.concept);
    if (!parsed.ok) throw new Error(JSON.stringify(parsed.issues));
    expect(parsed.design.aircraft.configurations.ferry).toEqual({ cd0: 0.025, oswaldEfficiency: 0.8, clMax: 1.4 });
  });

  it('writes only the values it is given', () => {
    const result = addConfiguration(concept(), 'engine out', { cd0Increment: 0.02, oswaldEfficiency: 0.75, clMax: 1.6 });
    if (!result.ok) throw new Error(result.message);
    expect((result.concept as Doc).aircraft.aero.configurations['engine out']).toEqual({ cd0Increment: 0.02, oswaldEfficiency: 0.75, clMax: 1.6 });
    const onlyE = addConfiguration(concept(), 'e-only', { oswaldEfficiency: 0.7 });
    if (!onlyE.ok) throw new Error(onlyE.message);
    expect((onlyE.concept as Doc).aircraft.aero.configurations['e-only']).toEqual({ cd0Increment: 0, oswaldEfficiency: 0.7 });
  });

  it('refuses a taken name, a malformed name and a document without configurations, naming the field', () => {
    expect(addConfiguration(concept(), 'landing')).toEqual({
      ok: false,
      path: 'aircraft.aero.configurations.landing',
      message: 'already exists; choose another name',
    });
    const rule = 'is not a configuration name: 1 to 40 letters, digits, spaces, "-" or "_", starting with a letter or digit';
    expect(addConfiguration(concept(), '-flaps')).toEqual({ ok: false, path: 'aircraft.aero.configurations.-flaps', message: `"-flaps" ${rule}` });
    expect(addConfiguration(concept(), '')).toEqual({ ok: false, path: 'aircraft.aero.configurations.', message: `"" ${rule}` });
    expect(addConfiguration(concept(), 'flaps.10').ok).toBe(false);
    expect(addConfiguration(concept(), 'flaps 10\n').ok).toBe(false);
    // 40 characters are allowed, 41 are not.
    expect(addConfiguration(concept(), 'a'.repeat(40)).ok).toBe(true);
    expect(addConfiguration(concept(), 'a'.repeat(41)).ok).toBe(false);
    expect(addConfiguration(concept(), '9_b-c d').ok).toBe(true);
    const missing = { ok: false, path: 'aircraft.aero.configurations', message: 'is missing; the concept has no configurations to add to' };
    expect(addConfiguration({ format: 'loftpoint-concept/1' }, 'x')).toEqual(missing);
    expect(addConfiguration({ aircraft: [] }, 'x')).toEqual(missing);
    expect(addConfiguration({ aircraft: { aero: null } }, 'x')).toEqual(missing);
    expect(addConfiguration({ aircraft: { aero: { configurations: [] } } }, 'x')).toEqual(missing);
    expect(addConfiguration({ aircraft: { aero: { configurations: {} } } }, 'x').ok).toBe(true);
  });
});

describe('renaming a configuration', () => {
  it('keeps its place, and the requirements and ranges on it follow (a stall flies in landing by default)', () => {
    const before = concept();
    const result = renameConfiguration(before, 'landing', 'full flap');
    if (!result.ok) throw new Error(result.message);
    const after = result.concept as Doc;
    expect(names(after)).toEqual(['clean', 'full flap']);
    expect(after.aircraft.aero.configurations['full flap']).toEqual({ cd0Increment: 0.05, clMax: 2 });
    expect(after.requirements).toEqual([
      { id: 'stall', kind: 'stall', speed: '50 kt', configuration: 'full flap' },
      { id: 'cruise', kind: 'cruise', speed: '120 kt', altitude: '6000 ft', configuration: 'clean' },
    ]);
    expect(after.uncertainty).toEqual({
      parameters: [
        { field: 'aircraft.aero.configurations.full flap.clMax', low: 1.8, high: 2.2 },
        { field: 'aircraft.aero.aspectRatio', low: 7, high: 9 },
      ],
    });
    expect(before).toEqual(concept());
  });

  it('leaves requirements alone when nothing flies in it, and a document without ranges without them', () => {
    const document = concept();
    delete document.uncertainty;
    document.requirements = [{ id: 'cruise', kind: 'cruise', speed: '120 kt', altitude: '6000 ft' }];
    const result = renameConfiguration(document, 'landing', 'flaps');
    if (!result.ok) throw new Error(result.message);
    expect(result.concept.requirements).toEqual([{ id: 'cruise', kind: 'cruise', speed: '120 kt', altitude: '6000 ft' }]);
    expect('uncertainty' in result.concept).toBe(false);
  });

  it('refuses clean, an unknown name, a taken or malformed new name, each with its field', () => {
    expect(renameConfiguration(concept(), 'clean', 'smooth')).toEqual({
      ok: false,
      path: 'aircraft.aero.configurations.clean',
      message: 'is the reference configuration and keeps its name',
    });
    expect(renameConfiguration(concept(), 'takeoff', 'flaps')).toEqual({
      ok: false,
      path: 'aircraft.aero.configurations.takeoff',
      message: 'no such configuration (the concept has clean, landing)',
    });
    expect(renameConfiguration(concept(), 'landing', 'clean')).toEqual({
      ok: false,
      path: 'aircraft.aero.configurations.clean',
      message: 'already exists; choose another name',
    });
    expect(renameConfiguration(concept(), 'landing', ' flaps')).toEqual({
      ok: false,
      path: 'aircraft.aero.configurations. flaps',
      message: '" flaps" is not a configuration name: 1 to 40 letters, digits, spaces, "-" or "_", starting with a letter or digit',
    });
    expect(renameConfiguration({ requirements: [] }, 'a', 'b')).toEqual({ ok: false, path: 'aircraft.aero.configurations', message: 'is missing' });
  });
});

describe('removing a configuration', () => {
  it('drops an unused one and keeps the rest in order', () => {
    const document = concept();
    document.aircraft.aero.configurations.spare = { cd0Increment: 0.01 };
    document.aircraft.aero.configurations.last = { cd0Increment: 0.02 };
    const result = removeConfiguration(document, 'spare');
    if (!result.ok) throw new Error(result.message);
    expect((result.concept as Doc).aircraft.aero.configurations).toEqual({
      clean: { cd0: 0.025, oswaldEfficiency: 0.8, clMax: 1.4 },
      landing: { cd0Increment: 0.05, clMax: 2 },
      last: { cd0Increment: 0.02 },
    });
    expect(names(result.concept)).toEqual(['clean', 'landing', 'last']);
    expect(document.aircraft.aero.configurations.spare).toEqual({ cd0Increment: 0.01 });
  });

  it('refuses one still flown, naming the first requirement (one or several, by name or by default)', () => {
    expect(removeConfiguration(concept(), 'landing')).toEqual({
      ok: false,
      path: 'requirements[0].configuration',
      message: 'requirement "stall" still flies in "landing"; point it at another configuration first',
    });
    const two = concept();
    two.requirements.push({ id: 'stall-2', kind: 'stall', speed: '55 kt', configuration: 'landing' });
    expect(removeConfiguration(two, 'landing')).toEqual({
      ok: false,
      path: 'requirements[0].configuration',
      message: 'requirements "stall", "stall-2" still fly in "landing"; point them at another configuration first',
    });
    const later = concept();
    later.requirements.reverse();
    later.requirements[0].configuration = 'landing';
    later.requirements[1].configuration = 'clean';
    expect(removeConfiguration(later, 'landing')).toMatchObject({ ok: false, path: 'requirements[0].configuration' });
    // A requirement without an id is named by its place; one that is not an object flies in nothing.
    const unnamed = concept();
    unnamed.requirements = [null, 'stall', { kind: 'stall', speed: '50 kt' }];
    expect(removeConfiguration(unnamed, 'landing')).toEqual({
      ok: false,
      path: 'requirements[2].configuration',
      message: 'requirement "2" still flies in "landing"; point it at another configuration first',
    });
    // An unknown kind has no default configuration.
    const unknown = concept();
    unknown.requirements = [{ id: 'q', kind: 'hover' }];
    delete unknown.uncertainty;
    expect(removeConfiguration(unknown, 'landing').ok).toBe(true);
  });

  it('refuses one a range is on, then clean, an unknown one and a document without configurations', () => {
    const ranged = concept();
    ranged.requirements[0].configuration = 'clean';
    expect(removeConfiguration(ranged, 'landing')).toEqual({
      ok: false,
      path: 'uncertainty.parameters[0].field',
      message: 'ranges a field of "landing"; remove the range first',
    });
    // A range on a configuration whose name only starts the same does not hold it.
    ranged.uncertainty.parameters[0].field = 'aircraft.aero.configurations.landing2.clMax';
    expect(removeConfiguration(ranged, 'landing').ok).toBe(true);
    expect(removeConfiguration(concept(), 'clean')).toEqual({
      ok: false,
      path: 'aircraft.aero.configurations.clean',
      message: 'is the reference configuration and cannot be removed',
    });
    expect(removeConfiguration(concept(), 'cruise')).toEqual({
      ok: false,
      path: 'aircraft.aero.configurations.cruise',
      message: 'no such configuration (the concept has clean, landing)',
    });
    expect(removeConfiguration({}, 'landing')).toEqual({ ok: false, path: 'aircraft.aero.configurations', message: 'is missing' });
  });
});
