// @ts-nocheck
import { describe, expect, it } from 'vitest';
import { CONCEPT_FORMAT, parseConcept, parseConceptText } from '../../../core/concept';
import { EXAMPLE_TEXT, exampleConcept } from './fixture';

// NIST SP 811 exact factors: 1 kt = 1852/3600 m/s, 1 ft = 0.3048 m.
const KT = 1852 / 3600;
const FT = 0.3048;
const near = (value: number) => expect.closeTo(value, 12);

describe('parseConcept: the DESIGN.md example', () => {
  it('resolves to exactly the SI design the example means', () => {
    const parsed = parseConcept(exampleConcept());
    if (!parsed.ok) throw new Error(JSON.stringify(parsed.issues));
    expect(parsed.warnings).toEqual([]);
    expect(parsed.design).toEqual({
      name: 'Example trainer',
      aircraft: {
        takeoffMassKg: 750,
        aspectRatio: 7.5,
        cdLinear: 0,
        configurations: {
          clean: { cd0: 0.03, oswaldEfficiency: 0.8, clMax: 1.5 },
          // Absolute cd0 = clean cd0 + increment (DESIGN.md).
          takeoff: { cd0: near(0.045), oswaldEfficiency: 0.76, clMax: 1.8 },
          landing: { cd0: near(0.09), oswaldEfficiency: 0.72, clMax: 2.1 },
        },
        // A piston engine has no lapse exponent of its own: 1 (unused).
        propulsion: { kind: 'piston', engines: 1, lapseExponent: 1 },
      },
      requirements: [
        {
          id: 'stall',
          kind: 'stall',
          enabled: true,
          altitudeM: 0,
          temperatureOffsetK: 0,
          massFraction: 1,
          powerSetting: 1,
          propellerEfficiency: 0.75,
          configuration: 'landing',
          speedMps: near(45 * KT),
        },
        {
          id: 'cruise',
          kind: 'cruise',
          enabled: true,
          altitudeM: near(6000 * FT),
          temperatureOffsetK: 0,
          massFraction: 0.95,
          powerSetting: 0.75,
          propellerEfficiency: 0.82,
          configuration: 'clean',
          speedMps: near(110 * KT),
        },
      ],
      diagram: { wingLoadingRangePa: [200, 1500], samples: 131 },
      designPoint: { wingLoadingPa: 600, loading: 9 },
      warnings: [],
    });
    // 45 kt = 23.15 m/s, 6000 ft = 1828.8 m (NIST SP 811).
    expect(parsed.design.requirements[0]).toMatchObject({ speedMps: expect.closeTo(23.15, 2) });
    expect(parsed.design.requirements[1].altitudeM).toBeCloseTo(1828.8, 9);
  });

  it('returns the concept exactly as written: same content, same key order, a copy', () => {
    const input = exampleConcept();
    const before = JSON.stringify(input);
    const parsed = parseConcept(input);
    if (!parsed.ok) throw new Error(JSON.stringify(parsed.issues));
    expect(parsed.concept).toEqual(input);
    expect(JSON.stringify(parsed.concept)).toBe(before);
    expect(parsed.concept).not.toBe(input);
    expect(parsed.concept.requirements).not.toBe(input.requirements);
    // Nothing in the input was changed or filled in.
    expect(JSON.stringify(input)).toBe(before);
    expect(parsed.concept.requirements[0]).not.toHaveProperty('altitude');
  });

  it('does not touch a frozen input', () => {
    const freeze = (value: unknown): unknown => {
      if (value && typeof value === 'object') {
        Object.values(value).forEach(freeze);
        Object.freeze(value);
      }
      return value;
    };
    const parsed = parseConcept(freeze(exampleConcept()));
    expect(parsed.ok).toBe(true);
  });

  it('parses the same from the text as from the object', () => {
    const fromText = parseConceptText(EXAMPLE_TEXT, 'example.json');
    const fromObject = parseConcept(exampleConcept());
    expect(fromText).toEqual(fromObject);
    if (fromText.ok) expect(fromText.concept.format).toBe(CONCEPT_FORMAT);
  });

  it('gives results that do not share state between calls', () => {
    const a = parseConcept(exampleConcept());
    const b = parseConcept(exampleConcept());
    if (!a.ok || !b.ok) throw new Error('example must parse');
    a.design.requirements[0].massFraction = 0.5;
    a.design.aircraft.configurations.clean.cd0 = 1;
    expect(b.design.requirements[0].massFraction).toBe(1);
    expect(b.design.aircraft.configurations.clean.cd0).toBe(0.03);
  });
});
