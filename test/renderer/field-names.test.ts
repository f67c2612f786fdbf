/**
 * Field paths in plain words: the names the editor shows beside each field
 * (checked against the editor's own titles would compare the code with
 * itself, so the expected words are written out here as a user reads them).
 */
import { describe, expect, it } from 'vitest';
import { DEMO_CONCEPTS } from '../../core';
import { fieldName } from '../../app/renderer/lib/concept/field-names';
import type { ConceptDocument } from '../../app/renderer/lib/concept/edit';

const trainer = structuredClone(DEMO_CONCEPTS[0].concept) as unknown as ConceptDocument;

describe('fieldName', () => {
  it.each([
    ['aircraft.aero.configurations.landing.clMax', 'Landing flaps: Maximum lift coefficient'],
    ['aircraft.aero.configurations.clean.cd0', 'Clean: Zero-lift drag CD0'],
    ['aircraft.aero.configurations.takeoff.oswaldEfficiency', 'Take-off flaps: Oswald efficiency e'],
    ['aircraft.aero.aspectRatio', 'Aspect ratio'],
    ['aircraft.takeoffMass', 'Take-off mass'],
    ['aircraft.propulsion.engines', 'Engines'],
    ['requirements[0].speed', 'stall: Stall speed (CAS)'],
    ['requirements.cruise.altitude', 'cruise: Pressure altitude'],
    ['requirements[1].label', 'takeoff-grass: Label'],
    ['name', 'Concept name'],
  ])('%s reads "%s"', (path, words) => {
    expect(fieldName(path, trainer)).toBe(words);
  });

  it('a path it does not know is shown as written', () => {
    expect(fieldName('uncertainty.parameters[0].low', trainer)).toBe('uncertainty.parameters[0].low');
    expect(fieldName('', trainer)).toBe('');
  });
});
