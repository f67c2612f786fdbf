/**
 * A second boundary of one kind is a shade of the kind's colour, not only a
 * dash: the colour mixed linearly towards black or white (common practice for
 * tints and shades of one hue), worked here by hand.
 */
import { describe, expect, it } from 'vitest';
import { DEMO_CONCEPTS, evaluateDesign, parseConcept } from '../../core';
import { chartData } from '../../app/chart';
import { boundaryColours, kindColour, kindShade } from '../../app/chart/palette';

describe('boundary shades', () => {
  it('mixes towards black, then white, by the stated amounts (by hand)', () => {
    // 0x33 = 51, 0x66 = 102, 0x99 = 153; 38 % towards black keeps 62 %: 31.6 -> 0x20, 63.2 -> 0x3f, 94.9 -> 0x5f.
    expect(kindShade('#336699', 1)).toBe('#203f5f');
    // 40 % towards white: 51 + 0.4 (255 - 51) = 132.6 -> 0x85; 102 + 61.2 = 163.2 -> 0xa3; 153 + 40.8 = 193.8 -> 0xc2.
    expect(kindShade('#336699', 2)).toBe('#85a3c2');
    expect(kindShade('#336699', 0)).toBe('#336699');
  });

  it('two climb-gradient boundaries in one concept get different colours, the second a shade of the first', () => {
    const concept = structuredClone(DEMO_CONCEPTS[0].concept) as Record<string, any>;
    concept.requirements.push({ id: 'climb-late', kind: 'climb-gradient', gradient: '5 %', configuration: 'clean' });
    const parsed = parseConcept(concept);
    if (!parsed.ok) throw new Error('does not parse');
    const data = chartData(evaluateDesign(parsed.design));
    const climbs = data.curves.filter((curve) => curve.kind === 'climb-gradient');
    expect(climbs.map((curve) => curve.colour)).toEqual([kindColour('climb-gradient'), kindShade(kindColour('climb-gradient'), 1)]);
    expect(climbs[0].colour).not.toBe(climbs[1].colour);
    expect(boundaryColours(climbs).get('climb-late')).toBe(climbs[1].colour);
  });
});
