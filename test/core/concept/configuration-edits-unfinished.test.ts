/**
 * Configuration edits on a document still being written: the window edits the
 * document as it stands, before it validates, so a range without its field, a
 * stray entry in the list of ranges or a missing list of requirements must
 * neither stop the edit nor be changed by it. Expected documents are written
 * out by hand from the input document.
 */
import { describe, expect, it } from 'vitest';
import { addConfiguration, removeConfiguration, renameConfiguration } from '../../../core/concept/configurations';

type Doc = Record<string, any>;

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
          ferry: { cd0Increment: 0.01 },
        },
      },
      propulsion: { kind: 'piston' },
    },
    requirements: [{ id: 'cruise', kind: 'cruise', speed: '120 kt', altitude: '6000 ft', configuration: 'clean' }],
  };
}

/** Ranges not yet finished: a blank entry, a number for a field, a word, and one real range on ferry. */
const unfinishedRanges = () => [null, { field: 5, low: 1, high: 2 }, 'clMax', { low: 1 }, { field: 'aircraft.aero.configurations.ferry.cd0Increment', low: 0, high: 0.02 }];

describe('configuration edits on an unfinished document', () => {
  it('renames past unfinished ranges, leaving them as written, and moves the real one', () => {
    const document = concept();
    document.uncertainty = { parameters: unfinishedRanges() };
    const result = renameConfiguration(document, 'ferry', 'long range');
    if (!result.ok) throw new Error(result.message);
    expect((result.concept as Doc).uncertainty.parameters).toEqual([
      null,
      { field: 5, low: 1, high: 2 },
      'clMax',
      { low: 1 },
      { field: 'aircraft.aero.configurations.long range.cd0Increment', low: 0, high: 0.02 },
    ]);
  });

  it('removes past unfinished ranges, and refuses while the real one is on it', () => {
    const document = concept();
    document.uncertainty = { parameters: unfinishedRanges() };
    const landing = removeConfiguration(document, 'landing');
    if (!landing.ok) throw new Error(landing.message);
    expect(Object.keys((landing.concept as Doc).aircraft.aero.configurations)).toEqual(['clean', 'ferry']);
    expect(removeConfiguration(document, 'ferry')).toEqual({
      ok: false,
      path: 'uncertainty.parameters[4].field',
      message: 'ranges a field of "ferry"; remove the range first',
    });
  });

  it('renames and removes in a document without its list of requirements', () => {
    for (const requirements of [undefined, {}, 'none']) {
      const document = concept();
      if (requirements === undefined) delete document.requirements;
      else document.requirements = requirements;
      const renamed = renameConfiguration(document, 'landing', 'flaps');
      if (!renamed.ok) throw new Error(renamed.message);
      expect(Object.keys((renamed.concept as Doc).aircraft.aero.configurations)).toEqual(['clean', 'flaps', 'ferry']);
      expect((renamed.concept as Doc).requirements).toEqual(requirements);
      const removed = removeConfiguration(document, 'landing');
      if (!removed.ok) throw new Error(removed.message);
      expect(Object.keys((removed.concept as Doc).aircraft.aero.configurations)).toEqual(['clean', 'ferry']);
    }
  });

  it('passes over a requirement whose kind is not text when looking for what flies in a configuration', () => {
    // A stall flies in landing by default (its kind's descriptor); a kind written as a number or an object names no default.
    const document = concept();
    document.requirements = [{ id: 'odd', kind: 5 }, { id: 'odder', kind: { name: 'stall' } }];
    const removed = removeConfiguration(document, 'landing');
    if (!removed.ok) throw new Error(removed.message);
    expect(Object.keys((removed.concept as Doc).aircraft.aero.configurations)).toEqual(['clean', 'ferry']);
  });

  it('shares the untouched list of requirements when nothing flies in the renamed configuration', () => {
    const document = concept();
    const result = renameConfiguration(document, 'ferry', 'long range');
    if (!result.ok) throw new Error(result.message);
    // Nothing to follow: the same list, not a copy.
    expect((result.concept as Doc).requirements).toBe(document.requirements);
  });

  it('writes no key for a value it is not given', () => {
    // "Absent ones are clean's": a configuration stating only its increment has that one key.
    const bare = addConfiguration(concept(), 'climb');
    if (!bare.ok) throw new Error(bare.message);
    expect(Object.keys((bare.concept as Doc).aircraft.aero.configurations.climb)).toEqual(['cd0Increment']);
    const onlyClMax = addConfiguration(concept(), 'flaps 10', { clMax: 1.7 });
    if (!onlyClMax.ok) throw new Error(onlyClMax.message);
    expect(Object.keys((onlyClMax.concept as Doc).aircraft.aero.configurations['flaps 10'])).toEqual(['cd0Increment', 'clMax']);
    const onlyE = addConfiguration(concept(), 'flaps 20', { oswaldEfficiency: 0.7 });
    if (!onlyE.ok) throw new Error(onlyE.message);
    expect(Object.keys((onlyE.concept as Doc).aircraft.aero.configurations['flaps 20'])).toEqual(['cd0Increment', 'oswaldEfficiency']);
  });
});
