/**
 * Adding, renaming and removing aerodynamic configurations in the window's
 * concept document, checked by parsing the result with the concept schema.
 */
import { describe, expect, it } from 'vitest';
import { DEMO_CONCEPTS, parseConcept } from '../../core';
import { addConfiguration, removeConfiguration, renameConfiguration, requirementsUsing } from '../../app/renderer/lib/concept/configurations';
import type { ConceptDocument } from '../../app/renderer/lib/concept/edit';

function demo(index: number): ConceptDocument {
  return structuredClone(DEMO_CONCEPTS[index].concept) as unknown as ConceptDocument;
}

function configurationsOf(document: ConceptDocument): Record<string, Record<string, number>> {
  return (document.aircraft as { aero: { configurations: Record<string, Record<string, number>> } }).aero.configurations;
}

describe('configurations of a concept', () => {
  it('a twin started from the trainer gets an engine-out configuration copied from take-off, and it parses', () => {
    const trainer = demo(0);
    const added = addConfiguration(trainer, 'engine-out', 'takeoff');
    if (!added.ok) throw new Error(added.message);
    expect(configurationsOf(added.document)['engine-out']).toEqual(configurationsOf(trainer).takeoff);
    expect(Object.keys(configurationsOf(trainer))).not.toContain('engine-out');
    expect(parseConcept(added.document).ok).toBe(true);
  });

  it('a copy of clean is an increment of zero on clean (the schema refuses cd0 outside clean)', () => {
    const added = addConfiguration(demo(0), 'cruise-gear-down', 'clean');
    if (!added.ok) throw new Error(added.message);
    expect(configurationsOf(added.document)['cruise-gear-down']).toEqual({ cd0Increment: 0, oswaldEfficiency: 0.79, clMax: 1.45 });
    expect(parseConcept(added.document).ok).toBe(true);
  });

  it('refuses a taken or malformed name', () => {
    expect(addConfiguration(demo(0), 'landing')).toEqual({ ok: false, message: 'A configuration "landing" already exists.' });
    expect(addConfiguration(demo(0), 'Engine Out').ok).toBe(false);
    expect(addConfiguration(demo(0), '').ok).toBe(false);
  });

  it('removing one a requirement flies in is refused, naming the requirement', () => {
    const result = removeConfiguration(demo(0), 'landing');
    expect(result.ok).toBe(false);
    if (!result.ok) {
      expect(result.message).toContain('"stall"');
      // The landing-distance requirement names no configuration: it flies in landing by its kind's default.
      expect(result.message).toContain('"landing-grass" (by its default)');
    }
    expect(removeConfiguration(demo(0), 'clean').ok).toBe(false);
  });

  it('removing an unused one drops it and the ranges on its values', () => {
    let document = demo(0);
    const added = addConfiguration(document, 'ferry');
    if (!added.ok) throw new Error(added.message);
    document = { ...added.document, uncertainty: { parameters: [{ field: 'aircraft.aero.configurations.ferry.clMax', low: 1.2, high: 1.6 }] } };
    const removed = removeConfiguration(document, 'ferry');
    if (!removed.ok) throw new Error(removed.message);
    expect(Object.keys(configurationsOf(removed.document))).toEqual(['clean', 'takeoff', 'landing']);
    expect(removed.document.uncertainty).toEqual({ parameters: [] });
    expect(parseConcept(removed.document).ok).toBe(true);
  });

  it('a rename carries the requirements that fly in it, named or by default, so the diagram does not change', () => {
    const trainer = demo(0);
    const renamed = renameConfiguration(trainer, 'landing', 'full-flap');
    if (!renamed.ok) throw new Error(renamed.message);
    expect(Object.keys(configurationsOf(renamed.document))).toEqual(['clean', 'takeoff', 'full-flap']);
    expect(requirementsUsing(renamed.document, 'full-flap').map((u) => u.id)).toEqual(['stall', 'landing-grass']);
    const before = parseConcept(trainer);
    const after = parseConcept(renamed.document);
    if (!before.ok || !after.ok) throw new Error('does not parse');
    // Same requirements, same polar in each: the engine's inputs are unchanged apart from the name.
    expect(after.warnings).toEqual(before.warnings);
    expect(after.design.aircraft.configurations['full-flap']).toEqual(before.design.aircraft.configurations.landing);
    expect(renameConfiguration(trainer, 'clean', 'x').ok).toBe(false);
    expect(renameConfiguration(trainer, 'landing', 'takeoff').ok).toBe(false);
  });
});
