import { describe, expect, it } from 'vitest';
import { AIRCRAFT_FIELDS, requirementFieldSpecs, type FieldSpec } from '../../app/renderer/lib/concept/fields';
import { convertedText, displayText, plainNumber, prettyUnit, readInput, storedSi } from '../../app/renderer/lib/concept/values';
import { REQUIREMENT_KINDS, parseConcept, DEMO_CONCEPTS } from '../../core';
import { requirementFields } from '../../core/concept/requirement-schema';

const spec = (kind: (typeof REQUIREMENT_KINDS)[number], key: string): FieldSpec => requirementFieldSpecs(kind).find((field) => field.key === key)!;
const stallSpeed = spec('stall', 'speed');
const distance = spec('takeoff-ground-roll', 'distance');
const gradient = spec('climb-gradient', 'gradient');
const engines = spec('climb-gradient', 'enginesInoperative');

describe('displayText', () => {
  it('shows a stored value as typed, with the value in the chosen system beside it when the units differ', () => {
    // 1 kt = 1852/3600 m/s exactly (NIST SP 811): 45 kt = 23.15 m/s, shown to 3 figures beside (23.2).
    expect(displayText('45 kt', stallSpeed, 'si')).toBe('45 kt');
    expect(convertedText('45 kt', stallSpeed, 'si')).toBe('= 23.2 m/s');
    expect(displayText('45 kt', stallSpeed, 'us')).toBe('45');
    expect(convertedText('45 kt', stallSpeed, 'us')).toBe('');
    expect(displayText('45 kt', stallSpeed, 'kt-ft')).toBe('45');
    // 1 ft = 0.3048 m exactly (NIST SP 811): 1500 ft = 457.2 m; 250 m = 820.2 ft, whole feet in the working mix.
    expect(displayText('1500 ft', distance, 'si')).toBe('1500 ft');
    expect(convertedText('1500 ft', distance, 'si')).toBe('= 457 m');
    expect(displayText('1500 ft', distance, 'kt-ft')).toBe('1500');
    expect(convertedText('250 m', distance, 'kt-ft')).toBe('= 820 ft');
    expect(displayText('457.2 m', distance, 'si')).toBe('457.2');
    expect(displayText('2.4 %', gradient, 'si')).toBe('2.4');
    expect(displayText(0.024, gradient, 'us')).toBe('2.4');
    expect(displayText(undefined, stallSpeed, 'si')).toBe('');
  });

  it('never shows NaN', () => {
    expect(plainNumber(Number.NaN)).toBe('');
    expect(plainNumber(Infinity)).toBe('');
    expect(displayText('fast', stallSpeed, 'si')).toBe('fast');
  });
});

describe('readInput', () => {
  it('reads a bare number in the shown unit and keeps the unit in the file', () => {
    expect(readInput('50', stallSpeed, 'us')).toEqual({ ok: true, value: '50 kt' });
    expect(readInput(' 25.7 ', stallSpeed, 'si')).toEqual({ ok: true, value: '25.7 m/s' });
    expect(readInput('2.4', gradient, 'si')).toEqual({ ok: true, value: '2.4 %' });
    expect(readInput('1', engines, 'si')).toEqual({ ok: true, value: 1 });
  });

  it('takes a value written with any unit of its kind', () => {
    expect(readInput('90 km/h', stallSpeed, 'us')).toEqual({ ok: true, value: '90 km/h' });
    expect(storedSi('90 km/h', stallSpeed)).toBeCloseTo(25, 12);
  });

  it('says what is wrong with a value it cannot use', () => {
    expect(readInput('fast', stallSpeed, 'si')).toMatchObject({ ok: false });
    expect(readInput('45 kg', stallSpeed, 'si')).toMatchObject({ ok: false });
    expect(readInput('', stallSpeed, 'si')).toEqual({ ok: false, message: 'is required' });
    expect(readInput('1.5', engines, 'si')).toMatchObject({ ok: false, message: expect.stringContaining('whole number') });
    expect(readInput('', engines, 'si')).toEqual({ ok: true, value: undefined });
  });

  it('reads a choice only as one of its words, and shows the stored word', () => {
    const surface = spec('takeoff-distance', 'runwaySurface');
    expect(readInput('grass', surface, 'si')).toEqual({ ok: true, value: 'grass' });
    expect(readInput('', surface, 'si')).toEqual({ ok: true, value: undefined });
    expect(readInput('gravel', surface, 'si')).toEqual({ ok: false, message: '"gravel" is not one of paved, grass, soft' });
    expect(displayText('soft', surface, 'us')).toBe('soft');
    expect(fieldUnitless(surface)).toBe(true);
  });

  it('writes units the concept file accepts', () => {
    expect(prettyUnit('N/m^2')).toBe('N/m²');
    expect(prettyUnit('degF')).toBe('°F');
  });
});

function fieldUnitless(field: FieldSpec): boolean {
  return storedSi('grass', field) === null;
}

describe('field specs', () => {
  it('offer as choices exactly the words the concept file accepts (aircraft class, runway surface)', () => {
    const demo = DEMO_CONCEPTS.find((d) => d.slug === 'trainer')!.concept;
    const aircraftClass = AIRCRAFT_FIELDS.find((field) => field.key === 'class')!;
    const surface = spec('takeoff-ground-roll', 'runwaySurface');
    for (const [field, place] of [
      [aircraftClass, (value: string) => ({ ...demo, aircraft: { ...demo.aircraft, class: value } })],
      [surface, (value: string) => ({ ...demo, requirements: demo.requirements.map((r) => (r.kind === 'takeoff-ground-roll' ? { ...r, runwaySurface: value } : r)) })],
    ] as const) {
      if (field.value.type !== 'choice') throw new Error(`${field.key} is not a choice`);
      expect(field.value.choices.length).toBeGreaterThan(1);
      for (const choice of field.value.choices) expect(parseConcept(place(choice.value)).ok, `${field.key} ${choice.value}`).toBe(true);
      expect(parseConcept(place('gravel')).ok).toBe(false);
    }
    expect(demo.requirements.some((r) => r.kind === 'takeoff-ground-roll')).toBe(true);
  });

  it('offer only fields the concept file knows, for every kind', () => {
    for (const kind of REQUIREMENT_KINDS) {
      const known = requirementFields(kind);
      for (const field of requirementFieldSpecs(kind)) expect(known, `${kind}.${field.key}`).toContain(field.key);
    }
  });

  it('show every demo value so that reading it back keeps its meaning (to 5 significant digits)', () => {
    for (const demo of DEMO_CONCEPTS) {
      demo.concept.requirements.forEach((requirement) => {
        for (const field of requirementFieldSpecs(requirement.kind)) {
          const raw = (requirement as Record<string, unknown>)[field.key];
          if (raw === undefined || field.value.type === 'configuration') continue;
          for (const system of ['si', 'us'] as const) {
            const shown = displayText(raw, field, system);
            const read = readInput(shown, field, system);
            expect(read.ok, `${demo.slug} ${requirement.id}.${field.key} ${system}`).toBe(true);
            if (!read.ok) continue;
            if (field.value.type === 'switch' || field.value.type === 'choice') expect(read.value).toBe(raw);
            else expect(storedSi(read.value, field)! / storedSi(raw, field)!).toBeCloseTo(1, 4);
          }
        }
      });
      expect(parseConcept(demo.concept).ok).toBe(true);
    }
  });
});
